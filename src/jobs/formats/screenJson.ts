/**
 * The document `screen --json` prints, from screened reports. Pure (the tool's name
 * and version are passed in), so the workbench page's worker writes the very same
 * document the command line does.
 */
import type { ScreenReport } from "../../screening/report.js";

/** Who wrote a document: the tool's name and version. */
export interface ToolHead {
  readonly tool: string;
  readonly version: string;
}

/** One pitch given by flags: the report at the top level; from a file or the demo: `pitches` (and `team`). */
export function screenJson(head: ToolHead, reports: readonly ScreenReport[], from: { readonly team?: string; readonly fromFile: boolean }) {
  const top = { tool: head.tool, version: head.version, command: "screen" };
  return reports.length === 1 && !from.fromFile ? { ...top, ...reports[0] } : { ...top, ...(from.team ? { team: from.team } : {}), pitches: reports };
}
