/**
 * Pitch flight from release to the front of home plate.
 *
 * Integrates the state [x, y, z, vx, vy, vz] (field frame: x toward the
 * catcher's right, y from the rear point of home plate toward the pitcher, z up;
 * m and m/s) under the forces of forces.ts with fixed-step classical RK4
 * (rk4.ts), default step 1 ms (about 400 steps for a pitch). The last step is
 * cut exactly at the plane y = plate front: a safeguarded Newton iteration on
 * the length of a partial RK4 step from the last full step, so the crossing has
 * the integrator's own accuracy rather than an interpolant's.
 *
 * Gravity is standard gravity g0 = 9.80665 m/s^2 by default. The ground is not
 * modelled: a pitch that would bounce just crosses the plate plane below z = 0.
 *
 * An optional `trajectory` callback sees the path as the integrator makes it:
 * release (t = 0), the state after every full step, and the cut point on the
 * plate plane (the last full step, which passes the plate, is not reported).
 * It gets four numbers, so recording allocates only what the caller chooses
 * (trajectory.ts keeps them in growable typed arrays), and a flight without it
 * pays one untaken branch per step.
 */
import { airState, type AirState } from "./air.js";
import { assertBall, BALL_MASS_KG, BALL_RADIUS_M } from "../../geometry/ball.js";
import { assertFiniteVec3, assertInRange } from "../../geometry/check.js";
import { DEFAULT_DRAG_MODEL, dragCoefficientFunction, type DragModel } from "./drag.js";
import { PLATE_FRONT_Y_M } from "./field.js";
import { flightDerivative, type SeamForceHook } from "./forces.js";
import { DEFAULT_LIFT_MODEL, liftCoefficientFunction, type LiftModel } from "./lift.js";
import { RELEASE_SPEED_MAX_M_PER_S } from "./launch.js";
import { Rk4Stepper } from "./rk4.js";
import { assertSpinDecayTimeConstant, spinDecayFactor } from "./spinDecay.js";
import { STANDARD_GRAVITY_M_PER_S2 } from "./atmosphere.js";
import type { Vec3 } from "../../geometry/vec.js";

/** The ball at release, SI, field frame. */
export interface Launch {
  /** Release position, m; y must be beyond the plate plane and at most 30 m from it. */
  readonly releasePositionM: Readonly<Vec3>;
  /** Release velocity, m/s; speed above 0 and at most 100 m/s, with vy < 0 (toward the plate). */
  readonly releaseVelocityMPerS: Readonly<Vec3>;
  /** Spin vector omega, rad/s (right-hand rule), |omega| at most 1000 rad/s (about 9550 rpm). */
  readonly spinRadPerS: Readonly<Vec3>;
}

/**
 * Receives one trajectory point: time since release, s, and position, m, field
 * frame. Called in time order; must not throw.
 */
export type TrajectoryCallback = (tS: number, xM: number, yM: number, zM: number) => void;

export interface FlightOptions {
  /** Air; default airState() (1976 standard atmosphere at sea level, dry: 1.225 kg/m^3). */
  readonly air?: AirState;
  /** Drag model; default { name: "giordano" }. */
  readonly drag?: DragModel;
  /** Lift model; default { name: "sawicki" }. */
  readonly lift?: LiftModel;
  /** Switch the Magnus force off (used for movement splits); default true. */
  readonly magnus?: boolean;
  /** Extra seam force hook, N; default none. */
  readonly seamForce?: SeamForceHook;
  /** No air at all: gravity only (drag, Magnus and seam force off); default false. */
  readonly vacuum?: boolean;
  /** Ball mass, kg, 0.001 to 1; default 0.145 (Nathan 2008). */
  readonly ballMassKg?: number;
  /** Ball radius, m, 0.005 to 0.1; default 0.0364 (Nathan 2008). */
  readonly ballRadiusM?: number;
  /** Gravitational acceleration, m/s^2, 0 to 30; default 9.80665. */
  readonly gravityMPerS2?: number;
  /** Exponential spin decay time constant, s, > 0; default Infinity (no decay). */
  readonly spinDecayTimeConstantS?: number;
  /** RK4 step, s, 1e-6 to 0.02; default 0.001. */
  readonly stepS?: number;
  /** The target plane y, m; default PLATE_FRONT_Y_M (0.4318, the front of home plate). */
  readonly plateYM?: number;
  /** Give up (RangeError) if the ball has not reached the plate after this long, s, 0 to 60; default 10. */
  readonly maxFlightTimeS?: number;
  /**
   * Called at release, after every full RK4 step and at the plate crossing
   * (see the file header); default none. Helpers that fly several flights from
   * one set of options (movementVersusSpinless, aimLaunch) pass it to the main
   * flight only, or to none.
   */
  readonly trajectory?: TrajectoryCallback;
}

