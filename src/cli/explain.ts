/** `seam-atlas explain`: tracked pitches against what their spin predicts, one from flags or a CSV streamed through. */
import { join } from "node:path";
import type { Argv } from "yargs";
import { InputError } from "../io/errors.js";
import type { OutputStream } from "../io/output.js";
import { quote } from "../io/quote.js";
import { textOption, withAirOptions, withCacheOption, withPitchOptions, withThreadsOption } from "./options.js";
import { openOutputStream, planRun, print, streamProgress, writeOutput, type WantedOutput } from "./output.js";

export function registerExplain(y: Argv): Argv {
  return y.command(
    "explain",
    "compare a tracked pitch's movement with what its spin predicts, find the seam orientations that would account for the rest, and read the spin-based against the observed direction (one pitch, or a CSV in batch with a per-pitch-type summary and a bullpen report)",
    (c) =>
      withThreadsOption(withCacheOption(withAirOptions(
        withPitchOptions(c)
          .option("move-up", textOption("observed vertical movement, inches, gravity removed (on the trade basis: induced vertical break)"))
          .option("move-arm", textOption("observed horizontal movement toward the arm side, inches"))
          .option("move-right", textOption("observed horizontal movement toward the catcher's right (the field's +x), inches (instead of --move-arm)"))
          .option("movement-basis", textOption("trade: induced vertical and horizontal break over the window --window-ft; release: at the plate against a spinless flight", "trade"))
          .option("window-ft", textOption("trade basis: where the movement window starts, ft from home plate (10 to 55) [default: 50]"))
          .option("gap-flag", textOption("flag a gap between spin-based and observed direction larger than this, minutes of clock (1 to 360)", "20"))
          .option("model", textOption("a seam-force model profile (JSON; see README) [default: the built-in defaults]"))
          .option("csv-in", textOption("a CSV of tracked pitches (our column keys, or --columns; see README); the pitch flags do not go with it"))
          .option("columns", textOption("batch: map our column keys to your headers, key=Header,... (e.g. speed_kmh=Velo,move_up_in=IVB)"))
          .option("out", textOption("where the batch results go (.csv or .json; - for standard output); for one pitch, also write its JSON here"))
          .option("format", textOption("csv or json for the batch output [default: from --out's extension; csv on standard output or a device]"))
          .option("on-bad-row", textOption("skip: report a bad row's line and go on; stop: stop there with exit status 2, writing nothing [default: skip]"))
          .option("summary", textOption("batch: per pitcher and pitch type, one seam orientation fitted to all its throws (.json or .csv)"))
          .option("report", textOption("batch: the bullpen report, a PDF per pitcher (.pdf)"))
          .option("report-svg", textOption("batch: also each of the report's charts as SVG, in this folder"))
          .option("report-png", textOption("batch: also each of the report's charts as PNG (1600 px wide), in this folder"))
          .option("grid", textOption("spacing of the orientations tried on the ball, deg (1 to 15)", "4"))
          .option("top", textOption("how many matching orientations to report (1 to 20)", "3"))
          .option("json", { type: "boolean", default: false, describe: "print JSON (one pitch)" })
          .example("$0 explain --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --move-arm 15 --move-up 9", "one tracked sinker (trade basis, 50 ft)")
          .example("$0 explain --csv-in session.csv --columns speed_kmh=Velo,move_up_in=IVB --out out/session.csv --summary out/summary.json --report out/bullpen.pdf", "a whole session"),
      )), "batch only: one per core for files above 48 KiB"),
    async (argv) => {
      const jobs = await import("../jobs/explain.js");
      const { inputFiles } = await import("../jobs/request/inputs.js");
      const json = await import("../jobs/formats/json.js");
      const job = jobs.parseExplain(argv);
      if (job.kind === "one") {
        const [out] = planRun([{ option: "--out", path: argv.out, format: "json" }], inputFiles(argv));
        const numbers = jobs.explanationNumbers(jobs.runExplainOne(job));
        const doc = json.jsonText(json.explainDocument(job, numbers));
        if (out) writeOutput(out, doc);
        if (out?.kind === "stdout") return; // the JSON is the standard output
        print(argv.json ? doc : (await import("../jobs/formats/text.js")).explainText(job, numbers));
        return;
      }
      // the CSV's header is checked before any output is made; then every output is planned, then rows stream through
      const opened = await jobs.openExplainBatch(job);
      let sink: OutputStream;
      let planned;
      try {
        const wanted: WantedOutput[] = [
          { option: "--out", path: job.out, format: job.format },
          { option: "--summary", path: job.summary?.path, format: job.summary?.format },
          { option: "--report", path: job.report, format: "pdf" },
          // the folder is checked through a file in it; the charts' names come from the pitchers
          { option: "--report-svg", path: job.reportSvg === undefined ? undefined : join(job.reportSvg, "movement.svg"), format: "svg" },
          { option: "--report-png", path: job.reportPng === undefined ? undefined : join(job.reportPng, "movement.png"), format: "png" },
        ];
        for (const [option, folder] of [["--report-svg", job.reportSvg], ["--report-png", job.reportPng]] as const) {
          if (folder === "-" || folder === "") throw new InputError(`${option} ${quote(folder)}: expected a folder for the charts`);
        }
        planned = planRun(wanted, inputFiles(argv));
        sink = openOutputStream(planned[0]!);
      } catch (err) {
        opened.reader.close();
        throw err;
      }
      const csv = await import("../jobs/formats/csv.js");
      const bar = streamProgress();
      // with the results on standard output, the words about them go to stderr
      const say = (text: string) => (sink.target.kind === "stdout" ? process.stderr.write(text) : print(text));
      const t0 = Date.now();
      let first = true;
      let summary;
      try {
        await sink.write(job.format === "json" ? json.batchJsonOpen(job.settings) : csv.explainCsvHeader(job.settings.top));
        summary = await jobs.runExplainBatch(job, opened, {
          row: async (r) => {
            await sink.write(job.format === "json" ? json.batchJsonRow(r, first) : csv.explainCsvRow(r));
            first = false;
          },
          skipped: (message) => {
            bar.clear();
            process.stderr.write(`seam-atlas: skipped ${message}\n`);
          },
          progress: (done, read) => bar.tick(done, read.bytesRead, read.totalBytes),
        });
        if (summary.stoppedAt !== undefined) {
          // bad input writes no file and replaces none: the rows before the bad one go too
          sink.abort();
          const printed = sink.target.kind === "stdout" ? `; ${summary.done} row(s) before it already printed` : "";
          throw new InputError(`stopped at ${summary.stoppedAt} (--on-bad-row stop: nothing written${printed})`);
        }
        if (job.format === "json") await sink.write(json.batchJsonClose());
        await sink.commit();
      } catch (err) {
        sink.abort();
        throw err;
      } finally {
        opened.reader.close();
        bar.clear();
      }
      const seconds = (Date.now() - t0) / 1000;
      const where = (p: { kind: string; given: string }) => (p.kind === "stdout" ? "standard output" : quote(p.given));
      const wrote: string[] = [where(sink.target)];
      const types = summary.pitchTypes ?? [];
      const [, summaryOut, reportOut] = planned;
      if (summaryOut) {
        const numbers = types.map((t) => t.numbers);
        writeOutput(
          summaryOut,
          job.summary!.format === "json"
            ? json.jsonText(json.explainSummaryDocument(job.settings, numbers, { done: summary.done, skipped: summary.skipped }))
            : csv.explainSummaryCsv(job.settings, numbers),
        );
        wrote.push(where(summaryOut));
      }
      if (reportOut || job.reportSvg !== undefined || job.reportPng !== undefined) {
        const report = await import("../jobs/explainReport.js");
        const built = await report.buildBullpenReport(job.settings, types, { pdf: reportOut !== undefined, svg: job.reportSvg !== undefined, png: job.reportPng !== undefined });
        if (reportOut) {
          writeOutput(reportOut, built.pdf!);
          wrote.push(where(reportOut));
        }
        if (job.reportSvg !== undefined) {
          const charts = planRun(
            built.svgs.map((s) => ({ option: "--report-svg", path: join(job.reportSvg!, s.name), format: "svg" as const })),
            inputFiles(argv),
          );
          charts.forEach((p, i) => writeOutput(p!, built.svgs[i].svg));
          wrote.push(`${built.svgs.length} chart(s) in ${quote(job.reportSvg)}`);
        }
        if (job.reportPng !== undefined) {
          const charts = planRun(
            built.pngs.map((s) => ({ option: "--report-png", path: join(job.reportPng!, s.name), format: "png" as const })),
            inputFiles(argv),
          );
          charts.forEach((p, i) => writeOutput(p!, built.pngs[i].png));
          wrote.push(`${built.pngs.length} PNG chart(s) in ${quote(job.reportPng)}`);
        }
      }
      say(
        `explained ${summary.done} pitch(es) in ${seconds.toFixed(1)} s (${Math.round(summary.done / Math.max(0.001, seconds))} rows/s${summary.threads ? `, ${summary.threads} worker threads` : ""})${summary.skipped ? `, skipped ${summary.skipped} bad row(s)` : ""}; wrote ${wrote.join(", ")}\n`,
      );
    },
  );
}
