/**
 * Surface pressure on a sphere with a given separation line, and the side force
 * it makes, in closed form per azimuth.
 *
 * Flow frame: unit sphere, free stream from the front stagnation point at +v, polar
 * angle theta from +v, azimuth psi about v. Ahead of separation the surface pressure
 * is that of potential flow past a sphere,
 *     Cp(theta) = 1 - (9/4) sin^2 theta                       (Katz 2016, eq. 6.75),
 * behind it a constant wake (base) pressure Cp_b. With the separation line at
 * theta_s(psi), the force F = -integral of (p - p_inf) n dA over the sphere, made
 * dimensionless with 1/2 rho U^2 pi R^2, has the part across v
 *     C(psi-sum) = -(1/pi) integral over psi of G(theta_s(psi)) (cos psi, sin psi) dpsi,
 * because n = (sin theta cos psi, sin theta sin psi, cos theta), dA = R^2 sin theta dtheta dpsi, and
 *     G(ts) = integral_0^ts Cp(t) sin^2 t dt + Cp_b integral_ts^pi sin^2 t dt.
 * With I2(t) = t/2 - sin 2t / 4 and I4(t) = 3t/8 - sin 2t / 4 + sin 4t / 32 (the
 * antiderivatives of sin^2 and sin^4 from 0),
 *     G(ts) = -11 ts/32 + 5 sin(2 ts)/16 - 9 sin(4 ts)/128 + Cp_b (pi/2 - I2(ts)).
 * dG/dts = sin^2 ts (Cp(ts) - Cp_b): where the potential-flow suction is stronger than
 * the wake's (Cp(ts) < Cp_b), moving separation later on one side lowers G there and
 * pushes the ball toward that side. A separation angle the same at every azimuth
 * gives no side force, because the integral of (cos psi, sin psi) over a turn is 0.
 */

/** Potential-flow surface pressure coefficient on a sphere at polar angle `thetaRad` (rad, 0 to pi). */
export function potentialPressureCoefficient(thetaRad: number): number {
  const s = Math.sin(thetaRad);
  return 1 - 2.25 * s * s;
}

/**
 * G(theta_s): the per-azimuth pressure integral of the header, dimensionless.
 * @param separationRad separation angle theta_s, rad, 0 to pi.
 * @param wakePressureCoefficient Cp_b behind separation, dimensionless.
 */
export function meridianSideIntegral(separationRad: number, wakePressureCoefficient: number): number {
  return meridianSideIntegralFromCos(Math.cos(separationRad), separationRad, wakePressureCoefficient);
}

/**
 * G(theta_s) from cos(theta_s) and theta_s together (the hot loop has both; saves two sines).
 * @param cosSeparation cos(theta_s), -1 to 1.
 * @param separationRad theta_s = arccos(cosSeparation), rad.
 * @param wakePressureCoefficient Cp_b, dimensionless.
 */
export function meridianSideIntegralFromCos(cosSeparation: number, separationRad: number, wakePressureCoefficient: number): number {
  const c = cosSeparation;
  const s = Math.sqrt(Math.max(0, 1 - c * c)); // theta_s in [0, pi], so sin >= 0
  const sin2 = 2 * s * c;
  const sin4 = 2 * sin2 * (2 * c * c - 1);
  const i2 = 0.5 * separationRad - 0.25 * sin2;
  return (-11 / 32) * separationRad + (5 / 16) * sin2 - (9 / 128) * sin4 + wakePressureCoefficient * (0.5 * Math.PI - i2);
}

/** Side-force coefficient across v, flow frame: components along flow x and flow y. */
export interface SideCoefficient {
  x: number;
  y: number;
}

/**
 * Side-force coefficient of a separation line sampled at equally spaced azimuths
 * psi_j = 2 pi j / n (j = 0 .. n - 1), by the rectangle rule on that periodic grid
 * (which integrates a constant G's (cos, sin) to zero exactly):
 *     C = -(2/n) sum_j G(theta_s[j]) (cos psi_j, sin psi_j).
 * @param separationRad theta_s at each azimuth, rad, 0 to pi (n = length, at least 3).
 * @param wakePressureCoefficient Cp_b, dimensionless.
 * @param out overwritten and returned.
 * @throws RangeError for fewer than 3 azimuths or an angle outside [0, pi].
 */
export function sideCoefficientFromSeparation(
  separationRad: Float64Array,
  wakePressureCoefficient: number,
  out: SideCoefficient = { x: 0, y: 0 },
): SideCoefficient {
  const n = separationRad.length;
  if (n < 3) throw new RangeError(`azimuth count ${n} must be at least 3`);
  let sx = 0;
  let sy = 0;
  for (let j = 0; j < n; j++) {
    const t = separationRad[j];
    if (!(t >= 0 && t <= Math.PI)) throw new RangeError(`separation angle ${t} rad at azimuth ${j} must be from 0 to pi rad`);
    const g = meridianSideIntegral(t, wakePressureCoefficient);
    const psi = (2 * Math.PI * j) / n;
    sx += g * Math.cos(psi);
    sy += g * Math.sin(psi);
  }
  out.x = (-2 / n) * sx;
  out.y = (-2 / n) * sy;
  return out;
}
