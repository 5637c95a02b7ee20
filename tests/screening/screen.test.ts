import { describe, expect, it } from "vitest";
import { clockToAngle, parseClock } from "../../geometry/clock.js";
import { equalAreaGrid } from "../../geometry/sphereGrid.js";
import { angleBetween } from "../../geometry/vec.js";
import { bandAveragesBrute } from "../../src/sampling/brute.js";
import { seamFor } from "../../src/sampling/measure.js";
import { computeSphereMap } from "../../src/sampling/sphereMap.js";
import { pitchFrame, scoreFactor, type Pitch } from "../../src/screening/pitch.js";
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

  it("scores each candidate as the brute-force sampler's alongAxis (720 steps) times cos 52.5 deg, the push line's share toward a right-hander's arm side for tilt 1:45 (closed form: a = (-cos t, 0, -sin t) from behind the pitcher), within 0.5 %", () => {
    const seam = seamFor();
    const armShare = Math.cos(clockToAngle(parseClock("1:45")));
    expect(Math.abs(armShare - Math.cos(52.5 * DEG))).toBeLessThan(1e-15);
    for (const c of r.candidates) {
      const brute = bandAveragesBrute(seam, c.axis[0], c.axis[1], c.axis[2], p.gyroRad, DEFAULT_BAND, 720).alongAxis;
      expect(Math.abs(c.score / (armShare * brute) - 1)).toBeLessThan(5e-3);
    }
  });

  it("lists distinct candidates: no two are symmetric images of each other within 2 deg", () => {
    for (let i = 0; i < r.candidates.length; i++)
      for (let j = i + 1; j < r.candidates.length; j++) expect(symmetricAngle(r.candidates[i].axis, r.candidates[j].axis)).toBeGreaterThan(2 * DEG);
  });

  it("finds the two- and four-seam references with 2 and 4 crossings (A. M. Nathan, Am. J. Phys. 76(2), 2008) and no net asymmetry at zero gyro (common practice, no source: symmetric holds average out over a turn)", () => {
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

  it("keeps each candidate a local maximum under release scatter: the 5 deg scatter's mean and 10th percentile lie below the score", () => {
    for (const c of r.candidates) {
      expect(c.robustness.mean).toBeLessThan(c.score);
      expect(c.robustness.p10).toBeLessThan(c.score);
    }
  });

  it("ranks candidates by the blend (score + p10) / 2 by default", () => {
    for (let i = 1; i < r.candidates.length; i++) expect(r.candidates[i - 1].rankScore).toBeGreaterThanOrEqual(r.candidates[i].rankScore);
    for (const c of r.candidates) expect(Math.abs(c.rankScore - 0.5 * (c.score + c.robustness.p10))).toBeLessThan(1e-15);
  });

  it("puts the index and middle pads one finger spacing apart (0.8 in along the surface of the 9 1/8 in ball, Thompson 1998; about one finger's width, common practice, no source) and names the cover half under each", () => {
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
