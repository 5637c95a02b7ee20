/**
 * What the terminal shows: tables and compact plots built from job results, with
 * numbers written by the shared rules of src/render/numbers.ts (as on paper).
 */
import { reachWords } from "../../render/paper/words.js";
import { formatLatLon, vectorToLatLon } from "../../../geometry/ballCoords.js";
import { DEG } from "../../../geometry/units.js";
import { fixed, formatMovementIn, percent, signed } from "../../render/numbers.js";
import type { OrientationReport, ScreenReport } from "../../screening/report.js";
import type { ExplainOneJob, ExplanationNumbers } from "../explain.js";
import { flightNumbers, type FlightOutcome } from "../flight.js";
import type { ForceResult } from "../force.js";
import type { LandmarksResult } from "../landmarks.js";
import type { MeasureResult } from "../measure.js";
import { calibrationNumbers, type CalibrateOutcome } from "../calibrate.js";

const BARS = " ▁▂▃▄▅▆▇█";

/** The mean of `values` in each of `columns` equal bins (a series squeezed to the width of a line). */
function binMeans(values: ArrayLike<number>, columns: number): number[] {
  const n = values.length;
  const out: number[] = [];
  for (let c = 0; c < columns; c++) {
    const i0 = Math.floor((c * n) / columns);
    const i1 = Math.max(i0 + 1, Math.floor(((c + 1) * n) / columns));
    let sum = 0;
    for (let i = i0; i < i1; i++) sum += values[i];
    out.push(sum / (i1 - i0));
  }
  return out;
}

/** The bar character for |value| on a scale of max. */
function bar(value: number, max: number): string {
  const level = max > 0 ? Math.round((Math.abs(value) / max) * (BARS.length - 1)) : 0;
  return BARS[Math.max(0, Math.min(BARS.length - 1, level))];
}

/** One row of bar characters for values in [0, max], averaged over `columns` equal bins. */
function sparkline(values: ArrayLike<number>, max: number, columns: number): string {
  return binMeans(values, columns).map((v) => bar(v, max)).join("");
}

/** Left-aligned two-column table with a fixed label width. */
function table(rows: readonly (readonly [string, string])[], indent = "  "): string {
  const width = Math.max(...rows.map((r) => r[0].length));
  return rows.map(([k, v]) => `${indent}${k.padEnd(width)}  ${v}`).join("\n");
}

export function measureText(r: MeasureResult): string {
  const s = r.job.settings;
  const blocks = r.measured.map(({ item, measurement: m, landmark }) => {
    const ll = formatLatLon(vectorToLatLon(m.axis));
    const head = item.label ? `${item.label}\n${item.note ? `  ${item.note}\n` : ""}` : "";
    const rows: [string, string][] = [
      ["spin axis (ball frame)", `${m.axis.map((v) => fixed(v, 4)).join(", ")}   ${ll}   given as ${item.axis.given}`],
      ["nearest landmark", `${landmark.name}, ${landmark.angleDeg.toFixed(1)} deg away`],
      ["gyro", `${item.gyroDeg.toFixed(1)} deg   (spin efficiency ${(100 * Math.cos(item.gyroDeg * DEG)).toFixed(1)} %)`],
      ["separation band", `${(s.bandCenterDeg - s.bandWidthDeg / 2).toFixed(1)} to ${(s.bandCenterDeg + s.bandWidthDeg / 2).toFixed(1)} deg from the stagnation point`],
      ["seam", `shape b = ${s.seamShape.toFixed(4)}, ${s.seamPoints} points`],
      ["seam in band, turn average", percent(m.seamInBand)],
      ["  axis side +  /  -", `${percent(m.axisPlus)}  /  ${percent(m.axisMinus)}`],
      ["  Magnus side +  /  -", `${percent(m.magnusPlus)}  /  ${percent(m.magnusMinus)}`],
      ["occupancy lever, axis", `${signed(m.alongAxis)}   (seam occupancy's side, not the push: see force or screen)`],
      ["occupancy lever, Magnus", signed(m.alongMagnus)],
      ["occupancy lever size", fixed(m.magnitude, 5)],
      ["crossings per revolution", String(m.crossingsPerRevolution)],
    ];
    let plot = "";
    if (m.timeline) {
      const max = Math.max(...m.timeline.axisPlus, ...m.timeline.axisMinus, 1e-9);
      plot =
        `\n\n  in-band seam share through one turn (0 to 360 deg, 5 deg a column; full bar = ${percent(max, 1)}):\n` +
        `    axis side +  |${sparkline(m.timeline.axisPlus, max, 72)}|\n` +
        `    axis side -  |${sparkline(m.timeline.axisMinus, max, 72)}|`;
    }
    return head + table(rows) + plot;
  });
  return (r.job.scenario ? `${r.job.scenario}\n\n` : "") + blocks.join("\n\n") + "\n";
}

