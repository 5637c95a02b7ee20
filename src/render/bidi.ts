/**
 * The order a line's runs are drawn in, left to right: the Unicode Bidirectional
 * Algorithm (UAX #9) by the bidi-js package. Every line is one left-to-right
 * paragraph (higher-level protocol HL1: cards, sheets and pages are laid out left to
 * right), so a name in Arabic or Hebrew inside an English line reads right to left,
 * and the numbers inside it left to right.
 *
 * bidi-js resolves each character's level (rules P2-P3 overridden to level 0, X1-X10,
 * W1-W7, N0-N2, I1-I2); here the line is cut into units of one face and one level
 * and the units are reordered by rule L2 (from the highest level down to 1, every
 * maximal sequence of units at that level or higher reversed). A unit at an odd level
 * is one right-to-left word (Arabic or Hebrew letters of one face, passed in logical
 * order: the face's layout, fontkit, shapes and reverses it) or one other character,
 * mirrored as rule L4 asks (a bracket at an odd level is drawn as its mirror image,
 * Bidi_Mirroring_Glyph). A unit at an even level is laid out left to right as it is;
 * Arabic-script digits (bidi class AN, level 2) go one per unit, since fontkit would
 * lay a run of them out right to left by their script.
 *
 * Levels are per UTF-16 unit in bidi-js; a character outside the Basic Multilingual
 * Plane counts as a left-to-right letter there. The text reaching here is already
 * printable (render/typeset.ts): what no face holds is U+FFFD, so such characters are
 * the CJK ideographs of the supplementary planes, which are left-to-right letters anyway.
 */
import bidiPackage, { type Bidi } from "bidi-js";
import type { TextRun, TypesetFace } from "./typeset.js";

// the package is CommonJS whose module.exports is the factory; its declarations call that the default export
const bidi = (bidiPackage as unknown as () => Bidi)();
const graphemes = new Intl.Segmenter("en", { granularity: "grapheme" });
// a right-to-left script's letter or mark (not its digits): the units fontkit shapes and reverses
const RTL_SCRIPT_LETTER = /^(?!\p{N})[\p{Script=Hebrew}\p{Script=Arabic}]/u;
const RTL_SCRIPT = /[\p{Script=Hebrew}\p{Script=Arabic}]/u;

interface Unit<F extends TypesetFace> {
  face: F;
  text: string;
  level: number;
  /** One unit that other graphemes may join: a right-to-left word at an odd level, a left-to-right stretch at an even one. */
  open: boolean;
}

/** UAX #9 rule L2 on `items` (each with a level): from the highest level down to 1, every maximal sequence at that level or higher reversed. */
export function reorderByLevels<T extends { readonly level: number }>(items: readonly T[]): T[] {
  const out = [...items];
  let highest = 0;
  for (const u of out) highest = Math.max(highest, u.level);
  for (let level = highest; level >= 1; level--) {
    for (let i = 0; i < out.length; ) {
      if (out[i].level < level) {
        i++;
        continue;
      }
      let j = i;
      while (j < out.length && out[j].level >= level) j++;
      for (let a = i, b = j - 1; a < b; a++, b--) [out[a], out[b]] = [out[b], out[a]];
      i = j;
    }
  }
  return out;
}

/**
 * `runs` (one line's runs in logical order, as typeset.ts `textRuns` gives them) in
 * the order they are drawn from left to right; the runs themselves when the line has
 * no right-to-left character. Their widths add up to the logical runs' total but for
 * kerning between a mirrored bracket and its neighbours.
 */
export function visualOrder<F extends TypesetFace>(runs: readonly TextRun<F>[]): TextRun<F>[] {
  const text = runs.map((r) => r.text).join("");
  const { levels } = bidi.getEmbeddingLevels(text, "ltr");
  if (levels.every((l: number) => l === 0)) return [...runs];
  const units: Unit<F>[] = [];
  let at = 0;
  for (const r of runs) {
    for (const { segment } of graphemes.segment(r.text)) {
      const level = levels[at];
      at += segment.length;
      const odd = level % 2 === 1;
      // at an odd level a right-to-left word is one unit; at an even one, a stretch without right-to-left script
      const open = odd ? RTL_SCRIPT_LETTER.test(segment) : !RTL_SCRIPT.test(segment);
      const last = units[units.length - 1];
      if (open && last?.open && last.face === r.face && last.level === level) {
        last.text += segment;
        continue;
      }
      const mirror = odd && segment.length === 1 ? bidi.getMirroredCharacter(segment) : null;
      units.push({ face: r.face, text: mirror ?? segment, level, open });
    }
  }
  const out: TextRun<F>[] = [];
  let prev: Unit<F> | undefined;
  for (const u of reorderByLevels(units)) {
    // neighbours drawn left to right in one face join again (a level-2 number beside a level-0 word, say)
    if (prev && u.open && prev.open && u.level % 2 === 0 && prev.level % 2 === 0 && u.face === prev.face) {
      out[out.length - 1] = { face: u.face, text: out[out.length - 1].text + u.text };
    } else out.push({ face: u.face, text: u.text });
    prev = u;
  }
  return out;
}
