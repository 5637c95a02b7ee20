/**
 * From the bytes of a CSV file to records with the line each starts on, through
 * csv-parse (RFC 4180: quoted commas, quotes and line breaks; CRLF, LF or CR line
 * ends), one chunk at a time, in bounded memory.
 *
 * Line numbers are counted here, from byte offsets: csv-parse reports where each
 * record ends (`bytes`), and the line breaks (LF, CRLF, lone CR) before that offset
 * are counted once each. A record's line is the line of its first byte.
 *
 * Recovery: csv-parse reports a malformed record (a quote that is not closed, a
 * quote inside an unquoted cell, a record over the size limit) and, left alone,
 * goes on after the end of what it took as that record, which for a quote never
 * closed can be the rest of the file. Instead, the record is reported bad with the
 * line it starts on, only that line is dropped, and a fresh parser starts at the
 * next line. So an unclosed quote in the middle of a file costs one line, and every
 * line after it is read again (each restart moves at least one line forward).
 *
 * Cells come back as bytes and are decoded here as strict UTF-8; a record with a
 * NUL byte or bytes that are not UTF-8 is a bad record, and a file that starts
 * with a UTF-16 byte-order mark has its first line reported as UTF-16. Blank lines are skipped.
 * Spaces before an opening quote are dropped (csv-parse's ltrim); text after a
 * closing quote, a space included, makes a bad record as RFC 4180 has it
 * (csv-parse's rtrim cannot be used: it fails on byte cells).
 */
import { parse, type CsvError, type Parser } from "csv-parse";
import { decodeUtf8, utf16Bom, utf16Problem } from "./utf8.js";

/** A record read from the file: its cells (as written, not trimmed). */
export interface RawCsvRecord {
  readonly line: number;
  readonly cells: readonly string[];
}

/** A record that could not be read: what is wrong ("a quoted cell is not closed ...") and what is expected. */
export interface RawCsvProblem {
  readonly line: number;
  readonly problem: string;
  readonly expected: string;
  /** True when reading went on at the next line (the record's own line was dropped). */
  readonly resynced?: boolean;
}

export type RawCsvItem = RawCsvRecord | RawCsvProblem;

type Event = { kind: "record"; end: number; cells: Uint8Array[] } | { kind: "skip"; err: CsvError };

const QUOTING = 'expected cells separated by commas, a cell holding a comma, quote or line break in double quotes, and a quote inside it written ""';
const LF = 0x0a;
const CR = 0x0d;

/**
 * Splits a byte stream into records. Feed chunks in order with `push`, then call
 * `end`; each returns the items completed by that input, in file order.
 */
export class CsvRecordSplitter {
  /** Bytes not yet given to a finished record, starting at absolute offset `bufStart`. */
  private buf: Buffer = Buffer.alloc(0);
  private bufStart = 0;
  /** Line of the byte at `bufStart`. */
  private bufLine = 1;
  /** Absolute offset up to which bytes were given to the current parser. */
  private fedUpTo = 0;
  private parser: Parser | undefined;
  private parserBase = 0;
  private generation = 0;
  private events: Event[] = [];
  private bomChecked = false;
  private resyncing = false;
  private ended = false;

  constructor(private readonly maxRecordBytes: number) {}

  /** Adds the next chunk of the file. */
  async push(chunk: Uint8Array): Promise<RawCsvItem[]> {
    this.buf = this.buf.length === 0 ? Buffer.from(chunk) : Buffer.concat([this.buf, chunk]);
    return this.run();
  }

  /** The end of the file. */
  async end(): Promise<RawCsvItem[]> {
    this.ended = true;
    return this.run();
  }

  private async run(): Promise<RawCsvItem[]> {
    const out: RawCsvItem[] = [];
    if (!this.bomChecked) {
      if (this.buf.length < 3 && !this.ended) return out;
      this.bomChecked = true;
      if (this.buf[0] === 0xef && this.buf[1] === 0xbb && this.buf[2] === 0xbf) this.consume(3);
      this.fedUpTo = this.bufStart;
      const wide = utf16Bom(this.buf);
      if (wide) {
        // every later line is UTF-16 too, each reported on its own if read on
        out.push({ line: 1, problem: utf16Problem(wide), expected: "expected a file saved as UTF-8 text", resynced: true });
        this.resyncing = true;
      }
    }
    for (;;) {
      if (this.resyncing && !this.resync()) return out;
      if (!this.parser) this.startParser();
      const parser = this.parser!;
      const fresh = this.buf.subarray(this.fedUpTo - this.bufStart);
      this.fedUpTo = this.bufStart + this.buf.length;
      try {
        if (fresh.length > 0) await write(parser, fresh);
        if (this.ended) await finish(parser);
      } catch (err) {
        // an error csv-parse does not skip: the record is bad like any other
        this.collect(out);
        if (!this.resyncing) {
          out.push({ line: this.bufLine, problem: `the record cannot be read as CSV (${(err as CsvError).code ?? (err as Error).message})`, expected: QUOTING, resynced: true });
          this.dropParser();
        }
        continue;
      }
      this.collect(out);
      if (this.resyncing) continue;
      if (this.buf.length > this.maxRecordBytes) {
        out.push({ line: this.bufLine, problem: `the record is longer than ${this.maxRecordBytes} bytes`, expected: `expected records of at most ${this.maxRecordBytes} bytes`, resynced: true });
        this.dropParser();
        continue;
      }
      if (this.ended) {
        parser.destroy();
        this.parser = undefined;
      }
      return out;
    }
  }

