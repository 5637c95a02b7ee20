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
 * seamInBand / 2 and the asymmetry has no Magnus component (alongMagnus = 0): the
 * time-averaged seam picture can only push along +-a, across the Magnus direction.
 *
 * The seam integral is the periodic trapezoid rule on the arc-length samples.
 */
import type { SeamSamples } from "../../geometry/seamSamples.js";
import type { Band } from "./band.js";

/** Below this k * rho a seam point is on the spin axis: it does not move (unit-sphere length). */
const ON_AXIS = 1e-12;
/** Samples between fresh arccos evaluations in the carried-angle recurrence. */
const RESEED = 32;
/**
 * Largest arcsin argument taken by the series x + x^3/6 + 3x^5/40 + 15x^7/336 + 105x^9/3456
 * (Abramowitz & Stegun 4.4.40); the first omitted term is below 1e-18 for |x| < 0.01.
 */
const SMALL_STEP = 0.01;
const ASIN3 = 1 / 6;
const ASIN5 = 3 / 40;
const ASIN7 = 15 / 336;
const ASIN9 = 105 / 3456;
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

/** arccos of x clamped to [-1, 1]. */
function acosClamped(x: number): number {
  return x <= -1 ? Math.PI : x >= 1 ? 0 : Math.acos(x);
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
  const pts = seam.points;
  const n = seam.count;
  const s = Math.sin(gyroRad);
  const k = Math.cos(gyroRad);
  const cosHi = Math.cos(band.centerRad - band.widthRad / 2); // upper limit of q . v
  const cosLo = Math.cos(band.centerRad + band.widthRad / 2); // lower limit of q . v
  const invPi = 1 / Math.PI;
  const kkOverS = s !== 0 ? (k * k) / s : 0; // cut = qw k / (s rho) = qw (k^2 / s) / (k rho)
  let inBand = 0;
  let plus = 0;
  let minus = 0;
  let axisMoment = 0; // sum of turn-averaged q . a over in-band time
  // carried arccos state for the two band limits (see the loop)
  let prevLower = 0, prevSLower = 0, prevALower = 0, runLower = 0;
  let prevUpper = 0, prevSUpper = 0, prevAUpper = 0, runUpper = 0;
  for (let i = 0; i < n; i++) {
    const qx = pts[3 * i];
    const qy = pts[3 * i + 1];
    const qz = pts[3 * i + 2];
    const qw = qx * wx + qy * wy + qz * wz;
    const rho2 = 1 - qw * qw;
    const rho = rho2 > 0 ? Math.sqrt(rho2) : 0;
    const r = k * rho;
    const centre = s * qw;
    if (r < ON_AXIS) {
      runLower = 0;
      runUpper = 0;
      if (centre >= cosLo && centre <= cosHi) {
        const qa = qw * k;
        inBand += 1;
        if (qa > SPLIT_TIE) plus += 1;
        else if (qa < -SPLIT_TIE) minus += 1;
        else {
          plus += 0.5;
          minus += 0.5;
        }
        axisMoment += qa;
      }
      continue;
    }
    const invR = 1 / r;
    const lower = (cosLo - centre) * invR;
    const upper = (cosHi - centre) * invR;
    if (lower >= 1 || upper <= -1) {
      runLower = 0;
      runUpper = 0;
      continue;
    }
    // arccos and sqrt(1 - x^2) of the clamped limits (pi, 0 and 0, 0 at the clamps).
    // Neighbouring seam samples have nearly equal limits, so the arccos is carried
    // from the previous sample by the angle-difference identity
    //   arccos x = arccos x' + arcsin(sqrt(1 - x^2) x' - x sqrt(1 - x'^2)),
    // with a short series for the small arcsin, and taken afresh at least every
    // RESEED samples, after any clamp, and whenever the step is not small.
    let aLower = Math.PI;
    let sLower = 0;
    if (lower > -1) {
      sLower = Math.sqrt((1 - lower) * (1 + lower));
      const d = sLower * prevLower - lower * prevSLower;
      if (runLower > 0 && d < SMALL_STEP && d > -SMALL_STEP) {
        const d2 = d * d;
        aLower = prevALower + d * (1 + d2 * (ASIN3 + d2 * (ASIN5 + d2 * (ASIN7 + d2 * ASIN9))));
        runLower--;
      } else {
        aLower = Math.acos(lower);
        runLower = RESEED;
      }
      prevLower = lower;
      prevSLower = sLower;
      prevALower = aLower;
    } else runLower = 0;
    let aUpper = 0;
    let sUpper = 0;
    if (upper < 1) {
      sUpper = Math.sqrt((1 - upper) * (1 + upper));
      const d = sUpper * prevUpper - upper * prevSUpper;
      if (runUpper > 0 && d < SMALL_STEP && d > -SMALL_STEP) {
        const d2 = d * d;
        aUpper = prevAUpper + d * (1 + d2 * (ASIN3 + d2 * (ASIN5 + d2 * (ASIN7 + d2 * ASIN9))));
        runUpper--;
      } else {
        aUpper = Math.acos(upper);
        runUpper = RESEED;
      }
      prevUpper = upper;
      prevSUpper = sUpper;
      prevAUpper = aUpper;
    } else runUpper = 0;
    const share = (aLower - aUpper) * invPi;
    const meanCos = (sLower - sUpper) * invPi;
    inBand += share;
    // turn average of q . a over in-band phases: qw k share - s rho meanCos
    axisMoment += qw * k * share - s * rho * meanCos;
    // side split: q . a > 0  <=>  s rho cos(phi') < qw k
    if (s === 0) {
      if (qw > SPLIT_TIE) plus += share;
      else if (qw < -SPLIT_TIE) minus += share;
      else {
        plus += 0.5 * share;
        minus += 0.5 * share;
      }
      continue;
    }
    const cut = qw * kkOverS * invR;
    // share with cos(phi') in [lower, min(upper, cut)]
    const lo = lower > -1 ? lower : -1;
    const hi = upper < 1 ? upper : 1;
    let below = 0;
    if (cut > lo) below = cut >= hi ? share : (aLower - acosClamped(cut)) * invPi;
    if (s > 0) {
      plus += below;
      minus += share - below;
    } else {
      minus += below;
      plus += share - below;
    }
  }
  const w = 1 / n;
  out.seamInBand = inBand * w;
  out.axisPlus = plus * w;
  out.axisMinus = minus * w;
  out.magnusPlus = 0.5 * out.seamInBand;
  out.magnusMinus = 0.5 * out.seamInBand;
  out.alongAxis = -axisMoment * w;
  out.alongMagnus = 0;
  out.magnitude = Math.abs(out.alongAxis);
  return out;
}
