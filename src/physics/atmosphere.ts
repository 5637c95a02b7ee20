/**
 * U.S. Standard Atmosphere, 1976 (NOAA/NASA/USAF, NOAA-S/T 76-1562), lowest layer
 * (troposphere, geopotential 0 to 11 km), where the temperature falls linearly:
 *
 *   T = T0 - L H,                        (1976, eq. 23 with L_M,0 = -6.5 K/km)
 *   P = P0 (T0 / T)^(-g0' M0 / (R* L))   (1976, eq. 33a, non-zero lapse rate)
 *   rho = P M0 / (R* T)                   (1976, eq. 42)
 *
 * H is geopotential altitude. The input here is geometric elevation Z above mean
 * sea level, converted with H = r0 Z / (r0 + Z), r0 = 6356.766 km (1976, eq. 18),
 * because the 1976 tables are printed against geometric altitude. (The
 * conversion changes density by about 6e-5 relative at 2 km, well under the
 * tables' four digits, but it is what makes the recomputation match them.)
 * The constants are the 1976 ones, including R* = 8.31432 J/(mol K) (the
 * standard's value, not the later CODATA 8.3144598).
 */
import { assertInRange } from "../../geometry/check.js";

/** Sea-level standard temperature T0, K (1976). */
export const SEA_LEVEL_TEMPERATURE_K = 288.15;
/** Sea-level standard pressure P0, Pa (1976). */
export const SEA_LEVEL_PRESSURE_PA = 101325;
/** Sea-level standard density, kg/m^3 (1976 table value). */
export const SEA_LEVEL_DENSITY_KG_M3 = 1.225;
/** Standard gravity g0, m/s^2 (1976; also the CGPM 1901 conventional value). */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;
/** Mean molar mass of dry air M0, kg/mol (1976). */
const MOLAR_MASS_KG_PER_MOL = 0.0289644;
/** Universal gas constant R*, J/(mol K), as adopted by the 1976 standard. */
const GAS_CONSTANT_J_PER_MOL_K = 8.31432;
/** Tropospheric temperature lapse rate L, K per geopotential metre (1976). */
const LAPSE_RATE_K_PER_M = 0.0065;
/** Effective Earth radius r0 for the geopotential conversion, m (1976, eq. 18). */
const EARTH_RADIUS_M = 6356766;
/** Exponent g0 M0 / (R* L) of the pressure law, dimensionless (about 5.2559). */
const PRESSURE_EXPONENT = (STANDARD_GRAVITY_M_PER_S2 * MOLAR_MASS_KG_PER_MOL) / (GAS_CONSTANT_J_PER_MOL_K * LAPSE_RATE_K_PER_M);

/** Accepted elevation range, m (geometric, above mean sea level). */
export const ELEVATION_MIN_M = -500;
export const ELEVATION_MAX_M = 5000;

export interface StandardAtmosphere {
  /** Air temperature, K. */
  readonly temperatureK: number;
  /** Static pressure, Pa. */
  readonly pressurePa: number;
  /** Dry-air density, kg/m^3. */
  readonly densityKgM3: number;
}

/**
 * The 1976 standard atmosphere at a geometric elevation.
 *
 * @param elevationM geometric elevation above mean sea level, m, from -500 to 5000.
 * @returns temperature (K), pressure (Pa) and dry-air density (kg/m^3).
 * @throws RangeError for an elevation outside -500 to 5000 m.
 */
export function standardAtmosphere(elevationM: number): StandardAtmosphere {
  assertInRange("elevation", elevationM, ELEVATION_MIN_M, ELEVATION_MAX_M, "m");
  const geopotentialM = (EARTH_RADIUS_M * elevationM) / (EARTH_RADIUS_M + elevationM);
  const temperatureK = SEA_LEVEL_TEMPERATURE_K - LAPSE_RATE_K_PER_M * geopotentialM;
  const pressurePa = SEA_LEVEL_PRESSURE_PA * Math.pow(temperatureK / SEA_LEVEL_TEMPERATURE_K, PRESSURE_EXPONENT);
  const densityKgM3 = (pressurePa * MOLAR_MASS_KG_PER_MOL) / (GAS_CONSTANT_J_PER_MOL_K * temperatureK);
  return { temperatureK, pressurePa, densityKgM3 };
}
