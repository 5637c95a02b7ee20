/** `seam-atlas calibrate`: fits the seam-force model's parameters to a lab's forces and tracked seam movement; writes a profile for --model. */
import type { Argv } from "yargs";
import { textOption, withAirOptions } from "./options.js";

export function registerCalibrate(y: Argv): Argv {
  return y.command(
    "calibrate",
    "fit the seam-force model's parameters to your own measurements (lab forces and/or tracked pitches' seam movement) and write the fitted profile for --model",
    (c) =>
      withAirOptions(
        c
          .option("lab", textOption("lab force measurements, CSV: axis_x,axis_y,axis_z,gyro_deg,phase_deg,speed_mph,spin_rpm,force_magnus_n,force_across_n (see README)"))
          .option("tracked", textOption("tracked pitches with a known seam orientation, CSV: hand,speed_mph,spin_rpm,tilt,axis_x,axis_y,axis_z,seam_arm_in,seam_up_in (or the other units and keys explain reads: see README)"))
          .option("columns", textOption("map the tracked file's keys onto your headers, key=Header,... (the keys carry their units: speed_kmh=Velo,seam_up_cm=SeamV)"))
          .option("fit", textOption("parameters to fit, NAME,NAME,... [default: every calibratable one]"))
          .option("model", textOption("the profile to start from (JSON); it also gives the parameters not fitted [default: the built-in defaults]"))
          .option("name", textOption("name of the fitted profile", "calibrated"))
          .option("out", textOption("write the fitted profile here (JSON, loadable with --model)"))
          .option("residuals", textOption("write each row's measured, start and fitted values here (CSV)"))
          .option("sigma-n", textOption("uncertainty of one lab force component, N (weights lab rows against tracked ones)", "0.02"))
          .option("sigma-in", textOption("uncertainty of one tracked movement component, inches", "1"))
          .option("window-ft", textOption("where the trade's movement window starts, ft from home plate (10 to 55), for tracked rows", "50"))
          .option("on-bad-row", textOption("skip: report a bad row's line and go on; stop: stop there, writing nothing", "skip"))
          .option("json", { type: "boolean", default: false, describe: "print the report as JSON" })
          .example("$0 calibrate --lab tunnel.csv --out out/my-lab.json", "fit every calibratable parameter to a lab's forces")
          .example("$0 calibrate --lab tunnel.csv --fit scale,laminarSeparationDeg --json", "fit two, print JSON")
          .example("$0 flight --demo --pitch-name 'Iris Talvela/sinker' --axis 20N,45E --model out/my-lab.json", "use the fitted profile"),
      ),
    async (argv) => {
      const jobs = await import("../jobs/calibrate.js");
      const { planOutputs, writeOutput } = await import("../io/output.js");
      const job = jobs.parseCalibrate(argv);
      const requested = [
        ...(typeof argv.out === "string" ? [{ option: "--out", path: argv.out, format: "json" as const }] : []),
        ...(typeof argv.residuals === "string" ? [{ option: "--residuals", path: argv.residuals, format: "csv" as const }] : []),
      ];
      const planned = planOutputs(requested, job.inputs);
      const tty = process.stderr.isTTY === true;
      const rows = await jobs.readCalibrationRows(job, {
        skipped: (message) => process.stderr.write(`seam-atlas: skipped ${message}\n`),
      });
      const outcome = jobs.runCalibrate(job, rows, (k, rms) => {
        if (tty) process.stderr.write(`\r  fitting: iteration ${k}, rms weighted residual ${rms.toFixed(3)}\x1b[K`);
      });
      if (tty) process.stderr.write("\r\x1b[K");
      const json = await import("../jobs/formats/json.js");
      for (const target of planned) {
        if (target.option === "--out") writeOutput(target, json.jsonText(json.calibratedProfileDocument(outcome)));
        else writeOutput(target, (await import("../jobs/formats/csv.js")).calibrateResidualsCsv(outcome));
      }
      // the report goes to standard output unless an output file already does
      if (planned.some((t) => t.kind === "stdout")) return;
      const { print } = await import("./output.js");
      print(argv.json ? json.jsonText(json.calibrateDocument(outcome)) : (await import("../jobs/formats/text.js")).calibrateText(outcome));
    },
  );
}
