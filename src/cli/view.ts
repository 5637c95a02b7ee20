/** `seam-atlas view`: the workbench, one self-contained page that screens, shows and prints grips offline from any folder. */
import type { Argv } from "yargs";
import { DEFAULT_TOP } from "../screening/screen.js";
import { textOption, withAirOptions, withPitchOptions, withCacheOption, withSamplerOptions, withScreenOptions } from "./options.js";
import { planRun, print, writeOutput } from "./output.js";

const DEFAULT_VIEW_OUT = "out/view.html";

export function registerView(y: Argv): Argv {
  return y.command(
    "view",
    "write the workbench: a self-contained page (one HTML file, no network needed) that screens a pitch typed into its form, shows the ball turning in the separation band with the push and the fingers, steps through the candidates and the reference holds, and prints grip cards; with a pitch file or pitch flags, those pitches come screened",
    (c) =>
      withCacheOption(withAirOptions(withScreenOptions(
        withSamplerOptions(
          withPitchOptions(c)
            .option("top", textOption("how many candidates to show (1 to 50)", String(DEFAULT_TOP)))
            .option("out", textOption("the HTML file to write (written whole or not at all; - for standard output)", DEFAULT_VIEW_OUT))
            .example("$0 view", "the workbench with an empty staff, to out/view.html")
            .example("$0 view --demo", "the demo staff, to out/view.html")
            .example("$0 view --hand right --speed 92 --spin 2150 --tilt 1:45 --want arm", "one pitch, to out/view.html"),
        ),
      ))),
    async (argv) => {
      const { parseView, runView } = await import("../jobs/view.js");
      const { inputFiles } = await import("../jobs/request/inputs.js");
      const job = parseView(argv);
      const [out] = planRun([{ option: "--out", path: argv.out, format: "html" }], inputFiles(argv));
      const made = await runView(job);
      writeOutput(out!, made.html);
      if (out!.kind === "stdout") return;
      const count = made.pitches === 0 ? "no pitch screened yet: type one into its form" : made.pitches === 1 ? "1 pitch" : `${made.pitches} pitches`;
      print(`wrote ${out!.given} (${count}, ${Math.round(Buffer.byteLength(made.html) / 1024)} KB; opens offline in a browser with WebGL)\n`);
    },
  );
}
