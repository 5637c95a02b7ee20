/**
 * The air a pitch flies through: one state object (density, viscosity,
 * temperature, pressure, humidity) built from an elevation with optional
 * measured overrides, plus the two dimensionless groups the aerodynamics needs.
 * Re-exports the atmosphere, humidity and viscosity pieces so callers can
 * import everything air-related from here.
 */
import { assertInRange, assertNonNegative, assertPositive } from "../../geometry/check.js";
import { standardAtmosphere } from "./atmosphere.js";
import { humidAirDensity, PRESSURE_MAX_PA, PRESSURE_MIN_PA, TEMPERATURE_MAX_C, TEMPERATURE_MIN_C } from "./humidity.js";
import { sutherlandViscosity } from "./viscosity.js";
import { KELVIN_AT_0_C } from "../../geometry/units.js";

export {
  standardAtmosphere,
  ELEVATION_MAX_M,
  ELEVATION_MIN_M,
  SEA_LEVEL_DENSITY_KG_M3,
  SEA_LEVEL_PRESSURE_PA,
  SEA_LEVEL_TEMPERATURE_K,
  STANDARD_GRAVITY_M_PER_S2,
} from "./atmosphere.js";
export type { StandardAtmosphere } from "./atmosphere.js";
export { humidAirDensity, saturationVapourPressurePa } from "./humidity.js";
export { sutherlandViscosity } from "./viscosity.js";

/** Conditions to build an air state from; every field is optional. */
export interface AirConditions {
  /** Geometric elevation above mean sea level, m, -500 to 5000; default 0. */
  readonly elevationM?: number;
  /** Measured air temperature, deg C, -40 to 60; default: standard atmosphere at the elevation. */
  readonly temperatureC?: number;
  /** Measured static (station, not sea-level-corrected) pressure, Pa, 50000 to 110000; default: standard atmosphere at the elevation. */
  readonly pressurePa?: number;
  /** Relative humidity, percent, 0 to 100; default 0 (dry, as in the standard atmosphere). */
  readonly relativeHumidityPct?: number;
}

/** Everything the flight model needs to know about the air. */
export interface AirState {
  /** Density, kg/m^3. */
  readonly densityKgM3: number;
  /** Dynamic viscosity, Pa s. */
  readonly viscosityPaS: number;
  /** Temperature, K. */
  readonly temperatureK: number;
  /** Static pressure, Pa. */
  readonly pressurePa: number;
  /** Relative humidity, percent (0 to 100). */
  readonly relativeHumidityPct: number;
}

/**
 * Air state at an elevation, with optional measured overrides. Temperature and
 * pressure not given come from the 1976 standard atmosphere at the elevation;
 * density then follows from the humid-air law, viscosity from Sutherland.
 *
 * @throws RangeError for an elevation outside -500 to 5000 m, a temperature
 *   outside -40 to 60 deg C, a pressure outside 500 to 1100 hPa, or a relative
 *   humidity outside 0 to 100 %.
 */
export function airState(conditions: AirConditions = {}): AirState {
  const standard = standardAtmosphere(conditions.elevationM ?? 0);
  let temperatureK = standard.temperatureK;
  if (conditions.temperatureC !== undefined) {
    assertInRange("temperature", conditions.temperatureC, TEMPERATURE_MIN_C, TEMPERATURE_MAX_C, "deg C");
    temperatureK = conditions.temperatureC + KELVIN_AT_0_C;
  }
  const pressurePa = conditions.pressurePa ?? standard.pressurePa;
  assertInRange("pressure", pressurePa, PRESSURE_MIN_PA, PRESSURE_MAX_PA, "Pa");
  const relativeHumidityPct = conditions.relativeHumidityPct ?? 0;
  return {
    densityKgM3: humidAirDensity(pressurePa, temperatureK, relativeHumidityPct),
    viscosityPaS: sutherlandViscosity(temperatureK),
    temperatureK,
    pressurePa,
    relativeHumidityPct,
  };
}

/**
 * Reynolds number Re = rho v D / mu.
 *
 * @param speedMPerS flow speed, m/s, >= 0.
 * @param diameterM body diameter, m, > 0.
 * @param densityKgM3 fluid density, kg/m^3, > 0.
 * @param viscosityPaS dynamic viscosity, Pa s, > 0.
 * @returns Re, dimensionless.
 */
export function reynoldsNumber(speedMPerS: number, diameterM: number, densityKgM3: number, viscosityPaS: number): number {
  assertNonNegative("speed", speedMPerS, "m/s");
  assertPositive("diameter", diameterM, "m");
  assertPositive("density", densityKgM3, "kg/m^3");
  assertPositive("viscosity", viscosityPaS, "Pa s");
  return (densityKgM3 * speedMPerS * diameterM) / viscosityPaS;
}

/**
 * Spin factor S = R omega / v: surface speed from spin over flight speed.
 *
 * @param radiusM ball radius, m, > 0.
 * @param spinRadPerS spin rate (magnitude), rad/s, >= 0.
 * @param speedMPerS flight speed, m/s, > 0.
 * @returns S, dimensionless.
 */
export function spinFactor(radiusM: number, spinRadPerS: number, speedMPerS: number): number {
  assertPositive("radius", radiusM, "m");
  assertNonNegative("spin rate", spinRadPerS, "rad/s");
  assertPositive("speed", speedMPerS, "m/s");
  return (radiusM * spinRadPerS) / speedMPerS;
}
