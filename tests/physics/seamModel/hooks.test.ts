import { describe, expect, it } from "vitest";
import { spinAxisFromTilt, TOWARD_PLATE } from "../../../geometry/frames.js";
import { BALL_MASS_KG } from "../../../geometry/ball.js";
import { simulateFlight, type FlightOptions, type Launch } from "../../../src/physics/flight.js";
import type { SeamForceHook, SeamForceInput } from "../../../src/physics/forces.js";
import { releasePosition, releaseVelocity } from "../../../src/physics/launch.js";
import {
  forceTimeline,
  seamHookTimeResolved,
  seamHookTurnAverage,
  seamModel,
  turnAverage,
} from "../../../src/physics/seamModel/index.js";
import { M_PER_IN, M_PER_S_PER_MPH, RAD_PER_S_PER_RPM } from "../../../geometry/units.js";
import { expectAbsolute, expectRelative } from "../../support/tolerance.js";
import { DEG } from "./helpers.js";

const AXIS_BALL: [number, number, number] = [0.35, 0.25, 0.9];

function input(v: number[], w: number[], timeS = 0): SeamForceInput {
  return { timeS, velocityMPerS: Float64Array.from(v), spinRadPerS: Float64Array.from(w), densityKgM3: 1.2, ballRadiusM: 0.0364 };
}

describe("the hooks' force in the field frame", () => {
  const model = seamModel();

  it("turn-average hook: F = 1/2 rho pi R^2 v^2 (C_a a + C_m m); v = -y, spin up and leaning 30 deg toward the plate gives a = +z, m = +x, to 1e-12 relative; no spin or spin along v adds nothing", () => {
    const c = { across: 0.02, alongMagnus: -0.01 };
    const hook = seamHookTurnAverage(model, [0, 0, 1], 30 * DEG, c);
    const v = 40;
    const omega = 200;
    const f = new Float64Array(3);
    hook(input([0, -v, 0], [0, -omega * Math.sin(30 * DEG), omega * Math.cos(30 * DEG)]), f);
    const k = 0.5 * 1.2 * Math.PI * 0.0364 ** 2 * v * v;
    expectRelative(f[0], k * c.alongMagnus, 1e-12);
    expectAbsolute(f[1], 0, 1e-15);
    expectRelative(f[2], k * c.across, 1e-12);
    for (const w of [
      [0, 0, 0],
      [0, -5, 0],
    ]) {
      f.fill(0);
      hook(input([0, -v, 0], w), f);
      expect(Array.from(f)).toEqual([0, 0, 0]);
    }
  });

  it("time-resolved hook: at time t it applies the timeline at phase phi_0 + omega t, linearly interpolated between its phases (closed form), to 1e-12 relative", () => {
    const phases = 72;
    const t = forceTimeline(model, AXIS_BALL, 10 * DEG, phases);
    const omega = 100;
    const phi0 = 0.3;
    const hook = seamHookTimeResolved(model, AXIS_BALL, 10 * DEG, { phaseRad: phi0, spinRadPerS: omega, timelinePhases: phases });
    const v = 30;
    const k = 0.5 * 1.2 * Math.PI * 0.0364 ** 2 * v * v;
    for (const time of [0, 0.0123, 0.2, 0.41]) {
      const u = (((phi0 + omega * time) / (2 * Math.PI)) * phases) % phases;
      const j = Math.floor(u);
      const fr = u - j;
      const lerp = (a: Float64Array) => a[j] + fr * (a[(j + 1) % phases] - a[j]);
      const f = new Float64Array(3);
      // v = -y, spin along +z: a = +z, m = z x (-y) = +x
      hook(input([0, -v, 0], [0, 0, omega], time), f);
      expectRelative(f[0], k * lerp(t.alongMagnus), 1e-12);
      expectRelative(f[2], k * lerp(t.across), 1e-12);
    }
  });

  it("time-resolved hook with exponential spin decay turns the ball by omega_0 tau (1 - exp(-t / tau)) (spinDecay.ts integrated in closed form): equal, to 1e-12, to the undecayed hook at the time with that turned angle", () => {
    const omega = 250;
    const tau = 2;
    const decayed = seamHookTimeResolved(model, AXIS_BALL, 10 * DEG, { phaseRad: 1, spinRadPerS: omega, spinDecayTimeConstantS: tau });
    const plain = seamHookTimeResolved(model, AXIS_BALL, 10 * DEG, { phaseRad: 1, spinRadPerS: omega });
    for (const time of [0.05, 0.2, 0.45]) {
      const a = new Float64Array(3);
      const b = new Float64Array(3);
      decayed(input([0, -35, 1], [10, 0, 200], time), a);
      plain(input([0, -35, 1], [10, 0, 200], tau * (1 - Math.exp(-time / tau))), b);
      for (let i = 0; i < 3; i++) expectAbsolute(a[i], b[i], 1e-12 * Math.hypot(...b));
    }
  });

  it("rejects a non-finite release phase, a negative spin rate, a non-positive decay constant and a bad timeline phase count", () => {
    expect(() => seamHookTimeResolved(model, AXIS_BALL, 0, { phaseRad: Number.NaN, spinRadPerS: 1 })).toThrow(/release phase NaN/);
    expect(() => seamHookTimeResolved(model, AXIS_BALL, 0, { phaseRad: 0, spinRadPerS: -1 })).toThrow(/spin rate -1 rad\/s/);
    expect(() => seamHookTimeResolved(model, AXIS_BALL, 0, { phaseRad: 0, spinRadPerS: 1, spinDecayTimeConstantS: 0 })).toThrow(
      /spin decay time constant 0 s/,
    );
    expect(() => seamHookTimeResolved(model, AXIS_BALL, 0, { phaseRad: 0, spinRadPerS: 1, timelinePhases: 30 })).toThrow(/hook timeline phases 30/);
    expect(() => seamHookTurnAverage(model, AXIS_BALL, 0, { across: Number.NaN, alongMagnus: 0 })).toThrow(/coefficient \(NaN, 0\)/);
  });
});

