/**
 * Reading right-to-left names back from a PDF. poppler's pdftotext in its default
 * and -layout modes runs its own reordering of a line holding Arabic or Hebrew (and
 * moves neutral punctuation such as an en dash into the right-to-left part), so the
 * tests read with -raw: the words in the order the content stream draws them (left
 * to right on the page), each right-to-left word read back in logical order between
 * U+202B RIGHT-TO-LEFT EMBEDDING and U+202C POP DIRECTIONAL FORMATTING (poppler
 * 22.12, TextOutputDev; Arabic presentation forms read back as the base letters).
 */
import { run } from "./poppler.js";

/** pdftotext -raw of one page (or all), NFC, without the directional formatting characters poppler wraps right-to-left words in. */
export function pdfRawText(file: string, page?: number): string {
  const args = page ? ["-f", String(page), "-l", String(page), "-raw", file, "-"] : ["-raw", file, "-"];
  return run("pdftotext", args).replace(/[\u202a-\u202e]/g, "").normalize("NFC");
}

const RTL_WORD = /^[\p{Script=Arabic}\p{Script=Hebrew}]+$/u;

/**
 * The words of `typed` in the order they appear left to right on the page, by the
 * Unicode Bidirectional Algorithm (UAX #9) for a left-to-right paragraph: a maximal
 * sequence of right-to-left words (Arabic or Hebrew letters only, spaces between) is
 * shown last word first (rules N1 and L2). Written here independently of the
 * renderer, for names without digits or punctuation.
 */
export function visualWordOrder(typed: string): string {
  const words = typed.split(" ");
  const out: string[] = [];
  for (let i = 0; i < words.length; ) {
    if (!RTL_WORD.test(words[i])) {
      out.push(words[i++]);
      continue;
    }
    let j = i;
    while (j < words.length && RTL_WORD.test(words[j])) j++;
    out.push(...words.slice(i, j).reverse());
    i = j;
  }
  return out.join(" ");
}

/**
 * A word as pdftotext -bbox reads it back: poppler lists a word's characters in the
 * order its glyphs stand on the page (left to right), so a right-to-left word drawn
 * correctly (first letter at the right) reads back reversed. This turns such a
 * word back into logical order; a left-to-right word is returned as it is.
 */
export function logicalFromGlyphOrder(word: string): string {
  return /[\p{Script=Arabic}\p{Script=Hebrew}]/u.test(word) ? Array.from(word).reverse().join("") : word;
}
