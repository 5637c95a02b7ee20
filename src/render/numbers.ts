/**
 * How numbers are written for people — one set of rules for the terminal, the CSV's
 * neighbours (tables), the SVG drawings and the printed pages, so a number reads the
 * same wherever it appears. JSON keeps full precision.
 */

/** toFixed without a minus sign on values that round to zero. */
export function fixed(x: number, digits: number): string {
  const s = x.toFixed(digits);
  return /^-0\.?0*$/.test(s) ? s.slice(1) : s;
}

/** With an explicit sign: "+1.23", "-0.40", "+0.00". */
export function signed(x: number, digits = 5): string {
  const s = fixed(x, digits);
  return s.startsWith("-") ? s : `+${s}`;
}

/** A score or push component in thousandths of the seam-asymmetry unit, 2 decimals, signed. */
export function formatScore(x: number): string {
  return signed(1000 * x, 2);
}

/** Inches with 2 decimals. */
export function formatInches(x: number): string {
  return fixed(x, 2);
}

/** Inches of movement with 1 decimal and a sign. */
export function formatMovementIn(x: number): string {
  return signed(x, 1);
}

export function percent(x: number, digits = 2): string {
  return `${(100 * x).toFixed(digits)} %`;
}
