/**
 * Reading a CSV file with a header, streamed, record by record.
 *
 * The first non-blank record is the header: names are trimmed; an empty name or
 * a name used twice makes the whole file unreadable (InputError). Each later
 * record comes back as `{ line, cells }`, cells keyed by header name and trimmed,
 * or as `{ line, error }` when it cannot be read (see csvRecords.ts) or has too
 * few cells, or too many non-empty cells unless `extraCells: "ignore"`. Extra
 * cells that are all empty (a spreadsheet's trailing commas) are always dropped.
 * `error` is a whole one-line message: `LABEL line N: what; expected what`.
 *
 * A missing file, a folder or an unreadable file is one InputError naming the
 * path. `progress()` gives bytes read and the file's size, for a progress bar that
 * needs no first pass over the file.
 */
import { createReadStream, fstatSync, openSync, type ReadStream } from "node:fs";
import { CsvRecordSplitter, type RawCsvItem } from "./csvRecords.js";
import { InputError } from "./errors.js";
import { quote } from "./quote.js";
import { errnoWords } from "./writeErrors.js";

/** Longest record accepted by default, bytes. */
export const DEFAULT_MAX_RECORD_BYTES = 1024 * 1024;

export interface CsvReadOptions {
  /** Names the file in messages, e.g. `--csv-in "session.csv"`; default the quoted path. */
  readonly label?: string;
  /** More non-empty cells than header names: a bad record ("error", the default) or dropped ("ignore"). */
  readonly extraCells?: "error" | "ignore";
  /** Longest record, bytes (default DEFAULT_MAX_RECORD_BYTES). */
  readonly maxRecordBytes?: number;
  /** Bytes read at a time (default 64 KiB; small values exercise chunk edges in tests). */
  readonly chunkBytes?: number;
}

/** A record: the line it starts on and its cells by header name. */
export interface CsvRecord {
  readonly line: number;
  readonly cells: Readonly<Record<string, string>>;
}

/** A record that could not be read: the line it starts on and a one-line message. */
export interface CsvBadRecord {
  readonly line: number;
  readonly error: string;
}

export type CsvItem = CsvRecord | CsvBadRecord;

export interface CsvProgress {
  readonly bytesRead: number;
  /** The file's size, or undefined when it is not a regular file (a pipe). */
  readonly totalBytes: number | undefined;
}

/** A CSV file being read; iterate it once. */
export interface CsvReader extends AsyncIterable<CsvItem> {
  /** The header's names in order (reads up to the header if needed). */
  header(): Promise<readonly string[]>;
  progress(): CsvProgress;
  /** Stops reading and closes the file (also done when iteration ends or breaks). */
  close(): void;
}

/** Whether an item is a bad record. */
export function isBadRecord(item: CsvItem): item is CsvBadRecord {
  return "error" in item;
}

/**
 * Opens a CSV file for streamed reading (see the module header).
 * @throws InputError at once for an empty path, a missing file, a folder or an unreadable file.
 */
export function readCsv(path: string, options: CsvReadOptions = {}): CsvReader {
  const label = options.label ?? quote(path);
  if (path === "") throw new InputError(`${label}: the path is empty; expected a CSV file`);
  let fd: number;
  try {
    fd = openSync(path, "r");
  } catch (err) {
    throw new InputError(`${label}: cannot read the file: ${errnoWords(err)}; expected a CSV file`);
  }
  const st = fstatSync(fd);
  const stream = createReadStream("", { fd, highWaterMark: options.chunkBytes ?? 64 * 1024, autoClose: true });
  if (st.isDirectory()) {
    stream.destroy();
    throw new InputError(`${label} is a folder; expected a CSV file`);
  }
  return new FileCsvReader(stream, label, st.isFile() ? st.size : undefined, options);
}

class FileCsvReader implements CsvReader {
  private bytesRead = 0;
  private names: Promise<readonly string[]> | undefined;
  private readonly raw: AsyncGenerator<RawCsvItem>;
  private started = false;

  constructor(
    private readonly stream: ReadStream,
    private readonly label: string,
    private readonly totalBytes: number | undefined,
    private readonly options: CsvReadOptions,
  ) {
    this.raw = this.rawItems();
  }

  progress(): CsvProgress {
    return { bytesRead: this.bytesRead, totalBytes: this.totalBytes };
  }

  close(): void {
    this.stream.destroy();
    void this.raw.return(undefined);
  }

  header(): Promise<readonly string[]> {
    // read once: a second call (after an error too) gives the same answer
    this.names ??= this.readHeader();
    return this.names;
  }

  private async readHeader(): Promise<readonly string[]> {
    const first = await this.raw.next();
    if (first.done) throw new InputError(`${this.label}: the file is empty; expected a header line with column names`);
    const item = first.value;
    if ("problem" in item) throw new InputError(`${this.label} line ${item.line}: the header cannot be read: ${item.problem}; ${item.expected}`);
    const names = item.cells.map((c) => c.trim());
    const seen = new Map<string, number>();
    names.forEach((n, i) => {
      if (n === "") throw new InputError(`${this.label} line ${item.line}: column ${i + 1} of the header has no name; expected a name for every column`);
      const j = seen.get(n);
      if (j !== undefined) throw new InputError(`${this.label} line ${item.line}: the column name ${quote(n)} appears twice in the header (columns ${j + 1} and ${i + 1}); expected each name once`);
      seen.set(n, i);
    });
    return names;
  }

  async *[Symbol.asyncIterator](): AsyncGenerator<CsvItem> {
    if (this.started) throw new Error("a CSV reader can be iterated once");
    this.started = true;
    try {
      const names = await this.header();
      for await (const item of this.raw) {
        if ("problem" in item) {
          const goesOn = item.resynced ? ` (only line ${item.line} is skipped; reading goes on at line ${item.line + 1})` : "";
          yield { line: item.line, error: `${this.label} line ${item.line}: ${item.problem}${goesOn}; ${item.expected}` };
          continue;
        }
        yield this.toRecord(names, item.line, item.cells);
      }
    } finally {
      this.close();
    }
  }

  private toRecord(names: readonly string[], line: number, raw: readonly string[]): CsvItem {
    const n = names.length;
    if (raw.length < n) {
      return { line, error: `${this.label} line ${line}: ${raw.length} cell(s), but the header has ${n} column(s); expected ${n} cells` };
    }
    if (raw.length > n && this.options.extraCells !== "ignore" && raw.slice(n).some((c) => c.trim() !== "")) {
      return { line, error: `${this.label} line ${line}: ${raw.length} cells, but the header has ${n} column(s); expected ${n} cells` };
    }
    const cells = Object.create(null) as Record<string, string>;
    for (let i = 0; i < n; i++) cells[names[i]] = raw[i].trim();
    return { line, cells };
  }

  private async *rawItems(): AsyncGenerator<RawCsvItem> {
    const splitter = new CsvRecordSplitter(this.options.maxRecordBytes ?? DEFAULT_MAX_RECORD_BYTES);
    try {
      for await (const chunk of this.stream) {
        this.bytesRead += (chunk as Buffer).length;
        yield* await splitter.push(chunk as Buffer);
      }
    } catch (err) {
      // a system error while reading (EIO, EISDIR ...) is about the file; anything else is a defect
      if ((err as NodeJS.ErrnoException).syscall === undefined) throw err;
      throw new InputError(`${this.label}: cannot read the file: ${errnoWords(err)}`);
    }
    yield* await splitter.end();
  }
}
