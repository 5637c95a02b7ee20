/**
 * Number formatting for the 3-D page: the same rules as the terminal and the paper
 * (src/screening/numbers.ts, imported here and bundled into the page), plus the
 * page's own clock helper.
 */
import { fixed, formatScore, percent, signed } from "../../screening/numbers.js";

/** `x.toFixed(digits)` without a minus sign on values that round to zero. */
export const fixedDigits = fixed;
/** With an explicit plus sign on non-negative values. */
export const signedDigits = signed;
/** A 0..1 share as "12.34 %". */
export const percentText = percent;
/** Score, push and robustness in thousandths of the seam-asymmetry unit, signed, 2 decimals. */
export const thousandthsText = formatScore;

/** Minutes on a 12-hour clock face. */
const CLOCK_MINUTES = 720;

/** The clock reading opposite "H:MM" (six hours on), or "-" when the reading is missing or not H:MM. */
export function oppositeClock(clock: string | null): string {
  const m = clock === null ? null : /^(\d{1,2}):(\d{2})$/.exec(clock);
  if (!m) return "-";
  const minutes = ((Number(m[1]) % 12) * 60 + Number(m[2]) + CLOCK_MINUTES / 2) % CLOCK_MINUTES;
  const h = Math.floor(minutes / 60);
  return `${h === 0 ? 12 : h}:${String(minutes % 60).padStart(2, "0")}`;
}
