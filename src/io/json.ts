/**
 * Strict JSON (RFC 8259) that remembers the line of every value, for messages such
 * as `--pitch "staff.json" line 7: ...`. Paths are written like
 * `pitchers[0].pitches[1].tilt`; the root is `""`.
 *
 * Stricter than JSON.parse, on purpose:
 * - bytes must be well-formed UTF-8 (RFC 8259 sec. 8.1); a leading byte-order mark
 *   is accepted and dropped (sec. 8.1 lets a parser ignore it); a UTF-16 one is
 *   named in the message;
 * - a key may appear once per object (sec. 4 leaves duplicates to the
 *   implementation; we refuse them), and the keys `__proto__`, `constructor` and
 *   `prototype` are refused; objects have no prototype (`Object.create(null)`);
 * - NUL is refused everywhere, also escaped as `\u0000` inside a string, and so is
 *   an escaped lone surrogate (sec. 8.2);
 * - a number that overflows a float64 is an error ("1e400 is too large"), never
 *   Infinity or null;
 * - nesting deeper than MAX_JSON_DEPTH is refused (no deep recursion).
 * Every message is one line: `SOURCE line N: what is wrong; expected what`.
 */
import { InputError } from "./errors.js";
import { quote } from "./quote.js";
import { firstInvalidUtf8, lineOfOffset, startsWithBom, utf16Bom, utf16Problem } from "./utf8.js";

/** A parsed JSON document and the line where each of its values starts. */
export interface LocatedJson {
  readonly value: unknown;
  /** Line (1-based) where the value at `path` starts, if there is such a value. */
  lineOf(path: string): number | undefined;
}

/** Deepest nesting of objects and arrays accepted. */
export const MAX_JSON_DEPTH = 64;

const FORBIDDEN_KEYS = new Set(["__proto__", "constructor", "prototype"]);
const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;
const NUMBER_TAIL = /[0-9A-Za-z.+\-]/;
const ESCAPES: Record<string, string> = { '"': '"', "\\": "\\", "/": "/", b: "\b", f: "\f", n: "\n", r: "\r", t: "\t" };

/**
 * Parses a JSON document strictly (see the module header).
 * @param input the file's bytes (checked as UTF-8) or its text.
 * @param source names the input in messages, e.g. `--pitch "staff.json"`.
 * @throws InputError with the line of the first problem.
 */
export function parseStrictJson(input: Uint8Array | string, source: string): LocatedJson {
  let text: string;
  if (typeof input === "string") {
    text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  } else {
    const wide = utf16Bom(input);
    if (wide) throw new InputError(`${source} line 1: ${utf16Problem(wide)}; expected a file saved as UTF-8 text`);
    const bytes = startsWithBom(input) ? input.subarray(3) : input;
    const bad = firstInvalidUtf8(bytes);
    if (bad >= 0) {
      throw new InputError(`${source} line ${lineOfOffset(bytes, bad)}: byte ${bytes[bad]!.toString(16).toUpperCase().padStart(2, "0")} is not valid UTF-8; expected a file saved as UTF-8 text`);
    }
    text = new TextDecoder("utf-8", { ignoreBOM: true }).decode(bytes);
  }
  return new StrictJsonParser(text, source).parseDocument();
}

class StrictJsonParser {
  private pos = 0;
  private line = 1;
  private readonly lines = new Map<string, number>();

  constructor(
    private readonly text: string,
    private readonly source: string,
  ) {}

  parseDocument(): LocatedJson {
    this.skipSpace();
    if (this.pos >= this.text.length) this.fail("the document is empty", "expected a JSON value");
    const value = this.parseValue("", 0);
    this.skipSpace();
    if (this.pos < this.text.length) this.fail(`${this.describeHere()} after the end of the document`, "expected nothing more");
    const lines = this.lines;
    return { value, lineOf: (path) => lines.get(path) };
  }

