/**
 * CSV reading and writing. References: RFC 4180 sec. 2 (rules 1-7: CRLF records,
 * quoted fields holding commas, quotes doubled, line breaks inside quotes; the
 * header line), the Unicode Standard (UTF-8 BOM EF BB BF; well-formed UTF-8,
 * Table 3-7), and the OWASP "CSV Injection" page for the formula characters
 * (=, +, -, @, tab, carriage return).
 */
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { csvCellText, csvLine, CsvWriter, isBadRecord, readCsv, type CsvItem, type CsvReadOptions } from "../../src/io/csv.js";
import { InputError } from "../../src/io/errors.js";
import { openOutputStream, planOutputs } from "../../src/io/output.js";

const dir = mkdtempSync(join(tmpdir(), "seam-atlas-csv-"));
let n = 0;

function file(content: string | Uint8Array): string {
  const p = join(dir, `f${n++}.csv`);
  writeFileSync(p, content);
  return p;
}

async function readAll(path: string, options: CsvReadOptions = {}): Promise<{ header: readonly string[]; items: CsvItem[] }> {
  const r = readCsv(path, { label: '--csv-in "f.csv"', ...options });
  const items: CsvItem[] = [];
  for await (const it of r) items.push(it);
  return { header: await r.header(), items };
}

/** Items as compact tuples: [line, {cells}] or [line, "error"]. */
function compact(items: CsvItem[]): [number, Record<string, string> | string][] {
  return items.map((it) => [it.line, isBadRecord(it) ? it.error : { ...it.cells }]);
}

async function refusal(path: string, options: CsvReadOptions = {}): Promise<string> {
  try {
    await readAll(path, options);
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    expect((err as Error).message).not.toContain("\n");
    return (err as Error).message;
  }
  throw new Error("not refused");
}

describe("readCsv reads RFC 4180 CSV with the line each record starts on", () => {
  it("rules 5-7: quoted commas, doubled quotes and line breaks inside quotes (CRLF file)", async () => {
    const p = file('name,note,speed_mph\r\n"Smith, J","say ""hi""",92\r\n"Lee","two\r\nlines",88\r\nKo,plain,90\r\n');
    const { header, items } = await readAll(p);
    expect(header).toEqual(["name", "note", "speed_mph"]);
    expect(compact(items)).toEqual([
      [2, { name: "Smith, J", note: 'say "hi"', speed_mph: "92" }],
      [3, { name: "Lee", note: "two\r\nlines", speed_mph: "88" }],
      [5, { name: "Ko", note: "plain", speed_mph: "90" }],
    ]);
  });

  it("LF, CRLF and lone CR line ends, mixed, and no line end after the last record", async () => {
    const { items } = await readAll(file('a,b\n1,2\r\n3,"x"\r5,6'));
    expect(compact(items)).toEqual([
      [2, { a: "1", b: "2" }],
      [3, { a: "3", b: "x" }],
      [4, { a: "5", b: "6" }],
    ]);
  });

  it("a UTF-8 byte-order mark before the header is dropped (not part of the first name)", async () => {
    const { header, items } = await readAll(file(Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from("pitcher,tilt\nIris,1:45\n")])));
    expect(header).toEqual(["pitcher", "tilt"]);
    expect(compact(items)).toEqual([[2, { pitcher: "Iris", tilt: "1:45" }]]);
  });

  it("names and cells are trimmed (also spaces before an opening quote); blank lines are skipped but counted", async () => {
    const { header, items } = await readAll(file(' a , b \n\n  \n 1 , "2 "\n'));
    expect(header).toEqual(["a", "b"]);
    expect(compact(items)).toEqual([[4, { a: "1", b: "2" }]]);
  });

  it("text after a closing quote, even a space, is a bad record (RFC 4180 rule 5: the quotes enclose the field)", async () => {
    const { items } = await readAll(file('a,b\n1,"2" \n3,4\n'));
    expect(compact(items)).toEqual([
      [2, expect.stringMatching(/line 2: a quoted cell is closed and then goes on/)],
      [3, { a: "3", b: "4" }],
    ]);
  });

  it("an extra column in the header is just another cell (the caller may ignore it)", async () => {
    const { items } = await readAll(file("a,b,notes\n1,2,anything\n"));
    expect(compact(items)).toEqual([[2, { a: "1", b: "2", notes: "anything" }]]);
  });

  it("extra cells in a row: a bad record by default, dropped with extraCells ignore; empty trailing cells always dropped", async () => {
    const p = file("a,b\n1,2,3\n4,5,,\n");
    expect(compact((await readAll(p)).items)).toEqual([
      [2, '--csv-in "f.csv" line 2: 3 cells, but the header has 2 column(s); expected 2 cells'],
      [3, { a: "4", b: "5" }],
    ]);
    expect(compact((await readAll(p, { extraCells: "ignore" })).items)).toEqual([
      [2, { a: "1", b: "2" }],
      [3, { a: "4", b: "5" }],
    ]);
  });

  it("too few cells is a bad record naming its line", async () => {
    const { items } = await readAll(file("a,b,c\n1,2\n4,5,6\n"));
    expect(compact(items)).toEqual([
      [2, '--csv-in "f.csv" line 2: 2 cell(s), but the header has 3 column(s); expected 3 cells'],
      [3, { a: "4", b: "5", c: "6" }],
    ]);
  });

  it("cells are keyed without a prototype: a column named __proto__ is plain data", async () => {
    const { items } = await readAll(file("__proto__,b\nx,y\n"));
    const cells = (items[0] as { cells: Record<string, string> }).cells;
    expect(Object.getPrototypeOf(cells)).toBeNull();
    expect(cells["__proto__"]).toBe("x");
  });
});

