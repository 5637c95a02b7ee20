import { describe, expect, it } from "vitest";
import { DEFAULT_BAND } from "../../../src/sampling/band.js";
import {
  SEAM_MODEL_PARAMETERS,
  SEAM_MODEL_PARAMETER_NAMES,
  bandOf,
  canonicalValuesJson,
  defaultProfile,
  resolveProfile,
  resolveResolution,
  seamModel,
} from "../../../src/physics/seamModel/index.js";

describe("the parameter table", () => {
  it("names every parameter once, each with a unit, a source, a range containing its default", () => {
    expect(SEAM_MODEL_PARAMETERS.map((p) => p.name)).toEqual([...SEAM_MODEL_PARAMETER_NAMES]);
    for (const p of SEAM_MODEL_PARAMETERS) {
      expect(p.source.length).toBeGreaterThan(20);
      expect(p.min).toBeLessThanOrEqual(p.defaultValue);
      expect(p.defaultValue).toBeLessThanOrEqual(p.max);
      expect(["deg", "1"]).toContain(p.unit);
    }
  });

  it("defaults sit inside the recalled published values: laminar separation 80-85 deg and turbulent 110-120 deg (Achenbach, J. Fluid Mech. 54(3), 1972, from memory); the trip zone contains the 20 deg seam angle of largest cricket-ball swing (Mehta, Annu. Rev. Fluid Mech. 17, 1985, from memory); potential-flow pressure (suction factor 1, Katz 2016 eq. 6.75)", () => {
    const v = defaultProfile().values;
    expect(v.laminarSeparationDeg).toBeGreaterThanOrEqual(80);
    expect(v.laminarSeparationDeg).toBeLessThanOrEqual(85);
    expect(v.turbulentSeparationDeg).toBeGreaterThanOrEqual(110);
    expect(v.turbulentSeparationDeg).toBeLessThanOrEqual(120);
    expect(v.tripStartDeg).toBeLessThan(20);
    expect(v.tripEndDeg).toBeGreaterThan(20);
    expect(v.suctionFactor).toBe(1);
    expect(v.scale).toBe(1);
  });

  it("the default fixation band is the sampler's band (one definition, src/sampling/band.ts)", () => {
    const band = bandOf(defaultProfile().values);
    expect(band.centerRad).toBe(DEFAULT_BAND.centerRad);
    expect(band.widthRad).toBe(DEFAULT_BAND.widthRad);
    expect(seamModel().band).toEqual(DEFAULT_BAND);
  });
});

