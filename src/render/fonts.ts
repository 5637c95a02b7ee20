/**
 * The typeface of every printed and rasterised output: Noto Sans (SIL Open Font
 * Licence 1.1), regular and bold, from the @fontsource/noto-sans package, with
 * fallback faces of the same design for the scripts it lacks.
 *
 * That package splits the face by script into subset files (latin, latin-ext,
 * cyrillic, cyrillic-ext, greek, greek-ext, vietnamese). Each is a WOFF 1.0 file,
 * unpacked here to a plain TrueType font (`woffToSfnt`), so pdfkit can embed it
 * (subsetting it to the glyphs used) and resvg can draw with it. Text is set by
 * render/typeset.ts over these files: runs in the first subset that holds each
 * character, measured with the font's own advances and kerning (fontkit's layout),
 * the same way pdfkit places it, so lines wrapped here fit where they are drawn.
 *
 * A character none of those subsets holds is looked up, in this order, in
 * - Noto Sans Arabic (@fontsource/noto-sans-arabic, its "arabic" subset file),
 * - Noto Sans Hebrew (@fontsource/noto-sans-hebrew, its "hebrew" subset file),
 * - Noto Sans SC (@fontsource/noto-sans-sc: Chinese ideographs, Japanese kana), an
 *   optional package (73 MB, a development dependency, not installed for users by
 *   default): read only if it resolves, the file for each character chosen by the
 *   unicode-range declarations of the package's own 400.css / 700.css. Its files
 *   hold 80 of the 11,172 Hangul syllables, so Hangul is not set in it;
 * - Noto Sans KR (@fontsource/noto-sans-kr) for Hangul, optional in the same way
 *   (54 MB), its files chosen by its own CSS the same way: they hold every syllable.
 * A character none holds (emoji, other scripts) prints as U+FFFD. When Noto Sans SC
 * or KR is not installed and a character needs it, one line on standard error (once
 * per process) names the package to install.
 */
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { inflateSync } from "node:zlib";
import * as fontkit from "fontkit";
import { BoundedCache } from "../../geometry/cache.js";
import { visualOrder } from "./bidi.js";
import { addNotice } from "./notices.js";
import { typesetter, type FontWeight, type TextRun as TypesetRun, type TypesetFace } from "./typeset.js";

export { MISSING_GLYPH, type FontWeight } from "./typeset.js";
export const FONT_FAMILY = "Noto Sans";
/** The SVG font-family list written into drawings: ours first (the fallback faces next, for a viewer that has them), then what a viewer has. */
export const SVG_FONT_FAMILY = "Noto Sans, Noto Sans Arabic, Noto Sans Hebrew, Noto Sans SC, Noto Sans KR, DejaVu Sans, Verdana, sans-serif";

/** The subsets, in the order a character is looked up. */
export const FONT_SUBSETS = ["latin", "latin-ext", "cyrillic", "cyrillic-ext", "greek", "greek-ext", "vietnamese"] as const;
export type FontSubset = (typeof FONT_SUBSETS)[number];

/** The fallback faces' files: Arabic, Hebrew, or a Noto Sans SC or KR file ("sc-115", "kr-116"). */
export type FallbackSubset = "arabic" | "hebrew" | `sc-${string}` | `kr-${string}`;

export interface FontFace extends TypesetFace {
  /** A name unique to this file, as registered in a PDF (e.g. "NotoSans-cyrillic-700", "NotoSansArabic-arabic-400"). */
  readonly key: string;
  readonly subset: FontSubset | FallbackSubset;
  readonly weight: FontWeight;
  /** The font as a plain TrueType file. */
  readonly sfnt: Buffer;
  readonly font: fontkit.Font;
}

function packageDir(pkg = "@fontsource/noto-sans"): string {
  // the packages export only their CSS, files and LICENSE; the LICENSE file sits at the root
  return dirname(createRequire(import.meta.url).resolve(`${pkg}/LICENSE`));
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
  return faces.get(key, () => parsedFace(key, subset, weight, woffFile(subset, weight)));
}

/** Every subset of one weight (for a rasteriser that picks glyphs itself). */
export function allFaces(weight: FontWeight): FontFace[] {
  return FONT_SUBSETS.map((s) => fontFace(s, weight));
}

/** The fallback packages, pinned in package.json (Noto Sans SC and KR as development dependencies: optional to users). */
export const FALLBACK_PACKAGES = {
  arabic: "@fontsource/noto-sans-arabic",
  hebrew: "@fontsource/noto-sans-hebrew",
  cjk: "@fontsource/noto-sans-sc",
  korean: "@fontsource/noto-sans-kr",
} as const;
/** The version of Noto Sans SC and KR the notices ask for (the one package.json pins). */
const CJK_VERSION = "5.3.0";

