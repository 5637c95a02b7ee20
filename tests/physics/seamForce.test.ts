import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE, seamPoint } from "../../geometry/seamCurve.js";
import { mat3, newMat3, newQuat, newVec3, quat } from "../../geometry/vec.js";
import { ballToFlowQuaternionAtPhaseZero } from "../../geometry/flow.js";
import { DEFAULT_BAND } from "../../src/sampling/band.js";
import { bandAveragesExact } from "../../src/sampling/exact.js";
import { seamFor } from "../../src/sampling/measure.js";
import { airState } from "../../src/physics/air.js";
import { BALL_MASS_KG, BALL_RADIUS_M, crossSectionM2 } from "../../geometry/ball.js";
import {
  instantaneousSeamForceCoefficient,
  seamForceHook,
  seamForceModel,
  seamForceTimeline,
  turnAveragedSeamForceCoefficient,
} from "../../src/physics/seamForce.js";
import { M_PER_S_PER_MPH, DEG } from "../../geometry/units.js";
import { meridianSideIntegral, meridianSideIntegralFromCos } from "../../src/physics/wakePressure.js";
import { lcg, randomUnit } from "../support/random.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

type V3 = [number, number, number];
const model = seamForceModel();

/** A uniformly random rotation as a column-major matrix (K. Shoemake, "Uniform random rotations", Graphics Gems III, 1992). */
function randomRotation(rnd: () => number, q: quat, out: mat3): mat3 {
  const u1 = rnd();
  const u2 = 2 * Math.PI * rnd();
  const u3 = 2 * Math.PI * rnd();
  const s1 = Math.sqrt(1 - u1);
  const s2 = Math.sqrt(u1);
  quat.set(q, s1 * Math.sin(u2), s1 * Math.cos(u2), s2 * Math.sin(u3), s2 * Math.cos(u3));
  return mat3.fromQuat(out, q);
}

/**
 * The instantaneous coefficient by a second route: on the exact seam curve (not the
 * arc-length polyline), every root in t of the seam's signed distance to each meridian
 * half-plane, by scanning and bisection; the in-band root nearest the front wins.
 * Also counts azimuths with two or more in-band crossings.
 */
function directCoefficient(r: mat3, nb: number): { x: number; y: number; multiple: number } {
  const cosNear = Math.cos(80 * DEG);
  const cosFar = Math.cos(120 * DEG);
  const steps = 8192;
  const c = new Float64Array(3);
  const flow = (t: number, out: Float64Array) => {
    seamPoint(DEFAULT_SEAM_SHAPE, t, c);
    out[0] = r[0] * c[0] + r[3] * c[1] + r[6] * c[2];
    out[1] = r[1] * c[0] + r[4] * c[1] + r[7] * c[2];
    out[2] = r[2] * c[0] + r[5] * c[1] + r[8] * c[2];
  };
  const pts = new Float64Array(3 * (steps + 1));
  const p = new Float64Array(3);
  for (let i = 0; i <= steps; i++) {
    flow((2 * Math.PI * i) / steps, p);
    pts.set(p, 3 * i);
  }
  const g0 = meridianSideIntegral(120 * DEG, -0.4);
  let sx = 0;
  let sy = 0;
  let multiple = 0;
  for (let j = 0; j < nb; j++) {
    const psi = (2 * Math.PI * j) / nb;
    const nx = -Math.sin(psi);
    const ny = Math.cos(psi);
    const dist = (x: number, y: number) => nx * x + ny * y;
    let best = -2;
    let found = 0;
    for (let i = 0; i < steps; i++) {
      const f0 = dist(pts[3 * i], pts[3 * i + 1]);
      const f1 = dist(pts[3 * i + 3], pts[3 * i + 4]);
      if (f0 === 0 ? false : f0 * f1 > 0) continue;
      let lo = (2 * Math.PI * i) / steps;
      let hi = (2 * Math.PI * (i + 1)) / steps;
      let flo = f0;
      for (let k = 0; k < 60; k++) {
        const mid = 0.5 * (lo + hi);
        flow(mid, p);
        const fm = dist(p[0], p[1]);
        if (fm * flo > 0) {
          lo = mid;
          flo = fm;
        } else hi = mid;
      }
      flow(0.5 * (lo + hi), p);
      if (p[0] * ny - p[1] * nx <= 0) continue; // the other half of the plane (psi + pi)
      if (p[2] < cosFar || p[2] > cosNear) continue;
      found++;
      best = Math.max(best, p[2]);
    }
    if (found > 1) multiple++;
    if (best === -2) continue;
    const dg = meridianSideIntegralFromCos(best, Math.acos(best), -0.4) - g0;
    sx += dg * Math.cos(psi);
    sy += dg * Math.sin(psi);
  }
  return { x: (-2 / nb) * sx, y: (-2 / nb) * sy, multiple };
}

