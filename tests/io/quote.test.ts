import { describe, expect, it } from "vitest";
import { MAX_QUOTED_CHARS, quote } from "../../src/io/quote.js";

describe("quote keeps a message on one line", () => {
  it("escapes line breaks and control characters as JSON does (RFC 8259 sec. 7), and NEL, LS, PS", () => {
    expect(quote('a"b\\c\nd\re\u0000')).toBe('"a\\"b\\\\c\\nd\\re\\u0000"');
    expect(quote("x\u0085y\u2028z\u2029")).toBe('"x\\u0085y\\u2028z\\u2029"');
    expect(quote("")).toBe('""');
  });
  it("shows invisible format characters as escapes (The Unicode Standard, ch. 23: U+FEFF byte-order mark, U+200B zero width space, U+202E and U+2066 bidirectional controls)", () => {
    expect(quote("\ufeff1:45")).toBe('"\\ufeff1:45"');
    expect(quote("a\u200bb\u202ec\u2066d")).toBe('"a\\u200bb\\u202ec\\u2066d"');
  });
  it(`cuts text longer than ${MAX_QUOTED_CHARS} code points, never inside a character`, () => {
    const q = quote("\u{1F600}".repeat(100));
    expect(q).toBe(`"${"\u{1F600}".repeat(MAX_QUOTED_CHARS)}..."`);
  });
  it("keeps letters of every script as they are", () => {
    expect(quote("Łukasz 山田 علي")).toBe('"Łukasz 山田 علي"');
  });
});
