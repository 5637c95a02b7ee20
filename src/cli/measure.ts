/** `seam-atlas measure`: the band occupancy for one orientation, or for the demo's orientations. */
import type { Argv } from "yargs";
import { withSamplerOptions, textOption } from "./options.js";
import { planRun, print, writeOutput } from "./output.js";

export function registerMeasure(y: Argv): Argv {
  return y.command(
    "measure",
    "turn-averaged seam share in the separation band, sides and asymmetry for one spin-axis position (seam occupancy, not the push)",
    (c) =>
      withSamplerOptions(
        c
          .option("axis", textOption("spin axis's positive end on the ball: X,Y,Z, a landmark name (see `landmarks`), or 12.5N,45E"))
          .option("gyro", textOption("gyro angle, deg, strictly between -90 and 90 (positive: axis end leans toward the flight) [default: 0]"))
          .option("json", { type: "boolean", default: false, describe: "print JSON instead of the table" })
          .option("out", textOption("also write the JSON to this file (written whole or not at all; - for standard output)"))
          .option("demo", { type: "boolean", default: false, describe: "measure the built-in demo's orientations (templates/demo.json)" })
          .example("$0 measure --axis waist-A", "the four-seam axis: 4 crossings, no asymmetry")
          .example("$0 measure --axis 20N,30E --gyro 15 --json", "one orientation as JSON")
          .example("$0 measure --demo --out out/demo-measure.json", "the demo's orientations"),
      ),
    async (argv) => {
      const { parseMeasure, runMeasure } = await import("../jobs/measure.js");
      const { inputFiles } = await import("../jobs/request/inputs.js");
      const { jsonText, measureDocument } = await import("../jobs/formats/json.js");
      const { measureText } = await import("../jobs/formats/text.js");
      const job = parseMeasure(argv);
      const [out] = planRun([{ option: "--out", path: argv.out, format: "json" }], inputFiles(argv));
      const result = runMeasure(job);
      const json = jsonText(measureDocument(result));
      if (out) writeOutput(out, json);
      if (out?.kind === "stdout") return; // the JSON is the standard output
      print(argv.json ? json : measureText(result) + (out ? `\nwrote ${out.given}\n` : ""));
    },
  );
}
