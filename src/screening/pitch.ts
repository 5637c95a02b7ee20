/**
 * A pitch as a screen sees it, in SI and radians, and what its spin axis means in
 * the field frame (geometry/frames.ts: x toward the catcher's right, y toward the
 * pitcher, z up; the pitch flies along -y).
 *
 * The seam-force model (src/physics/seamModel) reports its force along a =
 * unit(w - (w . v) v), the spin axis's part across the flight line ("across"), and
 * along m = unit(w x v), the Magnus direction; `pitchFrame` gives both in the field.
 */
import { armSideDirection, spinAxisFromTilt, TOWARD_PLATE, type ClockView, type Hand, HANDS, VIEWS } from "../../geometry/frames.js";
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