const KIND_WORDS = { tip: "horseshoe tip", waist: "waist middle", lobe: "lobe centre", node: "seam on the equator" } as const;

export function landmarksText(r: LandmarksResult): string {
  const lines = [`landmarks of the seam with shape b = ${r.seamShape.toFixed(6)} (ball frame; seam distance along the surface)`];
  for (const l of r.landmarks) {
    const dir = l.direction.map((v) => fixed(v, 4).padStart(7)).join(" ");
    lines.push(`  ${l.name.padEnd(8)} ${KIND_WORDS[l.kind].padEnd(19)} ${dir}   ${l.latLon.padEnd(14)} ${l.seamDistanceDeg.toFixed(1).padStart(5)} deg  ${l.seamDistanceIn.toFixed(2)} in`);
  }
  return lines.join("\n") + "\n";
}

const WANT_WORDS: Record<string, string> = { arm: "toward the arm side", glove: "toward the glove side", up: "up", down: "down", any: "any direction" };

function fingerWords(o: OrientationReport): string {
  return o.fingers
    .map((f) => `${f.finger} ${fixed(f.seamDistanceIn, 2)} in from seam (${f.region.part === "seam" ? "on the seam" : f.region.near})`)
    .join("; ");
}

function screenTable(r: ScreenReport): string {
  const p = r.input.pitch;
  const s = r.input.settings;
  const reach =
    p.want === "any"
      ? ""
      : r.reach.outOfReach
        ? `\n  ${reachWords(r)}`
        : `\n  toward ${WANT_WORDS[p.want].replace("toward ", "")}: at best ${fixed(r.reach.bestTowardIn, 1)} in, ${fixed(r.reach.wantPct, 0)} % of the strongest seam movement (${fixed(r.reach.strongestIn, 1)} in)`;
  const head =
    `${p.pitcher ? `${p.pitcher}, ` : ""}${p.name} (${p.hand === "right" ? "RHP" : "LHP"}): ${fixed(p.speedMph, 1)} mph, ${fixed(p.spinRpm, 0)} rpm, ` +
    `tilt ${p.tilt} from behind the ${p.view}, gyro ${signed(p.gyroDeg, 1)} deg (spin efficiency ${fixed(p.efficiencyPct, 1)} %); wanted push: ${WANT_WORDS[p.want]}` +
    reach +
    `\n  ${r.grid.count.toLocaleString("en-US")} axis positions at ${s.gridSpacingDeg} deg, ${r.maximaFound} distinct maxima; scatter ${s.spreadDeg} deg; ranked by ${s.rank}; model ${r.input.model.name} (${r.input.model.hash})` +
    `\n  seam movement at the plate in inches, the trade's reading over the last ${fixed(r.input.windowFt, 0)} ft (arm side, up, and its clock direction)\n`;
  const rows: string[][] = [["", "axis on ball", "nearest landmark", "arm side", "up", "toward", "score", "mean", "p10", "passes"]];
  const add = (label: string, o: OrientationReport) =>
    rows.push([
      label, o.latLon.text, `${o.landmark.name} ${fixed(o.landmark.angleDeg, 0)} deg`, formatMovementIn(o.seamMovement.armSideIn), formatMovementIn(o.seamMovement.verticalIn),
      o.seamMovement.clock ?? "-", formatMovementIn(o.score), formatMovementIn(o.robustness.meanIn), formatMovementIn(o.robustness.p10In), String(o.crossingsPerRevolution),
    ]);
  if (!r.reach.outOfReach) r.candidates.forEach((o) => add(`#${o.rank}`, o));
  r.references.forEach((o) => add(o.reference!, o));
  const widths = rows[0].map((_, c) => Math.max(...rows.map((row) => row[c].length)));
  const lines = rows.map((row) => "  " + row.map((cell, c) => (c >= 3 && c !== 5 ? cell.padStart(widths[c]) : cell.padEnd(widths[c]))).join("  "));
  const listed = [...(r.reach.outOfReach ? [] : r.candidates.map((o) => [`#${o.rank}`, o] as const)), ...r.references.map((o) => [o.reference!, o] as const)];
  const fingers = listed.map(([label, o]) => `  ${label} fingers: ${fingerWords(o)}`);
  return head + lines.join("\n") + "\n" + fingers.join("\n");
}

