import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { runCli } from "../support/cli.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-measure-"));

describe("seam-atlas measure", () => {
  it("prints the JSON keys scripts rely on, with 360 timeline samples per side and an echo of the inputs with units", () => {
    const r = runCli(["measure", "--axis", "waist-A", "--gyro", "5", "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    for (const k of ["seamInBand", "sides", "asymmetry", "crossingsPerRevolution", "timeline", "input", "version"]) expect(j).toHaveProperty(k);
    for (const k of ["axisPlus", "axisMinus", "magnusPlus", "magnusMinus"]) expect(typeof j.sides[k]).toBe("number");
    for (const k of ["alongAxis", "alongMagnus", "magnitude"]) expect(typeof j.asymmetry[k]).toBe("number");
    expect(j.timeline.axisPlus).toHaveLength(360);
    expect(j.timeline.axisMinus).toHaveLength(360);
    expect(j.input).toMatchObject({ axis: "waist-A", gyroDeg: 5, bandCenterDeg: 100, bandWidthDeg: 40, seamPoints: 2048 });
    expect(j.crossingsPerRevolution).toBe(4); // a waist axis is the four-seam orientation: 4 seam passes per turn (Nathan, Am. J. Phys. 76(2), 2008)
  });

  it("gives the same numbers for a landmark, its vector and its latitude/longitude", () => {
    const a = JSON.parse(runCli(["measure", "--axis", "node-2", "--json"]).stdout);
    const b = JSON.parse(runCli(["measure", "--axis", "0,3,0", "--json"]).stdout);
    const c = JSON.parse(runCli(["measure", "--axis", "0N,90E", "--json"]).stdout);
    expect(Math.abs(a.seamInBand - b.seamInBand)).toBeLessThan(1e-12);
    expect(Math.abs(a.seamInBand - c.seamInBand)).toBeLessThan(1e-12);
  });

  it("prints a readable table with units and a text plot", () => {
    const r = runCli(["measure", "--axis", "30N,40E"]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/seam in band, turn average\s+\d+\.\d\d %/);
    expect(r.stdout).toMatch(/crossings per revolution\s+4/);
    expect(r.stdout).toMatch(/axis side \+  \|.{72}\|/u);
  });

  it("runs the demo and writes its JSON whole", () => {
    const out = join(tmp, "demo.json");
    const r = runCli(["measure", "--demo", "--out", out]);
    expect(r.code).toBe(0);
    const j = JSON.parse(readFileSync(out, "utf8"));
    expect(j.orientations.length).toBeGreaterThanOrEqual(4);
  });

  const bad: [string, string[], RegExp][] = [
    ["a zero vector", ["--axis", "0,0,0"], /--axis "0,0,0" is a zero vector/],
    ["a malformed vector", ["--axis", "1,2"], /--axis "1,2" has 2 part/],
    ["NaN in a vector", ["--axis", "1,NaN,0"], /--axis "1,NaN,0": part 2 "NaN" is not a number/],
    ["an unknown landmark", ["--axis", "horseshoe"], /not a landmark/],
    ["a NaN gyro", ["--axis", "waist-A", "--gyro", "abc"], /--gyro "abc" is not a decimal number; expected degrees/],
    ["|gyro| = 90", ["--axis", "waist-A", "--gyro", "90"], /--gyro 90 deg is out of range/],
    ["a band centre outside the model's range", ["--axis", "waist-A", "--band-center", "170", "--band-width", "30"], /--band-center 170 deg is out of range; expected 60 to 140 deg/],
    ["a band reaching below the trip zone", ["--axis", "waist-A", "--band-center", "62", "--band-width", "30"], /band/],
    ["a negative band width", ["--axis", "waist-A", "--band-width", "-5"], /--band-width -5 deg is out of range/],
    ["b outside its range", ["--axis", "waist-A", "--seam-shape", "0.6"], /seam shape b = 0.6 is outside \(0, 0.5\)/],
    ["seam points not a multiple of 4", ["--axis", "waist-A", "--seam-points", "1001"], /seam points 1001 must be/],
    ["an unknown option", ["--axis", "waist-A", "--spin-rate", "2000"], /unknown option --spin-rate for measure; see seam-atlas measure --help/],
    ["a missing axis", [], /--axis is missing/],
    ["an option without its value", ["--axis"], /--axis is given without a value; see seam-atlas measure --help/],
  ];
  for (const [what, args, message] of bad) {
    it(`rejects ${what}: one line on stderr, exit 2, no stack trace, no partial file`, () => {
      const out = join(tmp, `bad-${what.replace(/\W+/g, "-")}.json`);
      const r = runCli(["measure", ...args, "--out", out]);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(r.stderr.trim().split("\n")).toHaveLength(1);
      expect(r.stderr).not.toMatch(/\n\s+at /);
      expect(r.stdout).toBe("");
      expect(existsSync(out)).toBe(false);
    });
  }

  it("leaves no temporary file behind after a successful write", () => {
    const out = join(tmp, "ok.json");
    expect(runCli(["measure", "--axis", "lobe-B1", "--out", out]).code).toBe(0);
    expect(readdirSync(tmp).filter((f) => f.endsWith(".tmp"))).toEqual([]);
  });

  it("fails with exit 2 and one line when the output folder cannot be written", () => {
    const blocker = join(tmp, "a-file");
    writeFileSync(blocker, "not a folder");
    const r = runCli(["measure", "--axis", "lobe-B1", "--out", join(blocker, "x.json")]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
  });

  it("fails at once with exit 2 and one line when the output folder cannot be created (a path under /proc)", () => {
    const r = runCli(["measure", "--axis", "lobe-B1", "--out", "/proc/seam-atlas-no/x.json"]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--out "\/proc\/seam-atlas-no\/x.json": cannot create the folder "\/proc\/seam-atlas-no"/);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
  });

  it("answers --help with exit 0", () => {
    const h = runCli(["measure", "--help"]);
    expect(h.code).toBe(0);
    expect(h.stdout).toMatch(/--band-center/);
  });
});
