import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatLatLon, latLonToVector, parseLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { angleBetween } from "../../geometry/vec.js";
import { uniform } from "../support/arbitraries.js";

// Spherical coordinates (closed form): latitude from the z = 0 plane toward +z, longitude from
// +x toward +y, (cos lat cos lon, cos lat sin lon, sin lat); longitude in (-180, 180] deg.

/** Longitude difference in degrees, wrapped into [0, 180]. */
const lonGap = (a: number, b: number) => Math.abs(((b - a + 540) % 360) - 180);
const LAT = uniform(-90, 90);
const LON = uniform(-180, 180);

describe("ball latitude and longitude", () => {
  it("puts 0N,0E at +x (node-1), 0N,90E at +y (node-2) and 90N at +z (waist-A), to 1e-15 (closed form)", () => {
    const near = (a: readonly number[], b: readonly number[]) => a.forEach((x, k) => expect(Math.abs(x - b[k])).toBeLessThan(1e-15));
    near(latLonToVector(0, 0), [1, 0, 0]);
    near(latLonToVector(0, 90), [0, 1, 0]);
    near(latLonToVector(90, 37), [0, 0, 1]);
    near(latLonToVector(-90, 0), [0, 0, -1]);
  });

  it("round-trips lat/lon -> vector -> lat/lon for 2000 random points, poles and the 180 deg meridian included: the same point to 2e-15 rad (a few rounding steps), latitude to 1e-12 deg, longitude to 1e-12 deg / cos(lat)", () => {
    fc.assert(
      fc.property(LAT, LON, (lat, lon) => {
        const v = latLonToVector(lat, lon);
        const back = vectorToLatLon(v);
        expect(back.lonDeg).toBeGreaterThan(-180);
        expect(back.lonDeg).toBeLessThanOrEqual(180);
        expect(Math.abs(back.latDeg - lat)).toBeLessThan(1e-12);
        expect(angleBetween(latLonToVector(back.latDeg, back.lonDeg), v)).toBeLessThan(2e-15);
        const cosLat = Math.cos((lat * Math.PI) / 180);
        if (cosLat > 1e-6) expect(lonGap(back.lonDeg, lon)).toBeLessThan(1e-12 / cosLat);
      }),
      { seed: 180, numRuns: 2000, examples: [[90, 0], [-90, 123], [0, 180], [0, -180], [45, 180], [-30, -180], [89.9999999, 10]] },
    );
  });

  it("reads the poles as longitude 0, and both sides of the 180 deg meridian as +180 rather than -180", () => {
    expect(vectorToLatLon([0, 0, 2])).toEqual({ latDeg: 90, lonDeg: 0 });
    expect(vectorToLatLon([0, 0, -1])).toEqual({ latDeg: -90, lonDeg: 0 });
    expect(vectorToLatLon([-1, 0, 0]).lonDeg).toBe(180);
    expect(vectorToLatLon(latLonToVector(0, -180)).lonDeg).toBe(180);
  });

  it("vector -> lat/lon -> vector returns the unit vector of any non-zero input within 2e-15 rad (1000 random vectors, lengths 1e-3 to 1e3)", () => {
    const c = uniform(-1, 1);
    fc.assert(
      fc.property(c, c, c, uniform(-3, 3).map((e) => 10 ** e), (x, y, z, scale) => {
        fc.pre(Math.hypot(x, y, z) > 1e-3);
        const v: [number, number, number] = [x * scale, y * scale, z * scale];
        const p = vectorToLatLon(v);
        expect(angleBetween(latLonToVector(p.latDeg, p.lonDeg), v)).toBeLessThan(2e-15);
      }),
      { seed: 181, numRuns: 1000 },
    );
  });

  it("prints and parses back to the printed precision: |parsed - true| <= half a unit in the last digit, and printing the parsed value gives the same text (2000 random points, 0 to 4 decimals)", () => {
    fc.assert(
      fc.property(LAT, LON, fc.integer({ min: 0, max: 4 }), (latDeg, lonDeg, digits) => {
        const text = formatLatLon({ latDeg, lonDeg }, digits);
        expect(text).toMatch(/^\d+(\.\d+)?[NS],\d+(\.\d+)?[EW]$/);
        const back = parseLatLon(text)!;
        const half = 0.5 * 10 ** -digits + 1e-9;
        expect(Math.abs(back.latDeg - latDeg)).toBeLessThanOrEqual(half);
        expect(lonGap(back.lonDeg, lonDeg)).toBeLessThanOrEqual(half);
        expect(formatLatLon(back, digits)).toBe(text);
      }),
      { seed: 182, numRuns: 2000, examples: [[0, 0, 1], [-0.04, -0.04, 1], [-90, -180, 0], [12.5, 45, 1]] },
    );
  });

  it("prints a value that rounds to zero with the positive letter (0.0N, 0.0E, never 0.0S or 0.0W)", () => {
    expect(formatLatLon({ latDeg: -0.04, lonDeg: -0.04 })).toBe("0.0N,0.0E");
    expect(formatLatLon({ latDeg: 12.5, lonDeg: -45 })).toBe("12.5N,45.0W");
  });

  it("parses the written forms with a space after the comma and lower-case letters, returns null for other text, and rejects latitudes past 90 deg", () => {
    expect(parseLatLon("12.5n, 45e")).toEqual({ latDeg: 12.5, lonDeg: 45 });
    expect(parseLatLon("30S,100W")).toEqual({ latDeg: -30, lonDeg: -100 });
    for (const bad of ["", "12.5,45", "N12,E45", "12N 45E", "waist-A"]) expect(parseLatLon(bad)).toBeNull();
    expect(() => parseLatLon("91N,0E")).toThrow(/latitude 91N/);
    expect(() => parseLatLon("0N,181E")).toThrow(/longitude 181E/);
  });
});
