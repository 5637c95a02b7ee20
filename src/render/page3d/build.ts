/**
 * Builds the workbench page in Node: the page script, bundled once at build time
 * (src/build/bundle.ts writes out/build/page/page.js), inlined with the data and the
 * style sheet into one HTML file. Nothing is bundled when a page is made, so an
 * installed package needs neither the TypeScript sources nor esbuild.
 */
import { createHash } from "node:crypto";
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { projectRoot, TOOL_NAME, TOOL_VERSION } from "../../version.js";
import type { SeamModelProfile } from "../../physics/seamModel/parameters.js";
import type { ScreenResult } from "../../screening/screen.js";
import type { ScreenReport } from "../../screening/report.js";
import { FONT_FAMILY, FONT_SUBSETS, fontFace, woffFile, type FontSubset } from "../fonts.js";
import { loadLayout } from "../paper/layouts.js";
import type { PageFonts, ViewData, ViewPitch } from "./data.js";
import { renderViewHtml } from "./html.js";
import { PAGE_CSS } from "./styles.js";

/** The bundled page script, relative to the project root (made by the build). */
export const PAGE_SCRIPT = join("out", "build", "page", "page.js");

/** The card layout the page prints (the `card` command's default) and its sheets of cards. */
export const PAGE_CARD_LAYOUT = "index-card-4x6";
export const PAGE_SHEET_LAYOUTS = { letter: "letter-4-cards-3x5", a4: "a4-4-cards-3x5" } as const;
/** The subsets whose files the page carries (the face's Latin letters, accents of Western names included); the rest print in the browser's own face. */
export const PAGE_FONT_FILES: readonly FontSubset[] = ["latin"];

export interface ViewSource {
  readonly team?: string;
  readonly fromFile: boolean;
  readonly profile: SeamModelProfile;
  /** The options that shape a screen, as typed (see ViewData.settings). */
  readonly settings: Readonly<Record<string, string>>;
}

/** Code points as inclusive ranges [first, last, ...], ascending. */
function ranges(codePoints: readonly number[]): number[] {
  const sorted = [...new Set(codePoints)].sort((a, b) => a - b);
  const out: number[] = [];
  for (const cp of sorted) {
    if (out.length && out[out.length - 1] === cp - 1) out[out.length - 1] = cp;
    else out.push(cp, cp);
  }
  return out;
}

let pageFontsMemo: PageFonts | undefined;

/** The card face as the page sets it: coverage and metrics from the files themselves, and the files the page carries. */
export function pageFonts(): PageFonts {
  if (pageFontsMemo) return pageFontsMemo;
  const latin = (w: "normal" | "bold") => fontFace("latin", w).font;
  const metric = (w: "normal" | "bold") => ({ ascent: latin(w).ascent / latin(w).unitsPerEm, descent: latin(w).descent / latin(w).unitsPerEm });
  const subsets = FONT_SUBSETS.map((subset) => ({
    subset,
    coverage: { normal: ranges(fontFace(subset, "normal").font.characterSet), bold: ranges(fontFace(subset, "bold").font.characterSet) },
    ...(PAGE_FONT_FILES.includes(subset) ? { woff: { normal: woffFile(subset, "normal").toString("base64"), bold: woffFile(subset, "bold").toString("base64") } } : {}),
  }));
  pageFontsMemo = { family: FONT_FAMILY, unitsPerEm: latin("normal").unitsPerEm, metrics: { normal: metric("normal"), bold: metric("bold") }, subsets };
  return pageFontsMemo;
}

/** The data the page embeds, from screened pitches (the form `runScreens` returns; none for a page that starts from its form). */
export function viewData(source: ViewSource, screened: readonly { result: ScreenResult; report: ScreenReport }[], root: string = projectRoot()): ViewData {
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
  const dir = join(root, "templates", "layouts");
  return {
    tool: TOOL_NAME,
    version: TOOL_VERSION,
    command: "view",
    ...(source.team ? { team: source.team } : {}),
    fromFile: source.fromFile,
    pitches,
    settings: source.settings,
    model: { name: source.profile.name, parameters: { ...source.profile.values } },
    layouts: { card: loadLayout(dir, PAGE_CARD_LAYOUT), sheets: { letter: loadLayout(dir, PAGE_SHEET_LAYOUTS.letter), a4: loadLayout(dir, PAGE_SHEET_LAYOUTS.a4) } },
    fonts: pageFonts(),
  };
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
  if (!existsSync(file)) throw new Error(`the workbench page's script ${file} is missing; run npm run build`);
  return readFileSync(file, "utf8");
}

/** The whole page for `data`. Deterministic: the same data and sources give the same bytes. */
export async function buildViewHtml(data: ViewData, root: string = projectRoot()): Promise<string> {
  const script = pageScript(root);
  return renderViewHtml({ data, script, css: PAGE_CSS, scriptHash: cspHash(script), styleHash: cspHash(PAGE_CSS) });
}
