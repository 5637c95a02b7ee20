import { readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { InputError } from "../../src/io/errors.js";
import { MAX_JSON_DEPTH, parseStrictJson } from "../../src/io/json.js";

const SRC = '--pitch "p.json"';

function failure(input: string | Uint8Array): string {
  try {
    parseStrictJson(input, SRC);
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    const m = (err as Error).message;
    expect(m).not.toContain("\n");
    expect(m.startsWith(`${SRC} line `)).toBe(true);
    return m;
  }
  throw new Error(`accepted: ${String(input)}`);
}

describe("parseStrictJson agrees with JSON.parse (ECMA-262, RFC 8259) on valid documents", () => {
  // RFC 8259 sec. 13, the two examples, verbatim
  const rfcObject = `{
      "Image": {
          "Width":  800,
          "Height": 600,
          "Title":  "View from 15th Floor",
          "Thumbnail": {
              "Url":    "http://www.example.com/image/481989943",
              "Height": 125,
              "Width":  100
          },
          "Animated" : false,
          "IDs": [116, 943, 234, 38793]
        }
    }`;
  const rfcArray = `[
        {
           "precision": "zip",
           "Latitude":  37.7668,
           "Longitude": -122.3959,
           "Address":   "",
           "City":      "SAN FRANCISCO",
           "State":     "CA",
           "Zip":       "94107",
           "Country":   "US"
        },
        {
           "precision": "zip",
           "Latitude":  37.371991,
           "Longitude": -122.026020,
           "Address":   "",
           "City":      "SUNNYVALE",
           "State":     "CA",
           "Zip":       "94085",
           "Country":   "US"
        }
    ]`;
  const others = ['"Hello world!"', "42", "3.5e-7", "-0", "null", "true", '["\\u00e9\\ud83d\\ude00\\/\\b\\f\\n\\r\\t\\"\\\\"]', "{}", "[]", " [ 1 , [ 2 , { } ] ] "];
  it.each([rfcObject, rfcArray, ...others])("document %#", (doc) => {
    // JSON.stringify of a prototype-less object equals that of a plain one
    expect(JSON.stringify(parseStrictJson(doc, SRC).value)).toBe(JSON.stringify(JSON.parse(doc)));
  });
  it("the demo staff file parses as JSON.parse does", () => {
    const bytes = readFileSync(join(dirname(fileURLToPath(import.meta.url)), "..", "..", "templates", "demo-staff.json"));
    expect(JSON.stringify(parseStrictJson(bytes, SRC).value)).toBe(JSON.stringify(JSON.parse(bytes.toString("utf8"))));
  });
});

describe("parseStrictJson gives the line of every value", () => {
  const doc = ['{', '  "team": "x",', '  "pitchers": [', '    {', '      "name": "Iris",', '      "pitches": [', '        { "name": "a" },', '        {', '          "tilt":', '            "1:45"', '        }', '      ]', '    }', '  ]', '}'].join("\r\n");
  const located = parseStrictJson(doc, SRC);
  it.each([
    ["", 1],
    ["team", 2],
    ["pitchers", 3],
    ["pitchers[0]", 4],
    ["pitchers[0].name", 5],
    ["pitchers[0].pitches[0].name", 7],
    ["pitchers[0].pitches[1]", 8],
    ["pitchers[0].pitches[1].tilt", 10],
  ] as const)("%s is on line %i (CRLF line ends)", (path, line) => {
    expect(located.lineOf(path)).toBe(line);
  });
  it("a path that is not in the document has no line", () => {
    expect(located.lineOf("pitchers[1]")).toBeUndefined();
  });
});

describe("parseStrictJson refuses, with the line", () => {
  const cases: [string, string | Uint8Array, RegExp][] = [
    ["a duplicate key (RFC 8259 sec. 4: names SHOULD be unique)", '{\n "a": 1,\n "b": 2,\n "a": 3\n}', /line 4: the key "a" appears again \(first on line 2\); expected each key once/],
    ["__proto__", '{\n "__proto__": {"polluted": true}\n}', /line 2: the key "__proto__" is not allowed/],
    ["constructor", '{"x": [\n{"constructor": 1}]}', /line 2: the key "constructor" is not allowed/],
    ["prototype", '{"prototype": 1}', /line 1: the key "prototype" is not allowed/],
    ["1e400 (overflows IEEE 754 binary64)", '{\n"speedMph": 1e400}', /line 2: 1e400 is too large/],
    ["-1e400", "[-1e400]", /-1e400 is too large/],
    ["NUL outside strings (RFC 8259 sec. 2: only space, tab, LF, CR)", "{\n\u0000}", /line 2: a NUL character where a key should be/],
    ["a raw NUL inside a string", '{"name": "a\u0000b"}', /line 1: a NUL character inside a string/],
    ["an escaped NUL inside a string", '{"name":\n "a\\u0000b"}', /line 2: a NUL character \(\\u0000\) inside a string/],
    ["a raw control character in a string (RFC 8259 sec. 7)", '"a\tb"', /the control character U\+0009 inside a string/],
    ["a vertical tab as white space", "[1,\u000b2]", /U\+000B/],
    ["a line break inside a string", '{"a": "x\ny"}', /line 1: the control character U\+000A inside a string/],
    ["a lone surrogate escape (RFC 8259 sec. 8.2)", '["\\ud800"]', /half of a surrogate pair/],
    ["hexadecimal", "[0x5C]", /"0x5C" is not a JSON number/],
    ["a leading zero", "[012]", /"012" is not a JSON number/],
    ["a leading plus", "[+1]", /unexpected "\+"/],
    ["a bare fraction", "[.5]", /unexpected "\."/],
    ["NaN", "[NaN]", /unexpected "N"/],
    ["Infinity", "[Infinity]", /unexpected "I"/],
    ["a trailing comma", '{"a": 1,\n}', /line 2: "}" where a key should be/],
    ["single quotes", "{'a': 1}", /"'" where a key should be/],
    ["a bad escape", '["\\x41"]', /the escape \\x is not JSON/],
    ["an unclosed string", '{"a": "b', /a string is not closed/],
    ["an empty document", " \n ", /line 2: the document is empty/],
    ["text after the document", "{}\n{}", /line 2: "\{" after the end of the document/],
    ["a BOM in the middle", "[1,\ufeff2]", /U\+FEFF/],
    ["true with a tail", "[truex]", /unexpected "t"/],
  ];
  it.each(cases)("%s", (_name, input, pattern) => {
    expect(failure(input)).toMatch(pattern);
  });

  it(`nesting deeper than ${MAX_JSON_DEPTH} levels, without deep recursion`, () => {
    expect(failure("[".repeat(100000))).toMatch(/nested deeper than 64 levels/);
  });
});

describe("parseStrictJson on bytes (RFC 8259 sec. 8.1: UTF-8)", () => {
  it("accepts and drops a UTF-8 byte-order mark", () => {
    const bytes = Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from('{"name": "Ren\u00e9"}')]);
    const v = parseStrictJson(bytes, SRC).value as Record<string, unknown>;
    expect(v.name).toBe("René");
  });
  it("accepts a BOM at the start of a string too", () => {
    expect(parseStrictJson('\ufeff[1]', SRC).value).toEqual([1]);
  });
  it("names the line of the first byte that is not UTF-8", () => {
    const bytes = Buffer.from('{\n  "a": "ok",\n  "b": "bad X"\n}');
    bytes[bytes.indexOf("X")] = 0xff;
    expect(failure(bytes)).toMatch(/^--pitch "p.json" line 3: byte FF is not valid UTF-8; expected a file saved as UTF-8 text$/);
  });
  it("a UTF-16 file is named by its byte-order mark, FF FE or FE FF (The Unicode Standard, sec. 23.8), line 1", () => {
    expect(failure(Buffer.from("\ufeff[1]", "utf16le"))).toMatch(/line 1: the file starts with the UTF-16 byte-order mark FF FE, so it is saved as UTF-16; expected a file saved as UTF-8 text$/);
    expect(failure(Buffer.from("\ufeff[1]", "utf16le").swap16())).toMatch(/line 1: the file starts with the UTF-16 byte-order mark FE FF/);
  });
});

describe("parsed objects have no prototype", () => {
  it("keys that shadow Object.prototype members are plain data", () => {
    const v = parseStrictJson('{"toString": 1, "hasOwnProperty": 2}', SRC).value as Record<string, unknown>;
    expect(Object.getPrototypeOf(v)).toBeNull();
    expect(v.toString).toBe(1);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});
