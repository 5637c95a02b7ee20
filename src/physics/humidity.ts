/**
 * Moist air. Water vapour (molar mass 18.015 g/mol) is lighter than dry air
 * (28.964 g/mol), so humid air is less dense at the same pressure and temperature:
 *
 *   rho = (P - 0.378 e) / (R_d T),   R_d = 287.05 J/(kg K),   e = RH e_s(T)
 *
 * (the usual virtual-temperature form found in standard meteorology texts;
 * 0.378 = 1 - 18.015/28.964).
 * The saturation vapour pressure over liquid water is Buck's formula,
 * A. L. Buck, "New equations for computing vapor pressure and enhancement factor",
 * J. Appl. Meteorol. 20, 1527-1532 (1981), in its revised constants:
 *
 *   e_s = 6.1121 exp((18.678 - T/234.5) T / (257.14 + T)) hPa,   T in deg C.
 */
import { assertInRange } from "../../geometry/check.js";
import { KELVIN_AT_0_C, PA_PER_HPA } from "../../geometry/units.js";

/** Specific gas constant of dry air R_d, J/(kg K). */
const DRY_AIR_GAS_CONSTANT_J_PER_KG_K = 287.05;
/** 1 - M_water / M_dry_air, dimensionless. */
const VAPOUR_MASS_DEFICIT = 0.378;

/** Accepted air temperature range, deg C. */
export const TEMPERATURE_MIN_C = -40;
export const TEMPERATURE_MAX_C = 60;
/** Accepted static pressure range, Pa (500 to 1100 hPa). */
export const PRESSURE_MIN_PA = 500 * PA_PER_HPA;
export const PRESSURE_MAX_PA = 1100 * PA_PER_HPA;

/**
 * Saturation vapour pressure over liquid water (Buck 1981).
 *
 * @param temperatureC air temperature, deg C, from -40 to 60.
 * @returns e_s, Pa.
 * @throws RangeError for a temperature outside -40 to 60 deg C.
 */
export function saturationVapourPressurePa(temperatureC: number): number {
  assertInRange("temperature", temperatureC, TEMPERATURE_MIN_C, TEMPERATURE_MAX_C, "deg C");
  const t = temperatureC;
  return 6.1121 * PA_PER_HPA * Math.exp(((18.678 - t / 234.5) * t) / (257.14 + t));
}

/**
 * Density of moist air, rho = (P - 0.378 RH e_s) / (R_d T).
 *
 * @param pressurePa static pressure, Pa, from 50000 to 110000 (500 to 1100 hPa).
 * @param temperatureK air temperature, K, from 233.15 to 333.15 (-40 to 60 deg C).
 * @param relativeHumidityPct relative humidity, percent, from 0 to 100.
 * @returns density, kg/m^3.
 * @throws RangeError for any argument outside its range.
 */
export function humidAirDensity(pressurePa: number, temperatureK: number, relativeHumidityPct: number): number {
  assertInRange("pressure", pressurePa, PRESSURE_MIN_PA, PRESSURE_MAX_PA, "Pa");
  assertInRange("temperature", temperatureK, TEMPERATURE_MIN_C + KELVIN_AT_0_C, TEMPERATURE_MAX_C + KELVIN_AT_0_C, "K");
  assertInRange("relative humidity", relativeHumidityPct, 0, 100, "%");
  const vapourPa = (relativeHumidityPct / 100) * saturationVapourPressurePa(temperatureK - KELVIN_AT_0_C);
  return (pressurePa - VAPOUR_MASS_DEFICIT * vapourPa) / (DRY_AIR_GAS_CONSTANT_J_PER_KG_K * temperatureK);
}