/** The optional packages split into many files by unicode-range: Noto Sans SC (Chinese, Japanese) and Noto Sans KR (Hangul). */
export type CjkPackage = "cjk" | "korean";

const CJK_FILES: Record<CjkPackage, { family: string; stem: string; tag: "sc" | "kr"; readers: string }> = {
  cjk: { family: "NotoSansSC", stem: "noto-sans-sc", tag: "sc", readers: "Chinese and Japanese characters" },
  korean: { family: "NotoSansKR", stem: "noto-sans-kr", tag: "kr", readers: "Korean (Hangul) characters" },
};

const fallbackFaces = new BoundedCache<string, FontFace>("fallback faces", 256);

/** A WOFF file unpacked and parsed into a face; `covers` narrows the characters it is used for. */
function parsedFace(key: string, subset: FontSubset | FallbackSubset, weight: FontWeight, woff: Buffer, covers: (cp: number) => boolean = () => true): FontFace {
  const sfnt = woffToSfnt(woff);
  const font = fontkit.create(sfnt);
  return {
    key,
    subset,
    weight,
    sfnt,
    font,
    holds: (cp: number) => covers(cp) && font.hasGlyphForCodePoint(cp),
    // the font's own layout: advances, kerning and ligatures, as pdfkit places the glyphs
    wordWidthEm: (word: string) => font.layout(word).advanceWidth / font.unitsPerEm,
  };
}

/** The Arabic or Hebrew fallback face (a dependency: always installed). */
export function scriptFace(script: "arabic" | "hebrew", weight: FontWeight): FontFace {
  const w = weight === "bold" ? 700 : 400;
  const family = script === "arabic" ? "NotoSansArabic" : "NotoSansHebrew";
  return fallbackFaces.get(`${family}-${script}-${w}`, () => {
    const file = join(packageDir(FALLBACK_PACKAGES[script]), "files", `noto-sans-${script}-${script}-${w}-normal.woff`);
    return parsedFace(`${family}-${script}-${w}`, script, weight, readFileSync(file));
  });
}

/** One unicode-range of a Noto Sans SC or KR file: [first, last] code points and the file's name. */
interface CjkRange {
  readonly first: number;
  readonly last: number;
  readonly file: string;
}

const cjkRanges = new Map<string, CjkRange[] | null>();

/**
 * The unicode-range declarations of one optional package's CSS (Noto Sans SC by
 * default, or KR) for one weight (400.css or 700.css), sorted by first code point, or
 * null when the package is not installed.
 * @throws RangeError when the CSS declares no file with a range (a changed package layout)
 */
export function cjkUnicodeRanges(weight: FontWeight, pkg: CjkPackage = "cjk"): readonly CjkRange[] | null {
  const key = `${pkg}-${weight}`;
  let ranges = cjkRanges.get(key);
  if (ranges !== undefined) return ranges;
  let dir: string | null;
  try {
    dir = packageDir(FALLBACK_PACKAGES[pkg]);
  } catch {
    dir = null;
  }
  ranges = dir === null ? null : parseUnicodeRanges(readFileSync(join(dir, `${weight === "bold" ? 700 : 400}.css`), "utf8"));
  cjkRanges.set(key, ranges);
  return ranges;
}

/**
 * The @font-face rules of a CSS file as [first, last, file] ranges (CSS Fonts Level 4,
 * sec. 4.5 "unicode-range": U+hex, U+hex-hex; wildcards "?" as 0 and F), the file
 * being the rule's WOFF 1.0 source, sorted by first code point.
 * @throws RangeError when no rule has both a .woff source and a unicode-range
 */
export function parseUnicodeRanges(css: string): CjkRange[] {
  const out: CjkRange[] = [];
  for (const rule of css.split("@font-face").slice(1)) {
    const file = /url\(\.\/files\/([^)]+?\.woff)\)/.exec(rule)?.[1];
    const list = /unicode-range:\s*([^;}]+)/.exec(rule)?.[1];
    if (!file || !list) continue;
    for (const part of list.split(",")) {
      const m = /^\s*U\+([0-9a-f?]+)(?:-([0-9a-f]+))?\s*$/i.exec(part);
      if (!m) throw new RangeError(`unicode-range "${part.trim()}" is not U+hex or U+hex-hex`);
      const first = parseInt(m[1].replace(/\?/g, "0"), 16);
      const last = parseInt(m[2] ?? m[1].replace(/\?/g, "f"), 16);
      out.push({ first, last, file });
    }
  }
  if (!out.length) throw new RangeError("the CSS has no @font-face rule with a .woff source and a unicode-range");
  return out.sort((a, b) => a.first - b.first);
}

