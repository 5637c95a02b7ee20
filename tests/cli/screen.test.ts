import { existsSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { ROOT, runCli } from "../support/cli.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-screen-"));
const SINKER = ["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--gyro", "10", "--want", "arm"];

describe("seam-atlas screen", () => {
  it("prints JSON with candidates, references, grid and the echo of the inputs", () => {
    const r = runCli(["screen", ...SINKER, "--top", "3", "--json", "--grid", "4"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.grid.spacingDeg).toBe(4);
    expect(j.grid.count).toBeGreaterThan(2000);
    expect(j.input.pitch).toMatchObject({ hand: "right", speedMph: 92, spinRpm: 2150, tilt: "1:45", view: "pitcher", gyroDeg: 10, want: "arm" });
    expect(j.candidates.length).toBeGreaterThanOrEqual(1);
    for (const c of [...j.candidates, ...j.references]) {
      for (const k of ["axis", "latLon", "landmark", "score", "seamMovement", "seamForce", "occupancy", "crossingsPerRevolution", "robustness", "fingers"]) expect(c).toHaveProperty(k);
      for (const k of ["armSideIn", "verticalIn", "clock", "towardWantIn"]) expect(c.seamMovement).toHaveProperty(k);
      // the score is the seam movement toward the wanted direction: the arm side for --want arm
      expect(c.score).toBe(c.seamMovement.armSideIn);
      expect(c.robustness).toHaveProperty("meanIn");
      expect(c.robustness).toHaveProperty("p10In");
      expect(c.fingers.map((f: { finger: string }) => f.finger)).toEqual(["index", "middle", "thumb"]);
    }
    expect(j.references.map((x: { reference: string }) => x.reference)).toEqual(["four-seam", "two-seam"]);
    expect(j.reach.wantPct).toBeGreaterThan(5);
    expect(j.input.model.hash).toMatch(/^[0-9a-f]{8}$/);
    expect(j.input.windowFt).toBe(50);
  });

  it("gives the same numbers in CSV, the table and JSON: the CSV and the table as the terminal rounds them (0.1 in), JSON in full", () => {
    const j = JSON.parse(runCli(["screen", ...SINKER, "--grid", "4", "--json"]).stdout);
    const csv = runCli(["screen", ...SINKER, "--grid", "4", "--csv"]).stdout.trim().split("\n");
    const head = csv[0].split(",");
    expect(head).toEqual(expect.arrayContaining(["toward_want_in", "seam_arm_in", "seam_up_in", "robust_p10_in", "lat_deg", "model_hash"]));
    const first = csv[1].split(",");
    const c = j.candidates[0];
    const at = (key: string) => first[head.indexOf(key)];
    expect(at("row")).toBe("candidate");
    expect(at("rank")).toBe("1");
    expect(at("toward_want_in")).toBe(Number(c.score.toFixed(1)).toString());
    expect(Math.abs(Number(at("toward_want_in")) - c.score)).toBeLessThanOrEqual(0.05 + 1e-12);
    expect(Math.abs(Number(at("seam_arm_in")) - c.seamMovement.armSideIn)).toBeLessThanOrEqual(0.05 + 1e-12);
    expect(at("seam_clock")).toBe(c.seamMovement.clock);
    const table = runCli(["screen", ...SINKER, "--grid", "4"]).stdout;
    const shown = c.score.toFixed(1);
    expect(table).toContain(`${c.score >= 0 ? "+" : ""}${shown}`);
    expect(table).toContain(c.seamMovement.clock);
    // the reference holds follow the candidates, named in the row column
    expect(csv.slice(1).map((l) => l.split(",")[head.indexOf("row")]).slice(-2)).toEqual(["four-seam", "two-seam"]);
  });

  it("screens the demo staff from its file and writes the sphere maps, one per pitch, named PITCHER-PITCH", () => {
    const dir = join(tmp, "maps");
    const r = runCli(["screen", "--demo", "--grid", "6", "--top", "2", "--json", "--map", dir]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.pitches.length).toBe(6);
    const m = JSON.parse(readFileSync(join(dir, "Iris-Talvela-sinker.json"), "utf8"));
    expect(m.cells.length).toBe(m.count);
    expect(m.columns).toContain("scoreIn");
    // the score of a wanted arm-side push is the cell's arm-side seam movement
    const is = m.columns.indexOf("scoreIn");
    const iarm = m.columns.indexOf("seamArmSideIn");
    for (const c of m.cells) expect(c[is]).toBe(c[iarm]);
    expect(m.model.hash).toMatch(/^[0-9a-f]{8}$/);
  });

  it("selects one pitch of a staff by name", () => {
    const j = JSON.parse(runCli(["screen", "--demo", "--pitch-name", "Luz Arrieta/curveball", "--grid", "6", "--json"]).stdout);
    expect(j.pitches).toHaveLength(1);
    expect(j.pitches[0].input.pitch.hand).toBe("left");
  });

  const write = (name: string, text: string) => {
    const p = join(tmp, name);
    writeFileSync(p, text);
    return p;
  };
  const staff = (pitch: string) => `{\n  "pitchers": [\n    {\n      "name": "A. Tester",\n      "hand": "right",\n      "pitches": [\n        ${pitch}\n      ]\n    }\n  ]\n}\n`;
  const badFiles: [string, string, RegExp][] = [
    ["malformed JSON", `{\n  "pitchers": [\n    { "name": "x", }\n  ]\n}`, /^seam-atlas: --pitch ".*" line 3: "}" where a key should be; expected a key in double quotes$/m],
    ["a missing field", staff(`{ "name": "sinker", "spinRpm": 2150, "tilt": "1:45" }`), /line 7 .*"speedMph" is missing/],
    ["wrong units", staff(`{ "name": "sinker", "speedKph": 148, "spinRpm": 2150, "tilt": "1:45" }`), /line 7 .*"speedKph" is not read; give speedMph \(mph\)/],
    ["a number as text", staff(`{ "name": "sinker", "speedMph": "92 mph", "spinRpm": 2150, "tilt": "1:45" }`), /line 7 .*"speedMph" must be a number of mph/],
    ["a bad tilt", staff(`{ "name": "sinker", "speedMph": 92, "spinRpm": 2150, "tilt": "13:45" }`), /line 7 .*tilt "13:45"/],
    ["an unknown hand", `{ "name": "x", "hand": "both", "speedMph": 92, "spinRpm": 2150, "tilt": "1:45" }`, /line 1 .*: "both" is not a throwing hand; expected right, left, R or L/],
  ];
  for (const [what, text, message] of badFiles) {
    it(`rejects a pitch file with ${what}: one line naming the field and line, exit 2`, () => {
      const out = join(tmp, `out-${what.replace(/\W+/g, "-")}.json`);
      const r = runCli(["screen", "--pitch", write(`${what.replace(/\W+/g, "-")}.json`, text), "--out", out]);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(r.stderr.trim().split("\n")).toHaveLength(1);
      expect(existsSync(out)).toBe(false);
    });
  }

  const badFlags: [string, string[], RegExp][] = [
    ["a missing spin", ["--hand", "right", "--speed", "92", "--tilt", "1:45"], /--spin is missing/],
    ["an unknown hand", ["--hand", "both", "--speed", "92", "--spin", "2150", "--tilt", "1:45"], /^seam-atlas: --hand "both" is not a throwing hand; expected right, left, R or L$/m],
    ["a speed out of range", ["--hand", "right", "--speed", "200", "--spin", "2150", "--tilt", "1:45"], /^seam-atlas: --speed 200 is out of range; expected 30 to 110 mph$/m],
    ["gyro and efficiency together", [...SINKER, "--efficiency", "90"], /--gyro or --efficiency, not both/],
    ["an unknown pitch name", ["--demo", "--pitch-name", "knuckler"], /--pitch-name "knuckler" is not in .*expected one of/],
    ["a bad rank", [...SINKER, "--rank", "best"], /--rank "best" is not one of blend, strength, robust/],
    ["a missing pitch file", ["--pitch", "/nonexistent/staff.json"], /--pitch "\/nonexistent\/staff.json": cannot read the file: no such file or folder/],
  ];
  for (const [what, args, message] of badFlags) {
    it(`rejects ${what}: one line, exit 2`, () => {
      const r = runCli(["screen", ...args]);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(r.stderr.trim().split("\n")).toHaveLength(1);
    });
  }
});

describe("screen --csv --out", () => {
  it("writes the CSV it prints to the file, and --out - prints it once [README, screen: --out writes the JSON, or the CSV with --csv]", () => {
    const file = join(tmp, "grips.csv");
    const printed = runCli(["screen", ...SINKER, "--grid", "6", "--top", "2", "--csv", "--out", file]);
    expect(printed.code, printed.stderr).toBe(0);
    expect(readFileSync(file, "utf8")).toBe(printed.stdout);
    const once = runCli(["screen", ...SINKER, "--grid", "6", "--top", "2", "--csv", "--out", "-"]);
    expect(once.stdout).toBe(printed.stdout);
    expect(printed.stdout.split("\n")[0]).toMatch(/^pitcher,pitch,hand,want,row,rank,/);
  });
});

describe("README's table of what the defaults give", () => {
  it("prints the demo staff's numbers exactly as screen --demo --json rounds them: toward the wanted direction, the size in brackets [README, The seam-force model; one number in every output]", () => {
    const readme = readFileSync(join(ROOT, "README.md"), "utf8");
    const rows = readme.split("\n").filter((l) => /^\| [RL]HP /.test(l));
    const j = JSON.parse(runCli(["screen", "--demo", "--json"]).stdout);
    expect(rows).toHaveLength(j.pitches.length);
    const signed = (x: number) => `${x >= 0 ? "+" : "-"}${Math.abs(x).toFixed(1)}`;
    const cell = (o: { score: number; seamMovement: { armSideIn: number; verticalIn: number } }) => `${signed(o.score)} (${Math.hypot(o.seamMovement.armSideIn, o.seamMovement.verticalIn).toFixed(1)}`;
    j.pitches.forEach((p: { input: { pitch: { name: string; want: string } }; candidates: never[]; references: { reference: string }[] }, i: number) => {
      const cells = rows[i].split("|").map((c) => c.trim());
      expect(cells[1]).toContain(p.input.pitch.name);
      expect(cells[2]).toBe(p.input.pitch.want);
      expect(cells[3].startsWith(cell(p.candidates[0]))).toBe(true);
      expect(cells[4].startsWith(cell(p.references.find((r) => r.reference === "two-seam") as never))).toBe(true);
      expect(cells[5].startsWith(cell(p.references.find((r) => r.reference === "four-seam") as never))).toBe(true);
    });
  });
});
