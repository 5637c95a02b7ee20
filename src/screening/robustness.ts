/**
 * Robustness of an orientation to release scatter of the spin axis on the ball.
 *
 * Model: the spin axis's pierce point wanders on the ball by an isotropic 2-D
 * Gaussian in the tangent plane with standard deviation `spreadRad` per direction.
 * Default 5 deg per direction (common practice, no source: pitch-to-pitch spin-axis
 * scatter of a repeatable delivery is a few degrees; the ball's set in the hand
 * varies by about as much).
 *
 * Quadrature: deterministic, equal weights, SCATTER_SAMPLES points of a Fibonacci
 * lattice on the unit square (u_j = (j + 1/2) / N, v_j = frac(j phi), phi the golden
 * ratio) mapped to the Gaussian by the inverse Rayleigh CDF, r = spread sqrt(-2 ln(1 - u)),
 * at angle 2 pi v. The same points every run, so results are reproducible. The report
 * gives the mean score and its 10th percentile (linear interpolation between order
 * statistics at rank 0.1 (N - 1)).
 */
import { perpendicularUnit, type Vec3 } from "../../geometry/vec.js";

export const SCATTER_SAMPLES = 64;
export const DEFAULT_SPREAD_DEG = 5;
const GOLDEN = (1 + Math.sqrt(5)) / 2;

export interface Robustness {
  /** Mean score under scatter. */
  readonly mean: number;
  /** 10th-percentile score under scatter. */
  readonly p10: number;
}

/** The scattered axes around unit `axis` (flat, 3 * SCATTER_SAMPLES). */
export function scatterAxes(axis: Readonly<Vec3>, spreadRad: number, count = SCATTER_SAMPLES): Float64Array {
  const e1 = perpendicularUnit(axis);
  const e2: Vec3 = [axis[1] * e1[2] - axis[2] * e1[1], axis[2] * e1[0] - axis[0] * e1[2], axis[0] * e1[1] - axis[1] * e1[0]];
  const out = new Float64Array(3 * count);
  for (let j = 0; j < count; j++) {
    const u = (j + 0.5) / count;
    const v = (j / GOLDEN) % 1;
    const r = spreadRad * Math.sqrt(-2 * Math.log(1 - u));
    const phi = 2 * Math.PI * v;
    // move by angle r along the great circle toward cos(phi) e1 + sin(phi) e2
    const dx = Math.cos(phi) * e1[0] + Math.sin(phi) * e2[0];
    const dy = Math.cos(phi) * e1[1] + Math.sin(phi) * e2[1];
    const dz = Math.cos(phi) * e1[2] + Math.sin(phi) * e2[2];
    const c = Math.cos(r);
    const s = Math.sin(r);
    out[3 * j] = c * axis[0] + s * dx;
    out[3 * j + 1] = c * axis[1] + s * dy;
    out[3 * j + 2] = c * axis[2] + s * dz;
  }
  return out;
}

/** Mean and 10th percentile of `score` over the scatter of `axis`. */
export function robustness(axis: Readonly<Vec3>, spreadRad: number, score: (x: number, y: number, z: number) => number): Robustness {
  if (!(spreadRad >= 0)) throw new RangeError(`scatter spread ${spreadRad} rad must be zero or positive`);
  const pts = scatterAxes(axis, spreadRad);
  const values = new Float64Array(SCATTER_SAMPLES);
  let sum = 0;
  for (let j = 0; j < SCATTER_SAMPLES; j++) {
    values[j] = score(pts[3 * j], pts[3 * j + 1], pts[3 * j + 2]);
    sum += values[j];
  }
  values.sort();
  const rank = 0.1 * (SCATTER_SAMPLES - 1);
  const lo = Math.floor(rank);
  const p10 = values[lo] + (rank - lo) * (values[lo + 1] - values[lo]);
  return { mean: sum / SCATTER_SAMPLES, p10 };
}
