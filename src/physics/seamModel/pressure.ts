/**
 * Surface pressure on a sphere with a given separation line, and the side force it
 * makes, in closed form per azimuth (meridian).
 *
 * Flow frame (geometry/flow.ts): unit sphere, front stagnation point at +v = +z, polar
 * angle theta from +v, azimuth psi about v measured from a = +x toward +y (so the
 * Magnus direction m = -y sits at psi = -pi/2). Outward normal
 * n = (sin theta cos psi, sin theta sin psi, cos theta), dA = R^2 sin theta dtheta dpsi.
 *
 * Pressure ahead of separation: potential flow past a sphere with its suction scaled
 * by the suction factor lambda,
 *     Cp(theta) = 1 - lambda (9/4) sin^2 theta,
 * lambda = 1 being the potential-flow distribution (surface speed 1.5 U sin theta;
 * e.g. J. Katz, Automotive Aerodynamics, Wiley 2016, eq. 6.75). Behind separation a
 * constant wake (base) pressure Cp_b.
 *
 * The force F = -integral (p - p_inf) n dA, made dimensionless with 1/2 rho U^2 pi R^2,
 * has the part across v
 *     C = -(1/pi) integral_0^{2 pi} G(theta_s(psi)) (cos psi, sin psi) dpsi,
 *     G(ts) = integral_0^ts Cp(t) sin^2 t dt + Cp_b integral_ts^pi sin^2 t dt.
 * With I2(t) = t/2 - sin(2t)/4 and I4(t) = 3t/8 - sin(2t)/4 + sin(4t)/32, the
 * antiderivatives of sin^2 and sin^4 from 0,
 *     G(ts) = I2(ts) - (9 lambda / 4) I4(ts) + Cp_b (pi/2 - I2(ts))
 * (at lambda = 1: -11 ts/32 + 5 sin(2 ts)/16 - 9 sin(4 ts)/128 + Cp_b (pi/2 - I2(ts)),
 * the form of src/physics/wakePressure.ts). Its derivative
 *     dG/dts = sin^2 ts (Cp(ts) - Cp_b)
 * is negative wherever the attached flow's suction is stronger than the wake's, so
 * on such a range later separation on one side lowers G there and, through the minus
 * sign, pushes the ball toward that side. A separation angle the same at every
 * azimuth gives no side force (the integral of (cos psi, sin psi) over a turn is 0).
 *
 * In terms of c = cos ts (the model's hot loop works in cosines): dG/dc = -sin ts
 * (Cp(ts) - Cp_b), finite away from the poles, so G(c) is tabulated on the range the
 * model needs and read by cubic Hermite interpolation (values and slopes exact).
 */

/** Cp(theta) = 1 - lambda (9/4) sin^2 theta, dimensionless. @param thetaRad 0..pi; @param suctionFactor lambda > 0. */
export function attachedPressureCoefficient(thetaRad: number, suctionFactor: number): number {
  const s = Math.sin(thetaRad);
  return 1 - 2.25 * suctionFactor * s * s;
}

/**
 * G(theta_s) of the header, dimensionless.
 * @param separationRad theta_s, rad, 0..pi.
 * @param suctionFactor lambda, dimensionless (1 = potential flow).
 * @param wakePressureCoefficient Cp_b, dimensionless.
 */
export function meridianPressureIntegral(separationRad: number, suctionFactor: number, wakePressureCoefficient: number): number {
  const t = separationRad;
  const sin2 = Math.sin(2 * t);
  const sin4 = Math.sin(4 * t);
  const i2 = 0.5 * t - 0.25 * sin2;
  const i4 = 0.375 * t - 0.25 * sin2 + sin4 / 32;
  return i2 - 2.25 * suctionFactor * i4 + wakePressureCoefficient * (0.5 * Math.PI - i2);
}

/** dG/dc at c = cos theta_s (|c| < 1), dimensionless: -sin theta_s (Cp(theta_s) - Cp_b). */
function pressureIntegralSlopeInCos(c: number, suctionFactor: number, wakePressureCoefficient: number): number {
  const s2 = Math.max(0, (1 - c) * (1 + c));
  return -Math.sqrt(s2) * (1 - 2.25 * suctionFactor * s2 - wakePressureCoefficient);
}

/**
 * G tabulated on a uniform grid in c = cos theta_s over [cLo, cHi], read by cubic
 * Hermite interpolation from exact values and slopes. Flat layout for the hot loop:
 * entry i at 2i holds G(c_i), at 2i + 1 holds h dG/dc(c_i) (slope times the step).
 */
export interface PressureTable {
  readonly cLo: number;
  readonly cHi: number;
  /** Intervals. */
  readonly intervals: number;
  /** 1 / step. */
  readonly inverseStep: number;
  readonly data: Float64Array;
}

/**
 * Builds the table. Interpolation error is below h^4 max|G''''| / 384; with
 * 256 intervals over the default band it is about 2e-12 (tested against the closed form).
 * @param cLo,cHi cosine range, -1 < cLo < cHi < 1 (the slope is singular at the poles).
 * @param intervals number of intervals, 1..65536.
 */
export function pressureTable(
  cLo: number,
  cHi: number,
  intervals: number,
  suctionFactor: number,
  wakePressureCoefficient: number,
): PressureTable {
  if (!(cLo > -1 && cHi < 1 && cLo < cHi)) {
    throw new RangeError(`pressure table range cos ${cLo} to ${cHi} must satisfy -1 < low < high < 1`);
  }
  if (!Number.isInteger(intervals) || intervals < 1 || intervals > 65536) {
    throw new RangeError(`pressure table intervals ${intervals} must be a whole number from 1 to 65536`);
  }
  const h = (cHi - cLo) / intervals;
  const data = new Float64Array(2 * (intervals + 1));
  for (let i = 0; i <= intervals; i++) {
    const c = i === intervals ? cHi : cLo + i * h;
    data[2 * i] = meridianPressureIntegral(Math.acos(c), suctionFactor, wakePressureCoefficient);
    data[2 * i + 1] = h * pressureIntegralSlopeInCos(c, suctionFactor, wakePressureCoefficient);
  }
  return { cLo, cHi, intervals, inverseStep: 1 / h, data };
}

/** G at c = cos theta_s from the table (c clamped to the table's range). */
export function pressureIntegralFromTable(table: PressureTable, c: number): number {
  let u = (c - table.cLo) * table.inverseStep;
  if (u < 0) u = 0;
  const last = table.intervals;
  let i = Math.floor(u);
  if (i >= last) i = last - 1;
  const t = u - i;
  const d = table.data;
  const g0 = d[2 * i], m0 = d[2 * i + 1], g1 = d[2 * i + 2], m1 = d[2 * i + 3];
  // cubic Hermite basis on [0, 1]
  const t2 = t * t;
  const t3 = t2 * t;
  return (2 * t3 - 3 * t2 + 1) * g0 + (t3 - 2 * t2 + t) * m0 + (-2 * t3 + 3 * t2) * g1 + (t3 - t2) * m1;
}
