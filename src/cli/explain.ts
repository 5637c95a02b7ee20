/** `seam-atlas explain`: tracked pitches against what their spin predicts, one from flags or a CSV streamed through. */
import { createWriteStream, renameSync, rmSync } from "node:fs";
import { basename, dirname, join } from "node:path";
import type { Argv } from "yargs";
import { InputError } from "../io/errors.js";
import { textOption, withAirOptions, withPitchOptions } from "./options.js";
import { ensureFolder, print, writeAtomic } from "./output.js";

export function registerExplain(y: Argv): Argv {
  return y.command(
    "explain",
    "compare a tracked pitch's movement with what its spin predicts and find the seam orientations that would account for the rest (one pitch, or a CSV in batch)",
    (c) =>
      withAirOptions(
        withPitchOptions(c)
          .option("move-arm", textOption("observed movement toward the arm side, inches (gravity removed)"))
          .option("move-up", textOption("observed movement up, inches (gravity removed)"))
          .option("csv-in", textOption("a CSV of tracked pitches (columns: see README)"))
          .option("out", textOption("where the batch results go (.csv or .json); for one pitch, also write its JSON here"))
          .option("format", textOption("csv or json for the batch output [default: from --out's extension]"))
          .option("on-bad-row", textOption("skip: report a bad row's line and go on; stop: stop there (rows already done are kept)", "skip"))
          .option("grid", textOption("spacing of the orientations tried on the ball, deg (1 to 15)", "4"))
          .option("top", textOption("how many matching orientations to report (1 to 20)", "3"))
          .option("json", { type: "boolean", default: false, describe: "print JSON (one pitch)" })
          .example("$0 explain --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --move-arm 17 --move-up 12", "one tracked sinker")
          .example("$0 explain --csv-in session.csv --out out/session-explained.csv", "a whole session"),
      ),
    async (argv) => {
      const jobs = await import("../jobs/explain.js");
      const json = await import("../jobs/formats/json.js");
      const job = jobs.parseExplain(argv);
      if (job.kind === "one") {
        const numbers = jobs.explanationNumbers(jobs.runExplainOne(job));
        const doc = json.jsonText(json.explainDocument(job, numbers));
        if (typeof argv.out === "string") writeAtomic(argv.out, doc);
        print(argv.json ? doc : (await import("../jobs/formats/text.js")).explainText(job, numbers));
        return;
      }
      const csv = await import("../jobs/formats/csv.js");
      const out = String(argv.out);
      ensureFolder(dirname(out));
      const tmp = join(dirname(out), `.${basename(out)}.${process.pid}.tmp`);
      const sink = createWriteStream(tmp);
      const write = (s: string) => new Promise<void>((resolve) => (sink.write(s) ? resolve() : sink.once("drain", () => resolve())));
      const finish = () => new Promise<void>((resolve, reject) => sink.end((err?: Error | null) => (err ? reject(err) : resolve())));
      const tty = process.stderr.isTTY === true;
      const t0 = Date.now();
      let first = true;
      let summary;
      try {
        await write(job.format === "json" ? json.batchJsonOpen() : csv.explainCsvHeader(job.top));
        summary = await jobs.runExplainBatch(job, {
          row: async (r) => {
            await write(job.format === "json" ? json.batchJsonRow(r, first) : csv.explainCsvRow(r));
            first = false;
          },
          skipped: (message) => process.stderr.write(`${tty ? "\r\x1b[K" : ""}seam-atlas: skipped ${message}\n`),
          progress: (done) => {
            if (tty && done % 50 === 0) process.stderr.write(`\r  ${done} rows, ${Math.round(done / Math.max(0.001, (Date.now() - t0) / 1000))} rows/s`);
          },
        });
        if (job.format === "json") await write(json.batchJsonClose());
        await finish();
        renameSync(tmp, out);
      } catch (err) {
        sink.destroy();
        rmSync(tmp, { force: true });
        throw err;
      }
      if (tty) process.stderr.write("\r\x1b[K");
      if (summary.stoppedAt !== undefined) {
        throw new InputError(`stopped at ${summary.stoppedAt} (${summary.done} row(s) before it written to ${out})`);
      }
      const seconds = (Date.now() - t0) / 1000;
      print(
        `explained ${summary.done} pitch(es) in ${seconds.toFixed(1)} s (${Math.round(summary.done / Math.max(0.001, seconds))} rows/s)${summary.skipped ? `, skipped ${summary.skipped} bad row(s)` : ""}; wrote ${out}\n`,
      );
    },
  );
}
