/** `seam-atlas force`: the seam-force model's side force through one turn and its turn average. */
import type { Argv } from "yargs";
import { textOption, withAirOptions } from "./options.js";
import { planRun, print, writeOutput } from "./output.js";

export function registerForce(y: Argv): Argv {
  return y.command(
    "force",
    "the seam-force model's instantaneous side force through one turn about the spin axis (newtons and coefficients), and its turn average",
    (c) =>
      withAirOptions(
        c
          .option("axis", textOption("spin axis's positive end on the ball: X,Y,Z, a landmark name (see `landmarks`), or 12.5N,45E"))
          .option("gyro", textOption("gyro angle, deg, strictly between -90 and 90", "0"))
          .option("speed", textOption("speed, mph", "65"))
          .option("spin", textOption("spin rate, rpm (for the Magnus force beside it; the seam force is quasi-steady)", "0"))
          .option("model", textOption("a seam-force model profile (JSON; see README) [default: the built-in defaults]"))
          .option("band-center", textOption("fixation band centre, deg [default: the model profile's]"))
          .option("band-width", textOption("fixation band width, deg [default: the model profile's]"))
          .option("seam-shape", textOption("seam shape b, 0 < b < 0.5 [default: fitted to a published cover's waist]"))
          .option("json", { type: "boolean", default: false, describe: "print JSON (360 phases)" })
          .option("out", textOption("also write the JSON to this file (- for standard output)"))
          .example("$0 force --axis waist-A --speed 65", "a knuckleball held on the four-seam axis, turned through one revolution")
          .example("$0 force --axis 3.6N,135E --gyro 10 --speed 92 --spin 2150 --json", "a sinker's grip, as JSON"),
      ),
    async (argv) => {
      const { parseForce, runForce } = await import("../jobs/force.js");
      const { inputFiles } = await import("../jobs/request/inputs.js");
      const { forceDocument, jsonText } = await import("../jobs/formats/json.js");
      const job = parseForce(argv);
      const [out] = planRun([{ option: "--out", path: argv.out, format: "json" }], inputFiles(argv));
      const result = runForce(job);
      const json = jsonText(forceDocument(result));
      if (out) writeOutput(out, json);
      if (out?.kind === "stdout") return; // the JSON is the standard output
      print(argv.json ? json : (await import("../jobs/formats/text.js")).forceText(result));
    },
  );
}
