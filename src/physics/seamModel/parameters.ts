/**
 * The seam-force model's physical parameters, in one place: name, unit, default,
 * source, physical range and whether a calibration may fit it; and profiles, the
 * files that override them.
 *
 * Units: angles in degrees here (a profile is an edge of the library, where people
 * read and write degrees); model.ts converts them to radians once. Polar angles are
 * measured from the front stagnation point (geometry/flow.ts). Coefficients are
 * dimensionless.
 *
 * Profile (JSON): { "name": string, "parameters": { "<name>": number, ... } }. Missing
 * names take their defaults; an unknown name, a value that is not a finite number or
 * one outside its range is a RangeError naming it, its value and the range. Then the
 * cross-parameter checks of checkCrossParameters. Each resolved profile carries a
 * short stable hash of its values for outputs to echo.
 *
 * Numerical resolution (seam points, azimuth bins, phases) is not here: see
 * resolution.ts. A spin-rate factor is not here either: the only grounds we have for
 * seam effects weakening as spin rises are trade summaries of the seam-shifted-wake
 * literature, recalled, with no primary source read (/work/shared/REFERENCES.md,
 * "Seam forces"), so the model has no spin dependence beyond the turning itself.
 */
import { sha256Hex } from "../../../geometry/sha256.js";
import { bandFromDegrees, DEFAULT_BAND_CENTER_DEG, DEFAULT_BAND_WIDTH_DEG, type Band } from "../../sampling/band.js";
import { attachedPressureCoefficient } from "./pressure.js";

import { DEG } from "../../../geometry/units.js";

export interface SeamModelParameter {
  /** Key in a profile's "parameters". */
  readonly name: SeamModelParameterName;
  /** "deg" or "1" (dimensionless). */
  readonly unit: "deg" | "1";
  readonly defaultValue: number;
  /** Physical range, inclusive. */
  readonly min: number;
  readonly max: number;
  /** Where the default and the range come from. */
  readonly source: string;
  /** Whether a calibration may fit it. */
  readonly calibratable: boolean;
  readonly description: string;
}

export const SEAM_MODEL_PARAMETER_NAMES = [
  "laminarSeparationDeg",
  "turbulentSeparationDeg",
  "tripStartDeg",
  "tripEndDeg",
  "bandCenterDeg",
  "bandWidthDeg",
  "wakePressureCoefficient",
  "suctionFactor",
  "scale",
] as const;

export type SeamModelParameterName = (typeof SEAM_MODEL_PARAMETER_NAMES)[number];

/** Resolved values, one per parameter, in the units of the table. */
export type SeamModelValues = { readonly [K in SeamModelParameterName]: number };

