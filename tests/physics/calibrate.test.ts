import { describe, expect, it } from "vitest";
import { DEG, M_PER_IN } from "../../geometry/units.js";
import type { Vec3 } from "../../geometry/vec.js";
import {
  boundedLevenbergMarquardt,
  calibrateSeamModel,
  checkFitNames,
  choleskySolve,
  compileObservations,
  crossLimits,
  finiteDifferenceJacobian,
  gaussNewtonCovariance,
  normalStream,
  predict,
  singularValues,
  syntheticLabRows,
  unitSeamMovementArmSide,
  type CalibrationResult,
  type LabObservation,
  type LeastSquaresProblem,
  type TrackedObservation,
} from "../../src/physics/calibrate/index.js";
import { airState } from "../../src/physics/air.js";
import { pitchLaunch, tradeArmSide } from "../../src/physics/pitchFlight.js";
import { seamHookTurnAverage } from "../../src/physics/seamModel/hooks.js";
import { defaultProfile, resolveProfile, SEAM_MODEL_PARAMETERS, seamModel, turnAverage, instantAtPhase } from "../../src/physics/seamModel/index.js";
import { checkCrossParameters } from "../../src/physics/seamModel/parameters.js";
import { TRADE_WINDOW_START_M, tradeMovement } from "../../src/physics/tradeMovement.js";
import { recordFlight } from "../../src/physics/trajectory.js";
import { lcg, randomUnit } from "../support/random.js";
import { sinkerPitch } from "../support/pitches.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

/** The planted truth of the recovery tests: invented values inside the table's ranges. */
const PLANTED = resolveProfile({ name: "planted", parameters: { scale: 0.6, wakePressureCoefficient: -0.35, laminarSeparationDeg: 82 } }, "test");
/** Noise on each synthetic force component, N (about 5 % of a typical 0.2 N row here). */
const NOISE_N = 0.01;

function param(r: CalibrationResult, name: string) {
  const p = r.parameters.find((q) => q.name === name);
  if (!p) throw new Error(`no fitted ${name}`);
  return p;
}

describe("small dense linear algebra", () => {
  it("Cholesky solves a symmetric positive definite system to 1e-12 (closed form: A x for a chosen x)", () => {
    const a = [4, 1, 0.5, 1, 3, 0.25, 0.5, 0.25, 2];
    const x = [1.5, -2, 0.75];
    const b = [0, 1, 2].map((i) => a[3 * i] * x[0] + a[3 * i + 1] * x[1] + a[3 * i + 2] * x[2]);
    const out = new Float64Array(3);
    expect(choleskySolve(a, b, 3, out)).toBe(true);
    for (let i = 0; i < 3; i++) expectAbsolute(out[i], x[i], 1e-12);
    expect(choleskySolve([1, 2, 2, 1], [1, 1], 2, new Float64Array(2))).toBe(false); // indefinite
  });

  it("the one-sided Jacobi SVD returns the singular values of D V^T exactly (they are invariant under orthogonal maps), small ones included", () => {
    const s = [3, 2, 1e-9];
    const c = Math.cos(0.7), t = Math.sin(0.7);
    // V: a rotation in the (0, 1) plane then in (1, 2); J = [D V^T; zeros] column-major 5 x 3
    const v = [
      [c, -t, 0],
      [t * Math.cos(0.3), c * Math.cos(0.3), -Math.sin(0.3)],
      [t * Math.sin(0.3), c * Math.sin(0.3), Math.cos(0.3)],
    ];
    const m = 5, n = 3;
    const j = new Float64Array(m * n);
    for (let row = 0; row < 3; row++) for (let col = 0; col < n; col++) j[m * col + row] = s[row] * v[col][row];
    const svd = singularValues(j, m, n);
    expect(svd.converged).toBe(true);
    expectRelative(svd.values[0], 3, 1e-13);
    expectRelative(svd.values[1], 2, 1e-13);
    expectRelative(svd.values[2], 1e-9, 1e-6);
    // a repeated column: rank 1, the second singular value zero to rounding
    const rep = Float64Array.of(1, 2, 3, 1, 2, 3);
    expect(singularValues(rep, 3, 2).values[1]).toBeLessThan(1e-15 * Math.sqrt(28));
  });
});

