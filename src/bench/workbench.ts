/**
 * The workbench page's figures for `npm run bench`: the size of the HTML `view` writes
 * (and what each package adds to its script, esbuild's accounting of the tree-shaken
 * bundle), the first frame drawn in headless Chromium with software WebGL, and the
 * screen run in the page's worker against the same screen in Node. Needs Debian's
 * chromium and the dev dependency playwright-core; without them the figures are
 * skipped with a note (a figure, never a test).
 */
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { performance } from "node:perf_hooks";
import { parseScreen, screenOne } from "../jobs/screen.js";
import { projectRoot } from "../version.js";

const CHROMIUM = "/usr/bin/chromium";
const ARGS = ["--headless", "--no-sandbox", "--use-angle=swiftshader", "--enable-unsafe-swiftshader", "--disable-background-networking", "--disable-component-update", "--no-first-run"];
/** The demo staff's sinker (an invented club), as `screen` flags: the same pitch the bench's Node screen times. */
const SINKER = { hand: "right", speed: "92", spin: "2150", tilt: "1:45", gyro: "10", want: "arm", name: "sinker" };

export interface WorkbenchFigures {
  readonly htmlBytes: { demo: number; empty: number };
  readonly scriptBytes: number;
  readonly bytesInOutput: Record<string, number>;
  /** Navigation start to the first frame with a pitch drawn, ms, the demo page (best of 3 fresh pages). */
  readonly firstRenderMs: number;
  /**
   * The page's own screens in its worker, default settings, ms: the demo sinker first
   * (worker start included); a new pitch (a gyro not seen before: the ball's
   * coefficient map computed anew), best of 3; the same pitch again (the map kept).
   */
  readonly pageScreenMs: { first: number; newPitch: number; again: number };
  /** The same screens in Node, in process, ms: a new pitch (a new model, as one `screen` run), best of 3; again with the map kept. */
  readonly nodeScreenMs: { newPitch: number; again: number };
}

export async function workbenchFigures(): Promise<WorkbenchFigures | { skipped: string }> {
  if (!existsSync(CHROMIUM)) return { skipped: `${CHROMIUM} is missing` };
  let chromium: typeof import("playwright-core").chromium;
  try {
    ({ chromium } = await import("playwright-core"));
  } catch {
    return { skipped: "playwright-core (a dev dependency) is not installed" };
  }
  const root = projectRoot();
  const cli = join(root, "out", "build", "cli", "main.js");
  const dir = mkdtempSync(join(tmpdir(), "seam-atlas-bench-page-"));
  const demo = join(dir, "demo.html");
  const empty = join(dir, "empty.html");
  for (const [file, args] of [[demo, ["--demo"]], [empty, []]] as const) {
    const r = spawnSync(process.execPath, [cli, "view", ...args, "--out", file, "--cache", "none"], { encoding: "utf8" });
    if (r.status !== 0) throw new Error(`view ${args.join(" ")} failed: ${r.stderr}`);
  }
  const sizes = JSON.parse(readFileSync(join(root, "out", "build", "page", "page-sizes.json"), "utf8")) as { scriptBytes: number; bytesInOutput: Record<string, number> };
  const browser = await chromium.launch({ executablePath: CHROMIUM, args: ARGS });
  try {
    let firstRenderMs = Infinity;
    for (let i = 0; i < 3; i++) {
      const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
      const page = await context.newPage();
      await page.goto(pathToFileURL(demo).href);
      await page.waitForFunction(() => window.seamAtlas?.state().firstFrameMs != null, undefined, { timeout: 60_000 });
      firstRenderMs = Math.min(firstRenderMs, (await page.evaluate(() => window.seamAtlas!.state().firstFrameMs))!);
      await context.close();
    }
    const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
    const page = await context.newPage();
    await page.goto(pathToFileURL(empty).href);
    await page.waitForFunction(() => window.seamAtlas && window.seamAtlas.state().screens >= 1 && !window.seamAtlas.state().busy, undefined, { timeout: 60_000 });
    const timed = async (options: Record<string, string>) => {
      await page.evaluate((o) => window.seamAtlas!.screen(o), options);
      return (await page.evaluate(() => window.seamAtlas!.state().lastScreenMs))!;
    };
    const first = await timed(SINKER);
    const fresh: number[] = [];
    for (const gyro of ["11", "12", "13"]) fresh.push(await timed({ ...SINKER, gyro }));
    const again: number[] = [];
    for (let i = 0; i < 3; i++) again.push(await timed(SINKER));
    await context.close();
    // Node: a new job each time (its own model, so its own map), then the same job again
    const nodeFresh: number[] = [];
    for (const gyro of ["11", "12", "13"]) {
      const job = parseScreen({ ...SINKER, gyro, cache: "none" });
      const t0 = performance.now();
      screenOne(job, job.pitches[0]);
      nodeFresh.push(performance.now() - t0);
    }
    const job = parseScreen({ ...SINKER, cache: "none" });
    screenOne(job, job.pitches[0]);
    const nodeAgain: number[] = [];
    for (let i = 0; i < 3; i++) {
      const t0 = performance.now();
      screenOne(job, job.pitches[0]);
      nodeAgain.push(performance.now() - t0);
    }
    return {
      htmlBytes: { demo: statSync(demo).size, empty: statSync(empty).size },
      scriptBytes: sizes.scriptBytes,
      bytesInOutput: sizes.bytesInOutput,
      firstRenderMs: Math.round(firstRenderMs),
      pageScreenMs: { first: Math.round(first), newPitch: Math.round(Math.min(...fresh)), again: Math.round(Math.min(...again)) },
      nodeScreenMs: { newPitch: Math.round(Math.min(...nodeFresh)), again: Math.round(Math.min(...nodeAgain)) },
    };
  } finally {
    await browser.close();
    rmSync(dir, { recursive: true, force: true });
  }
}