  private startParser(): void {
    const generation = ++this.generation;
    this.parserBase = this.bufStart;
    this.fedUpTo = this.bufStart;
    const events: Event[] = [];
    this.events = events;
    const parser = parse({
      encoding: null,
      record_delimiter: ["\r\n", "\n", "\r"],
      ltrim: true,
      relax_column_count: true,
      skip_records_with_error: true,
      max_record_size: this.maxRecordBytes,
      on_record: (record: unknown, context) => {
        if (generation === this.generation) events.push({ kind: "record", end: this.parserBase + context.bytes, cells: record as Uint8Array[] });
        return null;
      },
      on_skip: (err) => {
        if (generation === this.generation && err) events.push({ kind: "skip", err });
        return undefined;
      },
    });
    parser.on("error", () => undefined); // reported through the write callback
    parser.resume();
    this.parser = parser;
  }

  private dropParser(): void {
    this.parser?.destroy();
    this.parser = undefined;
    this.generation++;
    this.resyncing = true;
  }

  /** Moves this parser's finished records into `out`; a skip starts a resync. */
  private collect(out: RawCsvItem[]): void {
    const events = this.events.splice(0); // the parser keeps pushing into this same array
    for (const ev of events) {
      if (ev.kind === "skip") {
        out.push({ line: this.bufLine, problem: describeCsvError(ev.err, this.maxRecordBytes), expected: QUOTING, resynced: true });
        this.dropParser();
        return;
      }
      const line = this.bufLine;
      this.consume(ev.end - this.bufStart);
      const item = decodeRecord(line, ev.cells);
      if (item) out.push(item);
    }
    if (!this.resyncing && this.ended) {
      // what csv-parse consumed without a record (nothing but blank lines) is done
      this.consume(this.buf.length);
    }
  }

  /**
   * Drops the first line of a bad record and gets ready for a fresh parser on the
   * next line; false when more bytes are needed to find where that line ends.
   */
  private resync(): boolean {
    const b = this.buf;
    for (let i = 0; i < b.length; i++) {
      if (b[i] === LF) return this.restartAfter(i + 1);
      if (b[i] === CR) {
        if (i + 1 < b.length) return this.restartAfter(b[i + 1] === LF ? i + 2 : i + 1);
        if (this.ended) return this.restartAfter(i + 1);
        this.consumeWithoutBreaks(i);
        return false;
      }
    }
    this.consumeWithoutBreaks(b.length);
    if (this.ended) this.resyncing = false;
    return false;
  }

  private restartAfter(n: number): boolean {
    this.consume(n);
    this.resyncing = false;
    this.fedUpTo = this.bufStart;
    return true;
  }

  /** Drops `n` bytes known to hold no line break (a bad record's tail). */
  private consumeWithoutBreaks(n: number): void {
    this.buf = this.buf.subarray(n);
    this.bufStart += n;
    if (this.fedUpTo < this.bufStart) this.fedUpTo = this.bufStart;
  }

  /** Drops `n` bytes from the front, counting the line breaks in them. */
  private consume(n: number): void {
    const b = this.buf;
    const m = Math.min(n, b.length);
    let breaks = 0;
    for (let i = 0; i < m; i++) {
      const c = b[i];
      if (c === LF || (c === CR && b[i + 1] !== LF)) breaks++;
    }
    this.bufLine += breaks;
    this.buf = b.subarray(m);
    this.bufStart += m;
    if (this.fedUpTo < this.bufStart) this.fedUpTo = this.bufStart;
  }
}

function write(parser: Parser, data: Uint8Array): Promise<void> {
  return new Promise((resolve, reject) => parser.write(data, (err) => (err ? reject(err) : resolve())));
}

function finish(parser: Parser): Promise<void> {
  return new Promise((resolve) => parser.end(() => resolve()));
}

/** Cells as text; a NUL byte or bytes that are not UTF-8 make a problem; a blank line gives nothing. */
function decodeRecord(line: number, cells: readonly Uint8Array[]): RawCsvItem | undefined {
  const text: string[] = [];
  for (const c of cells) {
    if (c.includes(0)) return { line, problem: "the record holds a NUL byte", expected: "expected text without NUL bytes" };
    const s = decodeUtf8(c);
    if (s === undefined) return { line, problem: "the record is not valid UTF-8 text", expected: "expected a file saved as UTF-8 text" };
    text.push(s);
  }
  if (text.length === 1 && text[0].trim() === "") return undefined;
  return { line, cells: text };
}

/** csv-parse's error codes in words. */
function describeCsvError(err: CsvError, maxRecordBytes: number): string {
  switch (err.code) {
    case "CSV_QUOTE_NOT_CLOSED":
      return "a quoted cell is not closed before the end of the file";
    case "CSV_INVALID_CLOSING_QUOTE":
      return 'a quoted cell is closed and then goes on (a quote inside a quoted cell is written "")';
    case "INVALID_OPENING_QUOTE":
      return 'a quote stands inside a cell that does not start with one (quote the whole cell and write the inner quote as "")';
    case "CSV_MAX_RECORD_SIZE":
      return `a cell is longer than ${maxRecordBytes} bytes (a quote that is never closed?)`;
    default:
      return `the record cannot be read as CSV (${err.code})`;
  }
}