/** NIST StRD nonlinear regression dataset Misra1a: y = b1 (1 - exp(-b2 x)), 14 observations (certified results from NIST's page). */
const MISRA1A_X = [77.6, 114.9, 141.1, 190.8, 239.9, 289.0, 332.8, 378.4, 434.8, 477.3, 536.8, 593.1, 689.1, 760.0];
const MISRA1A_Y = [10.07, 14.73, 17.94, 23.93, 29.61, 35.18, 40.02, 44.82, 50.76, 55.05, 61.01, 66.4, 75.47, 81.78];
const MISRA1A = { b1: 2.3894212918e2, b2: 5.5015643181e-4, sd1: 2.7070075241, sd2: 7.2668688436e-6, rss: 1.2455138894e-1 };

function misra(upperB1 = 1e4, margin?: (x: Float64Array) => number): LeastSquaresProblem {
  return {
    size: 2,
    residualCount: 14,
    lower: [0, 0],
    upper: [upperB1, 1],
    step: [1e-4, 1e-10],
    residuals(x, out) {
      if (margin && !(margin(x) >= 0)) return false;
      for (let i = 0; i < 14; i++) out[i] = x[0] * (1 - Math.exp(-x[1] * MISRA1A_X[i])) - MISRA1A_Y[i];
      return true;
    },
    ...(margin ? { margins: (x: Float64Array) => [margin(x)] } : {}),
  };
}

describe("bounded Levenberg-Marquardt and the Gauss-Newton covariance", () => {
  for (const start of [
    [500, 1e-4],
    [250, 5e-4],
  ]) {
    it(`reproduces NIST StRD Misra1a's certified estimates, residual sum of squares and standard errors from start ${start.join(", ")} (NIST Statistical Reference Datasets, nonlinear regression, Misra1a)`, () => {
      const problem = misra();
      const fit = boundedLevenbergMarquardt(problem, start);
      expect(fit.converged).toBe(true);
      expectRelative(fit.x[0], MISRA1A.b1, 1e-6);
      expectRelative(fit.x[1], MISRA1A.b2, 1e-6);
      expectRelative(2 * fit.cost, MISRA1A.rss, 1e-8);
      const { jacobian } = finiteDifferenceJacobian(problem, fit.x, fit.residuals, true);
      const gn = gaussNewtonCovariance(jacobian, fit.residuals, 14, 2, { columnScales: [100, 1e-3] });
      expect(gn.degreesOfFreedom).toBe(12);
      expectRelative(Math.sqrt(gn.covariance[0]), MISRA1A.sd1, 1e-4);
      expectRelative(Math.sqrt(gn.covariance[3]), MISRA1A.sd2, 1e-4);
      expect(gn.nullDirections).toHaveLength(0);
    });
  }

  it("holds an unknown at its bound: with b1 <= 230 the fit ends at b1 = 230 with b2 at its conditional optimum (gradient in b2 zero to 1e-8 relative)", () => {
    const problem = misra(230);
    const fit = boundedLevenbergMarquardt(problem, [200, 5e-4]);
    expectAbsolute(fit.x[0], 230, 1e-9);
    // d(cost)/d(b2) by the chain rule: sum r dr/db2, dr/db2 = b1 x exp(-b2 x)
    let g = 0, scale = 0;
    for (let i = 0; i < 14; i++) {
      const d = fit.x[0] * MISRA1A_X[i] * Math.exp(-fit.x[1] * MISRA1A_X[i]);
      g += fit.residuals[i] * d;
      scale += Math.abs(fit.residuals[i] * d);
    }
    expect(Math.abs(g)).toBeLessThan(1e-8 * scale + 1e-12);
  });

  it("slides along a curved constraint beyond the box: with b1 b2 <= 0.125 it ends on the curve at the constrained minimum found by a golden-section search along it (two routes)", () => {
    const margin = (x: Float64Array) => 0.125 - x[0] * x[1];
    const fit = boundedLevenbergMarquardt(misra(1e4, margin), [200, 5e-4]);
    expect(margin(fit.x)).toBeGreaterThanOrEqual(0);
    expect(margin(fit.x)).toBeLessThan(1e-7);
    const rssOn = (b1: number) => MISRA1A_X.reduce((s, x, i) => s + (b1 * (1 - Math.exp(-(0.125 / b1) * x)) - MISRA1A_Y[i]) ** 2, 0);
    let lo = 200, hi = 600;
    const gr = (Math.sqrt(5) - 1) / 2;
    for (let k = 0; k < 200; k++) {
      const a = hi - gr * (hi - lo), b = lo + gr * (hi - lo);
      if (rssOn(a) < rssOn(b)) hi = b;
      else lo = a;
    }
    expectRelative(fit.x[0], 0.5 * (lo + hi), 1e-4);
    expectRelative(2 * fit.cost, rssOn(0.5 * (lo + hi)), 1e-6);
  });
});

