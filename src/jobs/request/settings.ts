/**
 * Requests for the settings several jobs share: the seam and band (sampler), the
 * screen, the air, the release and the flight models. Each reads options as typed,
 * checks them against the library's own ranges (shown in the user's units) and
 * returns SI.
 */
import { assertSeamShape, DEFAULT_SEAM_SHAPE } from "../../../geometry/seamCurve.js";
import { assertSeamPointCount, DEFAULT_SEAM_POINTS, SEAM_POINTS_RANGE } from "../../../geometry/seamSamples.js";
import { celsiusFromFahrenheit, DEG, M_PER_FT, PA_PER_HPA } from "../../../geometry/units.js";
import { InputError } from "../../io/errors.js";
import type { AirConditions } from "../../physics/air.js";
import { TRADE_WINDOW_START_M } from "../../physics/tradeMovement.js";
import { ELEVATION_MAX_M, ELEVATION_MIN_M } from "../../physics/atmosphere.js";
import { DEFAULT_CONSTANT_DRAG_COEFFICIENT, DRAG_COEFFICIENT_MAX, DRAG_MODEL_NAMES, type DragModel } from "../../physics/drag.js";
import { PRESSURE_MAX_PA, PRESSURE_MIN_PA, TEMPERATURE_MAX_C, TEMPERATURE_MIN_C } from "../../physics/humidity.js";
import {
  DEFAULT_RELEASE_EXTENSION_M,
  DEFAULT_RELEASE_HEIGHT_M,
  DEFAULT_RELEASE_SIDE_M,
  RELEASE_EXTENSION_RANGE_M,
  RELEASE_HEIGHT_RANGE_M,
  RELEASE_SIDE_RANGE_M,
  type ReleasePoint,
} from "../../physics/launch.js";
import { bandOf, type SeamModelProfile } from "../../physics/seamModel/parameters.js";
import type { Band } from "../../sampling/band.js";
import { DEFAULT_FINGER_SPACING_IN, FINGER_SPACING_MAX_IN } from "../../screening/hand.js";
import { DEFAULT_SPREAD_DEG } from "../../screening/robustness.js";
import { DEFAULT_GRID_SPACING_DEG, DEFAULT_TOP, GRID_SPACING_RANGE_DEG, RANKS, SPREAD_RANGE_DEG, TOP_RANGE, type RankBy } from "../../screening/screen.js";
import { atMostOne, oneOf, parseInRange, parseInteger, parseIntegerInRange, parseNumber, type Request } from "./values.js";

/** Rounds a range bound converted into the user's unit for messages. */
const shown = (x: number) => String(Math.round(x * 100) / 100);

export interface SamplerSettings {
  readonly seamShape: number;
  readonly band: Band;
  readonly bandCenterDeg: number;
  readonly bandWidthDeg: number;
  readonly seamPoints: number;
}

/** Seam shape, band and seam resolution; the band is the model profile's (after --band-center/--band-width: request/model.ts modelChoice). */
export function samplerSettings(request: Request, profile: SeamModelProfile): SamplerSettings {
  const seamShape =
    request["seam-shape"] === undefined ? DEFAULT_SEAM_SHAPE : parseNumber("seam-shape", request["seam-shape"], "a seam shape b strictly between 0 and 0.5");
  try {
    assertSeamShape(seamShape);
  } catch (err) {
    throw new InputError(`--seam-shape: ${(err as Error).message}`);
  }
  const band = bandOf(profile.values);
  const expected = `a multiple of 4 from ${SEAM_POINTS_RANGE[0]} to ${SEAM_POINTS_RANGE[1]}`;
  const seamPoints = parseInteger("seam-points", request["seam-points"] ?? DEFAULT_SEAM_POINTS, expected);
  try {
    assertSeamPointCount(seamPoints);
  } catch (err) {
    throw new InputError(`--seam-points: ${(err as Error).message}`);
  }
  return { seamShape, band, bandCenterDeg: profile.values.bandCenterDeg, bandWidthDeg: profile.values.bandWidthDeg, seamPoints };
}

export interface ScreenOptions {
  readonly gridSpacingRad: number;
  readonly spreadRad: number;
  readonly rank: RankBy;
  readonly fingerSpacingIn: number;
}

/** Grid, scatter, ranking and finger spacing of a screen. */
export function screenOptions(request: Request): ScreenOptions {
  const grid = parseInRange("grid", request.grid ?? DEFAULT_GRID_SPACING_DEG, GRID_SPACING_RANGE_DEG[0], GRID_SPACING_RANGE_DEG[1], "deg");
  const spread = parseInRange("spread", request.spread ?? DEFAULT_SPREAD_DEG, SPREAD_RANGE_DEG[0], SPREAD_RANGE_DEG[1], "deg");
  const rank = oneOf("rank", request.rank ?? "blend", RANKS);
  const finger = parseNumber("finger-spacing", request["finger-spacing"] ?? DEFAULT_FINGER_SPACING_IN, `inches above 0 and at most ${FINGER_SPACING_MAX_IN}`);
  if (!(finger > 0 && finger <= FINGER_SPACING_MAX_IN)) {
    throw new InputError(`--finger-spacing ${finger} in is out of range; expected above 0 and at most ${FINGER_SPACING_MAX_IN} in`);
  }
  return { gridSpacingRad: grid * DEG, spreadRad: spread * DEG, rank, fingerSpacingIn: finger };
}

