/**
 * The exact time-averaged separation-band sampler.
 *
 * Work in the ball frame, where the seam is fixed and the flow turns. The spin
 * axis is the unit vector w (ball frame); s = sin(gyro), k = cos(gyro). Over one
 * revolution the stagnation direction v traces the circle
 *     v(phi) = s w + k (cos phi e1 - sin phi e2),   e2 = w x e1,
 * so for a seam point q with qw = q . w and rho = |q - qw w|,
 *     q . v = s qw + k rho cos(phi'),    phi' = phi - psi_q (psi_q: q's own phase).
 * The band condition cos(theta2) <= q . v <= cos(theta1) is cos(phi') in [L, U] with
 *     L = (cos theta2 - s qw) / (k rho),  U = (cos theta1 - s qw) / (k rho),
 * and the set of phases where it holds is phi' in +-[arccos U, arccos L], hence
 *     share of the turn in band      = (arccos L - arccos U) / pi            (clamped to [-1, 1])
 *     turn-average of cos(phi') there = (sqrt(1 - L^2) - sqrt(1 - U^2)) / pi.
 * The flow-fixed split vector a = (w - s v) / k gives q . a = qw k - s rho cos(phi'),
 * so each side is again an interval of cos(phi') (cut at K = qw k / (s rho)).
 *
 * The Magnus split m = w x v / |w x v| gives q . m = rho sin(psi_q - phi): odd about
 * phi' = 0, while the band set is even. Hence, exactly, magnusPlus = magnusMinus =
 * seamInBand / 2 and the occupancy asymmetry has no Magnus component (alongMagnus = 0):
 * the turn-averaged band occupancy splits only along +-a. (It is seam occupancy, not
 * the push: the seam-force model, src/physics/seamModel/, gives a force along both.)
 *
 * The seam integral is the periodic trapezoid rule on the arc-length samples.
 *
 * Evaluation (about 15 ns per seam point; all to about 1e-16 per point):
 * - Only differences of arccosines are needed. With L, U clamped to [-1, 1] and
 *   sL = sqrt(1 - L^2), sU = sqrt(1 - U^2), the angle arccos L - arccos U (in [0, pi])
 *   has cosine L U + sL sU and sine sL U - L sU, so one arccos-from-cosine-and-sine per
 *   point gives the share; the side cut (arccos L - arccos K) works the same way.
 * - That arccos comes from a 768-entry table of exact angles (ARC_TABLE) and the
 *   angle-difference identity: arcsin of sin(theta - theta_j), below 0.003, by its
 *   series to the 5th power (omitted terms below 1e-19). No Math.acos calls, no
 *   state carried from sample to sample.
 * - L, U and the side cut are computed with exactly the operations of the direct
 *   formulas above: near the clamps arccos has an infinite slope, so a different
 *   rounding of L could move a share by 1e-8.
 * - The loop is software-pipelined: each pass computes the height and radius of the
 *   point two ahead, the limits and their square roots for the point one ahead, and
 *   the angle and the sums for the current point. The chain of three square roots and
 *   a division per point is long; interleaving three independent points keeps the
 *   processor busy (the straight loop ran at about 22 ns per point, this one at 15).
 */
import type { SeamSamples } from "../../geometry/seamSamples.js";
import type { Band } from "./band.js";
import { DEG } from "../../geometry/units.js";

/** Below this k * rho a seam point is on the spin axis: it does not move (unit-sphere length). */
const ON_AXIS = 1e-12;
/** |q . a| below this counts as on the split plane: half to each side (keeps symmetric sums exact). */
export const SPLIT_TIE = 1e-12;

export interface BandAverages {
  /** Turn-averaged share of the seam length inside the band, 0..1. */
  seamInBand: number;
  /** The same, restricted to q . a > 0. */
  axisPlus: number;
  /** The same, restricted to q . a < 0. */
  axisMinus: number;
  /** The same, restricted to q . m > 0 (always seamInBand / 2). */
  magnusPlus: number;
  /** The same, restricted to q . m < 0 (always seamInBand / 2). */
  magnusMinus: number;
  /** Asymmetry vector's component along a (unit-sphere length). */
  alongAxis: number;
  /** Asymmetry vector's component along m (exactly 0, see the header). */
  alongMagnus: number;
  /** |asymmetry vector|. */
  magnitude: number;
}

export function emptyAverages(): BandAverages {
  return { seamInBand: 0, axisPlus: 0, axisMinus: 0, magnusPlus: 0, magnusMinus: 0, alongAxis: 0, alongMagnus: 0, magnitude: 0 };
}

