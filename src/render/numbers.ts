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

/** A number rounded as `fixed` writes it (for CSV cells people read): the same digits, no minus zero. */
export function rounded(x: number, digits: number): number {
  return Number(fixed(x, digits));
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
