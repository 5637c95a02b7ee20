/**
 * Spin-based against observed movement direction, read on the clock.
 *
 * Movement vectors lie in the plate plane, m: horizontal along the field frame's
 * +x (the catcher's right), vertical up (geometry/frames.ts). A direction reads as
 * a clock hand in a view (geometry/frames.ts): 12:00 up, 6:00 down, 3:00 the
 * viewer's right, which is -x from behind the pitcher and +x from behind the
 * catcher, so the two views read mirror-image clocks. A turn is 720 minutes of
 * clock: 1 minute = 0.5 deg.
 *
 * The spin-based vector is what the spin alone would give (for instance the
 * Magnus part of tradeMovementParts.ts); the observed one is the whole movement.
 * The trade reads a gap of more than about 15-30 minutes between the two as a
 * sign of seam effects (common practice, no source).
 */
import { angleToClock, formatClock } from "../../geometry/clock.js";
import { directionToClockAngle, type ClockView } from "../../geometry/frames.js";

/** A movement in the plate plane, m: horizontal toward the catcher's right (+x), vertical up. */
export interface PlateMovement {
  readonly horizontalM: number;
  readonly verticalM: number;
}

/** A direction on the clock, to the minute. */
export interface ClockReading {
  /** Minutes past 12:00, an integer 0 to 719 (rounded to the nearest minute). */
  readonly minutes: number;
  /** "H:MM", 12:00 for straight up. */
  readonly text: string;
}

export interface DirectionComparison {
  /** The spin-based direction, or null for a (near) zero vector. */
  readonly spinBased: ClockReading | null;
  /** The observed direction, or null for a (near) zero vector. */
  readonly observed: ClockReading | null;
  /**
   * observed minus spin-based, minutes of clock, in (-360, 360]: positive when the
   * observed direction lies clockwise of the spin-based one in this view. From the
   * unrounded directions (so it may differ by a minute from the readings'
   * difference); null when either direction is null.
   */
  readonly differenceMinutes: number | null;
  /** The same difference in degrees (0.5 deg per minute), in (-180, 180]; null with it. */
  readonly differenceDeg: number | null;
}

/** Movement shorter than this has no direction, m (a micrometre: far below any tracking precision). */
const DIRECTION_ZERO_M = 1e-6;
/** Minutes in a full turn of the clock. */
const CLOCK_MINUTES = 720;
const DEG_PER_CLOCK_MINUTE = 0.5;

/**
 * The clock minutes (unrounded, [0, 720)) of a plate-plane movement in a view,
 * or null when it is shorter than `zeroBelowM`.
 */
export function movementClockMinutes(movement: PlateMovement, view: ClockView, zeroBelowM: number = DIRECTION_ZERO_M): number | null {
  checkView(view);
  checkMovement("movement", movement);
  checkZero(zeroBelowM);
  return clockMinutes(movement, view, zeroBelowM);
}

/**
 * Reads a spin-based and an observed movement on the clock of `view` and gives the
 * signed gap between them (see DirectionComparison).
 *
 * @param zeroBelowM length below which a movement has no direction, m, > 0; default 1e-6.
 * @throws RangeError for an unknown view, a non-finite component or a bad threshold.
 */
export function compareMovementDirections(
  spinBased: PlateMovement,
  observed: PlateMovement,
  view: ClockView,
  zeroBelowM: number = DIRECTION_ZERO_M,
): DirectionComparison {
  checkView(view);
  checkMovement("spin-based movement", spinBased);
  checkMovement("observed movement", observed);
  checkZero(zeroBelowM);
  const a = clockMinutes(spinBased, view, zeroBelowM);
  const b = clockMinutes(observed, view, zeroBelowM);
  let difference: number | null = null;
  if (a !== null && b !== null) {
    difference = ((((b - a) % CLOCK_MINUTES) + CLOCK_MINUTES) % CLOCK_MINUTES);
    if (difference > CLOCK_MINUTES / 2) difference -= CLOCK_MINUTES;
  }
  return {
    spinBased: a === null ? null : reading(a),
    observed: b === null ? null : reading(b),
    differenceMinutes: difference,
    differenceDeg: difference === null ? null : difference * DEG_PER_CLOCK_MINUTE,
  };
}

function clockMinutes(m: PlateMovement, view: ClockView, zeroBelowM: number): number | null {
  if (!(Math.hypot(m.horizontalM, m.verticalM) >= zeroBelowM)) return null;
  // the plate plane is across the nominal flight line -y, which is the clock's default
  const angle = directionToClockAngle([m.horizontalM, 0, m.verticalM], view);
  return angle === null ? null : angleToClock(angle);
}

function reading(minutes: number): ClockReading {
  return { minutes: Math.round(minutes) % CLOCK_MINUTES, text: formatClock(minutes) };
}

function checkView(view: ClockView): void {
  if (view !== "pitcher" && view !== "catcher") throw new RangeError(`clock view "${view}" must be "pitcher" or "catcher"`);
}

function checkMovement(label: string, m: PlateMovement): void {
  if (!Number.isFinite(m.horizontalM) || !Number.isFinite(m.verticalM)) {
    throw new RangeError(`${label} (${m.horizontalM}, ${m.verticalM}) m must have finite horizontal and vertical parts`);
  }
}

function checkZero(zeroBelowM: number): void {
  if (!(Number.isFinite(zeroBelowM) && zeroBelowM > 0)) throw new RangeError(`zero-movement threshold ${zeroBelowM} m must be a finite number greater than 0`);
}
