import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { seamModel } from "../../src/physics/seamModel/model.js";
import { runCli } from "../support/cli.js";
import { itWithPoppler, pdfPages, pdfText } from "../support/poppler.js";
import { plantedSession, sessionCsv, type PlantedType } from "../support/session.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-explain-"));
const CACHE = join(tmp, "cache");
const SINKER = ["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--gyro", "10", "--want", "arm"];
const one = (args: string[]) => {
  const r = runCli(["explain", ...args, "--json", "--cache", CACHE]);
  expect(r.stderr).toBe("");
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout);
};

describe("seam-atlas explain, one pitch", () => {
  it("names the basis and the window, echoes the signed gyro, and gives residual = observed - predicted to 1e-9 in [definition: README, For analysts]", () => {
    const j = one([...SINKER, "--move-arm", "15", "--move-up", "9"]);
    expect(j.settings.basis).toBe("trade");
    expect(j.settings.windowFt).toBeCloseTo(50, 9);
    expect(j.basis).toBe("trade");
    expect(j.windowFt).toBeCloseTo(50, 9);
    expect(j.input.pitch.gyroDeg).toBe(10);
    expect(j.residual.armSideIn).toBeCloseTo(15 - j.predicted.armSideIn, 9);
    expect(j.residual.upIn).toBeCloseTo(9 - j.predicted.upIn, 9);
    expect(j.matches).toHaveLength(3);
    expect(j.matches[0].fitErrorIn).toBeLessThanOrEqual(j.matches[1].fitErrorIn);
    expect(typeof j.direction.spinBased).toBe("string");
    const release = one([...SINKER, "--move-arm", "15", "--move-up", "9", "--movement-basis", "release"]);
    expect(release.basis).toBe("release");
    expect(release.windowFt).toBeNull();
    const forty = one([...SINKER, "--move-arm", "15", "--move-up", "9", "--window-ft", "40"]);
    expect(forty.windowFt).toBeCloseTo(40, 9);
    expect(forty.predicted.upIn).toBeLessThan(j.predicted.upIn);
  });

  it("--move-right is toward the catcher's right: -15 for a right-hander and +15 for a left-hander are both 15 in to the arm side [geometry/frames.ts: the arm side is -x for a right-hander, +x for a left-hander]", () => {
    const arm = one([...SINKER, "--move-arm", "15", "--move-up", "9"]);
    const right = one([...SINKER, "--move-right", "-15", "--move-up", "9"]);
    expect(right.residual).toEqual(arm.residual);
    const lefty = ["--hand", "L", "--speed", "92", "--spin", "2150", "--tilt", "10:15", "--gyro", "-10"];
    const lArm = one([...lefty, "--move-arm", "15", "--move-up", "9"]);
    const lRight = one([...lefty, "--move-right", "15", "--move-up", "9"]);
    expect(lRight.residual).toEqual(lArm.residual);
    expect(lArm.input.pitch.hand).toBe("left");
    // the mirror image of the right-hander's pitch: same numbers (x -> -x, gyro sign reversed)
    expect(lArm.residual.armSideIn).toBeCloseTo(arm.residual.armSideIn, 6);
    expect(lArm.residual.upIn).toBeCloseTo(arm.residual.upIn, 6);
  });

  it("--tilt-deg 52.5 is --tilt 1:45 (one degree is two minutes of clock), and a catcher's 10:15 is the pitcher's 1:45 [README, For analysts; geometry/frames.ts]", () => {
    const clock = one([...SINKER, "--move-arm", "15", "--move-up", "9"]);
    const deg = one(["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt-deg", "52.5", "--gyro", "10", "--move-arm", "15", "--move-up", "9"]);
    expect(deg.residual).toEqual(clock.residual);
    expect(deg.input.pitch.tilt).toBe("1:45");
    expect(deg.input.pitch.tiltDeg).toBe(52.5);
    const catcher = one(["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "10:15", "--view", "catcher", "--gyro", "10", "--move-arm", "15", "--move-up", "9"]);
    expect(catcher.residual.armSideIn).toBeCloseTo(clock.residual.armSideIn, 9);
    // each output reads the clock in the pitch's own view
    expect(catcher.direction.spinBased).not.toBe(clock.direction.spinBased);
  });

  it("spin efficiency with --gyro-sign neg is the negative gyro: 98.4807753 % is cos 10 deg [geometry/frames.ts: efficiency = cos gyro]", () => {
    const gyro = one(["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--gyro", "-10", "--move-arm", "15", "--move-up", "9"]);
    const eff = one(["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--efficiency", "98.4807753", "--gyro-sign", "neg", "--move-arm", "15", "--move-up", "9"]);
    expect(eff.input.pitch.gyroDeg).toBeCloseTo(-10, 6);
    expect(eff.residual.armSideIn).toBeCloseTo(gyro.residual.armSideIn, 4);
  });
});

describe("seam-atlas explain, a batch", () => {
  it("reads the user's own headers through --columns (km/h, cm, R/L, efficiency with its sign column), ignores extra columns, and skips a row with efficiency but no sign, naming its line [README, For analysts]", () => {
    const csv = join(tmp, "export.csv");
    writeFileSync(
      csv,
      [
        "Pitcher,Type,Throws,Velo,Spin,Axis,Eff,Sign,IVB,HB,Notes",
        "A,SI,R,148.0596,2150,1:45,98.4807753,neg,22.86,-38.1,first",
        "A,SI,R,148.0596,2150,1:45,98.4807753,,22.86,-38.1,no sign",
        "B,SI,L,148.0596,2150,10:15,98.4807753,pos,22.86,38.1,mirror",
      ].join("\n") + "\n",
    );
    const out = join(tmp, "export-out.csv");
    const r = runCli([
      "explain", "--csv-in", csv, "--out", out, "--cache", CACHE,
      "--columns", "pitcher=Pitcher,pitch=Type,hand=Throws,speed_kmh=Velo,spin_rpm=Spin,tilt=Axis,efficiency_pct=Eff,gyro_sign=Sign,move_up_cm=IVB,move_right_cm=HB",
    ]);
    expect(r.code).toBe(0);
    const skipped = r.stderr.trim().split("\n");
    expect(skipped).toHaveLength(1);
    expect(skipped[0]).toMatch(/^seam-atlas: skipped --csv-in ".*export\.csv" line 3, column "Eff" \(efficiency_pct\): spin efficiency 98\.4807753 % has no gyro sign; expected column "Sign" \(gyro_sign\) pos .* or neg, or a signed column "gyro_deg"$/);
    const rows = readFileSync(out, "utf8").trim().split("\n").map((l) => l.split(","));
    const head = rows[0];
    const col = (row: string[], name: string) => row[head.indexOf(name)];
    expect(rows).toHaveLength(3);
    // echoed in our units, rounded for people: 148.0596 km/h = 92.0 mph (1 mph = 1.609344 km/h, NIST SP 811), 22.86 cm = 9.0 in
    expect(col(rows[1], "speed_mph")).toBe("92");
    expect(col(rows[1], "gyro_deg")).toBe("-10");
    expect(col(rows[1], "observed_up_in")).toBe("9");
    // toward the catcher's right -38.1 cm for a right-hander is 15 in to the arm side
    expect(col(rows[1], "observed_arm_in")).toBe("15");
    expect(col(rows[2], "observed_arm_in")).toBe("15");
    expect(col(rows[1], "basis")).toBe("trade");
    expect(col(rows[1], "window_ft")).toBe("50");
    // every number written to 0.1 at most, clock readings to the minute
    for (const name of ["predicted_arm_in", "residual_up_in", "match1_fit_error_in", "gap_deg"]) expect(col(rows[1], name)).toMatch(/^-?\d+(\.\d)?$/);
    expect(col(rows[1], "spin_clock")).toMatch(/^\d{1,2}:\d\d$/);
  });

  it("--summary fits one orientation per pitcher and pitch type, JSON as documented; --threads 2 writes the same bytes as --threads 0 [README, For analysts; determinism]", () => {
    const types: PlantedType[] = [
      { pitcher: "Iris Talvela", pitch: "sinker", hand: "right", speedMph: 92, spinRpm: 2150, tilt: "1:45", gyroDeg: 10, latLon: [30, 100] },
      { pitcher: "Iris Talvela", pitch: "four-seam", hand: "right", speedMph: 94, spinRpm: 2350, tilt: "12:45", gyroDeg: 5, latLon: [5, 40] },
      { pitcher: "Luz Arrieta", pitch: "curveball", hand: "left", speedMph: 78, spinRpm: 2600, tilt: "5:00", gyroDeg: 15, latLon: [-40, 150] },
    ];
    const csv = join(tmp, "session.csv");
    writeFileSync(csv, sessionCsv(plantedSession(types, 12, seamModel(), 5, 0.1)));
    const run = (threads: string, stem: string) => {
      const r = runCli(["explain", "--csv-in", csv, "--out", join(tmp, `${stem}.csv`), "--summary", join(tmp, `${stem}.json`), "--threads", threads, "--cache", CACHE]);
      expect(r.stderr).toBe("");
      expect(r.code).toBe(0);
      return r;
    };
    run("0", "s0");
    const r2 = run("2", "s2");
    expect(r2.stdout).toMatch(/2 worker threads/);
    expect(readFileSync(join(tmp, "s2.csv"))).toEqual(readFileSync(join(tmp, "s0.csv")));
    const doc = JSON.parse(readFileSync(join(tmp, "s0.json"), "utf8"));
    expect(readFileSync(join(tmp, "s2.json"), "utf8")).toBe(readFileSync(join(tmp, "s0.json"), "utf8"));
    expect(doc.settings.basis).toBe("trade");
    expect(doc.pitches.map((p: { pitcher: string; pitch: string; rows: number }) => `${p.pitcher}/${p.pitch}/${p.rows}`)).toEqual(["Iris Talvela/sinker/12", "Iris Talvela/four-seam/12", "Luz Arrieta/curveball/12"]);
    for (const p of doc.pitches) {
      expect(p.orientations.length).toBeGreaterThan(0);
      expect(p.orientations[0].axis).toHaveLength(3);
      expect(typeof p.orientations[0].latLon).toBe("string");
      expect(p.orientations[0].fitErrorIn).toBeLessThan(0.5);
      expect(typeof p.residual.armSideIn).toBe("number");
      expect(typeof p.residual.verticalIn).toBe("number");
    }
  }, 120_000);

  itWithPoppler("--report writes the bullpen report: a cover and two pages per pitcher, the basis, the pitchers, the charts' words and the caution on every page; --report-svg and --report-png write each chart [pdfinfo, pdftotext; PNG, ISO/IEC 15948 sec. 11.2.2]", () => {
    const csv = join(tmp, "session.csv");
    if (!existsSync(csv)) writeFileSync(csv, sessionCsv(plantedSession([{ pitcher: "Iris Talvela", pitch: "sinker", hand: "right", speedMph: 92, spinRpm: 2150, tilt: "1:45", gyroDeg: 10, latLon: [30, 100] }], 12, seamModel(), 5, 0.1)));
    const pdf = join(tmp, "bullpen.pdf");
    const svgDir = join(tmp, "charts");
    const pngDir = join(tmp, "pngs");
    const r = runCli(["explain", "--csv-in", csv, "--out", join(tmp, "r.csv"), "--report", pdf, "--report-svg", svgDir, "--report-png", pngDir, "--cache", CACHE]);
    expect(r.code).toBe(0);
    const pitchers = new Set(readFileSync(csv, "utf8").trim().split("\n").slice(1).map((l) => l.split(",")[0]));
    const pages = pdfPages(pdf);
    expect(pages).toBe(1 + 2 * pitchers.size);
    const all = pdfText(pdf).replace(/\s+/g, " ");
    expect(all).toContain("Bullpen report");
    expect(all).toContain("trade basis: induced vertical and horizontal break over the last 50 ft");
    for (const p of pitchers) expect(all).toContain(`${p}: movement and direction`);
    expect(all).toContain("horizontal break toward the arm side, in");
    expect(all).toContain("spin-based direction (Magnus alone), clock");
    expect(all).toContain("best orientations");
    for (let page = 1; page <= pages; page++) expect(pdfText(pdf, page).replace(/\s+/g, " ")).toContain("Caution: pitching can injure");
    const svgs = readdirSync(svgDir).sort();
    expect(svgs).toHaveLength(2 * pitchers.size);
    expect(svgs).toContain("Iris-Talvela-movement.svg");
    expect(readFileSync(join(svgDir, "Iris-Talvela-direction.svg"), "utf8")).toMatch(/^<svg[^>]*viewBox="0 0 520 470"/);
    // the same charts as PNG, named like the SVG files; the IHDR chunk holds width and height (PNG spec, sec. 11.2.2)
    expect(readdirSync(pngDir).sort()).toEqual(svgs.map((f) => f.replace(/\.svg$/, ".png")).sort());
    const png = readFileSync(join(pngDir, "Iris-Talvela-movement.png"));
    expect(png.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
    expect(png.toString("latin1", 12, 16)).toBe("IHDR");
    expect(png.readUInt32BE(16)).toBe(1600);
    // the chart's aspect ratio, 520 x 470 (to the pixel)
    expect(Math.abs(png.readUInt32BE(20) - Math.round((1600 * 470) / 520))).toBeLessThanOrEqual(1);
  }, 120_000);

  it("with --on-bad-row stop, stops at the bad row with exit 2 and writes nothing, replacing no file [README, Bad input]", () => {
    const csv = join(tmp, "session2.csv");
    writeFileSync(csv, "hand,speed_mph,spin_rpm,tilt,move_arm_in,move_up_in\nright,92,2150,1:45,16,12\nright,92,2150,25:00,16,12\nright,92,2150,1:45,16,12\n");
    const out = join(tmp, "session2.json");
    const summary = join(tmp, "session2-summary.json");
    writeFileSync(out, "an earlier run's output\n");
    const r = runCli(["explain", "--csv-in", csv, "--out", out, "--summary", summary, "--on-bad-row", "stop", "--cache", CACHE]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/stopped at .*line 3.*nothing written/);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(readFileSync(out, "utf8")).toBe("an earlier run's output\n");
    expect(existsSync(summary)).toBe(false);
  });
});