describe("profiles", () => {
  it("missing names take defaults; the hash is 8 hex digits, depends on the values only (not the name or key order) and changes with any value", () => {
    const d = defaultProfile();
    expect(d.hash).toMatch(/^[0-9a-f]{8}$/);
    const same = resolveProfile({ name: "other", parameters: { scale: 1, laminarSeparationDeg: d.values.laminarSeparationDeg } }, "t");
    expect(same.hash).toBe(d.hash);
    expect(same.values).toEqual(d.values);
    const a = resolveProfile({ name: "a", parameters: { scale: 2, wakePressureCoefficient: -0.35 } }, "t");
    const b = resolveProfile({ name: "b", parameters: { wakePressureCoefficient: -0.35, scale: 2 } }, "t");
    expect(a.hash).toBe(b.hash);
    expect(canonicalValuesJson(a.values)).toBe(canonicalValuesJson(b.values));
    const hashes = new Set<string>([d.hash]);
    for (const p of SEAM_MODEL_PARAMETERS.filter((q) => q.calibratable)) {
      const nudged = p.defaultValue + (p.defaultValue + 0.01 <= p.max ? 0.01 : -0.01);
      hashes.add(resolveProfile({ name: "n", parameters: { [p.name]: nudged } }, "t").hash);
    }
    expect(hashes.size).toBe(1 + SEAM_MODEL_PARAMETERS.filter((q) => q.calibratable).length);
  });

  it("the default profile's canonical JSON and hash are pinned (outputs echo the hash: a change of defaults must show here); the hash is the first 8 hex digits of SHA-256 of that JSON", async () => {
    const d = defaultProfile();
    const json =
      '[["laminarSeparationDeg",80],["turbulentSeparationDeg",120],["tripStartDeg",10],["tripEndDeg",50],' +
      '["bandCenterDeg",100],["bandWidthDeg",40],["wakePressureCoefficient",-0.3],["suctionFactor",1],["scale",1]]';
    expect(canonicalValuesJson(d.values)).toBe(json);
    const { createHash } = await import("node:crypto");
    expect(createHash("sha256").update(json).digest("hex").slice(0, 8)).toBe(d.hash);
    expect(d.hash).toBe("6c7f8250");
  });

  it("rejects an unknown name, a non-number, an out-of-range value and malformed profiles with a one-line RangeError naming the source, the name, the value and the range", () => {
    expect(() => resolveProfile({ name: "x", parameters: { laminarAngle: 80 } }, "lab.json")).toThrow(
      /lab\.json: unknown seam model parameter "laminarAngle"/,
    );
    expect(() => resolveProfile({ name: "x", parameters: { scale: "2" } }, "lab.json")).toThrow(/scale = "2" must be a number from 0 to 10/);
    expect(() => resolveProfile({ name: "x", parameters: { laminarSeparationDeg: 95 } }, "lab.json")).toThrow(
      /laminarSeparationDeg = 95 must be a number from 75 to 90 deg/,
    );
    expect(() => resolveProfile({ name: "x", parameters: { scale: Number.NaN } }, "p")).toThrow(/scale = NaN must be/);
    expect(() => resolveProfile([], "p")).toThrow(RangeError);
    expect(() => resolveProfile({ parameters: {} }, "p")).toThrow(/"name" must be a non-empty string/);
    expect(() => resolveProfile({ name: "x", extra: 1 }, "p")).toThrow(/unknown profile field "extra"/);
    expect(() => resolveProfile({ name: "x", parameters: [1] }, "p")).toThrow(/"parameters" must be an object/);
    for (const fn of [() => resolveProfile({ name: "x", parameters: { scale: 11 } }, "p")]) {
      expect(fn).toThrow(RangeError);
      try {
        fn();
      } catch (e) {
        expect((e as Error).message).not.toContain("\n");
      }
    }
  });

  it("cross-parameter checks: trip zone ordered, ending at or before laminar separation and the band's near edge; laminar before turbulent; wake pressure above the attached Cp where separation can be", () => {
    expect(() => resolveProfile({ name: "x", parameters: { tripStartDeg: 50, tripEndDeg: 40 } }, "p")).toThrow(/tripStartDeg 50 must be below tripEndDeg 40/);
    expect(() => resolveProfile({ name: "x", parameters: { tripEndDeg: 79, laminarSeparationDeg: 78 } }, "p")).toThrow(
      /tripEndDeg 79 must be at most laminarSeparationDeg 78/,
    );
    expect(() => resolveProfile({ name: "x", parameters: { tripEndDeg: 75, bandCenterDeg: 110, bandWidthDeg: 80 } }, "p")).toThrow(
      /tripEndDeg 75 must be at most the fixation band's near edge 70 deg/,
    );
    expect(() => resolveProfile({ name: "x", parameters: { laminarSeparationDeg: 90, turbulentSeparationDeg: 100, bandCenterDeg: 140, bandWidthDeg: 100 } }, "p")).toThrow(
      /band 90 to 190 deg/,
    );
    // at 120 deg potential flow has Cp = -0.6875: a wake at -0.7 would out-suck the attached flow
    expect(() => resolveProfile({ name: "x", parameters: { wakePressureCoefficient: -0.7 } }, "p")).toThrow(
      /wakePressureCoefficient -0.7 must be above -0.6875/,
    );
  });

  it("resolution: seam points, azimuth bins and phases must be multiples of 4 in range (RangeError naming the value)", () => {
    expect(resolveResolution({}).azimuthBins % 4).toBe(0);
    expect(() => resolveResolution({ azimuthBins: 90 })).toThrow(/azimuth bins 90/);
    expect(() => resolveResolution({ phases: 2 })).toThrow(/phases per turn 2/);
    expect(() => resolveResolution({ seamPoints: 100 + 2 })).toThrow(/seam points 102/);
    expect(() => seamModel(defaultProfile(), { seamShape: 0.6 })).toThrow(/seam shape b = 0.6/);
  });
});
