/**
 * File-name stems for pitcher and pitch labels in any script: readable, unique
 * (also on case-insensitive file systems) and safe as one path component.
 *
 * Rule: normalise to NFC; keep letters, digits and combining marks of every
 * script (Unicode properties L, N, M; marks are kept because Devanagari, Thai
 * and others need them, and only after a kept letter or digit); every other run
 * of characters becomes one "-"; "-" is trimmed at both ends; an empty result
 * becomes "pitch"; a Windows device name (CON, NUL, COM1 ...) gets "-pitch"
 * appended. Length is capped at MAX_SLUG_CHARS code points and MAX_SLUG_BYTES
 * UTF-8 bytes (room for an extension within the usual 255-byte name limit).
 * Duplicates, compared case-insensitively, get "-2", "-3" ... in input order,
 * never colliding with a stem that another label produced plainly.
 */

/** Longest stem, code points (a "-N" suffix included). */
export const MAX_SLUG_CHARS = 80;
/** Longest stem, UTF-8 bytes (a "-N" suffix included). */
export const MAX_SLUG_BYTES = 200;

const FALLBACK = "pitch";
const RESERVED = /^(con|prn|aux|nul|com[0-9]|lpt[0-9])$/i;

/** One stem per label, in order; see the module header for the rule. */
export function uniqueSlugs(labels: readonly string[]): string[] {
  const bases = labels.map(baseSlug);
  const taken = new Set<string>();
  const out: (string | undefined)[] = bases.map((b) => {
    const k = keyOf(b);
    if (taken.has(k)) return undefined;
    taken.add(k);
    return b;
  });
  // reserve every plain stem first, so "J Smith 2" keeps "J-Smith-2" whatever its place
  for (const b of bases) taken.add(keyOf(b));
  return out.map((s, i) => {
    if (s !== undefined) return s;
    for (let n = 2; ; n++) {
      const candidate = capped(bases[i], `-${n}`);
      const k = keyOf(candidate);
      if (!taken.has(k)) {
        taken.add(k);
        return candidate;
      }
    }
  });
}

/** The stem for one label before de-duplication. */
export function baseSlug(label: string): string {
  const parts: string[] = [];
  let run = "";
  for (const ch of label.normalize("NFC")) {
    if (/[\p{L}\p{N}]/u.test(ch) || (run !== "" && /\p{M}/u.test(ch))) run += ch;
    else if (run !== "") {
      parts.push(run);
      run = "";
    }
  }
  if (run !== "") parts.push(run);
  let stem = parts.join("-");
  if (stem === "") stem = FALLBACK;
  if (RESERVED.test(stem)) stem += `-${FALLBACK}`;
  return capped(stem, "");
}

function keyOf(stem: string): string {
  return stem.normalize("NFC").toLowerCase();
}

/** `stem` cut so that `stem + suffix` fits both caps; never ends in "-" or a lone mark. */
function capped(stem: string, suffix: string): string {
  const suffixBytes = Buffer.byteLength(suffix);
  const suffixChars = Array.from(suffix).length;
  let chars = 0;
  let bytes = 0;
  let out = "";
  for (const ch of stem) {
    const b = Buffer.byteLength(ch);
    if (chars + 1 + suffixChars > MAX_SLUG_CHARS || bytes + b + suffixBytes > MAX_SLUG_BYTES) break;
    out += ch;
    chars++;
    bytes += b;
  }
  out = out.replace(/-+$/, "");
  return (out === "" ? FALLBACK : out) + suffix;
}
