/**
 * Byte-level mutations of valid inputs for seeded fuzzing (tests/io/fuzz.test.ts,
 * tests/cli/fuzz.test.ts): a bit flipped, a byte inserted, a span deleted or
 * duplicated, or one of the bytes that CSV and JSON readers treat specially
 * inserted (quote, UTF-8 BOM EF BB BF, NUL, 0xFF which never appears in UTF-8,
 * CR, LF, comma, backslash).
 */
const SPECIALS = [[0x22], [0xef, 0xbb, 0xbf], [0x00], [0xff], [0x0d], [0x0a], [0x2c], [0x5c]];

/** One random edit of `b`: flip a bit, insert a byte, delete or duplicate a span, or insert a quote, BOM, NUL, 0xFF, CR, LF, comma or backslash. */
export function mutate(b: Uint8Array, rnd: () => number): Uint8Array {
  const at = Math.floor(rnd() * (b.length + 1));
  const span = 1 + Math.floor(rnd() * 16);
  const bytes = Array.from(b);
  switch (Math.floor(rnd() * 5)) {
    case 0:
      if (at < bytes.length) bytes[at] ^= 1 << Math.floor(rnd() * 8);
      break;
    case 1:
      bytes.splice(at, 0, Math.floor(rnd() * 256));
      break;
    case 2:
      bytes.splice(at, span);
      break;
    case 3:
      bytes.splice(at, 0, ...bytes.slice(at, at + span));
      break;
    default:
      bytes.splice(at, 0, ...SPECIALS[Math.floor(rnd() * SPECIALS.length)]);
  }
  return Uint8Array.from(bytes);
}

/** 1 to 4 mutations in a row. */
export function mutant(b: Uint8Array, rnd: () => number): Uint8Array {
  let m = b;
  const k = 1 + Math.floor(rnd() * 4);
  for (let i = 0; i < k; i++) m = mutate(m, rnd);
  return m;
}

