import { describe, expect, it } from "vitest";
import { runCli } from "../support/cli.js";

describe("seam-atlas force", () => {
  it("gives 360 phases of the side force in newtons and coefficients, the four separation angles, and the turn average with the same keys", () => {
    const r = runCli(["force", "--axis", "20N,30E", "--gyro", "10", "--speed", "90", "--spin", "2000", "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.timeline).toHaveLength(360);
    for (const k of ["phaseDeg", "alongMagnusN", "acrossN", "alongMagnus", "across"]) expect(typeof j.timeline[7][k]).toBe("number");
    for (const k of ["plusAcross", "minusAcross", "plusMagnus", "minusMagnus"]) {
      expect(j.timeline[7].separationDeg[k]).toBeGreaterThan(0);
      expect(j.timeline[7].separationDeg[k]).toBeLessThan(180);
    }
    for (const k of ["alongMagnusN", "acrossN", "alongMagnus", "across"]) expect(typeof j.turnAverage[k]).toBe("number");
    // newtons = 1/2 rho pi R^2 v^2 times the coefficient (the definition of a force coefficient)
    expect(j.timeline[7].acrossN).toBeCloseTo(j.timeline[7].across * j.dynamicForceN, 12);
    expect(j.dynamicForceN).toBeCloseTo(0.5 * j.input.densityKgM3 * Math.PI * (9.125 / (2 * Math.PI) * 0.0254) ** 2 * (90 * 0.44704) ** 2, 9);
    expect(j.input.model.hash).toMatch(/^[0-9a-f]{8}$/);
  });

  it("turning a non-spinning ball about the axis through the waists at 65 mph gives a lateral force that peaks near half the ball's weight, 4 times a turn (Watts & Sawyer, Am. J. Phys. 43, 1975)", () => {
    const j = JSON.parse(runCli(["force", "--axis", "waist-A", "--speed", "65", "--json"]).stdout);
    const lateral = j.timeline.map((x: { alongMagnusN: number }) => x.alongMagnusN);
    const peak = Math.max(...lateral.map(Math.abs));
    const halfWeight = 0.5 * 0.145 * 9.81;
    expect(peak / halfWeight).toBeGreaterThan(0.75);
    expect(peak / halfWeight).toBeLessThan(1.25);
    // a quarter turn later the ball shows the air the same seams (the curve's rotoreflection): the force repeats,
    // up to one meridian's step where a seam sample sits exactly on a zone edge at a whole-degree phase
    for (let k = 0; k < 360; k++) expect(Math.abs(lateral[k] - lateral[(k + 90) % 360])).toBeLessThan(0.05 * peak);
    // the turn average of a symmetric hold without spin is zero
    expect(Math.abs(j.turnAverage.alongMagnusN)).toBeLessThan(1e-9);
  });

  it("prints a compact plot and the turn average on the terminal", () => {
    const r = runCli(["force", "--axis", "waist-A"]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/turn average\s+[+-]\d+\.\d{3} N across/);
    expect(r.stdout).toMatch(/along Magnus\s+\+ \|/);
  });

  const bad: [string, string[], RegExp][] = [
    ["no axis", ["--speed", "80"], /--axis is missing/],
    ["a speed out of range", ["--axis", "waist-A", "--speed", "400"], /--speed 400 mph is out of range/],
    ["a gyro of 90 deg", ["--axis", "waist-A", "--gyro", "90"], /--gyro 90 deg is out of range/],
  ];
  for (const [what, args, message] of bad) {
    it(`rejects ${what}: one line, exit 2`, () => {
      const r = runCli(["force", ...args]);
      expect(r.code).toBe(2);
      expect(r.stderr.trim().split("\n")).toHaveLength(1);
      expect(r.stderr).toMatch(message);
    });
  }
});
