/**
 * What every paper job reads from a request before it draws anything: the layout (by
 * name from templates/layouts or by path) and printable names. Light on purpose: the
 * atlas parses its request and sets its worker threads screening before the drawing
 * code (pdfkit, fonts) is loaded.
 */
import { join } from "node:path";
import { InputError } from "../io/errors.js";
import { LayoutError, loadLayout, loadLayoutFile, type Layout } from "../render/paper/layouts.js";
import { projectRoot } from "../version.js";
import type { ScreenJob } from "./screen.js";

export function layoutsDir(): string {
  return join(projectRoot(), "templates", "layouts");
}

/** The file a --layout value reads: a name in templates/layouts, or a path to a .json file. */
export function layoutPath(value: string): string {
  return value.endsWith(".json") ? value : join(layoutsDir(), `${value}.json`);
}

/** A layout by name (templates/layouts) or by path (a .json file whose card layout, if any, is named from templates/layouts), of one of the kinds a command takes. */
export function layoutOf(name: string, kinds: readonly string[]): Layout {
  let layout: Layout;
  try {
    layout = name.endsWith(".json") ? loadLayoutFile(name, layoutsDir()) : loadLayout(layoutsDir(), name);
  } catch (err) {
    if (err instanceof LayoutError) throw new InputError(`--layout: ${err.message}`);
    throw err;
  }
  const a = (k: string) => (/^[aeiou]/.test(k) ? `an ${k}` : `a ${k}`);
  if (!kinds.includes(layout.kind)) throw new InputError(`--layout ${name} is ${a(layout.kind)} layout; this command takes ${a(kinds.join(" or "))} layout`);
  return layout;
}

// C0 controls (NUL among them) and DEL: text that would print as nothing or as garbage
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f]/;

/** Refuses printed text holding a control character (a NUL byte, an escape), naming it. */
export function assertPrintable(what: string, text: string | undefined): void {
  if (text === undefined) return;
  const m = CONTROL.exec(text);
  if (m) {
    const code = m[0].charCodeAt(0).toString(16).padStart(4, "0").toUpperCase();
    throw new InputError(`${what} "${text.replace(/[\u0000-\u001f\u007f]/g, "?")}" holds the control character U+${code}${code === "0000" ? " (a NUL byte)" : ""}; expected printable text`);
  }
}

/** Refuses a team, pitcher or pitch name holding a control character (assertPrintable). */
export function checkNames(job: ScreenJob): void {
  assertPrintable("the team name", job.team);
  for (const p of job.pitches) {
    assertPrintable("the pitcher's name", p.echo.pitcher);
    assertPrintable("the pitch's name", p.echo.name);
  }
}
