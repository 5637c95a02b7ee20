/**
 * The one typeface of every printed and rasterised output: Noto Sans (SIL Open
 * Font Licence 1.1), regular and bold, from the @fontsource/noto-sans package.
 *
 * That package splits the face by script into subset files (latin, latin-ext,
 * cyrillic, cyrillic-ext, greek, greek-ext, vietnamese). Each is a WOFF 1.0 file,
 * unpacked here to a plain TrueType font (`woffToSfnt`), so pdfkit can embed it
 * (subsetting it to the glyphs used) and resvg can draw with it. A string is
 * written as runs, each in the first subset that holds every code point of its
 * characters (`textRuns`); a character no subset holds (Arabic, the CJK scripts,
 * emoji, ...) prints as U+FFFD, the Unicode replacement character, one per
 * user-perceived character (grapheme), so it shows as a visible mark and never as
 * stray glyphs that run into the next word. Control characters are dropped.
 *
 * Text is measured with the font's own advances and kerning (fontkit's layout),
 * the same way pdfkit places it, so lines wrapped here fit where they are drawn.
 */
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { inflateSync } from "node:zlib";
import * as fontkit from "fontkit";
import { BoundedCache } from "../../geometry/cache.js";

export const FONT_FAMILY = "Noto Sans";
/** The SVG font-family list written into drawings: ours first, then what a viewer has. */
export const SVG_FONT_FAMILY = "Noto Sans, DejaVu Sans, Verdana, sans-serif";
export type FontWeight = "normal" | "bold";

/** The subsets, in the order a character is looked up. */
export const FONT_SUBSETS = ["latin", "latin-ext", "cyrillic", "cyrillic-ext", "greek", "greek-ext", "vietnamese"] as const;
export type FontSubset = (typeof FONT_SUBSETS)[number];

/** What a character no subset holds prints as (U+FFFD REPLACEMENT CHARACTER, in the latin subset). */
export const MISSING_GLYPH = "\ufffd";

export interface FontFace {
  /** A name unique to this file, as registered in a PDF (e.g. "NotoSans-cyrillic-700"). */
  readonly key: string;
  readonly subset: FontSubset;
  readonly weight: FontWeight;
  /** The font as a plain TrueType file. */
  readonly sfnt: Buffer;
  readonly font: fontkit.Font;
}

/** A piece of text in one face. */
export interface TextRun {
  readonly face: FontFace;
  readonly text: string;
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

const faces = new BoundedCache<string, FontFace>("Noto Sans subset faces", 2 * FONT_SUBSETS.length);

/** One subset file of the face, unpacked and parsed (cached). */
export function fontFace(subset: FontSubset, weight: FontWeight): FontFace {
  const w = weight === "bold" ? 700 : 400;
  const key = `NotoSans-${subset}-${w}`;
  return faces.get(key, () => {
    const sfnt = woffToSfnt(readFileSync(join(packageDir(), "files", `noto-sans-${subset}-${w}-normal.woff`)));
    return { key, subset, weight, sfnt, font: fontkit.create(sfnt) };
  });
}

/** Every subset of one weight (for a rasteriser that picks glyphs itself). */
export function allFaces(weight: FontWeight): FontFace[] {
  return FONT_SUBSETS.map((s) => fontFace(s, weight));
}

const graphemes = new Intl.Segmenter("en", { granularity: "grapheme" });
// C0 and C1 controls other than tab and line feed, invisible format characters (bidi
// marks and embeddings, zero-width spaces, the byte-order mark; not the joiner, which
// marks emoji sequences) and the non-characters
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u200b\u200c\u200e\u200f\u202a-\u202e\u2060-\u2069\ufeff\ufffe\uffff]/g;

/** The first face that holds every code point of `g` (variation selectors and joiners aside), or null. */
function faceFor(g: string, weight: FontWeight): FontFace | null {
  const cps: number[] = [];
  for (const ch of g) {
    const cp = ch.codePointAt(0)!;
    if (cp === 0xfe0e || cp === 0xfe0f || cp === 0x200d) {
      // a joiner or a text/emoji presentation selector alone asks for no glyph, but with other characters it marks an emoji sequence
      if (cp === 0x200d || cp === 0xfe0f) return null;
      continue;
    }
    cps.push(cp);
  }
  for (const s of FONT_SUBSETS) {
    const f = fontFace(s, weight);
    if (cps.every((cp) => f.font.hasGlyphForCodePoint(cp))) return f;
  }
  return null;
}

