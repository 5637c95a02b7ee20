/**
 * JSON parsing that remembers where each value starts, so that a bad field can be
 * reported with its line. Paths are written like `pitchers[0].pitches[1].speedMph`.
 */
import { InputError } from "./errors.js";

export interface LocatedJson {
  readonly value: unknown;
  /** Line (1-based) where the value at `path` starts, if known. */
  lineOf(path: string): number | undefined;
}

export function parseJsonWithLines(text: string, source: string): LocatedJson {
  const lines = new Map<string, number>();
  let pos = 0;
  let line = 1;
  const fail = (what: string): never => {
    const col = pos - text.lastIndexOf("\n", pos - 1);
    throw new InputError(`${source}: malformed JSON at line ${line}, column ${col}: ${what}`);
  };
  const skip = () => {
    while (pos < text.length) {
      const c = text[pos];
      if (c === "\n") line++;
      else if (c !== " " && c !== "\t" && c !== "\r") break;
      pos++;
    }
  };
  const parseString = (): string => {
    const start = pos;
    pos++; // opening quote
    while (pos < text.length && text[pos] !== '"') {
      if (text[pos] === "\\") pos++;
      if (text[pos] === "\n") fail("a string runs past the end of its line");
      pos++;
    }
    if (pos >= text.length) fail("a string is not closed");
    pos++;
    try {
      return JSON.parse(text.slice(start, pos)) as string;
    } catch {
      return fail("a string has a bad escape");
    }
  };
  const parseValue = (path: string, depth: number): unknown => {
    if (depth > 64) fail("nested too deeply");
    skip();
    lines.set(path, line);
    const c = text[pos];
    if (c === "{") {
      pos++;
      const obj: Record<string, unknown> = {};
      skip();
      if (text[pos] === "}") {
        pos++;
        return obj;
      }
      for (;;) {
        skip();
        if (text[pos] !== '"') fail(`expected a field name in double quotes, found ${describe(text[pos])}`);
        const key = parseString();
        skip();
        if (text[pos] !== ":") fail(`expected ":" after "${key}"`);
        pos++;
        obj[key] = parseValue(path ? `${path}.${key}` : key, depth + 1);
        skip();
        if (text[pos] === ",") {
          pos++;
          continue;
        }
        if (text[pos] === "}") {
          pos++;
          return obj;
        }
        fail(`expected "," or "}" after the value of "${key}", found ${describe(text[pos])}`);
      }
    }
    if (c === "[") {
      pos++;
      const arr: unknown[] = [];
      skip();
      if (text[pos] === "]") {
        pos++;
        return arr;
      }
      for (;;) {
        arr.push(parseValue(`${path}[${arr.length}]`, depth + 1));
        skip();
        if (text[pos] === ",") {
          pos++;
          continue;
        }
        if (text[pos] === "]") {
          pos++;
          return arr;
        }
        fail(`expected "," or "]" in a list, found ${describe(text[pos])}`);
      }
    }
    if (c === '"') return parseString();
    const m = /^(-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?|true|false|null)/.exec(text.slice(pos, pos + 64));
    if (!m) return fail(`unexpected ${describe(c)}`);
    pos += m[0].length;
    return JSON.parse(m[0]);
  };
  const value = parseValue("", 0);
  skip();
  if (pos < text.length) fail(`unexpected ${describe(text[pos])} after the end of the document`);
  return { value, lineOf: (path) => lines.get(path) };
}

function describe(c: string | undefined): string {
  return c === undefined ? "the end of the file" : `"${c}"`;
}
