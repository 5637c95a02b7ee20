/**
 * CSV in and out: the streamed reader (csvReader.ts, records with their lines,
 * bad records reported and skipped) and the writer (csvWriter.ts, RFC 4180 quoting
 * and formula neutralising), both through the csv-parse / csv-stringify libraries.
 */
export { DEFAULT_MAX_RECORD_BYTES, isBadRecord, readCsv, type CsvBadRecord, type CsvItem, type CsvProgress, type CsvReader, type CsvReadOptions, type CsvRecord } from "./csvReader.js";
export { csvCellText, csvLine, CsvWriter } from "./csvWriter.js";
