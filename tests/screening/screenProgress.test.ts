/** The screen's optional progress callback (src/screening/screen.ts ScreenProgress). */
import { describe, expect, it } from "vitest";
import { DEG } from "../../geometry/units.js";
import { seamModel } from "../../src/physics/seamModel/model.js";
import { DEFAULT_SCREEN_OPTIONS, screenPitch } from "../../src/screening/screen.js";
import { screenReport } from "../../src/screening/report.js";
import { pitchFromSpec } from "../../src/index.js";

describe("the screen's progress", () => {
  const model = seamModel();
  const pitch = pitchFromSpec({ hand: "right", speedMph: 92, spinRpm: 2150, tilt: "1:45", gyroDeg: 10, want: "arm" });
  const settings = { ...DEFAULT_SCREEN_OPTIONS, model, band: model.band, gridSpacingRad: 6 * DEG, top: 3 };

  it("counts one step for the sweep and one per grip and classic hold flown, ending at its total, and changes no number", () => {
    const heard: [number, number, string][] = [];
    const withProgress = screenPitch(pitch, settings, (done, total, stage) => heard.push([done, total, stage]));
    const without = screenPitch(pitch, settings);
    const total = heard[0][1];
    expect(heard[0]).toEqual([1, total, "sweep"]);
    expect(heard.map((h) => h[0])).toEqual(Array.from({ length: total }, (_, i) => i + 1));
    expect(heard.every((h) => h[1] === total)).toBe(true);
    expect(heard.slice(1).every((h) => h[2] === "grips")).toBe(true);
    // the holds are two (four-seam, two-seam); the grips flown are the top 3 and 2 more at most
    expect(total).toBeLessThanOrEqual(1 + 5 + 2);
    expect(total).toBeGreaterThanOrEqual(1 + without.candidates.length + without.references.length);
    const echo = { name: "p", pitcher: "", hand: "right", speedMph: 92, spinRpm: 2150, tilt: "1:45", view: "pitcher", gyroDeg: 10, efficiencyPct: 98.48, want: "arm" };
    expect(screenReport(withProgress, echo)).toEqual(screenReport(without, echo));
  });
});
