/**
 * The measure job: the sampler's band occupancy for one spin-axis position, or for
 * the demo's orientations (templates/demo.json). These are seam occupancy numbers
 * (how much seam sits in the separation band through a turn), not the push.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { findLandmarks, nearestLandmark } from "../../geometry/landmarks.js";
import { DEG } from "../../geometry/units.js";
import { InputError } from "../io/errors.js";
import { parseStrictJson } from "../io/json.js";
import { quote } from "../io/quote.js";
import { measureOrientation, type Measurement } from "../sampling/measure.js";
import { projectRoot } from "../version.js";
import { modelChoice } from "./request/model.js";
import { samplerSettings, type SamplerSettings } from "./request/settings.js";
import { parseAxis, parseDegrees, type ParsedAxis, type Request } from "./request/values.js";

export interface MeasureItem {
  readonly label?: string;
  readonly note?: string;
  readonly axis: ParsedAxis;
  readonly gyroDeg: number;
  readonly gyroRad: number;
}

export interface MeasureJob {
  readonly settings: SamplerSettings;
  readonly items: readonly MeasureItem[];
  /** The demo's scenario line, for --demo. */
  readonly scenario?: string;
}

export interface MeasuredItem {
  readonly item: MeasureItem;
  readonly measurement: Measurement;
  readonly landmark: { readonly name: string; readonly angleDeg: number };
}

export interface MeasureResult {
  readonly job: MeasureJob;
  readonly measured: readonly MeasuredItem[];
}

interface DemoOrientation {
  name: string;
  pitcher: string;
  note: string;
  axis: string;
  gyroDeg: number;
}

export function parseMeasure(request: Request): MeasureJob {
  const settings = samplerSettings(request, modelChoice(request).profile);
  if (request.demo) {
    if (request.axis !== undefined) throw new InputError(`--demo measures the demo's own axes; leave out --axis ${quote(String(request.axis))}`);
    if (request.gyro !== undefined) throw new InputError(`--demo measures the demo's own gyro angles; leave out --gyro ${quote(String(request.gyro))}`);
    const file = join(projectRoot(), "templates", "demo.json");
    const demo = parseStrictJson(readFileSync(file), quote(file)).value as { scenario: string; orientations: DemoOrientation[] };
    const items = demo.orientations.map((o) => ({
      label: `${o.name} (${o.pitcher})`,
      note: o.note,
      axis: parseAxis("axis", o.axis, settings.seamShape),
      gyroDeg: o.gyroDeg,
      gyroRad: o.gyroDeg * DEG,
    }));
    return { settings, items, scenario: demo.scenario };
  }
  if (request.axis === undefined) throw new InputError(`--axis is missing; expected X,Y,Z, a landmark name such as waist-A, or 12.5N,45E (or use --demo)`);
  const axis = parseAxis("axis", request.axis, settings.seamShape);
  const gyroRad = parseDegrees("gyro", request.gyro ?? "0", -90, 90);
  return { settings, items: [{ axis, gyroDeg: gyroRad / DEG, gyroRad }] };
}

export function runMeasure(job: MeasureJob): MeasureResult {
  const s = job.settings;
  const landmarks = findLandmarks(s.seamShape);
  const measured = job.items.map((item) => {
    const measurement = measureOrientation({ axis: item.axis.vector, gyroRad: item.gyroRad }, { band: s.band, seamShape: s.seamShape, seamPoints: s.seamPoints });
    const near = nearestLandmark(landmarks, measurement.axis);
    return { item, measurement, landmark: { name: near.landmark.name, angleDeg: near.angleRad / DEG } };
  });
  return { job, measured };
}