/**
 * `text` as runs of one face each: normalised to NFC, control characters dropped,
 * every grapheme no subset holds replaced by MISSING_GLYPH. Spaces and line feeds
 * stay in the run they fall in.
 */
export function textRuns(text: string, weight: FontWeight = "normal"): TextRun[] {
  const latin = fontFace("latin", weight);
  // most text is plain ASCII, which the latin subset holds whole: one run, no segmenting
  if (/^[\x20-\x7e]*$/.test(text)) return text ? [{ face: latin, text }] : [];
  const runs: { face: FontFace; text: string }[] = [];
  for (const { segment } of graphemes.segment(text.normalize("NFC").replace(CONTROL, ""))) {
    let face: FontFace;
    let piece = segment;
    if (segment === " " || segment === "\n" || segment === "\t") face = runs.length ? runs[runs.length - 1].face : latin;
    else {
      const f = faceFor(segment, weight);
      if (f) face = f;
      else {
        face = latin;
        piece = MISSING_GLYPH;
      }
    }
    const last = runs[runs.length - 1];
    if (last && last.face === face) last.text += piece;
    else runs.push({ face, text: piece });
  }
  return runs;
}

/** `text` as it prints: NFC, no control characters, every grapheme the face lacks as MISSING_GLYPH. */
export function printable(text: string): string {
  return textRuns(text).map((r) => r.text).join("");
}

const widthCache = new BoundedCache<string, number>("text widths in em", 4096);

/**
 * Advance width of one run's text in em: the font's advances and kerning within each
 * word (as pdfkit lays it out), words measured once and cached, spaces added between.
 */
function runWidthEm(face: FontFace, text: string): number {
  const word = (w: string) => widthCache.get(`${face.key}\u0000${w}`, () => face.font.layout(w).advanceWidth / face.font.unitsPerEm);
  if (!text.includes(" ")) return word(text);
  let em = 0;
  let spaces = 0;
  for (const w of text.split(" ")) {
    if (w) em += word(w);
    spaces++;
  }
  return em + (spaces - 1) * word(" ");
}

/** Width of `text` at `size` (any unit: the result is in the same unit). */
export function measureText(text: string, size: number, weight: FontWeight = "normal"): number {
  let em = 0;
  for (const r of textRuns(text, weight)) em += runWidthEm(r.face, r.text);
  return em * size;
}

/** Width in em of already split runs. */
export function runsWidth(runs: readonly TextRun[], size: number): number {
  let em = 0;
  for (const r of runs) em += runWidthEm(r.face, r.text);
  return em * size;
}

/** The face's ascent and descent, em (descent negative). */
export function fontMetricsEm(weight: FontWeight = "normal"): { ascent: number; descent: number } {
  const f = fontFace("latin", weight).font;
  return { ascent: f.ascent / f.unitsPerEm, descent: f.descent / f.unitsPerEm };
}

/**
 * Lines of `text` no wider than `maxWidth` at `size` (same unit): paragraphs at line
 * feeds, breaks at spaces, a word longer than a line broken between graphemes.
 */
export function wrapText(text: string, maxWidth: number, size: number, weight: FontWeight = "normal"): string[] {
  const out: string[] = [];
  const space = measureText(" ", size, weight);
  for (const para of text.split("\n")) {
    let line = "";
    let lineW = 0;
    for (const word of para.split(/ +/)) {
      if (word === "") continue;
      let w = measureText(word, size, weight);
      let rest = word;
      // a word wider than the line: break it between graphemes
      while (w > maxWidth && rest.length > 1) {
        if (line) {
          out.push(line);
          line = "";
          lineW = 0;
        }
        let head = "";
        for (const { segment } of graphemes.segment(rest)) {
          if (head && measureText(head + segment, size, weight) > maxWidth) break;
          head += segment;
        }
        out.push(head);
        rest = rest.slice(head.length);
        w = measureText(rest, size, weight);
      }
      if (!rest) continue;
      if (line && lineW + space + w > maxWidth) {
        out.push(line);
        line = rest;
        lineW = w;
      } else {
        lineW += (line ? space : 0) + w;
        line = line ? `${line} ${rest}` : rest;
      }
    }
    out.push(line);
  }
  return out;
}

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
