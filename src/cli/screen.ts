/** `seam-atlas screen`: every spin-axis position for a pitch, the best distinct grips and the classic holds. */
import { join } from "node:path";
import type { Argv } from "yargs";
import { DEG } from "../../geometry/units.js";
import { DEFAULT_FINGER_SPACING_IN } from "../screening/hand.js";
import { screenReport, sphereMapReport, type OrientationReport, type ScreenReport } from "../screening/report.js";
import { DEFAULT_SPREAD_DEG } from "../screening/robustness.js";
import { DEFAULT_GRID_SPACING_DEG, DEFAULT_TOP, RANKS, screenPitch, type RankBy } from "../screening/screen.js";
import { projectRoot, TOOL_NAME, TOOL_VERSION } from "../version.js";
import { InputError } from "./errors.js";
import { formatScore } from "../render/numbers.js";
import { fixed } from "./format.js";
import { parseSamplerSettings, withSamplerOptions } from "./measure.js";
import { parseInteger, parseNumber, assertOneOf } from "./parse.js";
import { pitchesFromFile, pitchFromFlags, selectPitches, type PitchInput } from "./pitchInput.js";
import { writeAtomic } from "./writeAtomic.js";

/** The built-in demo staff. */
export function demoStaffPath(): string {
  return join(projectRoot(), "templates", "demo-staff.json");
}

/** Pitch options shared by screen, card, atlas and flight. */
export function withPitchOptions<T>(y: Argv<T>) {
  return y
    .option("hand", { type: "string", describe: "throwing hand: right or left", requiresArg: true })
    .option("speed", { type: "string", describe: "release speed, mph", requiresArg: true })
    .option("spin", { type: "string", describe: "spin rate, rpm", requiresArg: true })
    .option("tilt", { type: "string", describe: "tilt as a clock reading H:MM (12:00 = pure backspin)", requiresArg: true })
    .option("view", { type: "string", describe: "whose view the clock is read from: pitcher (behind the pitcher) or catcher", requiresArg: true })
    .option("gyro", { type: "string", describe: "gyro angle, deg (positive: the axis's positive end leans toward the plate) [default: 0]", requiresArg: true })
    .option("efficiency", { type: "string", describe: "spin efficiency, percent (instead of --gyro; gyro taken positive)", requiresArg: true })
    .option("want", { type: "string", describe: "wanted direction of the seam push: arm, glove, up, down or any [default: any]", requiresArg: true })
    .option("name", { type: "string", describe: "a label for the pitch", requiresArg: true })
    .option("pitch", { type: "string", describe: "a pitch file (one pitch or a staff; see README)", requiresArg: true })
    .option("pitch-name", { type: "string", describe: "only this pitch of the file: NAME or PITCHER/NAME", requiresArg: true })
    .option("demo", { type: "boolean", default: false, describe: "use the built-in demo staff (templates/demo-staff.json)" });
}

/** The pitches a command works on, from --demo, --pitch or the pitch flags. */
export function pitchesFromArgs(argv: Record<string, unknown>): { team?: string; pitches: PitchInput[] } {
  const flagNames = ["hand", "speed", "spin", "tilt", "view", "gyro", "efficiency", "want", "name"];
  const given = flagNames.filter((k) => argv[k] !== undefined);
  if (argv.demo && argv.pitch !== undefined) throw new InputError(`give --demo or --pitch, not both`);
  const file = argv.demo ? demoStaffPath() : (argv.pitch as string | undefined);
  if (file !== undefined) {
    if (given.length) throw new InputError(`--${given[0]} cannot be combined with ${argv.demo ? "--demo" : "--pitch"}; the file describes the pitches`);
    const pf = pitchesFromFile(file);
    return { team: pf.team, pitches: selectPitches(pf, argv["pitch-name"] as string | undefined, file) };
  }
  if (argv["pitch-name"] !== undefined) throw new InputError(`--pitch-name needs --pitch FILE or --demo`);
  return { pitches: [pitchFromFlags(argv as Record<string, string | undefined>)] };
}

export interface ScreenOptions {
  gridSpacingRad: number;
  spreadRad: number;
  rank: RankBy;
  top: number;
  fingerSpacingIn: number;
}

export function withScreenOptions<T>(y: Argv<T>) {
  return y
    .option("grid", { type: "string", default: String(DEFAULT_GRID_SPACING_DEG), describe: "spacing of the axis-position grid on the ball, deg (0.5 to 10)", requiresArg: true })
    .option("spread", { type: "string", default: String(DEFAULT_SPREAD_DEG), describe: "release scatter of the axis on the ball, deg per direction (0 to 30)", requiresArg: true })
    .option("rank", { type: "string", default: "blend", describe: "rank by strength (score), robust (10th-percentile score) or blend (their mean)", requiresArg: true })
    .option("finger-spacing", { type: "string", default: String(DEFAULT_FINGER_SPACING_IN), describe: "centre-to-centre spacing of the index and middle pads, inches", requiresArg: true });
}

