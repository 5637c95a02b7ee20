/**
 * Quoting of user-typed text inside one-line messages: the text appears in double
 * quotes with control characters, quotes and backslashes escaped (JSON string
 * rules), so a path or value holding a newline still gives a one-line message.
 */

/** Characters written as \uXXXX: line breaks JSON leaves alone, and invisible format characters. */
const INVISIBLE = /[\u0085\u2028\u2029\u200b-\u200f\u202a-\u202e\u2060-\u2064\u2066-\u2069\ufeff]/g;

/** Longest quoted text in a message, code points; longer text is cut with "...". */
export const MAX_QUOTED_CHARS = 80;

/** `text` in double quotes, escaped to stay on one line and cut to `maxChars` code points. */
export function quote(text: string, maxChars = MAX_QUOTED_CHARS): string {
  const points = Array.from(text);
  const shown = points.length > maxChars ? points.slice(0, maxChars).join("") + "..." : text;
  // JSON.stringify escapes U+0000-U+001F, quotes, backslashes and lone surrogates;
  // NEL and the line/paragraph separators break lines in some terminals too, and
  // invisible format characters (zero-width spaces and joiners, bidirectional
  // controls, the byte-order mark U+FEFF) would hide what is wrong with a value.
  return JSON.stringify(shown).replace(INVISIBLE, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, "0")}`);
}
