import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parseJsonWithLines } from "../../src/io/jsonLines.js";

describe("JSON that remembers its lines", () => {
  it("reads the same values as the platform's JSON.parse (ECMA-404 reference parser) for 500 random documents, compact and pretty-printed", () => {
    fc.assert(
      fc.property(fc.json(), fc.constantFrom(0, 2), (text, indent) => {
        const doc = indent ? JSON.stringify(JSON.parse(text), null, indent) : text;
        expect(parseJsonWithLines(doc, "t.json").value).toEqual(JSON.parse(doc));
      }),
      { seed: 404, numRuns: 500 },
    );
  });

  it("gives each field the line its value starts on, and names line and column of a syntax error", () => {
    const text = '{\n  "pitchers": [\n    { "name": "x",\n      "speedMph": 92 }\n  ]\n}\n';
    const parsed = parseJsonWithLines(text, "staff.json");
    expect(parsed.lineOf("pitchers")).toBe(2);
    expect(parsed.lineOf("pitchers[0].name")).toBe(3);
    expect(parsed.lineOf("pitchers[0].speedMph")).toBe(4);
    expect(() => parseJsonWithLines('{\n  "a": 1,\n}', "bad.json")).toThrow(/bad\.json: malformed JSON at line 3/);
  });
});
