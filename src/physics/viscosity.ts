/**
 * Dynamic viscosity of air by Sutherland's law, in the form and constants of the
 * U.S. Standard Atmosphere, 1976 (eq. 51):
 *
 *   mu = beta T^1.5 / (T + S),   beta = 1.458e-6 kg/(m s K^0.5),   S = 110.4 K.
 *
 * This is dry air; water vapour changes the viscosity of air by well under 1 %
 * at the humidities a ballpark sees, so it is neglected.
 */
import { assertInRange } from "../../geometry/check.js";

const SUTHERLAND_BETA = 1.458e-6;
const SUTHERLAND_S_K = 110.4;

/**
 * Dynamic viscosity of air.
 *
 * @param temperatureK air temperature, K, from 150 to 500 (wider than the
 *   air-state range; Sutherland's law is good to a few per cent there).
 * @returns viscosity, Pa s.
 * @throws RangeError for a temperature outside 150 to 500 K.
 */
export function sutherlandViscosity(temperatureK: number): number {
  assertInRange("temperature", temperatureK, 150, 500, "K");
  return (SUTHERLAND_BETA * Math.pow(temperatureK, 1.5)) / (temperatureK + SUTHERLAND_S_K);
}