describe("readCsv reports a malformed record once, with its line, and reads on", () => {
  it("an unclosed quote in the middle, closed by a later quote: one bad record, every later line read", async () => {
    const { items } = await readAll(file('a,b\n1,"2\n3,4\n5,"6"\n7,8\n'));
    expect(compact(items)).toEqual([
      [2, expect.stringMatching(/^--csv-in "f\.csv" line 2: a quoted cell is closed and then goes on .*\(only line 2 is skipped; reading goes on at line 3\); expected /)],
      [3, { a: "3", b: "4" }],
      [4, { a: "5", b: "6" }],
      [5, { a: "7", b: "8" }],
    ]);
  });

  it("an unclosed quote never closed: the rest of the file is not swallowed", async () => {
    const { items } = await readAll(file('a,b\n1,2\n3,"4\n5,6\n7,8\n'));
    expect(compact(items)).toEqual([
      [2, { a: "1", b: "2" }],
      [3, expect.stringMatching(/line 3: a quoted cell is not closed before the end of the file \(only line 3 is skipped; reading goes on at line 4\)/)],
      [4, { a: "5", b: "6" }],
      [5, { a: "7", b: "8" }],
    ]);
  });

  it("a quote inside an unquoted cell is a bad record; the next line is read", async () => {
    const { items } = await readAll(file('a,b\n1,2"3\n4,5\n'));
    expect(compact(items)).toEqual([
      [2, expect.stringMatching(/line 2: a quote stands inside a cell that does not start with one/)],
      [3, { a: "4", b: "5" }],
    ]);
  });

  it("a record longer than the limit is a bad record; reading goes on", async () => {
    const { items } = await readAll(file(`a,b\n1,"${"x".repeat(500)}\n2,3\n`), { maxRecordBytes: 100 });
    expect(compact(items)).toEqual([
      [2, expect.stringMatching(/line 2: a cell is longer than 100 bytes/)],
      [3, { a: "2", b: "3" }],
    ]);
  });

  it("a NUL byte makes a bad record", async () => {
    const { items } = await readAll(file("a,b\n1,x\u0000y\n2,3\n"));
    expect(compact(items)).toEqual([
      [2, '--csv-in "f.csv" line 2: the record holds a NUL byte; expected text without NUL bytes'],
      [3, { a: "2", b: "3" }],
    ]);
  });

  it("bytes that are not UTF-8 (Unicode Table 3-7) make a bad record naming its line", async () => {
    const bytes = Buffer.from('a,b\n1,"multi\nline \xff"\n2,3\n', "latin1");
    const { items } = await readAll(file(bytes));
    expect(compact(items)).toEqual([
      [2, '--csv-in "f.csv" line 2: the record is not valid UTF-8 text; expected a file saved as UTF-8 text'],
      [4, { a: "2", b: "3" }],
    ]);
  });

  it("a UTF-16 file (byte-order mark FF FE, The Unicode Standard sec. 23.8) is refused at its header, naming the mark", async () => {
    const m = await refusal(file(Buffer.from("\ufeffhand,x\r\nright,1\r\n", "utf16le")));
    expect(m).toMatch(/^--csv-in "f.csv" line 1: the header cannot be read: the file starts with the UTF-16 byte-order mark FF FE, so it is saved as UTF-16; expected a file saved as UTF-8 text$/);
  });

  it("the same items whatever the chunk size (1 to 7 bytes and 64 KiB)", async () => {
    const p = file(Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from('a,b\r\n"x\r\ny",1\r\n1,"2\n3,4\n5,\xff\n,\n"q""r",\0\n7,"8', "latin1")]));
    const whole = compact((await readAll(p)).items);
    expect(whole.length).toBeGreaterThan(4);
    for (let chunkBytes = 1; chunkBytes <= 7; chunkBytes++) expect(compact((await readAll(p, { chunkBytes })).items)).toEqual(whole);
  });
});