/** A right-hander's pitch toward the plate: release 6 ft high and 1.5 ft arm side, 6 ft extension (common practice, no source). */
function launchFor(mph: number, rpm: number, tiltMinutes: number, gyroRad: number): Launch {
  const w = spinAxisFromTilt((tiltMinutes / 720) * 2 * Math.PI, gyroRad, "pitcher", TOWARD_PLATE);
  const omega = rpm * RAD_PER_S_PER_RPM;
  return {
    releasePositionM: releasePosition(),
    releaseVelocityMPerS: releaseVelocity(mph * M_PER_S_PER_MPH, -1.5 * DEG, 1 * DEG),
    spinRadPerS: [w[0] * omega, w[1] * omega, w[2] * omega],
  };
}

function plate(launch: Launch, hook: SeamForceHook | undefined, options: FlightOptions = {}): [number, number] {
  const f = simulateFlight(launch, { ...options, seamForce: hook });
  return [f.plateCrossingM[0], f.plateCrossingM[2]];
}

describe("time-resolved against turn-averaged flights (src/physics/flight.ts)", () => {
  // The model's turn average and the hook's timeline on the same 360 phases, so the two
  // hooks read the same numbers and differ only by when the ball shows which seams.
  const model = seamModel(undefined, { phases: 360 });
  const gyro = 10 * DEG;
  const releasePhases = Array.from({ length: 36 }, (_, k) => (2 * Math.PI * k) / 36);

  for (const tau of [Infinity, 5]) {
    it(`2,400 rpm, 92 mph (about 16 turns to the plate${tau === Infinity ? "" : `, spin decay tau ${tau} s`}): every release phase of 36 lands within the drift bound osc(P) q A T / (m omega) (below 0.5 in) of the turn-averaged flight, and their mean within 0.005 in`, () => {
      const launch = launchFor(92, 2400, 75, gyro);
      const omega = 2400 * RAD_PER_S_PER_RPM;
      const options: FlightOptions = tau === Infinity ? {} : { spinDecayTimeConstantS: tau };
      const avg = plate(launch, seamHookTurnAverage(model, AXIS_BALL, gyro), options);
      const none = plate(launch, undefined, options);
      const seamMove = Math.hypot(avg[0] - none[0], avg[1] - none[1]);
      // Bound: the velocity error is (1/omega)(P(phi(t)) - P(phi_0)) with P the antiderivative of the
      // coefficient's deviation from its mean (periodic), times q A / m; so |dx| <= osc(P) q A T / (m omega),
      // with q A at the release speed (the largest) and omega the smallest spin in flight.
      const t = forceTimeline(model, AXIS_BALL, gyro, 360);
      const mean = turnAverage(model, AXIS_BALL, gyro);
      let oscillation = 0;
      for (const [series, m] of [
        [t.across, mean.across],
        [t.alongMagnus, mean.alongMagnus],
      ] as [Float64Array, number][]) {
        let p = 0;
        let lo = 0;
        let hi = 0;
        for (const c of series) {
          p += ((c - m) * 2 * Math.PI) / 360;
          lo = Math.min(lo, p);
          hi = Math.max(hi, p);
        }
        oscillation += (hi - lo) ** 2;
      }
      oscillation = Math.sqrt(oscillation);
      const speed = 92 * M_PER_S_PER_MPH;
      const qA = 0.5 * 1.225 * Math.PI * 0.0364 ** 2 * speed * speed;
      const flightTimeS = 0.42;
      const omegaMin = tau === Infinity ? omega : omega * Math.exp(-flightTimeS / tau);
      const bound = (oscillation * qA * flightTimeS) / (BALL_MASS_KG * omegaMin);
      expect(bound).toBeLessThan(0.5 * M_PER_IN); // a bound small enough to mean something
      let sx = 0;
      let sz = 0;
      let worst = 0;
      for (const phi of releasePhases) {
        const p = plate(launch, seamHookTimeResolved(model, AXIS_BALL, gyro, { phaseRad: phi, spinRadPerS: omega, spinDecayTimeConstantS: tau }), options);
        worst = Math.max(worst, Math.hypot(p[0] - avg[0], p[1] - avg[1]));
        sx += p[0];
        sz += p[1];
      }
      expect(worst, `worst ${(worst / M_PER_IN).toFixed(3)} in, bound ${(bound / M_PER_IN).toFixed(3)} in`).toBeLessThan(bound);
      expect(seamMove).toBeGreaterThan(1 * M_PER_IN);
      expectAbsolute(sx / releasePhases.length, avg[0], 0.005 * M_PER_IN);
      expectAbsolute(sz / releasePhases.length, avg[1], 0.005 * M_PER_IN);
    });
  }

  it("60 rpm, 75 mph (half a turn to the plate): the release phase moves the plate crossing by more than 3 in between phases, and some phase lands more than 2 in from the turn-averaged flight", () => {
    const launch = launchFor(75, 60, 0, 0);
    const omega = 60 * RAD_PER_S_PER_RPM;
    const avg = plate(launch, seamHookTurnAverage(model, AXIS_BALL, 0));
    const xs: number[] = [];
    const zs: number[] = [];
    let farthest = 0;
    for (let k = 0; k < 8; k++) {
      const p = plate(launch, seamHookTimeResolved(model, AXIS_BALL, 0, { phaseRad: (2 * Math.PI * k) / 8, spinRadPerS: omega }));
      xs.push(p[0]);
      zs.push(p[1]);
      farthest = Math.max(farthest, Math.hypot(p[0] - avg[0], p[1] - avg[1]));
    }
    const spread = Math.hypot(Math.max(...xs) - Math.min(...xs), Math.max(...zs) - Math.min(...zs));
    expect(spread).toBeGreaterThan(3 * M_PER_IN);
    expect(farthest).toBeGreaterThan(2 * M_PER_IN);
  });
});
