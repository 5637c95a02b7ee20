/** `seam-atlas measure`: the band numbers for one orientation, or for the demo's orientations. */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { Argv } from "yargs";
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { findLandmarks, nearestLandmark } from "../../geometry/landmarks.js";
import { assertSeamShape, DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { assertSeamPointCount, DEFAULT_SEAM_POINTS } from "../../geometry/seamSamples.js";
import { DEG } from "../../geometry/units.js";
import { bandFromDegrees, DEFAULT_BAND_CENTER_DEG, DEFAULT_BAND_WIDTH_DEG, type Band } from "../sampling/band.js";
import { measureOrientation, type Measurement } from "../sampling/measure.js";
import { projectRoot, TOOL_NAME, TOOL_VERSION } from "../version.js";
import { InputError } from "./errors.js";
import { fixed, percent, signed, sparkline, table } from "./format.js";
import { parseAxis, parseDegrees, parseInteger, parseNumber, type ParsedAxis } from "./parse.js";
import { writeAtomic } from "./writeAtomic.js";

interface MeasureArgs {
  axis?: string;
  gyro: string;
  "seam-shape"?: string;
  "band-center": string;
  "band-width": string;
  "seam-points": string;
  json: boolean;
  out?: string;
  demo: boolean;
}

/** Options shared by every command that measures orientations. */
export function withSamplerOptions<T>(y: Argv<T>) {
  return y
    .option("seam-shape", { type: "string", describe: `seam shape b of the curve, 0 < b < 0.5 [default: ${DEFAULT_SEAM_SHAPE.toFixed(6)}, fitted to a published cover's waist]`, requiresArg: true })
    .option("band-center", { type: "string", default: String(DEFAULT_BAND_CENTER_DEG), describe: "separation band centre, deg from the front stagnation point", requiresArg: true })
    .option("band-width", { type: "string", default: String(DEFAULT_BAND_WIDTH_DEG), describe: "separation band width, deg", requiresArg: true })
    .option("seam-points", { type: "string", default: String(DEFAULT_SEAM_POINTS), describe: "seam samples, a multiple of 4 from 64 to 262144", requiresArg: true });
}

export interface SamplerSettings {
  seamShape: number;
  band: Band;
  bandCenterDeg: number;
  bandWidthDeg: number;
  seamPoints: number;
}

export function parseSamplerSettings(argv: Record<string, unknown>): SamplerSettings {
  const seamShape =
    argv["seam-shape"] === undefined ? DEFAULT_SEAM_SHAPE : parseNumber("seam-shape", argv["seam-shape"], "a seam shape b strictly between 0 and 0.5");
  try {
    assertSeamShape(seamShape);
  } catch (err) {
    throw new InputError(`--seam-shape: ${(err as Error).message}`);
  }
  const bandCenterDeg = parseNumber("band-center", argv["band-center"], "degrees from the stagnation point");
  const bandWidthDeg = parseNumber("band-width", argv["band-width"], "a positive number of degrees");
  let band: Band;
  try {
    band = bandFromDegrees(bandCenterDeg, bandWidthDeg);
  } catch (err) {
    throw new InputError(`--band-center/--band-width: ${(err as Error).message}`);
  }
  const seamPoints = parseInteger("seam-points", argv["seam-points"], "a multiple of 4 from 64 to 262144");
  try {
    assertSeamPointCount(seamPoints);
  } catch (err) {
    throw new InputError(`--seam-points: ${(err as Error).message}`);
  }
  return { seamShape, band, bandCenterDeg, bandWidthDeg, seamPoints };
}

export function registerMeasure(y: Argv): Argv {
  return y.command(
    "measure",
    "turn-averaged seam share in the separation band, sides and asymmetry for one spin-axis position",
    (c) =>
      withSamplerOptions(
        c
          .option("axis", { type: "string", describe: "spin axis's positive end on the ball: X,Y,Z, a landmark name (see `landmarks`), or 12.5N,45E", requiresArg: true })
          .option("gyro", { type: "string", default: "0", describe: "gyro angle, deg, strictly between -90 and 90 (positive: axis end leans toward the flight)", requiresArg: true })
          .option("json", { type: "boolean", default: false, describe: "print JSON instead of the table" })
          .option("out", { type: "string", describe: "also write the JSON to this file (written whole or not at all)", requiresArg: true })
          .option("demo", { type: "boolean", default: false, describe: "measure the built-in demo's orientations (templates/demo.json)" })
          .example("$0 measure --axis waist-A", "the four-seam axis: 4 crossings, no asymmetry")
          .example("$0 measure --axis 20N,30E --gyro 15 --json", "one orientation as JSON")
          .example("$0 measure --demo --out out/demo-measure.json", "the demo's orientations"),
      ),
    (argv) => runMeasure(argv as unknown as MeasureArgs),
  );
}

interface DemoOrientation {
  name: string;
  pitcher: string;
  note: string;
  axis: string;
  gyroDeg: number;
}

function loadDemoOrientations(): { scenario: string; orientations: DemoOrientation[] } {
  const path = join(projectRoot(), "templates", "demo.json");
  const demo = JSON.parse(readFileSync(path, "utf8")) as { scenario: string; orientations: DemoOrientation[] };
  return demo;
}

function runMeasure(argv: MeasureArgs): void {
  const settings = parseSamplerSettings(argv as unknown as Record<string, unknown>);
  const jobs: { label?: string; note?: string; axis: ParsedAxis; gyroDeg: number; gyroRad: number }[] = [];
  let scenario: string | undefined;
  if (argv.demo) {
    if (argv.axis !== undefined) throw new InputError(`--demo measures the demo's own axes; leave out --axis "${argv.axis}"`);
    const demo = loadDemoOrientations();
    scenario = demo.scenario;
    for (const o of demo.orientations) {
      jobs.push({ label: `${o.name} (${o.pitcher})`, note: o.note, axis: parseAxis("axis", o.axis, settings.seamShape), gyroDeg: o.gyroDeg, gyroRad: o.gyroDeg * DEG });
    }
  } else {
    if (argv.axis === undefined) throw new InputError(`--axis is missing; expected X,Y,Z, a landmark name such as waist-A, or 12.5N,45E (or use --demo)`);
    const axis = parseAxis("axis", argv.axis, settings.seamShape);
    const gyroRad = parseDegrees("gyro", argv.gyro, -90, 90);
    jobs.push({ axis, gyroDeg: gyroRad / DEG, gyroRad });
  }
  const landmarks = findLandmarks(settings.seamShape);
  const results = jobs.map((job) => {
    const m = measureOrientation(
      { axis: job.axis.vector, gyroRad: job.gyroRad },
      { band: settings.band, seamShape: settings.seamShape, seamPoints: settings.seamPoints },
    );
    const near = nearestLandmark(landmarks, m.axis);
    return { job, m, near };
  });
  const records = results.map(({ job, m, near }) => ({
    ...(job.label ? { name: job.label } : {}),
    input: {
      axis: job.axis.given,
      gyroDeg: job.gyroDeg,
      seamShape: settings.seamShape,
      bandCenterDeg: settings.bandCenterDeg,
      bandWidthDeg: settings.bandWidthDeg,
      seamPoints: settings.seamPoints,
    },
    ...measurementJson(m, near.landmark.name, near.angleRad / DEG),
  }));
  const doc = argv.demo
    ? { tool: TOOL_NAME, version: TOOL_VERSION, command: "measure", scenario, orientations: records }
    : { tool: TOOL_NAME, version: TOOL_VERSION, command: "measure", ...records[0] };
  const json = JSON.stringify(doc, null, 2) + "\n";
  if (argv.out) writeAtomic(argv.out, json);
  if (argv.json) {
    process.stdout.write(json);
    return;
  }
  const blocks = results.map(({ job, m, near }) => humanReport(job.label, job.note, job.axis, job.gyroDeg, settings, m, near.landmark.name, near.angleRad / DEG));
  if (scenario) process.stdout.write(`${scenario}\n\n`);
  process.stdout.write(blocks.join("\n\n") + "\n");
  if (argv.out) process.stdout.write(`\nwrote ${argv.out}\n`);
}

/** The JSON form of a measurement (the keys scripts rely on; see README). */
export function measurementJson(m: Measurement, landmark: string, landmarkAngleDeg: number) {
  const ll = vectorToLatLon(m.axis);
  return {
    axis: m.axis,
    latLon: { latDeg: ll.latDeg, lonDeg: ll.lonDeg, text: formatLatLon(ll) },
    landmark: { name: landmark, angleDeg: landmarkAngleDeg },
    seamInBand: m.seamInBand,
    sides: { axisPlus: m.axisPlus, axisMinus: m.axisMinus, magnusPlus: m.magnusPlus, magnusMinus: m.magnusMinus },
    asymmetry: { alongAxis: m.alongAxis, alongMagnus: m.alongMagnus, magnitude: m.magnitude },
    crossingsPerRevolution: m.crossingsPerRevolution,
    timeline: m.timeline
      ? { phaseStepDeg: 1, phaseZero: "stagnation point nearest the +z pole (waist-A)", axisPlus: Array.from(m.timeline.axisPlus), axisMinus: Array.from(m.timeline.axisMinus) }
      : undefined,
  };
}

function humanReport(
  label: string | undefined,
  note: string | undefined,
  axis: ParsedAxis,
  gyroDeg: number,
  s: SamplerSettings,
  m: Measurement,
  landmark: string,
  landmarkAngleDeg: number,
): string {
  const ll = formatLatLon(vectorToLatLon(m.axis));
  const head = label ? `${label}\n${note ? `  ${note}\n` : ""}` : "";
  const rows: [string, string][] = [
    ["spin axis (ball frame)", `${m.axis.map((v) => fixed(v, 4)).join(", ")}   ${ll}   given as ${axis.given}`],
    ["nearest landmark", `${landmark}, ${landmarkAngleDeg.toFixed(1)} deg away`],
    ["gyro", `${gyroDeg.toFixed(1)} deg   (spin efficiency ${(100 * Math.cos(gyroDeg * DEG)).toFixed(1)} %)`],
    ["separation band", `${(s.bandCenterDeg - s.bandWidthDeg / 2).toFixed(1)} to ${(s.bandCenterDeg + s.bandWidthDeg / 2).toFixed(1)} deg from the stagnation point`],
    ["seam", `shape b = ${s.seamShape.toFixed(4)}, ${s.seamPoints} points`],
    ["seam in band, turn average", percent(m.seamInBand)],
    ["  axis side +  /  -", `${percent(m.axisPlus)}  /  ${percent(m.axisMinus)}`],
    ["  Magnus side +  /  -", `${percent(m.magnusPlus)}  /  ${percent(m.magnusMinus)}`],
    ["asymmetry along axis", `${signed(m.alongAxis)}   (+ pushes toward the axis's positive end)`],
    ["asymmetry along Magnus", signed(m.alongMagnus)],
    ["asymmetry magnitude", fixed(m.magnitude, 5)],
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
}
