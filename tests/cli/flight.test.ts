import { existsSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { runCli } from "../support/cli.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-flight-"));
const SINKER = ["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--gyro", "10", "--want", "arm"];

describe("seam-atlas flight", () => {
  it("prints JSON with air, time, plate and movement split into Magnus and seam parts, in inches", () => {
    const r = runCli(["flight", ...SINKER, "--axis", "30N,100E", "--elevation-ft", "5200", "--temperature-f", "80", "--humidity", "40", "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    for (const k of ["densityKgM3", "viscosityPaS", "reynolds"]) expect(typeof j.air[k]).toBe("number");
    expect(j.air.densityKgM3).toBeLessThan(1.05); // thin air at 5200 ft and 80 F (U.S. Standard Atmosphere 1976 gives about 1.05 at 1585 m, 15 C colder)
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

  it("in a vacuum gives no movement at all against the spinless flight", () => {
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

describe("seam-atlas explain", () => {
  it("explains one tracked pitch: Magnus, residual and matching orientations with their fit", () => {
    const r = runCli(["explain", ...SINKER, "--move-arm", "16.5", "--move-up", "12.5", "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.residual.armSideIn).toBeCloseTo(16.5 - j.magnus.armSideIn, 9);
    expect(j.matches.length).toBe(3);
    expect(j.matches[0].fitErrorIn).toBeLessThanOrEqual(j.matches[1].fitErrorIn);
  });

  it("streams a CSV batch, reports a bad row with its line and skips it, and writes the rest", () => {
    const csv = join(tmp, "session.csv");
    writeFileSync(
      csv,
      [
        "pitcher,pitch,hand,speed_mph,spin_rpm,tilt,view,gyro_deg,move_arm_in,move_up_in",
        "A,sinker,right,92,2150,1:45,pitcher,10,16.5,12.5",
        "A,sinker,right,fast,2150,1:45,pitcher,10,16.5,12.5",
        "B,slider,right,85,2400,9:30,pitcher,40,-6.2,2.1",
      ].join("\n") + "\n",
    );
    const out = join(tmp, "session-out.csv");
    const r = runCli(["explain", "--csv-in", csv, "--out", out]);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/line 3, column speed_mph: "fast" is not a number/);
    const rows = readFileSync(out, "utf8").trim().split("\n");
    expect(rows).toHaveLength(3);
    expect(rows[0].split(",")).toContain("match1_fit_error_in");
    expect(rows[2].startsWith("4,B,slider")).toBe(true);
  });

  it("with --on-bad-row stop, stops at the bad row with exit 2 and keeps the rows before it", () => {
    const csv = join(tmp, "session2.csv");
    writeFileSync(csv, "hand,speed_mph,spin_rpm,tilt,move_arm_in,move_up_in\nright,92,2150,1:45,16,12\nright,92,2150,25:00,16,12\nright,92,2150,1:45,16,12\n");
    const out = join(tmp, "session2.json");
    const r = runCli(["explain", "--csv-in", csv, "--out", out, "--on-bad-row", "stop"]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/stopped at .*line 3/);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(JSON.parse(readFileSync(out, "utf8")).rows).toHaveLength(1);
  });

  it("rejects a CSV whose header lacks a column, naming it", () => {
    const csv = join(tmp, "session3.csv");
    writeFileSync(csv, "hand,speed_mph,spin_rpm,tilt,move_arm_in\nright,92,2150,1:45,16\n");
    const out = join(tmp, "session3.csv.out.csv");
    const r = runCli(["explain", "--csv-in", csv, "--out", out]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/lacks column "move_up_in"/);
    expect(existsSync(out)).toBe(false);
  });
});
