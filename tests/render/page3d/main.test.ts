/**
 * The workbench page (src/page/main.ts, the script the builder bundles): its 3-D view in a real
 * browser: Debian's chromium with software WebGL, opened from file://.
 */
import { mkdirSync } from "node:fs";
import { join } from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEG } from "../../../geometry/units.js";
import { percent } from "../../../src/render/numbers.js";
import { bandFromDegrees } from "../../../src/sampling/band.js";
import { measureOrientation } from "../../../src/sampling/measure.js";
import type { ViewData } from "../../../src/render/page3d/data.js";
import { movementClock, type ClockView } from "../../../geometry/frames.js";
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
import { buildDemoPage, expectedFigures, PAGE_TIMEOUT_MS } from "../../support/viewPage.js";

let data: ViewData;
let pageUrl: string;

beforeAll(async () => {
  ({ data, pageUrl } = await buildDemoPage());
}, PAGE_TIMEOUT_MS);

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
  }, PAGE_TIMEOUT_MS);
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
  }, PAGE_TIMEOUT_MS);

  it("draws a picture that is not blank (grey-level spread above 10 of 255, over 30 distinct colours)", async () => {
    await pauseAt(opened.page, 0);
    const px = await canvasPixels(opened.page);
    expect(px.standardDeviation).toBeGreaterThan(10);
    expect(px.distinctColours).toBeGreaterThan(30);
  }, PAGE_TIMEOUT_MS);

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
  }, PAGE_TIMEOUT_MS);

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
  }, PAGE_TIMEOUT_MS);

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
    expect(Math.abs(state0.pageAverages.axisPlus - o.occupancy.axisPlus)).toBeLessThan(1e-12);
    expect(Math.abs(state0.pageAverages.axisMinus - o.occupancy.axisMinus)).toBeLessThan(1e-12);
    expect(state0.timeline.plus).toEqual(Array.from(m.timeline!.axisPlus));
    expect(await page.locator("#average-plus").textContent()).toBe(percent(o.occupancy.axisPlus));
    expect(await page.locator("#average-minus").textContent()).toBe(percent(o.occupancy.axisMinus));
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
    const a = data.pitches[1].frame.pushLine;
    expect(await page.locator("#side-plus-label").textContent()).toBe(`+ side (toward ${movementClock(a[0], a[2], p.input.pitch.view as ClockView)})`);
  }, PAGE_TIMEOUT_MS);

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
  }, PAGE_TIMEOUT_MS);

  it("reaches every control from the keyboard, labels every input, and turns the view with the arrow keys", async () => {
    const { page } = opened;
    await pauseAt(page, 0);
    const unlabelled = await page.evaluate(() =>
      [...document.querySelectorAll<HTMLInputElement | HTMLSelectElement>("input, select")].filter((e) => e.labels === null || e.labels.length === 0).map((e) => e.id),
    );
    expect(unlabelled).toEqual([]);
    const buttonsAreButtons = await page.evaluate(() =>
      ["play-toggle", "reset-view", "previous-orientation", "next-orientation", "camera-pitcher", "camera-side", "camera-catcher", "release-phase", "screen-button", "print-button"].every(
        (id) => document.getElementById(id)?.tagName === "BUTTON",
      ),
    );
    expect(buttonsAreButtons).toBe(true);
    await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
    const reached = new Set<string>();
    for (let i = 0; i < 90; i++) {
      await page.keyboard.press("Tab");
      reached.add(await page.evaluate(() => document.activeElement?.id || document.activeElement?.tagName || ""));
    }
    const controls = ["ball-canvas", "play-toggle", "spin-speed", "phase", "reset-view", "pitch-select", "previous-orientation", "next-orientation"];
    const workbench = ["camera-pitcher", "camera-side", "camera-catcher", "release-phase", "show-fingers", "f-name", "f-hand", "f-speed", "f-spin", "f-tilt-as", "f-tilt", "f-view", "f-gyro-as", "f-gyro", "f-want", "f-elevation", "f-temperature", "screen-button", "paper-select", "print-button"];
    for (const id of [...controls, ...workbench]) expect(reached).toContain(id);
    // Space on the focused play button starts the turn; again stops it
    await page.focus("#play-toggle");
    await page.keyboard.press("Space");
    expect((await viewState(page)).playing).toBe(true);
    await page.keyboard.press("Space");
    expect((await viewState(page)).playing).toBe(false);
    await pauseAt(page, 0);
    const home = await canvasPixels(page);
    await page.focus("#ball-canvas");
    for (let i = 0; i < 6; i++) await page.keyboard.press("ArrowLeft");
    // a key press may land between frames: poll the picture (the page draws only when something
    // changed, so a frame counter alone cannot say whether the last press has been drawn yet)
    await expect.poll(async () => pixelDifference(home, await canvasPixels(page)).changedShare, { timeout: 10_000, interval: 100 }).toBeGreaterThan(0.01);
    await page.keyboard.press("Home");
    await expect.poll(async () => pixelDifference(home, await canvasPixels(page)).meanAbs, { timeout: 10_000, interval: 100 }).toBeLessThan(0.5);
  }, PAGE_TIMEOUT_MS);

  it("switches pitch from the list and shows that pitch's numbers", async () => {
    const { page } = opened;
    await page.selectOption("#pitch-select", "5");
    const report = data.pitches[5].report;
    expect(await page.locator("#pitch-summary").textContent()).toContain("LHP");
    expect(await page.locator("#orientation-list button").count()).toBe(report.candidates.length + report.references.length);
    expect(await shownFigures(page)).toMatchObject(expectedFigures(report.candidates[0]));
  }, PAGE_TIMEOUT_MS);

  it("writes a screenshot to out/view-screenshot.png", async () => {
    const { page } = opened;
    await page.selectOption("#pitch-select", "1");
    await page.locator("#orientation-list button").nth(0).click();
    await pauseAt(page, 40);
    mkdirSync(join(ROOT, "out"), { recursive: true });
    const png = await page.screenshot({ path: join(ROOT, "out", "view-screenshot.png"), fullPage: true });
    expect(png.subarray(1, 4).toString("latin1")).toBe("PNG");
    expect(opened.errors).toEqual([]);
  }, PAGE_TIMEOUT_MS);

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
  }, PAGE_TIMEOUT_MS);
});
