/** Invented pitches that several tests share. */
import { clockToAngle, parseClock } from "../../geometry/clock.js";
import type { Pitch } from "../../src/screening/pitch.js";

/** A right-hander's sinker (92 mph, 2150 rpm, tilt 1:45, gyro 10 deg, wanted push arm side): invented test data. */
export function sinkerPitch(over: Partial<Pitch> = {}): Pitch {
  return {
    name: "sinker",
    pitcher: "",
    hand: "right",
    speedMPerS: 92 * 0.44704,
    spinRadPerS: (2150 * 2 * Math.PI) / 60,
    tiltRad: clockToAngle(parseClock("1:45")),
    view: "pitcher",
    gyroRad: (10 * Math.PI) / 180,
    want: "arm",
    ...over,
  };
}
