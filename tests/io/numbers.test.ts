import { describe, expect, it } from "vitest";
import { InputError } from "../../src/io/errors.js";
import { isPlainDecimal, parseDecimal } from "../../src/io/numbers.js";

function message(text: string): string {
  try {
    parseDecimal(text, "--speed", "mph");
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return (err as Error).message;
  }
  throw new Error(`${JSON.stringify(text)} was accepted`);
}

describe("parseDecimal refuses what is not a plain decimal number, naming the value", () => {
  // Each of these is a number to JavaScript's Number() (ECMA-262 StringToNumber reads
  // 0x/0o/0b prefixes and Infinity, and "" as 0); none is a decimal a user means.
  const cases: [string, RegExp][] = [
    ["0x5C", /^--speed "0x5C" is not a decimal number .*; expected mph$/],
    ["0X5c", /is not a decimal number/],
    ["0o17", /is not a decimal number/],
    ["0b101", /is not a decimal number/],
    ["-0x1", /is not a decimal number/],
    ["Infinity", /^--speed "Infinity" is not a number; expected mph$/],
    ["-Infinity", /is not a number/],
    ["inf", /is not a number/],
    ["NaN", /^--speed "NaN" is not a number; expected mph$/],
    ["", /^--speed "" is empty; expected mph$/],
    ["   ", /^--speed "" is empty; expected mph$/],
    ["1,000", /no thousands separators/],
    ["1 000", /no thousands separators/],
    ["1_000", /no thousands separators/],
    ["92,5", /is not a decimal number/],
    ["1e400", /^--speed "1e400" is too large; expected mph$/],
    ["-1e400", /is too large/],
    ["1e-400", /is too small/],
    ["92mph", /is not a decimal number/],
    ["--5", /is not a decimal number/],
    ["1e", /is not a decimal number/],
    [".", /is not a decimal number/],
    ["\u0669\u0662", /is not a decimal number/], // Arabic-Indic digits 92 (Unicode Nd, not ASCII)
    ["\u221292", /is not a decimal number/], // U+2212 MINUS SIGN
  ];
  it.each(cases)("%j", (text, pattern) => {
    const m = message(text);
    expect(m).toMatch(pattern);
    expect(m).not.toContain("\n");
  });
});

describe("parseDecimal reads ordinary decimals as ECMA-262 StringToNumber does (round to nearest float64)", () => {
  const cases = ["92", "-1.5", "+3", "2.4e3", "2.4E+3", "1e-3", ".5", "-.5", "5.", "092", "0", "-0", "1.7976931348623157e308", "4.9e-324", " 94 "];
  it.each(cases)("%j", (text) => {
    expect(Object.is(parseDecimal(text, "--x", "a number"), Number(text))).toBe(true);
  });
});

describe("isPlainDecimal", () => {
  it("matches signed decimals with fraction and exponent only", () => {
    for (const t of ["1", "-1.5", "+2", "3e5", ".5"]) expect(isPlainDecimal(t)).toBe(true);
    for (const t of ["-2+3", "+1+1", "=1", "0x1", "1,5", "", " 1"]) expect(isPlainDecimal(t)).toBe(false);
  });
});
