/**
 * The separation band and the flow seen from the ball.
 *
 * Polar angle theta of a point q on the unit ball is measured from the front
 * stagnation point +v (v = unit flight direction): theta = arccos(q . v).
 * The band is theta in [c - w/2, c + w/2].
 *
 * Default band: 80 to 120 degrees (centre 100, width 40). Achenbach's smooth-sphere
 * measurements (J. Fluid Mech. 54(3), 1972) put laminar separation near 82 degrees
 * from the front stagnation point at subcritical Reynolds numbers and turbulent
 * separation near 120 degrees at supercritical ones (values from memory). A pitched
 * ball (Re about 1.5e5 to 2.2e5) sits below the smooth-sphere crisis, so its
 * undisturbed separation is near the laminar angle; a seam anywhere between the two
 * regimes' separation lines can move the line from one regime toward the other.
 * The band spans that range, rounded outward to whole tens of degrees.
 */
import { DEG } from "../../geometry/units.js";

export interface Band {
  /** Band centre c, radians from the front stagnation point. */
  readonly centerRad: number;
  /** Band width w, radians. */
  readonly widthRad: number;
}

export const DEFAULT_BAND_CENTER_DEG = 100;
export const DEFAULT_BAND_WIDTH_DEG = 40;

export const DEFAULT_BAND: Band = {
  centerRad: DEFAULT_BAND_CENTER_DEG * DEG,
  widthRad: DEFAULT_BAND_WIDTH_DEG * DEG,
};

/** Builds a band from degrees, throwing RangeError unless 0 < c - w/2 and c + w/2 < 180. */
export function bandFromDegrees(centerDeg: number, widthDeg: number): Band {
  if (!Number.isFinite(centerDeg)) throw new RangeError(`band centre ${centerDeg} deg is not a number of degrees`);
  if (!Number.isFinite(widthDeg) || widthDeg <= 0) {
    throw new RangeError(`band width ${widthDeg} deg must be a positive number of degrees`);
  }
  const lo = centerDeg - widthDeg / 2;
  const hi = centerDeg + widthDeg / 2;
  if (lo <= 0 || hi >= 180) {
    throw new RangeError(
      `band ${lo} to ${hi} deg (centre ${centerDeg}, width ${widthDeg}) must lie inside (0, 180) deg from the stagnation point`,
    );
  }
  return { centerRad: centerDeg * DEG, widthRad: widthDeg * DEG };
}

/** Largest |gyro| accepted, radians (exclusive): at 90 deg the spin axis is the flight line. */
export const GYRO_LIMIT_RAD = Math.PI / 2;

/** Throws RangeError unless |gyro| < 90 deg. */
export function assertGyro(gyroRad: number): void {
  if (!Number.isFinite(gyroRad) || Math.abs(gyroRad) >= GYRO_LIMIT_RAD) {
    throw new RangeError(`gyro angle ${(gyroRad / DEG).toPrecision(6)} deg must be a number strictly between -90 and 90 deg`);
  }
}