/**
 * Table for theta = arccos(c) given c = cos theta and s = sin theta >= 0 (c^2 + s^2 = 1).
 * Central part, used when s >= sqrt(7)/4 (|c| <= 3/4): entry j at 4j holds
 *     c_j = j/256 - 1 (exact), sin theta_j, theta_j = arccos c_j,
 * and theta = theta_j + arcsin(s c_j - c sin theta_j), j = round(256 (c + 1)).
 * Outer part (s < sqrt(7)/4, theta within 41.4 deg of 0 or pi): entry k at ARC_OUTER + 4k holds
 *     sigma_k = k/256 (exact), cos b_k, b_k = arcsin sigma_k, pi - b_k,
 * and theta = b_k + arcsin(s cos b_k - c sigma_k) for c > 0,
 *     theta = (pi - b_k) - arcsin(s cos b_k + c sigma_k) for c <= 0,   k = round(256 s).
 * Either way the arcsin argument is below 0.003 in magnitude.
 */
const ARC_STEPS = 256;
const ARC_OUTER = 2560;
const ARC_TABLE = new Float64Array(4096);
for (let j = 0; j < 2 * ARC_STEPS; j++) {
  const c = j / ARC_STEPS - 1;
  ARC_TABLE[4 * j] = c;
  ARC_TABLE[4 * j + 1] = Math.sqrt((1 - c) * (1 + c));
  ARC_TABLE[4 * j + 2] = Math.acos(c);
}
for (let k = 0; k < ARC_STEPS; k++) {
  const sigma = k / ARC_STEPS;
  ARC_TABLE[ARC_OUTER + 4 * k] = sigma;
  ARC_TABLE[ARC_OUTER + 4 * k + 1] = Math.sqrt((1 - sigma) * (1 + sigma));
  ARC_TABLE[ARC_OUTER + 4 * k + 2] = Math.asin(sigma);
  ARC_TABLE[ARC_OUTER + 4 * k + 3] = Math.PI - Math.asin(sigma);
}

/**
 * Constants the loop reads once into locals (literals would be rematerialised by the
 * compiler at every use): the central-part bound sqrt(1 - (3/4)^2), the table scale and offsets,
 * the arcsin series coefficients 1/6 and 3/40 (Abramowitz & Stegun 4.4.40), 1/pi, ...
 */
const CONSTANTS = new Float64Array([
  Math.sqrt(1 - 0.75 * 0.75),
  ARC_STEPS,
  ARC_STEPS + 0.5,
  0.5,
  1 / 6,
  3 / 40,
  1 / Math.PI,
  ON_AXIS,
  SPLIT_TIE,
  1,
  -1,
  0,
]);

/**
 * Inputs of accumulate() (wx, wy, wz, s, k, cos theta2, cos theta1, k^2 / s) and its
 * outputs (in band, plus side, minus side, sum of turn-averaged q . a). Passing them
 * through a typed array gives the loop untagged doubles.
 */
const IO = new Float64Array(12);

