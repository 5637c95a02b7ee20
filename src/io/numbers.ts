/**
 * Decimal numbers from text typed by a user (command-line values, CSV cells).
 *
 * Accepted (after trimming white space at both ends):
 *   [+|-] digits [. digits] [(e|E) [+|-] digits]
 * where either side of the decimal point may be empty but not both, so `92`,
 * `-1.5`, `+3`, `2.4e3`, `.5` and `5.` are read. Leading zeros are decimal (`092`
 * is 92, never octal).
 *
 * Refused, each with one line naming the value: empty text; `0x`/`0o`/`0b`
 * prefixes; `Infinity` and `NaN` ("is not a number"); thousands separators or a
 * decimal comma; digits of other scripts; a value whose magnitude overflows a
 * float64 ("is too large") or a non-zero value that underflows to zero ("is too
 * small"). JavaScript's `Number()` would take `0x5C`, `0b1`, `Infinity` and " "
 * (as 0); that is why this module exists.
 */
import { InputError } from "./errors.js";
import { quote } from "./quote.js";

const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const NOT_A_NUMBER = /^[+-]?(?:inf|infinity|nan)$/i;
const PREFIXED = /^[+-]?0[xob]/i;

/** Whether `text` is a plain decimal number by the grammar above (no trimming). */
export function isPlainDecimal(text: string): boolean {
  return DECIMAL.test(text);
}

/**
 * Reads a decimal number; throws InputError `WHAT "TEXT" is ...; expected EXPECTED`.
 * @param text the text as typed (trimmed here).
 * @param what names the place for the message, e.g. `--speed` or `"a.csv" line 4, column "speed_mph"`.
 * @param expected what a good value is, e.g. `mph` or `a number of rpm from 500 to 3500`.
 * @returns a finite float64.
 */
export function parseDecimal(text: string, what: string, expected: string): number {
  const t = text.trim();
  const fail = (problem: string): never => {
    throw new InputError(`${what} ${quote(t)} ${problem}; expected ${expected}`);
  };
  if (t === "") fail("is empty");
  if (NOT_A_NUMBER.test(t)) fail("is not a number");
  if (PREFIXED.test(t)) fail("is not a decimal number (hexadecimal, octal and binary are not read)");
  if (!DECIMAL.test(t)) {
    if (/^[+-]?[\d.]+[,'_ ][\d.,'_ ]*$/.test(t)) fail("is not a decimal number (no thousands separators; the decimal point is \".\")");
    fail("is not a decimal number");
  }
  const x = Number(t);
  if (!Number.isFinite(x)) fail("is too large");
  if (x === 0 && /[1-9]/.test(t.replace(/[eE].*$/, ""))) fail("is too small to tell from zero");
  return x;
}
