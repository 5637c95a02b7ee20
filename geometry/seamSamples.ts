/**
 * The seam resampled uniformly by arc length (ball frame, unit sphere; see seamCurve.ts).
 *
 * Sample i sits at arc length s_i = i L / N from c(0) = +x, in the direction of
 * increasing t. With N a multiple of 4 the sample set is mapped onto itself by
 * every symmetry of the curve (a quarter-period shift is the rotoreflection
 * (x, y, z) -> (-y, x, -z); t -> -t is the half-turn about x), so symmetric
 * orientations give identical sums, not just nearly identical ones.
 * Equal weights L / N make every seam integral the periodic trapezoid rule.
 */
import { assertSeamShape, seamPoint, seamSpeed, seamTangent } from "./seamCurve.js";

/** Seam points per ball used unless the caller asks otherwise (set by the convergence study in DEVELOPERS.md). */
export const DEFAULT_SEAM_POINTS = 2048;
/** Accepted range of seam point counts. */
export const SEAM_POINTS_RANGE: readonly [number, number] = [64, 262144];

/** Panels of the arc-length table per revolution of t. */
const TABLE_PANELS = 2048;
/** Newton tolerance on arc length, unit-sphere lengths. */
const ARC_TOLERANCE = 1e-14;
const MAX_NEWTON_STEPS = 30;

/** 5-point Gauss-Legendre nodes and weights on [-1, 1] (Abramowitz & Stegun, Table 25.4). */
const GL_X = [0, -0.5384693101056831, 0.5384693101056831, -0.906179845938664, 0.906179845938664];
const GL_W = [0.5688888888888889, 0.4786286704993665, 0.4786286704993665, 0.2369268850561891, 0.2369268850561891];

function arcOnInterval(b: number, t0: number, t1: number): number {
  const mid = 0.5 * (t0 + t1);
  const half = 0.5 * (t1 - t0);
  let sum = 0;
  for (let k = 0; k < 5; k++) sum += GL_W[k] * seamSpeed(b, mid + half * GL_X[k]);
  return sum * half;
}

/** Length of the whole seam on the unit sphere (composite Gauss-Legendre, about 1e-15 relative). */
export function seamLength(b: number): number {
  assertSeamShape(b);
  const dt = (2 * Math.PI) / TABLE_PANELS;
  let sum = 0;
  let comp = 0;
  for (let k = 0; k < TABLE_PANELS; k++) {
    // Kahan summation keeps the long sum at double precision.
    const y = arcOnInterval(b, k * dt, (k + 1) * dt) - comp;
    const next = sum + y;
    comp = next - sum - y;
    sum = next;
  }
  return sum;
}

export interface SeamSamples {
  /** Shape parameter b. */
  readonly shape: number;
  /** Number of samples N. */
  readonly count: number;
  /** Seam length L on the unit sphere. */
  readonly length: number;
  /** Unit positions, flat: point i at [3i, 3i+1, 3i+2]. */
  readonly points: Float64Array;
  /** Unit tangents (direction of increasing t), flat like `points`. */
  readonly tangents: Float64Array;
  /** Curve parameter t of each sample, radians in [0, 2 pi). */
  readonly params: Float64Array;
}

/** Throws RangeError unless `n` is an accepted seam point count. */
export function assertSeamPointCount(n: number): void {
  if (!Number.isInteger(n) || n < SEAM_POINTS_RANGE[0] || n > SEAM_POINTS_RANGE[1] || n % 4 !== 0) {
    throw new RangeError(
      `seam points ${n} must be a whole number from ${SEAM_POINTS_RANGE[0]} to ${SEAM_POINTS_RANGE[1]} divisible by 4 (so the ball's symmetries stay exact)`,
    );
  }
}

/**
 * Samples the seam at N points equally spaced in arc length.
 * @param b seam shape, 0 < b < 1/2
 * @param n number of samples, a multiple of 4
 * @param offset where sample 0 sits, as a fraction of one spacing (0 puts it at +x; 0.5 is the midpoint rule)
 */
export function sampleSeam(b: number, n: number = DEFAULT_SEAM_POINTS, offset = 0): SeamSamples {
  assertSeamShape(b);
  assertSeamPointCount(n);
  const dt = (2 * Math.PI) / TABLE_PANELS;
  const cumulative = new Float64Array(TABLE_PANELS + 1);
  for (let k = 0; k < TABLE_PANELS; k++) {
    cumulative[k + 1] = cumulative[k] + arcOnInterval(b, k * dt, (k + 1) * dt);
  }
  const length = cumulative[TABLE_PANELS];
  const points = new Float64Array(3 * n);
  const tangents = new Float64Array(3 * n);
  const params = new Float64Array(n);
  let panel = 0;
  for (let i = 0; i < n; i++) {
    const target = ((i + offset) * length) / n;
    while (panel < TABLE_PANELS - 1 && cumulative[panel + 1] < target) panel++;
    const t0 = panel * dt;
    // Newton on s(t) - target, started by linear interpolation inside the panel.
    const span = cumulative[panel + 1] - cumulative[panel];
    let t = t0 + (dt * (target - cumulative[panel])) / span;
    let converged = false;
    for (let step = 0; step < MAX_NEWTON_STEPS; step++) {
      const s = cumulative[panel] + arcOnInterval(b, t0, t);
      const err = s - target;
      t -= err / seamSpeed(b, t);
      if (Math.abs(err) < ARC_TOLERANCE) {
        converged = true;
        break;
      }
    }
    if (!converged) throw new Error(`arc-length inversion did not converge at sample ${i} (b = ${b}, N = ${n})`);
    params[i] = t;
    seamPoint(b, t, points, 3 * i);
    seamTangent(b, t, tangents, 3 * i);
    const tx = tangents[3 * i];
    const ty = tangents[3 * i + 1];
    const tz = tangents[3 * i + 2];
    const len = Math.hypot(tx, ty, tz);
    tangents[3 * i] = tx / len;
    tangents[3 * i + 1] = ty / len;
    tangents[3 * i + 2] = tz / len;
  }
  return { shape: b, count: n, length, points, tangents, params };
}
