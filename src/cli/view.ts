/** `seam-atlas view`: the screen, drawn as one self-contained 3-D page that opens offline from any folder. */
import { statSync } from "node:fs";
import type { Argv } from "yargs";
import { InputError } from "../io/errors.js";
import { DEFAULT_TOP } from "../screening/screen.js";
import { textOption, withAirOptions, withPitchOptions, withSamplerOptions, withScreenOptions } from "./options.js";
import { print, writeAtomic } from "./output.js";

const DEFAULT_VIEW_OUT = "out/view.html";

export function registerView(y: Argv): Argv {
  return y.command(
    "view",
    "screen a pitch and write a self-contained 3-D page (one HTML file, no network needed): the ball turning in the separation band, the push, the candidates and the reference holds",
    (c) =>
      withAirOptions(withScreenOptions(
        withSamplerOptions(
          withPitchOptions(c)
            .option("top", textOption("how many candidates to show (1 to 50)", String(DEFAULT_TOP)))
            .option("out", textOption("the HTML file to write (written whole or not at all)", DEFAULT_VIEW_OUT))
            .example("$0 view --demo", "the demo staff, to out/view.html")
            .example("$0 view --hand right --speed 92 --spin 2150 --tilt 1:45 --want arm", "one pitch, to out/view.html"),
        ),
      )),
    async (argv) => {
      const out = String(argv.out ?? "").trim();
      if (Array.isArray(argv.out)) throw new InputError(`--out was given ${argv.out.length} times; give it once (an .html file name)`);
      if (out === "") throw new InputError(`--out is empty; expected an .html file name such as ${DEFAULT_VIEW_OUT}`);
      let isDirectory = false;
      try {
        isDirectory = statSync(out).isDirectory();
      } catch {
        // a path that does not exist yet is what we expect
      }
      if (isDirectory) throw new InputError(`--out "${out}" is a folder; expected an .html file name`);
      const { parseView, runView } = await import("../jobs/view.js");
      const made = await runView(parseView(argv));
      writeAtomic(out, made.html);
      const count = made.pitches === 1 ? "1 pitch" : `${made.pitches} pitches`;
      print(`wrote ${out} (${count}, ${Math.round(Buffer.byteLength(made.html) / 1024)} KB; opens offline in a browser with WebGL)\n`);
    },
  );
}
