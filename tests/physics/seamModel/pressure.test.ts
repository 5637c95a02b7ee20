import { describe, expect, it } from "vitest";
import {
  attachedPressureCoefficient,
  meridianPressureIntegral,
  pressureIntegralFromTable,
  pressureTable,
} from "../../../src/physics/seamModel/pressure.js";
import { expectAbsolute, expectRelative } from "../../support/tolerance.js";

import { DEG } from "../../../geometry/units.js";

/** Composite Simpson rule on [a, b] with `panels` (even) panels. */
function simpson(f: (x: number) => number, a: number, b: number, panels: number): number {
  const h = (b - a) / panels;
  let s = f(a) + f(b);
  for (let i = 1; i < panels; i++) s += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}

describe("attached-flow pressure (potential flow past a sphere at suction factor 1)", () => {
  it("Cp(0) = 1, Cp(90 deg) = -1.25 and Cp = 0 at 41.81 deg (Katz, Automotive Aerodynamics 2016, eq. 6.75), to 1e-12, 1e-12 and 1e-4", () => {
    expectAbsolute(attachedPressureCoefficient(0, 1), 1, 1e-12);
    expectAbsolute(attachedPressureCoefficient(90 * DEG, 1), -1.25, 1e-12);
    expectAbsolute(attachedPressureCoefficient(41.81 * DEG, 1), 0, 1e-4);
  });

  it("the suction factor scales the suction 1 - Cp linearly: 1 - Cp(theta; 0.7) = 0.7 (1 - Cp(theta; 1)) to 1e-14 (definition)", () => {
    for (const t of [10, 45, 80, 100, 150].map((d) => d * DEG)) {
      expectAbsolute(1 - attachedPressureCoefficient(t, 0.7), 0.7 * (1 - attachedPressureCoefficient(t, 1)), 1e-14);
    }
  });
});

describe("the per-meridian pressure integral G(theta_s)", () => {
  it("closed form equals Simpson quadrature of its definition (Cp sin^2 ahead of theta_s, Cp_b sin^2 behind) to 1e-10, for suction factors 0.6 and 1 and wake Cp -0.1 to -0.6", () => {
    for (const lambda of [0.6, 1]) {
      for (const cpb of [-0.1, -0.3, -0.6]) {
        for (const ts of [20, 80, 100, 120, 160].map((d) => d * DEG)) {
          const ahead = simpson((t) => attachedPressureCoefficient(t, lambda) * Math.sin(t) ** 2, 0, ts, 2000);
          const behind = cpb * simpson((t) => Math.sin(t) ** 2, ts, Math.PI, 2000);
          expectAbsolute(meridianPressureIntegral(ts, lambda, cpb), ahead + behind, 1e-10);
        }
      }
    }
  });

  it("at suction factor 1 it equals the potential-flow closed form G = -11 ts/32 + 5 sin(2 ts)/16 - 9 sin(4 ts)/128 + Cp_b (pi/2 - ts/2 + sin(2 ts)/4), to 1e-14", () => {
    // integral of (1 - 9/4 sin^2 t) sin^2 t from 0 to ts, with the antiderivatives of sin^2 and sin^4
    // (any table of integrals, e.g. Abramowitz & Stegun 4.3.x), plus Cp_b times the rest of sin^2
    const closed = (ts: number, cpb: number) => (-11 * ts) / 32 + (5 * Math.sin(2 * ts)) / 16 - (9 * Math.sin(4 * ts)) / 128 + cpb * (Math.PI / 2 - ts / 2 + Math.sin(2 * ts) / 4);
    for (const ts of [30, 82, 110, 135].map((d) => d * DEG)) {
      expectAbsolute(meridianPressureIntegral(ts, 1, -0.4), closed(ts, -0.4), 1e-14);
    }
  });

  it("dG/dtheta_s = sin^2 theta_s (Cp(theta_s) - Cp_b) (fundamental theorem of calculus) by central differences to 1e-8", () => {
    const h = 1e-5;
    for (const ts of [60, 85, 100, 118].map((d) => d * DEG)) {
      const numeric = (meridianPressureIntegral(ts + h, 0.9, -0.3) - meridianPressureIntegral(ts - h, 0.9, -0.3)) / (2 * h);
      expectAbsolute(numeric, Math.sin(ts) ** 2 * (attachedPressureCoefficient(ts, 0.9) - -0.3), 1e-8);
    }
  });

  it("separation at theta_1 on the half psi in (-pi/2, pi/2) and theta_2 on the other gives C_x = -(2/pi)(G(theta_1) - G(theta_2)) (closed form); later on +x (80 vs 120 deg) pushes toward +x", () => {
    // C = -(1/pi) integral G (cos, sin) dpsi; the integral of cos over each half is +-2.
    const g1 = meridianPressureIntegral(120 * DEG, 1, -0.3);
    const g2 = meridianPressureIntegral(80 * DEG, 1, -0.3);
    const n = 20000;
    let cx = 0;
    for (let j = 0; j < n; j++) {
      const psi = (2 * Math.PI * (j + 0.5)) / n;
      cx += (Math.cos(psi) > 0 ? g1 : g2) * Math.cos(psi);
    }
    cx *= -(1 / Math.PI) * ((2 * Math.PI) / n);
    expectRelative(cx, (-2 / Math.PI) * (g1 - g2), 1e-6);
    expect(cx).toBeGreaterThan(0.2);
  });

  it("the Hermite table matches the closed form to 5e-12 over the default band 80-120 deg at 256 intervals, and halving the step divides the error by 16 +- 4 (fourth-order cubic Hermite interpolation)", () => {
    const lo = Math.cos(120 * DEG);
    const hi = Math.cos(80 * DEG);
    const worstAt = (intervals: number) => {
      const table = pressureTable(lo, hi, intervals, 1, -0.3);
      let worst = 0;
      for (let k = 0; k <= 4000; k++) {
        const c = lo + ((hi - lo) * k) / 4000;
        worst = Math.max(worst, Math.abs(pressureIntegralFromTable(table, c) - meridianPressureIntegral(Math.acos(c), 1, -0.3)));
      }
      return worst;
    };
    expect(worstAt(256)).toBeLessThan(5e-12);
    const ratio = worstAt(32) / worstAt(64);
    expect(ratio).toBeGreaterThan(12);
    expect(ratio).toBeLessThan(20);
  });

  it("rejects a table range reaching a pole or with no intervals (RangeError naming the value)", () => {
    expect(() => pressureTable(-1, 0.5, 16, 1, -0.3)).toThrow(/cos -1 to 0.5/);
    expect(() => pressureTable(-0.5, 0.5, 0, 1, -0.3)).toThrow(/intervals 0/);
  });
});