describe("the cross-parameter margins", () => {
  it("agree with the model's own check (parameters.ts) at 2,000 random points of the table's box: feasible exactly when every strict margin is above 0 and every other at least 0", () => {
    const rnd = lcg(3);
    let feasible = 0;
    for (let k = 0; k < 2000; k++) {
      const v: Record<string, number> = {};
      for (const p of SEAM_MODEL_PARAMETERS) v[p.name] = p.min + (p.max - p.min) * rnd();
      let ok = true;
      try {
        checkCrossParameters(v as never, "test");
      } catch {
        ok = false;
      }
      let band = true;
      try {
        crossLimits(v as never);
      } catch {
        band = false; // a band outside (0, 180) deg: the check fails on it first
      }
      if (!band) {
        expect(ok).toBe(false);
        continue;
      }
      const limits = crossLimits(v as never);
      const byMargins = limits.every((l) => (l.strict ? l.margin > 0 : l.margin >= -1e-9));
      expect(byMargins).toBe(ok);
      if (ok) feasible++;
    }
    expect(feasible).toBeGreaterThan(20); // the test visits both sides
  });
});

describe("predictions", () => {
  it("a lab row's prediction is turnAverage or instantAtPhase times 1/2 rho pi R^2 v^2 (the force coefficient's definition), rows sharing an orientation sharing one evaluation", () => {
    const model = seamModel(PLANTED);
    const axis: Vec3 = [0.3, -0.5, 0.8];
    const q1 = 2.1, q2 = 3.4;
    const lab: LabObservation[] = [
      { axisBall: axis, gyroRad: 0.2, dynamicForceN: q1, forceAlongMagnusN: 0, forceAcrossN: 0 },
      { axisBall: [0.6, -1, 1.6], gyroRad: 0.2, dynamicForceN: q2, forceAlongMagnusN: 0, forceAcrossN: 0 },
      { axisBall: axis, gyroRad: 0.2, phaseRad: 1.1, dynamicForceN: q1, forceAlongMagnusN: 0, forceAcrossN: 0 },
    ];
    const set = compileObservations(lab, []);
    expect(set.orientationGyro.length).toBe(2); // rows 1 and 2: one axis (any length), one gyro, turn-averaged
    const p = predict(model, set, new Float64Array(6));
    const avg = turnAverage(model, axis, 0.2);
    const inst = instantAtPhase(model, axis, 0.2, 1.1);
    expectAbsolute(p[0], q1 * avg.alongMagnus, 1e-15);
    expectAbsolute(p[1], q1 * avg.across, 1e-15);
    expectAbsolute(p[2], q2 * avg.alongMagnus, 1e-15);
    expectAbsolute(p[4], q1 * inst.alongMagnus, 1e-15);
    expectAbsolute(p[5], q1 * inst.across, 1e-15);
  });

  it("a tracked pitch's seam movement is linear in the coefficient: c_a J_a + c_m J_m matches a flight with the seam force at (c_a, c_m) = (0.06, -0.04) to 1 % of its size (superposition of a small force; pitchFlight.ts's unitSeamMovement)", () => {
    const pitch = sinkerPitch();
    const model = seamModel();
    const J = unitSeamMovementArmSide(pitch, model);
    const ca = 0.06, cm = -0.04;
    const air = airState();
    const { launch } = pitchLaunch({ pitch }, { air });
    const fit = { windowStartM: TRADE_WINDOW_START_M };
    const base = tradeMovement(recordFlight(launch, { air, magnus: false }).samples, fit);
    const hook = seamHookTurnAverage(model, [0, 0, 1], pitch.gyroRad, { across: ca, alongMagnus: cm });
    const t = tradeMovement(recordFlight(launch, { air, magnus: false, seamForce: hook }).samples, fit);
    const flown = tradeArmSide({ horizontalBreakM: t.horizontalBreakM - base.horizontalBreakM, inducedVerticalBreakM: t.inducedVerticalBreakM - base.inducedVerticalBreakM }, pitch.hand);
    const arm = ca * J.acrossArmSideM + cm * J.alongMagnusArmSideM;
    const up = ca * J.acrossUpM + cm * J.alongMagnusUpM;
    const size = Math.hypot(flown.armSideM, flown.verticalM);
    expect(size).toBeGreaterThan(0.01); // about an inch or more: the check has something to compare
    expectAbsolute(arm, flown.armSideM, 0.01 * size);
    expectAbsolute(up, flown.verticalM, 0.01 * size);
  });
});