export function screenText(team: string | undefined, reports: readonly ScreenReport[]): string {
  return (team ? `${team}\n\n` : "") + reports.map(screenTable).join("\n\n") + "\n";
}

export function flightText(o: FlightOutcome): string {
  const echo = o.job.echo;
  const d = flightNumbers(o);
  const t = d.movement.trade;
  const fr = d.movement.fromRelease;
  const sp = d.movement.seamSpread;
  // the catcher's right is the plate's +x; the arm side is the catcher's left for a right-hander
  const side = (xIn: number, unit: string) => `${fixed(Math.abs(xIn), unit === "deg" ? 2 : 1)} ${unit} ${xIn < 0 ? "left" : "right"}`;
  const armSign = echo.hand === "left" ? 1 : -1;
  const armRange = (r: { p10In: number; p90In: number }) => (armSign > 0 ? [r.p10In, r.p90In] : [-r.p90In, -r.p10In]);
  const seamMode =
    d.seam.mode === "turn-average"
      ? `turn-averaged (${fixed(d.seam.turnsToPlate, 1)} turns to the plate)`
      : `time-resolved from release phase ${fixed(d.seam.phaseDeg ?? 0, 0)} deg (${fixed(d.seam.turnsToPlate, 1)} turns to the plate)`;
  const lines: [string, string][] = [
    ["pitch", `${echo.pitcher ? `${echo.pitcher}, ` : ""}${echo.name}: ${fixed(echo.speedMph, 1)} mph, ${fixed(echo.spinRpm, 0)} rpm, tilt ${echo.tilt} (${echo.view}), gyro ${signed(echo.gyroDeg, 1)} deg`],
    ["seam orientation", `${d.axis.latLon} (${o.job.axisGiven})`],
    ["seam model", `${o.job.model.profile.name} (${o.job.model.profile.hash}), ${seamMode}`],
    ["air", o.job.airMode === "none" ? "none (vacuum)" : `${fixed(d.air.densityKgM3, 4)} kg/m^3, Re ${fixed(d.air.reynolds / 1e5, 2)}e5, spin factor ${fixed(d.air.spinFactor, 3)}`],
    [
      "launch",
      `${fixed(Math.abs(d.launch.verticalDeg), 2)} deg ${d.launch.verticalDeg < 0 ? "down" : "up"}, ${side(d.launch.horizontalDeg, "deg")} as the catcher sees it` +
        (d.launch.aimed ? `; aimed at the middle of the zone${d.seam.mode === "turn-average" ? "" : " with the turn-averaged seam force (the force at this phase moves the ball off it)"}` : ""),
    ],
    ["time to plate", `${fixed(d.timeToPlateS, 3)} s`],
    ["at the plate", `${side(d.plate.xIn, "in")} of centre as the catcher sees it, ${fixed(d.plate.zIn, 1)} in high`],
    ["approach", `${fixed(d.approach.verticalDeg, 2)} deg vertical, ${fixed(d.approach.horizontalDeg, 2)} deg horizontal`],
    [`movement (last ${fixed(t.windowFt, 0)} ft)`, `${formatMovementIn(t.inducedVerticalBreakIn)} in induced vertical break, ${formatMovementIn(t.horizontalBreakIn)} in horizontal break (${formatMovementIn(t.armSideIn)} in arm side)`],
    ["  Magnus part", `${formatMovementIn(t.magnus.inducedVerticalBreakIn)} in up, ${formatMovementIn(t.magnus.armSideIn)} in arm side`],
    ["  seam part", `${formatMovementIn(t.seam.inducedVerticalBreakIn)} in up, ${formatMovementIn(t.seam.armSideIn)} in arm side, toward ${t.seam.clock ?? "-"} (${echo.view}'s view)`],
    ...(sp
      ? ([["  seam, by release phase", `${formatMovementIn(sp.inducedVerticalBreak.p10In)} to ${formatMovementIn(sp.inducedVerticalBreak.p90In)} in up, ${armRange(sp.horizontalBreak).map(formatMovementIn).join(" to ")} in arm side (10th to 90th percentile of ${sp.releasePhases} phases)`]] as [string, string][])
      : []),
    ["  drag's own part", `${formatMovementIn(t.drag.inducedVerticalBreakIn)} in up, ${formatMovementIn(t.drag.armSideIn)} in arm side`],
    ["from release", `${formatMovementIn(fr.armSideIn)} in arm side, ${formatMovementIn(fr.verticalIn)} in up against the spinless flight (seam part ${formatMovementIn(fr.seam.armSideIn)} / ${formatMovementIn(fr.seam.verticalIn)})`],
  ];
  return table(lines) + "\n";
}

