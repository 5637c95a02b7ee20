import { existsSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { runCli } from "../support/cli.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-explain-"));
const SINKER = ["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--gyro", "10", "--want", "arm"];

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
    expect(r.stderr).toMatch(/line 3, column "speed_mph": "fast" is not a decimal number; expected a number of mph/);
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
