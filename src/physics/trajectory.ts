/**
 * Recording a flight's path: time and position at every integrator step.
 *
 * Field frame (geometry/frames.ts): x toward the catcher's right, y from the rear
 * point of home plate toward the pitcher, z up; m, and s since release. The points
 * are what flight.ts's `trajectory` callback reports: release, every full RK4 step
 * and the cut point on the plate plane.
 *
 * Kept as four parallel typed arrays (structure of arrays), grown by doubling,
 * so a recorded pitch of about 400 steps allocates a handful of times, not once
 * per step.
 */
import { simulateFlight, type FlightOptions, type FlightResult, type Launch, type TrajectoryCallback } from "./flight.js";

/**
 * Sampled positions of one flight, in time order for a recorded flight (any order
 * for the fit in tradeMovement.ts). All four have the same length.
 */
export interface TrajectorySamples {
  /** Time, s (any fixed origin; a recorded flight counts from release). */
  readonly tS: ArrayLike<number>;
  /** Position x, m, toward the catcher's right. */
  readonly xM: ArrayLike<number>;
  /** Position y, m, from the rear point of home plate toward the pitcher. */
  readonly yM: ArrayLike<number>;
  /** Position z, m, up. */
  readonly zM: ArrayLike<number>;
}

/** Initial room, points: a 1 ms-step pitch from release takes about 400-500. */
const INITIAL_CAPACITY = 512;

/** Collects trajectory points; pass `recorder.record` as FlightOptions.trajectory. */
export class TrajectoryRecorder {
  private t: Float64Array = new Float64Array(INITIAL_CAPACITY);
  private x: Float64Array = new Float64Array(INITIAL_CAPACITY);
  private y: Float64Array = new Float64Array(INITIAL_CAPACITY);
  private z: Float64Array = new Float64Array(INITIAL_CAPACITY);
  private n = 0;

  /** Appends one point (bound: can be handed to simulateFlight as is). */
  readonly record: TrajectoryCallback = (tS, xM, yM, zM) => {
    if (this.n === this.t.length) this.grow();
    const i = this.n++;
    this.t[i] = tS;
    this.x[i] = xM;
    this.y[i] = yM;
    this.z[i] = zM;
  };

  /** Number of points recorded. */
  get length(): number {
    return this.n;
  }

  /** The points so far, as views on the recorder's arrays (valid until the next record or clear). */
  samples(): TrajectorySamples {
    const n = this.n;
    return { tS: this.t.subarray(0, n), xM: this.x.subarray(0, n), yM: this.y.subarray(0, n), zM: this.z.subarray(0, n) };
  }

  /** Forgets the points, keeping the room. */
  clear(): void {
    this.n = 0;
  }

  private grow(): void {
    const size = 2 * this.t.length;
    const widen = (a: Float64Array): Float64Array => {
      const b = new Float64Array(size);
      b.set(a);
      return b;
    };
    this.t = widen(this.t);
    this.x = widen(this.x);
    this.y = widen(this.y);
    this.z = widen(this.z);
  }
}

/**
 * Flies a pitch and records its path (release, every step, the plate crossing).
 * Any `trajectory` callback in `options` is replaced by the recorder.
 *
 * @returns the flight and its samples (owned by the caller).
 * @throws RangeError as simulateFlight does.
 */
export function recordFlight(launch: Launch, options: FlightOptions = {}): { flight: FlightResult; samples: TrajectorySamples } {
  const recorder = new TrajectoryRecorder();
  const flight = simulateFlight(launch, { ...options, trajectory: recorder.record });
  return { flight, samples: recorder.samples() };
}