/** The sums over the seam for the inputs in IO[0..7]; writes IO[8..11]. */
function accumulate(pts: Float64Array, n: number): void {
  const wx = IO[0], wy = IO[1], wz = IO[2], s = IO[3], k = IO[4], cosLo = IO[5], cosHi = IO[6], kkOverS = IO[7];
  const sCentral = CONSTANTS[0], scale = CONSTANTS[1], centralOffset = CONSTANTS[2], half = CONSTANTS[3];
  const c3 = CONSTANTS[4], c5 = CONSTANTS[5], invPi = CONSTANTS[6], onAxis = CONSTANTS[7], tie = CONSTANTS[8];
  const one = CONSTANTS[9], minusOne = CONSTANTS[10], zero = CONSTANTS[11];
  const count = n | 0;
  const end = 3 * count;
  let inBand = 0;
  let plus = 0;
  let minus = 0;
  let axisMoment = 0; // sum of turn-averaged q . a over in-band time
  // pipeline registers: stage 1 (height, radius) of the point after next
  let p1 = 0;
  let qw1 = 0, rho1 = 0;
  // stage 2 (limits) of the next point
  let qw2 = 0, rho2 = 0, r2 = 0, lower2 = 0, upper2 = 0, lo2 = 0, hi2 = 0, sLo2 = 0, sHi2 = 0, cos2 = 0, sin2 = 0, cut2 = 0;
  for (let i = -2; i < count; i++) {
    // the current point, from stage 2 of the previous pass
    const qw = qw2, rho = rho2, r = r2, lower = lower2, upper = upper2, lo = lo2, hi = hi2;
    const sLo = sLo2, sHi = sHi2, cosA = cos2, sinA = sin2, cut = cut2;
    {
      // stage 2 for point i + 1: limits L, U (clamped: lo, hi), their sines, the angle's cosine and sine
      const rN = k * rho1;
      const invR = one / rN;
      const centre = s * qw1;
      const lN = (cosLo - centre) * invR;
      const uN = (cosHi - centre) * invR;
      let loN = minusOne, sLoN = zero;
      if (lN > minusOne) {
        loN = lN;
        sLoN = Math.sqrt((one - lN) * (one + lN));
      }
      let hiN = one, sHiN = zero;
      if (uN < one) {
        hiN = uN;
        sHiN = Math.sqrt((one - uN) * (one + uN));
      }
      qw2 = qw1;
      rho2 = rho1;
      r2 = rN;
      lower2 = lN;
      upper2 = uN;
      lo2 = loN;
      hi2 = hiN;
      sLo2 = sLoN;
      sHi2 = sHiN;
      cos2 = loN * hiN + sLoN * sHiN;
      sin2 = sLoN * hiN - loN * sHiN;
      cut2 = qw1 * kkOverS * invR;
      // stage 1 for point i + 2 (wrapping round at the end; those values are never used)
      const q = pts[p1] * wx + pts[p1 + 1] * wy + pts[p1 + 2] * wz;
      const rr = one - q * q;
      rho1 = rr > 0 ? Math.sqrt(rr) : 0;
      qw1 = q;
      p1 += 3;
      if (p1 >= end) p1 = 0;
    }
    if (i < 0) continue;
    // stage 3 for point i
    if (r < onAxis) {
      const centre = s * qw;
      if (centre >= cosLo && centre <= cosHi) {
        const qa = qw * k;
        inBand += 1;
        if (qa > tie) plus += 1;
        else if (qa < -tie) minus += 1;
        else {
          plus += 0.5;
          minus += 0.5;
        }
        axisMoment += qa;
      }
      continue;
    }
    if (lower >= one || upper <= minusOne) continue;
    // a = arccos lo - arccos hi from its cosine and sine (see ARC_TABLE)
    let a: number;
    if (sinA >= sCentral) {
      const j = (((cosA * scale + centralOffset) | 0) << 2) & 2047;
      const d = sinA * ARC_TABLE[j] - cosA * ARC_TABLE[j + 1];
      const d2 = d * d;
      a = ARC_TABLE[j + 2] + (d + d * d2 * (c3 + d2 * c5));
    } else {
      const j = ((((sinA * scale + half) | 0) << 2) & 1023) + ARC_OUTER;
      if (cosA > 0) {
        const d = sinA * ARC_TABLE[j + 1] - cosA * ARC_TABLE[j];
        const d2 = d * d;
        a = ARC_TABLE[j + 2] + (d + d * d2 * (c3 + d2 * c5));
      } else {
        const d = sinA * ARC_TABLE[j + 1] + cosA * ARC_TABLE[j];
        const d2 = d * d;
        a = ARC_TABLE[j + 3] - (d + d * d2 * (c3 + d2 * c5));
      }
    }
    const share = a * invPi;
    const meanCos = (sLo - sHi) * invPi;
    inBand += share;
    // turn average of q . a over in-band phases: qw k share - s rho meanCos
    axisMoment += qw * k * share - s * rho * meanCos;
    // side split: q . a > 0  <=>  s rho cos(phi') < qw k
    if (s === 0) {
      if (qw > tie) plus += share;
      else if (qw < -tie) minus += share;
      else {
        plus += 0.5 * share;
        minus += 0.5 * share;
      }
      continue;
    }
    // share with cos(phi') in [lo, min(hi, cut)]: (arccos lo - arccos cut) / pi, the same way as a
    let below = 0;
    if (cut > lo) {
      if (cut >= hi) below = share;
      else {
        const sCut = Math.sqrt((one - cut) * (one + cut));
        const cosB = lo * cut + sLo * sCut;
        const sinB = sLo * cut - lo * sCut;
        let b: number;
        if (sinB >= sCentral) {
          const j = (((cosB * scale + centralOffset) | 0) << 2) & 2047;
          const d = sinB * ARC_TABLE[j] - cosB * ARC_TABLE[j + 1];
          const d2 = d * d;
          b = ARC_TABLE[j + 2] + (d + d * d2 * (c3 + d2 * c5));
        } else {
          const j = ((((sinB * scale + half) | 0) << 2) & 1023) + ARC_OUTER;
          if (cosB > 0) {
            const d = sinB * ARC_TABLE[j + 1] - cosB * ARC_TABLE[j];
            const d2 = d * d;
            b = ARC_TABLE[j + 2] + (d + d * d2 * (c3 + d2 * c5));
          } else {
            const d = sinB * ARC_TABLE[j + 1] + cosB * ARC_TABLE[j];
            const d2 = d * d;
            b = ARC_TABLE[j + 3] - (d + d * d2 * (c3 + d2 * c5));
          }
        }
        below = b * invPi;
      }
    }
    if (s > 0) {
      plus += below;
      minus += share - below;
    } else {
      minus += below;
      plus += share - below;
    }
  }
  IO[8] = inBand;
  IO[9] = plus;
  IO[10] = minus;
  IO[11] = axisMoment;
}

