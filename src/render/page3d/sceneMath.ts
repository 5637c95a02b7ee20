/**
 * Where the ball and the flow sit in the 3-D scene (pure maths on three.js types, no DOM).
 *
 * Three frames, from the inside out:
 *   ball frame   the seam curve's axes (geometry/seamCurve.ts);
 *   flow frame   geometry/flow.ts: v = +z the flight direction, a = +x the across
 *                direction, w = (k, 0, s) the spin axis, m = -y; the ball turns by +phi
 *                about w, and at phi = 0 the stagnation point sits on its path at the
 *                point nearest the ball's +z pole;
 *   field frame  geometry/frames.ts: x toward the catcher's right, y toward the
 *                pitcher, z up.
 * three.js draws with +y up, so the scene's root turns the field frame by -90 deg
 * about x: field (x, y, z) is drawn at (x, z, -y).
 */
import { Matrix4, Quaternion, Vector3 } from "three";
import { ballToFlowQuaternionAtPhaseZero } from "../../../geometry/flow.js";
import { type Vec3 } from "../../../geometry/vec.js";
import type { FieldFrameVectors } from "./data.js";

/** The rotation that draws the field frame in three.js's y-up world. */
export const FIELD_TO_WORLD = new Quaternion().setFromAxisAngle(new Vector3(1, 0, 0), -Math.PI / 2);

/** Field direction to three.js world direction. */
export function fieldToWorld(v: Readonly<Vec3>): Vector3 {
  return new Vector3(v[0], v[2], -v[1]);
}

/**
 * The rotation taking flow-frame vectors to the field frame: a to the push line,
 * v to the flight direction, and -m (flow +y) to minus the Magnus direction.
 * Proper because a x (-m) = v holds in both frames (m = a x v).
 */
export function flowToFieldQuaternion(frame: FieldFrameVectors, out: Quaternion = new Quaternion()): Quaternion {
  const [a, m, v] = [frame.pushLine, frame.magnus, frame.flight];
  const basis = new Matrix4().makeBasis(new Vector3(a[0], a[1], a[2]), new Vector3(-m[0], -m[1], -m[2]), new Vector3(v[0], v[1], v[2]));
  return out.setFromRotationMatrix(basis);
}

/** The flow-frame spin axis w = (cos gyro, 0, sin gyro). */
export function flowSpinAxis(gyroRad: number): Vector3 {
  return new Vector3(Math.cos(gyroRad), 0, Math.sin(gyroRad));
}

/** The ball's attitude in the flow frame through the turn: q(phi) = turn(w, phi) q0. */
export class BallPose {
  private readonly q0 = new Quaternion();
  private readonly spin = new Vector3(1, 0, 0);
  private readonly turn = new Quaternion();

  /** Sets the ball-frame spin axis (any non-zero length) and the gyro angle, radians. */
  setOrientation(axis: Readonly<Vec3>, gyroRad: number): void {
    const q = ballToFlowQuaternionAtPhaseZero(axis, gyroRad);
    // gl-matrix and three.js both order quaternions [x, y, z, w]
    this.q0.set(q[0], q[1], q[2], q[3]);
    this.spin.copy(flowSpinAxis(gyroRad));
  }

  /** Ball-to-flow rotation at phase `phiRad` (radians); writes into and returns `out`. */
  at(phiRad: number, out: Quaternion = new Quaternion()): Quaternion {
    this.turn.setFromAxisAngle(this.spin, phiRad);
    return out.multiplyQuaternions(this.turn, this.q0);
  }
}

/**
 * The phase at which the turning ball stands as the hand holds it at release: the
 * field pose flowToField * turn(w, phi) * ballToFlow(0) equals `ballToField` (row-major,
 * src/screening/hand.ts) when both map the spin axis to the pitch's spin axis, as the
 * hand model's release rotation does; phi in [0, 2 pi).
 */
export function releasePhase(frame: FieldFrameVectors, axis: Readonly<Vec3>, gyroRad: number, ballToField: readonly number[]): number {
  const m = ballToField;
  const release = new Quaternion().setFromRotationMatrix(new Matrix4().set(m[0], m[1], m[2], 0, m[3], m[4], m[5], 0, m[6], m[7], m[8], 0, 0, 0, 0, 1));
  const q0 = ballToFlowQuaternionAtPhaseZero(axis, gyroRad);
  const atZero = new Quaternion(q0[0], q0[1], q0[2], q0[3]);
  const turn = flowToFieldQuaternion(frame).invert().multiply(release).multiply(atZero.invert());
  const w = flowSpinAxis(gyroRad);
  const phi = 2 * Math.atan2(turn.x * w.x + turn.y * w.y + turn.z * w.z, turn.w);
  return ((phi % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
}
