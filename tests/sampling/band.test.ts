import { describe, expect, it } from "vitest";
import { DEG } from "../../geometry/units.js";
import { assertGyro, bandFromDegrees, DEFAULT_BAND, DEFAULT_BAND_CENTER_DEG, DEFAULT_BAND_WIDTH_DEG } from "../../src/sampling/band.js";

describe("the separation band", () => {
  it("runs from 80 to 120 deg by default, spanning a smooth sphere's laminar (about 82 deg) and supercritical (about 120 deg) separation angles (E. Achenbach, J. Fluid Mech. 54(3), 565 (1972), from memory), to 1e-12 deg", () => {
    const loDeg = (DEFAULT_BAND.centerRad - DEFAULT_BAND.widthRad / 2) / DEG;
    const hiDeg = (DEFAULT_BAND.centerRad + DEFAULT_BAND.widthRad / 2) / DEG;
    expect(Math.abs(loDeg - 80)).toBeLessThan(1e-12);
    expect(Math.abs(hiDeg - 120)).toBeLessThan(1e-12);
    expect(loDeg).toBeLessThanOrEqual(82);
    expect(hiDeg).toBeGreaterThanOrEqual(120 - 1e-12);
    expect([DEFAULT_BAND_CENTER_DEG, DEFAULT_BAND_WIDTH_DEG]).toEqual([100, 40]);
  });

  it("builds a band from degrees in radians (pi / 180 per degree) and rejects one reaching 0 or 180 deg, a zero width or NaN", () => {
    const band = bandFromDegrees(95, 30);
    expect(Math.abs(band.centerRad - (95 * Math.PI) / 180)).toBeLessThan(1e-15);
    expect(Math.abs(band.widthRad - Math.PI / 6)).toBeLessThan(1e-15);
    expect(() => bandFromDegrees(15, 30)).toThrow(/must lie inside \(0, 180\)/);
    expect(() => bandFromDegrees(165, 30)).toThrow(/must lie inside \(0, 180\)/);
    expect(() => bandFromDegrees(90, 0)).toThrow(/band width 0 deg/);
    expect(() => bandFromDegrees(Number.NaN, 10)).toThrow(/band centre/);
  });

  it("accepts gyro angles strictly between -90 and 90 deg only", () => {
    expect(() => assertGyro(89.9 * DEG)).not.toThrow();
    expect(() => assertGyro(-89.9 * DEG)).not.toThrow();
    expect(() => assertGyro(Math.PI / 2)).toThrow(/gyro angle 90/);
    expect(() => assertGyro(Number.NaN)).toThrow(RangeError);
  });
});
