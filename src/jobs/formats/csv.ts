/** Every CSV table the tool writes, built from job results (one row per record, a header first). */
import { vectorToLatLon } from "../../../geometry/ballCoords.js";
import { csvLine } from "../../io/csv.js";
import type { ScreenReport } from "../../screening/report.js";
import type { ExplainedRow } from "../explain.js";

/** One RFC 4180 record without its line end (formula cells neutralised: io/csvWriter.ts). */
const csvRow = (values: readonly unknown[]) => csvLine(values).slice(0, -1);

const SCREEN_COLUMNS = [
  "pitcher", "pitch", "kind", "rank", "latDeg", "lonDeg", "landmark", "landmarkAngleDeg", "scoreIn", "seamArmSideIn", "seamVerticalIn", "seamClock",
  "robustMeanIn", "robustP10In", "rankScoreIn", "crossingsPerRevolution", "seamInBand", "coefficientAcross", "coefficientAlongMagnus", "modelHash",
];

export function screenCsv(reports: readonly ScreenReport[]): string {
  const rows = [csvRow(SCREEN_COLUMNS)];
  for (const r of reports) {
    const p = r.input.pitch;
    for (const o of [...r.candidates, ...r.references]) {
      rows.push(
        csvRow([
          p.pitcher, p.name, o.reference ?? "candidate", o.rank ?? "", o.latLon.latDeg, o.latLon.lonDeg, o.landmark.name, o.landmark.angleDeg, o.score,
          o.seamMovement.armSideIn, o.seamMovement.verticalIn, o.seamMovement.clock, o.robustness.meanIn, o.robustness.p10In, o.rankScore,
          o.crossingsPerRevolution, o.occupancy.seamInBand, o.seamForce.across, o.seamForce.alongMagnus, r.input.model.hash,
        ]),
      );
    }
  }
  return rows.join("\n") + "\n";
}

/** The batch's CSV header for `top` matches per row. */
export function explainCsvHeader(top: number): string {
  return csvRow([
    "line", "pitcher", "pitch", "magnus_arm_in", "magnus_up_in", "residual_arm_in", "residual_up_in",
    ...Array.from({ length: top }, (_, i) => [`match${i + 1}_lat_deg`, `match${i + 1}_lon_deg`, `match${i + 1}_landmark`, `match${i + 1}_seam_arm_in`, `match${i + 1}_seam_up_in`, `match${i + 1}_fit_error_in`]).flat(),
  ]) + "\n";
}

export function explainCsvRow(r: ExplainedRow): string {
  const j = r.numbers;
  return (
    csvRow([
      r.line, r.pitcher, r.pitch, j.magnus.armSideIn, j.magnus.upIn, j.residual.armSideIn, j.residual.upIn,
      ...j.matches.flatMap((m) => {
        const ll = vectorToLatLon(m.axis);
        return [ll.latDeg, ll.lonDeg, m.landmark.name, m.seam.armSideIn, m.seam.upIn, m.fitErrorIn];
      }),
    ]) + "\n"
  );
}

// ---- calibrate (a self-contained block, its imports here rather than at the top, for easy merges) ----

import { calibrationNumbers, type CalibrateOutcome } from "../calibrate.js";

const CALIBRATE_RESIDUAL_COLUMNS = [
  "kind", "line", "label",
  "measured_magnus_n", "measured_across_n", "start_magnus_n", "start_across_n", "fitted_magnus_n", "fitted_across_n",
  "measured_arm_in", "measured_up_in", "start_arm_in", "start_up_in", "fitted_arm_in", "fitted_up_in",
];

/** Each row's measured, start and fitted values (newtons for lab rows, inches for tracked ones), in file order. */
export function calibrateResidualsCsv(o: CalibrateOutcome): string {
  const out = [csvRow(CALIBRATE_RESIDUAL_COLUMNS)];
  for (const row of calibrationNumbers(o).rows) {
    const values = [...row.measured, ...row.start, ...row.fitted];
    const blank = ["", "", "", "", "", ""];
    out.push(csvRow([row.kind, row.line, row.label, ...(row.kind === "lab" ? [...values, ...blank] : [...blank, ...values])]));
  }
  return out.join("\n") + "\n";
}
