import { existsSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { runCli } from "../support/cli.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-flight-"));
const SINKER = ["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--gyro", "10", "--want", "arm"];

describe("seam-atlas flight", () => {
  it("prints JSON with air (density by the 1976 standard atmosphere and Buck's vapour pressure, to 1e-9 relative), time, plate and movement split into Magnus and seam parts, in inches", () => {
    const r = runCli(["flight", ...SINKER, "--axis", "30N,100E", "--elevation-ft", "5200", "--temperature-f", "80", "--humidity", "40", "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    for (const k of ["densityKgM3", "viscosityPaS", "reynolds"]) expect(typeof j.air[k]).toBe("number");
    // The air from the published formulas, written out here: U.S. Standard Atmosphere 1976 pressure at
    // 5200 ft = 1584.96 m geometric (eqs. 18, 23, 33a), Buck (J. Appl. Meteorol. 20, 1527, 1981) e_s at
    // 80 F = 26.67 C, and rho = (P - 0.378 e) / (R_d T) with R_d = 287.05 J/(kg K): 0.96620 kg/m^3.
    const zM = 5200 * 0.3048;
    const hM = (6356766 * zM) / (6356766 + zM);
    const pPa = 101325 * ((288.15 - 0.0065 * hM) / 288.15) ** ((9.80665 * 0.0289644) / (8.31432 * 0.0065));
    const tC = ((80 - 32) * 5) / 9;
    const ePa = 0.4 * 611.21 * Math.exp(((18.678 - tC / 234.5) * tC) / (257.14 + tC));
    const rho = (pPa - 0.378 * ePa) / (287.05 * (tC + 273.15));
    expect(Math.abs(j.air.densityKgM3 - rho) / rho).toBeLessThan(1e-9);
    expect(Math.abs(j.air.densityKgM3 - 0.9662)).toBeLessThan(1e-4);
    // Re = rho v D / mu with v = 92 mph and D the 9 1/8 in ball's diameter (Thompson 1998), to 1e-9 relative
    const re = (rho * 92 * 0.44704 * (9.125 / Math.PI) * 0.0254) / j.air.viscosityPaS;
    expect(Math.abs(j.air.reynolds - re) / re).toBeLessThan(1e-9);
    expect(j.timeToPlateS).toBeGreaterThan(0.35);
    expect(j.timeToPlateS).toBeLessThan(0.5);
    for (const k of ["xIn", "zIn"]) expect(typeof j.plate[k]).toBe("number");
    const t = j.movement.trade;
    expect(t.windowFt).toBe(50); // common practice, no source: the trade's window starts 50 ft from home plate
    for (const part of [t, t.magnus, t.seam, t.drag]) for (const k of ["inducedVerticalBreakIn", "horizontalBreakIn", "armSideIn"]) expect(typeof part[k]).toBe("number");
    // a right-hander's arm side is toward the catcher's left, -x (common practice, no source)
    expect(t.armSideIn).toBeCloseTo(-t.horizontalBreakIn, 12);
    for (const k of ["horizontalIn", "verticalIn", "armSideIn"]) {
      expect(typeof j.movement.fromRelease[k]).toBe("number");
      expect(typeof j.movement.fromRelease.seam[k]).toBe("number");
    }
    expect(j.input).toMatchObject({ elevationM: 1584.96, humidityPct: 40, windowFt: 50, model: { name: "default" } });
    expect(j.input.model.hash).toMatch(/^[0-9a-f]{8}$/);
  });

  it("in a vacuum gives no movement at all (no Magnus, no seam force, no drag)", () => {
    const j = JSON.parse(runCli(["flight", ...SINKER, "--axis", "lobe-B1", "--air", "none", "--json"]).stdout);
    expect(Math.abs(j.movement.fromRelease.horizontalIn)).toBeLessThan(1e-9);
    expect(Math.abs(j.movement.fromRelease.verticalIn)).toBeLessThan(1e-9);
    expect(Math.abs(j.movement.trade.inducedVerticalBreakIn)).toBeLessThan(1e-6);
  });

  it("reports for the screen's candidate 1 the seam movement screen --json reports for it, within 0.05 in (one model gives every number)", () => {
    const screen = JSON.parse(runCli(["screen", ...SINKER, "--json"]).stdout);
    const flight = JSON.parse(runCli(["flight", ...SINKER, "--candidate", "1", "--json"]).stdout);
    const c = screen.candidates[0];
    expect(Math.abs(flight.movement.trade.seam.armSideIn - c.seamMovement.armSideIn)).toBeLessThan(0.05);
    expect(Math.abs(flight.movement.trade.seam.inducedVerticalBreakIn - c.seamMovement.verticalIn)).toBeLessThan(0.05);
    expect(flight.movement.trade.seam.clock).toBe(c.seamMovement.clock);
  });

  it("words directions in the text as a reader takes them: the plate's side as the catcher sees it with no minus sign, a launch below level as down, the seam's spread by phase in the same arm-side terms as the seam part [README, flight]", () => {
    const slow = ["--hand", "right", "--speed", "70", "--spin", "60", "--tilt", "12:00", "--axis", "20N,30E", "--phase", "90"];
    const text = runCli(["flight", ...slow]).stdout;
    const j = JSON.parse(runCli(["flight", ...slow, "--json"]).stdout);
    const side = j.plate.xIn < 0 ? "left" : "right";
    expect(text).toContain(`${Math.abs(j.plate.xIn).toFixed(1)} in ${side} of centre as the catcher sees it`);
    expect(text).toMatch(/deg (up|down), \d+\.\d\d deg (left|right) as the catcher sees it; aimed at the middle of the zone with the turn-averaged seam force/);
    // a right-hander's arm side is the catcher's left: the spread's arm-side range is the horizontal one negated and reversed
    const hb = j.movement.seamSpread.horizontalBreak;
    const fmt = (x: number) => `${x >= 0 ? "+" : "-"}${Math.abs(x).toFixed(1)}`;
    expect(text).toContain(`${fmt(-hb.p90In)} to ${fmt(-hb.p10In)} in arm side`);
    expect(text).not.toMatch(/-\d+\.\d in (right|left) of centre/);
  });

  it("flies the candidate N of the screen the user ran: the same --rank, --grid and --top give the same axis as screen's #N (one model, one list)", () => {
    const opts = ["--rank", "robust", "--grid", "3", "--top", "4"];
    const screen = JSON.parse(runCli(["screen", ...SINKER, ...opts, "--json"]).stdout);
    for (const n of [1, 3]) {
      const flight = JSON.parse(runCli(["flight", ...SINKER, ...opts, "--candidate", String(n), "--json"]).stdout);
      expect(flight.axis.latLon).toBe(screen.candidates[n - 1].latLon.text);
    }
  });

  it("turns the ball from a given release phase, reports the seam part's spread over phases, and adds the path at least every 5 ms with --trajectory", () => {
    const slow = ["--hand", "right", "--speed", "80", "--spin", "60", "--tilt", "12:00"];
    const a = JSON.parse(runCli(["flight", ...slow, "--axis", "20N,30E", "--phase", "0", "--json"]).stdout);
    const b = JSON.parse(runCli(["flight", ...slow, "--axis", "20N,30E", "--phase", "90", "--json"]).stdout);
    expect(a.seam.mode).toBe("time-resolved");
    expect(a.seam.turnsToPlate).toBeLessThan(1);
    // a knuckleball's seam movement depends on where the seams start (Watts & Sawyer, Am. J. Phys. 43, 1975)
    const d = Math.hypot(a.movement.trade.seam.horizontalBreakIn - b.movement.trade.seam.horizontalBreakIn, a.movement.trade.seam.inducedVerticalBreakIn - b.movement.trade.seam.inducedVerticalBreakIn);
    expect(d).toBeGreaterThan(0.1);
    const spread = a.movement.seamSpread;
    expect(spread.inducedVerticalBreak.maxIn).toBeGreaterThan(spread.inducedVerticalBreak.minIn);
    const t = JSON.parse(runCli(["flight", ...SINKER, "--axis", "waist-A", "--trajectory", "--json"]).stdout).trajectory;
    expect(t.length).toBeGreaterThan(300);
    for (let i = 1; i < t.length; i++) expect(t[i].tS - t[i - 1].tS).toBeLessThanOrEqual(0.005);
    expect(t[t.length - 1].yFt).toBeCloseTo(17 / 12, 6); // the front of home plate (Official Baseball Rules 2.02)
  });

  it("takes the screen's candidate or a reference hold instead of --axis", () => {
    const a = runCli(["flight", ...SINKER, "--candidate", "1", "--json"]);
    expect(a.code).toBe(0);
    const b = runCli(["flight", ...SINKER, "--reference", "two-seam", "--json"]);
    expect(JSON.parse(b.stdout).axis.latLon).toBe("0.0N,45.0E");
  });

  it("selects the drag model: a larger constant C_D slows the pitch (longer time to plate), and spin decay is accepted", () => {
    const t = (args: string[]) => JSON.parse(runCli(["flight", ...SINKER, "--axis", "lobe-B1", "--vertical-angle", "-1", "--horizontal-angle", "2", ...args, "--json"]).stdout).timeToPlateS;
    expect(t(["--drag", "constant", "--drag-coefficient", "0.5"])).toBeGreaterThan(t(["--drag", "constant", "--drag-coefficient", "0.2"]));
    const j = JSON.parse(runCli(["flight", ...SINKER, "--axis", "lobe-B1", "--spin-decay-s", "1.5", "--json"]).stdout);
    expect(j.input.spinDecayS).toBe(1.5);
  });

  const bad: [string, string[], RegExp][] = [
    ["a drag coefficient without the constant model", [...SINKER, "--axis", "waist-A", "--drag-coefficient", "0.4"], /--drag-coefficient goes with --drag constant/],
    ["no axis", SINKER, /exactly one of --axis, --candidate N or --reference/],
    ["two elevations", [...SINKER, "--axis", "waist-A", "--elevation-ft", "10", "--elevation-m", "3"], /--elevation-ft or --elevation-m, not both/],
    ["humidity above 100", [...SINKER, "--axis", "waist-A", "--humidity", "140"], /--humidity 140 percent is out of range/],
    ["one launch angle", [...SINKER, "--axis", "waist-A", "--vertical-angle", "-2"], /both --vertical-angle and --horizontal-angle/],
    ["an unknown air model", [...SINKER, "--axis", "waist-A", "--air", "thin"], /--air "thin" is not one of standard, none/],
    ["a candidate past the list", [...SINKER, "--candidate", "99"], /--candidate 99 is out of range/],
  ];
  for (const [what, args, message] of bad) {
    it(`rejects ${what}: one line, exit 2, no file`, () => {
      const out = join(tmp, `f-${what.replace(/\W+/g, "-")}.json`);
      const r = runCli(["flight", ...args, "--out", out]);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(r.stderr.trim().split("\n")).toHaveLength(1);
      expect(existsSync(out)).toBe(false);
    });
  }
});