export function explainText(job: ExplainOneJob, n: ExplanationNumbers): string {
  const e = job.echo;
  const basis = n.basis === "trade" ? `trade basis: induced vertical break and horizontal break over the last ${fixed(n.windowFt ?? 0, 0)} ft` : "release basis: at the plate against the spinless flight";
  const d = n.direction;
  const gap =
    d.gapMinutes === null
      ? "-"
      : `${signed(d.gapMinutes, 0)} min (${signed(d.gapDeg ?? 0, 1)} deg)${d.flagged ? `: more than ${fixed(job.settings.gapFlagMinutes, 0)} min, a sign of seam effects` : ""}`;
  const lines = [
    `  pitch          ${e.pitcher ? `${e.pitcher}, ` : ""}${e.name}: ${e.hand}, ${fixed(e.speedMph, 1)} mph, ${fixed(e.spinRpm, 0)} rpm, tilt ${e.tilt} (${e.view}'s view), gyro ${signed(e.gyroDeg, 1)} deg`,
    `  movement       ${basis}`,
    `  observed       ${formatMovementIn(job.moveArmIn)} in arm side, ${formatMovementIn(job.moveUpIn)} in up (gravity removed)`,
    `  spin predicts  ${formatMovementIn(n.predicted.armSideIn)} in arm side, ${formatMovementIn(n.predicted.upIn)} in up` +
      (n.basis === "trade" ? ` (Magnus ${formatMovementIn(n.magnus.armSideIn)} / ${formatMovementIn(n.magnus.upIn)}, drag's own ${formatMovementIn(n.drag.armSideIn)} / ${formatMovementIn(n.drag.upIn)})` : " (Magnus)"),
    `  left over      ${formatMovementIn(n.residual.armSideIn)} in arm side, ${formatMovementIn(n.residual.upIn)} in up` +
      (n.reach.beyondReach ? `: beyond what any seam orientation reaches (at most ${fixed(n.reach.alongResidualIn, 1)} in that way)` : ""),
    `  direction      spin-based ${d.spinBased ?? "-"}, observed ${d.observed ?? "-"} (${e.view}'s view); gap ${gap}`,
    `  seam orientations that would give it (best first):`,
    ...n.matches.map(
      (m) =>
        `    #${m.rank}  ${m.latLon.padEnd(14)} near ${m.landmark.name} (${fixed(m.landmark.angleDeg, 0)} deg): seam ${formatMovementIn(m.seam.armSideIn)} in arm side, ${formatMovementIn(m.seam.upIn)} in up; misses by ${fixed(m.fitErrorIn, 1)} in`,
    ),
  ];
  return lines.join("\n") + "\n";
}

/** A signed series as two rows of characters: bars for positive values, and below them for negative ones. */
function signedPlot(values: ArrayLike<number>, max: number, columns: number): [string, string] {
  const means = binMeans(values, columns);
  return [means.map((v) => (v > 0 ? bar(v, max) : " ")).join(""), means.map((v) => (v < 0 ? bar(v, max) : " ")).join("")];
}

