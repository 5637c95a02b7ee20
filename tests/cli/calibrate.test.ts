import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEG, M_PER_IN } from "../../geometry/units.js";
import { normalStream, syntheticLabRows, unitSeamMovementArmSide, type SyntheticLabRow } from "../../src/physics/calibrate/index.js";
import { instantAtPhase, resolveProfile, seamModel, turnAverage } from "../../src/physics/seamModel/index.js";
import { buildPitch } from "../../src/jobs/request/pitch.js";
import { lcg, randomUnit } from "../support/random.js";
import { runCli } from "../support/cli.js";

const dir = mkdtempSync(join(tmpdir(), "seam-atlas-calibrate-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const at = (name: string) => join(dir, name);

/** The planted truth: invented values inside the parameter table's ranges. */
const PLANTED = resolveProfile({ name: "planted", parameters: { scale: 0.6, wakePressureCoefficient: -0.35, laminarSeparationDeg: 82 } }, "test");
const NOISE_N = 0.01;
const LAB_HEADER = "axis_x,axis_y,axis_z,gyro_deg,phase_deg,speed_mph,spin_rpm,force_magnus_n,force_across_n";

function labLine(r: SyntheticLabRow): string {
  return [...r.axisBall, r.gyroDeg, r.phaseDeg ?? "", r.speedMph, 2000, r.forceAlongMagnusN, r.forceAcrossN].join(",");
}

function writeLab(name: string, rows: readonly SyntheticLabRow[], extra: string[] = []): string {
  writeFileSync(at(name), [LAB_HEADER, ...rows.map(labLine), ...extra].join("\n") + "\n");
  return at(name);
}

/** A CSV of the residuals file, by column name. */
function readResiduals(path: string): Record<string, string>[] {
  const [head, ...lines] = readFileSync(path, "utf8").trim().split("\n");
  const names = head.split(",");
  return lines.map((l) => Object.fromEntries(l.split(",").map((c, i) => [names[i], c])));
}

// 300 rows over random axes, gyros within +-45 deg, phases, a quarter turn-averaged; one more at a whole-degree phase
const ROWS = syntheticLabRows({ profile: PLANTED, count: 300, seed: 31, noiseN: NOISE_N, turnAveragedShare: 0.25 });
const PHASED: SyntheticLabRow[] = syntheticLabRows({ profile: PLANTED, count: 1, seed: 32, noiseN: 0, turnAveragedShare: 0 }).map((r) => {
  // an orientation read at phase 30 deg exactly (no noise), so `force`'s one-degree timeline has it
  const c = instantAtPhase(seamModel(PLANTED), r.axisBall, r.gyroDeg * DEG, 30 * DEG);
  const q = r.observation.dynamicForceN;
  return { ...r, phaseDeg: 30, forceAlongMagnusN: q * c.alongMagnus, forceAcrossN: q * c.across };
});

describe("seam-atlas calibrate", () => {
  const lab = writeLab("lab.csv", [...ROWS, ...PHASED]);
  const profile = at("fitted.json");
  const residuals = at("residuals.csv");
  let run: ReturnType<typeof runCli>;
  beforeAll(() => {
    run = runCli(["calibrate", "--lab", lab, "--fit", "scale,wakePressureCoefficient,laminarSeparationDeg", "--sigma-n", String(NOISE_N), "--out", profile, "--residuals", residuals, "--json"]);
  }, 120_000);

  it("fits a planted profile (scale 0.6, wakePressureCoefficient -0.35, laminarSeparationDeg 82) from 301 noisy lab rows to within 3 sigma each, and reports it as JSON", () => {
    expect(run.stderr).toBe("");
    expect(run.code).toBe(0);
    const j = JSON.parse(run.stdout);
    expect(j.tool).toBe("seam-atlas");
    expect(j.command).toBe("calibrate");
    expect(j.input.fit).toEqual(["laminarSeparationDeg", "wakePressureCoefficient", "scale"]);
    expect(j.rows).toBe(301);
    expect(j.rowsByKind).toEqual({ lab: 301, labTurnAveraged: 75, tracked: 0 });
    expect(j.notIdentified).toEqual([]);
    for (const p of j.parameters) {
      expect(Object.keys(p)).toEqual(expect.arrayContaining(["name", "value", "uncertainty", "unit", "atBound"]));
      expect(p.atBound).toBe(false);
      expect(Math.abs(p.value - PLANTED.values[p.name as keyof typeof PLANTED.values]), `${p.name} ${p.value} +- ${p.uncertainty}`).toBeLessThan(3 * p.uncertainty);
    }
    expect(j.rmsBeforeN).toBeGreaterThan(5 * NOISE_N);
    expect(j.rmsAfterN).toBeLessThan(1.1 * NOISE_N);
    expect(j.rmsBeforeIn).toBeNull();
    expect(j.profile.name).toBe("calibrated");
    expect(j.profile.hash).toMatch(/^[0-9a-f]{8}$/);
    expect(j.method.uncertainty).toMatch(/Gauss-Newton covariance/);
  });

  it("writes a profile that loads with --model and reproduces the fitted forces (turn-averaged and at one phase) to 1e-9 N", () => {
    const doc = JSON.parse(readFileSync(profile, "utf8"));
    expect(Object.keys(doc)).toEqual(["name", "parameters"]);
    const fitted = readResiduals(residuals);
    expect(fitted).toHaveLength(301);
    const k = ROWS.findIndex((r) => r.phaseDeg === undefined);
    for (const [row, line] of [
      [ROWS[k], fitted[k]],
      [PHASED[0], fitted[300]],
    ] as const) {
      const f = runCli(["force", `--axis=${row.axisBall.join(",")}`, `--gyro=${row.gyroDeg}`, `--speed=${row.speedMph}`, "--model", profile, "--json"]);
      expect(f.code).toBe(0);
      const j = JSON.parse(f.stdout);
      expect(j.input.model.hash).toBe(JSON.parse(run.stdout).profile.hash);
      const got = row.phaseDeg === undefined ? j.turnAverage : j.timeline[row.phaseDeg];
      expect(Math.abs(got.alongMagnusN - Number(line.fitted_magnus_n))).toBeLessThan(1e-9);
      expect(Math.abs(got.acrossN - Number(line.fitted_across_n))).toBeLessThan(1e-9);
    }
  });

  it("with --fit scale alone gives the closed form, the least-squares slope through the origin sum(u y) / sum(u^2) of the measured forces y on the start's (scale 1) predictions u (Draper & Smith, regression through the origin)", () => {
    const out = at("scale-only.csv");
    const r = runCli(["calibrate", "--lab", lab, "--fit", "scale", "--residuals", out, "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.method.search).toBe("closed form");
    let uy = 0, uu = 0;
    for (const line of readResiduals(out)) {
      for (const c of ["magnus", "across"]) {
        uy += Number(line[`start_${c}_n`]) * Number(line[`measured_${c}_n`]);
        uu += Number(line[`start_${c}_n`]) ** 2;
      }
    }
    expect(Math.abs(j.parameters[0].value / (uy / uu) - 1)).toBeLessThan(1e-12);
  });

  it("prints a short table on the terminal: each parameter with start, fitted value and 1 sigma, the rms force before and after", () => {
    const r = runCli(["calibrate", "--lab", lab, "--fit", "scale,laminarSeparationDeg"]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/laminarSeparationDeg\s+80\.00\s+\d+\.\d\d\s+\d+\.\d\d\s+deg/);
    expect(r.stdout).toMatch(/scale\s+1\.0000\s+0\.\d{4}\s+0\.\d{4}\s+1/);
    expect(r.stdout).toMatch(/rms force\s+0\.\d{4} N before, 0\.\d{4} N after/);
    expect(r.stdout.split("\n").length).toBeLessThan(20);
  });

  it("fits tracked pitches' seam movement (planted scale 0.6, 30 pitches, 0.3 in of noise), alone and with the lab rows", () => {
    const planted = resolveProfile({ name: "scale", parameters: { scale: 0.6 } }, "test");
    const model = seamModel(planted);
    const rnd = lcg(41);
    const normal = normalStream(42);
    const lines = ["pitcher,pitch,hand,speed_mph,spin_rpm,tilt,view,gyro_deg,axis_x,axis_y,axis_z,seam_arm_in,seam_up_in"];
    for (let i = 0; i < 30; i++) {
      const raw = { hand: rnd() < 0.5 ? "right" : "left", speedMph: 80 + 15 * rnd(), spinRpm: 1800 + 800 * rnd(), tilt: `${1 + Math.floor(3 * rnd())}:${10 + Math.floor(40 * rnd())}`, gyroDeg: -20 + 40 * rnd() };
      const { pitch } = buildPitch(raw, (f) => f);
      const axis = randomUnit(rnd);
      const J = unitSeamMovementArmSide(pitch, model);
      const c = turnAverage(model, axis, pitch.gyroRad);
      const arm = (c.across * J.acrossArmSideM + c.alongMagnus * J.alongMagnusArmSideM) / M_PER_IN + 0.3 * normal();
      const up = (c.across * J.acrossUpM + c.alongMagnus * J.alongMagnusUpM) / M_PER_IN + 0.3 * normal();
      lines.push(["Iris", `p${i}`, raw.hand, raw.speedMph, raw.spinRpm, raw.tilt, "pitcher", raw.gyroDeg, ...axis, arm, up].join(","));
    }
    writeFileSync(at("tracked.csv"), lines.join("\n") + "\n");
    const r = runCli(["calibrate", "--tracked", at("tracked.csv"), "--fit", "scale", "--sigma-in", "0.3", "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(Math.abs(j.parameters[0].value - 0.6)).toBeLessThan(3 * j.parameters[0].uncertainty);
    expect(j.rmsAfterIn).toBeLessThan(0.4);
    expect(j.rmsBeforeN).toBeNull();
    const both = runCli(["calibrate", "--tracked", at("tracked.csv"), "--lab", lab, "--fit", "scale,laminarSeparationDeg", "--json"]);
    expect(both.code).toBe(0);
    expect(JSON.parse(both.stdout).rowsByKind).toEqual({ lab: 301, labTurnAveraged: 75, tracked: 30 });
  });

  it("reports bad rows with their file and line and skips them (exit 0), counting them in the report", () => {
    const good = ROWS.slice(0, 20);
    const path = writeLab("some-bad.csv", good, ["0,0,0,10,,80,2000,0.1,0.1", "0.1,0.2,0.9,10,,120,2000,0.1,0.1", "0.1,0.2,0.9,10,,80,2000,abc,0.1", '0.1,0.2,0.9,10,"5,80,2000,0.1,0.1']);
    const r = runCli(["calibrate", "--lab", path, "--fit", "scale", "--json"]);
    expect(r.code).toBe(0);
    const lines = r.stderr.trim().split("\n");
    expect(lines).toHaveLength(4);
    expect(lines[0]).toMatch(/skipped --lab ".*some-bad.csv" line 22: the axis \(0, 0, 0\) is a zero vector/);
    expect(lines[1]).toMatch(/line 23, column speed_mph: 120 mph is out of range; expected 30 to 110 mph/);
    expect(lines[2]).toMatch(/line 24, column force_magnus_n: "abc" is not a decimal number/);
    expect(lines[3]).toMatch(/line 25: .*quote/);
    const j = JSON.parse(r.stdout);
    expect(j.rows).toBe(20);
    expect(j.skippedRows).toBe(4);
  });

  it("stops with exit 2 and writes nothing when every row is bad: the skipped row reported, then one line saying so", () => {
    const out = at("never-all-bad.json");
    const r = runCli(["calibrate", "--lab", writeLab("all-bad.csv", [], ["0,0,0,10,,80,2000,0.1,0.1"]), "--fit", "scale", "--out", out]);
    expect(r.code).toBe(2);
    const lines = r.stderr.trim().split("\n");
    expect(lines).toHaveLength(2);
    expect(lines[0]).toMatch(/skipped .* line 2: the axis \(0, 0, 0\) is a zero vector/);
    expect(lines[1]).toMatch(/no rows to fit \(after skipping 1 bad row\(s\)\)/);
    expect(existsSync(out)).toBe(false);
  });

  // a good row on line 2, the row under test on line 3; stopping at the first bad row
  const TRACKED_HEADER = "hand,speed_mph,spin_rpm,tilt,axis_x,axis_y,axis_z,seam_arm_in,seam_up_in";
  const tracked = (name: string, header: string, row: string): string[] => {
    const good = header.split(",").map((c) => ({ hand: "right", speed_mph: "90", speed_kmh: "145", spin_rpm: "2200", tilt: "1:30", Axis: "1:30", tilt_deg: "45", efficiency_pct: "100", axis_x: "1" })[c] ?? "0.5");
    writeFileSync(at(name), [header, good.join(","), row].join("\n") + "\n");
    return ["--tracked", at(name), "--fit", "scale", "--on-bad-row", "stop"];
  };
  const bad: [string, () => string[], RegExp][] = [
    ["an unknown parameter in --fit", () => ["--lab", lab, "--fit", "scale,stickiness"], /--fit: "stickiness" is not a seam model parameter/],
    ["a parameter that is not calibratable", () => ["--lab", lab, "--fit", "bandWidthDeg"], /--fit: bandWidthDeg is not calibratable/],
    ["no input file", () => ["--fit", "scale"], /give --lab FILE.csv .* --tracked FILE.csv/],
    ["a missing file", () => ["--lab", at("nowhere.csv")], /--lab ".*nowhere.csv": cannot read the file/],
    ["a header without force_across_n", () => {
      writeFileSync(at("no-across.csv"), "axis_x,axis_y,axis_z,gyro_deg,phase_deg,speed_mph,spin_rpm,force_magnus_n\n1,0,0,0,,80,0,0.1\n");
      return ["--lab", at("no-across.csv")];
    }, /the header lacks column "force_across_n"/],
    ["an unknown column", () => {
      writeFileSync(at("extra.csv"), `${LAB_HEADER},speed_kph\n${labLine(ROWS[0])},100\n`);
      return ["--lab", at("extra.csv"), "--fit", "scale"];
    }, /unknown column "speed_kph"/],
    ["no rows at all", () => ["--lab", writeLab("empty.csv", [])], /no rows to fit; expected at least 6 row\(s\)/],
    ["fewer rows than parameters", () => ["--lab", writeLab("two.csv", ROWS.slice(0, 2)), "--fit", "scale,wakePressureCoefficient,laminarSeparationDeg"], /2 row\(s\) to fit 3 parameters/],
    ["a zero axis, with --on-bad-row stop", () => ["--lab", writeLab("zero.csv", ROWS.slice(0, 5), ["0,0,0,10,,80,2000,0.1,0.1"]), "--on-bad-row", "stop", "--fit", "scale"], /line 7: the axis \(0, 0, 0\) is a zero vector.*--on-bad-row stop; nothing written/],
    ["a speed of 120 mph, with --on-bad-row stop", () => ["--lab", writeLab("fast.csv", ROWS.slice(0, 5), ["0.1,0.2,0.9,10,,120,2000,0.1,0.1"]), "--on-bad-row", "stop"], /line 7, column speed_mph: 120 mph is out of range; expected 30 to 110 mph/],
    ["a value that is not finite, with --on-bad-row stop", () => ["--lab", writeLab("inf.csv", ROWS.slice(0, 5), ["0.1,0.2,0.9,10,,80,2000,Infinity,0.1"]), "--on-bad-row", "stop"], /line 7, column force_magnus_n: "Infinity" is not a number/],
    ["a gyro of 90 deg, with --on-bad-row stop", () => ["--lab", writeLab("gyro.csv", ROWS.slice(0, 5), ["0.1,0.2,0.9,90,,80,2000,0.1,0.1"]), "--on-bad-row", "stop"], /column gyro_deg: 90 deg is out of range/],
    ["a sigma of 0", () => ["--lab", lab, "--sigma-n", "0"], /--sigma-n 0 N is out of range/],
    ["the output over the input", () => ["--lab", lab, "--fit", "scale", "--residuals", lab], /--residuals ".*lab.csv" is the same file as the input --lab/],
    ["a tracked row with an unknown hand", () => tracked("hand.csv", TRACKED_HEADER, "middle,90,2200,1:30,1,0,0,1,1"), /line 3, column "hand": "middle" is not a throwing hand; expected right, left, R or L/],
    // the tracked file is read by explain's columns (README, Calibrating: tracked file), so its messages are explain's
    ["a tracked row with efficiency but no gyro sign", () => tracked("eff.csv", "hand,speed_mph,spin_rpm,tilt,efficiency_pct,axis_x,axis_y,axis_z,seam_arm_in,seam_up_in", "R,90,2200,1:30,90,1,0,0,1,1"),
      /line 3, column "efficiency_pct": spin efficiency 90 % has no gyro sign; expected column "gyro_sign" pos .* or neg, or a signed column "gyro_deg" \(stopped there/],
    // 110 mph is 177.0 km/h and 30 mph 48.3 km/h (1 mph = 1.609344 km/h, exact)
    ["a tracked speed of 190 km/h", () => tracked("kmh.csv", "hand,speed_kmh,spin_rpm,tilt,axis_x,axis_y,axis_z,seam_arm_in,seam_up_in", "L,190,2200,1:30,1,0,0,1,1"),
      /line 3, column "speed_kmh": 190 km\/h is out of range; expected 48\.3 to 177 km\/h/],
    // 30 in is 76.2 cm (1 in = 2.54 cm, exact)
    ["a tracked seam movement of 80 cm", () => tracked("cm.csv", "hand,speed_mph,spin_rpm,tilt,axis_x,axis_y,axis_z,seam_right_cm,seam_up_cm", "right,90,2200,1:30,1,0,0,80,1"),
      /line 3, column "seam_right_cm": 80 cm is out of range; expected at most 76\.2 cm either way/],
    ["a tracked tilt that is no clock reading, under a mapped header", () => [...tracked("clock.csv", "hand,speed_mph,spin_rpm,Axis,axis_x,axis_y,axis_z,seam_arm_in,seam_up_in", "right,90,2200,13:30,1,0,0,1,1"), "--columns", "tilt=Axis"],
      /line 3, column "Axis" \(tilt\): tilt "13:30" must have hours 0-12/],
    ["a tracked tilt_deg of 360", () => tracked("deg.csv", "hand,speed_mph,spin_rpm,tilt_deg,axis_x,axis_y,axis_z,seam_arm_in,seam_up_in", "right,90,2200,360,1,0,0,1,1"),
      /line 3, column "tilt_deg": 360 is out of range; expected degrees clockwise from 12:00, at least 0 and below 360/],
    ["a tracked axis cell that is not a number", () => tracked("axis.csv", TRACKED_HEADER, "right,90,2200,1:30,1,x,0,1,1"), /line 3, column "axis_y": "x" is not a decimal number/],
    ["a tracked zero axis", () => tracked("zero-axis.csv", TRACKED_HEADER, "right,90,2200,1:30,0,0,0,1,1"), /line 3: the axis \(0, 0, 0\) is a zero vector/],
    ["a tracked spin of 0", () => tracked("spin0.csv", TRACKED_HEADER, "right,90,0,1:30,1,0,0,1,1"), /line 3, column "spin_rpm": 0 rpm; expected a spin above 0/],
    ["tracked speed in both mph and km/h", () => tracked("both.csv", "hand,speed_mph,speed_kmh,spin_rpm,tilt,axis_x,axis_y,axis_z,seam_arm_in,seam_up_in", "right,90,145,2200,1:30,1,0,0,1,1"),
      /the columns "speed_mph" and "speed_kmh" both give the speed/],
    ["a --columns header the tracked file lacks", () => [...tracked("velo.csv", TRACKED_HEADER, "right,90,2200,1:30,1,0,0,1,1"), "--columns", "speed_kmh=Velo"], /the header lacks column "Velo" \(mapped to speed_kmh by --columns\)/],
    ["a tracked file without its axis", () => tracked("no-axis.csv", "hand,speed_mph,spin_rpm,tilt,axis_x,axis_y,seam_arm_in,seam_up_in", "right,90,2200,1:30,1,0,1,1"), /the header lacks column "axis_z"; expected it, or --columns axis_z=YourHeader/],
    ["--columns without --tracked", () => ["--lab", lab, "--columns", "speed_kmh=Velo"], /--columns goes with --tracked FILE.csv/],
  ];
  for (const [what, args, message] of bad) {
    it(`rejects ${what}: one line, exit 2, no file written`, () => {
      const out = at(`never-${what.replace(/\W+/g, "-")}.json`);
      const r = runCli(["calibrate", ...args(), "--out", out]);
      expect(r.code).toBe(2);
      expect(r.stderr.trim().split("\n")).toHaveLength(1);
      expect(r.stderr).toMatch(message);
      expect(r.stderr).not.toMatch(/at .*\.js:\d+/); // no stack trace
      expect(existsSync(out)).toBe(false);
    });
  }
});
