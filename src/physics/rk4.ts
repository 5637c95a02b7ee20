/**
 * The classical fourth-order Runge-Kutta step (W. Kutta, "Beitrag zur
 * naeherungsweisen Integration totaler Differentialgleichungen", Z. Math. Phys.
 * 46, 435-453 (1901); e.g. Press et al., Numerical Recipes, 3rd ed., eq. 17.1.3,
 * from memory):
 *
 *   k1 = f(t, y),  k2 = f(t + h/2, y + h k1/2),  k3 = f(t + h/2, y + h k2/2),
 *   k4 = f(t + h, y + h k3),   y(t + h) = y + h (k1 + 2 k2 + 2 k3 + k4) / 6.
 *
 * Global error O(h^4). The stepper owns its stage buffers, so a step allocates
 * nothing: the flight loop runs hundreds of thousands of steps per second.
 */

/** Right-hand side dy/dt = f(t, y): writes the derivative of `state` into `out`. */
export type Derivative = (timeS: number, state: Float64Array, out: Float64Array) => void;

export class Rk4Stepper {
  private readonly k1: Float64Array;
  private readonly k2: Float64Array;
  private readonly k3: Float64Array;
  private readonly k4: Float64Array;
  private readonly stage: Float64Array;

  constructor(
    private readonly f: Derivative,
    private readonly dimension: number,
  ) {
    this.k1 = new Float64Array(dimension);
    this.k2 = new Float64Array(dimension);
    this.k3 = new Float64Array(dimension);
    this.k4 = new Float64Array(dimension);
    this.stage = new Float64Array(dimension);
  }

  /**
   * One step of size `h` from (t, from) into `to`. `to` may be the same array
   * as `from`: each component of `to` is written only after all stages are done.
   */
  step(timeS: number, from: Float64Array, h: number, to: Float64Array): void {
    const { f, k1, k2, k3, k4, stage, dimension: n } = this;
    const half = h / 2;
    f(timeS, from, k1);
    for (let i = 0; i < n; i++) stage[i] = from[i] + half * k1[i];
    f(timeS + half, stage, k2);
    for (let i = 0; i < n; i++) stage[i] = from[i] + half * k2[i];
    f(timeS + half, stage, k3);
    for (let i = 0; i < n; i++) stage[i] = from[i] + h * k3[i];
    f(timeS + h, stage, k4);
    const sixth = h / 6;
    for (let i = 0; i < n; i++) to[i] = from[i] + sixth * (k1[i] + 2 * (k2[i] + k3[i]) + k4[i]);
  }
}
