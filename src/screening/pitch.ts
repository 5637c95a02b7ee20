/**
 * A pitch as a screen sees it, in SI and radians, and what its spin axis means in
 * the field frame (geometry/frames.ts: x toward the catcher's right, y toward the
 * pitcher, z up; the pitch flies along -y).
 *
 * The seam-shifted-wake push of any ball orientation lies along +-a, where
 * a = unit(w - (w . v) v) is the spin axis's part across the flight line
 * (src/sampling/exact.ts shows the Magnus-direction part averages to zero). So a
 * pitch's spin axis fixes the line of the push; the seam orientation sets its sign
 * and size. `pushInField` turns the sampler's `alongAxis` into field terms.
 */
import { armSideDirection, directionToClockAngle, spinAxisFromTilt, TOWARD_PLATE, type ClockView, type Hand, HANDS, VIEWS } from "../../geometry/frames.js";
import { clockToAngle } from "../../geometry/clock.js";
import { dot3, unit3, type Vec3 } from "../../geometry/vec.js";
import { DEG, M_PER_S_PER_MPH, RAD_PER_S_PER_RPM } from "../../geometry/units.js";

export type Want = "arm" | "glove" | "up" | "down" | "any";
export const WANTS: readonly Want[] = ["arm", "glove", "up", "down", "any"];
export { HANDS, VIEWS };


/** Accepted ranges (at the edges, in the user's units). */
export const SPEED_RANGE_MPH: readonly [number, number] = [30, 110];
export const SPIN_RANGE_RPM: readonly [number, number] = [0, 4500];

export interface Pitch {
  /** Label, e.g. "sinker". */
  readonly name: string;
  /** Who throws it (free text), e.g. "Iris Talvela". */
  readonly pitcher: string;
  readonly hand: Hand;
  readonly speedMPerS: number;
  readonly spinRadPerS: number;
  /** Tilt, radians clockwise from 12:00 as seen from `view`. */
  readonly tiltRad: number;
  readonly view: ClockView;
  /** Gyro angle, radians, |gyro| < pi/2 (sign: see geometry/frames.ts). */
  readonly gyroRad: number;
  /** The wanted direction of the seam push. */
  readonly want: Want;
}

/** Field-frame unit vectors of a pitch: spin axis w, flight direction v, push line a and the Magnus direction m. */
export interface PitchFrame {
  readonly spinAxis: Vec3;
  readonly flight: Vec3;
  readonly pushLine: Vec3;
  readonly magnus: Vec3;
  readonly armSide: Vec3;
}

export function pitchFrame(p: Pitch): PitchFrame {
  const v = TOWARD_PLATE;
  const w = spinAxisFromTilt(p.tiltRad, p.gyroRad, p.view, v);
  const wv = dot3(w, v);
  const a = unit3([w[0] - wv * v[0], w[1] - wv * v[1], w[2] - wv * v[2]]);
  const m = unit3([w[1] * v[2] - w[2] * v[1], w[2] * v[0] - w[0] * v[2], w[0] * v[1] - w[1] * v[0]]);
  return { spinAxis: w, flight: [...v] as Vec3, pushLine: a, magnus: m, armSide: armSideDirection(p.hand) };
}

export interface FieldPush {
  /** Push vector in the field frame (asymmetry units: the sampler's alongAxis along a). */
  readonly vector: Vec3;
  /** Clock reading angle of the push direction, radians clockwise from 12:00 in the pitch's view; null when zero. */
  readonly clockRad: number | null;
  /** Component toward the arm side (negative: glove side). */
  readonly armSide: number;
  /** Component up (negative: down). */
  readonly up: number;
}

/** The seam push of an orientation whose sampler result is `alongAxis`, in field terms. */
export function pushInField(frame: PitchFrame, view: ClockView, alongAxis: number): FieldPush {
  const a = frame.pushLine;
  const vector: Vec3 = [alongAxis * a[0], alongAxis * a[1], alongAxis * a[2]];
  const clockRad = Math.abs(alongAxis) > 1e-15 ? directionToClockAngle(vector, view, frame.flight) : null;
  return { vector, clockRad, armSide: dot3(vector, frame.armSide), up: vector[2] };
}

/** Unit field direction of the wanted push (null for "any"). */
export function wantDirection(frame: PitchFrame, want: Want): Vec3 | null {
  switch (want) {
    case "arm":
      return frame.armSide;
    case "glove":
      return [-frame.armSide[0], -frame.armSide[1], -frame.armSide[2]];
    case "up":
      return [0, 0, 1];
    case "down":
      return [0, 0, -1];
    default:
      return null;
  }
}

/**
 * How a sampler result scores for the pitch: the push's component toward the wanted
 * direction (alongAxis times a . wanted), or the asymmetry magnitude for "any".
 * Returns the factor f with score = f * alongAxis, or null for "any" (score = |alongAxis|).
 */
export function scoreFactor(frame: PitchFrame, want: Want): number | null {
  const d = wantDirection(frame, want);
  return d ? dot3(frame.pushLine, d) : null;
}

/** Checks a pitch's numbers, throwing RangeError with the field's name and the expected range. */
export function assertPitch(p: Pitch): void {
  const speedMph = p.speedMPerS / M_PER_S_PER_MPH;
  if (!(speedMph >= SPEED_RANGE_MPH[0] && speedMph <= SPEED_RANGE_MPH[1])) {
    throw new RangeError(`speed ${fmt(speedMph)} mph must be from ${SPEED_RANGE_MPH[0]} to ${SPEED_RANGE_MPH[1]} mph`);
  }
  const spinRpm = p.spinRadPerS / RAD_PER_S_PER_RPM;
  if (!(spinRpm >= SPIN_RANGE_RPM[0] && spinRpm <= SPIN_RANGE_RPM[1])) {
    throw new RangeError(`spin ${fmt(spinRpm)} rpm must be from ${SPIN_RANGE_RPM[0]} to ${SPIN_RANGE_RPM[1]} rpm`);
  }
  if (!Number.isFinite(p.tiltRad)) throw new RangeError(`tilt must be a clock reading H:MM`);
  if (!(Math.abs(p.gyroRad) < Math.PI / 2)) throw new RangeError(`gyro ${fmt(p.gyroRad / DEG)} deg must be strictly between -90 and 90 deg`);
  if (!HANDS.includes(p.hand)) throw new RangeError(`hand "${p.hand}" must be right or left`);
  if (!VIEWS.includes(p.view)) throw new RangeError(`view "${p.view}" must be pitcher or catcher`);
  if (!WANTS.includes(p.want)) throw new RangeError(`want "${p.want}" must be one of ${WANTS.join(", ")}`);
}

function fmt(x: number): string {
  return Number.isFinite(x) ? String(Math.round(x * 1000) / 1000) : String(x);
}

/** Tilt in radians from minutes past 12:00 (re-exported for callers that hold only this module). */
export const tiltFromClockMinutes = (minutes: number): number => clockToAngle(minutes);
