/**
 * Clock readings: the trade's way of writing a direction across the flight line.
 * A reading "H:MM" names where a clock hand points on a 12-hour face; 12:00 is
 * straight up and 3:00 the viewer's right (whose view: geometry/frames.ts). Inside
 * the tool a reading is minutes past 12:00 in [0, 720), or the clockwise angle from
 * 12:00 in radians (one minute of clock is half a degree).
 */

/** Minutes on a 12-hour clock face. */
export const CLOCK_MINUTES = 720;

/** Parses "H:MM" (0 <= H <= 12, 00 <= MM <= 59; "12:00" and "0:00" both mean straight up) to minutes past 12:00. */
export function parseClock(text: string): number {
  const m = /^\s*(\d{1,2}):(\d{2})\s*$/.exec(text);
  if (!m) throw new RangeError(`tilt "${text}" is not a clock reading H:MM (for example 1:30)`);
  const h = Number(m[1]);
  const min = Number(m[2]);
  if (h > 12 || min >= 60) throw new RangeError(`tilt "${text}" must have hours 0-12 and minutes 00-59`);
  return ((h % 12) * 60 + min) % CLOCK_MINUTES;
}

/** Formats minutes past 12:00 as "H:MM" (rounded to the nearest minute; 12:00 for straight up). */
export function formatClock(minutes: number): string {
  let m = Math.round(minutes) % CLOCK_MINUTES;
  if (m < 0) m += CLOCK_MINUTES;
  const h = Math.floor(m / 60);
  const mm = m % 60;
  return `${h === 0 ? 12 : h}:${mm.toString().padStart(2, "0")}`;
}

/** Clock minutes to the clockwise angle from 12:00, radians. */
export function clockToAngle(minutes: number): number {
  return (minutes / CLOCK_MINUTES) * 2 * Math.PI;
}

/** Clockwise angle from 12:00 (radians) to clock minutes in [0, 720). */
export function angleToClock(angleRad: number): number {
  const m = (angleRad / (2 * Math.PI)) * CLOCK_MINUTES;
  const r = ((m % CLOCK_MINUTES) + CLOCK_MINUTES) % CLOCK_MINUTES;
  return r === CLOCK_MINUTES ? 0 : r;
}

/** The reading six hours on (the opposite direction), or null for no reading. */
export function oppositeClock(reading: string | null): string | null {
  return reading === null ? null : formatClock(parseClock(reading) + CLOCK_MINUTES / 2);
}

/**
 * Signed difference b - a in clock minutes, wrapped into (-360, 360]: positive when
 * b lies clockwise of a (in the same view).
 */
export function clockDifferenceMinutes(aMinutes: number, bMinutes: number): number {
  let d = (bMinutes - aMinutes) % CLOCK_MINUTES;
  if (d <= -CLOCK_MINUTES / 2) d += CLOCK_MINUTES;
  else if (d > CLOCK_MINUTES / 2) d -= CLOCK_MINUTES;
  return d;
}
