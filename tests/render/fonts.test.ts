import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import * as fontkit from "fontkit";
import { describe, expect, it } from "vitest";
import PDFDocument from "pdfkit";
import { cjkFace, cjkUnicodeRanges, fontFace, MISSING_GLYPH, measureText, parseUnicodeRanges, printable, scriptFace, textRuns, visualRuns, woffToSfnt, wrapText } from "../../src/render/fonts.js";
import { paintSceneAt } from "../../src/render/paper/pdfScene.js";
import { createScene } from "../../src/render/scene.js";

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

  it("sets a label of Latin-1 letters and punctuation (12° – arm side · 5×, “grip”, ½ …) as one run in the first face, as segmenting it character by character does, and a character that face lacks (U+2030, U+2049) still by segmenting", () => {
    const label = "Zoë: 12° – arm side · 5× “grip” ½ … ±0.3′";
    const runs = textRuns(label);
    expect(runs).toHaveLength(1);
    expect(runs[0].face.subset).toBe("latin");
    expect(runs[0].text).toBe(label);
    // the segmenting path, character by character, picks the same face for each
    // (a Cyrillic letter first sends it down the segmenting path)
    for (const ch of label) if (ch !== " ") expect(textRuns(`\u0416${ch}`).at(-1)!.face.subset).toBe("latin");
    const lacking = "a \u2049 b \u2030";
    for (const cp of [0x2030, 0x2049]) expect(fontFace("latin", "normal").font.hasGlyphForCodePoint(cp)).toBe(false);
    const runs2 = textRuns(lacking);
    expect(runs2.length).toBeGreaterThan(1);
    for (const r of runs2) for (const ch of r.text) if (ch !== " ") expect(r.face.holds(ch.codePointAt(0)!)).toBe(true);
  });

  it("prints one U+FFFD for each character no shipped face holds (Thai, an emoji with skin tone, a family emoji), never stray glyphs", () => {
    expect(printable("สม")).toBe(MISSING_GLYPH.repeat(2));
    expect(printable("A👍🏽B")).toBe(`A${MISSING_GLYPH}B`);
    expect(printable("x👨‍👩‍👧y")).toBe(`x${MISSING_GLYPH}y`);
    expect(fontFace("latin", "normal").font.hasGlyphForCodePoint(0xfffd)).toBe(true);
  });

  it("sets Arabic, Hebrew, Chinese, Japanese and Korean in the fallback faces, each character in a file that holds it, and prints them as typed", () => {
    for (const [name, family] of [["محمد علي", "NotoSansArabic"], ["דוד לוי", "NotoSansHebrew"], ["李小龙", "NotoSansSC"], ["山田 太郎", "NotoSansSC"], ["さくら カナ", "NotoSansSC"], ["김민준", "NotoSansKR"], ["이서연 박", "NotoSansKR"]] as const) {
      expect(printable(name)).toBe(name);
      for (const r of textRuns(name)) {
        expect(r.face.key.startsWith(`${family}-`), `${name}: ${r.face.key}`).toBe(true);
        for (const ch of r.text) expect(r.face.font.hasGlyphForCodePoint(ch.codePointAt(0)!)).toBe(true);
      }
    }
  });

  it("picks each CJK file by the package's own CSS: every code point a 400.css rule names is in that rule's file (cross-check of the CSS against the file's cmap, sampled)", () => {
    const css = readFileSync(join(dirname(createRequire(import.meta.url).resolve("@fontsource/noto-sans-sc/LICENSE")), "400.css"), "utf8");
    const ranges = parseUnicodeRanges(css);
    // fontsource's 400.css: one rule per file, about 100 files (the package's README)
    expect(new Set(ranges.map((r) => r.file)).size).toBeGreaterThan(90);
    expect(cjkUnicodeRanges("normal")).toEqual(ranges);
    for (const cp of [0x674e, 0x5c0f, 0x9f99, 0x5c71, 0x7530, 0x3042, 0x30ab]) {
      const face = cjkFace(cp, "normal")!;
      const rule = ranges.find((r) => cp >= r.first && cp <= r.last)!;
      expect(face.key).toBe(`NotoSansSC-${/^noto-sans-sc-(.+)-400-normal\.woff$/.exec(rule.file)![1]}-400`);
      expect(face.font.hasGlyphForCodePoint(cp)).toBe(true);
    }
  });

  it("sets Hangul in Noto Sans KR, never in Noto Sans SC, whose files hold only some syllables (김 is in one, 민 in none)", () => {
    const sc = cjkUnicodeRanges("normal")!;
    const inSc = (cp: number) => sc.some((r) => cp >= r.first && cp <= r.last);
    expect(inSc(0xae40)).toBe(true);
    expect(inSc(0xbbfc)).toBe(false);
    for (const cp of [0xae40, 0xbbfc]) expect(cjkFace(cp, "normal")!.key.startsWith("NotoSansKR-")).toBe(true);
  });

  it("finds every Hangul syllable (U+AC00 to U+D7A3: SBase and SCount = 11,172 of the Unicode Standard, sec. 3.12) in a Noto Sans KR file by the package's own CSS, in both weights, and the file holds it (cross-check of the CSS against the files' cmaps, every 37th syllable)", () => {
    for (const weight of ["normal", "bold"] as const) {
      const css = readFileSync(join(dirname(createRequire(import.meta.url).resolve("@fontsource/noto-sans-kr/LICENSE")), weight === "bold" ? "700.css" : "400.css"), "utf8");
      const ranges = parseUnicodeRanges(css);
      expect(cjkUnicodeRanges(weight, "korean")).toEqual(ranges);
      const w = weight === "bold" ? 700 : 400;
      for (let cp = 0xac00; cp <= 0xd7a3; cp++) {
        const rule = ranges.find((r) => cp >= r.first && cp <= r.last);
        expect(rule, `U+${cp.toString(16)}`).toBeDefined();
        if ((cp - 0xac00) % 37 !== 0 && cp !== 0xd7a3) continue;
        const face = cjkFace(cp, weight)!;
        expect(face.key).toBe(`NotoSansKR-${/^noto-sans-kr-(.+)-[0-9]00-normal\.woff$/.exec(rule!.file)![1]}-${w}`);
        expect(face.font.hasGlyphForCodePoint(cp), `U+${cp.toString(16)}`).toBe(true);
      }
    }
  });

  it("parses CSS unicode-range lists (CSS Fonts Level 4, sec. 4.5): single code points, ranges and wildcards", () => {
    const css = "@font-face { src: url(./files/a.woff2) format('woff2'), url(./files/a.woff) format('woff'); unicode-range: U+4e00-4e0f,U+30??,U+ff01; }";
    expect(parseUnicodeRanges(css)).toEqual([
      { first: 0x3000, last: 0x30ff, file: "a.woff" },
      { first: 0x4e00, last: 0x4e0f, file: "a.woff" },
      { first: 0xff01, last: 0xff01, file: "a.woff" },
    ]);
    expect(() => parseUnicodeRanges("body { color: red }")).toThrow(RangeError);
  });

  it("orders a mixed line as UAX #9 does for a left-to-right paragraph: each right-to-left stretch, spaces and punctuation between its words included, last word first", () => {
    const order = (t: string) => visualRuns(t).map((r) => r.text).join("|");
    // UAX #9 N1: the space between two Arabic words takes their direction; the one before the en dash (R then ON then L) the paragraph's
    expect(order("Coach محمد علي – sinker")).toBe("Coach |علي| |محمد| |– sinker");
    // a Hebrew word next to an Arabic word: one right-to-left stretch across two faces
    expect(order("a דוד محمد b")).toBe("a |محمد| |דוד| |b");
    // a hyphen between two Hebrew words (N1): drawn between them, the second word at the left
    expect(order("בן-גוריון")).toBe("גוריון|-|בן");
    // no right-to-left letter: the logical runs as they are
    expect(visualRuns("Zoë Ярослава")).toEqual(textRuns("Zoë Ярослава"));
  });

  it("orders numbers and brackets inside right-to-left text as UAX #9 does (hand-derived from its rules W2, W7, N0, N1, I1-I2, L2, L4)", () => {
    const order = (t: string) => visualRuns(t).map((r) => r.text).join("|");
    // European digits between Hebrew words: EN (W7 finds R before them, not L) at level 2 (I1), the spaces R by N1 (numbers count as R), so the number stays left to right inside the reversed stretch (L2)
    expect(order("מכבי 2024 תל אביב")).toBe("אביב| |תל| |2024| |מכבי");
    expect(order("מחנה אימון 2027")).toBe("2027| |אימון| |מחנה");
    // Arabic-Indic digits after an Arabic word: AN (W2) at level 2, each digit its own run so no face reverses them
    expect(order("نادي ٢٠٢٧")).toBe("٢|٠|٢|٧| |نادي");
    // ... and alone in a left-to-right line: reversed twice by L2 (levels 2 and 1), so in typed order
    expect(order("٢٠٢٧")).toBe("٢|٠|٢|٧");
    // brackets around an Arabic word after an Arabic word: N0 gives them R, so they sit at level 1 and print mirrored (L4)
    expect(order("محمد (علي)")).toBe("(|علي|)| |محمد");
    // brackets around a Hebrew word inside English: N0 gives them the paragraph's L, unmirrored, in place
    expect(order("abc (דוד) def")).toBe("abc (|דוד|) def");
    // two punctuation marks between Hebrew words: R by N1, reversed one by one
    expect(order("דוד?! לוי")).toBe("לוי| |!|?|דוד");
    // a mirrored bracket is as wide as the one typed, so a line's measured width holds when drawn
    for (const [a, b] of [["(", ")"], ["[", "]"], ["{", "}"], ["«", "»"], ["<", ">"]]) expect(measureText(a, 1)).toBeCloseTo(measureText(b, 1), 12);
  });

  it("measures Arabic as pdfkit lays it out: our width of 'محمد علي' at 10 pt equals pdfkit's widthOfString in the same face (fontkit's shaping, both routes), to 1e-9 pt", () => {
    const doc = new PDFDocument({ size: [100, 100] });
    const face = scriptFace("arabic", "normal");
    doc.registerFont(face.key, face.sfnt);
    doc.font(face.key).fontSize(10);
    expect(measureText("محمد علي", 10)).toBeCloseTo(doc.widthOfString("محمد علي"), 9);
    // shaping narrows the word: the joined forms are not the isolated letters' advances summed
    const isolated = [..."محمد"].reduce((w, ch) => w + face.font.glyphForCodePoint(ch.codePointAt(0)!).advanceWidth, 0) / face.font.unitsPerEm;
    expect(Math.abs(measureText("محمد", 1) - isolated)).toBeGreaterThan(0.01);
  });

  it("draws 'محمد' in the PDF with its joining forms, left to right: final dal, medial meem, medial hah, initial meem (The Unicode Standard, ch. 9 Arabic joining; presentation forms U+FEAA, U+FEE4, U+FEA4, U+FEE3), never the isolated letters", async () => {
    const scene = createScene(120, 40);
    scene.element("text").attr({ x: 10, y: 30, "font-size": 20 }).words("محمد");
    const doc = new PDFDocument({ size: [120, 40], compress: false });
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    const done = new Promise<void>((ok) => doc.on("end", () => ok()));
    paintSceneAt(doc, scene);
    doc.end();
    await done;
    const pdf = Buffer.concat(chunks).toString("latin1");
    // the embedded (subset) font file, read back, and the glyph ids the page shows, in drawing order
    // the TrueType file pdfkit embeds (its subsetter writes the sfnt version "true")
    const streams = [...pdf.matchAll(/stream\n([\s\S]*?)\nendstream/g)].map((m) => Buffer.from(m[1], "latin1"));
    const subset = fontkit.create(streams.find((b) => b.length > 12 && (b.readUInt32BE(0) === 0x00010000 || b.toString("latin1", 0, 4) === "true"))!) as fontkit.Font;
    const shown = [...pdf.matchAll(/\[<([0-9a-f]+)>[^\]]*\] TJ/g)].flatMap((m) => m[1].match(/.{4}/g)!.map((h) => parseInt(h, 16)));
    expect(shown.length).toBe(4);
    // a glyph's outline as its drawing commands (the subset keeps each glyph's contours, renumbered)
    type Outlined = { path: { commands: readonly unknown[] } };
    const outline = (g: Outlined) => JSON.stringify(g.path.commands);
    const glyphOf = (gid: number) => (subset as unknown as { getGlyph(id: number): Outlined }).getGlyph(gid);
    const arabic = scriptFace("arabic", "normal").font;
    const forms = [0xfeaa, 0xfee4, 0xfea4, 0xfee3].map((cp) => outline(arabic.glyphForCodePoint(cp)));
    expect(shown.map((gid) => outline(glyphOf(gid)))).toEqual(forms);
    const isolated = [0x645, 0x62d, 0x62f].map((cp) => outline(arabic.glyphForCodePoint(cp)));
    for (const g of shown) expect(isolated).not.toContain(outline(glyphOf(g)));
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
