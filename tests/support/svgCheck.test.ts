import { describe, expect, it } from "vitest";
import { subpaths, xmlProblems } from "./svgCheck.js";

// the checker itself must be able to fail, or the tests that lean on it prove nothing
describe("the test's XML well-formedness check", () => {
  it("accepts one balanced <svg> root with entities", () => {
    expect(xmlProblems('<svg a="1"><g><text x="0">a &amp; b</text></g><path d="M0 0"></path></svg>')).toEqual([]);
  });
  it("rejects unbalanced tags, a second root, a bare & and a broken attribute", () => {
    expect(xmlProblems("<svg><g></svg>").length).toBeGreaterThan(0);
    expect(xmlProblems("<svg></svg><svg></svg>").length).toBeGreaterThan(0);
    expect(xmlProblems("<svg><text>a & b</text></svg>").length).toBeGreaterThan(0);
    expect(xmlProblems('<svg a="1></svg>').length).toBeGreaterThan(0);
  });
  it("reads relative path steps as absolute points (exact sums of the written steps)", () => {
    expect(subpaths("M1 2l3 4 -1 -1ZM0 0L5 5")).toEqual([[1, 2, 4, 6, 3, 5], [0, 0, 5, 5]]);
  });
});