describe("fitting scale alone: the closed form", () => {
  it("is the least-squares slope through the origin, sum(u y) / sum(u^2), with standard error sqrt(s^2 / sum(u^2)), s^2 = RSS / (m - 1) (regression through the origin, e.g. Draper & Smith, Applied Regression Analysis)", () => {
    const rows = syntheticLabRows({ profile: PLANTED, count: 120, seed: 7, noiseN: NOISE_N, turnAveragedShare: 0.25 });
    const lab = rows.map((r) => r.observation);
    const r = calibrateSeamModel({ start: defaultProfile(), fit: ["scale"], lab, sigmaN: NOISE_N });
    expect(r.method.search).toBe("closed form");
    // u: the predictions at the default profile (scale 1) are the start predictions
    const u = r.predictedBefore;
    const y = r.measured;
    let uy = 0, uu = 0;
    for (let i = 0; i < u.length; i++) {
      uy += u[i] * y[i];
      uu += u[i] * u[i];
    }
    const s = uy / uu;
    expectRelative(param(r, "scale").value, s, 1e-12);
    let rss = 0;
    for (let i = 0; i < u.length; i++) rss += (s * u[i] - y[i]) ** 2;
    expectRelative(param(r, "scale").uncertainty!, Math.sqrt(rss / (u.length - 1) / uu), 1e-9);
    for (let i = 0; i < u.length; i++) expectAbsolute(r.predictedAfter[i], s * u[i], 1e-12);
  });

  it("weights lab and tracked rows by their sigmas: scale = sum(w^2 u y) / sum(w^2 u^2) with w = 1/sigma_N for newtons and 1/sigma_M for metres (weighted least squares)", () => {
    const lab = syntheticLabRows({ profile: PLANTED, count: 20, seed: 8, noiseN: NOISE_N, turnAveragedShare: 0.5 }).map((r) => r.observation);
    const rnd = lcg(9);
    const tracked: TrackedObservation[] = Array.from({ length: 10 }, () => ({
      axisBall: randomUnit(rnd),
      gyroRad: 0.1,
      unitMovement: { acrossArmSideM: 0.8, acrossUpM: -0.2, alongMagnusArmSideM: 0.1, alongMagnusUpM: 0.9 },
      seamArmSideM: (rnd() - 0.5) * 0.05,
      seamUpM: (rnd() - 0.5) * 0.05,
    }));
    const sigmaN = 0.03, sigmaM = 0.5 * M_PER_IN;
    const r = calibrateSeamModel({ start: defaultProfile(), fit: ["scale"], lab, tracked, sigmaN, sigmaM });
    const u = r.predictedBefore, y = r.measured;
    let num = 0, den = 0;
    for (let i = 0; i < u.length; i++) {
      const w = i < 2 * lab.length ? 1 / sigmaN : 1 / sigmaM;
      num += w * w * u[i] * y[i];
      den += w * w * u[i] * u[i];
    }
    expectRelative(param(r, "scale").value, num / den, 1e-12);
  });
});