function cjkFileFor(ranges: readonly CjkRange[], cp: number): string | null {
  let lo = 0;
  let hi = ranges.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (cp < ranges[mid].first) hi = mid - 1;
    else if (cp > ranges[mid].last) lo = mid + 1;
    else return ranges[mid].file;
  }
  return null;
}

// Korean: the SC files hold too few syllables to set a name (see the header); the KR files hold them all
const HANGUL = /\p{Script=Hangul}/u;
// what only a CJK face would print: the notice is for these
const HAN_KANA = /[\p{Script=Han}\p{Script=Hiragana}\p{Script=Katakana}\p{Script=Bopomofo}]/u;

/**
 * The file that holds `cp` by its package's CSS, parsed (cached): Noto Sans KR for
 * Hangul, Noto Sans SC for every other character; null when none or not installed.
 */
export function cjkFace(cp: number, weight: FontWeight): FontFace | null {
  const ch = String.fromCodePoint(cp);
  const hangul = HANGUL.test(ch);
  const pkg: CjkPackage = hangul ? "korean" : "cjk";
  const ranges = cjkUnicodeRanges(weight, pkg);
  const { family, stem, tag, readers } = CJK_FILES[pkg];
  if (ranges === null) {
    if (hangul || HAN_KANA.test(ch)) addNotice(`${readers} print as \ufffd; to print them, install the font package: npm install ${FALLBACK_PACKAGES[pkg]}@${CJK_VERSION}`);
    return null;
  }
  const file = cjkFileFor(ranges, cp);
  if (!file) return null;
  const name = new RegExp(`^${stem}-(.+)-[0-9]00-normal\\.woff$`).exec(file)?.[1] ?? file;
  const key = `${family}-${name}-${weight === "bold" ? 700 : 400}`;
  // a file is asked only for its own package's characters: SC never sets Hangul, KR only Hangul
  const covers = hangul ? (c: number) => HANGUL.test(String.fromCodePoint(c)) : (c: number) => !HANGUL.test(String.fromCodePoint(c));
  return fallbackFaces.get(key, () => parsedFace(key, `${tag}-${name}`, weight, readFileSync(join(packageDir(FALLBACK_PACKAGES[pkg]), "files", file)), covers));
}

/** The first fallback face that holds every code point of one character, or null. */
function fallbackFace(cps: readonly number[], weight: FontWeight): FontFace | null {
  for (const script of ["arabic", "hebrew"] as const) {
    const f = scriptFace(script, weight);
    if (cps.every((cp) => f.holds(cp))) return f;
  }
  const f = cjkFace(cps[0], weight);
  return f && cps.every((cp) => f.holds(cp)) ? f : null;
}

/** The text functions over these files (render/typeset.ts): runs, widths, line breaks. */
const text = typesetter<FontFace>({
  fallback: fallbackFace,
  subsetCount: FONT_SUBSETS.length,
  face: (index, weight) => fontFace(FONT_SUBSETS[index], weight),
  metricsEm: (weight) => {
    const f = fontFace("latin", weight).font;
    return { ascent: f.ascent / f.unitsPerEm, descent: f.descent / f.unitsPerEm };
  },
});

export type TextRun = TypesetRun<FontFace>;
export const { textRuns, printable, measureText, runsWidth, fontMetricsEm, wrapText } = text;

/** `text` as runs in the order they are drawn from left to right (render/bidi.ts: UAX #9 for a left-to-right line). */
export function visualRuns(text: string, weight: FontWeight = "normal"): TextRun[] {
  return visualOrder(textRuns(text, weight));
}

/**
 * The outline of `text` set at `size` with its baseline starting at (x, y) (y down),
 * as SVG path data: each glyph's own contours from the face, placed by its advance
 * and kerning, runs in visual order (right-to-left words reversed and shaped), so a rasteriser draws exactly the letters the PDF holds without
 * needing the font.
 */
export function textOutline(text: string, x: number, y: number, size: number, weight: FontWeight = "normal"): string {
  let d = "";
  let pen = x;
  const f = (n: number) => String(Math.round(n * 100) / 100);
  for (const r of visualRuns(text, weight)) {
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
