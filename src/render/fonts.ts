/**
 * The one typeface of every printed and rasterised output: Noto Sans (SIL Open
 * Font Licence 1.1), regular and bold, from the @fontsource/noto-sans package.
 *
 * That package splits the face by script into subset files (latin, latin-ext,
 * cyrillic, cyrillic-ext, greek, greek-ext, vietnamese). Each is a WOFF 1.0 file,
 * unpacked here to a plain TrueType font (`woffToSfnt`), so pdfkit can embed it
 * (subsetting it to the glyphs used) and resvg can draw with it. Text is set by
 * render/typeset.ts over these files: runs in the first subset that holds each
 * character (a character none holds, Arabic, the CJK scripts, emoji, ..., prints as
 * U+FFFD), measured with the font's own advances and kerning (fontkit's layout), the
 * same way pdfkit places it, so lines wrapped here fit where they are drawn.
 */
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { inflateSync } from "node:zlib";
import * as fontkit from "fontkit";
import { BoundedCache } from "../../geometry/cache.js";
import { typesetter, type FontWeight, type TextRun as TypesetRun, type TypesetFace } from "./typeset.js";

export { MISSING_GLYPH, type FontWeight } from "./typeset.js";
export const FONT_FAMILY = "Noto Sans";
/** The SVG font-family list written into drawings: ours first, then what a viewer has. */
export const SVG_FONT_FAMILY = "Noto Sans, DejaVu Sans, Verdana, sans-serif";

/** The subsets, in the order a character is looked up. */
export const FONT_SUBSETS = ["latin", "latin-ext", "cyrillic", "cyrillic-ext", "greek", "greek-ext", "vietnamese"] as const;
export type FontSubset = (typeof FONT_SUBSETS)[number];

export interface FontFace extends TypesetFace {
  /** A name unique to this file, as registered in a PDF (e.g. "NotoSans-cyrillic-700"). */
  readonly key: string;
  readonly subset: FontSubset;
  readonly weight: FontWeight;
  /** The font as a plain TrueType file. */
  readonly sfnt: Buffer;
  readonly font: fontkit.Font;
}

function packageDir(): string {
  // the package exports only its CSS and LICENSE; the LICENSE file sits at its root
  return dirname(createRequire(import.meta.url).resolve("@fontsource/noto-sans/LICENSE"));
}

/**
 * A WOFF 1.0 file (W3C, "WOFF File Format 1.0", 2012, sec. 3-5) unpacked to the sfnt
 * (TrueType/OpenType) file it wraps: the offset table, the table directory and each
 * table inflated (zlib) where it was compressed, 4-byte aligned.
 * @throws RangeError for bytes that are not WOFF 1.0
 */
export function woffToSfnt(woff: Uint8Array): Buffer {
  const b = Buffer.from(woff.buffer, woff.byteOffset, woff.byteLength);
  if (b.length < 44 || b.toString("latin1", 0, 4) !== "wOFF") throw new RangeError("not a WOFF 1.0 file (no wOFF signature)");
  const flavor = b.readUInt32BE(4);
  const numTables = b.readUInt16BE(12);
  if (44 + 20 * numTables > b.length) throw new RangeError(`WOFF table directory of ${numTables} tables runs past the file`);
  const tables: { tag: number; checksum: number; data: Buffer }[] = [];
  for (let i = 0; i < numTables; i++) {
    const e = 44 + 20 * i;
    const offset = b.readUInt32BE(e + 4);
    const compLength = b.readUInt32BE(e + 8);
    const origLength = b.readUInt32BE(e + 12);
    if (offset + compLength > b.length) throw new RangeError(`WOFF table ${i} runs past the file`);
    const raw = b.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(raw) : Buffer.from(raw);
    if (data.length !== origLength) throw new RangeError(`WOFF table ${i} inflates to ${data.length} bytes, not ${origLength}`);
    tables.push({ tag: b.readUInt32BE(e), checksum: b.readUInt32BE(e + 16), data });
  }
  // the directory is sorted by tag in WOFF as in sfnt
  let entrySelector = 0;
  while (2 ** (entrySelector + 1) <= numTables) entrySelector++;
  const searchRange = 16 * 2 ** entrySelector;
  const header = 12 + 16 * numTables;
  let size = header;
  for (const t of tables) size += (t.data.length + 3) & ~3;
  const out = Buffer.alloc(size);
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(searchRange, 6);
  out.writeUInt16BE(entrySelector, 8);
  out.writeUInt16BE(16 * numTables - searchRange, 10);
  let at = header;
  tables.forEach((t, i) => {
    const r = 12 + 16 * i;
    out.writeUInt32BE(t.tag, r);
    out.writeUInt32BE(t.checksum, r + 4);
    out.writeUInt32BE(at, r + 8);
    out.writeUInt32BE(t.data.length, r + 12);
    t.data.copy(out, at);
    at += (t.data.length + 3) & ~3;
  });
  return out;
}