export interface FlightResult {
  /** Where the ball crosses the plate plane, m (y equals the plate plane). */
  readonly plateCrossingM: Vec3;
  /** Time from release to the plate plane, s. */
  readonly timeToPlateS: number;
  /** Velocity at the plate plane, m/s. */
  readonly velocityAtPlateMPerS: Vec3;
  /** Speed at the plate plane, m/s. */
  readonly speedAtPlateMPerS: number;
  /**
   * Vertical approach angle, rad: elevation of the velocity above the horizontal
   * plane, atan2(vz, hypot(vx, vy)); negative for a descending pitch.
   */
  readonly verticalApproachAngleRad: number;
  /**
   * Horizontal approach angle, rad: azimuth of the velocity's horizontal part
   * from the -y direction, atan2(vx, -vy); positive when moving toward +x.
   * (These two invert releaseVelocity's angles.)
   */
  readonly horizontalApproachAngleRad: number;
  /** Spin at the plate, rad/s (differs from release only with spin decay). */
  readonly spinAtPlateRadPerS: Vec3;
  /** Full RK4 steps taken before the final partial one. */
  readonly steps: number;
}

/** Default RK4 step, s. */
const DEFAULT_STEP_S = 0.001;
/** Largest release distance from the plate plane accepted, m. */
const MAX_RELEASE_DISTANCE_M = 30;
/** Largest spin rate accepted, rad/s. */
const MAX_SPIN_RAD_PER_S = 1000;
/** Iteration cap and tolerance (m) for cutting the last step at the plate plane. */
const CROSSING_MAX_ITERATIONS = 60;
const CROSSING_TOLERANCE_M = 1e-12;

const DEFAULT_AIR = airState();

/**
 * Flies a pitch from release to the plate plane.
 *
 * @throws RangeError for invalid inputs (each message names the value and the
 *   accepted range) and when the ball does not reach the plate within
 *   maxFlightTimeS (e.g. thrown too slowly or curved away).
 * @throws Error if the state becomes non-finite or the crossing search does not
 *   converge (neither should happen for valid inputs).
 */
