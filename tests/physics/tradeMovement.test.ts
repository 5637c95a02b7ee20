import { describe, expect, it } from "vitest";
import { BALL_MASS_KG, BALL_RADIUS_M } from "../../geometry/ball.js";
import { clockToAngle, parseClock } from "../../geometry/clock.js";
import { spinAxisFromTilt, type ClockView, type Hand } from "../../geometry/frames.js";
import { PLATE_FRONT_Y_M } from "../../src/physics/field.js";
import type { Launch } from "../../src/physics/flight.js";
import { releasePosition, releaseVelocity } from "../../src/physics/launch.js";
import { movementVersusSpinless } from "../../src/physics/movement.js";
import { aimLaunch, tradeArmSide } from "../../src/physics/pitchFlight.js";
import {
  OLDER_TRADE_WINDOW_START_M,
  TRADE_WINDOW_START_M,
  tradeMovement,
  type TradeMovement,
} from "../../src/physics/tradeMovement.js";
import { tradeMovementParts } from "../../src/physics/tradeMovementParts.js";
import { recordFlight, type TrajectorySamples } from "../../src/physics/trajectory.js";
import { DEG as RAD_PER_DEG, M_PER_FT, M_PER_IN, M_PER_S_PER_MPH, RAD_PER_S_PER_RPM } from "../../geometry/units.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

const G = 9.80665;
type V3 = [number, number, number];

/**
 * Samples every 1 ms of the constant-acceleration path p(t) = p0 + v t + a t^2 / 2
 * (closed form), from t0 until the plane y = PLATE_FRONT_Y_M, plus the exact
 * crossing point. With `wild`, x and z before the window start are replaced by
 * nonsense and 20 nonsense points follow beyond the plate, to show that samples
 * outside the window do not count.
 */
function constantAccelerationSamples(p0: V3, v: V3, a: V3, t0 = 0, wild = false): TrajectorySamples {
  const tS: number[] = [];
  const xM: number[] = [];
  const yM: number[] = [];
  const zM: number[] = [];
  const at = (t: number): V3 => [p0[0] + v[0] * t + 0.5 * a[0] * t * t, p0[1] + v[1] * t + 0.5 * a[1] * t * t, p0[2] + v[2] * t + 0.5 * a[2] * t * t];
  const push = (t: number, p: V3) => {
    tS.push(t0 + t);
    xM.push(p[0]);
    yM.push(p[1]);
    zM.push(p[2]);
  };
  const tPlate = crossingTime(p0[1], v[1], a[1], PLATE_FRONT_Y_M);
  for (let i = 0; i * 0.001 < tPlate; i++) {
    const t = i * 0.001;
    const p = at(t);
    push(t, wild && p[1] > TRADE_WINDOW_START_M ? [5 + t, p[1], -3 * t] : p);
  }
  push(tPlate, at(tPlate));
  if (wild) for (let i = 1; i <= 20; i++) push(tPlate + i * 0.001, [7 * i, PLATE_FRONT_Y_M - 0.01 * i, 2 + i]);
  return { tS, xM, yM, zM };
}

/** First t with y0 + vy t + ay t^2 / 2 = y (textbook quadratic formula; vy < 0, ay >= 0). */
function crossingTime(y0: number, vy: number, ay: number, y: number): number {
  if (ay === 0) return (y - y0) / vy;
  return (-vy - Math.sqrt(vy * vy - 2 * ay * (y0 - y))) / ay;
}

