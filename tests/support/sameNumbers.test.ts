/** The number-by-number comparison the page tests use (sameNumbers.ts), seen to fail where it should. */
import { describe, expect, it } from "vitest";
import { compareNumberedText, compareNumbers } from "./sameNumbers.js";

describe("comparing documents number by number", () => {
  it("passes numbers within the relative tolerance and names those beyond it, a changed string, a missing key and a length", () => {
    expect(compareNumbers({ a: [1, 2.000000001], s: "x" }, { a: [1, 2], s: "x" }, 1e-6).mismatches).toEqual([]);
    expect(compareNumbers({ a: [1, 2.01], s: "x" }, { a: [1, 2], s: "y" }, 1e-6).mismatches).toEqual([".a[1]: 2.01 against 2", '.s: "x" against "y"']);
    expect(compareNumbers({ a: 1, k: 1 }, { a: 1, j: 1 }, 1e-6).mismatches).toEqual([": keys a,k against a,j"]);
    expect(compareNumbers([1, 2], [1], 1e-6).mismatches).toEqual([": 2 items against 1"]);
    // 2e-9 relative, the engines' difference: counted, within 1e-6
    const close = compareNumbers({ x: 1 + 2e-9 }, { x: 1 }, 1e-6);
    expect(close.mismatches).toEqual([]);
    expect(close.maxRelative).toBeCloseTo(2e-9, 12);
  });

  it("compares printed texts piece by piece: the words exactly, each number within one unit of its last digit", () => {
    expect(compareNumberedText('<path d="M1.25 3.5"/>', '<path d="M1.26 3.5"/>', 0.0100001)).toEqual([]);
    expect(compareNumberedText('<path d="M1.25 3.5"/>', '<path d="M1.28 3.5"/>', 0.0100001)).toEqual(["number 0: 1.25 against 1.28"]);
    expect(compareNumberedText("grip 1", "grip 2", 0.0100001)).toEqual(["number 0: 1 against 2"]);
    expect(compareNumberedText("grip 1", "hold 1", 0.0100001)).toEqual(['text "grip " against "hold "']);
  });
});
