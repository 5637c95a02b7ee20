/**
 * The brute-force twin of the exact sampler: turn the ball in small steps,
 * test every seam point against the band, average. Used only to cross-check
 * the exact sampler, to draw timelines, and in the benchmark.
 *
 * It works in the flow frame, independently of exact.ts's ball-frame algebra:
 *   v = (0, 0, 1)           flight direction (front stagnation point at +v)
 *   w = (k, 0, s)           spin axis, s = sin(gyro), k = cos(gyro)
 *   a = (1, 0, 0)           w minus its flight-line part, normalised
 *   m = w x v / |w x v| = (0, -1, 0)
 * Phase convention (shared with exact.ts): at phase 0 the stagnation point sits
 * on its path at the point nearest the ball's +z pole (nearest +x when the axis
 * is the z axis); the ball turns by +phi about w (right-hand rule).
 */
import { mat3, quat, vec3 } from "../../geometry/vec.js";
import type { SeamSamples } from "../../geometry/seamSamples.js";
import { emptyAverages, SPLIT_TIE, type BandAverages } from "./exact.js";
import type { Band } from "./band.js";

/**
 * The ball-to-flow rotation at phase 0, as a gl-matrix quaternion.
 * Maps the ball-frame axis w_b to (k, 0, s) and the phase-0 stagnation point to (0, 0, 1).
 */
export function ballToFlowAtPhaseZero(wx: number, wy: number, wz: number, gyroRad: number): quat {
  const s = Math.sin(gyroRad);
  const k = Math.cos(gyroRad);
  const w = vec3.fromValues(wx, wy, wz);
  // e1: the +z pole's component across w (or +x's, when w is along z)
  const e1 = vec3.create();
  const pole = Math.abs(wz) < 1 - 1e-9 ? vec3.fromValues(0, 0, 1) : vec3.fromValues(1, 0, 0);
  vec3.scaleAndAdd(e1, pole, w, -vec3.dot(pole, w));
  vec3.normalize(e1, e1);
  const e2 = vec3.cross(vec3.create(), w, e1);
  // ball basis (w, e1, e2) -> flow basis (wf, u0, wf x u0), with v = s wf + k u0
  const wf = vec3.fromValues(k, 0, s);
  const u0 = vec3.fromValues(-s, 0, k);
  const u1 = vec3.cross(vec3.create(), wf, u0);
  const ball = mat3.fromValues(w[0], w[1], w[2], e1[0], e1[1], e1[2], e2[0], e2[1], e2[2]); // columns
  const flow = mat3.fromValues(wf[0], wf[1], wf[2], u0[0], u0[1], u0[2], u1[0], u1[1], u1[2]);
  const ballT = mat3.transpose(mat3.create(), ball);
  const r = mat3.multiply(mat3.create(), flow, ballT);
  return quat.normalize(quat.create(), quat.fromMat3(quat.create(), r));
}

export interface BruteOptions {
  /** Time steps per revolution (default 720). */
  steps?: number;
  /** When given (length `steps`), receives the instantaneous in-band share with q . a > 0 at each step. */
  plusTimeline?: Float64Array;
  /** When given (length `steps`), receives the instantaneous in-band share with q . a < 0 at each step. */
  minusTimeline?: Float64Array;
}

/** Brute-force turn average by time stepping (phases phi_j = 2 pi j / steps, equal weights). */
export function bandAveragesBrute(
  seam: SeamSamples,
  wx: number,
  wy: number,
  wz: number,
  gyroRad: number,
  band: Band,
  options: BruteOptions = {},
  out: BandAverages = emptyAverages(),
): BandAverages {
  const steps = options.steps ?? 720;
  const s = Math.sin(gyroRad);
  const k = Math.cos(gyroRad);
  const cosHi = Math.cos(band.centerRad - band.widthRad / 2);
  const cosLo = Math.cos(band.centerRad + band.widthRad / 2);
  const q0 = ballToFlowAtPhaseZero(wx, wy, wz, gyroRad);
  const wf = vec3.fromValues(k, 0, s);
  const turn = quat.create();
  const q = quat.create();
  const m = mat3.create();
  const pts = seam.points;
  const n = seam.count;
  let inBand = 0;
  let plus = 0;
  let minus = 0;
  let mPlus = 0;
  let mMinus = 0;
  let sumA = 0;
  let sumM = 0;
  for (let j = 0; j < steps; j++) {
    quat.setAxisAngle(turn, wf, (2 * Math.PI * j) / steps);
    quat.multiply(q, turn, q0);
    mat3.fromQuat(m, q);
    const m0 = m[0], m1 = m[1], m2 = m[2], m3 = m[3], m4 = m[4], m5 = m[5], m6 = m[6], m7 = m[7], m8 = m[8];
    let stepPlus = 0;
    let stepMinus = 0;
    for (let i = 0; i < n; i++) {
      // rotate the seam point into the flow frame, then test it
      const x = pts[3 * i];
      const y = pts[3 * i + 1];
      const z = pts[3 * i + 2];
      const qa = m0 * x + m3 * y + m6 * z; // q . a, a = +x
      const qm = -(m1 * x + m4 * y + m7 * z); // q . m, m = -y
      const qv = m2 * x + m5 * y + m8 * z; // q . v, v = +z
      if (qv < cosLo || qv > cosHi) continue;
      inBand += 1;
      if (qa > SPLIT_TIE) stepPlus += 1;
      else if (qa < -SPLIT_TIE) stepMinus += 1;
      else {
        stepPlus += 0.5;
        stepMinus += 0.5;
      }
      if (qm > SPLIT_TIE) mPlus += 1;
      else if (qm < -SPLIT_TIE) mMinus += 1;
      else {
        mPlus += 0.5;
        mMinus += 0.5;
      }
      sumA += qa;
      sumM += qm;
    }
    plus += stepPlus;
    minus += stepMinus;
    if (options.plusTimeline) options.plusTimeline[j] = stepPlus / n;
    if (options.minusTimeline) options.minusTimeline[j] = stepMinus / n;
  }
  const w = 1 / (n * steps);
  out.seamInBand = inBand * w;
  out.axisPlus = plus * w;
  out.axisMinus = minus * w;
  out.magnusPlus = mPlus * w;
  out.magnusMinus = mMinus * w;
  out.alongAxis = -sumA * w;
  out.alongMagnus = -sumM * w;
  out.magnitude = Math.hypot(out.alongAxis, out.alongMagnus);
  return out;
}