/** How many candidates to list. */
export function topOption(request: Request, fallback = DEFAULT_TOP, range: readonly [number, number] = TOP_RANGE): number {
  return parseIntegerInRange("top", request.top ?? fallback, range[0], range[1]);
}

/** Air conditions in SI; one of each unit pair at most. */
export function airConditions(request: Request): AirConditions {
  atMostOne(request, "elevation-ft", "elevation-m");
  atMostOne(request, "temperature-f", "temperature-c");
  const out: { elevationM?: number; temperatureC?: number; relativeHumidityPct?: number; pressurePa?: number } = {};
  if (request["elevation-ft"] !== undefined) {
    out.elevationM = parseInRange("elevation-ft", request["elevation-ft"], Math.round(ELEVATION_MIN_M / M_PER_FT), Math.round(ELEVATION_MAX_M / M_PER_FT), "ft") * M_PER_FT;
  }
  if (request["elevation-m"] !== undefined) out.elevationM = parseInRange("elevation-m", request["elevation-m"], ELEVATION_MIN_M, ELEVATION_MAX_M, "m");
  if (request["temperature-f"] !== undefined) {
    const lo = (TEMPERATURE_MIN_C * 9) / 5 + 32;
    const hi = (TEMPERATURE_MAX_C * 9) / 5 + 32;
    out.temperatureC = celsiusFromFahrenheit(parseInRange("temperature-f", request["temperature-f"], lo, hi, "deg F"));
  }
  if (request["temperature-c"] !== undefined) out.temperatureC = parseInRange("temperature-c", request["temperature-c"], TEMPERATURE_MIN_C, TEMPERATURE_MAX_C, "deg C");
  if (request.humidity !== undefined) out.relativeHumidityPct = parseInRange("humidity", request.humidity, 0, 100, "percent");
  if (request["pressure-hpa"] !== undefined) {
    out.pressurePa = parseInRange("pressure-hpa", request["pressure-hpa"], PRESSURE_MIN_PA / PA_PER_HPA, PRESSURE_MAX_PA / PA_PER_HPA, "hPa") * PA_PER_HPA;
  }
  return out;
}

/** Release point in SI from feet (defaults: the library's). */
export function releasePoint(request: Request): Required<Omit<ReleasePoint, "hand">> {
  const ft = (option: string, fallbackM: number, range: readonly [number, number]) =>
    parseInRange(option, request[option] ?? shown(fallbackM / M_PER_FT), Number(shown(range[0] / M_PER_FT)), Number(shown(range[1] / M_PER_FT)), "ft") * M_PER_FT;
  return {
    heightM: ft("release-height-ft", DEFAULT_RELEASE_HEIGHT_M, RELEASE_HEIGHT_RANGE_M),
    armSideM: ft("release-side-ft", DEFAULT_RELEASE_SIDE_M, RELEASE_SIDE_RANGE_M),
    extensionM: ft("extension-ft", DEFAULT_RELEASE_EXTENSION_M, RELEASE_EXTENSION_RANGE_M),
  };
}

/** Launch angles in radians, or undefined to aim at the middle of the zone. */
export function launchAngles(request: Request): { verticalRad: number; horizontalRad: number } | undefined {
  if ((request["vertical-angle"] === undefined) !== (request["horizontal-angle"] === undefined)) {
    throw new InputError(`give both --vertical-angle and --horizontal-angle, or neither (to aim at the middle of the zone)`);
  }
  if (request["vertical-angle"] === undefined) return undefined;
  const v = parseNumber("vertical-angle", request["vertical-angle"], "degrees strictly between -45 and 45");
  const h = parseNumber("horizontal-angle", request["horizontal-angle"], "degrees strictly between -45 and 45");
  if (!(Math.abs(v) < 45 && Math.abs(h) < 45)) throw new InputError(`launch angles ${v}, ${h} deg are out of range; expected each strictly between -45 and 45 deg`);
  return { verticalRad: v * DEG, horizontalRad: h * DEG };
}

/** The drag model, by the library's own names and constants. */
export function dragModel(request: Request): DragModel {
  const name = oneOf("drag", request.drag ?? "giordano", DRAG_MODEL_NAMES);
  if (request["drag-coefficient"] !== undefined && name !== "constant") throw new InputError(`--drag-coefficient goes with --drag constant`);
  if (name === "giordano") return { name };
  const cd =
    request["drag-coefficient"] === undefined
      ? DEFAULT_CONSTANT_DRAG_COEFFICIENT
      : parseInRange("drag-coefficient", request["drag-coefficient"], 0, DRAG_COEFFICIENT_MAX, "");
  return { name, dragCoefficient: cd };
}

/** Exponential spin decay time constant, s, or undefined for none. */
export function spinDecay(request: Request): number | undefined {
  if (request["spin-decay-s"] === undefined) return undefined;
  const tau = parseNumber("spin-decay-s", request["spin-decay-s"], "seconds above 0");
  if (!(tau > 0)) throw new InputError(`--spin-decay-s ${tau} must be above 0 seconds`);
  return tau;
}

/** Accepted start of the trade's movement window, ft from home plate (beyond the plate, inside a release). */
export const WINDOW_RANGE_FT: readonly [number, number] = [10, 55];

/** Where the trade's movement window starts, m (--window-ft; default 50 ft, common practice). */
export function windowStart(request: Request): number {
  return parseInRange("window-ft", request["window-ft"] ?? TRADE_WINDOW_START_M / M_PER_FT, WINDOW_RANGE_FT[0], WINDOW_RANGE_FT[1], "ft") * M_PER_FT;
}
