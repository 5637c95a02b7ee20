import { describe, expect, it } from "vitest";
import { BALL_CIRCUMFERENCE_IN } from "../../geometry/ball.js";
import { equalAreaGrid } from "../../geometry/sphereGrid.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { DEG, M_PER_IN } from "../../geometry/units.js";
import { angleBetween } from "../../geometry/vec.js";
import { flyPitch, tradeArmSide, unitSeamMovement } from "../../src/physics/pitchFlight.js";
import { coefficientMap } from "../../src/physics/seamModel/map.js";
import { seamModel } from "../../src/physics/seamModel/model.js";
import { turnAverage } from "../../src/physics/seamModel/turn.js";
import { pitchFrame, type Pitch } from "../../src/screening/pitch.js";
import { robustness } from "../../src/screening/robustness.js";
import { DEFAULT_SCREEN_OPTIONS, scoreOf, screenPitch, symmetricAngle, type ScreenSettings } from "../../src/screening/screen.js";
import { sinkerPitch } from "../support/pitches.js";

const pitch = (over: Partial<Pitch> = {}): Pitch => sinkerPitch({ name: "test", ...over });
const model = seamModel();
const settings = (over: Partial<ScreenSettings> = {}): ScreenSettings => ({ ...DEFAULT_SCREEN_OPTIONS, band: model.band, model, ...over });

/** The screen's linear seam movement (arm side, up; m) of an axis for a pitch: c_a J_a + c_m J_m. */
function linear(p: Pitch, axis: readonly [number, number, number]): [number, number] {
  const u = unitSeamMovement(p, model);
  const c = turnAverage(model, axis, p.gyroRad);
  const a = tradeArmSide(u.across, p.hand);
  const m = tradeArmSide(u.alongMagnus, p.hand);
  return [c.across * a.armSideM + c.alongMagnus * m.armSideM, c.across * a.verticalM + c.alongMagnus * m.verticalM];
}

