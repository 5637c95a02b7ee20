/** `seam-atlas screen`: every spin-axis position on the ball for a pitch, the best distinct grips and the classic holds. */
import type { Argv } from "yargs";
import { InputError } from "../io/errors.js";
import { DEFAULT_TOP } from "../screening/screen.js";
import { textOption, withAirOptions, withPitchOptions, withSamplerOptions, withScreenOptions } from "./options.js";
import { print, writeAtomic } from "./output.js";

export function registerScreen(y: Argv): Argv {
  return y.command(
    "screen",
    "screen every spin-axis position on the ball for a pitch: best distinct grips, robustness, the two- and four-seam holds, finger placement",
    (c) =>
      withAirOptions(withScreenOptions(
        withSamplerOptions(
          withPitchOptions(c)
            .option("top", textOption("how many candidates to list (1 to 50)", String(DEFAULT_TOP)))
            .option("json", { type: "boolean", default: false, describe: "print JSON" })
            .option("csv", { type: "boolean", default: false, describe: "print CSV, one row per candidate or reference hold" })
            .option("out", textOption("also write the JSON to this file"))
            .option("map", textOption("write the full sphere map (JSON) to this file; with several pitches, one file each (NAME.json) in this folder"))
            .example("$0 screen --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --want arm", "a right-hander's sinker")
            .example("$0 screen --demo --csv", "the demo staff as CSV"),
        ),
      )),
    async (argv) => {
      if (argv.json && argv.csv) throw new InputError(`give --json or --csv, not both`);
      const { parseScreen, runScreen } = await import("../jobs/screen.js");
      const { jsonText, screenDocument, sphereMapDocument } = await import("../jobs/formats/json.js");
      const outcome = runScreen(parseScreen(argv));
      const json = jsonText(screenDocument(outcome));
      // build every output before writing any
      const mapFiles: [string, string][] = [];
      if (typeof argv.map === "string") {
        if (outcome.screened.length === 1) mapFiles.push([argv.map, JSON.stringify(sphereMapDocument(outcome.screened[0].result)) + "\n"]);
        else {
          const { join } = await import("node:path");
          for (const s of outcome.screened) {
            const stem = `${s.input.echo.pitcher}-${s.input.echo.name}`.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "");
            mapFiles.push([join(argv.map, `${stem}.json`), JSON.stringify(sphereMapDocument(s.result)) + "\n"]);
          }
        }
      }
      if (typeof argv.out === "string") writeAtomic(argv.out, json);
      for (const [path, text] of mapFiles) writeAtomic(path, text);
      const reports = outcome.screened.map((s) => s.report);
      if (argv.json) print(json);
      else if (argv.csv) print((await import("../jobs/formats/csv.js")).screenCsv(reports));
      else {
        print((await import("../jobs/formats/text.js")).screenText(outcome.job.team, reports));
        for (const f of [argv.out, ...mapFiles.map((m) => m[0])]) if (typeof f === "string") print(`wrote ${f}\n`);
      }
    },
  );
}
