/**
 * One seam orientation fitted jointly to all throws of one pitch type (a pitcher's
 * sinker, say).
 *
 * Each throw i has its own speed, spin, tilt and gyro, so its own residual R_i, unit
 * movements J_i = [J_a,i J_m,i] and coefficients c(o, g_i) (explain.ts). One
 * orientation o (a place on the ball, up to the ball's rotations) for them all:
 *     fit error(o) = sqrt( (1/n) sum_i |R_i - J_i c(o, g_i)|^2 )      (root mean square)
 * A single throw gives two numbers for an orientation's two degrees of freedom, so a
 * whole curve of orientations fits it; throws that differ in gyro and spin direction
 * cut those curves at different angles and pin the orientation down.
 *
 * Steps: the sums per orientation of the set come from the rows as they stream
 * (Explainer.explainWith, merged across workers); the best distinct orientations are
 * taken from them (Explainer.distinctBest: at least 2.5 grid spacings apart up to the
 * ball's proper rotations, since only those leave this model unchanged; a mirror image
 * reverses the Magnus part and is a different answer); each is then refined off the
 * grid by a compass search on the sphere over a sample of the throws (REFINE_THROWS,
 * a fixed-seed reservoir: memory stays bounded however many rows), with the
 * coefficients from the model at the gyro keys the throws need, interpolated as the
 * maps are (explainMaps.ts coefficientAt).
 *
 * Reach: with R the mean residual and S(o) the mean seam movement of orientation o,
 * the most any orientation gives along R is max_o S(o) . R/|R|; the pitch type's
 * residual is beyond reach when |R| exceeds that by more than REACH_MARGIN_M.
 */
import { DEG } from "../../geometry/units.js";
import { cross3, unit3, type Vec3 } from "../../geometry/vec.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { REACH_MARGIN_M, type Explainer, type OrientationSums, type ThrowFitData, emptySums, addSums } from "./explain.js";
import { gyroKeys, gyroOfKey } from "./explainMaps.js";
import { turnAverage } from "./seamModel/turn.js";

/** Throws kept per pitch type for the refinement (a reservoir sample beyond that). */
const REFINE_THROWS = 400;
/** Compass search: first step (grid spacings), smallest step (rad), most evaluations. */
const REFINE_FIRST_STEP = 0.5;
const REFINE_MIN_STEP_RAD = 0.1 * DEG;
const REFINE_MAX_EVALUATIONS = 40;
const PROPER_ROTATIONS = SEAM_SYMMETRIES.filter((g) => g.proper);

/** The running numbers of one pitch type. */
export class PitchTypeAccumulator {
  readonly sums: OrientationSums;
  rows = 0;
  private sumX = 0;
  private sumZ = 0;
  private sumXX = 0;
  private sumZZ = 0;
  readonly sample: ThrowFitData[] = [];
  private seed = 0x9e3779b9;

  constructor(orientations: number) {
    this.sums = emptySums(orientations);
  }

  /** Adds one throw's numbers (its per-orientation sums are added separately with addSums). */
  addThrow(t: ThrowFitData): void {
    this.rows++;
    this.sumX += t.residualArmSideM;
    this.sumZ += t.residualUpM;
    this.sumXX += t.residualArmSideM * t.residualArmSideM;
    this.sumZZ += t.residualUpM * t.residualUpM;
    if (this.sample.length < REFINE_THROWS) this.sample.push(t);
    else {
      // reservoir sampling (Vitter's algorithm R) with a fixed-seed generator: the same file gives the same sample
      this.seed = (Math.imul(this.seed, 1664525) + 1013904223) >>> 0;
      const j = Math.floor((this.seed / 4294967296) * this.rows);
      if (j < REFINE_THROWS) this.sample[j] = t;
    }
  }

  addSums(from: OrientationSums): void {
    addSums(this.sums, from);
  }

  /** Mean and standard deviation (population) of the residual, m. */
  residual(): { armSideM: number; upM: number; sdArmSideM: number; sdUpM: number } {
    const n = Math.max(1, this.rows);
    const mx = this.sumX / n;
    const mz = this.sumZ / n;
    return {
      armSideM: mx,
      upM: mz,
      sdArmSideM: Math.sqrt(Math.max(0, this.sumXX / n - mx * mx)),
      sdUpM: Math.sqrt(Math.max(0, this.sumZZ / n - mz * mz)),
    };
  }
}

export interface FittedOrientation {
  /** Unit axis, ball frame (refined off the grid). */
  readonly axis: Vec3;
  /** Root-mean-square fit error over the throws used, m. */
  readonly fitErrorM: number;
  /** The grid's own root-mean-square error at its cell, over all throws, m. */
  readonly gridFitErrorM: number;
  /** Mean seam movement of the orientation over the throws used, m. */
  readonly seamArmSideM: number;
  readonly seamUpM: number;
}

export interface PitchTypeFit {
  readonly rows: number;
  readonly orientations: readonly FittedOrientation[];
  readonly residual: { armSideM: number; upM: number; sdArmSideM: number; sdUpM: number };
  /** The most any orientation gives along the mean residual, m. */
  readonly reachM: number;
  readonly beyondReach: boolean;
}

