/** Every CSV table the tool writes, built from job results (one row per record, a header first). */
import { vectorToLatLon } from "../../../geometry/ballCoords.js";
import { csvCellText, csvLine } from "../../io/csv.js";
import { rounded } from "../../render/numbers.js";
import type { ScreenReport } from "../../screening/report.js";
import { M_PER_FT } from "../../../geometry/units.js";
import type { ExplainedRow, PitchTypeNumbers } from "../explain.js";
import { calibrationNumbers, type CalibrateOutcome } from "../calibrate.js";

const NEEDS_QUOTES = /[",\r\n]/;

/**
 * One RFC 4180 record without its line end (formula cells neutralised: io/csvWriter.ts).
 * A record none of whose cells needs quotes is the cells joined by commas, the bytes
 * csv-stringify writes for it; only the others go through csv-stringify (a batch writes
 * thousands of rows a second).
 */
const csvRow = (values: readonly unknown[]) => {
  const cells = values.map(csvCellText);
  return cells.some((c) => NEEDS_QUOTES.test(c)) ? csvLine(values).slice(0, -1) : cells.join(",");
};

const SCREEN_COLUMNS = [
  "pitcher", "pitch", "hand", "want", "row", "rank", "lat_deg", "lon_deg", "landmark", "landmark_off_deg",
  "seam_arm_in", "seam_up_in", "seam_clock", "toward_want_in", "robust_mean_in", "robust_p10_in", "rank_score_in",
  "passes_per_turn", "seam_in_band_pct", "coef_across", "coef_along_magnus", "model", "model_hash",
];

/**
 * The screen as CSV: one row per candidate (`row` candidate, with its rank) and per
 * reference hold (`row` four-seam or two-seam), rounded for people as the terminal
 * shows them (inches and degrees to 0.1, coefficients to 0.0001); JSON keeps full precision.
 */
export function screenCsv(reports: readonly ScreenReport[]): string {
  const rows = [csvRow(SCREEN_COLUMNS)];
  for (const r of reports) {
    const p = r.input.pitch;
    for (const o of [...r.candidates, ...r.references]) {
      const m = o.seamMovement;
      rows.push(
        csvRow([
          p.pitcher, p.name, p.hand, p.want, o.reference ?? "candidate", o.rank ?? "", r1(o.latLon.latDeg), r1(o.latLon.lonDeg), o.landmark.name, Math.round(o.landmark.angleDeg),
          r1(m.armSideIn), r1(m.verticalIn), m.clock, r1(o.score), r1(o.robustness.meanIn), r1(o.robustness.p10In), r1(o.rankScore),
          o.crossingsPerRevolution, r1(100 * o.occupancy.seamInBand), rounded(o.seamForce.across, 4), rounded(o.seamForce.alongMagnus, 4), r.input.model.name, r.input.model.hash,
        ]),
      );
    }
  }
  return rows.join("\n") + "\n";
}

/** Rounded for people as render/numbers.ts writes them (0.1 in, 0.1 deg, mph, percent; whole rpm and minutes). */
const r1 = (x: number | null) => (x === null ? "" : rounded(x, 1));
const r0 = (x: number | null) => (x === null ? "" : rounded(x, 0));

/** The batch's CSV header for `top` matches per row (our keys; the inputs echoed first, normalised). */
export function explainCsvHeader(top: number): string {
  return csvRow([
    "line", "pitcher", "pitch", "hand", "speed_mph", "spin_rpm", "tilt", "view", "gyro_deg", "efficiency_pct", "observed_arm_in", "observed_up_in",
    "basis", "window_ft", "predicted_arm_in", "predicted_up_in", "magnus_arm_in", "magnus_up_in", "drag_arm_in", "drag_up_in", "residual_arm_in", "residual_up_in",
    "spin_clock", "observed_clock", "gap_min", "gap_deg", "gap_flag", "reach_in", "beyond_reach",
    ...Array.from({ length: top }, (_, i) => [`match${i + 1}_lat_deg`, `match${i + 1}_lon_deg`, `match${i + 1}_landmark`, `match${i + 1}_seam_arm_in`, `match${i + 1}_seam_up_in`, `match${i + 1}_fit_error_in`]).flat(),
  ]) + "\n";
}

export function explainCsvRow(r: ExplainedRow): string {
  const j = r.numbers;
  const e = r.echo;
  return (
    csvRow([
      r.line, e.pitcher, e.name, e.hand, r1(e.speedMph), r0(e.spinRpm), e.tilt, e.view, r1(e.gyroDeg), r1(e.efficiencyPct), r1(r.moveArmIn), r1(r.moveUpIn),
      j.basis, j.windowFt === null ? "" : r1(j.windowFt), r1(j.predicted.armSideIn), r1(j.predicted.upIn), r1(j.magnus.armSideIn), r1(j.magnus.upIn),
      r1(j.drag.armSideIn), r1(j.drag.upIn), r1(j.residual.armSideIn), r1(j.residual.upIn),
      j.direction.spinBased ?? "", j.direction.observed ?? "", r0(j.direction.gapMinutes), r1(j.direction.gapDeg), j.direction.flagged ? "yes" : "no",
      r1(j.reach.alongResidualIn), j.reach.beyondReach ? "yes" : "no",
      ...j.matches.flatMap((m) => {
        const ll = vectorToLatLon(m.axis);
        return [r1(ll.latDeg), r1(ll.lonDeg), m.landmark.name, r1(m.seam.armSideIn), r1(m.seam.upIn), r1(m.fitErrorIn)];
      }),
    ]) + "\n"
  );
}

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

/** The per-pitch-type summary as CSV: one row per pitch type and orientation (best first). */
export function explainSummaryCsv(settings: { basis: string; windowStartM: number }, pitchTypes: readonly PitchTypeNumbers[]): string {
  const rows = [
    csvRow([
      "pitcher", "pitch", "hand", "rows", "basis", "window_ft", "rank", "lat_deg", "lon_deg", "landmark", "fit_error_in", "seam_arm_in", "seam_up_in",
      "residual_arm_in", "residual_up_in", "residual_sd_arm_in", "residual_sd_up_in", "reach_in", "beyond_reach",
    ]),
  ];
  const windowFt = settings.basis === "trade" ? r1(settings.windowStartM / M_PER_FT) : "";
  for (const p of pitchTypes) {
    const common = [r1(p.residual.armSideIn), r1(p.residual.verticalIn), r1(p.residual.sdArmSideIn), r1(p.residual.sdVerticalIn), r1(p.reach.alongResidualIn), p.reach.beyondReach ? "yes" : "no"];
    for (const o of p.orientations) {
      const ll = vectorToLatLon(o.axis);
      rows.push(csvRow([p.pitcher, p.pitch, p.hand, p.rows, settings.basis, windowFt, o.rank, r1(ll.latDeg), r1(ll.lonDeg), o.landmark.name, r1(o.fitErrorIn), r1(o.seam.armSideIn), r1(o.seam.upIn), ...common]));
    }
  }
  return rows.join("\n") + "\n";
}