describe("constant-acceleration flight: the fit gives the closed-form break exactly", () => {
  // Closed form x = x0 + v t + a t^2 / 2, so over the window [t_w, t_p] the break is a T^2 / 2 (T = t_p - t_w).
  // The definition (quadratic fit over the window, break a T^2 / 2, gravity removed from z) is A. M. Nathan's
  // notes on determining pitch movement from tracking data (from memory); the 50 ft and 40 ft window starts
  // are common practice (from memory).
  const p0: V3 = [-0.55, 55 * M_PER_FT, 1.85];
  const v: V3 = [1.2, -41.5, -1.4];
  const cases: { name: string; a: V3 }[] = [
    { name: "gravity only", a: [0, 0, -G] },
    { name: "four-seam-like (ax -3, ay 8, az -2.5)", a: [-3, 8, -2.5] },
    { name: "curveball-like (ax 5, ay 9, az -15)", a: [5, 9, -15] },
    { name: "sinker-like (ax -4.5, ay 7, az -6)", a: [-4.5, 7, -6] },
  ];
  for (const { name, a } of cases) {
    for (const windowStartM of [TRADE_WINDOW_START_M, OLDER_TRADE_WINDOW_START_M]) {
      it(`${name}, window from ${(windowStartM / M_PER_FT).toFixed(0)} ft: breaks 1/2 a T^2 within 1e-9 m`, () => {
        const m = tradeMovement(constantAccelerationSamples(p0, v, a), { windowStartM });
        const tw = crossingTime(p0[1], v[1], a[1], windowStartM);
        const T = crossingTime(p0[1], v[1], a[1], PLATE_FRONT_Y_M) - tw;
        expectAbsolute(m.windowTimeS, T, 1e-12);
        expectAbsolute(m.horizontalBreakM, 0.5 * a[0] * T * T, 1e-9);
        expectAbsolute(m.inducedVerticalBreakM, 0.5 * (a[2] + G) * T * T, 1e-9);
        expectAbsolute(m.accelerationMPerS2[1], a[1], 1e-7);
        expect(m.rmsResidualM).toBeLessThan(1e-12);
        // the nine parameters at the window start: position, velocity v + a t_w, acceleration
        expectAbsolute(m.fit.referenceTimeS, tw, 1e-12);
        expectAbsolute(m.fit.positionM[1], windowStartM, 1e-9);
        for (let k = 0; k < 3; k++) {
          expectAbsolute(m.fit.positionM[k], p0[k] + v[k] * tw + 0.5 * a[k] * tw * tw, 1e-9);
          expectAbsolute(m.fit.velocityMPerS[k], v[k] + a[k] * tw, 1e-8);
          expectAbsolute(m.fit.accelerationMPerS2[k], a[k], 1e-7);
        }
      });
    }
  }

  it("uses only the samples inside the window: wild points before 50 ft and past the plate change nothing (within 1e-9 m)", () => {
    const a: V3 = [-3, 8, -2.5];
    const clean = tradeMovement(constantAccelerationSamples(p0, v, a));
    const mixed = tradeMovement(constantAccelerationSamples(p0, v, a, 0, true));
    expect(mixed.samplesUsed).toBe(clean.samplesUsed);
    expect(clean.samplesUsed).toBeLessThan(clean.windowTimeS / 0.001 + 2);
    expectAbsolute(mixed.horizontalBreakM, clean.horizontalBreakM, 1e-9);
    expectAbsolute(mixed.inducedVerticalBreakM, clean.inducedVerticalBreakM, 1e-9);
  });

  it("is well conditioned on a clock that does not start at release: the same break 100 s later within 1e-9 m (time centred on the window)", () => {
    const a: V3 = [5, 9, -15];
    const atZero = tradeMovement(constantAccelerationSamples(p0, v, a));
    const later = tradeMovement(constantAccelerationSamples(p0, v, a, 100));
    expectAbsolute(later.horizontalBreakM, atZero.horizontalBreakM, 1e-9);
    expectAbsolute(later.inducedVerticalBreakM, atZero.inducedVerticalBreakM, 1e-9);
    expectAbsolute(later.fit.referenceTimeS - 100, atZero.fit.referenceTimeS, 1e-9);
  });

  it("rejects a window start not beyond the plate, fewer than 3 samples, arrays of unequal length and negative gravity (one-line RangeError)", () => {
    const s = constantAccelerationSamples(p0, v, [0, 0, -G]);
    expect(() => tradeMovement(s, { windowStartM: PLATE_FRONT_Y_M })).toThrow(/^window start y \S+ m must be a finite number beyond the plate plane y = \S+ m$/);
    expect(() => tradeMovement(s, { windowStartM: PLATE_FRONT_Y_M + 0.02 })).toThrow(/holds 1 of the trajectory's samples; the quadratic fit needs at least 3$/);
    expect(() => tradeMovement({ ...s, zM: [1, 2] })).toThrow(/^trajectory samples have unequal lengths: t \d+, x \d+, y \d+, z 2$/);
    expect(() => tradeMovement(s, { gravityMPerS2: -1 })).toThrow(/^gravity -1 m\/s\^2/);
  });
});

// A typical four-seam fastball (92-96 mph, 2200-2400 rpm: common practice, from memory):
// 95 mph, 2400 rpm, tilt 12:00, spin efficiency 90 % (four-seamers usually run about 85-95 %: common practice, no source; gyro +25.8 deg),
// a right-hander's default release, aimed at the middle of the zone.
const FASTBALL_SPEED_M_PER_S = 95 * M_PER_S_PER_MPH;
function pitchLaunch(hand: Hand, tilt: string, view: ClockView, rpm: number, speedMPerS = FASTBALL_SPEED_M_PER_S, gyroRad = 0): Launch {
  const axis = spinAxisFromTilt(clockToAngle(parseClock(tilt)), gyroRad, view);
  const spin: V3 = [axis[0] * rpm * RAD_PER_S_PER_RPM, axis[1] * rpm * RAD_PER_S_PER_RPM, axis[2] * rpm * RAD_PER_S_PER_RPM];
  const position = releasePosition({ hand });
  const angles = aimLaunch(position, speedMPerS, spin, {});
  return { releasePositionM: position, releaseVelocityMPerS: releaseVelocity(speedMPerS, angles.verticalRad, angles.horizontalRad), spinRadPerS: spin };
}

describe("a 95 mph, 2400 rpm four-seam fastball, tilt 12:00 (gravity, Giordano drag, Sawicki Magnus)", () => {
  // pure backspin for the mechanics (the spin stays across the flight), 90 % efficiency for the trade's range
  const launch = pitchLaunch("right", "12:00", "pitcher", 2400);
  const { samples } = recordFlight(launch);
  const at50 = tradeMovement(samples);
  const at40 = tradeMovement(samples, { windowStartM: OLDER_TRADE_WINDOW_START_M });
  const typical = tradeMovement(recordFlight(pitchLaunch("right", "12:00", "pitcher", 2400, FASTBALL_SPEED_M_PER_S, Math.acos(0.9))).samples);

  it("at 90 % efficiency has an induced vertical break in the trade's four-seam range, 14-19 in at the 50 ft window, and under 1 in of horizontal break", () => {
    // Typical induced vertical break of a right-hander's four-seam fastball over the 50 ft window:
    // about 14-19 in (common practice, from memory).
    // Tolerance: the range itself. The lift law (Sawicki et al. 2003, from memory) is uncertain by
    // more than the range's width, so a tighter claim would test the recalled numbers, not the code;
    // 2400 rpm at 90 % efficiency is near the top of the usual spin, so the upper half is expected.
    const ivbIn = typical.inducedVerticalBreakM / M_PER_IN;
    expect(ivbIn).toBeGreaterThan(14);
    expect(ivbIn).toBeLessThan(19);
    // little sideways Magnus force for a 12:00 axis: drag on the sideways aim toward the zone, and the gyro's share
    expect(Math.abs(typical.horizontalBreakM / M_PER_IN)).toBeLessThan(1);
  });

  it("fits the acceleration the force laws give at the window's middle within 0.2 % (Sawicki et al. 2003 lift, Giordano & Nakanishi drag)", () => {
    // Two routes to one number: the fitted constant acceleration against gravity + drag + lift evaluated
    // at the fitted mid-window velocity. Sawicki, Hubbard & Stronge, Am. J. Phys. 71, 1152 (2003):
    // C_L = 0.09 + 0.6 S for S >= 0.1 (from memory); Giordano & Nakanishi, Computational Physics:
    // drag per mass B2/m v |v| with B2/m = 0.0039 + 0.0058 / (1 + exp((v - 35) / 5)) per m (seen), at
    // sea level; 1976 standard sea-level density 1.225 kg/m^3; the tool's ball (geometry/ball.ts).
    // a(t) changes by about 10 % across the window, nearly linearly; on a window centred in time the
    // linear change cancels in a least-squares constant, leaving the curvature, of order (10 %)^2 / 6,
    // so 0.2 % is allowed.
    const T = at50.windowTimeS;
    const a = at50.accelerationMPerS2;
    const vm: V3 = [0, 1, 2].map((k) => at50.fit.velocityMPerS[k] + 0.5 * a[k] * T) as V3;
    const speed = Math.hypot(vm[0], vm[1], vm[2]);
    // the fit's B2/m is for its reference ball (0.145 kg, 0.0364 m); the same C_D on the tool's ball
    // decelerates in proportion to its area over its mass (src/physics/drag.ts)
    const b2 = (0.0039 + 0.0058 / (1 + Math.exp((speed - 35) / 5))) * (BALL_RADIUS_M / 0.0364) ** 2 * (0.145 / BALL_MASS_KG);
    const w = launch.spinRadPerS;
    const c: V3 = [w[1] * vm[2] - w[2] * vm[1], w[2] * vm[0] - w[0] * vm[2], w[0] * vm[1] - w[1] * vm[0]];
    const cNorm = Math.hypot(c[0], c[1], c[2]);
    const s = (BALL_RADIUS_M * cNorm) / (speed * speed);
    const lift = (0.5 * 1.225 * Math.PI * BALL_RADIUS_M ** 2 * (0.09 + 0.6 * s) * speed * speed) / BALL_MASS_KG;
    const model: V3 = [0, 1, 2].map((k) => -b2 * speed * vm[k] + (lift * c[k]) / cNorm - (k === 2 ? G : 0)) as V3;
    expectRelative(a[2] + G, model[2] + G, 0.002);
    expectRelative(a[1], model[1], 0.002);
    expectAbsolute(a[0], model[0], 0.002 * Math.abs(model[1]));
  });

  it("breaks less over the older 40 ft window, about as (T40/T50)^2 (within 2 %) for a nearly constant acceleration", () => {
    expect(at40.windowTimeS).toBeLessThan(at50.windowTimeS);
    expect(at40.inducedVerticalBreakM).toBeLessThan(at50.inducedVerticalBreakM);
    expect(Math.abs(at40.horizontalBreakM)).toBeLessThan(Math.abs(at50.horizontalBreakM));
    // break = a T^2 / 2 (closed form); the acceleration the two windows see differs by about 1 %
    const ratio = (at40.windowTimeS / at50.windowTimeS) ** 2;
    expectRelative(at40.inducedVerticalBreakM / at50.inducedVerticalBreakM, ratio, 0.02);
    expectRelative(at40.horizontalBreakM / at50.horizontalBreakM, ratio, 0.02);
  });

  it("is not the from-release movement: the window starts after release, so the trade's break is smaller", () => {
    const fromRelease = movementVersusSpinless(launch).breakM.zM;
    expect(at50.windowTimeS).toBeLessThan(recordFlight(launch).flight.timeToPlateS);
    expect(tradeMovementParts(launch).magnusM.inducedVerticalBreakM).toBeLessThan(fromRelease);
  });
});

describe("signs: horizontal break +x (catcher's right), arm side for the hand, induced vertical break up", () => {
  // geometry/frames.ts: 3:00 is the viewer's right, -x from behind the pitcher and +x from behind the
  // catcher; a right-hander's arm side is -x, a left-hander's +x (common practice, no source).
  // An arm-side run tilt is 1:30 from behind a right-hander, 10:30 from behind a left-hander.
  const fly = (hand: Hand, tilt: string, view: ClockView): TradeMovement => tradeMovement(recordFlight(pitchLaunch(hand, tilt, view, 2200, 93 * M_PER_S_PER_MPH)).samples);
  const rightPitcherView = fly("right", "1:30", "pitcher");

  it("a right-hander's arm-side run has negative horizontal break (catcher's left) and positive arm side, the same from either view within 1e-9 m", () => {
    expect(rightPitcherView.horizontalBreakM).toBeLessThan(-5 * M_PER_IN);
    expect(tradeArmSide(rightPitcherView, "right").armSideM).toBeGreaterThan(5 * M_PER_IN);
    expect(rightPitcherView.inducedVerticalBreakM).toBeGreaterThan(5 * M_PER_IN);
    const rightCatcherView = fly("right", "10:30", "catcher");
    expectAbsolute(rightCatcherView.horizontalBreakM, rightPitcherView.horizontalBreakM, 1e-9);
    expectAbsolute(rightCatcherView.inducedVerticalBreakM, rightPitcherView.inducedVerticalBreakM, 1e-9);
  });

  it("a left-hander's is its mirror image (x -> -x): horizontal break negated, induced vertical break equal, both within 1e-9 m", () => {
    for (const [tilt, view] of [["10:30", "pitcher"], ["1:30", "catcher"]] as const) {
      const left = fly("left", tilt, view);
      expectAbsolute(left.horizontalBreakM, -rightPitcherView.horizontalBreakM, 1e-9);
      expectAbsolute(left.inducedVerticalBreakM, rightPitcherView.inducedVerticalBreakM, 1e-9);
      expect(left.horizontalBreakM).toBeGreaterThan(0);
      expectAbsolute(tradeArmSide(left, "left").armSideM, tradeArmSide(rightPitcherView, "right").armSideM, 1e-9);
    }
  });

  it("a topspin pitch (tilt 6:00) has negative induced vertical break", () => {
    expect(fly("right", "6:00", "pitcher").inducedVerticalBreakM).toBeLessThan(-5 * M_PER_IN);
  });
});

describe("drag and gravity on their own", () => {
  const straight: Launch = {
    releasePositionM: releasePosition(),
    releaseVelocityMPerS: releaseVelocity(90 * M_PER_S_PER_MPH, -1.5 * RAD_PER_DEG, 1.5 * RAD_PER_DEG),
    spinRadPerS: [-2300 * RAD_PER_S_PER_RPM, 0, 500 * RAD_PER_S_PER_RPM],
  };

  it("in vacuum gravity is all there is: induced vertical break 0 within 1e-9 m, horizontal break 0 within 1e-12 m", () => {
    // closed form: z = z0 + vz t - g t^2 / 2 exactly, x linear in t (RK4 is exact on polynomials of degree <= 4)
    const m = tradeMovement(recordFlight(straight, { vacuum: true }).samples);
    expectAbsolute(m.inducedVerticalBreakM, 0, 1e-9);
    expectAbsolute(m.horizontalBreakM, 0, 1e-12);
  });

  it("a spinless pitch's horizontal break is drag's sideways share, (vx0 / vy0) a_y T^2 / 2, within 1e-9 relative: small, nonzero, against vx", () => {
    // Closed form: with drag along -v and gravity along -z, dvx/dt = -k vx and dvy/dt = -k vy with the
    // same k, so vx / vy stays vx0 / vy0 and x - x0 = (vx0 / vy0)(y - y0) on every sample; least squares
    // is linear, so the fitted ax = (vx0 / vy0) ay.
    const m = tradeMovement(recordFlight({ ...straight, spinRadPerS: [0, 0, 0] }).samples);
    const [vx0, vy0] = straight.releaseVelocityMPerS;
    const T = m.windowTimeS;
    expectRelative(m.horizontalBreakM, (vx0 / vy0) * 0.5 * m.accelerationMPerS2[1] * T * T, 1e-9);
    expect(vx0).toBeGreaterThan(0);
    expect(m.horizontalBreakM).toBeLessThan(-0.1 * M_PER_IN);
    expect(m.horizontalBreakM).toBeGreaterThan(-2 * M_PER_IN);
    // drag's vertical share is upward for a descending pitch: a positive induced vertical break
    expect(m.inducedVerticalBreakM).toBeGreaterThan(0);
  });

});
