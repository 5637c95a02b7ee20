import { Quaternion, Vector3 } from "three";
import { describe, expect, it } from "vitest";
import { type Vec3 } from "../../../geometry/vec.js";
import { DEG } from "../../../geometry/units.js";
import { pitchFrame } from "../../../src/screening/pitch.js";
import { BallPose, fieldToWorld, FIELD_TO_WORLD, flowSpinAxis, flowToFieldQuaternion } from "../../../src/render/page3d/sceneMath.js";
import { lcg, randomUnit } from "../../support/random.js";

/** The flow-frame spin axis written out (geometry/flow.ts header): w = (cos g, 0, sin g). */
const spinAxisInFlow = (gyroRad: number): Vec3 => [Math.cos(gyroRad), 0, Math.sin(gyroRad)];

const rnd = lcg(2024);
const cases = Array.from({ length: 8 }, () => ({ axis: randomUnit(rnd), gyroRad: (rnd() - 0.5) * 120 * DEG }));

describe("scene frames of the 3-D page", () => {
  const close = (a: Vector3, b: Readonly<Vec3>, tol: number) => {
    expect(a.x).toBeCloseTo(b[0], tol);
    expect(a.y).toBeCloseTo(b[1], tol);
    expect(a.z).toBeCloseTo(b[2], tol);
  };

  it("keep the spin axis fixed in the flow frame at (cos g, 0, sin g) through the turn (closed form, geometry/flow.ts header), to 1e-12", () => {
    const pose = new BallPose();
    for (const c of cases) {
      pose.setOrientation(c.axis, c.gyroRad);
      const w = spinAxisInFlow(c.gyroRad);
      close(flowSpinAxis(c.gyroRad), w, 15);
      for (const phi of [0, 1, 2.5, 5]) close(new Vector3(...c.axis).applyQuaternion(pose.at(phi)), w, 12);
    }
  });

  it("turn the ball by +phi about w between any two phases: q(phi1 + phi2) = turn(w, phi2) q(phi1), with the turn built by three.js, to 1e-12", () => {
    const pose = new BallPose();
    for (const c of cases) {
      pose.setOrientation(c.axis, c.gyroRad);
      const turn = new Quaternion().setFromAxisAngle(new Vector3(...spinAxisInFlow(c.gyroRad)), 1.7);
      const p = new Vector3(0.3, -0.5, 0.81).normalize();
      const viaTurn = p.clone().applyQuaternion(pose.at(0.4)).applyQuaternion(turn);
      const direct = p.clone().applyQuaternion(pose.at(2.1));
      close(viaTurn, [direct.x, direct.y, direct.z], 12);
    }
  });

  it("put the front stagnation point at the phase-0 point nearest the +z pole (geometry/flow.ts phase convention), to 1e-12", () => {
    const pose = new BallPose();
    for (const c of cases) {
      pose.setOrientation(c.axis, c.gyroRad);
      // the stagnation point in the ball frame at phase 0: flow +z taken back through the pose
      const stagnation = new Vector3(0, 0, 1).applyQuaternion(pose.at(0).clone().invert());
      const w = new Vector3(...c.axis);
      // on its path (w . v = sin g), and the +z pole's component across w points the same way as its own
      expect(stagnation.dot(w)).toBeCloseTo(Math.sin(c.gyroRad), 12);
      const pole = new Vector3(0, 0, 1).addScaledVector(w, -w.z).normalize();
      const across = stagnation.clone().addScaledVector(w, -stagnation.dot(w)).normalize();
      expect(across.dot(pole)).toBeCloseTo(1, 12);
    }
  });

  it("carry the flow frame onto the pitch's field frame: a to the push line, v to the flight, w to the spin axis (src/screening/pitch.ts)", () => {
    for (const [tilt, gyroDeg, view] of [[45, 10, "pitcher"], [300, -25, "catcher"], [170, 40, "pitcher"]] as const) {
      const frame = pitchFrame({ name: "t", pitcher: "", hand: "right", speedMPerS: 40, spinRadPerS: 200, tiltRad: tilt * DEG, view, gyroRad: gyroDeg * DEG, want: "any" });
      const q = flowToFieldQuaternion(frame);
      close(new Vector3(1, 0, 0).applyQuaternion(q), frame.pushLine, 12);
      close(new Vector3(0, 0, 1).applyQuaternion(q), frame.flight, 12);
      close(new Vector3(0, -1, 0).applyQuaternion(q), frame.magnus, 12);
      close(new Vector3(...spinAxisInFlow(gyroDeg * DEG)).applyQuaternion(q), frame.spinAxis, 12);
    }
  });

  it("draw the field frame y-up: field up is world +y and the flight toward the plate is world +z", () => {
    const q = new Quaternion().copy(FIELD_TO_WORLD);
    for (const v of [[1, 0, 0], [0, 1, 0], [0, 0, 1], [0.3, -0.5, 0.8]] as Vec3[]) {
      const w = fieldToWorld(v);
      close(new Vector3(...v).applyQuaternion(q), [w.x, w.y, w.z], 12);
    }
    close(fieldToWorld([0, 0, 1]), [0, 1, 0], 15);
    close(fieldToWorld([0, -1, 0]), [0, 0, 1], 15);
  });
});