describe("screen (the one seam-force model, seam movement in the trade's reading)", () => {
  const p = pitch();
  const r = screenPitch(p, settings({ gridSpacingRad: 3 * DEG }));

  it("reports for every listed grip exactly the seam movement the flight reports for that axis (one model, one number), and the score is its arm-side part", () => {
    for (const c of [...r.candidates, ...r.references]) {
      const f = flyPitch({ pitch: p, axisBall: c.axis, model });
      const m = tradeArmSide(f.trade.seamM, p.hand);
      expect(Math.abs(c.seamMovement.armSideM - m.armSideM) / M_PER_IN).toBeLessThan(1e-9);
      expect(Math.abs(c.seamMovement.verticalM - m.verticalM) / M_PER_IN).toBeLessThan(1e-9);
      expect(c.score).toBe(c.seamMovement.armSideM);
    }
  });

  it("maps seam movement linearly in the coefficient to within 3 % (or 0.1 in) of the full flight at the listed grips (the map's approximation; the listed grips are flown in full)", () => {
    for (const c of r.candidates) {
      const [arm, up] = linear(p, c.axis);
      expect(Math.abs(arm - c.seamMovement.armSideM) / M_PER_IN).toBeLessThan(Math.max(0.1, 0.03 * Math.abs(c.seamMovement.armSideM / M_PER_IN)));
      expect(Math.abs(up - c.seamMovement.verticalM) / M_PER_IN).toBeLessThan(Math.max(0.1, 0.03 * Math.abs(c.seamMovement.verticalM / M_PER_IN)));
    }
  });

  it("puts the top candidate within 3 deg and 2 % of the best linear score found by exhaustive search on a 1 deg grid (brute force)", () => {
    const grid = equalAreaGrid(1 * DEG);
    const map = coefficientMap(model, p.gyroRad, grid);
    const u = unitSeamMovement(p, model);
    const a = tradeArmSide(u.across, p.hand);
    const m = tradeArmSide(u.alongMagnus, p.hand);
    let best = -Infinity;
    let bestAxis: [number, number, number] = [0, 0, 1];
    for (let i = 0; i < grid.count; i++) {
      const arm = map.across[i] * a.armSideM + map.alongMagnus[i] * m.armSideM;
      const up = map.across[i] * a.verticalM + map.alongMagnus[i] * m.verticalM;
      const s = scoreOf(p.want, arm, up);
      if (s > best) {
        best = s;
        bestAxis = [grid.points[3 * i], grid.points[3 * i + 1], grid.points[3 * i + 2]];
      }
    }
    const top = [...r.candidates].sort((x, y) => y.score - x.score)[0];
    const [arm, up] = linear(p, top.axis);
    expect(scoreOf(p.want, arm, up)).toBeGreaterThanOrEqual(best * 0.98);
    expect(symmetricAngle(top.axis, bestAxis)).toBeLessThan(3 * DEG);
  });

  it("gives every rotated image of a grip the same coefficient (to 1e-12), and a mirrored image the Magnus part reversed: rotations only merge candidates", () => {
    const c = r.candidates[0];
    const base = turnAverage(model, c.axis, p.gyroRad, { across: 0, alongMagnus: 0 });
    for (const g of SEAM_SYMMETRIES) {
      const t = turnAverage(model, applySymmetry(g, c.axis), p.gyroRad, { across: 0, alongMagnus: 0 });
      expect(Math.abs(t.across - base.across)).toBeLessThan(1e-12);
      expect(Math.abs(t.alongMagnus - (g.proper ? 1 : -1) * base.alongMagnus)).toBeLessThan(1e-12);
    }
  });

  it("lists distinct candidates: no two are rotated images of each other within the release scatter (5 deg; a grip inside the delivery's own scatter of a better one is that grip)", () => {
    for (let i = 0; i < r.candidates.length; i++)
      for (let j = i + 1; j < r.candidates.length; j++) expect(symmetricAngle(r.candidates[i].axis, r.candidates[j].axis)).toBeGreaterThan(5 * DEG);
  });

  it("gives a shorter list as the first grips of the default one, and counts the distinct maxima whatever the list's length (the atlas's 4 are the screen's first 4)", () => {
    const lists = [2, 4, 5].map((top) => screenPitch(p, settings({ gridSpacingRad: 3 * DEG, top })));
    const five = lists[2];
    for (const l of lists) {
      expect(l.maximaFound).toBe(five.maximaFound);
      l.candidates.forEach((c, i) => expect(c.axis).toEqual(five.candidates[i].axis));
    }
    expect(five.maximaFound).toBeGreaterThanOrEqual(five.candidates.length);
  });

  it("finds the two- and four-seam references with 2 and 4 seam passes per turn, and at zero gyro the four-seam hold adds no seam movement (its seams balance over a turn: common practice, no source)", () => {
    const r0 = screenPitch(pitch({ gyroRad: 0, want: "any" }), settings({ gridSpacingRad: 6 * DEG, top: 1 }));
    const four = r0.references.find((x) => x.reference === "four-seam")!;
    const two = r0.references.find((x) => x.reference === "two-seam")!;
    expect(four.crossingsPerRevolution).toBe(4);
    expect(two.crossingsPerRevolution).toBe(2);
    expect(Math.hypot(four.seamMovement.armSideM, four.seamMovement.verticalM) / M_PER_IN).toBeLessThan(0.01);
    // and the best grip adds more than either hold
    expect(r0.candidates[0].score).toBeGreaterThan(Math.max(four.score, two.score));
  });

  it("robustness tends to the linear score as the scatter goes to zero (mean and p10 within 1e-9 m at 1e-9 rad), and scatter off a maximum can only lose", () => {
    const c = r.candidates[0];
    const score = (x: number, y: number, z: number) => {
      const [arm, up] = linear(p, [x, y, z]);
      return scoreOf(p.want, arm, up);
    };
    const at = score(c.axis[0], c.axis[1], c.axis[2]);
    const tiny = robustness(c.axis, 1e-9, score);
    expect(Math.abs(tiny.mean - at)).toBeLessThan(1e-9);
    expect(Math.abs(tiny.p10 - at)).toBeLessThan(1e-9);
    const wide = robustness(c.axis, 10 * DEG, score);
    expect(wide.p10).toBeLessThan(at);
    expect(wide.mean).toBeLessThan(at);
  });

  it("reads robustness from the sweep's map to within 0.15 in of turn averages at every scattered axis (mean and p10, each listed grip and hold) [closed form: the same quadrature on the exact linear score]", () => {
    const exact = (x: number, y: number, z: number) => {
      const [arm, up] = linear(p, [x, y, z]);
      return scoreOf(p.want, arm, up);
    };
    for (const c of [...r.candidates, ...r.references]) {
      const direct = robustness(c.axis, r.settings.spreadRad, exact);
      expect(Math.abs(c.robustness.mean - direct.mean) / M_PER_IN).toBeLessThan(0.15);
      expect(Math.abs(c.robustness.p10 - direct.p10) / M_PER_IN).toBeLessThan(0.15);
    }
  });

  it("ranks candidates by the blend (score + p10) / 2 by default", () => {
    for (let i = 1; i < r.candidates.length; i++) expect(r.candidates[i - 1].rankScore).toBeGreaterThanOrEqual(r.candidates[i].rankScore);
    for (const c of r.candidates) expect(Math.abs(c.rankScore - 0.5 * (c.score + c.robustness.p10))).toBeLessThan(1e-15);
  });

  it("says a wanted direction is out of reach when no grip can push that way: reach is the best push that way over the strongest push anywhere (0 to 1)", () => {
    expect(r.reach.wantFraction).toBeGreaterThan(0.05);
    expect(r.reach.wantFraction).toBeLessThanOrEqual(1);
    // the best that way over the grid and over the grips and holds flown in full, so no listed grip beats it
    const flown = [...r.candidates, ...r.references].map((c) => c.score);
    expect(Math.abs(r.reach.bestTowardM - Math.max(...r.scores, ...flown))).toBeLessThan(1e-15);
    for (const c of [...r.candidates, ...r.references]) expect(Math.hypot(c.seamMovement.armSideM, c.seamMovement.verticalM)).toBeLessThanOrEqual(r.reach.strongestM);
    const any = screenPitch(pitch({ want: "any" }), settings({ gridSpacingRad: 6 * DEG, top: 1 }));
    expect(any.reach.wantFraction).toBe(1);
  });

  it("puts the index and middle pads one finger spacing apart (0.8 in along the surface of the 9 1/8 in ball) and names the cover half under each", () => {
    for (const c of r.candidates) {
      const [index, middle] = c.grip.pads;
      expect(angleBetween(index.direction, middle.direction) * (BALL_CIRCUMFERENCE_IN / (2 * Math.PI))).toBeCloseTo(0.8, 9);
      expect(["A", "B"]).toContain(index.region.half);
      expect(index.seamDistanceIn).toBeGreaterThanOrEqual(0);
    }
  });

  it("maps the release rotation so the spin axis lands on the pitch's field axis and the pads sit behind the ball (toward the pitcher)", () => {
    const frame = pitchFrame(p);
    for (const c of r.candidates) {
      const m = c.grip.ballToField;
      const w = c.axis;
      const wf = [m[0] * w[0] + m[1] * w[1] + m[2] * w[2], m[3] * w[0] + m[4] * w[1] + m[5] * w[2], m[6] * w[0] + m[7] * w[1] + m[8] * w[2]];
      wf.forEach((x, k) => expect(Math.abs(x - frame.spinAxis[k])).toBeLessThan(1e-12));
      const t = c.grip.trailingPoint;
      const tf1 = m[3] * t[0] + m[4] * t[1] + m[5] * t[2];
      expect(tf1).toBeGreaterThan(0.9); // +y is toward the pitcher: behind a ball flying along -y
    }
  });
});
