/**
 * calibrate --tracked reads tracked pitches by the columns explain reads
 * (src/jobs/trackedColumns.ts): the same rows written in every accepted convention
 * fit the same profile as the canonical form.
 */
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { DEG, M_PER_IN } from "../../geometry/units.js";
import { parseCalibrate, readCalibrationRows, runCalibrate } from "../../src/jobs/calibrate.js";
import { normalStream, unitSeamMovementArmSide } from "../../src/physics/calibrate/index.js";
import { resolveProfile, seamModel, turnAverage } from "../../src/physics/seamModel/index.js";
import { buildPitch } from "../../src/jobs/request/pitch.js";
import { lcg, randomUnit } from "../support/random.js";

const dir = mkdtempSync(join(tmpdir(), "seam-atlas-calibrate-tracked-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** km/h per mph and cm per inch: exact by the international yard and pound agreement (1959). */
const KMH_PER_MPH = 1.609344;
const CM_PER_IN = 2.54;
/**
 * Relative agreement asked of the fitted scale and each row's numbers: the conversions
 * above and the views' mirror are exact in decimal but not in binary, and acos(cos g)
 * loses a few ulps, so the rows differ in the last bits only; 1e-9 leaves room.
 */
const SAME_REL = 1e-9;

interface Row {
  hand: "right" | "left";
  speedMph: number;
  spinRpm: number;
  /** Minutes of clock past 12:00 from the pitcher's view. */
  tiltMinutes: number;
  gyroDeg: number;
  axis: [number, number, number];
  armIn: number;
  upIn: number;
}

// 12 pitches of both hands with a planted scale of 0.6 and 0.3 in of noise; gyros kept off 0 so efficiency needs its sign
const PLANTED = seamModel(resolveProfile({ name: "planted", parameters: { scale: 0.6 } }, "test"));
const rnd = lcg(71);
const normal = normalStream(72);
const ROWS: Row[] = Array.from({ length: 12 }, (_, i) => {
  const hand = i % 2 === 0 ? "right" : "left";
  const tiltMinutes = 30 + Math.floor(600 * rnd());
  const gyroDeg = (i % 3 === 0 ? -1 : 1) * (5 + 25 * rnd());
  const speedMph = 80 + 15 * rnd();
  const spinRpm = 1800 + 800 * rnd();
  const clock = `${Math.floor(tiltMinutes / 60) || 12}:${String(tiltMinutes % 60).padStart(2, "0")}`;
  const { pitch } = buildPitch({ hand, speedMph, spinRpm, tilt: clock, gyroDeg }, (f) => f);
  const axis = randomUnit(rnd);
  const J = unitSeamMovementArmSide(pitch, PLANTED);
  const c = turnAverage(PLANTED, axis, gyroDeg * DEG);
  const armIn = (c.across * J.acrossArmSideM + c.alongMagnus * J.alongMagnusArmSideM) / M_PER_IN + 0.3 * normal();
  const upIn = (c.across * J.acrossUpM + c.alongMagnus * J.alongMagnusUpM) / M_PER_IN + 0.3 * normal();
  return { hand, speedMph, spinRpm, tiltMinutes, gyroDeg, axis, armIn, upIn };
});

const clockOf = (minutes: number) => `${Math.floor(minutes / 60) || 12}:${String(minutes % 60).padStart(2, "0")}`;
/** The field's +x is the catcher's right; the arm side is -x for a right-hander, +x for a left-hander (geometry/frames.ts header; common practice). */
const rightOf = (r: Row, arm: number) => (r.hand === "right" ? -arm : arm);

type Variant = { header: string[]; cells: (r: Row) => (string | number)[]; columns?: string };
const VARIANTS: Record<string, Variant> = {
  canonical: {
    header: ["hand", "speed_mph", "spin_rpm", "tilt", "gyro_deg", "axis_x", "axis_y", "axis_z", "seam_arm_in", "seam_up_in"],
    cells: (r) => [r.hand, r.speedMph, r.spinRpm, clockOf(r.tiltMinutes), r.gyroDeg, ...r.axis, r.armIn, r.upIn],
  },
  "hand as R and L": {
    header: ["hand", "speed_mph", "spin_rpm", "tilt", "gyro_deg", "axis_x", "axis_y", "axis_z", "seam_arm_in", "seam_up_in"],
    cells: (r) => [r.hand === "right" ? "R" : "l", r.speedMph, r.spinRpm, clockOf(r.tiltMinutes), r.gyroDeg, ...r.axis, r.armIn, r.upIn],
  },
  "speed in km/h": {
    header: ["hand", "speed_kmh", "spin_rpm", "tilt", "gyro_deg", "axis_x", "axis_y", "axis_z", "seam_arm_in", "seam_up_in"],
    cells: (r) => [r.hand, r.speedMph * KMH_PER_MPH, r.spinRpm, clockOf(r.tiltMinutes), r.gyroDeg, ...r.axis, r.armIn, r.upIn],
  },
  "movement in cm, horizontal toward the catcher's right": {
    header: ["hand", "speed_mph", "spin_rpm", "tilt", "gyro_deg", "axis_x", "axis_y", "axis_z", "seam_right_cm", "seam_up_cm"],
    cells: (r) => [r.hand, r.speedMph, r.spinRpm, clockOf(r.tiltMinutes), r.gyroDeg, ...r.axis, rightOf(r, r.armIn) * CM_PER_IN, r.upIn * CM_PER_IN],
  },
  // from behind the catcher the clock is mirrored: H:MM reads (12:00 - H:MM) (geometry/frames.ts header: 1:30 from one view is 10:30 from the other)
  "tilt as a clock from the catcher's view": {
    header: ["hand", "speed_mph", "spin_rpm", "tilt", "view", "gyro_deg", "axis_x", "axis_y", "axis_z", "seam_arm_in", "seam_up_in"],
    cells: (r) => [r.hand, r.speedMph, r.spinRpm, clockOf((720 - r.tiltMinutes) % 720), "catcher", r.gyroDeg, ...r.axis, r.armIn, r.upIn],
  },
  // one minute of clock is half a degree (README: degrees clockwise from 12:00)
  "tilt_deg": {
    header: ["hand", "speed_mph", "spin_rpm", "tilt_deg", "gyro_deg", "axis_x", "axis_y", "axis_z", "seam_arm_in", "seam_up_in"],
    cells: (r) => [r.hand, r.speedMph, r.spinRpm, r.tiltMinutes / 2, r.gyroDeg, ...r.axis, r.armIn, r.upIn],
  },
  // spin efficiency = cos(gyro), the sign given apart (geometry/frames.ts header)
  "efficiency with gyro_sign": {
    header: ["hand", "speed_mph", "spin_rpm", "tilt", "efficiency_pct", "gyro_sign", "axis_x", "axis_y", "axis_z", "seam_arm_in", "seam_up_in"],
    cells: (r) => [r.hand, r.speedMph, r.spinRpm, clockOf(r.tiltMinutes), 100 * Math.cos(r.gyroDeg * DEG), r.gyroDeg < 0 ? "neg" : "pos", ...r.axis, r.armIn, r.upIn],
  },
  "an export's own headers through --columns, with an extra column": {
    header: ["Pitcher", "Throws", "Velo", "Spin", "Axis", "Eff", "Sign", "AX", "AY", "AZ", "SeamH", "SeamV", "Notes"],
    cells: (r) => ["Iris", r.hand[0].toUpperCase(), r.speedMph * KMH_PER_MPH, r.spinRpm, r.tiltMinutes / 2, 100 * Math.cos(r.gyroDeg * DEG), r.gyroDeg < 0 ? "neg" : "pos", ...r.axis, rightOf(r, r.armIn) * CM_PER_IN, r.upIn * CM_PER_IN, "bullpen"],
    columns: "pitcher=Pitcher,hand=Throws,speed_kmh=Velo,spin_rpm=Spin,tilt_deg=Axis,efficiency_pct=Eff,gyro_sign=Sign,axis_x=AX,axis_y=AY,axis_z=AZ,seam_right_cm=SeamH,seam_up_cm=SeamV",
  },
};

async function fitVariant(name: string, v: Variant) {
  const path = join(dir, `${name.replace(/\W+/g, "-")}.csv`);
  writeFileSync(path, [v.header.join(","), ...ROWS.map((r) => v.cells(r).join(","))].join("\n") + "\n");
  const job = parseCalibrate({ tracked: path, fit: "scale", "sigma-in": "0.3", ...(v.columns ? { columns: v.columns } : {}) });
  const skipped: string[] = [];
  const rows = await readCalibrationRows(job, { skipped: (m) => skipped.push(m) });
  expect(skipped).toEqual([]);
  return runCalibrate(job, rows);
}

describe("calibrate --tracked reads every convention explain reads", () => {
  let canonical: Awaited<ReturnType<typeof fitVariant>>;
  it("the canonical form fits the planted scale 0.6 within 3 sigma (12 pitches, 0.3 in of noise)", async () => {
    canonical = await fitVariant("canonical", VARIANTS.canonical);
    const p = canonical.result.parameters[0];
    expect(canonical.rows.tracked).toHaveLength(12);
    expect(Math.abs(p.value - 0.6)).toBeLessThan(3 * p.uncertainty!);
  }, 60_000);

  for (const [name, v] of Object.entries(VARIANTS)) {
    if (name === "canonical") continue;
    it(`${name}: the same fitted scale, uncertainty and per-row measured and fitted movement as the canonical form, to ${SAME_REL} relative`, async () => {
      const got = await fitVariant(name, v);
      const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-12);
      expect(rel(got.result.parameters[0].value, canonical.result.parameters[0].value)).toBeLessThan(SAME_REL);
      expect(rel(got.result.parameters[0].uncertainty!, canonical.result.parameters[0].uncertainty!)).toBeLessThan(SAME_REL);
      const scaleM = Math.max(...Array.from(canonical.result.measured, Math.abs));
      for (let i = 0; i < canonical.result.measured.length; i++) {
        expect(Math.abs(got.result.measured[i] - canonical.result.measured[i])).toBeLessThan(SAME_REL * scaleM);
        expect(Math.abs(got.result.predictedAfter[i] - canonical.result.predictedAfter[i])).toBeLessThan(SAME_REL * scaleM);
      }
    }, 60_000);
  }
});
