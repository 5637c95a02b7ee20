import { describe, expect, it } from "vitest";
import { Rk4Stepper } from "../../src/physics/rk4.js";

/** Integrates dy/dt = f from t = 0 to `t1` in `n` steps of the stepper. */
function integrate(stepper: Rk4Stepper, y0: number[], t1: number, n: number): Float64Array {
  const y = Float64Array.from(y0);
  const h = t1 / n;
  for (let i = 0; i < n; i++) stepper.step(i * h, y, h, y);
  return y;
}

describe("classical fourth-order Runge-Kutta step (Kutta 1901; Press et al., Numerical Recipes, 3rd ed., eq. 17.1.3, from memory)", () => {
  it("matches e^h's Taylor series through h^4 in one step of dy/dt = y: 1 + h + h^2/2 + h^3/6 + h^4/24 (the classical method's stability polynomial), to 1e-15", () => {
    const stepper = new Rk4Stepper((_t, y, out) => void (out[0] = y[0]), 1);
    for (const h of [0.1, 0.5, 1]) {
      const y = Float64Array.of(1);
      stepper.step(0, y, h, y);
      expect(Math.abs(y[0] - (1 + h + h ** 2 / 2 + h ** 3 / 6 + h ** 4 / 24))).toBeLessThan(1e-15);
    }
  });

  it("reduces to Simpson's rule for y' = f(t): exact for 4 t^3 on [0, 2] (16, to 1e-12, 4 steps), and for 5 t^4 over-shoots 32 by Simpson's error (b - a) (H/2)^4 max|f''''| / 180 = (4/3)(H/2)^4 (closed form, to 1e-12)", () => {
    const cubic = new Rk4Stepper((t, _y, out) => void (out[0] = 4 * t ** 3), 1);
    expect(Math.abs(integrate(cubic, [0], 2, 4)[0] - 16)).toBeLessThan(1e-12);
    const quartic = new Rk4Stepper((t, _y, out) => void (out[0] = 5 * t ** 4), 1);
    for (const n of [4, 8, 16]) {
      const half = 2 / n / 2;
      expect(Math.abs(integrate(quartic, [0], 2, n)[0] - 32 - (4 / 3) * half ** 4)).toBeLessThan(1e-12);
    }
  });

  it("turns a harmonic oscillator through one period with the leading error term's phase lag, |e^(ih) - R(ih)| = h^5 / 120 per step, so 2 pi h^4 / 120 after one period, within 2 % for 64 and 128 steps", () => {
    const stepper = new Rk4Stepper((_t, y, out) => {
      out[0] = y[1];
      out[1] = -y[0];
    }, 2);
    for (const n of [64, 128]) {
      const h = (2 * Math.PI) / n;
      const y = integrate(stepper, [1, 0], 2 * Math.PI, n);
      const error = Math.hypot(y[0] - 1, y[1]);
      expect(Math.abs(error / ((2 * Math.PI * h ** 4) / 120) - 1)).toBeLessThan(0.02);
    }
  });
});
