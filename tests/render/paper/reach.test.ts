/**
 * Honest reach: when the seams cannot push a pitch the wanted way (below 5 % of
 * the strongest seam movement, src/screening/screen.ts REACH_FLOOR), every output
 * says so in plain words, names the nearest direction they can reach, and ranks no
 * grip. The default model reaches every direction for ordinary pitches, so the
 * case is made from a real screen report with its reach set out of reach.
 */
import { describe, expect, it } from "vitest";
import { parseAtlas } from "../../../src/jobs/atlas.js";
import { outOfReachMessage } from "../../../src/jobs/paper.js";
import { screenText } from "../../../src/jobs/formats/text.js";
import { parseScreen, screenOne } from "../../../src/jobs/screen.js";
import { listOrientations } from "../../../src/render/page3d/data.js";
import { atlasPages } from "../../../src/render/paper/atlas.js";
import { nearestReachable, reachWords } from "../../../src/render/paper/words.js";
import { serializeScene } from "../../../src/render/scene.js";
import type { ScreenReport } from "../../../src/screening/report.js";

const job = parseScreen({ demo: true, "pitch-name": "Iris Talvela/sinker", grid: "4", top: "2" });
const screened = screenOne(job, job.pitches[0]);
const report: ScreenReport = structuredClone(screened.report);
report.reach = {
  ...report.reach,
  wantPct: 2,
  bestTowardIn: 0.17,
  outOfReach: true,
  directions: { arm: { bestTowardIn: 0.17, pct: 2 }, glove: { bestTowardIn: 7.5, pct: 90 }, up: { bestTowardIn: 3.3, pct: 40 }, down: { bestTowardIn: 5, pct: 60 } },
};

describe("honest reach", () => {
  it("names the nearest direction the seams can add to: across the wanted one before opposite it, the larger reach first", () => {
    expect(nearestReachable(report)).toMatchObject({ key: "down", pct: 60 });
    const words = reachWords(report);
    expect(words).toMatch(/^Out of reach: with this spin the seams cannot add arm-side movement/);
    expect(words).toContain("2 % of the strongest seam movement");
    expect(words).toContain("no grip is ranked for it");
    expect(words).toContain("The nearest direction they can add to is down: up to 5.0 in (60 %); screen for it with --want down.");
  });

  it("stops card with one line that says so and how to go on", () => {
    const m = outOfReachMessage(report);
    expect(m).not.toContain("\n");
    expect(m).toMatch(/^--want arm is out of reach for this spin: the seams add at most 0\.2 in of arm-side movement, 2 % of their strongest .* no grip is ranked; the nearest direction they can add to is down .* try --want down, or print a classic hold with --reference four-seam\|two-seam$/);
  });

  it("lists no grip in the screen's table or the 3-D view, only the classic holds", () => {
    const text = screenText(undefined, [report]);
    expect(text).toContain("Out of reach: with this spin the seams cannot add arm-side movement");
    expect(text).not.toMatch(/^\s*#1\b/m);
    expect(listOrientations(report).map((o) => o.label)).toEqual(["four-seam hold", "two-seam hold"]);
  });

  it("prints the atlas pitch with the reach in words, an out-of-reach card and the holds' cards, and no ranked grip", () => {
    const atlas = parseAtlas({ demo: true, "pitch-name": "Iris Talvela/sinker", grid: "4", top: "2" });
    const pages = atlasPages({
      layout: atlas.layout,
      seamShape: job.sampler.seamShape,
      pitches: [{ report, mapValuesIn: screened.result.scores.map((x) => x / 0.0254), grid: screened.result.grid }],
    });
    const svg = pages.map((p) => serializeScene(p.scene)).join("\n");
    expect(svg).toContain("no grip for arm-side movement");
    expect(svg).toContain("Out of reach:");
    expect(svg).toContain("four-seam hold, for comparison");
    expect(svg).not.toMatch(/>grip 1</);
    expect(svg).not.toContain(": grip 1");
  });
});