/** The mean of |R_i - J_i c(axis, g_i)|^2 over `throws` and the mean seam movement (coefficients from the model). */
function throwError(explainer: Explainer, axis: Vec3, throws: readonly ThrowFitData[]): { e2: number; sx: number; sz: number } {
  const cache = new Map<number, { across: number; alongMagnus: number }>();
  const at = (key: number) => {
    let c = cache.get(key);
    if (!c) {
      const t = turnAverage(explainer.model, axis, gyroOfKey(key));
      c = { across: t.across, alongMagnus: t.alongMagnus };
      cache.set(key, c);
    }
    return c;
  };
  let e2 = 0, sx = 0, sz = 0;
  for (const t of throws) {
    const { k0, f } = gyroKeys(t.gyroRad);
    const c0 = at(k0);
    let ca = c0.across, cm = c0.alongMagnus;
    if (f > 0) {
      const c1 = at(k0 + 1);
      ca = (1 - f) * ca + f * c1.across;
      cm = (1 - f) * cm + f * c1.alongMagnus;
    }
    const x = ca * t.unitA.armSideM + cm * t.unitM.armSideM;
    const z = ca * t.unitA.upM + cm * t.unitM.upM;
    e2 += (t.residualArmSideM - x) ** 2 + (t.residualUpM - z) ** 2;
    sx += x;
    sz += z;
  }
  const n = Math.max(1, throws.length);
  return { e2: e2 / n, sx: sx / n, sz: sz / n };
}

/** Turns `axis` by `angle` toward the tangent direction `dir` (both unit, dir perpendicular to axis). */
function step(axis: Vec3, dir: Vec3, angle: number): Vec3 {
  const c = Math.cos(angle), s = Math.sin(angle);
  return unit3([c * axis[0] + s * dir[0], c * axis[1] + s * dir[1], c * axis[2] + s * dir[2]]);
}

/** Compass search on the sphere from `start` (see the header). */
function refine(explainer: Explainer, start: Vec3, throws: readonly ThrowFitData[]): { axis: Vec3; e2: number; sx: number; sz: number } {
  let axis = start;
  let best = throwError(explainer, axis, throws);
  let h = REFINE_FIRST_STEP * explainer.set.grid.spacingRad;
  let evaluations = 1;
  while (h >= REFINE_MIN_STEP_RAD && evaluations < REFINE_MAX_EVALUATIONS) {
    const helper: Vec3 = Math.abs(axis[2]) < 0.9 ? [0, 0, 1] : [1, 0, 0];
    const u = unit3(cross3(axis, helper));
    const v = unit3(cross3(axis, u));
    let moved = false;
    for (const d of [u, v, [-u[0], -u[1], -u[2]] as Vec3, [-v[0], -v[1], -v[2]] as Vec3]) {
      const trial = step(axis, d, h);
      const r = throwError(explainer, trial, throws);
      evaluations++;
      if (r.e2 < best.e2) {
        axis = trial;
        best = r;
        moved = true;
        break;
      }
      if (evaluations >= REFINE_MAX_EVALUATIONS) break;
    }
    if (!moved) h /= 2;
  }
  return { axis, ...best };
}

/** The smallest angle between a and any proper rotation of b, rad. */
function properAngle(a: Readonly<Vec3>, b: Readonly<Vec3>): number {
  let best = Infinity;
  for (const g of PROPER_ROTATIONS) {
    const c = applySymmetry(g, b);
    const x = cross3(a as Vec3, c);
    best = Math.min(best, Math.atan2(Math.hypot(x[0], x[1], x[2]), a[0] * c[0] + a[1] * c[1] + a[2] * c[2]));
  }
  return best;
}

/**
 * The best `top` distinct orientations for one pitch type, refined, with the residual's
 * mean and spread and whether it lies beyond the seams' reach (see the header).
 */
export function fitPitchType(explainer: Explainer, acc: PitchTypeAccumulator, top = explainer.top): PitchTypeFit {
  const s = acc.sums;
  const n = Math.max(1, s.count);
  const rms = new Float64Array(s.errorSquared.length);
  for (let k = 0; k < rms.length; k++) rms[k] = Math.sqrt(s.errorSquared[k] / n);
  const picked = explainer.distinctBest(rms, top);
  const refined = picked.map((k) => {
    const r = refine(explainer, explainer.axisOf(k), acc.sample);
    return { axis: r.axis, fitErrorM: Math.sqrt(r.e2), gridFitErrorM: rms[k], seamArmSideM: r.sx, seamUpM: r.sz };
  });
  refined.sort((a, b) => a.fitErrorM - b.fitErrorM);
  // refinement can bring two starts to one place: keep the first of each
  const minSep = explainer.set.grid.spacingRad;
  const orientations: FittedOrientation[] = [];
  for (const o of refined) if (orientations.every((q) => properAngle(q.axis, o.axis) >= minSep)) orientations.push(o);
  const residual = acc.residual();
  const rNorm = Math.hypot(residual.armSideM, residual.upM);
  let reach = 0;
  if (rNorm > 0) {
    const ux = residual.armSideM / rNorm, uz = residual.upM / rNorm;
    for (let k = 0; k < rms.length; k++) reach = Math.max(reach, (s.seamArmSide[k] * ux + s.seamUp[k] * uz) / n);
  }
  return { rows: acc.rows, orientations, residual, reachM: reach, beyondReach: rNorm > reach + REACH_MARGIN_M };
}

export { properAngle };
