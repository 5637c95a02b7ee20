/** `seam-atlas explain`: tracked pitches against what their spin predicts, one from flags or a CSV streamed through. */
import type { Argv } from "yargs";
import { InputError } from "../io/errors.js";
import type { OutputStream } from "../io/output.js";
import { quote } from "../io/quote.js";
import { textOption, withAirOptions, withPitchOptions } from "./options.js";
import { openOutputStream, planRun, print, streamProgress, writeOutput } from "./output.js";

export function registerExplain(y: Argv): Argv {
  return y.command(
    "explain",
    "compare a tracked pitch's movement with what its spin predicts and find the seam orientations that would account for the rest (one pitch, or a CSV in batch)",
    (c) =>
      withAirOptions(
        withPitchOptions(c)
          .option("move-arm", textOption("observed movement toward the arm side, inches (gravity removed)"))
          .option("move-up", textOption("observed movement up, inches (gravity removed)"))
          .option("csv-in", textOption("a CSV of tracked pitches (columns: see README); the pitch flags do not go with it"))
          .option("out", textOption("where the batch results go (.csv or .json; - for standard output); for one pitch, also write its JSON here"))
          .option("format", textOption("csv or json for the batch output [default: from --out's extension; csv on standard output or a device]"))
          .option("on-bad-row", textOption("skip: report a bad row's line and go on; stop: stop there with exit status 2 (rows already done are kept) [default: skip]"))
          .option("grid", textOption("spacing of the orientations tried on the ball, deg (1 to 15)", "4"))
          .option("top", textOption("how many matching orientations to report (1 to 20)", "3"))
          .option("json", { type: "boolean", default: false, describe: "print JSON (one pitch)" })
          .example("$0 explain --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --move-arm 17 --move-up 12", "one tracked sinker")
          .example("$0 explain --csv-in session.csv --out out/session-explained.csv", "a whole session"),
      ),
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
      // the CSV's header is checked before any output is made; then the output is planned, then rows stream through
      const reader = await jobs.openExplainBatch(job);
      let sink: OutputStream;
      try {
        const [out] = planRun([{ option: "--out", path: job.out, format: job.format }], inputFiles(argv));
        sink = openOutputStream(out!);
      } catch (err) {
        reader.close();
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
        await sink.write(job.format === "json" ? json.batchJsonOpen() : csv.explainCsvHeader(job.top));
        summary = await jobs.runExplainBatch(job, reader, {
          row: async (r) => {
            await sink.write(job.format === "json" ? json.batchJsonRow(r, first) : csv.explainCsvRow(r));
            first = false;
          },
          skipped: (message) => {
            bar.clear();
            process.stderr.write(`seam-atlas: skipped ${message}\n`);
          },
          progress: (done, read) => {
            if (done % 50 === 0) bar.tick(done, read.bytesRead, read.totalBytes);
          },
        });
        if (job.format === "json") await sink.write(json.batchJsonClose());
        // also after a stop: the rows before the bad one are the output
        await sink.commit();
      } catch (err) {
        sink.abort();
        throw err;
      } finally {
        reader.close();
        bar.clear();
      }
      const where = sink.target.kind === "stdout" ? "standard output" : quote(sink.target.given);
      if (summary.stoppedAt !== undefined) {
        throw new InputError(`stopped at ${summary.stoppedAt} (${summary.done} row(s) before it written to ${where})`);
      }
      const seconds = (Date.now() - t0) / 1000;
      say(
        `explained ${summary.done} pitch(es) in ${seconds.toFixed(1)} s (${Math.round(summary.done / Math.max(0.001, seconds))} rows/s)${summary.skipped ? `, skipped ${summary.skipped} bad row(s)` : ""}; wrote ${where}\n`,
      );
    },
  );
}
