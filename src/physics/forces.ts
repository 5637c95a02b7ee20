/**
 * The forces on a pitched ball, as the right-hand side of the equations of
 * motion for the state [x, y, z, vx, vy, vz] (m, m/s, field frame):
 *
 *   m dv/dt = m g (-z)                                   gravity
 *           - 1/2 rho A C_D(v) v  v_vec                  drag, against the velocity
 *           + 1/2 rho A C_L(S) v^2 (omega x v) / |omega x v|   Magnus (lift)
 *           + F_seam(t, v, omega)                        optional hook
 *
 * with A = pi R^2, v = |v_vec|, and S = R |omega_perp| / v, where omega_perp is
 * the spin component perpendicular to the velocity. |omega x v| = |omega_perp| v,
 * so the Magnus direction and S both come from one cross product, and a spin
 * along the velocity (pure gyro) gives no lift.
 */
import type { Derivative } from "./rk4.js";
import { spinDecayFactor } from "./spinDecay.js";

/** What the seam-force hook sees. The arrays are reused between calls: read, do not keep. */
export interface SeamForceInput {
  /** Time since release, s. */
  readonly timeS: number;
  /** Ball velocity, m/s, field frame: [vx, vy, vz]. */
  readonly velocityMPerS: Float64Array;
  /** Current spin (after any decay), rad/s, field frame: [wx, wy, wz]. */
  readonly spinRadPerS: Float64Array;
  /** Air density, kg/m^3. */
  readonly densityKgM3: number;
  /** Ball radius, m. */
  readonly ballRadiusM: number;
}

/**
 * Extra aerodynamic force from the seams (e.g. a seam-shifted-wake model):
 * writes a force in newtons, field frame, into forceN[0..2]. forceN is zeroed
 * before each call. Called four times per integration step; it must not allocate
 * if the flight is to stay fast.
 */
export type SeamForceHook = (input: SeamForceInput, forceN: Float64Array) => void;

/** A fully resolved, validated force model (built by flight.ts). */
export interface ForceModel {
  readonly massKg: number;
  readonly radiusM: number;
  readonly gravityMPerS2: number;
  readonly densityKgM3: number;
  /** No aerodynamic force at all (drag, Magnus and seam force off). */
  readonly vacuum: boolean;
  readonly dragCoefficient: (speedMPerS: number) => number;
  /** Lift coefficient from spin factor, or null for no Magnus force. */
  readonly liftCoefficient: ((spinFactor: number) => number) | null;
  readonly seamForce: SeamForceHook | null;
  /** Spin at release, rad/s, field frame. */
  readonly spinX: number;
  readonly spinY: number;
  readonly spinZ: number;
  /** Exponential spin decay time constant, s; Infinity for none. */
  readonly spinDecayTimeConstantS: number;
}

/** Builds dy/dt for the flight state [x, y, z, vx, vy, vz]. Allocates only once, here. */
export function flightDerivative(model: ForceModel): Derivative {
  const { massKg: m, radiusM: r, gravityMPerS2: g, densityKgM3: rho, vacuum } = model;
  const { dragCoefficient, liftCoefficient, seamForce, spinDecayTimeConstantS: tau } = model;
  const { spinX, spinY, spinZ } = model;
  // 1/2 rho A / m: turns C v^2 into an acceleration.
  const halfRhoAOverM = (0.5 * rho * Math.PI * r * r) / m;
  const hasSpin = spinX !== 0 || spinY !== 0 || spinZ !== 0;
  const seamVelocity = new Float64Array(3);
  const seamSpin = new Float64Array(3);
  const seamOut = new Float64Array(3);
  const seamInput = { timeS: 0, velocityMPerS: seamVelocity, spinRadPerS: seamSpin, densityKgM3: rho, ballRadiusM: r };

  return (timeS, s, out) => {
    const vx = s[3];
    const vy = s[4];
    const vz = s[5];
    out[0] = vx;
    out[1] = vy;
    out[2] = vz;
    let ax = 0;
    let ay = 0;
    let az = -g;
    if (!vacuum) {
      const v = Math.sqrt(vx * vx + vy * vy + vz * vz);
      const kDrag = halfRhoAOverM * dragCoefficient(v) * v;
      ax -= kDrag * vx;
      ay -= kDrag * vy;
      az -= kDrag * vz;
      const decay = hasSpin ? spinDecayFactor(timeS, tau) : 1;
      const wx = spinX * decay;
      const wy = spinY * decay;
      const wz = spinZ * decay;
      if (liftCoefficient !== null && hasSpin && v > 0) {
        const cx = wy * vz - wz * vy;
        const cy = wz * vx - wx * vz;
        const cz = wx * vy - wy * vx;
        const crossNorm = Math.sqrt(cx * cx + cy * cy + cz * cz);
        if (crossNorm > 0) {
          // S = R |omega_perp| / v = R |omega x v| / v^2; lift magnitude per mass 1/2 rho A C_L v^2 / m.
          const kLift = (halfRhoAOverM * liftCoefficient((r * crossNorm) / (v * v)) * v * v) / crossNorm;
          ax += kLift * cx;
          ay += kLift * cy;
          az += kLift * cz;
        }
      }
      if (seamForce !== null) {
        seamInput.timeS = timeS;
        seamVelocity[0] = vx;
        seamVelocity[1] = vy;
        seamVelocity[2] = vz;
        seamSpin[0] = wx;
        seamSpin[1] = wy;
        seamSpin[2] = wz;
        seamOut[0] = 0;
        seamOut[1] = 0;
        seamOut[2] = 0;
        seamForce(seamInput, seamOut);
        ax += seamOut[0] / m;
        ay += seamOut[1] / m;
        az += seamOut[2] / m;
      }
    }
    out[3] = ax;
    out[4] = ay;
    out[5] = az;
  };
}
