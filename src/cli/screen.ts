/** `seam-atlas screen`: every spin-axis position on the ball for a pitch, the best distinct grips and the classic holds. */
import { existsSync, statSync } from "node:fs";
import { join } from "node:path";
import type { Argv } from "yargs";
import { InputError } from "../io/errors.js";
import { formatOfPath } from "../io/outputPlan.js";
import { quote } from "../io/quote.js";
import { uniqueSlugs } from "../io/slugs.js";
import { DEFAULT_TOP } from "../screening/screen.js";
import { textOption, withAirOptions, withPitchOptions, withCacheOption, withSamplerOptions, withScreenOptions } from "./options.js";
import { planRun, print, refuseSecondStdout, toStdout, wroteLines, writeOutput, type WantedOutput } from "./output.js";

export function registerScreen(y: Argv): Argv {
  return y.command(
    "screen",
    "screen every spin-axis position on the ball for a pitch by the seam movement it adds (inches at the plate): best distinct grips, robustness, the two- and four-seam holds, finger placement",
    (c) =>
      withCacheOption(withAirOptions(withScreenOptions(
        withSamplerOptions(
          withPitchOptions(c)
            .option("top", textOption("how many candidates to list (1 to 50)", String(DEFAULT_TOP)))
            .option("json", { type: "boolean", default: false, describe: "print JSON" })
            .option("csv", { type: "boolean", default: false, describe: "print CSV, one row per candidate or reference hold" })
            .option("out", textOption("also write the JSON to this file, or the CSV with --csv (- for standard output)"))
            .option(
              "map",
              textOption(
                "write the full sphere map (JSON) to this file; for several pitches (a staff), or when it is an existing folder, a folder: one PITCHER-PITCH.json per pitch, each name unique",
              ),
            )
            .option("map-png", textOption("write the sphere map as a PNG picture, 1600 px wide, to this file; for a staff, a folder: one PITCHER-PITCH.png per pitch"))
            .example("$0 screen --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --want arm", "a right-hander's sinker")
            .example("$0 screen --demo --csv", "the demo staff as CSV")
            .example("$0 screen --demo --map out/maps", "the demo staff's sphere maps, one file per pitch in out/maps/"),
        ),
      ))),
    async (argv) => {
      if (argv.json && argv.csv) throw new InputError(`give --json or --csv, not both`);
      const { parseScreen, runScreen } = await import("../jobs/screen.js");
      const { inputFiles } = await import("../jobs/request/inputs.js");
      const job = parseScreen(argv);
      const labels = job.pitches.map((p) => (p.echo.pitcher ? `${p.echo.pitcher}-${p.echo.name}` : p.echo.name));
      const mapOutputs = mapsWanted(argv.map, labels);
      const pngOutputs = mapsWanted(argv["map-png"], labels, "--map-png", "png");
      const wanted: WantedOutput[] = [{ option: "--out", path: argv.out, format: argv.csv ? "csv" : "json" }, ...mapOutputs, ...pngOutputs];
      // standard output carries one document: --out - may go with --json or --csv (the same document), nothing else
      if (argv.csv) refuseSecondStdout([...mapOutputs, ...pngOutputs], "--csv");
      if (argv.json) refuseSecondStdout([...mapOutputs, ...pngOutputs], "--json");
      const [out, ...rest] = planRun(wanted, inputFiles(argv));
      const maps = rest.slice(0, mapOutputs.length);
      const pngs = rest.slice(mapOutputs.length);
      const planned = [out, ...rest];
      const { jsonText, screenDocument, sphereMapDocument } = await import("../jobs/formats/json.js");
      const outcome = runScreen(job);
      const json = jsonText(screenDocument(outcome));
      const reports = outcome.screened.map((s) => s.report);
      const csv = argv.csv ? (await import("../jobs/formats/csv.js")).screenCsv(reports) : undefined;
      if (out) writeOutput(out, csv ?? json);
      maps.forEach((m, i) => m && writeOutput(m, JSON.stringify(sphereMapDocument(outcome.screened[i].result)) + "\n"));
      if (pngs.some((m) => m)) {
        const { mapPng } = await import("../jobs/paper.js");
        pngs.forEach((m, i) => m && writeOutput(m, mapPng(outcome.screened[i], job.sampler.seamShape)));
      }
      if (toStdout(planned)) return;
      if (argv.json) print(json);
      else if (csv !== undefined) print(csv);
      else print((await import("../jobs/formats/text.js")).screenText(outcome.job.team, reports) + wroteLines(planned));
    },
  );
}

/**
 * The sphere-map outputs --map asks for: with one pitch the file it names; with
 * several, one file per pitch in the folder it names, each named by a unique
 * readable stem of "PITCHER-PITCH" (io/slugs.ts).
 */
function mapsWanted(map: unknown, labels: readonly string[], option = "--map", format: "json" | "png" = "json"): WantedOutput[] {
  if (map === undefined) return [];
  const folder = typeof map === "string" && map !== "" && existsSync(map) && statSync(map).isDirectory();
  if (typeof map !== "string" || (labels.length === 1 && !folder)) return [{ option, path: map, format }];
  const n = labels.length;
  const expected = `expected a folder for the ${n} pitches' sphere maps (one PITCHER-PITCH.${format} each)`;
  const given = `${option} ${quote(map)}`;
  if (map === "" || map === "-") throw new InputError(`${given} cannot hold ${n} sphere maps; ${expected}`);
  if (existsSync(map) && !statSync(map).isDirectory()) throw new InputError(`${given} is a file, but the run has ${n} pitches; ${expected}`);
  if (!existsSync(map) && formatOfPath(map) !== undefined) throw new InputError(`${given} is named like a file, but the run has ${n} pitches; ${expected}`);
  return uniqueSlugs(labels).map((stem) => ({ option, path: join(map, `${stem}.${format}`), format }));
}