export function simulateFlight(launch: Launch, options: FlightOptions = {}): FlightResult {
  const plateYM = options.plateYM ?? PLATE_FRONT_Y_M;
  assertInRange("plate plane y", plateYM, -100, 100, "m");
  const p0 = launch.releasePositionM;
  const v0 = launch.releaseVelocityMPerS;
  const w0 = launch.spinRadPerS;
  assertFiniteVec3("release position", p0, "m");
  assertFiniteVec3("release velocity", v0, "m/s");
  assertFiniteVec3("spin", w0, "rad/s");
  const distanceM = p0[1] - plateYM;
  if (!(distanceM > 0 && distanceM <= MAX_RELEASE_DISTANCE_M)) {
    throw new RangeError(
      `release y ${p0[1]} m must be beyond the plate plane y = ${plateYM} m by more than 0 and at most ${MAX_RELEASE_DISTANCE_M} m`,
    );
  }
  const speed0 = Math.hypot(v0[0], v0[1], v0[2]);
  if (!(speed0 > 0 && speed0 <= RELEASE_SPEED_MAX_M_PER_S)) {
    throw new RangeError(`release speed ${speed0} m/s must be greater than 0 and at most ${RELEASE_SPEED_MAX_M_PER_S} m/s`);
  }
  if (!(v0[1] < 0)) {
    throw new RangeError(`release velocity y ${v0[1]} m/s must be negative (toward home plate, along -y)`);
  }
  const spin0 = Math.hypot(w0[0], w0[1], w0[2]);
  assertInRange("spin rate", spin0, 0, MAX_SPIN_RAD_PER_S, "rad/s");

  const massKg = options.ballMassKg ?? BALL_MASS_KG;
  const radiusM = options.ballRadiusM ?? BALL_RADIUS_M;
  assertBall(massKg, radiusM);
  const gravityMPerS2 = options.gravityMPerS2 ?? STANDARD_GRAVITY_M_PER_S2;
  assertInRange("gravity", gravityMPerS2, 0, 30, "m/s^2");
  const air = options.air ?? DEFAULT_AIR;
  assertInRange("air density", air.densityKgM3, 0, 2, "kg/m^3");
  const tau = options.spinDecayTimeConstantS ?? Infinity;
  assertSpinDecayTimeConstant(tau);
  const h = options.stepS ?? DEFAULT_STEP_S;
  assertInRange("step", h, 1e-6, 0.02, "s");
  const maxFlightTimeS = options.maxFlightTimeS ?? 10;
  assertInRange("maximum flight time", maxFlightTimeS, 1e-3, 60, "s");

  const derivative = flightDerivative({
    massKg,
    radiusM,
    gravityMPerS2,
    densityKgM3: air.densityKgM3,
    vacuum: options.vacuum ?? false,
    dragCoefficient: dragCoefficientFunction(options.drag ?? DEFAULT_DRAG_MODEL),
    liftCoefficient: options.magnus === false ? null : liftCoefficientFunction(options.lift ?? DEFAULT_LIFT_MODEL),
    seamForce: options.seamForce ?? null,
    spinX: w0[0],
    spinY: w0[1],
    spinZ: w0[2],
    spinDecayTimeConstantS: tau,
  });
  const stepper = new Rk4Stepper(derivative, 6);
  const state = Float64Array.of(p0[0], p0[1], p0[2], v0[0], v0[1], v0[2]);
  const previous = new Float64Array(6);
  const maxSteps = Math.ceil(maxFlightTimeS / h);
  const trajectory = options.trajectory;
  if (trajectory !== undefined) trajectory(0, p0[0], p0[1], p0[2]);

  for (let n = 0; n < maxSteps; n++) {
    previous.set(state);
    // Time as n h, not a running sum, so rounding does not accumulate.
    const tPrevious = n * h;
    stepper.step(tPrevious, previous, h, state);
    if (!Number.isFinite(state[0] + state[1] + state[2] + state[3] + state[4] + state[5])) {
      throw new Error(`flight state became non-finite at t = ${(tPrevious + h).toPrecision(6)} s (check the seam force hook)`);
    }
    if (state[1] <= plateYM) {
      const dt = cutAtPlane(stepper, tPrevious, previous, h, plateYM, state);
      const t = tPrevious + dt;
      if (trajectory !== undefined) trajectory(t, state[0], state[1], state[2]);
      const decay = spinDecayFactor(t, tau);
      const vx = state[3];
      const vy = state[4];
      const vz = state[5];
      return {
        plateCrossingM: [state[0], state[1], state[2]],
        timeToPlateS: t,
        velocityAtPlateMPerS: [vx, vy, vz],
        speedAtPlateMPerS: Math.hypot(vx, vy, vz),
        verticalApproachAngleRad: Math.atan2(vz, Math.hypot(vx, vy)),
        horizontalApproachAngleRad: Math.atan2(vx, -vy),
        spinAtPlateRadPerS: [w0[0] * decay, w0[1] * decay, w0[2] * decay],
        steps: n,
      };
    }
    if (trajectory !== undefined) trajectory((n + 1) * h, state[0], state[1], state[2]);
  }
  throw new RangeError(
    `ball did not reach the plate plane y = ${plateYM} m within ${maxFlightTimeS} s (release speed ${speed0.toPrecision(4)} m/s): throw it faster or more directly toward the plate`,
  );
}

/**
 * Finds dt in (0, h] with y(tPrevious + dt) = plateYM, where y comes from one
 * RK4 step of length dt from `previous`; leaves that state in `out` and
 * returns dt. Newton on dt (dy/d(dt) = vy) kept inside a shrinking bracket,
 * falling back to bisection; y(0) > plateYM >= y(h) on entry.
 */
function cutAtPlane(
  stepper: Rk4Stepper,
  tPrevious: number,
  previous: Float64Array,
  h: number,
  plateYM: number,
  out: Float64Array,
): number {
  let lo = 0;
  let hi = h;
  const y0 = previous[1];
  const yH = out[1];
  if (yH === plateYM) return h;
  let dt = (h * (y0 - plateYM)) / (y0 - yH);
  for (let i = 0; i < CROSSING_MAX_ITERATIONS; i++) {
    stepper.step(tPrevious, previous, dt, out);
    const f = out[1] - plateYM;
    if (Math.abs(f) <= CROSSING_TOLERANCE_M) return dt;
    if (f > 0) lo = dt;
    else hi = dt;
    const newton = dt - f / out[4];
    dt = newton > lo && newton < hi ? newton : 0.5 * (lo + hi);
  }
  throw new Error(`plate crossing did not converge to ${CROSSING_TOLERANCE_M} m in ${CROSSING_MAX_ITERATIONS} iterations`);
}
