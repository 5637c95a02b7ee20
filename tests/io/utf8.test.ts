import { describe, expect, it } from "vitest";
import { firstInvalidUtf8, lineOfOffset } from "../../src/io/utf8.js";

// Ill-formed sequences from The Unicode Standard, ch. 3, Table 3-7 (well-formed UTF-8
// byte sequences) and the examples after definition D93; each case gives the offset of
// the first byte of the first ill-formed subsequence.
const cases: [string, number[], number][] = [
  ["ASCII", [0x61, 0x62], -1],
  ["two-, three- and four-byte sequences (U+00E9, U+20AC, U+1F600)", [0xc3, 0xa9, 0xe2, 0x82, 0xac, 0xf0, 0x9f, 0x98, 0x80], -1],
  ["0xFF never appears", [0x61, 0xff, 0x62], 1],
  ["a lone continuation byte", [0x61, 0x80], 1],
  ["overlong C0 AF (for '/')", [0xc0, 0xaf], 0],
  ["a surrogate ED A0 80 (U+D800)", [0xed, 0xa0, 0x80], 0],
  ["above U+10FFFF: F4 90 80 80", [0xf4, 0x90, 0x80, 0x80], 0],
  ["a sequence cut by an ASCII byte", [0x61, 0xe2, 0x82, 0x0a], 1],
  ["a sequence cut by the end", [0x61, 0x62, 0xe2, 0x82], 2],
  ["a bad byte after good multi-byte text", [0xc3, 0xa9, 0xff], 2],
];

describe("firstInvalidUtf8 (Unicode Table 3-7)", () => {
  it.each(cases)("%s", (_name, bytes, offset) => {
    expect(firstInvalidUtf8(Uint8Array.from(bytes))).toBe(offset);
  });
  it("finds the first of several bad bytes in a long text", () => {
    const b = Buffer.from("é".repeat(5000) + "x");
    b[7001] = 0xff;
    b[9000] = 0xfe;
    expect(firstInvalidUtf8(b)).toBe(7000); // the lead byte of the broken pair at 7000-7001
  });
  it("lineOfOffset counts line feeds before the offset", () => {
    const b = Buffer.from("a\nb\r\nc\n");
    expect([0, 2, 5, 7].map((o) => lineOfOffset(b, o))).toEqual([1, 2, 3, 4]);
  });
});