describe("turn-averaged SSW coefficient: symmetries", () => {
  it("the four-seam (spin axis = ball z) and two-seam ((1,1,0)/sqrt 2) holds at zero gyro average to zero force, to 1e-9 (the seam's mirror and rotoreflection symmetries, README)", () => {
    for (const axis of [
      [0, 0, 1],
      [Math.SQRT1_2, Math.SQRT1_2, 0],
    ] as V3[]) {
      const c = turnAveragedSeamForceCoefficient(model, axis, 0);
      expectAbsolute(c.alongAxis, 0, 1e-9);
      expectAbsolute(c.alongMagnus, 0, 1e-9);
    }
  });

  it("the Magnus part vanishes (1e-9) for spin axes in the seam's mirror planes x = y and x = -y at any gyro; elsewhere the mirror x <-> y keeps alongAxis and flips alongMagnus (1e-9)", () => {
    // The seam's mirror P (x <-> y) composed with the flow-frame mirror m -> -m maps the
    // turn about w onto the turn about P w with the phase reversed (P fixes the ball's z
    // pole, so phase 0 maps to phase 0), hence C(Pw) = (C_a(w), -C_m(w)).
    for (const [axis, gyroDeg] of [
      [[0.5, 0.5, 0.7], 20],
      [[-0.3, 0.3, 0.4], -35],
      [[Math.SQRT1_2, Math.SQRT1_2, 0], 40],
    ] as [V3, number][]) {
      expectAbsolute(turnAveragedSeamForceCoefficient(model, axis, gyroDeg * DEG).alongMagnus, 0, 1e-9);
    }
    let largestMagnus = 0;
    for (const [axis, gyroDeg] of [
      [[0.35, 0.25, 0.9], 0],
      [[0.6, -0.2, 0.5], 15],
      [[0.2, 0.7, -0.3], -40],
    ] as [V3, number][]) {
      const c = turnAveragedSeamForceCoefficient(model, axis, gyroDeg * DEG);
      const mirrored = turnAveragedSeamForceCoefficient(model, [axis[1], axis[0], axis[2]], gyroDeg * DEG);
      expectAbsolute(mirrored.alongAxis, c.alongAxis, 1e-9);
      expectAbsolute(mirrored.alongMagnus, -c.alongMagnus, 1e-9);
      largestMagnus = Math.max(largestMagnus, Math.abs(c.alongMagnus));
    }
    expect(largestMagnus).toBeGreaterThan(1e-4); // the flip is checked on non-zero values
  });

  it("turning about the seam's z axis (flow across it), the lateral force repeats every quarter turn and the vertical one reverses, to 1e-9 (rotoreflection symmetry; Watts & Sawyer 1975's four-fold pattern)", () => {
    // 364 phases, not 360: on a 1 deg grid the seam's equator nodes sit exactly on the
    // 80 deg band edge at phase 10 deg, where rounding decides whether they count.
    const offGrid = seamForceModel({ phases: 364 });
    const a = new Float64Array(offGrid.phases);
    const m = new Float64Array(offGrid.phases);
    seamForceTimeline(offGrid, [0, 0, 1], 0, a, m);
    const q = offGrid.phases / 4;
    let worst = 0;
    for (let j = 0; j < offGrid.phases; j++) {
      const k = (j + q) % offGrid.phases;
      worst = Math.max(worst, Math.abs(m[k] - m[j]), Math.abs(a[k] + a[j]));
    }
    expect(worst).toBeLessThan(1e-9);
    expect(Math.max(...m.map(Math.abs))).toBeGreaterThan(0.01); // not trivially zero
  });
});

