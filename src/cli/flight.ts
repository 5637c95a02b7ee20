/** `seam-atlas flight`: a pitch with a seam orientation flown to the plate, its movement split into Magnus and seam parts. */
import type { Argv } from "yargs";
import { textOption, withAirOptions, withCacheOption, withPitchOptions, withSamplerOptions, withScreenChoiceOptions } from "./options.js";
import { planRun, print, writeOutput } from "./output.js";

export function registerFlight(y: Argv): Argv {
  return y.command(
    "flight",
    "fly a pitch with a seam orientation to the plate: plate location, time, approach angles, movement as the trade reads it (induced vertical and horizontal break) and from release, split into Magnus, seam and drag parts",
    (c) =>
      withScreenChoiceOptions(withCacheOption(withAirOptions(
        withSamplerOptions(
          withPitchOptions(c)
            .option("axis", textOption("spin axis on the ball: X,Y,Z, a landmark name, or 12.5N,45E"))
            .option("candidate", textOption("use the screen's candidate N for this pitch instead of --axis"))
            .option("reference", textOption("use a reference hold instead of --axis: four-seam or two-seam"))
            .option("air", textOption("standard (the air options apply) or none (a vacuum check)", "standard"))
            .option("release-height-ft", textOption("release height above the ground, ft", "6"))
            .option("release-side-ft", textOption("release point toward the arm side of the rubber's middle, ft", "1.5"))
            .option("extension-ft", textOption("release extension in front of the rubber, ft", "6"))
            .option("vertical-angle", textOption("launch angle above level, deg (with --horizontal-angle; default: aim at the middle of the zone)"))
            .option("horizontal-angle", textOption("launch angle toward the catcher's right, deg"))
            .option("drag", textOption("drag model: giordano (Giordano & Nakanishi's speed-dependent fit, scaled to the air's density) or constant", "giordano"))
            .option("drag-coefficient", textOption("C_D for --drag constant [default: 0.35]"))
            .option("spin-decay-s", textOption("spin decays as exp(-t / TAU), TAU in seconds [default: no decay]"))
            .option("phase", textOption("the ball's phase at release, deg (geometry/flow.ts): the seam force then follows the ball's turning from it [default: turn-averaged when the ball turns 8 or more times before the plate, else phase 0]"))
            .option("window-ft", textOption("where the trade's movement window starts, ft from home plate (10 to 55)", "50"))
            .option("trajectory", { type: "boolean", default: false, describe: "add the flight's path (every 1 ms) to the JSON" })
            .option("json", { type: "boolean", default: false, describe: "print JSON" })
            .option("out", textOption("also write the JSON to this file (- for standard output)"))
            .example("$0 flight --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --candidate 1", "the screen's best grip, in inches")
            .example("$0 flight --hand right --speed 94 --spin 2350 --tilt 12:45 --axis waist-A --elevation-ft 5200", "a four-seam hold at altitude"),
        ),
      ))),
    async (argv) => {
      const { parseFlight, runFlight } = await import("../jobs/flight.js");
      const { inputFiles } = await import("../jobs/request/inputs.js");
      const { flightDocument, jsonText } = await import("../jobs/formats/json.js");
      const job = parseFlight(argv);
      const [out] = planRun([{ option: "--out", path: argv.out, format: "json" }], inputFiles(argv));
      const outcome = runFlight(job);
      const json = jsonText(flightDocument(outcome));
      if (out) writeOutput(out, json);
      if (out?.kind === "stdout") return; // the JSON is the standard output
      print(argv.json ? json : (await import("../jobs/formats/text.js")).flightText(outcome));
    },
  );
}
