/**
 * Writing CSV through csv-stringify: RFC 4180 quoting (cells holding a comma, a
 * quote, CR or LF are quoted, inner quotes doubled), records ended by LF.
 *
 * Spreadsheet-injection defence: a text cell that begins with "=", "+", "-", "@",
 * a tab or a carriage return is read by spreadsheet programs as a formula, so it
 * is written with a single quote "'" in front, unless it is a plain decimal number
 * such as -1.5 or +3 (see numbers.ts), which stays as it is. Numbers are written
 * as given (JavaScript's shortest round-trip form; the caller rounds); a number
 * that is not finite is refused. A cell holding NUL is refused. null and undefined
 * are empty cells; true and false are written as words.
 */
import { stringify } from "csv-stringify/sync";
import { InputError } from "./errors.js";
import { isPlainDecimal } from "./numbers.js";
import type { OutputStream } from "./output.js";
import { quote } from "./quote.js";

const FORMULA_START = /^[=+\-@\t\r]/;

/** The text a value is written as, before CSV quoting; see the module header. */
export function csvCellText(value: unknown): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") {
    if (!Number.isFinite(value)) throw new Error(`cannot write ${value} in a CSV cell; expected a finite number`);
    return String(value);
  }
  if (typeof value === "bigint" || typeof value === "boolean") return String(value);
  if (typeof value !== "string") throw new Error(`cannot write a ${typeof value} in a CSV cell; expected text or a number`);
  if (value.includes("\0")) throw new InputError(`the text ${quote(value)} holds a NUL character; expected text without NUL to write in a CSV cell`);
  return FORMULA_START.test(value) && !isPlainDecimal(value) ? `'${value}` : value;
}

/** One CSV record, ending in "\n". */
export function csvLine(values: readonly unknown[]): string {
  return stringify([values.map(csvCellText)], { record_delimiter: "\n", quote_record_delimiter: true });
}

/** Rows written one at a time to an output stream (see output.ts). */
export class CsvWriter {
  private rows = 0;

  /** @param columns the header, written first when given. */
  constructor(
    private readonly out: OutputStream,
    private readonly columns?: readonly string[],
  ) {}

  /** Writes one row (and the header before the first one). */
  async writeRow(values: readonly unknown[]): Promise<void> {
    if (this.rows === 0 && this.columns) await this.out.write(csvLine(this.columns));
    if (this.columns && values.length !== this.columns.length) throw new Error(`a row of ${values.length} cells under a header of ${this.columns.length}`);
    this.rows++;
    await this.out.write(csvLine(values));
  }

  /** Rows written so far (the header not counted). */
  get rowCount(): number {
    return this.rows;
  }
}