/** The parameter table. Defaults chosen as each row says; how they were fitted: DEVELOPERS.md in this folder. */
export const SEAM_MODEL_PARAMETERS: readonly SeamModelParameter[] = [
  {
    name: "laminarSeparationDeg",
    unit: "deg",
    defaultValue: 80,
    min: 75,
    max: 90,
    source:
      "E. Achenbach, J. Fluid Mech. 54(3), 565-575 (1972): laminar separation of a smooth sphere at subcritical Reynolds numbers about 80-85 deg (from memory); default 80, the low end, chosen with the trip zone and wake pressure against Watts & Sawyer's knuckleball (DEVELOPERS.md)",
    calibratable: true,
    description: "where an untripped (laminar) boundary layer separates, from the front stagnation point",
  },
  {
    name: "turbulentSeparationDeg",
    unit: "deg",
    defaultValue: 120,
    min: 100,
    max: 130,
    source:
      "E. Achenbach, J. Fluid Mech. 54(3), 565-575 (1972): turbulent separation of a sphere about 110-120 deg (from memory); default 120, also the fixation band's far edge",
    calibratable: true,
    description: "where a boundary layer tripped turbulent by a seam separates, from the front stagnation point",
  },
  {
    name: "tripStartDeg",
    unit: "deg",
    defaultValue: 10,
    min: 0,
    max: 60,
    source:
      "R. D. Mehta, Annu. Rev. Fluid Mech. 17, 151-189 (1985): a cricket ball's side force grows from zero at zero seam angle to its largest near 20 deg (from memory); nearer the stagnation point the layer is too thin and slow for a seam to trip it; default 10 deg chosen by a grid search against Watts & Sawyer (DEVELOPERS.md)",
    calibratable: true,
    description: "start of the trip zone: a seam crossed between tripStartDeg and tripEndDeg trips the laminar boundary layer turbulent",
  },
  {
    name: "tripEndDeg",
    unit: "deg",
    defaultValue: 50,
    min: 10,
    max: 90,
    source:
      "R. D. Mehta, Annu. Rev. Fluid Mech. 17, 151-189 (1985): the side force falls away at large seam angles, where the seam sits too close to laminar separation for the tripped layer to matter (from memory); default 50 deg chosen by a grid search against Watts & Sawyer (DEVELOPERS.md)",
    calibratable: true,
    description: "end of the trip zone; at most laminarSeparationDeg and the fixation band's near edge",
  },
  {
    name: "bandCenterDeg",
    unit: "deg",
    defaultValue: DEFAULT_BAND_CENTER_DEG,
    min: 60,
    max: 140,
    source: "src/sampling/band.ts: the sampler's separation band (80-120 deg), spanning Achenbach's laminar and turbulent separation angles",
    calibratable: false,
    description: "centre of the fixation band (shared with the band sampler): a seam met there while the layer is attached fixes separation at itself",
  },
  {
    name: "bandWidthDeg",
    unit: "deg",
    defaultValue: DEFAULT_BAND_WIDTH_DEG,
    min: 2,
    max: 100,
    source: "src/sampling/band.ts (as bandCenterDeg)",
    calibratable: false,
    description: "width of the fixation band (shared with the band sampler)",
  },
  {
    name: "wakePressureCoefficient",
    unit: "1",
    defaultValue: -0.3,
    min: -0.8,
    max: 0,
    source:
      "E. Achenbach, J. Fluid Mech. 54(3), 565-575 (1972): base pressure of a subcritical sphere about -0.4, weaker behind a supercritical one (about -0.2) (both from memory); default -0.3 between them, a ball with tripped meridians having a partly turbulent wake, chosen against Watts & Sawyer (at -0.4 the knuckleball peak is 26 % low; DEVELOPERS.md)",
    calibratable: true,
    description: "constant pressure coefficient Cp_b behind separation",
  },
  {
    name: "suctionFactor",
    unit: "1",
    defaultValue: 1,
    min: 0.5,
    max: 1,
    source:
      "potential flow past a sphere, Cp = 1 - (9/4) sin^2 theta (e.g. J. Katz, Automotive Aerodynamics, Wiley 2016, eq. 6.75) at 1; measured sphere pressures have weaker suction (common practice, no source). Not fitted by calibrate: with scale and the wake pressure it enters the force only through two combinations, scale (1 - Cp_b) and scale lambda, so the three cannot be told apart (DEVELOPERS.md, Calibration)",
    calibratable: false,
    description: "lambda in Cp = 1 - lambda (9/4) sin^2 theta ahead of separation",
  },
  {
    name: "scale",
    unit: "1",
    defaultValue: 1,
    min: 0,
    max: 10,
    source: "calibration factor on the whole force (common practice, no source); 0 switches the seam force off",
    calibratable: true,
    description: "overall factor on the seam force coefficient",
  },
];

const BY_NAME = new Map<string, SeamModelParameter>(SEAM_MODEL_PARAMETERS.map((p) => [p.name, p]));

/** A resolved profile: every value known and checked. */
export interface SeamModelProfile {
  readonly name: string;
  readonly values: SeamModelValues;
  /** First 8 hex digits of SHA-256 of the canonical JSON of `values` (names in table order). */
  readonly hash: string;
}

/** The table's defaults. */
export function defaultValues(): SeamModelValues {
  const out: Record<string, number> = {};
  for (const p of SEAM_MODEL_PARAMETERS) out[p.name] = p.defaultValue;
  return out as SeamModelValues;
}

/** The default profile, named "default". */
export function defaultProfile(): SeamModelProfile {
  return resolveProfile({ name: "default", parameters: {} }, "built-in defaults");
}

/** Canonical JSON of the values: one key per parameter, in table order. */
export function canonicalValuesJson(values: SeamModelValues): string {
  return JSON.stringify(SEAM_MODEL_PARAMETER_NAMES.map((n) => [n, values[n]]));
}

/** The profile hash of `values` (8 hex digits). */
export function profileHash(values: SeamModelValues): string {
  return sha256Hex(canonicalValuesJson(values)).slice(0, 8);
}

function isRecord(x: unknown): x is Record<string, unknown> {
  return typeof x === "object" && x !== null && !Array.isArray(x);
}

/**
 * Resolves a profile from parsed JSON.
 * @param input { name: string, parameters?: { <name>: number } }.
 * @param source where it came from (file name), for messages.
 * @throws RangeError (one line) for a malformed profile, an unknown name, a value that
 *   is not a finite number or lies outside its range, or a failed cross-parameter check.
 */
