import { describe, expect, it } from "vitest";
import { latLonToVector } from "../../geometry/ballCoords.js";
import { clockToAngle, parseClock } from "../../geometry/clock.js";
import { toArmSide } from "../../geometry/frames.js";
import { DEG, M_PER_FT } from "../../geometry/units.js";
import { Explainer } from "../../src/physics/explain.js";
import { coefficientAt } from "../../src/physics/explainMaps.js";
import { flyPitch } from "../../src/physics/pitchFlight.js";
import { seamModel } from "../../src/physics/seamModel/model.js";
import { sinkerPitch } from "../support/pitches.js";

const IN = 0.0254;
const sinker = sinkerPitch();
const model = seamModel();
const explainer = new Explainer({ model, top: 3 });

describe("explain on the trade basis", () => {
  it("the residual of a flight the tool flew with a planted orientation is its seam part, and the linear seam movement at the planted axis matches it within 0.15 in [planted truth; two routes: full flight against c_a J_a + c_m J_m]", () => {
    for (const [lat, lon] of [
      [30, 100],
      [-20, 60],
    ]) {
      const planted = latLonToVector(lat, lon);
      const f = flyPitch({ pitch: sinker, axisBall: planted, model });
      const obs = toArmSide(f.trade.total.horizontalBreakM, f.trade.total.inducedVerticalBreakM, "right");
      const e = explainer.explain({ pitch: sinker, observedArmSideM: obs.armSideM, observedUpM: obs.upM });
      const seam = toArmSide(f.trade.seamM.horizontalBreakM + f.trade.interactionM.horizontalBreakM, f.trade.seamM.inducedVerticalBreakM + f.trade.interactionM.inducedVerticalBreakM, "right");
      // the two launches differ by the seam force's own effect on the aim (a few hundredths of an inch)
      expect(Math.abs(e.residual.armSideM - seam.armSideM)).toBeLessThan(0.15 * IN);
      expect(Math.abs(e.residual.upM - seam.upM)).toBeLessThan(0.15 * IN);
      const c = coefficientAt(model, planted, sinker.gyroRad, { across: 0, alongMagnus: 0 });
      const sx = c.across * e.unitA.armSideM + c.alongMagnus * e.unitM.armSideM;
      const sz = c.across * e.unitA.upM + c.alongMagnus * e.unitM.upM;
      expect(Math.hypot(sx - e.residual.armSideM, sz - e.residual.upM)).toBeLessThan(0.15 * IN);
    }
  });

  it("leaves nothing over when the observed movement is what the spin predicts (residual exactly 0 in: R = observed - P)", () => {
    const e0 = explainer.explain({ pitch: sinker, observedArmSideM: 0, observedUpM: 0 });
    const e = explainer.explain({ pitch: sinker, observedArmSideM: e0.predicted.armSideM, observedUpM: e0.predicted.upM });
    expect(Math.hypot(e.residual.armSideM, e.residual.upM)).toBe(0);
    expect(e.beyondReach).toBe(false);
  });

  it("predicts drag's own deflection plus the Magnus part: P - M - D = 0 to 1e-12 m on the trade basis, and P = M on the release basis [definitions, file header]", () => {
    const e = explainer.explain({ pitch: sinker, observedArmSideM: 0.3, observedUpM: 0.2 });
    expect(Math.abs(e.predicted.armSideM - e.magnus.armSideM - e.drag.armSideM)).toBeLessThan(1e-12);
    expect(Math.abs(e.predicted.upM - e.magnus.upM - e.drag.upM)).toBeLessThan(1e-12);
    const r = new Explainer({ model, basis: "release" }).explain({ pitch: sinker, observedArmSideM: 0.3, observedUpM: 0.2 });
    expect(r.predicted).toEqual(r.magnus);
    expect(r.drag).toEqual({ armSideM: 0, upM: 0 });
    expect(r.windowStartM).toBeNull();
  });

  it("a 95 mph, 2,400 rpm backspin fastball (tilt 12:30, gyro 0) is predicted 14 to 19 in of induced vertical break over 50 ft [REFERENCES.md: the trade's usual four-seam range, common practice, from memory]", () => {
    const p = sinkerPitch({ speedMPerS: 95 * 0.44704, spinRadPerS: (2400 * Math.PI) / 30, tiltRad: clockToAngle(parseClock("12:30")), gyroRad: 0 });
    const e = explainer.explain({ pitch: p, observedArmSideM: 0, observedUpM: 0 });
    expect(e.predicted.upM / IN).toBeGreaterThan(14);
    expect(e.predicted.upM / IN).toBeLessThan(19);
  });

  it("a 40 ft window reads about (40 - 1.42)^2 / (50 - 1.42)^2 = 0.631 of the 50 ft break, within 5 % [closed form: break = a T^2 / 2 at constant speed, T proportional to the window's length]", () => {
    const e50 = explainer.explain({ pitch: sinker, observedArmSideM: 0, observedUpM: 0 });
    const e40 = new Explainer({ model, windowStartM: 40 * M_PER_FT }).explain({ pitch: sinker, observedArmSideM: 0, observedUpM: 0 });
    const front = 17 / 12; // front of the plate, ft from its rear point (Official Baseball Rules 2.02: 17 in)
    const closed = ((40 - front) / (50 - front)) ** 2;
    expect(e40.magnus.upM / e50.magnus.upM).toBeGreaterThan(0.95 * closed);
    expect(e40.magnus.upM / e50.magnus.upM).toBeLessThan(1.05 * closed);
    expect(e40.windowStartM).toBeCloseTo(40 * M_PER_FT, 12);
  });

  it("mirror symmetry: a left-hander at tilt 10:15 and gyro -10 deg is a right-hander at 1:45 and +10 deg reflected, so what the spin predicts agrees to 1e-9 m; a tilt read from the catcher's view (10:15) is the pitcher's 1:45 [geometry/frames.ts: x -> -x reflects the field; the spin is a pseudovector, so w . v = sin g changes sign; the two views read mirror-image clocks]", () => {
    const right = explainer.explain({ pitch: sinker, observedArmSideM: 0.4, observedUpM: 0.25 });
    const lefty = sinkerPitch({ hand: "left", tiltRad: clockToAngle(parseClock("10:15")), gyroRad: -10 * DEG });
    const left = explainer.explain({ pitch: lefty, observedArmSideM: 0.4, observedUpM: 0.25 });
    const catcher = explainer.explain({ pitch: sinkerPitch({ view: "catcher", tiltRad: clockToAngle(parseClock("10:15")) }), observedArmSideM: 0.4, observedUpM: 0.25 });
    for (const other of [left, catcher]) {
      expect(Math.abs(other.predicted.armSideM - right.predicted.armSideM)).toBeLessThan(1e-9);
      expect(Math.abs(other.predicted.upM - right.predicted.upM)).toBeLessThan(1e-9);
      expect(Math.abs(other.residual.armSideM - right.residual.armSideM)).toBeLessThan(1e-9);
    }
    // a sinker's Magnus part runs to the arm side and up for either hand
    expect(left.magnus.armSideM).toBeGreaterThan(0);
    expect(left.magnus.upM).toBeGreaterThan(0);
    // clock readings follow the view: the catcher's reading mirrors the pitcher's
    expect(right.direction.spinBased!.minutes + catcher.direction.spinBased!.minutes).toBeCloseTo(720, -1);
  });

  it("the spin-based direction (Magnus alone) reads the tilt within 6 minutes for zero gyro [geometry/frames.ts: tilt is where the Magnus force points]; a residual of 30 in up is beyond any orientation's reach", () => {
    const p = sinkerPitch({ gyroRad: 0 });
    const e = explainer.explain({ pitch: p, observedArmSideM: 0, observedUpM: 0 });
    expect(Math.abs(e.direction.spinBased!.minutes - parseClock("1:45"))).toBeLessThanOrEqual(6);
    const far = explainer.explain({ pitch: p, observedArmSideM: e.predicted.armSideM, observedUpM: e.predicted.upM + 30 * IN });
    expect(far.beyondReach).toBe(true);
    expect(far.reachM).toBeLessThan(30 * IN);
    expect(far.reachM).toBeGreaterThan(0);
  });

  it("lists distinct matches: every two are at least 2.5 grid spacings apart up to the ball's rotations [file header]", () => {
    const e = new Explainer({ model, top: 5 }).explain({ pitch: sinker, observedArmSideM: 0.4, observedUpM: 0.2 });
    expect(e.matches).toHaveLength(5);
    for (let i = 0; i < 5; i++) {
      for (let j = 0; j < i; j++) {
        let best = Infinity;
        for (const [sx, sy, sz] of [[1, 1, 1], [1, -1, -1], [-1, 1, -1], [-1, -1, 1]]) {
          const a = e.matches[i].axis;
          const b = e.matches[j].axis;
          best = Math.min(best, Math.acos(Math.max(-1, Math.min(1, a[0] * sx * b[0] + a[1] * sy * b[1] + a[2] * sz * b[2]))));
        }
        expect(best).toBeGreaterThan(2.5 * 4 * DEG - 1e-9);
      }
    }
    for (let i = 1; i < 5; i++) expect(e.matches[i].fitErrorM).toBeGreaterThanOrEqual(e.matches[i - 1].fitErrorM);
  });
});