  private fail(what: string, expected: string, line = this.line): never {
    throw new InputError(`${this.source} line ${line}: ${what}; ${expected}`);
  }

  private describeHere(): string {
    if (this.pos >= this.text.length) return "the end of the file";
    const cp = this.text.codePointAt(this.pos)!;
    if (cp === 0) return "a NUL character";
    if (cp < 0x20 || (cp >= 0x7f && cp <= 0x9f) || cp === 0xfeff || cp === 0x2028 || cp === 0x2029) {
      return `the character U+${cp.toString(16).toUpperCase().padStart(4, "0")}`;
    }
    return quote(String.fromCodePoint(cp));
  }

  /** RFC 8259 sec. 2: white space is space, tab, line feed and carriage return only. */
  private skipSpace(): void {
    const t = this.text;
    while (this.pos < t.length) {
      const c = t.charCodeAt(this.pos);
      if (c === 0x0a) this.line++;
      else if (c !== 0x20 && c !== 0x09 && c !== 0x0d) break;
      this.pos++;
    }
  }

  private parseValue(path: string, depth: number): unknown {
    if (depth > MAX_JSON_DEPTH) this.fail(`objects and lists nested deeper than ${MAX_JSON_DEPTH} levels`, `expected at most ${MAX_JSON_DEPTH}`);
    this.skipSpace();
    this.lines.set(path, this.line);
    const c = this.text[this.pos];
    if (c === "{") return this.parseObject(path, depth);
    if (c === "[") return this.parseArray(path, depth);
    if (c === '"') return this.parseString();
    if (c === "-" || (c !== undefined && c >= "0" && c <= "9")) return this.parseNumber();
    for (const [word, v] of [["true", true], ["false", false], ["null", null]] as const) {
      if (this.text.startsWith(word, this.pos) && !/[0-9A-Za-z_]/.test(this.text[this.pos + word.length] ?? "")) {
        this.pos += word.length;
        return v;
      }
    }
    const here = this.describeHere();
    return this.fail(here === "the end of the file" ? "the file ends where a value should be" : `unexpected ${here}`, "expected a value: an object, a list, a string in double quotes, a number, true, false or null");
  }

  private parseObject(path: string, depth: number): Record<string, unknown> {
    const obj = Object.create(null) as Record<string, unknown>;
    const seen = new Map<string, number>();
    this.pos++;
    this.skipSpace();
    if (this.text[this.pos] === "}") {
      this.pos++;
      return obj;
    }
    for (;;) {
      this.skipSpace();
      if (this.text[this.pos] !== '"') this.fail(`${this.describeHere()} where a key should be`, "expected a key in double quotes");
      const keyLine = this.line;
      const key = this.parseString();
      if (FORBIDDEN_KEYS.has(key)) this.fail(`the key ${quote(key)} is not allowed`, "expected a field name", keyLine);
      const first = seen.get(key);
      if (first !== undefined) this.fail(`the key ${quote(key)} appears again (first on line ${first})`, "expected each key once in an object", keyLine);
      seen.set(key, keyLine);
      this.skipSpace();
      if (this.text[this.pos] !== ":") this.fail(`${this.describeHere()} after the key ${quote(key)}`, 'expected ":"');
      this.pos++;
      obj[key] = this.parseValue(path === "" ? key : `${path}.${key}`, depth + 1);
      this.skipSpace();
      const next = this.text[this.pos];
      this.pos++;
      if (next === ",") continue;
      if (next === "}") return obj;
      this.pos--;
      this.fail(`${this.describeHere()} after the value of ${quote(key)}`, 'expected "," or "}"');
    }
  }

