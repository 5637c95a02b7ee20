/**
 * The 3-D page built by calling the builder directly (src/render/page3d/build.ts),
 * checked as a file and in a real browser (Debian's chromium, software WebGL).
 */
import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEG } from "../../../geometry/units.js";
import { formatScore as fmtScore, percent } from "../../../src/render/numbers.js";
import { parseScreen, runScreen } from "../../../src/jobs/screen.js";
import { DEFAULT_BAND_CENTER_DEG, DEFAULT_BAND_WIDTH_DEG, bandFromDegrees } from "../../../src/sampling/band.js";
import { measureOrientation } from "../../../src/sampling/measure.js";
import { DEFAULT_FINGER_SPACING_IN } from "../../../src/screening/hand.js";
import type { OrientationReport } from "../../../src/screening/report.js";
import { DEFAULT_SPREAD_DEG } from "../../../src/screening/robustness.js";
import { bundledPackages } from "../../../src/build/licences.js";
import { buildViewHtml, cspHash, viewData } from "../../../src/render/page3d/build.js";
import type { ViewData } from "../../../src/render/page3d/data.js";
import { CAUTION_TEXT, renderViewHtml } from "../../../src/render/page3d/html.js";
import { PAGE_CSS } from "../../../src/render/page3d/styles.js";
import {
  canvasPixels,
  CHROMIUM_PATH,
  HAVE_CHROMIUM,
  launchChromium,
  nextFrame,
  openPage,
  pauseAt,
  pixelDifference,
  RUN_BROWSER_TESTS,
  shownFigures,
  viewState,
  type OpenedPage,
} from "../../support/browser.js";
import { ROOT } from "../../support/cli.js";

const BROWSER_TIMEOUT_MS = 120_000;
/** The demo staff at a 6 deg grid, as `view --demo --grid 6` would screen it (yargs' defaults spelled out). */
const ARGV = {
  demo: true,
  grid: "6",
  spread: String(DEFAULT_SPREAD_DEG),
  rank: "blend",
  "finger-spacing": String(DEFAULT_FINGER_SPACING_IN),
  "band-center": String(DEFAULT_BAND_CENTER_DEG),
  "band-width": String(DEFAULT_BAND_WIDTH_DEG),
  "seam-points": "2048",
};
const TOP = 3;

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-page3d-"));
let data: ViewData;
let html: string;
let pageUrl: string;

beforeAll(async () => {
  const outcome = runScreen(parseScreen({ ...ARGV, top: String(TOP) }));
  data = viewData(outcome.job.team, outcome.screened);
  html = await buildViewHtml(data);
  const file = join(tmp, "view.html");
  writeFileSync(file, html);
  pageUrl = pathToFileURL(file).href;
}, BROWSER_TIMEOUT_MS);

/** The figures the page must show for `o`, in the terminal's formatting (the shared formatting of src/render/numbers.ts). */
function expectedFigures(o: OrientationReport): Record<string, string> {
  return {
    score: fmtScore(o.score),
    "push-clock": o.push.clock ?? "-",
    "arm-side": fmtScore(o.push.armSide),
    up: fmtScore(o.push.up),
    crossings: String(o.crossingsPerRevolution),
    "robust-mean": fmtScore(o.robustness.mean),
    "robust-p10": fmtScore(o.robustness.p10),
    axis: o.latLon.text,
    "seam-in-band": percent(o.seamInBand),
  };
}