export function parseScreenOptions(argv: Record<string, unknown>, top: number): ScreenOptions {
  const grid = parseNumber("grid", argv.grid, "degrees from 0.5 to 10");
  if (!(grid >= 0.5 && grid <= 10)) throw new InputError(`--grid ${grid} deg is out of range; expected 0.5 to 10 deg`);
  const spread = parseNumber("spread", argv.spread, "degrees from 0 to 30");
  if (!(spread >= 0 && spread <= 30)) throw new InputError(`--spread ${spread} deg is out of range; expected 0 to 30 deg`);
  const rank = assertOneOf("rank", argv.rank, RANKS);
  const finger = parseNumber("finger-spacing", argv["finger-spacing"], "inches above 0 and at most 3");
  if (!(finger > 0 && finger <= 3)) throw new InputError(`--finger-spacing ${finger} in is out of range; expected above 0 and at most 3 in`);
  return { gridSpacingRad: grid * DEG, spreadRad: spread * DEG, rank, top, fingerSpacingIn: finger };
}

/** Screens every pitch and returns the reports (the shared form of JSON, CSV, table and paper). */
export function runScreens(argv: Record<string, unknown>, top: number) {
  const sampler = parseSamplerSettings(argv);
  const opts = parseScreenOptions(argv, top);
  const { team, pitches } = pitchesFromArgs(argv);
  const results = pitches.map((p) => {
    const result = screenPitch(p.pitch, { ...opts, seamShape: sampler.seamShape, seamPoints: sampler.seamPoints, band: sampler.band });
    return { input: p, result, report: screenReport(result, p.echo, sampler.bandCenterDeg, sampler.bandWidthDeg) };
  });
  return { team, results, sampler };
}

export function registerScreen(y: Argv): Argv {
  return y.command(
    "screen",
    "screen every spin-axis position on the ball for a pitch: best distinct grips, robustness, the two- and four-seam holds, finger placement",
    (c) =>
      withScreenOptions(
        withSamplerOptions(
          withPitchOptions(c)
            .option("top", { type: "string", default: String(DEFAULT_TOP), describe: "how many candidates to list (1 to 50)", requiresArg: true })
            .option("json", { type: "boolean", default: false, describe: "print JSON" })
            .option("csv", { type: "boolean", default: false, describe: "print CSV, one row per candidate or reference hold" })
            .option("out", { type: "string", describe: "also write the JSON to this file", requiresArg: true })
            .option("map", { type: "string", describe: "write the full sphere map (JSON) to this file; with several pitches, one file each (NAME.json)", requiresArg: true })
            .example("$0 screen --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --want arm", "a right-hander's sinker")
            .example("$0 screen --demo --csv", "the demo staff as CSV"),
        ),
      ),
    (argv) => runScreen(argv as unknown as Record<string, unknown>),
  );
}

function runScreen(argv: Record<string, unknown>): void {
  if (argv.json && argv.csv) throw new InputError(`give --json or --csv, not both`);
  const top = parseInteger("top", argv.top, "a whole number from 1 to 50");
  if (!(top >= 1 && top <= 50)) throw new InputError(`--top ${top} is out of range; expected 1 to 50`);
  const { team, results } = runScreens(argv, top);
  const reports = results.map((r) => r.report);
  const doc =
    reports.length === 1 && !argv.demo && argv.pitch === undefined
      ? { tool: TOOL_NAME, version: TOOL_VERSION, command: "screen", ...reports[0] }
      : { tool: TOOL_NAME, version: TOOL_VERSION, command: "screen", ...(team ? { team } : {}), pitches: reports };
  const json = JSON.stringify(doc, null, 2) + "\n";
  // build every output before writing any
  const mapFiles: [string, string][] = [];
  if (typeof argv.map === "string") {
    if (results.length === 1) mapFiles.push([argv.map, JSON.stringify(sphereMapReport(results[0].result)) + "\n"]);
    else {
      for (const r of results) {
        const stem = `${r.input.echo.pitcher}-${r.input.echo.name}`.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "");
        mapFiles.push([join(argv.map, `${stem}.json`), JSON.stringify(sphereMapReport(r.result)) + "\n"]);
      }
    }
  }
  if (typeof argv.out === "string") writeAtomic(argv.out, json);
  for (const [path, text] of mapFiles) writeAtomic(path, text);
  if (argv.json) process.stdout.write(json);
  else if (argv.csv) process.stdout.write(screenCsv(reports));
  else {
    if (team) process.stdout.write(`${team}\n\n`);
    process.stdout.write(reports.map(screenTable).join("\n\n") + "\n");
    for (const f of [argv.out, ...mapFiles.map((m) => m[0])]) if (typeof f === "string") process.stdout.write(`wrote ${f}\n`);
  }
}