/** One subset file of the face as the package ships it (WOFF 1.0 bytes). */
export function woffFile(subset: FontSubset, weight: FontWeight): Buffer {
  return readFileSync(join(packageDir(), "files", `noto-sans-${subset}-${weight === "bold" ? 700 : 400}-normal.woff`));
}

const faces = new BoundedCache<string, FontFace>("Noto Sans subset faces", 2 * FONT_SUBSETS.length);

/** One subset file of the face, unpacked and parsed (cached). */
export function fontFace(subset: FontSubset, weight: FontWeight): FontFace {
  const w = weight === "bold" ? 700 : 400;
  const key = `NotoSans-${subset}-${w}`;
  return faces.get(key, () => {
    const sfnt = woffToSfnt(woffFile(subset, weight));
    const font = fontkit.create(sfnt);
    return {
      key,
      subset,
      weight,
      sfnt,
      font,
      holds: (cp: number) => font.hasGlyphForCodePoint(cp),
      // the font's own layout: advances, kerning and ligatures, as pdfkit places the glyphs
      wordWidthEm: (word: string) => font.layout(word).advanceWidth / font.unitsPerEm,
    };
  });
}

/** Every subset of one weight (for a rasteriser that picks glyphs itself). */
export function allFaces(weight: FontWeight): FontFace[] {
  return FONT_SUBSETS.map((s) => fontFace(s, weight));
}

/** The text functions over these files (render/typeset.ts): runs, widths, line breaks. */
const text = typesetter<FontFace>({
  subsetCount: FONT_SUBSETS.length,
  face: (index, weight) => fontFace(FONT_SUBSETS[index], weight),
  metricsEm: (weight) => {
    const f = fontFace("latin", weight).font;
    return { ascent: f.ascent / f.unitsPerEm, descent: f.descent / f.unitsPerEm };
  },
});

export type TextRun = TypesetRun<FontFace>;
export const { textRuns, printable, measureText, runsWidth, fontMetricsEm, wrapText } = text;

/**
 * The outline of `text` set at `size` with its baseline starting at (x, y) (y down),
 * as SVG path data: each glyph's own contours from the face, placed by its advance
 * and kerning, so a rasteriser draws exactly the letters the PDF holds without
 * needing the font.
 */
export function textOutline(text: string, x: number, y: number, size: number, weight: FontWeight = "normal"): string {
  let d = "";
  let pen = x;
  const f = (n: number) => String(Math.round(n * 100) / 100);
  for (const r of textRuns(text, weight)) {
    const font = r.face.font;
    const k = size / font.unitsPerEm;
    const run = font.layout(r.text);
    for (let i = 0; i < run.glyphs.length; i++) {
      const g = run.glyphs[i];
      const p = run.positions[i];
      const ox = pen + p.xOffset * k, oy = y - p.yOffset * k;
      for (const c of g.path.commands) {
        const a = c.args;
        const pt = (j: number) => `${f(ox + a[j] * k)} ${f(oy - a[j + 1] * k)}`;
        if (c.command === "moveTo") d += `M${pt(0)}`;
        else if (c.command === "lineTo") d += `L${pt(0)}`;
        else if (c.command === "quadraticCurveTo") d += `Q${pt(0)} ${pt(2)}`;
        else if (c.command === "bezierCurveTo") d += `C${pt(0)} ${pt(2)} ${pt(4)}`;
        else d += "Z";
      }
      pen += p.xAdvance * k;
    }
  }
  return d;
}