  private parseArray(path: string, depth: number): unknown[] {
    const arr: unknown[] = [];
    this.pos++;
    this.skipSpace();
    if (this.text[this.pos] === "]") {
      this.pos++;
      return arr;
    }
    for (;;) {
      arr.push(this.parseValue(`${path}[${arr.length}]`, depth + 1));
      this.skipSpace();
      const next = this.text[this.pos];
      this.pos++;
      if (next === ",") continue;
      if (next === "]") return arr;
      this.pos--;
      this.fail(`${this.describeHere()} in a list`, 'expected "," or "]"');
    }
  }

  /** RFC 8259 sec. 7; the opening quote is at `pos`. */
  private parseString(): string {
    const t = this.text;
    let out = "";
    let runStart = ++this.pos;
    for (;;) {
      if (this.pos >= t.length) this.fail("a string is not closed", 'expected a closing "');
      const c = t.charCodeAt(this.pos);
      if (c === 0x22) {
        out += t.slice(runStart, this.pos);
        this.pos++;
        return out;
      }
      if (c === 0) this.fail("a NUL character inside a string", "expected text without NUL");
      if (c < 0x20) {
        this.fail(`the control character U+${c.toString(16).toUpperCase().padStart(4, "0")} inside a string`, c === 0x0a ? 'expected the string closed on its line (or the line break written as \\n)' : "expected it written as an escape such as \\t or \\u001F");
      }
      if (c !== 0x5c) {
        this.pos++;
        continue;
      }
      out += t.slice(runStart, this.pos);
      const e = t[this.pos + 1];
      if (e === "u") {
        const unit = this.hex4(this.pos + 2);
        this.pos += 6;
        if (unit === 0) this.fail("a NUL character (\\u0000) inside a string", "expected text without NUL");
        if (unit >= 0xd800 && unit <= 0xdbff && t[this.pos] === "\\" && t[this.pos + 1] === "u") {
          const low = this.hex4(this.pos + 2);
          if (low >= 0xdc00 && low <= 0xdfff) {
            out += String.fromCharCode(unit, low);
            this.pos += 6;
            runStart = this.pos;
            continue;
          }
        }
        if (unit >= 0xd800 && unit <= 0xdfff) this.fail(`the escape \\u${unit.toString(16).toUpperCase()} is half of a surrogate pair`, "expected a whole character");
        out += String.fromCharCode(unit);
      } else if (e !== undefined && Object.hasOwn(ESCAPES, e)) {
        out += ESCAPES[e];
        this.pos += 2;
      } else {
        this.pos++;
        this.fail(`the escape \\${e === undefined ? "" : e} is not JSON`, 'expected one of \\" \\\\ \\/ \\b \\f \\n \\r \\t \\uXXXX');
      }
      runStart = this.pos;
    }
  }

  private hex4(at: number): number {
    const h = this.text.slice(at, at + 4);
    if (!/^[0-9A-Fa-f]{4}$/.test(h)) this.fail(`the escape \\u${h.replace(/[^0-9A-Za-z]/g, "?")} is not four hexadecimal digits`, "expected \\u followed by four hexadecimal digits");
    return parseInt(h, 16);
  }

  /** RFC 8259 sec. 6 grammar; overflow to Infinity is an error. */
  private parseNumber(): number {
    NUMBER.lastIndex = this.pos;
    const m = NUMBER.exec(this.text);
    const end = m ? this.pos + m[0].length : this.pos;
    if (!m || NUMBER_TAIL.test(this.text[end] ?? "")) {
      const word = /^[0-9A-Za-z.+\-]{1,40}/.exec(this.text.slice(this.pos))?.[0] ?? this.text[this.pos];
      this.fail(`${quote(word)} is not a JSON number`, "expected digits with an optional fraction and exponent, such as 92, -1.5 or 2.4e3 (no leading zeros, no hexadecimal)");
    }
    const x = Number(m[0]);
    if (!Number.isFinite(x)) this.fail(`${m[0].length > 40 ? m[0].slice(0, 40) + "..." : m[0]} is too large`, "expected a number below 1.8e308 in magnitude");
    this.pos = end;
    return x;
  }
}