describe("recovering a planted profile from noisy lab rows made by the model itself", () => {
  const FIT = ["scale", "wakePressureCoefficient", "laminarSeparationDeg"] as const;
  const SEEDS = [1, 2, 3, 4, 5, 6];
  const fits = new Map<number, CalibrationResult>();
  const fitFor = (seed: number) => {
    let r = fits.get(seed);
    if (!r) {
      // 300 rows over random axes, gyros within +-45 deg and phases, a quarter of them turn-averaged; Gaussian noise NOISE_N
      const rows = syntheticLabRows({ profile: PLANTED, count: 300, seed, noiseN: NOISE_N, turnAveragedShare: 0.25 });
      r = calibrateSeamModel({ start: defaultProfile(), fit: [...FIT], lab: rows.map((x) => x.observation), sigmaN: NOISE_N });
      fits.set(seed, r);
    }
    return r;
  };

  it("fits scale 0.6, wakePressureCoefficient -0.35 and laminarSeparationDeg 82 (planted) within 3 sigma each, from the defaults, with the rms force falling to the noise (0.01 N)", () => {
    const r = fitFor(1);
    expect(r.method.converged).toBe(true);
    for (const name of FIT) {
      const p = param(r, name);
      expect(p.uncertainty).toBeDefined();
      expect(Math.abs(p.value - PLANTED.values[name]), `${name} ${p.value} +- ${p.uncertainty}`).toBeLessThan(3 * p.uncertainty!);
    }
    expect(r.notIdentified).toEqual([]);
    expect(r.rms.labAfterN!).toBeLessThan(1.1 * NOISE_N);
    expect(r.rms.labBeforeN!).toBeGreaterThan(5 * NOISE_N);
    // s^2 near 1: the stated sigma is the noise (chi-square over about 600 degrees of freedom: 1 +- 0.06)
    expectAbsolute(r.method.residualVariance, 1, 0.2);
  });

  it("reports sigmas that match the scatter: over 6 seeds the spread of each fitted value is 0.4 to 2.2 times the mean reported sigma (a sample standard deviation of 6 values falls within 0.41 to 1.60 of the true one 95 % of the time, chi-square with 5 degrees of freedom; the upper limit leaves room for the search's own scatter)", () => {
    for (const name of FIT) {
      const values = SEEDS.map((s) => param(fitFor(s), name).value);
      const sigmas = SEEDS.map((s) => param(fitFor(s), name).uncertainty!);
      const mean = values.reduce((a, b) => a + b) / values.length;
      const spread = Math.sqrt(values.reduce((a, b) => a + (b - mean) ** 2, 0) / (values.length - 1));
      const sigma = sigmas.reduce((a, b) => a + b) / sigmas.length;
      expect(spread / sigma, `${name}: spread ${spread}, mean sigma ${sigma}`).toBeGreaterThan(0.4);
      expect(spread / sigma, `${name}: spread ${spread}, mean sigma ${sigma}`).toBeLessThan(2.2);
      // and the mean of the fits is within 3 standard errors of the mean of the planted value
      expect(Math.abs(mean - PLANTED.values[name])).toBeLessThan((3 * sigma) / Math.sqrt(values.length) + 1e-12);
    }
  });

  it("recovers planted trip-zone edges (13.3 and 44.6 deg, from the defaults 10 and 50) within 0.1 deg and 4 sigma: the edges act through whole seam crossings, a staircase, which adds to the statistical scatter (DEVELOPERS.md)", () => {
    const planted = resolveProfile({ name: "trip", parameters: { scale: 0.6, tripStartDeg: 13.3, tripEndDeg: 44.6 } }, "test");
    const rows = syntheticLabRows({ profile: planted, count: 300, seed: 11, noiseN: NOISE_N, turnAveragedShare: 0.25 });
    const r = calibrateSeamModel({ start: defaultProfile(), fit: ["scale", "tripStartDeg", "tripEndDeg"], lab: rows.map((x) => x.observation), sigmaN: NOISE_N });
    for (const name of ["tripStartDeg", "tripEndDeg", "scale"] as const) {
      const p = param(r, name);
      expect(Math.abs(p.value - planted.values[name]), `${name} ${p.value} +- ${p.uncertainty}`).toBeLessThan(4 * p.uncertainty!);
    }
    expectAbsolute(param(r, "tripStartDeg").value, 13.3, 0.1);
    expectAbsolute(param(r, "tripEndDeg").value, 44.6, 0.1);
  });
});