describe("readCsv refuses a whole file with one line", () => {
  it.each([
    ["an empty header name", "a,,c\n1,2,3\n", /^--csv-in "f\.csv" line 1: column 2 of the header has no name; expected a name for every column$/],
    ["a blank-after-trim header name", "a, ,c\n", /column 2 of the header has no name/],
    ["a duplicate header name", "a,b,a\n1,2,3\n", /^--csv-in "f\.csv" line 1: the column name "a" appears twice in the header \(columns 1 and 3\); expected each name once$/],
    ["duplicates after trimming", "a, a\n", /appears twice/],
    ["an empty file", "", /^--csv-in "f\.csv": the file is empty; expected a header line with column names$/],
    ["blank lines only", "\n\r\n  \n", /the file is empty/],
    ["a header that cannot be read", 'a,"b\n', /line 1: the header cannot be read: a quoted cell is not closed/],
  ])("%s", async (_name, content, pattern) => {
    expect(await refusal(file(content))).toMatch(pattern);
  });

  it("a bad header stays the answer: asking again does not take the next line as the header", async () => {
    const r = readCsv(file("a,a\nb,c\n1,2\n"));
    await expect(r.header()).rejects.toThrow(/appears twice/);
    await expect(r.header()).rejects.toThrow(/appears twice/);
    r.close();
  });

  it("a folder, a missing file and an empty path, naming the path", async () => {
    const folder = join(dir, "folder.csv");
    mkdirSync(folder);
    expect(() => readCsv(folder)).toThrow(new InputError(`"${folder}" is a folder; expected a CSV file`));
    expect(() => readCsv(join(dir, "none.csv"), { label: '--csv-in "none.csv"' })).toThrow(new InputError('--csv-in "none.csv": cannot read the file: no such file or folder; expected a CSV file'));
    expect(() => readCsv("")).toThrow(new InputError('"": the path is empty; expected a CSV file'));
  });
});

describe("readCsv progress", () => {
  it("bytes read grow to the file's size, known without counting lines first", async () => {
    const content = "a,b\n" + "1,2\n".repeat(10_000);
    const p = file(content);
    const r = readCsv(p, { chunkBytes: 4096 });
    expect(r.progress()).toEqual({ bytesRead: 0, totalBytes: content.length });
    let last = 0;
    let rows = 0;
    for await (const it of r) {
      expect(isBadRecord(it)).toBe(false);
      const { bytesRead } = r.progress();
      expect(bytesRead).toBeGreaterThanOrEqual(last);
      last = bytesRead;
      rows++;
    }
    expect(rows).toBe(10_000);
    expect(r.progress().bytesRead).toBe(content.length);
  });
});