export function resolveProfile(input: unknown, source: string): SeamModelProfile {
  if (!isRecord(input)) throw new RangeError(`${source}: a seam model profile must be a JSON object { "name": ..., "parameters": {...} }`);
  for (const key of Object.keys(input)) {
    if (key !== "name" && key !== "parameters") {
      throw new RangeError(`${source}: unknown profile field "${key}" (expected "name" and "parameters")`);
    }
  }
  const name = input.name;
  if (typeof name !== "string" || name.trim() === "") throw new RangeError(`${source}: profile "name" must be a non-empty string`);
  const given = input.parameters ?? {};
  if (!isRecord(given)) throw new RangeError(`${source}: profile "parameters" must be an object of name: number`);
  const values: Record<string, number> = {};
  for (const p of SEAM_MODEL_PARAMETERS) values[p.name] = p.defaultValue;
  for (const [key, value] of Object.entries(given)) {
    const p = BY_NAME.get(key);
    if (!p) {
      throw new RangeError(`${source}: unknown seam model parameter "${key}" (known: ${SEAM_MODEL_PARAMETER_NAMES.join(", ")})`);
    }
    if (typeof value !== "number" || !Number.isFinite(value) || value < p.min || value > p.max) {
      throw new RangeError(
        `${source}: seam model parameter ${key} = ${typeof value === "number" ? String(value) : JSON.stringify(value)} must be a number from ${p.min} to ${p.max}${p.unit === "deg" ? " deg" : ""}`,
      );
    }
    values[key] = value;
  }
  checkCrossParameters(values as SeamModelValues, source);
  return { name, values: Object.freeze(values) as SeamModelValues, hash: profileHash(values as SeamModelValues) };
}

/** The fixation band of a set of values (the sampler's Band type). */
export function bandOf(values: SeamModelValues): Band {
  return bandFromDegrees(values.bandCenterDeg, values.bandWidthDeg);
}

/**
 * Checks between parameters (RangeError naming both values):
 * - the band lies inside (0, 180) deg;
 * - tripStartDeg < tripEndDeg <= laminarSeparationDeg and tripEndDeg <= the band's near
 *   edge, so every trip crossing on a meridian precedes every band crossing (the rule in
 *   instant.ts then needs no ordering);
 * - laminarSeparationDeg < turbulentSeparationDeg;
 * - wakePressureCoefficient lies above the attached-flow Cp everywhere separation can
 *   happen (from min(laminar, band near edge) to max(turbulent, band far edge)), so the
 *   wake never has more suction than the attached flow beside it and later separation
 *   on one side always pushes toward that side (pressure.ts, dG/dts < 0).
 */
export function checkCrossParameters(v: SeamModelValues, source: string): void {
  let band: Band;
  try {
    band = bandOf(v);
  } catch (e) {
    throw new RangeError(`${source}: ${(e as Error).message}`);
  }
  const nearDeg = (band.centerRad - band.widthRad / 2) / DEG;
  const farDeg = (band.centerRad + band.widthRad / 2) / DEG;
  if (!(v.tripStartDeg < v.tripEndDeg)) {
    throw new RangeError(`${source}: tripStartDeg ${v.tripStartDeg} must be below tripEndDeg ${v.tripEndDeg}`);
  }
  if (!(v.tripEndDeg <= v.laminarSeparationDeg)) {
    throw new RangeError(
      `${source}: tripEndDeg ${v.tripEndDeg} must be at most laminarSeparationDeg ${v.laminarSeparationDeg} (the trip zone lies ahead of laminar separation)`,
    );
  }
  if (!(v.tripEndDeg <= nearDeg + 1e-9)) {
    throw new RangeError(
      `${source}: tripEndDeg ${v.tripEndDeg} must be at most the fixation band's near edge ${nearDeg} deg (bandCenterDeg - bandWidthDeg / 2)`,
    );
  }
  if (!(v.laminarSeparationDeg < v.turbulentSeparationDeg)) {
    throw new RangeError(
      `${source}: laminarSeparationDeg ${v.laminarSeparationDeg} must be below turbulentSeparationDeg ${v.turbulentSeparationDeg}`,
    );
  }
  const lo = Math.min(v.laminarSeparationDeg, nearDeg) * DEG;
  const hi = Math.max(v.turbulentSeparationDeg, farDeg) * DEG;
  // Cp = 1 - lambda (9/4) sin^2 is lowest at 90 deg, so its largest value on [lo, hi] is at an end.
  const cpMax = Math.max(attachedPressureCoefficient(lo, v.suctionFactor), attachedPressureCoefficient(hi, v.suctionFactor));
  if (!(v.wakePressureCoefficient > cpMax)) {
    throw new RangeError(
      `${source}: wakePressureCoefficient ${v.wakePressureCoefficient} must be above ${cpMax.toPrecision(4)}, the attached-flow Cp at ${(lo / DEG).toFixed(1)} or ${(hi / DEG).toFixed(1)} deg with suctionFactor ${v.suctionFactor}`,
    );
  }
}