describe("what the data cannot pin down", () => {
  it("names the trip zone's edges when no seam can reach the trip zone: spin axes at the four lobe centres (45.3 deg from the nearest seam, geometry/landmarks.ts) with gyro 75-85 deg keep the flow within 15 deg of the axis, so no seam comes within 30 deg of the front, beyond a 10-25 deg trip zone (laminar separation at 86 deg, inside the fixation band, so the band still gives a force for scale to fit)", () => {
    const lobes: Vec3[] = [
      [0.6993, 0.6993, 0.148],
      [-0.6993, 0.6993, -0.148],
      [-0.6993, -0.6993, 0.148],
      [0.6993, -0.6993, -0.148],
    ];
    const start = resolveProfile({ name: "narrow trip", parameters: { tripEndDeg: 25, laminarSeparationDeg: 86 } }, "test");
    const planted = resolveProfile({ name: "planted", parameters: { tripEndDeg: 25, laminarSeparationDeg: 86, scale: 0.6 } }, "test");
    const rows = syntheticLabRows({ profile: planted, count: 80, seed: 4, noiseN: 0.002, turnAveragedShare: 0.25, axes: lobes, gyroRangeDeg: [75, 85] });
    const r = calibrateSeamModel({ start, fit: ["scale", "tripStartDeg", "tripEndDeg"], lab: rows.map((x) => x.observation), sigmaN: 0.002 });
    const names = r.notIdentified.map((n) => n.name);
    expect(names).toContain("tripStartDeg");
    expect(names).toContain("tripEndDeg");
    expect(names).not.toContain("scale");
    for (const n of r.notIdentified) expect(n.reason).toMatch(/no row's prediction changes/);
    expect(param(r, "tripStartDeg").uncertainty).toBeUndefined();
    expect(param(r, "tripStartDeg").value).toBe(10); // never moved: nothing pulls it
    const s = param(r, "scale");
    expect(Math.abs(s.value - 0.6)).toBeLessThan(3 * s.uncertainty!);
  });

  it("does not fit suctionFactor: with scale and the wake pressure the force depends on scale (1 - Cp_b) and scale lambda only (pressure.ts's G is linear in both), so the three cannot be told apart; asking for it is refused by name", () => {
    const rows = syntheticLabRows({ profile: PLANTED, count: 40, seed: 5, noiseN: NOISE_N, turnAveragedShare: 0.25 });
    const lab = rows.map((x) => x.observation);
    expect(() => calibrateSeamModel({ start: defaultProfile(), fit: ["scale", "suctionFactor"], lab, sigmaN: NOISE_N })).toThrow(/suctionFactor/);
    // the degeneracy itself (closed form): scaling lambda by k and scale by 1/k, with Cp_b adjusted so scale (1 - Cp_b) holds, leaves every force unchanged
    const a = seamModel(resolveProfile({ name: "a", parameters: { scale: 0.8, wakePressureCoefficient: -0.3, suctionFactor: 1 } }, "test"));
    const b = seamModel(resolveProfile({ name: "b", parameters: { scale: 0.8 / 0.9, wakePressureCoefficient: 1 - 0.9 * 1.3, suctionFactor: 0.9 } }, "test"));
    for (const r of lab.slice(0, 5)) {
      const ca = turnAverage(a, r.axisBall, r.gyroRad);
      const cb = turnAverage(b, r.axisBall, r.gyroRad);
      expectAbsolute(cb.across, ca.across, 1e-12);
      expectAbsolute(cb.alongMagnus, ca.alongMagnus, 1e-12);
    }
  });

  it("reports a value pushed to the end of its range: forces of the opposite sign drive scale to 0 (its lower bound)", () => {
    const lab = syntheticLabRows({ profile: PLANTED, count: 40, seed: 6, noiseN: NOISE_N, turnAveragedShare: 0.5 }).map((x) => ({
      ...x.observation,
      forceAlongMagnusN: -x.observation.forceAlongMagnusN,
      forceAcrossN: -x.observation.forceAcrossN,
    }));
    const r = calibrateSeamModel({ start: defaultProfile(), fit: ["scale"], lab, sigmaN: NOISE_N });
    expect(param(r, "scale").value).toBe(0);
    expect(param(r, "scale").atBound).toBe("min");
    expect(r.notIdentified.find((n) => n.name === "scale")?.reason).toMatch(/lower end of its range/);
  });
});

describe("tracked pitches", () => {
  it("recovers a planted scale (0.6) from 40 tracked pitches' seam movement with 0.3 in of noise, within 3 sigma", () => {
    const model = seamModel(resolveProfile({ name: "planted scale", parameters: { scale: 0.6 } }, "test"));
    const rnd = lcg(21);
    const normal = normalStream(22);
    const tracked: TrackedObservation[] = [];
    for (let i = 0; i < 40; i++) {
      const pitch = sinkerPitch({ gyroRad: (-20 + 40 * rnd()) * DEG, tiltRad: (20 + 60 * rnd()) * DEG, hand: rnd() < 0.5 ? "right" : "left" });
      const axis = randomUnit(rnd);
      const J = unitSeamMovementArmSide(pitch, model);
      const c = turnAverage(model, axis, pitch.gyroRad);
      tracked.push({
        axisBall: axis,
        gyroRad: pitch.gyroRad,
        unitMovement: J,
        seamArmSideM: c.across * J.acrossArmSideM + c.alongMagnus * J.alongMagnusArmSideM + 0.3 * M_PER_IN * normal(),
        seamUpM: c.across * J.acrossUpM + c.alongMagnus * J.alongMagnusUpM + 0.3 * M_PER_IN * normal(),
      });
    }
    const r = calibrateSeamModel({ start: defaultProfile(), fit: ["scale"], tracked, sigmaM: 0.3 * M_PER_IN });
    const s = param(r, "scale");
    expect(Math.abs(s.value - 0.6)).toBeLessThan(3 * s.uncertainty!);
    expect(r.rms.trackedAfterM! / M_PER_IN).toBeLessThan(0.4);
    expect(r.rms.labAfterN).toBeUndefined();
  });
});

describe("bad input", () => {
  const lab = syntheticLabRows({ profile: PLANTED, count: 3, seed: 1, noiseN: 0, turnAveragedShare: 0 }).map((x) => x.observation);
  const cases: [string, () => unknown, RegExp][] = [
    ["an unknown parameter", () => checkFitNames(["scale", "stickiness"]), /"stickiness" is not a seam model parameter/],
    ["a parameter that is not calibratable", () => checkFitNames(["bandCenterDeg"]), /bandCenterDeg is not calibratable/],
    ["a parameter named twice", () => checkFitNames(["scale", "scale"]), /scale is named twice/],
    ["no parameters", () => checkFitNames([]), /no parameters to fit/],
    ["no rows", () => calibrateSeamModel({ start: defaultProfile(), fit: ["scale"], lab: [] }), /no rows to fit/],
    ["fewer rows than parameters", () => calibrateSeamModel({ start: defaultProfile(), fit: ["scale", "laminarSeparationDeg", "tripEndDeg", "tripStartDeg"], lab }), /3 row\(s\) to fit 4 parameters/],
    ["a zero axis", () => calibrateSeamModel({ start: defaultProfile(), fit: ["scale"], lab: [{ ...lab[0], axisBall: [0, 0, 0] }, ...lab] }), /lab row 1: spin axis \(0, 0, 0\)/],
    ["a force that is not finite", () => calibrateSeamModel({ start: defaultProfile(), fit: ["scale"], lab: [...lab, { ...lab[0], forceAcrossN: NaN }] }), /lab row 4: forces/],
    ["a sigma of 0", () => calibrateSeamModel({ start: defaultProfile(), fit: ["scale"], lab, sigmaN: 0 }), /force uncertainty 0 N/],
  ];
  for (const [what, run, message] of cases) {
    it(`rejects ${what} with one RangeError line`, () => {
      expect(run).toThrow(RangeError);
      expect(run).toThrow(message);
    });
  }
});
