/**
 * Coefficient to newtons: F = 1/2 rho A C v^2 with A = pi R^2 (the model's coefficients
 * already carry the profile's scale).
 */

/**
 * Seam force, N, from a coefficient.
 * @param coefficient dimensionless (turnAverage, forceTimeline or instantaneousCoefficient).
 * @param densityKgM3 air density, kg/m^3, 0 to 2.
 * @param radiusM ball radius, m, 0.005 to 0.1.
 * @param speedMPerS air speed past the ball, m/s, 0 to 100.
 * @throws RangeError for an input outside its range.
 */
export function seamForceNewtons(coefficient: number, densityKgM3: number, radiusM: number, speedMPerS: number): number {
  if (!Number.isFinite(coefficient)) throw new RangeError(`seam force coefficient ${coefficient} must be a finite number`);
  if (!(densityKgM3 >= 0 && densityKgM3 <= 2)) throw new RangeError(`air density ${densityKgM3} kg/m^3 must be a number from 0 to 2 kg/m^3`);
  if (!(radiusM >= 0.005 && radiusM <= 0.1)) throw new RangeError(`ball radius ${radiusM} m must be a number from 0.005 to 0.1 m`);
  if (!(speedMPerS >= 0 && speedMPerS <= 100)) throw new RangeError(`speed ${speedMPerS} m/s must be a number from 0 to 100 m/s`);
  return 0.5 * densityKgM3 * Math.PI * radiusM * radiusM * coefficient * speedMPerS * speedMPerS;
}