describe("the 3-D page as a file", () => {
  it("is one self-contained HTML file: one inline script, one JSON block, nothing loaded by src or href but data:", () => {
    const scripts = [...html.matchAll(/<script\b([^>]*)>/g)].map((m) => m[1].trim());
    expect(scripts).toEqual(['type="application/json" id="seam-atlas-view-data"', ""]);
    const refs = [...html.matchAll(/\b(?:src|href)\s*=\s*"([^"]*)"/g)].map((m) => m[1]);
    expect(refs.every((r) => r.startsWith("data:"))).toBe(true);
    expect(html).not.toMatch(/<link\b(?![^>]*rel="icon")/);
    expect(html).not.toMatch(/@import|url\(\s*['"]?https?:/);
  });

  it("allows only its own script and style by hash, and no network, in its Content-Security-Policy", () => {
    const csp = /<meta http-equiv="Content-Security-Policy" content="([^"]*)">/.exec(html)?.[1] ?? "";
    const script = /<script>([\s\S]*)<\/script>\s*<\/body>/.exec(html)?.[1] ?? "";
    const style = /<style>([\s\S]*?)<\/style>/.exec(html)?.[1] ?? "";
    expect(csp).toContain("default-src 'none'");
    expect(csp).toContain(`script-src ${cspHash(script)}`);
    expect(csp).toContain(`style-src ${cspHash(style)}`);
    expect(csp).not.toMatch(/https?:|'unsafe-inline'|'unsafe-eval'|\*/);
    expect(script.length).toBeGreaterThan(100_000);
  });

  it("embeds every pitch's screen report exactly as screen builds it, and the pitch's field frame", () => {
    const block = /<script type="application\/json" id="seam-atlas-view-data">([\s\S]*?)<\/script>/.exec(html)?.[1] ?? "";
    const embedded = JSON.parse(block) as ViewData;
    const results = runScreen(parseScreen({ ...ARGV, top: String(TOP) })).screened;
    expect(embedded.pitches).toHaveLength(6);
    expect(embedded.pitches.map((p) => p.report)).toEqual(JSON.parse(JSON.stringify(results.map((r) => r.report))));
    expect(embedded.pitches[1].frame.pushLine).toEqual(results[1].result.frame.pushLine);
    expect(embedded.team).toMatch(/invented club/);
  });

  it("carries the caution line, and the same data gives the same bytes", async () => {
    expect(html).toContain(CAUTION_TEXT.replace(/'/g, "&#39;"));
    expect(CAUTION_TEXT).toMatch(/can injure/);
    expect(CAUTION_TEXT).toMatch(/gradually/);
    expect(CAUTION_TEXT).toMatch(/never alter/);
    expect(await buildViewHtml(data)).toBe(html);
  }, BROWSER_TIMEOUT_MS);

  it("carries the licence of every package bundled into the script (three.js and gl-matrix)", () => {
    expect(html).toContain("/*! Licences of the bundled packages");
    expect(html).toMatch(/\ngl-matrix:\nCopyright \(c\) 2015-\d{4}, Brandon Jones/);
    expect(html).toMatch(/\nthree:\n[^]*?Permission is hereby granted/);
    expect(bundledPackages(["src/x.ts", "node_modules/three/build/three.core.js", "node_modules\\gl-matrix\\esm\\vec3.js", "a/node_modules/@scope/pkg/i.js", "node_modules/three/build/three.module.js"])).toEqual([
      { name: "@scope/pkg", dir: "a/node_modules/@scope/pkg" },
      { name: "gl-matrix", dir: "node_modules/gl-matrix" },
      { name: "three", dir: "node_modules/three" },
    ]);
  });

  it("keeps a hostile team or pitcher name inside its JSON block (no '</script>' breaks out)", () => {
    const hostile = `</script><script>alert(1)</script><!--`;
    const doc = { ...data, team: hostile };
    const out = renderViewHtml({ data: doc, script: "void 0", css: PAGE_CSS, scriptHash: cspHash("void 0"), styleHash: cspHash(PAGE_CSS) });
    expect(out.match(/<script\b/g)).toHaveLength(2);
    const block = /<script type="application\/json" id="seam-atlas-view-data">([\s\S]*?)<\/script>/.exec(out)?.[1] ?? "";
    expect(JSON.parse(block).team).toBe(hostile);
  });
});

describe.runIf(RUN_BROWSER_TESTS)("the browser the page tests drive", () => {
  it("is Debian's chromium at /usr/bin/chromium (with CI=true a missing one fails here rather than skipping)", () => {
    expect(HAVE_CHROMIUM, `${CHROMIUM_PATH} is missing: apt-get install -y chromium`).toBe(true);
  });
});

describe.runIf(RUN_BROWSER_TESTS)("the 3-D page in chromium (file://, software WebGL)", () => {
  let browser: Browser;
  let opened: OpenedPage;

  beforeAll(async () => {
    browser = await launchChromium();
    opened = await openPage(browser, pageUrl);
  }, BROWSER_TIMEOUT_MS);
  afterAll(async () => {
    await browser?.close();
  });

  it("loads from file:// with WebGL, no console errors and no request but its own file", async () => {
    const s = await viewState(opened.page);
    expect(s.webgl).toBe(true);
    expect(opened.errors).toEqual([]);
    expect(opened.requests.filter((u) => /^https?:/i.test(u))).toEqual([]);
    expect(opened.requests.every((u) => u === pageUrl || u.startsWith("data:") || u.startsWith("blob:"))).toBe(true);
    expect(await opened.page.locator(".caution").textContent()).toContain("Pitching can injure");
  }, BROWSER_TIMEOUT_MS);

  it("draws a picture that is not blank (grey-level spread above 10 of 255, over 30 distinct colours)", async () => {
    await pauseAt(opened.page, 0);
    const px = await canvasPixels(opened.page);
    expect(px.standardDeviation).toBeGreaterThan(10);
    expect(px.distinctColours).toBeGreaterThan(30);
  }, BROWSER_TIMEOUT_MS);

  it("shows each candidate's and reference hold's numbers exactly as the terminal prints them (Next steps through all)", async () => {
    const { page } = opened;
    await page.selectOption("#pitch-select", "1");
    const report = data.pitches[1].report;
    const all = [...report.candidates, ...report.references];
    for (let i = 0; i < all.length; i++) {
      const s = await viewState(page);
      expect(s.orientationIndex).toBe(i);
      expect(await shownFigures(page)).toMatchObject(expectedFigures(all[i]));
      await page.click("#next-orientation");
    }
    expect((await viewState(page)).orientationIndex).toBe(0);
    await page.click("#previous-orientation");
    expect((await viewState(page)).label).toBe("two-seam hold");
    expect(opened.errors).toEqual([]);
  }, BROWSER_TIMEOUT_MS);

  it("changes the picture and the numbers when another candidate is chosen, and gives the first picture back on return", async () => {
    const { page } = opened;
    await page.selectOption("#pitch-select", "0");
    await pauseAt(page, 0);
    const report = data.pitches[0].report;
    const first = await canvasPixels(page);
    const firstFigures = await shownFigures(page);
    let before = (await viewState(page)).frames;
    await page.locator("#orientation-list button").nth(1).click();
    await nextFrame(page, before);
    const second = await canvasPixels(page);
    const secondFigures = await shownFigures(page);
    before = (await viewState(page)).frames;
    await page.locator("#orientation-list button").nth(0).click();
    await nextFrame(page, before);
    const back = await canvasPixels(page);
    // same orientation, same phase, same view: the same picture to within antialiasing noise
    expect(pixelDifference(first, back).meanAbs).toBeLessThan(0.5);
    const moved = pixelDifference(first, second);
    expect(moved.meanAbs).toBeGreaterThan(1);
    expect(moved.changedShare).toBeGreaterThan(0.01);
    expect(secondFigures.score).not.toBe(firstFigures.score);
    expect(firstFigures).toMatchObject(expectedFigures(report.candidates[0]));
    expect(secondFigures).toMatchObject(expectedFigures(report.candidates[1]));
    expect(await page.locator("#orientation-list button").nth(0).getAttribute("aria-pressed")).toBe("true");
  }, BROWSER_TIMEOUT_MS);

  it("computes the live in-band share on each side at the scrubbed phase as measure's timeline has it, beside the report's turn average", async () => {
    const { page } = opened;
    await page.selectOption("#pitch-select", "1");
    await page.locator("#orientation-list button").nth(0).click();
    const p = data.pitches[1].report;
    const o = p.candidates[0];
    const s = p.input.settings;
    const m = measureOrientation(
      { axis: o.axis, gyroRad: p.input.pitch.gyroDeg * DEG },
      { band: bandFromDegrees(s.bandCenterDeg, s.bandWidthDeg), seamShape: s.seamShape, seamPoints: s.seamPoints },
    );
    const state0 = await viewState(page);
    // the page's own exact sampler gives the report's turn averages (same code, same inputs)
    expect(Math.abs(state0.pageAverages.axisPlus - o.sides.axisPlus)).toBeLessThan(1e-12);
    expect(Math.abs(state0.pageAverages.axisMinus - o.sides.axisMinus)).toBeLessThan(1e-12);
    expect(Math.abs(state0.pageAverages.alongAxis - o.asymmetry.alongAxis)).toBeLessThan(1e-12);
    expect(state0.timeline.plus).toEqual(Array.from(m.timeline!.axisPlus));
    expect(await page.locator("#average-plus").textContent()).toBe(percent(o.sides.axisPlus));
    expect(await page.locator("#average-minus").textContent()).toBe(percent(o.sides.axisMinus));
    const seen = new Set<string>();
    for (const k of [0, 37, 90, 181, 300]) {
      await pauseAt(page, k);
      const st = await viewState(page);
      expect(st.phaseDeg).toBeCloseTo(k, 9);
      // counts of seam samples: equal, or one sample apart if a sample sits on a band limit
      expect(Math.abs(st.live.axisPlus - m.timeline!.axisPlus[k])).toBeLessThanOrEqual(1 / s.seamPoints + 1e-15);
      expect(Math.abs(st.live.axisMinus - m.timeline!.axisMinus[k])).toBeLessThanOrEqual(1 / s.seamPoints + 1e-15);
      expect(await page.locator("#live-plus").textContent()).toBe(percent(st.live.axisPlus));
      expect(await page.locator("#live-minus").textContent()).toBe(percent(st.live.axisMinus));
      expect(await page.locator("#phase-value").textContent()).toBe(`${k}\u00b0`);
      seen.add(await page.locator("#live-plus").innerText());
    }
    // the readout is live: it moves through the turn
    expect(seen.size).toBeGreaterThan(1);
    expect(await page.locator("#side-plus-label").textContent()).toBe(`+ side (toward ${p.pushLine.clock})`);
  }, BROWSER_TIMEOUT_MS);

  it("plays and pauses the turn, at the speed the slider sets", async () => {
    const { page } = opened;
    await pauseAt(page, 10);
    await page.fill("#spin-speed", "60");
    expect(await page.locator("#spin-speed-value").textContent()).toBe("60 turns/min");
    await page.click("#play-toggle");
    expect(await page.locator("#play-toggle").textContent()).toBe("Pause");
    const a = await viewState(page);
    await page.waitForTimeout(400);
    const b = await viewState(page);
    expect(b.playing).toBe(true);
    expect(b.phaseDeg).not.toBeCloseTo(a.phaseDeg, 3);
    await page.click("#play-toggle");
    expect(await page.locator("#play-toggle").textContent()).toBe("Play");
    const c = await viewState(page);
    await page.waitForTimeout(300);
    expect((await viewState(page)).phaseDeg).toBe(c.phaseDeg);
  }, BROWSER_TIMEOUT_MS);

  it("reaches every control from the keyboard, labels every input, and turns the view with the arrow keys", async () => {
    const { page } = opened;
    await pauseAt(page, 0);
    const unlabelled = await page.evaluate(() =>
      [...document.querySelectorAll<HTMLInputElement | HTMLSelectElement>("input, select")].filter((e) => e.labels === null || e.labels.length === 0).map((e) => e.id),
    );
    expect(unlabelled).toEqual([]);
    const buttonsAreButtons = await page.evaluate(() => ["play-toggle", "reset-view", "previous-orientation", "next-orientation"].every((id) => document.getElementById(id)?.tagName === "BUTTON"));
    expect(buttonsAreButtons).toBe(true);
    await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
    const reached = new Set<string>();
    for (let i = 0; i < 30; i++) {
      await page.keyboard.press("Tab");
      reached.add(await page.evaluate(() => document.activeElement?.id || document.activeElement?.tagName || ""));
    }
    for (const id of ["ball-canvas", "play-toggle", "spin-speed", "phase", "reset-view", "pitch-select", "previous-orientation", "next-orientation"]) expect(reached).toContain(id);
    // Space on the focused play button starts the turn; again stops it
    await page.focus("#play-toggle");
    await page.keyboard.press("Space");
    expect((await viewState(page)).playing).toBe(true);
    await page.keyboard.press("Space");
    expect((await viewState(page)).playing).toBe(false);
    await pauseAt(page, 0);
    const home = await canvasPixels(page);
    await page.focus("#ball-canvas");
    let before = (await viewState(page)).frames;
    for (let i = 0; i < 6; i++) await page.keyboard.press("ArrowLeft");
    await nextFrame(page, before);
    const turned = await canvasPixels(page);
    expect(pixelDifference(home, turned).changedShare).toBeGreaterThan(0.01);
    before = (await viewState(page)).frames;
    await page.keyboard.press("Home");
    await nextFrame(page, before);
    expect(pixelDifference(home, await canvasPixels(page)).meanAbs).toBeLessThan(0.5);
  }, BROWSER_TIMEOUT_MS);

  it("switches pitch from the list and shows that pitch's numbers", async () => {
    const { page } = opened;
    await page.selectOption("#pitch-select", "5");
    const report = data.pitches[5].report;
    expect(await page.locator("#pitch-summary").textContent()).toContain("LHP");
    expect(await page.locator("#orientation-list button").count()).toBe(report.candidates.length + report.references.length);
    expect(await shownFigures(page)).toMatchObject(expectedFigures(report.candidates[0]));
  }, BROWSER_TIMEOUT_MS);

  it("writes a screenshot to out/view-screenshot.png", async () => {
    const { page } = opened;
    await page.selectOption("#pitch-select", "1");
    await page.locator("#orientation-list button").nth(0).click();
    await pauseAt(page, 40);
    mkdirSync(join(ROOT, "out"), { recursive: true });
    const png = await page.screenshot({ path: join(ROOT, "out", "view-screenshot.png"), fullPage: true });
    expect(png.subarray(1, 4).toString("latin1")).toBe("PNG");
    expect(opened.errors).toEqual([]);
  }, BROWSER_TIMEOUT_MS);

  it("says plainly when the browser has no WebGL, and still shows the numbers and the live share", async () => {
    const noGl = await openPage(browser, pageUrl, () => {
      const original = HTMLCanvasElement.prototype.getContext;
      // a browser with WebGL switched off hands out no WebGL context at all
      HTMLCanvasElement.prototype.getContext = function (this: HTMLCanvasElement, kind: string, ...rest: unknown[]) {
        if (/webgl/i.test(kind)) return null;
        return (original as (...a: unknown[]) => RenderingContext | null).call(this, kind, ...rest);
      } as typeof original;
    });
    const { page } = noGl;
    expect((await viewState(page)).webgl).toBe(false);
    expect(await page.locator("#webgl-message").isVisible()).toBe(true);
    expect(await page.locator("#webgl-message").textContent()).toContain("WebGL");
    expect(await shownFigures(page)).toMatchObject(expectedFigures(data.pitches[0].report.candidates[0]));
    await pauseAt(page, 90);
    expect(await page.locator("#live-plus").textContent()).not.toBe("-");
    expect(noGl.errors).toEqual([]);
    await page.context().close();
  }, BROWSER_TIMEOUT_MS);
});
