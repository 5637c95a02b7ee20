/**
 * Shared set-up for the workbench page's browser tests: Debian's chromium driven by
 * playwright-core, software WebGL (SwiftShader), and recorders for console errors,
 * page errors and every request the page makes.
 *
 * Outside CI a missing /usr/bin/chromium skips the browser tests with a message;
 * in CI (CI=true) they run anyway and fail, so a missing browser cannot pass unnoticed.
 */
import { existsSync } from "node:fs";
import { chromium, type Browser, type Page } from "playwright-core";
import { afterAll, beforeAll } from "vitest";

export const CHROMIUM_PATH = "/usr/bin/chromium";
export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--use-angle=swiftshader",
  "--enable-unsafe-swiftshader",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--no-first-run",
];
export const IN_CI = process.env.CI === "true" || process.env.CI === "1";
export const HAVE_CHROMIUM = existsSync(CHROMIUM_PATH);
/** Whether the browser tests run (and, in CI, fail without chromium). */
export const RUN_BROWSER_TESTS = HAVE_CHROMIUM || IN_CI;

if (!RUN_BROWSER_TESTS) {
  console.warn(`skipping the workbench page's browser tests: ${CHROMIUM_PATH} is missing (apt-get install -y chromium); with CI=true they fail instead`);
}

/** A fresh headless chromium (playwright gives each launch its own new profile). */
export async function launchChromium(): Promise<Browser> {
  if (!HAVE_CHROMIUM) throw new Error(`${CHROMIUM_PATH} is missing: the workbench page tests need Debian's chromium (apt-get install -y chromium)`);
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
}

/** A chromium for the tests of the enclosing describe block: launched before them, closed after; the getter returns it. */
export function sharedBrowser(timeoutMs: number): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launchChromium();
  }, timeoutMs);
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error("the shared chromium is not running (launched in beforeAll)");
    return browser;
  };
}

export interface OpenedPage {
  readonly page: Page;
  /** Console messages of type "error" and uncaught page errors. */
  readonly errors: string[];
  /** Every request URL the page made, the page itself included. */
  readonly requests: string[];
}

/** Opens `fileUrl` in a new context and waits until the page has drawn a few frames. */
export async function openPage(browser: Browser, fileUrl: string, init?: () => void): Promise<OpenedPage> {
  const context = await browser.newContext({ viewport: { width: 1400, height: 900 }, deviceScaleFactor: 1 });
  const page = await context.newPage();
  const errors: string[] = [];
  const requests: string[] = [];
  page.on("console", (m) => {
    if (m.type() === "error") errors.push(`console: ${m.text()}`);
  });
  page.on("pageerror", (e) => errors.push(`page error: ${e.message}`));
  page.on("request", (r) => requests.push(r.url()));
  if (init) await page.addInitScript(init);
  await page.goto(fileUrl);
  await page.waitForFunction(() => (window.seamAtlasView?.state().frames ?? 0) >= 2, undefined, { timeout: 30_000 });
  return { page, errors, requests };
}

/** The page's state hook (main.ts `ViewState`). */
export async function viewState(page: Page) {
  return page.evaluate(() => window.seamAtlasView!.state());
}

/** Waits until the page has drawn at least one more frame than `frames`. */
export async function nextFrame(page: Page, frames: number): Promise<void> {
  await page.waitForFunction((n) => window.seamAtlasView!.state().frames > n, frames, { timeout: 10_000 });
}

/** Pauses the turn (if playing) and puts it at whole degree `phaseDeg`, then waits for the frame. */
export async function pauseAt(page: Page, phaseDeg: number): Promise<void> {
  const s = await viewState(page);
  if (s.playing) await page.click("#play-toggle");
  const before = (await viewState(page)).frames;
  await page.fill("#phase", String(phaseDeg));
  await nextFrame(page, before);
}

export interface CanvasPixels {
  /** Grey levels 0..255 of the WebGL canvas scaled to 160 x 100. */
  readonly grey: number[];
  readonly mean: number;
  readonly standardDeviation: number;
  /** Distinct colours after quantising each channel to 16 levels. */
  readonly distinctColours: number;
}

/** Reads the WebGL canvas's pixels (it keeps its drawing buffer) through a 2-D canvas. */
export async function canvasPixels(page: Page): Promise<CanvasPixels> {
  return page.evaluate(() => {
    const source = document.getElementById("ball-canvas") as HTMLCanvasElement;
    const w = 160;
    const h = 100;
    const scratch = document.createElement("canvas");
    scratch.width = w;
    scratch.height = h;
    const ctx = scratch.getContext("2d")!;
    ctx.drawImage(source, 0, 0, w, h);
    const d = ctx.getImageData(0, 0, w, h).data;
    const grey: number[] = [];
    const colours = new Set<number>();
    for (let i = 0; i < d.length; i += 4) {
      grey.push(Math.round(0.2126 * d[i] + 0.7152 * d[i + 1] + 0.0722 * d[i + 2]));
      colours.add(((d[i] >> 4) << 8) | ((d[i + 1] >> 4) << 4) | (d[i + 2] >> 4));
    }
    const mean = grey.reduce((a, b) => a + b, 0) / grey.length;
    const variance = grey.reduce((a, b) => a + (b - mean) ** 2, 0) / grey.length;
    return { grey, mean, standardDeviation: Math.sqrt(variance), distinctColours: colours.size };
  });
}

/** Mean absolute grey-level difference and the share of pixels that differ by more than 8 levels. */
export function pixelDifference(a: CanvasPixels, b: CanvasPixels): { meanAbs: number; changedShare: number } {
  let sum = 0;
  let changed = 0;
  for (let i = 0; i < a.grey.length; i++) {
    const d = Math.abs(a.grey[i] - b.grey[i]);
    sum += d;
    if (d > 8) changed++;
  }
  return { meanAbs: sum / a.grey.length, changedShare: changed / a.grey.length };
}

/** The displayed figures of the shown orientation, by data-field. */
export async function shownFigures(page: Page): Promise<Record<string, string>> {
  return page.evaluate(() => {
    const out: Record<string, string> = {};
    for (const dd of document.querySelectorAll<HTMLElement>("#orientation-numbers dd")) out[dd.dataset.field ?? ""] = dd.textContent ?? "";
    return out;
  });
}
