/**
 * seam-atlas input and output: what the command line uses to read what a user
 * gives and to write files the user can trust. Each export is named here.
 */
export { InputError } from "./errors.js";
export { quote } from "./quote.js";
export { isPlainDecimal, parseDecimal } from "./numbers.js";
export { MAX_JSON_DEPTH, parseStrictJson, type LocatedJson } from "./json.js";
export { decodeUtf8, firstInvalidUtf8, lineOfOffset, startsWithBom, utf16Bom } from "./utf8.js";
export { baseSlug, MAX_SLUG_BYTES, MAX_SLUG_CHARS, uniqueSlugs } from "./slugs.js";
export { ensureFolder } from "./folders.js";
export { FLUSH_BYTES, openOutputStream, writeOutput, type OutputStream } from "./output.js";
export { formatOfPath, OUTPUT_FORMATS, planOutputs, writesStraight, type InputRef, type OutputFormat, type OutputRequest, type PlannedOutput } from "./outputPlan.js";
export {
  csvCellText,
  csvLine,
  CsvWriter,
  DEFAULT_MAX_RECORD_BYTES,
  isBadRecord,
  readCsv,
  type CsvBadRecord,
  type CsvItem,
  type CsvProgress,
  type CsvReader,
  type CsvReadOptions,
  type CsvRecord,
} from "./csv.js";
