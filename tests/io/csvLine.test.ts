import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { csvCell, csvRow, parseCsvLine } from "../../src/io/csvLine.js";

describe("one CSV line (RFC 4180 quoting)", () => {
  it("reads RFC 4180's examples: quoted fields, a doubled quote inside one, and commas inside quotes (Y. Shafranovich, RFC 4180, 2005, section 2)", () => {
    expect(parseCsvLine('"aaa","b""bb","ccc"')).toEqual(["aaa", 'b"bb', "ccc"]);
    expect(parseCsvLine('aaa,"b,bb",ccc')).toEqual(["aaa", "b,bb", "ccc"]);
    expect(parseCsvLine("aaa,,ccc")).toEqual(["aaa", "", "ccc"]);
    expect(() => parseCsvLine('aaa,"bbb')).toThrow(/not closed/);
  });

  it("quotes a cell with a quote, comma or line feed by RFC 4180's rule and doubles its quotes", () => {
    expect(csvCell('say "hi", then')).toBe('"say ""hi"", then"');
    expect(csvCell("plain")).toBe("plain");
    expect(csvCell(null)).toBe("");
    expect(csvCell(1.5)).toBe("1.5");
  });

  it("reads back every row it writes, for 500 random rows of cells with quotes and commas (no line breaks, no spaces at a cell's ends: the reader trims cells)", () => {
    const cell = fc.string({ unit: fc.constantFrom("a", "b", "7", " ", ",", '"', ".", "-", "é") }).map((s) => s.trim());
    fc.assert(
      fc.property(fc.array(cell, { minLength: 1, maxLength: 8 }), (cells) => {
        expect(parseCsvLine(csvRow(cells))).toEqual(cells);
      }),
      { seed: 4180, numRuns: 500 },
    );
  });
});
