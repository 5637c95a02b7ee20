import { describe, expect, it } from "vitest";
import { azimuthBins, meridiansUpTo, pseudoAngle } from "../../../src/physics/seamModel/azimuth.js";
import { lcg } from "../../support/random.js";

describe("meridians and the pseudo-angle (src/physics/seamModel/azimuth.ts)", () => {
  it("the pseudo-angle is 0, 1, 2, 3 on the axes and strictly increasing in the azimuth over 100,000 steps of a turn (so it orders points as atan2 does)", () => {
    expect([pseudoAngle(1, 0), pseudoAngle(0, 1), pseudoAngle(-1, 0), pseudoAngle(0, -1)]).toEqual([0, 1, 2, 3]);
    let previous = -1;
    for (let k = 0; k < 100000; k++) {
      const psi = (2 * Math.PI * k) / 100000;
      const p = pseudoAngle(Math.cos(psi), Math.sin(psi));
      expect(p).toBeGreaterThan(previous);
      expect(p).toBeLessThan(4);
      previous = p;
    }
  });

  it("its slope dp/dpsi = 1 / (|cos| + |sin|)^2 stays in [1/2, 1] (closed form), by central differences to 1e-6", () => {
    for (const psi of [0.1, 0.7, 1.9, 2.5, 3.6, 4.4, 5.9]) {
      const h = 1e-6;
      const slope = (pseudoAngle(Math.cos(psi + h), Math.sin(psi + h)) - pseudoAngle(Math.cos(psi - h), Math.sin(psi - h))) / (2 * h);
      expect(Math.abs(slope - 1 / (Math.abs(Math.cos(psi)) + Math.abs(Math.sin(psi))) ** 2)).toBeLessThan(1e-6);
    }
  });

  it("the table count of meridians at or below p equals a brute-force count, at every threshold and at 20,000 random p, for 8, 96 and 4096 meridians", () => {
    const rnd = lcg(5);
    for (const n of [8, 96, 4096]) {
      const bins = azimuthBins(n);
      const brute = (p: number) => bins.threshold.reduce((c, t) => c + (t <= p ? 1 : 0), 0);
      for (let j = 0; j < n; j++) expect(meridiansUpTo(bins, bins.threshold[j])).toBe(j + 1);
      for (let k = 0; k < 20000; k++) {
        const p = 4 * rnd();
        expect(meridiansUpTo(bins, p)).toBe(brute(p));
      }
    }
  });

  it("meridians are mirror images bit for bit (psi_{B - j} = -psi_j) and exact at the quarter points", () => {
    const bins = azimuthBins(96);
    for (let j = 1; j < 96; j++) {
      expect(bins.cos[96 - j]).toBe(bins.cos[j]);
      expect(bins.sin[96 - j] + bins.sin[j]).toBe(0);
    }
    expect([bins.cos[24], bins.sin[24], bins.cos[48], bins.sin[48]].map((x) => x + 0)).toEqual([0, 1, -1, 0]); // + 0 folds -0
  });
});
