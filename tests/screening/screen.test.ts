import { describe, expect, it } from "vitest";
import { clockToAngle, parseClock, angleToClock, formatClock } from "../../geometry/clock.js";
import { equalAreaGrid } from "../../geometry/sphereGrid.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { angleBetween } from "../../geometry/vec.js";
import { bandAveragesExact } from "../../src/sampling/exact.js";
import { seamFor } from "../../src/sampling/measure.js";
import { computeSphereMap } from "../../src/sampling/sphereMap.js";
import { pitchFrame, pushInField, scoreFactor, type Pitch } from "../../src/screening/pitch.js";
import { robustness } from "../../src/screening/robustness.js";
import { screenPitch, symmetricAngle } from "../../src/screening/screen.js";
import { DEFAULT_BAND } from "../../src/sampling/band.js";
import { sinkerPitch } from "../support/pitches.js";
import { DEG } from "../../geometry/units.js";

const pitch = (over: Partial<Pitch> = {}): Pitch => sinkerPitch({ name: "test", ...over });

describe("screen", () => {
  const p = pitch();
  const r = screenPitch(p, { gridSpacingRad: 2 * DEG });

  it("puts the top candidate within 1 deg and 1 % of the best found by exhaustive search on a 0.5 deg grid", () => {
    const seam = seamFor();
    const fine = computeSphereMap(seam, p.gyroRad, DEFAULT_BAND, equalAreaGrid(0.5 * DEG));
    const f = scoreFactor(pitchFrame(p), p.want)!;
    let best = -Infinity;
    let bestAxis: [number, number, number] = [0, 0, 1];
    for (let i = 0; i < fine.grid.count; i++) {
      const s = f * fine.alongAxis[i];
      if (s > best) {
        best = s;
        bestAxis = [fine.grid.points[3 * i], fine.grid.points[3 * i + 1], fine.grid.points[3 * i + 2]];
      }
    }
    const topByScore = [...r.candidates].sort((a, b) => b.score - a.score)[0];
    expect(Math.abs(topByScore.score - best) / best).toBeLessThan(0.01);
    expect(topByScore.score).toBeGreaterThanOrEqual(best * 0.99);
    expect(symmetricAngle(topByScore.axis, bestAxis)).toBeLessThan(1 * DEG);
  });

  it("gives every symmetric image of a position the identical score (to 1e-13)", () => {
    const seam = seamFor();
    const f = scoreFactor(pitchFrame(p), p.want)!;
    for (const c of r.candidates) {
      for (const g of SEAM_SYMMETRIES) {
        const q = applySymmetry(g, c.axis);
        const s = f * bandAveragesExact(seam, q[0], q[1], q[2], p.gyroRad, DEFAULT_BAND).alongAxis;
        expect(Math.abs(s - c.score)).toBeLessThan(1e-13);
      }
    }
  });

  it("lists distinct candidates: no two are symmetric images of each other within 2 deg", () => {
    for (let i = 0; i < r.candidates.length; i++)
      for (let j = i + 1; j < r.candidates.length; j++) expect(symmetricAngle(r.candidates[i].axis, r.candidates[j].axis)).toBeGreaterThan(2 * DEG);
  });

  it("finds the two- and four-seam references with 2 and 4 crossings and no net asymmetry at zero gyro (common practice, no source: symmetric holds average out over a turn)", () => {
    const r0 = screenPitch(pitch({ gyroRad: 0, want: "any" }), { gridSpacingRad: 4 * DEG, top: 1 });
    const four = r0.references.find((x) => x.reference === "four-seam")!;
    const two = r0.references.find((x) => x.reference === "two-seam")!;
    expect(four.crossingsPerRevolution).toBe(4);
    expect(two.crossingsPerRevolution).toBe(2);
    expect(four.averages.magnitude).toBeLessThan(1e-12);
    expect(two.averages.magnitude).toBeLessThan(1e-12);
    // and a candidate adds over them
    expect(r0.candidates[0].score).toBeGreaterThan(1e-3);
  });

  it("robustness tends to the plain score as the scatter goes to zero (mean and p10 within 1e-9 at 1e-9 rad)", () => {
    const c = r.candidates[0];
    const seam = seamFor();
    const f = scoreFactor(pitchFrame(p), p.want)!;
    const score = (x: number, y: number, z: number) => f * bandAveragesExact(seam, x, y, z, p.gyroRad, DEFAULT_BAND).alongAxis;
    const tiny = robustness(c.axis, 1e-9, score);
    expect(Math.abs(tiny.mean - c.score)).toBeLessThan(1e-9);
    expect(Math.abs(tiny.p10 - c.score)).toBeLessThan(1e-9);
    const wide = robustness(c.axis, 10 * DEG, score);
    expect(wide.p10).toBeLessThan(c.score); // scatter off a maximum can only lose
    expect(wide.mean).toBeLessThan(c.score);
  });

  it("ranks candidates by the blend (score + p10) / 2 by default", () => {
    for (let i = 1; i < r.candidates.length; i++) expect(r.candidates[i - 1].rankScore).toBeGreaterThanOrEqual(r.candidates[i].rankScore);
    for (const c of r.candidates) expect(Math.abs(c.rankScore - 0.5 * (c.score + c.robustness.p10))).toBeLessThan(1e-15);
  });

  it("puts the index and middle pads one finger spacing apart (0.8 in along the surface) and names the cover half under each", () => {
    for (const c of r.candidates) {
      const [index, middle] = c.grip.pads;
      expect(angleBetween(index.direction, middle.direction) * (9.125 / (2 * Math.PI))).toBeCloseTo(0.8, 9);
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

describe("push in field terms", () => {
  it("reads the same direction from both views as mirror clocks, and arm side flips with the hand", () => {
    for (const hand of ["right", "left"] as const) {
      const pp = pitch({ hand, view: "pitcher" });
      const pc = pitch({ hand, view: "catcher", tiltRad: clockToAngle(parseClock("10:15")) }); // 1:45 from behind the pitcher is 10:15 from behind the catcher
      const fp = pitchFrame(pp);
      const fc = pitchFrame(pc);
      fp.spinAxis.forEach((x, k) => expect(Math.abs(x - fc.spinAxis[k])).toBeLessThan(1e-12));
      const a = pushInField(fp, "pitcher", 0.01);
      const b = pushInField(fc, "catcher", 0.01);
      const toMinutes = (rad: number) => angleToClock(rad);
      expect(Math.abs(((toMinutes(a.clockRad!) + toMinutes(b.clockRad!)) % 720))).toBeLessThan(1e-6);
      expect(Math.abs(a.armSide - b.armSide)).toBeLessThan(1e-15);
      // arm side: the pitcher's right (-x) for a right-hander (common practice, no source)
      expect(Math.sign(a.armSide)).toBe(Math.sign(hand === "right" ? -a.vector[0] : a.vector[0]));
    }
    // the same field push is arm side for one hand and glove side for the other
    const r = pushInField(pitchFrame(pitch({ hand: "right" })), "pitcher", 0.01);
    const l = pushInField(pitchFrame(pitch({ hand: "left" })), "pitcher", 0.01);
    expect(Math.abs(r.armSide + l.armSide)).toBeLessThan(1e-15);
    expect(formatClock(angleToClock(r.clockRad!))).toBe("4:45");
  });

  it("puts the push across the Magnus direction: for pure backspin it is horizontal (arm or glove side)", () => {
    const f = pitchFrame(pitch({ tiltRad: 0, gyroRad: 0 }));
    const push = pushInField(f, "pitcher", 0.01);
    expect(Math.abs(push.up)).toBeLessThan(1e-15);
    expect(Math.abs(Math.abs(push.armSide) - 0.01)).toBeLessThan(1e-15);
  });
});
