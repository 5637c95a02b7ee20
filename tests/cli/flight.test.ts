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
    for (const k of ["horizontalIn", "verticalIn"]) {
      expect(typeof j.movement[k]).toBe("number");
      expect(typeof j.movement.magnus[k]).toBe("number");
      expect(typeof j.movement.seam[k]).toBe("number");
    }
    expect(j.input).toMatchObject({ elevationM: 1584.96, humidityPct: 40 });
  });

  it("in a vacuum gives no movement at all against the spinless flight (no air, no aerodynamic force: closed form 0 within 1e-9 in)", () => {
    const j = JSON.parse(runCli(["flight", ...SINKER, "--axis", "lobe-B1", "--air", "none", "--json"]).stdout);
    expect(Math.abs(j.movement.horizontalIn)).toBeLessThan(1e-9);
    expect(Math.abs(j.movement.verticalIn)).toBeLessThan(1e-9);
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
