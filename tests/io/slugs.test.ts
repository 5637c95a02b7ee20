import { describe, expect, it } from "vitest";
import { baseSlug, MAX_SLUG_BYTES, MAX_SLUG_CHARS, uniqueSlugs } from "../../src/io/slugs.js";

/** A stem is one safe path component: no separators, no NUL, not "." or "..", no leading dot. */
function assertSafe(stem: string): void {
  expect(stem).not.toMatch(/[\/\\\0:*?"<>|]/);
  expect(stem).not.toMatch(/^\.|^-|-$/);
  expect(stem.length).toBeGreaterThan(0);
  expect(Array.from(stem).length).toBeLessThanOrEqual(MAX_SLUG_CHARS);
  expect(Buffer.byteLength(stem)).toBeLessThanOrEqual(MAX_SLUG_BYTES);
}

describe("uniqueSlugs", () => {
  it('"J. Smith" and "J Smith" do not collide', () => {
    expect(uniqueSlugs(["J. Smith", "J Smith"])).toEqual(["J-Smith", "J-Smith-2"]);
  });
  it("duplicates are found case-insensitively (as on default macOS and Windows volumes)", () => {
    expect(uniqueSlugs(["Sinker", "sinker", "SINKER"])).toEqual(["Sinker", "sinker-2", "SINKER-3"]);
  });
  it("a suffix never takes a stem another label gives plainly", () => {
    expect(uniqueSlugs(["J Smith", "J. Smith", "J Smith 2"])).toEqual(["J-Smith", "J-Smith-3", "J-Smith-2"]);
  });
  it("keeps letters and digits of every script: two Arabic names, two CJK names stay apart", () => {
    const s = uniqueSlugs(["\u0639\u0644\u064a \u062d\u0633\u0646", "\u0639\u0645\u0631 \u062e\u0627\u0644\u062f", "\u5c71\u7530 \u592a\u90ce", "\u7530\u4e2d \u82b1\u5b50", "\uae40\ubbfc\uc900"]);
    expect(s).toEqual(["\u0639\u0644\u064a-\u062d\u0633\u0646", "\u0639\u0645\u0631-\u062e\u0627\u0644\u062f", "\u5c71\u7530-\u592a\u90ce", "\u7530\u4e2d-\u82b1\u5b50", "\uae40\ubbfc\uc900"]);
    s.forEach(assertSafe);
  });
  it("keeps combining marks (Devanagari vowel signs are Unicode category Mc/Mn)", () => {
    expect(baseSlug("\u0930\u093e\u091c\u0947\u0936 \u0915\u0941\u092e\u093e\u0930")).toBe("\u0930\u093e\u091c\u0947\u0936-\u0915\u0941\u092e\u093e\u0930");
  });
  it("normalises to NFC, so composed and decomposed names are the same file (Unicode UAX #15)", () => {
    expect(uniqueSlugs(["Jos\u00e9", "Jose\u0301"])).toEqual(["Jos\u00e9", "Jos\u00e9-2"]);
  });
  it("labels with nothing to keep fall back to pitch, pitch-2 ...", () => {
    expect(uniqueSlugs(["", "!!!", "\u26be\u26be", "../.."])).toEqual(["pitch", "pitch-2", "pitch-3", "pitch-4"]);
  });
  it("path separators, dots and NUL never survive", () => {
    for (const l of ["../../etc/passwd", "a/b\\c", ".hidden", "x\u0000y", "CON", "nul", "com1"]) assertSafe(baseSlug(l));
    expect(baseSlug("../../etc/passwd")).toBe("etc-passwd");
    expect(baseSlug("CON")).toBe("CON-pitch");
  });
  it(`caps length at ${MAX_SLUG_CHARS} code points and ${MAX_SLUG_BYTES} bytes, suffix included`, () => {
    const long = "a".repeat(300);
    const s = uniqueSlugs([long, long]);
    expect(Array.from(s[0]).length).toBe(MAX_SLUG_CHARS);
    expect(s[1].endsWith("-2")).toBe(true);
    expect(Array.from(s[1]).length).toBe(MAX_SLUG_CHARS);
    const wide = "\u{20000}".repeat(100); // CJK Extension B: 4 bytes each in UTF-8
    const w = uniqueSlugs([wide, wide]);
    w.forEach(assertSafe);
    expect(w[0]).not.toBe(w[1]);
  });
  it("every stem of a batch of mixed labels is safe and unique (case-insensitively)", () => {
    const labels = ["Iris Talvela", "iris talvela", "Ode Mbeki", "Luz Arrieta", "luz-arrieta", "O'Neil", "O Neil", "", "🎯", "Łukasz Żak", "Ñandú"];
    const s = uniqueSlugs(labels);
    s.forEach(assertSafe);
    expect(new Set(s.map((x) => x.toLowerCase())).size).toBe(labels.length);
  });
});
