import { describe, expect, it } from "vitest";
import { DEG } from "../../geometry/units.js";
import { meridianSideIntegral, potentialPressureCoefficient, sideCoefficientFromSeparation } from "../../src/physics/wakePressure.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

/** Composite Simpson rule on [a, b] with `panels` (even) panels. */
function simpson(f: (x: number) => number, a: number, b: number, panels: number): number {
  const h = (b - a) / panels;
  let s = f(a) + f(b);
  for (let i = 1; i < panels; i++) s += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}

describe("surface pressure and the per-azimuth integral (closed forms)", () => {
  it("potential flow past a sphere: Cp(90 deg) = -1.25 and Cp = 0 at 41.81 deg (Katz, Automotive Aerodynamics 2016, eq. 6.75), to 1e-12 and 1e-4", () => {
    expectAbsolute(potentialPressureCoefficient(90 * DEG), -1.25, 1e-12);
    expectAbsolute(potentialPressureCoefficient(41.81 * DEG), 0, 1e-4);
  });

  it("G(theta_s) in closed form equals Simpson quadrature of its definition (integral of Cp sin^2 with the wake behind theta_s) to 1e-10", () => {
    for (const cpb of [-0.4, -0.2]) {
      for (const ts of [30, 80, 100, 120, 150].map((d) => d * DEG)) {
        const ahead = simpson((t) => potentialPressureCoefficient(t) * Math.sin(t) ** 2, 0, ts, 2000);
        const behind = cpb * simpson((t) => Math.sin(t) ** 2, ts, Math.PI, 2000);
        expectAbsolute(meridianSideIntegral(ts, cpb), ahead + behind, 1e-10);
      }
    }
  });

  it("a separation line at the same angle on every azimuth gives zero side force (integral of (cos, sin) over a turn), to 1e-15", () => {
    for (const n of [8, 72, 180]) {
      for (const deg of [60, 100, 120, 170]) {
        const c = sideCoefficientFromSeparation(new Float64Array(n).fill(deg * DEG), -0.4);
        expect(Math.hypot(c.x, c.y)).toBeLessThan(1e-15);
      }
    }
  });

  it("separation at 85 deg on the +x half and 120 deg on the -x half pushes toward -x (the later side) with C_x = -(2/n) cot(pi/n) (G(85) - G(120)) to 1e-12 and the continuum -(2/pi)(G(85) - G(120)) to 1.1e-4 relative (closed forms), C_y 0 to 1e-15", () => {
    const n = 180;
    const ts = new Float64Array(n);
    for (let j = 0; j < n; j++) ts[j] = Math.cos((2 * Math.PI * j) / n) > 1e-9 ? 85 * DEG : 120 * DEG;
    const c = sideCoefficientFromSeparation(ts, -0.4);
    const dG = meridianSideIntegral(85 * DEG, -0.4) - meridianSideIntegral(120 * DEG, -0.4);
    const continuum = (-2 / Math.PI) * dG;
    expect(continuum).toBeLessThan(0);
    // on the grid: sum of cos(2 pi j / n) over |j| < n/4 is cot(pi / n) (geometric sum)
    expectRelative(c.x, (-2 / n) * (1 / Math.tan(Math.PI / n)) * dG, 1e-12);
    // grid against continuum: (pi/n) cot(pi/n) = 1 - (pi/n)^2 / 3 + ..., 1.0e-4 at n = 180
    expectRelative(c.x, continuum, 1.1e-4);
    expectAbsolute(c.y, 0, 1e-15);
  });
});
