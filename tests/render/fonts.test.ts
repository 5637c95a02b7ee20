import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import * as fontkit from "fontkit";
import { describe, expect, it } from "vitest";
import { fontFace, MISSING_GLYPH, measureText, printable, textRuns, woffToSfnt, wrapText } from "../../src/render/fonts.js";

const dir = join(dirname(createRequire(import.meta.url).resolve("@fontsource/noto-sans/LICENSE")), "files");

describe("the embedded face (Noto Sans from @fontsource/noto-sans)", () => {
  it("unpacks WOFF 1.0 into a font fontkit reads as the same face: glyph count, name and advances equal to reading the WOFF itself", () => {
    const woff = readFileSync(join(dir, "noto-sans-cyrillic-400-normal.woff"));
    const a = fontkit.create(woff);
    const b = fontkit.create(woffToSfnt(woff));
    expect(b.numGlyphs).toBe(a.numGlyphs);
    expect(b.postscriptName).toBe(a.postscriptName);
    for (const ch of "ЖЯжя") expect(b.glyphForCodePoint(ch.codePointAt(0)!).advanceWidth).toBe(a.glyphForCodePoint(ch.codePointAt(0)!).advanceWidth);
  });

  it("refuses bytes that are not WOFF 1.0 with a RangeError", () => {
    expect(() => woffToSfnt(new Uint8Array(64))).toThrow(RangeError);
  });

  it("sets accents, Cyrillic and Greek in the subset that holds them", () => {
    const runs = textRuns("Zoë Łukasz Ярослава Σοφία Nguyễn");
    const faceOf = (word: string) => runs.find((r) => r.text.includes(word))!.face.subset;
    expect(faceOf("Zoë")).toBe("latin");
    expect(faceOf("Ярослава")).toMatch(/^cyrillic/);
    expect(faceOf("Σοφία")).toMatch(/^greek/);
    expect(runs.map((r) => r.text).join("")).toBe("Zoë Łukasz Ярослава Σοφία Nguyễn".normalize("NFC"));
  });

  it("prints one U+FFFD for each character the face lacks (CJK, Arabic, an emoji with skin tone, a family emoji), never stray glyphs", () => {
    expect(printable("山田 太郎")).toBe(`${MISSING_GLYPH}${MISSING_GLYPH} ${MISSING_GLYPH}${MISSING_GLYPH}`);
    expect(printable("عمر")).toBe(MISSING_GLYPH.repeat(3));
    expect(printable("A👍🏽B")).toBe(`A${MISSING_GLYPH}B`);
    expect(printable("x👨‍👩‍👧y")).toBe(`x${MISSING_GLYPH}y`);
    expect(fontFace("latin", "normal").font.hasGlyphForCodePoint(0xfffd)).toBe(true);
  });

  it("drops control characters and invisible bidi marks", () => {
    expect(printable("a\u0000b\u001bc\u200fd")).toBe("abcd");
  });

  it("wraps text into lines no wider than the box, keeping every word in order", () => {
    const text = "Start from the two-seam hold and turn the ball 16 degrees in your hand: the side under your fingers rolls toward your arm side.";
    const lines = wrapText(text, 120, 8);
    expect(lines.length).toBeGreaterThan(2);
    for (const l of lines) expect(measureText(l, 8)).toBeLessThanOrEqual(120 + 1e-9);
    expect(lines.join(" ")).toBe(text);
  });

  it("measures a string as its runs laid out by the font: 'Hello' at 10 pt is 10 pt times its advance in em", () => {
    const f = fontFace("latin", "normal").font;
    expect(measureText("Hello", 10)).toBeCloseTo((10 * f.layout("Hello").advanceWidth) / f.unitsPerEm, 9);
  });
});