describe("instantaneous and turn-averaged coefficient: two routes", () => {
  it("the polyline model equals the direct exact-curve route within 1e-5 at 6 random orientations, at least one with several in-band crossings on one meridian", () => {
    const rnd = lcg(4242);
    const q = newQuat();
    const r = newMat3();
    let multiple = 0;
    for (let k = 0; k < 6; k++) {
      randomRotation(rnd, q, r);
      const c = instantaneousSeamForceCoefficient(model, r);
      const d = directCoefficient(r, model.azimuthBins);
      expectAbsolute(c.x, d.x, 1e-5);
      expectAbsolute(c.y, d.y, 1e-5);
      multiple += d.multiple;
    }
    expect(multiple).toBeGreaterThan(0); // the nearest-the-front rule is exercised
  });

  it("the turn average is the mean over phases of the instantaneous coefficient along geometry/flow.ts's a = (1,0,0) and m = (0,-1,0), to 1e-12", () => {
    const fast = seamForceModel({ phases: 36 });
    const axis: V3 = [0.6, -0.2, 0.5];
    const gyro = 25 * DEG;
    const n = Math.hypot(...axis);
    const q0 = ballToFlowQuaternionAtPhaseZero([axis[0] / n, axis[1] / n, axis[2] / n], gyro) as unknown as quat;
    const wf = newVec3(Math.cos(gyro), 0, Math.sin(gyro));
    const turn = newQuat();
    const q = newQuat();
    const r = newMat3();
    let sa = 0;
    let sm = 0;
    for (let j = 0; j < 36; j++) {
      quat.multiply(q, quat.setAxisAngle(turn, wf, (2 * Math.PI * j) / 36), q0);
      const c = instantaneousSeamForceCoefficient(fast, mat3.fromQuat(r, q));
      sa += c.x;
      sm -= c.y;
    }
    const avg = turnAveragedSeamForceCoefficient(fast, axis, gyro);
    expectRelative(avg.alongAxis, sa / 36, 1e-12);
    expectRelative(avg.alongMagnus, sm / 36, 1e-12);
  });
});

describe("turn-averaged SSW coefficient against the band sampler", () => {
  it("pushes the same way as the sampler's alongAxis (src/sampling/exact.ts) at the 10 most asymmetric of 1500 random axes and gyros (|gyro| < 60 deg)", () => {
    const seam = seamFor();
    const rnd = lcg(99);
    const cases: { axis: V3; gyro: number; along: number }[] = [];
    for (let k = 0; k < 1500; k++) {
      const axis = randomUnit(rnd);
      const gyro = (2 * rnd() - 1) * 60 * DEG;
      cases.push({ axis, gyro, along: bandAveragesExact(seam, axis[0], axis[1], axis[2], gyro, DEFAULT_BAND).alongAxis });
    }
    cases.sort((p, q) => Math.abs(q.along) - Math.abs(p.along));
    const fast = seamForceModel({ phases: 180 });
    for (const c of cases.slice(0, 10)) {
      expect(Math.abs(c.along)).toBeGreaterThan(0.05);
      const f = turnAveragedSeamForceCoefficient(fast, c.axis, c.gyro);
      expect(Math.sign(f.alongAxis), `axis ${c.axis}, gyro ${c.gyro}: model ${f.alongAxis}, sampler ${c.along}`).toBe(
        Math.sign(c.along),
      );
    }
  });
});