/**
 * Exact turn-averaged band occupancy for one spin axis.
 * @param seam arc-length samples of the seam (ball frame)
 * @param wx,wy,wz spin axis in the ball frame, unit length (the caller normalises), positive end by the right-hand rule
 * @param gyroRad gyro angle, |gyro| < pi/2; positive when the axis's positive end leans toward the flight direction
 * @param band separation band
 * @param out result record, overwritten and returned
 */
export function bandAveragesExact(
  seam: SeamSamples,
  wx: number,
  wy: number,
  wz: number,
  gyroRad: number,
  band: Band,
  out: BandAverages = emptyAverages(),
): BandAverages {
  if (!warmedUp) warmUp();
  const n = seam.count;
  const s = Math.sin(gyroRad);
  const k = Math.cos(gyroRad);
  IO[0] = wx;
  IO[1] = wy;
  IO[2] = wz;
  IO[3] = s;
  IO[4] = k;
  IO[5] = Math.cos(band.centerRad + band.widthRad / 2); // lower limit of q . v
  IO[6] = Math.cos(band.centerRad - band.widthRad / 2); // upper limit of q . v
  IO[7] = s !== 0 ? (k * k) / s : 0; // cut = qw k / (s rho) = qw (k^2 / s) / (k rho)
  IO[8] = IO[9] = IO[10] = IO[11] = 0;
  if (n > 0) accumulate(seam.points, n);
  const w = 1 / n;
  out.seamInBand = IO[8] * w;
  out.axisPlus = IO[9] * w;
  out.axisMinus = IO[10] * w;
  out.magnusPlus = 0.5 * out.seamInBand;
  out.magnusMinus = 0.5 * out.seamInBand;
  out.alongAxis = -IO[11] * w;
  out.alongMagnus = 0;
  out.magnitude = Math.abs(out.alongAxis);
  return out;
}

/**
 * Runs accumulate() on a small synthetic seam that takes every branch, at load time.
 * V8 allocates a function's type feedback only after several calls; compiled during
 * its first long call, accumulate() would lack feedback for the code before and after
 * the loop and for rare branches, give up its optimised code at the next call, and
 * from then on enter the loop through on-stack replacement, whose code keeps the
 * loop's doubles boxed (2 to 3 times slower). 26 calls on at most 16 points take
 * about a millisecond and leave complete feedback. Done on the first call, not at
 * import, so loading the module has no side effect.
 */
let warmedUp = false;

function warmUp(): void {
  warmedUp = true;
  // points in the x-z plane at heights z (the axis is z): poles, the equator, both hemispheres
  const heights = [1, -1, 0, 0.999, -0.999, 0.9, -0.9, 0.6, -0.6, 0.3, -0.3, 0.1, -0.1, 0.02, -0.02, 0.5];
  const pts = new Float64Array(3 * heights.length);
  heights.forEach((z, i) => {
    pts[3 * i] = Math.sqrt((1 - z) * (1 + z));
    pts[3 * i + 2] = z;
  });
  const run = (gyroRad: number, fromDeg: number, toDeg: number, points: number): void => {
    const s = Math.sin(gyroRad);
    const k = Math.cos(gyroRad);
    IO[0] = 0;
    IO[1] = 0;
    IO[2] = 1;
    IO[3] = s;
    IO[4] = k;
    IO[5] = Math.cos(toDeg * DEG);
    IO[6] = Math.cos(fromDeg * DEG);
    IO[7] = s !== 0 ? (k * k) / s : 0;
    accumulate(pts, points);
  };
  for (let i = 0; i < 8; i++) run(0.3, 80, 120, 2);
  // every branch: on the axis (poles; gyro 90 deg puts every point there), outside the band,
  // either limit clamped, both table regions, both gyro signs and zero, all side-split cases
  for (const g of [0, 0.75, -0.75, 1.2, -1.2, Math.PI / 2]) {
    for (const [fromDeg, toDeg] of [
      [20, 150],
      [89, 91],
      [80, 120],
    ]) {
      run(g, fromDeg, toDeg, heights.length);
    }
  }
}
