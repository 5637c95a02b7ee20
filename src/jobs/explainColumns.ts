/**
 * explain's batch columns: the tracked-pitch keys (trackedColumns.ts, shared with
 * calibrate --tracked) with the observed movement under `move`:
 *
 *   move_up_in | move_up_cm     observed vertical movement on the basis (gravity removed)
 *   move_arm_in | move_arm_cm | move_right_in | move_right_cm
 *                               observed horizontal movement toward the arm side, or
 *                               toward the catcher's right (the field's +x)
 *
 * each at most MOVEMENT_LIMIT_IN either way.
 */
import type { Pitch } from "../screening/pitch.js";
import type { PitchEcho } from "../screening/report.js";
import { parseColumnsOption as parseColumns, readTrackedRow, resolveColumns as resolve, trackedColumnSet, type ColumnMap } from "./trackedColumns.js";

export type { ColumnMap };

/** Largest observed movement accepted either way, inches. */
export const MOVEMENT_LIMIT_IN = 60;

const EXPLAIN_COLUMNS = trackedColumnSet("move", MOVEMENT_LIMIT_IN);

/** Parses --columns "key=Header,key=Header" (no column map: an empty one). */
export function parseColumnsOption(value: unknown): Record<string, string> {
  return parseColumns(value, EXPLAIN_COLUMNS);
}

/** Resolves explain's keys against the file's header (trackedColumns.ts). */
export function resolveColumns(header: readonly string[], mapped: Readonly<Record<string, string>>, label: string): ColumnMap {
  return resolve(header, mapped, label, EXPLAIN_COLUMNS);
}

/** One row: the pitch, its echo (normalised units) and the observed movement on the batch's basis. */
export interface BatchRow {
  readonly pitch: Pitch;
  readonly echo: PitchEcho;
  readonly moveArmIn: number;
  readonly moveUpIn: number;
}

/** Reads one record's cells into a row; InputError (with the line and column) for a bad value. */
export function readRow(cells: Readonly<Record<string, string>>, columns: ColumnMap, lineNo: number, label: string): BatchRow {
  const { pitch, echo, moveArmIn, moveUpIn } = readTrackedRow(cells, columns, lineNo, label);
  return { pitch, echo, moveArmIn, moveUpIn };
}
