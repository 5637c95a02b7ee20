/**
 * The demo staff's 3-D page, built by calling the builder directly
 * (src/render/page3d/build.ts), for the page tests under tests/render/page3d/.
 */
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { formatMovementIn as inches, percent } from "../../src/render/numbers.js";
import { parseScreen, runScreen } from "../../src/jobs/screen.js";
import { DEFAULT_BAND_CENTER_DEG, DEFAULT_BAND_WIDTH_DEG } from "../../src/sampling/band.js";
import { DEFAULT_FINGER_SPACING_IN } from "../../src/screening/hand.js";
import type { OrientationReport } from "../../src/screening/report.js";
import { DEFAULT_SPREAD_DEG } from "../../src/screening/robustness.js";
import { buildViewHtml, viewData } from "../../src/render/page3d/build.js";
import type { ViewData } from "../../src/render/page3d/data.js";

export const PAGE_TIMEOUT_MS = 120_000;
/** Candidates per pitch on the demo page. */
export const TOP = 3;
/** The demo staff at a 6 deg grid, as `view --demo --grid 6` would screen it (yargs' defaults spelled out). */
export const DEMO_ARGV = {
  demo: true,
  grid: "6",
  spread: String(DEFAULT_SPREAD_DEG),
  rank: "blend",
  "finger-spacing": String(DEFAULT_FINGER_SPACING_IN),
  "band-center": String(DEFAULT_BAND_CENTER_DEG),
  "band-width": String(DEFAULT_BAND_WIDTH_DEG),
  "seam-points": "2048",
  top: String(TOP),
};

/** The demo staff screened as the page embeds it. */
export function demoScreen() {
  return runScreen(parseScreen(DEMO_ARGV));
}

/** The page's data for a screen outcome, as `view` embeds it (the settings as typed). */
export function pageData(outcome: ReturnType<typeof demoScreen>, settings: Record<string, string> = { grid: DEMO_ARGV.grid, top: DEMO_ARGV.top }): ViewData {
  const j = outcome.job;
  return viewData({ team: j.team, fromFile: j.fromFile, profile: j.model.profile, settings }, outcome.screened);
}

/** Writes a page to a fresh temporary folder; its file:// URL. */
export async function writePage(data: ViewData): Promise<{ html: string; pageUrl: string }> {
  const html = await buildViewHtml(data);
  const file = join(mkdtempSync(join(tmpdir(), "seam-atlas-page3d-")), "view.html");
  writeFileSync(file, html);
  return { html, pageUrl: pathToFileURL(file).href };
}

/** The demo page's data, its HTML and a file:// URL of it written to a fresh temporary folder. */
export async function buildDemoPage(): Promise<{ data: ViewData; html: string; pageUrl: string }> {
  const data = pageData(demoScreen());
  return { data, ...(await writePage(data)) };
}

/** The figures the page must show for `o`, in the terminal's formatting (the shared formatting of src/render/numbers.ts). */
export function expectedFigures(o: OrientationReport): Record<string, string> {
  return {
    score: inches(o.score),
    "push-clock": o.seamMovement.clock ?? "-",
    "arm-side": inches(o.seamMovement.armSideIn),
    up: inches(o.seamMovement.verticalIn),
    crossings: String(o.crossingsPerRevolution),
    "robust-mean": inches(o.robustness.meanIn),
    "robust-p10": inches(o.robustness.p10In),
    axis: o.latLon.text,
    "seam-in-band": percent(o.occupancy.seamInBand),
  };
}