describe("csvLine writes RFC 4180 fields and neutralises formulas", () => {
  it("quotes commas, quotes and line breaks (RFC 4180 sec. 2 rules 6 and 7)", () => {
    expect(csvLine(["a,b", 'say "hi"', "x\ny", "x\r\ny", "plain", 92, -1.5, null, undefined, true])).toBe('"a,b","say ""hi""","x\ny","x\r\ny",plain,92,-1.5,,,true\n');
  });

  it.each([
    ["=SUM(A1)", "'=SUM(A1)"],
    ["+1+1", "'+1+1"],
    ["-2+3", "'-2+3"],
    ["@x", "'@x"],
    ["\tx", "'\tx"],
    ["\rx", "'\rx"],
    ["=HYPERLINK(\"http://x\",\"y\")", "'=HYPERLINK(\"http://x\",\"y\")"],
  ])("text %j is written as %j (OWASP CSV injection)", (cell, expected) => {
    expect(csvCellText(cell)).toBe(expected);
    // and reads back through csv-parse as exactly that text
    expect(csvLine([cell])).not.toMatch(/^[=+\-@\t\r]/);
  });

  it("plain decimal numbers stay numbers, as text or as numbers", () => {
    expect(csvLine(["-1.5", -1.5, "+3", "-2e-3", 0.1 + 0.2])).toBe("-1.5,-1.5,+3,-2e-3,0.30000000000000004\n");
  });

  it("NUL in a cell and non-finite numbers are refused", () => {
    expect(() => csvLine(["a\u0000b"])).toThrow(InputError);
    expect(() => csvLine([NaN])).toThrow(/finite/);
    expect(() => csvLine([Infinity])).toThrow(/finite/);
  });

  it("property: rows written with csvLine read back through readCsv cell for cell, at the right lines (fast-check, seed fixed)", async () => {
    const cellText = fc.string({ unit: fc.constantFrom("a", "é", "漢", ",", '"', "\n", "\r", "=", "-", "+", "@", "1", ".", "'", "\t", " "), maxLength: 12 }).map((s) => s.trim());
    await fc.assert(
      fc.asyncProperty(fc.array(fc.tuple(cellText, cellText, cellText), { minLength: 1, maxLength: 12 }), fc.integer({ min: 1, max: 64 }), async (rows, chunkBytes) => {
        const header = csvLine(["x", "y", "z"]);
        let text = header;
        const expected: [number, Record<string, string>][] = [];
        for (const r of rows) {
          const line = 1 + (text.match(/\r\n|\r|\n/g) ?? []).length;
          const [x, y, z] = r.map((c) => csvCellText(c).trim());
          expected.push([line, { x, y, z }]);
          text += csvLine(r);
        }
        const got = compact((await readAll(file(text), { chunkBytes })).items);
        expect(got).toEqual(expected);
      }),
      { seed: 4180, numRuns: 150 },
    );
  });
});

describe("CsvWriter streams rows into a planned output", () => {
  it("writes the header then each row, and the file is whole after commit", async () => {
    const out = join(dir, "rows.csv");
    const [target] = planOutputs([{ option: "--out", path: out, format: "csv" }], []);
    const stream = openOutputStream(target);
    const w = new CsvWriter(stream, ["line", "pitcher", "note"]);
    await w.writeRow([2, "Smith, J", "=cmd"]);
    await w.writeRow([3, "Lee", -1.5]);
    await stream.commit();
    expect(w.rowCount).toBe(2);
    expect(readFileSync(out, "utf8")).toBe('line,pitcher,note\n2,"Smith, J",\'=cmd\n3,Lee,-1.5\n');
  });
});
