/**
 * Builds the 3-D page in Node: the page script, bundled once at build time
 * (src/build/bundle.ts writes out/build/page/page.js), inlined with the data and the
 * style sheet into one HTML file. Nothing is bundled when a page is made, so an
 * installed package needs neither the TypeScript sources nor esbuild.
 */
import { createHash } from "node:crypto";
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { projectRoot, TOOL_NAME, TOOL_VERSION } from "../../version.js";
import type { ScreenResult } from "../../screening/screen.js";
import type { ScreenReport } from "../../screening/report.js";
import type { ViewData, ViewPitch } from "./data.js";
import { renderViewHtml } from "./html.js";
import { PAGE_CSS } from "./styles.js";

/** The bundled page script, relative to the project root (made by the build). */
export const PAGE_SCRIPT = join("out", "build", "page", "page.js");

/** The data the page embeds, from screened pitches (the form `runScreens` returns). */
export function viewData(team: string | undefined, screened: readonly { result: ScreenResult; report: ScreenReport }[]): ViewData {
  const pitches: ViewPitch[] = screened.map(({ result, report }) => ({
    report,
    frame: {
      spinAxis: result.frame.spinAxis,
      flight: result.frame.flight,
      pushLine: result.frame.pushLine,
      magnus: result.frame.magnus,
      armSide: result.frame.armSide,
    },
  }));
  return { tool: TOOL_NAME, version: TOOL_VERSION, command: "view", ...(team ? { team } : {}), pitches };
}

/** A CSP hash source for an inline element's exact text. */
export function cspHash(text: string): string {
  return `'sha256-${createHash("sha256").update(text, "utf8").digest("base64")}'`;
}

/**
 * The page script as built (an IIFE with the bundled packages' licences). Throws
 * Error (not an input error) when it is missing: that is a broken installation.
 */
export function pageScript(root: string = projectRoot()): string {
  const file = join(root, PAGE_SCRIPT);
  if (!existsSync(file)) throw new Error(`the 3-D page's script ${file} is missing; run npm run build`);
  return readFileSync(file, "utf8");
}

/** The whole page for `data`. Deterministic: the same data and sources give the same bytes. */
export async function buildViewHtml(data: ViewData, root: string = projectRoot()): Promise<string> {
  const script = pageScript(root);
  return renderViewHtml({ data, script, css: PAGE_CSS, scriptHash: cspHash(script), styleHash: cspHash(PAGE_CSS) });
}
