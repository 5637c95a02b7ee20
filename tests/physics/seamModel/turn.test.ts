import { describe, expect, it } from "vitest";
import { ballToFlowAtPhase } from "../../../geometry/flow.js";
import {
  defaultProfile,
  forceTimeline,
  instantAtPhase,
  instantaneousCoefficient,
  resolveProfile,
  seamModel,
  turnAverage,
} from "../../../src/physics/seamModel/index.js";
import { lcg, randomUnit } from "../../support/random.js";
import { expectAbsolute, expectRelative } from "../../support/tolerance.js";
import { DEG } from "./helpers.js";

describe("through the turn (phase convention of geometry/flow.ts)", () => {
  const model = seamModel();
  const rnd = lcg(77);
  const cases = Array.from({ length: 5 }, () => ({ axis: randomUnit(rnd), gyro: (2 * rnd() - 1) * 60 * DEG }));

  it("timeline entry j and instantAtPhase(2 pi j / phases) are the instantaneous coefficient at ballToFlowAtPhase(axis, gyro, 2 pi j / phases), coefficients to 1e-12 and the four separation angles to 1e-9 rad", () => {
    for (const c of cases) {
      const t = forceTimeline(model, c.axis, c.gyro, 36);
      const m = new Float64Array(9);
      for (let j = 0; j < 36; j++) {
        ballToFlowAtPhase(c.axis[0], c.axis[1], c.axis[2], c.gyro, (2 * Math.PI * j) / 36, m);
        const i = instantaneousCoefficient(model, m);
        expectAbsolute(t.across[j], i.across, 1e-12);
        expectAbsolute(t.alongMagnus[j], i.alongMagnus, 1e-12);
        expectAbsolute(t.separationPlusAcrossRad[j], i.separationPlusAcrossRad, 1e-9);
        expectAbsolute(t.separationMinusAcrossRad[j], i.separationMinusAcrossRad, 1e-9);
        expectAbsolute(t.separationPlusMagnusRad[j], i.separationPlusMagnusRad, 1e-9);
        expectAbsolute(t.separationMinusMagnusRad[j], i.separationMinusMagnusRad, 1e-9);
        const a = instantAtPhase(model, c.axis, c.gyro, (2 * Math.PI * j) / 36);
        expectAbsolute(a.across, i.across, 1e-12);
        expectAbsolute(a.alongMagnus, i.alongMagnus, 1e-12);
      }
    }
  });

  it("the turn average equals the mean of the timeline at the same phase count (the model's 96), to 1e-15, and is not trivially zero", () => {
    let largest = 0;
    for (const c of cases) {
      const avg = turnAverage(model, c.axis, c.gyro);
      const t = forceTimeline(model, c.axis, c.gyro, model.resolution.phases);
      const mean = (f: Float64Array) => f.reduce((s, x) => s + x, 0) / f.length;
      expectAbsolute(avg.across, mean(t.across), 1e-15);
      expectAbsolute(avg.alongMagnus, mean(t.alongMagnus), 1e-15);
      largest = Math.max(largest, Math.abs(avg.across), Math.abs(avg.alongMagnus));
    }
    expect(largest).toBeGreaterThan(0.01);
  });

  it("every separation angle in a timeline is the laminar (80), the turbulent (120) angle or inside the fixation band (80-120 deg), to 1e-9 deg", () => {
    const t = forceTimeline(model, cases[0].axis, cases[0].gyro, 72);
    for (const f of [t.separationPlusAcrossRad, t.separationMinusAcrossRad, t.separationPlusMagnusRad, t.separationMinusMagnusRad]) {
      for (const rad of f) {
        const deg = rad / DEG;
        expect(deg).toBeGreaterThanOrEqual(80 - 1e-9);
        expect(deg).toBeLessThanOrEqual(120 + 1e-9);
      }
    }
  });

  it("the scale parameter multiplies the turn average (0.5 x, 1e-13 relative)", () => {
    const half = seamModel(resolveProfile({ name: "half", parameters: { scale: 0.5 } }, "test"));
    const a = turnAverage(model, cases[1].axis, cases[1].gyro);
    const b = turnAverage(half, cases[1].axis, cases[1].gyro);
    expectRelative(b.across, 0.5 * a.across, 1e-13);
    expectRelative(b.alongMagnus, 0.5 * a.alongMagnus, 1e-13);
  });

  it("rejects a zero axis, |gyro| >= 90 deg and a timeline phase count not a multiple of 4 (RangeError naming the value)", () => {
    expect(() => turnAverage(model, [0, 0, 0], 0)).toThrow(/cannot normalise vector \(0, 0, 0\)/);
    expect(() => turnAverage(model, [0, 0, 1], 95 * DEG)).toThrow(/gyro angle 95/);
    expect(() => forceTimeline(model, [0, 0, 1], 0, 90)).toThrow(/timeline phases 90/);
    expect(() => instantAtPhase(model, [0, 0, 1], 0, Number.POSITIVE_INFINITY)).toThrow(/phase Infinity rad/);
  });

  it("models built from different profiles share one set of seam samples and azimuth bins (the same objects), so building one per parameter vector redoes no sampling", () => {
    const a = seamModel(defaultProfile());
    const b = seamModel(resolveProfile({ name: "b", parameters: { wakePressureCoefficient: -0.35 } }, "t"));
    expect(a.seam).toBe(b.seam);
    expect(a.bins).toBe(b.bins);
  });
});
