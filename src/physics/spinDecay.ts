/**
 * Spin decay during flight: off by default.
 *
 * The torque law quoted in the project references from Nathan's note,
 * I domega/dt = -1/2 k R rho A C_L v^2 with I = 0.4 M R^2, carries a factor k whose
 * value and provenance we cannot pin down, so this library uses a simple
 * exponential decay instead:
 *
 *   omega(t) = omega0 exp(-t / tau)
 *
 * with the direction fixed and the time constant tau set by the user (no default
 * value is claimed; choose one from the literature you trust). Over a 0.4 s pitch
 * any tau of tens of seconds changes the spin by only a few per cent.
 */
import { assertPositive } from "../../geometry/check.js";

/**
 * The factor omega(t) / omega0 = exp(-t / tau).
 *
 * @param timeS time since release, s, >= 0.
 * @param timeConstantS decay time constant tau, s, > 0; Infinity means no decay.
 */
export function spinDecayFactor(timeS: number, timeConstantS: number): number {
  return timeConstantS === Infinity ? 1 : Math.exp(-timeS / timeConstantS);
}

/** Throws RangeError unless tau (s) is a positive number (Infinity allowed: no decay). */
export function assertSpinDecayTimeConstant(timeConstantS: number): void {
  if (timeConstantS === Infinity) return;
  assertPositive("spin decay time constant", timeConstantS, "s");
}
