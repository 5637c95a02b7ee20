import { Quaternion, Vector3 } from "three";
import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE } from "../../../geometry/seamCurve.js";
import { type Vec3 } from "../../../geometry/vec.js";
import { DEG } from "../../../geometry/units.js";
import { DEFAULT_BAND } from "../../../src/sampling/band.js";
import { SPLIT_TIE } from "../../../src/sampling/exact.js";
import { measureOrientation, seamFor, TIMELINE_STEPS } from "../../../src/sampling/measure.js";
import { pitchFrame } from "../../../src/screening/pitch.js";
import { LiveSeamShares, SEAM_IN_BAND_MINUS, SEAM_IN_BAND_ON_SPLIT, SEAM_IN_BAND_PLUS, SEAM_OUT_OF_BAND } from "../../../src/render/page3d/liveShare.js";
import { BallPose, fieldToWorld, FIELD_TO_WORLD, flowSpinAxis, flowToFieldQuaternion } from "../../../src/render/page3d/sceneMath.js";
import { lcg, randomUnit } from "../../support/random.js";

const SEAM_POINTS = 1024;
const seam = seamFor(DEFAULT_SEAM_SHAPE, SEAM_POINTS);
const rnd = lcg(2024);
const cases = Array.from({ length: 8 }, () => ({ axis: randomUnit(rnd), gyroRad: (rnd() - 0.5) * 120 * DEG }));

describe("live in-band shares of the 3-D page", () => {
  it("equal measure's 360-phase timeline at every whole degree, to one seam sample (1/1024), for 8 random axes and gyros up to 60 deg", () => {
    const live = new LiveSeamShares(seam, DEFAULT_BAND);
    let phasesThatDiffer = 0;
    for (const c of cases) {
      const m = measureOrientation(c, { seamPoints: SEAM_POINTS });
      live.setOrientation(c.axis, c.gyroRad);
      for (let k = 0; k < TIMELINE_STEPS; k++) {
        const s = live.update((2 * Math.PI * k) / TIMELINE_STEPS);
        // both are counts of seam samples over N; a sample exactly on a band limit may round either way
        expect(Math.abs(s.axisPlus - m.timeline!.axisPlus[k])).toBeLessThanOrEqual(1 / SEAM_POINTS + 1e-15);
        expect(Math.abs(s.axisMinus - m.timeline!.axisMinus[k])).toBeLessThanOrEqual(1 / SEAM_POINTS + 1e-15);
        if (s.axisPlus !== m.timeline!.axisPlus[k] || s.axisMinus !== m.timeline!.axisMinus[k]) phasesThatDiffer++;
      }
    }
    // rounding flips are rare: under 1 % of the 2,880 phases
    expect(phasesThatDiffer).toBeLessThan(29);
  });

  it("average over 720 phases to the exact turn averages within 1e-3 (the brute-force tolerance of tests/sampling/exact.test.ts)", () => {
    const live = new LiveSeamShares(seam, DEFAULT_BAND);
    for (const c of cases.slice(0, 3)) {
      const m = measureOrientation(c, { seamPoints: SEAM_POINTS, timeline: false });
      live.setOrientation(c.axis, c.gyroRad);
      let plus = 0;
      let minus = 0;
      for (let k = 0; k < 720; k++) {
        const s = live.update((2 * Math.PI * k) / 720 + 0.3);
        plus += s.axisPlus / 720;
        minus += s.axisMinus / 720;
      }
      expect(Math.abs(plus - m.axisPlus)).toBeLessThan(1e-3);
      expect(Math.abs(minus - m.axisMinus)).toBeLessThan(1e-3);
    }
  });

  it("colour exactly the samples they count: per-sample states add up to the shares at any phase (ties half each side)", () => {
    const live = new LiveSeamShares(seam, DEFAULT_BAND);
    for (const c of cases.slice(0, 4)) {
      live.setOrientation(c.axis, c.gyroRad);
      for (const phi of [0, 0.7, 2.1, 4.4, 6.0]) {
        const s = live.update(phi);
        const count = [0, 0, 0, 0];
        for (const state of live.states) count[state]++;
        expect(count[SEAM_IN_BAND_PLUS] + count[SEAM_IN_BAND_ON_SPLIT] / 2).toBe(s.axisPlus * SEAM_POINTS);
        expect(count[SEAM_IN_BAND_MINUS] + count[SEAM_IN_BAND_ON_SPLIT] / 2).toBe(s.axisMinus * SEAM_POINTS);
        expect(SEAM_POINTS - count[SEAM_OUT_OF_BAND]).toBe(s.seamInBand * SEAM_POINTS);
      }
    }
  });

  it("draw the ball where they count it: the drawn pose puts the same samples in the band on the same sides", () => {
    const live = new LiveSeamShares(seam, DEFAULT_BAND);
    const pose = new BallPose();
    const cosHi = Math.cos(DEFAULT_BAND.centerRad - DEFAULT_BAND.widthRad / 2);
    const cosLo = Math.cos(DEFAULT_BAND.centerRad + DEFAULT_BAND.widthRad / 2);
    // samples closer than this (unit-sphere length) to a band limit or the split may fall either way between routes
    const EDGE = 1e-9;
    for (const c of cases.slice(0, 4)) {
      live.setOrientation(c.axis, c.gyroRad);
      pose.setOrientation(c.axis, c.gyroRad);
      for (const phi of [0, 1.3, 3.9]) {
        live.update(phi);
        const q = pose.at(phi);
        const p = new Vector3();
        for (let i = 0; i < seam.count; i++) {
          p.set(seam.points[3 * i], seam.points[3 * i + 1], seam.points[3 * i + 2]).applyQuaternion(q);
          if (Math.abs(p.z - cosLo) < EDGE || Math.abs(p.z - cosHi) < EDGE || Math.abs(p.x) < Math.max(EDGE, SPLIT_TIE)) continue;
          const expected = p.z < cosLo || p.z > cosHi ? SEAM_OUT_OF_BAND : p.x > 0 ? SEAM_IN_BAND_PLUS : SEAM_IN_BAND_MINUS;
          expect(live.states[i]).toBe(expected);
        }
      }
    }
  });
});

describe("scene frames of the 3-D page", () => {
  const close = (a: Vector3, b: Readonly<Vec3>, tol: number) => {
    expect(a.x).toBeCloseTo(b[0], tol);
    expect(a.y).toBeCloseTo(b[1], tol);
    expect(a.z).toBeCloseTo(b[2], tol);
  };

  it("keep the spin axis fixed in the flow frame at (cos g, 0, sin g) through the turn (closed form, brute.ts header), to 1e-12", () => {
    const pose = new BallPose();
    for (const c of cases) {
      pose.setOrientation(c.axis, c.gyroRad);
      const w = flowSpinAxis(c.gyroRad);
      for (const phi of [0, 1, 2.5, 5]) close(new Vector3(...c.axis).applyQuaternion(pose.at(phi)), [w.x, w.y, w.z], 12);
    }
  });

  it("put the front stagnation point at the phase-0 point nearest the +z pole (brute.ts phase convention)", () => {
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
      close(flowSpinAxis(gyroDeg * DEG).applyQuaternion(q), frame.spinAxis, 12);
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
