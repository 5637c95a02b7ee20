import { describe, expect, it } from "vitest";
import { HAMMER_HALF_HEIGHT, HAMMER_HALF_WIDTH, hammerProject, lonLatOf } from "../../src/render/hammer.js";
import { shoelaceArea } from "../support/svgCheck.js";
import { DEG } from "../../geometry/units.js";


/** Area of the image of the lon/lat cell [lon0, lon1] x [lat0, lat1] under `f`, edges sampled finely (shoelace). */
function imageArea(f: (lon: number, lat: number) => [number, number], lon0: number, lon1: number, lat0: number, lat1: number): number {
  const steps = 32;
  const xy: number[] = [];
  const push = (lon: number, lat: number) => xy.push(...f(lon, lat));
  for (let k = 0; k < steps; k++) push(lon0 + ((lon1 - lon0) * k) / steps, lat0);
  for (let k = 0; k < steps; k++) push(lon1, lat0 + ((lat1 - lat0) * k) / steps);
  for (let k = 0; k < steps; k++) push(lon1 - ((lon1 - lon0) * k) / steps, lat1);
  for (let k = 0; k < steps; k++) push(lon0, lat1 - ((lat1 - lat0) * k) / steps);
  return Math.abs(shoelaceArea(xy));
}

/** Sphere area of the cell (unit sphere): dlon (sin lat1 - sin lat0) (Archimedes). */
const sphereArea = (lon0: number, lon1: number, lat0: number, lat1: number) => (lon1 - lon0) * (Math.sin(lat1) - Math.sin(lat0));

// small cells over the map, including ones near the pole and near the +-180 deg edge
const CELLS: [number, number, number, number][] = [
  [0, 2, 0, 2], [-40, -37, 20, 23], [100, 103, 55, 57], [170, 175, 60, 65], [-179, -176, -80, -78], [60, 62, -30, -28],
];

describe("Hammer equal-area projection", () => {
  it("maps lon 0, lat 0 to the centre, to 1e-15", () => {
    const [x, y] = hammerProject(0, 0);
    expect(Math.abs(x) + Math.abs(y)).toBeLessThan(1e-15);
  });

  it("maps lon +-180 deg on the equator to the edge x = +-2 sqrt 2 and the poles to y = +-sqrt 2 (closed form), to 1e-12", () => {
    expect(Math.abs(hammerProject(Math.PI, 0)[0] - 2 * Math.SQRT2)).toBeLessThan(1e-12);
    expect(Math.abs(hammerProject(-Math.PI, 0)[0] + 2 * Math.SQRT2)).toBeLessThan(1e-12);
    const north = hammerProject(1.234, Math.PI / 2);
    expect(Math.abs(north[0]) + Math.abs(north[1] - Math.SQRT2)).toBeLessThan(1e-12);
    expect(Math.abs(hammerProject(-2, -Math.PI / 2)[1] + Math.SQRT2)).toBeLessThan(1e-12);
  });

  it("puts lon 90 deg, lat 0 at x = 2 sqrt 2 sin 45 deg / sqrt(1 + cos 45 deg) (closed form), to 1e-12", () => {
    const expected = (2 * Math.SQRT2 * Math.sin(Math.PI / 4)) / Math.sqrt(1 + Math.cos(Math.PI / 4));
    expect(Math.abs(hammerProject(Math.PI / 2, 0)[0] - expected)).toBeLessThan(1e-12);
  });

  it("is equal-area: small cells keep their sphere area (unit sphere, no rescaling) within 0.1 %, and the whole ellipse has area 4 pi", () => {
    for (const [a, b, c, d] of CELLS) {
      const ratio = imageArea((lon, lat) => hammerProject(lon, lat, [0, 0]), a * DEG, b * DEG, c * DEG, d * DEG) / sphereArea(a * DEG, b * DEG, c * DEG, d * DEG);
      expect(Math.abs(ratio - 1)).toBeLessThan(1e-3);
    }
    expect(Math.abs(Math.PI * HAMMER_HALF_WIDTH * HAMMER_HALF_HEIGHT - 4 * Math.PI)).toBeLessThan(1e-12);
  });

  it("control: the same area check rejects the plate carree (x = lon, y = lat) at latitude 55 deg", () => {
    const [a, b, c, d] = CELLS[2];
    const ratio = imageArea((lon, lat) => [lon, lat], a * DEG, b * DEG, c * DEG, d * DEG) / sphereArea(a * DEG, b * DEG, c * DEG, d * DEG);
    expect(Math.abs(ratio - 1)).toBeGreaterThan(0.5);
  });

  it("reads longitude from +x toward +y and latitude toward +z (geometry/ballCoords.ts), to 1e-15", () => {
    const [lonY, latY] = lonLatOf(0, 1, 0);
    expect(Math.abs(lonY - Math.PI / 2) + Math.abs(latY)).toBeLessThan(1e-15);
    const [lonZ, latZ] = lonLatOf(0, 0, 3);
    expect(Math.abs(lonZ) + Math.abs(latZ - Math.PI / 2)).toBeLessThan(1e-15);
  });
});