export function forceText(r: ForceResult): string {
  const j = r.job;
  const t = r.timeline;
  const k = r.dynamicForceN;
  const n = (c: number) => `${signed(c * k, 3)} N`;
  const max = Math.max(...Array.from(t.across, Math.abs), ...Array.from(t.alongMagnus, Math.abs), 1e-12);
  const [au, ad] = signedPlot(t.across, max, 72);
  const [mu, md] = signedPlot(t.alongMagnus, max, 72);
  const rows: [string, string][] = [
    ["seam orientation", `${formatLatLon(vectorToLatLon(j.axisBall))} (given as ${j.axis.given}), gyro ${signed(j.gyroRad / DEG, 1)} deg`],
    ["air and speed", `${fixed(j.air.densityKgM3, 4)} kg/m^3, ${fixed(j.speedMph, 1)} mph: ${fixed(k, 3)} N per unit coefficient`],
    ["seam model", `${j.model.profile.name} (${j.model.profile.hash})`],
    ["turn average", `${n(r.turnAverage.across)} across, ${n(r.turnAverage.alongMagnus)} along Magnus`],
    ["largest in the turn", `${fixed(max * k, 3)} N`],
    ...(r.magnusN > 0 ? ([["Magnus at this spin", `${fixed(r.magnusN, 3)} N (${fixed(j.spinRpm, 0)} rpm)`]] as [string, string][]) : []),
  ];
  return (
    table(rows) +
    `\n\n  instantaneous side force through one turn (0 to 360 deg, 5 deg a column; full bar = ${fixed(max * k, 3)} N):\n` +
    `    across        + |${au}|\n                  - |${ad}|\n` +
    `    along Magnus  + |${mu}|\n                  - |${md}|\n`
  );
}

/** The calibration as a short table: parameters, rms before and after, what the data cannot pin down. */
export function calibrateText(o: CalibrateOutcome): string {
  const r = o.result;
  const rows = r.rows;
  const value = (x: number, unit: string) => (unit === "deg" ? fixed(x, 2) : fixed(x, 4));
  const sigma = (x: number | undefined, unit: string) => (x === undefined ? "-" : x >= 1000 ? x.toExponential(1) : unit === "deg" ? fixed(x, 2) : fixed(x, 4));
  const plural = (k: number, word: string) => `${k} ${word}${k === 1 ? "" : "s"}`;
  const width = Math.max(...r.parameters.map((p) => p.name.length), 9);
  const kinds = [
    ...(rows.lab ? [`${rows.lab} lab (${rows.labTurnAveraged} turn-averaged)`] : []),
    ...(rows.tracked ? [`${rows.tracked} tracked`] : []),
  ].join(", ");
  const lines = [
    `profile "${r.profile.name}" (${r.profile.hash}) fitted from "${r.start.name}" (${r.start.hash}) to ${plural(rows.lab + rows.tracked, "row")}: ${kinds}${o.rows.skipped ? `; ${plural(o.rows.skipped, "bad row")} skipped` : ""}`,
    "",
    `  ${"parameter".padEnd(width)}  ${"start".padStart(9)}  ${"fitted".padStart(9)}  ${"1 sigma".padStart(8)}  unit`,
    ...r.parameters.map(
      (p) =>
        `  ${p.name.padEnd(width)}  ${value(p.start, p.unit).padStart(9)}  ${value(p.value, p.unit).padStart(9)}  ${sigma(p.uncertainty, p.unit).padStart(8)}  ${p.unit}${p.atBound !== undefined ? "   at a limit" : ""}`,
    ),
    "",
  ];
  const numbers = calibrationNumbers(o);
  if (numbers.rmsBeforeN !== undefined) lines.push(`  rms force        ${fixed(numbers.rmsBeforeN, 4)} N before, ${fixed(numbers.rmsAfterN!, 4)} N after (sigma ${o.job.sigmaN} N)`);
  if (numbers.rmsBeforeIn !== undefined) lines.push(`  rms movement     ${fixed(numbers.rmsBeforeIn, 2)} in before, ${fixed(numbers.rmsAfterIn!, 2)} in after (sigma ${o.job.sigmaIn} in)`);
  const m = r.method;
  lines.push(
    `  search           ${m.search}${m.search === "closed form" ? "" : `, ${m.iterations} iterations, ${m.converged ? `stopped: ${m.stopReason}` : "NOT converged (iteration cap)"}`}; residual variance ${fixed(m.residualVariance, 3)} (about 1 when the sigmas match the scatter)`,
    `  uncertainties    1 sigma from the Gauss-Newton covariance s^2 (J^T J)^-1 at the optimum`,
  );
  if (r.notIdentified.length) {
    lines.push("", "  not pinned down by these data:");
    for (const n of r.notIdentified) lines.push(`    ${n.name}: ${n.reason}`);
  }
  return lines.join("\n") + "\n";
}
