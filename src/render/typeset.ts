/**
 * Setting text in one face split into subset files, whatever reads the files: which
 * subset sets each character, how wide a string is, where lines break. The face
 * set is handed in (render/fonts.ts reads the files with fontkit in Node; the
 * workbench page measures the same files in the browser), so printed cards break
 * their lines by one rule everywhere.
 *
 * A string is written as runs, each in the first subset that holds every code point
 * of its characters (`textRuns`); a character no subset holds prints as U+FFFD, the
 * Unicode replacement character, one per user-perceived character (grapheme), so it
 * shows as a visible mark and never as stray glyphs that run into the next word.
 * Control characters are dropped. A word's width is the face's own layout of it
 * (advances, kerning and ligatures), measured once and cached. After the face's own
 * subsets, a face set may name fallback faces (other scripts' faces), asked for a
 * character none of the subsets holds.
 *
 * The order runs are drawn in (right-to-left words and numbers) is render/bidi.ts's.
 */
import { BoundedCache } from "../../geometry/cache.js";

export type FontWeight = "normal" | "bold";

/** What a character no subset holds prints as (U+FFFD REPLACEMENT CHARACTER, in the first subset). */
export const MISSING_GLYPH = "\ufffd";

/** One subset file of one weight. */
export interface TypesetFace {
  /** A name unique to this file (e.g. "NotoSans-cyrillic-700"). */
  readonly key: string;
  /** Whether the file has a glyph for code point `cp`. */
  holds(cp: number): boolean;
  /** The face's own layout width of `word` (no spaces), em. */
  wordWidthEm(word: string): number;
}

/** The subsets of one face, in the order a character is looked up. */
export interface FaceSet<F extends TypesetFace> {
  readonly subsetCount: number;
  /** Subset `index` of `weight` (read when first asked for). */
  face(index: number, weight: FontWeight): F;
  /** Ascent and descent of the first subset, em (descent negative). */
  metricsEm(weight: FontWeight): { ascent: number; descent: number };
  /** A face of another family for the code points of one character no subset holds all of (asked in lookup order), or null. */
  fallback?(codePoints: readonly number[], weight: FontWeight): F | null;
}

/** A piece of text in one face. */
export interface TextRun<F extends TypesetFace> {
  readonly face: F;
  readonly text: string;
}

const graphemes = new Intl.Segmenter("en", { granularity: "grapheme" });
// C0 and C1 controls other than tab and line feed, invisible format characters (bidi
// marks and embeddings, zero-width spaces, the byte-order mark; not the joiner, which
// marks emoji sequences) and the non-characters
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u200b\u200c\u200e\u200f\u202a-\u202e\u2060-\u2069\ufeff\ufffe\uffff]/g;

/** The text functions for one face set. */
export function typesetter<F extends TypesetFace>(set: FaceSet<F>) {
  const widths = new BoundedCache<string, number>("text widths in em", 4096);

  /** The first face that holds every code point of `g` (variation selectors and joiners aside), or null. */
  function faceFor(g: string, weight: FontWeight): F | null {
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
    for (let s = 0; s < set.subsetCount; s++) {
      const f = set.face(s, weight);
      if (cps.every((cp) => f.holds(cp))) return f;
    }
    return cps.length && set.fallback ? set.fallback(cps, weight) : null;
  }

  /**
   * `text` as runs of one face each: normalised to NFC, control characters dropped,
   * every grapheme no subset holds replaced by MISSING_GLYPH. Spaces and line feeds
   * stay in the run they fall in.
   */
  function textRuns(text: string, weight: FontWeight = "normal"): TextRun<F>[] {
    const first = set.face(0, weight);
    // most text is plain ASCII, which the first subset holds whole: one run, no segmenting
    if (/^[\x20-\x7e]*$/.test(text)) return text ? [{ face: first, text }] : [];
    // Latin-1 letters and general punctuation (no combining marks, controls or right-to-left
    // letters: every character its own grapheme, already NFC) that the first subset holds
    // whole: the same single run the segmenting below would give
    if (/^[\x20-\x7e\u00a0-\u00ff\u2010-\u2027\u2030-\u205e]*$/.test(text)) {
      let held = true;
      for (let i = 0; i < text.length && held; i++) {
        const cp = text.charCodeAt(i);
        if (cp > 0x7e) held = first.holds(cp);
      }
      if (held) return text ? [{ face: first, text }] : [];
    }
    const runs: { face: F; text: string }[] = [];
    for (const { segment } of graphemes.segment(text.normalize("NFC").replace(CONTROL, ""))) {
      let face: F;
      let piece = segment;
      if (segment === " " || segment === "\n" || segment === "\t") face = runs.length ? runs[runs.length - 1].face : first;
      else {
        const f = faceFor(segment, weight);
        if (f) face = f;
        else {
          face = first;
          piece = MISSING_GLYPH;
        }
      }
      const last = runs[runs.length - 1];
      if (last && last.face === face) last.text += piece;
      else runs.push({ face, text: piece });
    }
    return runs;
  }

  /** Width of one run's text in em: each word laid out by the face, spaces added between. */
  function runWidthEm(face: F, text: string): number {
    const word = (w: string) => widths.get(`${face.key}\u0000${w}`, () => face.wordWidthEm(w));
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
  function measureText(text: string, size: number, weight: FontWeight = "normal"): number {
    let em = 0;
    for (const r of textRuns(text, weight)) em += runWidthEm(r.face, r.text);
    return em * size;
  }

  /**
   * Lines of `text` no wider than `maxWidth` at `size` (same unit): paragraphs at line
   * feeds, breaks at spaces, a word longer than a line broken between graphemes.
   */
  function wrapText(text: string, maxWidth: number, size: number, weight: FontWeight = "normal"): string[] {
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

  return {
    textRuns,
    measureText,
    wrapText,
    /** `text` as it prints: NFC, no control characters, every grapheme the face lacks as MISSING_GLYPH. */
    printable: (text: string): string => textRuns(text).map((r) => r.text).join(""),
    /** Width of already split runs at `size`. */
    runsWidth: (runs: readonly TextRun<F>[], size: number): number => runs.reduce((em, r) => em + runWidthEm(r.face, r.text), 0) * size,
    /** The face's ascent and descent, em (descent negative). */
    fontMetricsEm: (weight: FontWeight = "normal") => set.metricsEm(weight),
  };
}