describe("knuckleball: no spin, 65 mph, sea level (Watts & Sawyer, Am. J. Phys. 43, 1975)", () => {
  const speedMPerS = 65 * M_PER_S_PER_MPH; // 29.06 m/s
  const dynamicForceN = 0.5 * airState().densityKgM3 * crossSectionM2(BALL_RADIUS_M) * speedMPerS * speedMPerS;
  const publishedN = 0.5 * BALL_MASS_KG * 9.81; // about half the ball's weight, 0.71 N

  it("the largest instantaneous side force over a turn about a vertical axis and 5000 random orientations is within a factor of 3 of half the ball's weight", () => {
    const a = new Float64Array(model.phases);
    const m = new Float64Array(model.phases);
    seamForceTimeline(model, [0, 0, 1], 0, a, m); // ball z vertical, flow horizontal: m is the horizontal lateral
    let largest = Math.max(...m.map(Math.abs));
    const rnd = lcg(1975);
    const q = newQuat();
    const r = newMat3();
    const side = { x: 0, y: 0 };
    for (let k = 0; k < 5000; k++) {
      instantaneousSeamForceCoefficient(model, randomRotation(rnd, q, r), side);
      largest = Math.max(largest, Math.hypot(side.x, side.y));
    }
    const ratio = (largest * dynamicForceN) / publishedN;
    expect(ratio, `max side force ${(largest * dynamicForceN).toFixed(3)} N, ratio ${ratio.toFixed(3)}`).toBeGreaterThan(1 / 3);
    expect(ratio).toBeLessThan(3);
  });

  // KNOWN DISAGREEMENT, not asserted (this model is about to be replaced): at the default
  // 80-120 deg band the lateral force has two strong maxima and two strong minima in each
  // quarter turn (eight of each per revolution), where Watts & Sawyer (1975) measured four
  // of each: a seam element swings the force as it crosses the band's near edge at 80 deg,
  // once on each side.
});

describe("calibration scale, flight hook, input checks, speed", () => {
  it("scale multiplies the coefficient linearly (2.5 x, to 1e-12 relative)", () => {
    const scaled = seamForceModel({ scale: 2.5 });
    const axis: V3 = [0.35, 0.25, 0.9];
    const base = turnAveragedSeamForceCoefficient(model, axis, 10 * DEG);
    const big = turnAveragedSeamForceCoefficient(scaled, axis, 10 * DEG);
    expectRelative(big.alongAxis, 2.5 * base.alongAxis, 1e-12);
    expectRelative(big.alongMagnus, 2.5 * base.alongMagnus, 1e-12);
  });

  it("the hook applies F = 1/2 rho A v^2 (C_a a + C_m m) in the field frame: v = -y, spin up and leaning 30 deg toward the plate gives a = +z, m = +x, to 1e-12 relative; no spin gives no force", () => {
    const coefficient = { alongAxis: 0.02, alongMagnus: -0.01, magnitude: Math.hypot(0.02, 0.01) };
    const hook = seamForceHook({ axis: [0, 0, 1], gyroRad: 30 * DEG, coefficient });
    const v = 40;
    const omega = 200;
    const input = {
      timeS: 0,
      velocityMPerS: Float64Array.of(0, -v, 0),
      spinRadPerS: Float64Array.of(0, -omega * Math.sin(30 * DEG), omega * Math.cos(30 * DEG)),
      densityKgM3: 1.2,
      ballRadiusM: 0.0364,
    };
    const f = new Float64Array(3);
    hook(input, f);
    const k = 0.5 * 1.2 * Math.PI * 0.0364 ** 2 * v * v;
    expectRelative(f[0], k * coefficient.alongMagnus, 1e-12);
    expectAbsolute(f[1], 0, 1e-15);
    expectRelative(f[2], k * coefficient.alongAxis, 1e-12);
    input.spinRadPerS.fill(0);
    f.fill(0);
    hook(input, f);
    expect(Array.from(f)).toEqual([0, 0, 0]);
  });

  it("rejects bad parameters with a RangeError naming the value", () => {
    expect(() => seamForceModel({ wakePressureCoefficient: -0.9 })).toThrow(/wake pressure coefficient -0.9/);
    expect(() => seamForceModel({ azimuthBins: 90 })).toThrow(/azimuth bins 90/);
    expect(() => seamForceModel({ scale: -1 })).toThrow(/scale -1/);
    expect(() => seamForceModel({ undisturbedSeparationRad: 100 * DEG })).toThrow(RangeError);
    expect(() => turnAveragedSeamForceCoefficient(model, [0, 0, 1], 95 * DEG)).toThrow(/gyro angle 95/);
  });

});