const CSV_COLUMNS = [
  "pitcher", "pitch", "kind", "rank", "latDeg", "lonDeg", "landmark", "landmarkAngleDeg", "score", "pushClock", "pushArmSide", "pushUp",
  "crossingsPerRevolution", "robustMean", "robustP10", "rankScore", "seamInBand", "alongAxis",
];

function csvCell(v: unknown): string {
  const s = v === null || v === undefined ? "" : String(v);
  return /[",\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function screenCsv(reports: readonly ScreenReport[]): string {
  const rows = [CSV_COLUMNS.join(",")];
  for (const r of reports) {
    const p = r.input.pitch;
    for (const o of [...r.candidates, ...r.references]) {
      rows.push(
        [
          p.pitcher, p.name, o.reference ?? "candidate", o.rank ?? "", o.latLon.latDeg, o.latLon.lonDeg, o.landmark.name, o.landmark.angleDeg, o.score,
          o.push.clock, o.push.armSide, o.push.up, o.crossingsPerRevolution, o.robustness.mean, o.robustness.p10, o.rankScore, o.seamInBand, o.asymmetry.alongAxis,
        ].map(csvCell).join(","),
      );
    }
  }
  return rows.join("\n") + "\n";
}

const WANT_WORDS: Record<string, string> = { arm: "toward the arm side", glove: "toward the glove side", up: "up", down: "down", any: "any direction" };

/** Score and push numbers in the one rounding used on screen and on paper. */
export const fmtScore = formatScore;

function fingerWords(o: OrientationReport): string {
  return o.fingers
    .map((f) => `${f.finger} ${fixed(f.seamDistanceIn, 2)} in from seam (${f.region.part === "seam" ? "on the seam" : f.region.near})`)
    .join("; ");
}

export function screenTable(r: ScreenReport): string {
  const p = r.input.pitch;
  const s = r.input.settings;
  const head =
    `${p.pitcher ? `${p.pitcher}, ` : ""}${p.name} (${p.hand === "right" ? "RHP" : "LHP"}): ${fixed(p.speedMph, 1)} mph, ${fixed(p.spinRpm, 0)} rpm, ` +
    `tilt ${p.tilt} from behind the ${p.view}, gyro ${fixed(p.gyroDeg, 1)} deg (spin efficiency ${fixed(p.efficiencyPct, 1)} %); wanted push: ${WANT_WORDS[p.want]}\n` +
    `  the seam push acts along ${r.pushLine.clock ?? "-"} / its opposite (same view)` +
    (p.want === "any" ? "" : `; at most ${fixed(100 * r.wantReach, 0)} % of it can point ${WANT_WORDS[p.want]}`) +
    `\n  ${r.grid.count.toLocaleString("en-US")} axis positions at ${s.gridSpacingDeg} deg, ${r.maximaFound} distinct maxima; scatter ${s.spreadDeg} deg; ranked by ${s.rank}` +
    `\n  score and push in thousandths of the seam-asymmetry unit (see README)\n`;
  const rows: string[][] = [["", "axis on ball", "nearest landmark", "score", "mean", "p10", "push", "arm side", "up", "crossings"]];
  const add = (label: string, o: OrientationReport) =>
    rows.push([
      label, o.latLon.text, `${o.landmark.name} ${fixed(o.landmark.angleDeg, 0)} deg`, fmtScore(o.score), fmtScore(o.robustness.mean), fmtScore(o.robustness.p10),
      o.push.clock ?? "-", fmtScore(o.push.armSide), fmtScore(o.push.up), String(o.crossingsPerRevolution),
    ]);
  r.candidates.forEach((o) => add(`#${o.rank}`, o));
  r.references.forEach((o) => add(o.reference!, o));
  const widths = rows[0].map((_, c) => Math.max(...rows.map((row) => row[c].length)));
  const lines = rows.map((row) => "  " + row.map((cell, c) => (c >= 3 && c !== 6 ? cell.padStart(widths[c]) : cell.padEnd(widths[c]))).join("  "));
  const fingers = [...r.candidates.map((o) => [`#${o.rank}`, o] as const), ...r.references.map((o) => [o.reference!, o] as const)].map(
    ([label, o]) => `  ${label} fingers: ${fingerWords(o)}`,
  );
  return head + lines.join("\n") + "\n" + fingers.join("\n");
}
