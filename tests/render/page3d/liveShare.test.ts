import { Vector3 } from "three";
import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE } from "../../../geometry/seamCurve.js";
import { DEG } from "../../../geometry/units.js";
import { DEFAULT_BAND } from "../../../src/sampling/band.js";
import { SPLIT_TIE } from "../../../src/sampling/exact.js";
import { measureOrientation, seamFor } from "../../../src/sampling/measure.js";
import { LiveSeamShares, SEAM_IN_BAND_MINUS, SEAM_IN_BAND_ON_SPLIT, SEAM_IN_BAND_PLUS, SEAM_OUT_OF_BAND } from "../../../src/render/page3d/liveShare.js";
import { BallPose } from "../../../src/render/page3d/sceneMath.js";
import { lcg, randomUnit } from "../../support/random.js";

const SEAM_POINTS = 1024;
const seam = seamFor(DEFAULT_SEAM_SHAPE, SEAM_POINTS);
const rnd = lcg(2024);
const cases = Array.from({ length: 8 }, () => ({ axis: randomUnit(rnd), gyroRad: (rnd() - 0.5) * 120 * DEG }));

describe("live in-band shares of the 3-D page", () => {
  it("equal the ball-frame closed form of the turning flow, v(phi) = s w + k (cos phi e1 - sin phi e2) and a = (w - s v) / k (src/sampling/exact.ts header; geometry/flow.ts phase convention), at every whole degree for 8 random axes and gyros up to 60 deg, up to the samples within 1e-9 of a band limit or the split", () => {
    // A second route: no rotation matrix, only the ball-frame formulas, against the page's count.
    const live = new LiveSeamShares(seam, DEFAULT_BAND);
    const cosHi = Math.cos(DEFAULT_BAND.centerRad - DEFAULT_BAND.widthRad / 2);
    const cosLo = Math.cos(DEFAULT_BAND.centerRad + DEFAULT_BAND.widthRad / 2);
    const EDGE = 1e-9;
    let phasesThatDiffer = 0;
    for (const c of cases) {
      const w = c.axis;
      const s = Math.sin(c.gyroRad);
      const k = Math.cos(c.gyroRad);
      // e1: the +z pole's part across w, normalised; e2 = w x e1
      const pz = 1 - w[2] * w[2];
      const e1 = [-w[2] * w[0] / Math.sqrt(pz), -w[2] * w[1] / Math.sqrt(pz), pz / Math.sqrt(pz)];
      const e2 = [w[1] * e1[2] - w[2] * e1[1], w[2] * e1[0] - w[0] * e1[2], w[0] * e1[1] - w[1] * e1[0]];
      live.setOrientation(w, c.gyroRad);
      for (let deg = 0; deg < 360; deg++) {
        const phi = (2 * Math.PI * deg) / 360;
        const v = [0, 1, 2].map((i) => s * w[i] + k * (Math.cos(phi) * e1[i] - Math.sin(phi) * e2[i]));
        const a = [0, 1, 2].map((i) => (w[i] - s * v[i]) / k);
        let plus = 0;
        let minus = 0;
        let doubtful = 0;
        for (let i = 0; i < seam.count; i++) {
          const q = [seam.points[3 * i], seam.points[3 * i + 1], seam.points[3 * i + 2]];
          const qv = q[0] * v[0] + q[1] * v[1] + q[2] * v[2];
          const qa = q[0] * a[0] + q[1] * a[1] + q[2] * a[2];
          if (Math.abs(qv - cosLo) < EDGE || Math.abs(qv - cosHi) < EDGE || (qv >= cosLo && qv <= cosHi && Math.abs(qa) < EDGE)) doubtful++;
          if (qv < cosLo || qv > cosHi) continue;
          if (qa > SPLIT_TIE) plus++;
          else if (qa < -SPLIT_TIE) minus++;
          else (plus += 0.5), (minus += 0.5);
        }
        const shares = live.update(phi);
        const tol = doubtful / SEAM_POINTS + 1e-15;
        expect(Math.abs(shares.axisPlus - plus / SEAM_POINTS)).toBeLessThanOrEqual(tol);
        expect(Math.abs(shares.axisMinus - minus / SEAM_POINTS)).toBeLessThanOrEqual(tol);
        if (shares.axisPlus !== plus / SEAM_POINTS || shares.axisMinus !== minus / SEAM_POINTS) phasesThatDiffer++;
      }
    }
    // doubtful samples are rare: under 1 % of the 2,880 phases differ at all
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
