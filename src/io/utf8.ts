/**
 * Strict UTF-8 decoding with the place of the first bad byte. The decoder is the
 * platform's WHATWG TextDecoder in fatal mode (well-formed sequences as in The
 * Unicode Standard, Table 3-7); the offset of the first ill-formed sequence is
 * found by bisecting on prefixes decoded in streaming mode, where an incomplete
 * sequence at the end is not an error but an ill-formed one is.
 */

/** The UTF-8 byte-order mark, EF BB BF. */
export const UTF8_BOM = Uint8Array.of(0xef, 0xbb, 0xbf);

/** Whether `bytes` starts with the UTF-8 byte-order mark. */
export function startsWithBom(bytes: Uint8Array): boolean {
  return bytes.length >= 3 && bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf;
}

/**
 * The UTF-16 byte-order mark `bytes` starts with, if any: FF FE (little-endian) or
 * FE FF (big-endian) (The Unicode Standard, sec. 23.8). Neither can begin UTF-8
 * text, and a file that starts so was saved as UTF-16, which messages say by name.
 */
export function utf16Bom(bytes: Uint8Array): "FF FE" | "FE FF" | undefined {
  if (bytes.length < 2) return undefined;
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return "FF FE";
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return "FE FF";
  return undefined;
}

/** What to say about a file that starts with a UTF-16 byte-order mark. */
export function utf16Problem(bom: string): string {
  return `the file starts with the UTF-16 byte-order mark ${bom}, so it is saved as UTF-16`;
}

/** `bytes` as text, or `undefined` when it is not well-formed UTF-8. A BOM is kept. */
export function decodeUtf8(bytes: Uint8Array): string | undefined {
  try {
    return new TextDecoder("utf-8", { fatal: true, ignoreBOM: true }).decode(bytes);
  } catch {
    return undefined;
  }
}

function prefixIsBad(bytes: Uint8Array, n: number): boolean {
  try {
    new TextDecoder("utf-8", { fatal: true, ignoreBOM: true }).decode(bytes.subarray(0, n), { stream: true });
    return false;
  } catch {
    return true;
  }
}

/**
 * Offset of the first byte of the first ill-formed sequence, or -1 when all of
 * `bytes` is well-formed. A sequence cut short (by the end of `bytes` or by a byte
 * that cannot continue it) counts as ill-formed at its lead byte.
 */
export function firstInvalidUtf8(bytes: Uint8Array): number {
  if (decodeUtf8(bytes) !== undefined) return -1;
  if (!prefixIsBad(bytes, bytes.length)) return startOfCutSequence(bytes, bytes.length);
  // the smallest n whose prefix of length n is bad: byte n - 1 is where the decoder
  // gave up; the bad sequence starts there or at an unfinished sequence before it
  let lo = 0;
  let hi = bytes.length;
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if (prefixIsBad(bytes, mid)) hi = mid;
    else lo = mid;
  }
  return startOfCutSequence(bytes, hi - 1);
}

/** Start of a multi-byte sequence left unfinished just before `end`, else `end`. */
function startOfCutSequence(bytes: Uint8Array, end: number): number {
  for (let j = end - 1; j >= 0 && end - j <= 3; j--) {
    const b = bytes[j];
    if ((b & 0xc0) === 0x80) continue; // a continuation byte: look further back
    const need = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : b >= 0xc0 ? 2 : 1;
    return need > end - j ? j : end;
  }
  return end;
}

/** 1-based line of byte `offset`: one more than the line feeds before it. */
export function lineOfOffset(bytes: Uint8Array, offset: number): number {
  let line = 1;
  const end = Math.min(offset, bytes.length);
  for (let i = 0; i < end; i++) if (bytes[i] === 0x0a) line++;
  return line;
}
