/**
 * The flow frame and the phase convention: where the air meets the ball at each
 * instant of a turn. Binding for the sampler's timelines, the seam-force model,
 * the flights that turn the ball, and the 3-D page.
 *
 * Flow frame (unit ball at the origin):
 *   v = (0, 0, 1)   the flight direction; the front stagnation point is at +v and
 *                   polar angles theta are measured from it
 *   w = (k, 0, s)   the spin axis, s = sin(gyro), k = cos(gyro) (gyro as in frames.ts)
 *   a = (1, 0, 0)   w minus its flight-line part, normalised: the "across" direction
 *   m = (0, -1, 0)  unit(w x v), the Magnus direction
 * Phase: the ball turns by +phi about w (right-hand rule). At phi = 0 the front
 * stagnation point sits on its path over the ball (the circle q . w = s in the ball
 * frame) at the point nearest the ball's +z pole (waist-A), or nearest +x when the
 * spin axis is the z axis itself.
 *
 * With e1 = unit(pole - (pole . w) w) and e2 = w x e1 in the ball frame, and
 * u0 = (-s, 0, k), u1 = w x u0 = (0, -1, 0) in the flow frame, the ball-to-flow
 * rotation at phase phi maps w to w_f, e1 to cos(phi) u0 + sin(phi) u1 and e2 to
 * -sin(phi) u0 + cos(phi) u1; at phi = 0 the stagnation point v = s w_f + k u0 is the
 * image of s w + k e1, the point of its path nearest the pole.
 */
import { mat3, newQuat, quat, unit3, type Vec3 } from "./vec.js";

/** Below this, a spin axis counts as lying along the ball's z axis (the pole falls back to +x). */
const POLE_TOLERANCE = 1e-9;
/** Scratch for ballToFlowAtPhase (read at once, never kept). */
const BASIS = new Float64Array(6);

/**
 * The ball-to-flow rotation at phase `phaseRad`, written into `out` as a column-major
 * 3x3 matrix (gl-matrix's mat3 layout: out[3 * col + row]) and returned.
 * @param wx,wy,wz the spin axis in the ball frame, unit length (the caller normalises)
 * @param gyroRad gyro angle, rad, |gyro| < pi/2
 */
/**
 * The ball-frame basis across the spin axis that fixes phase 0: e1 = unit(pole - (pole . w) w)
 * with pole = +z (or +x when w lies along z), e2 = w x e1. Writes [e1x, e1y, e1z, e2x, e2y, e2z]
 * into `out` and returns it.
 * @param wx,wy,wz the spin axis in the ball frame, unit length
 */
export function phaseBasis(wx: number, wy: number, wz: number, out: Float64Array = new Float64Array(6)): Float64Array {
  let px = 0;
  let pz = 1;
  if (!(Math.abs(wz) < 1 - POLE_TOLERANCE)) {
    px = 1;
    pz = 0;
  }
  const d = px * wx + pz * wz;
  let e1x = px - d * wx;
  let e1y = -d * wy;
  let e1z = pz - d * wz;
  const n = Math.hypot(e1x, e1y, e1z);
  e1x /= n;
  e1y /= n;
  e1z /= n;
  out[0] = e1x;
  out[1] = e1y;
  out[2] = e1z;
  out[3] = wy * e1z - wz * e1y;
  out[4] = wz * e1x - wx * e1z;
  out[5] = wx * e1y - wy * e1x;
  return out;
}

export function ballToFlowAtPhase(
  wx: number,
  wy: number,
  wz: number,
  gyroRad: number,
  phaseRad: number,
  out: Float64Array = new Float64Array(9),
): Float64Array {
  const s = Math.sin(gyroRad);
  const k = Math.cos(gyroRad);
  const b = phaseBasis(wx, wy, wz, BASIS);
  const e1x = b[0], e1y = b[1], e1z = b[2], e2x = b[3], e2y = b[4], e2z = b[5];
  const c = Math.cos(phaseRad);
  const sn = Math.sin(phaseRad);
  // flow images: w -> (k, 0, s); e1 -> c u0 + sn u1 = (-s c, -sn, k c); e2 -> -sn u0 + c u1 = (s sn, -c, -k sn)
  const f1x = -s * c, f1y = -sn, f1z = k * c;
  const f2x = s * sn, f2y = -c, f2z = -k * sn;
  // R = wf w^T + f1 e1^T + f2 e2^T; column j holds R e_j
  out[0] = k * wx + f1x * e1x + f2x * e2x;
  out[1] = f1y * e1x + f2y * e2x;
  out[2] = s * wx + f1z * e1x + f2z * e2x;
  out[3] = k * wy + f1x * e1y + f2x * e2y;
  out[4] = f1y * e1y + f2y * e2y;
  out[5] = s * wy + f1z * e1y + f2z * e2y;
  out[6] = k * wz + f1x * e1z + f2x * e2z;
  out[7] = f1y * e1z + f2y * e2z;
  out[8] = s * wz + f1z * e1z + f2z * e2z;
  return out;
}

/** The ball-to-flow rotation at phase 0 as a unit quaternion [x, y, z, w] (gl-matrix and three.js order). */
export function ballToFlowQuaternionAtPhaseZero(axis: Readonly<Vec3>, gyroRad: number): Float64Array {
  const w = unit3(axis);
  const m = ballToFlowAtPhase(w[0], w[1], w[2], gyroRad, 0);
  const q = newQuat();
  quat.fromMat3(q, m as unknown as mat3);
  return quat.normalize(q, q) as unknown as Float64Array;
}

/** The flow-frame spin axis w = (cos gyro, 0, sin gyro). */
export function flowSpinAxis(gyroRad: number): Vec3 {
  return [Math.cos(gyroRad), 0, Math.sin(gyroRad)];
}
