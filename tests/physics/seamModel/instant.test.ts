import { describe, expect, it } from "vitest";
import { DEFAULT_SEAM_SHAPE, seamPoint } from "../../../geometry/seamCurve.js";
import {
  defaultProfile,
  instantaneousCoefficient,
  meridianPressureIntegral,
  resolveProfile,
  resolveResolution,
  seamModel,
  type SeamModel,
  type SeamModelProfile,
} from "../../../src/physics/seamModel/index.js";
import { seamModelOnSamples } from "../../../src/physics/seamModel/model.js";
import { lcg, randomUnit } from "../../support/random.js";
import { expectAbsolute, expectRelative } from "../../support/tolerance.js";
import { arcPoints, DEG, meridianPoints, outAndBack, rotationTaking, samplesFrom } from "./helpers.js";

const IDENTITY = Float64Array.of(1, 0, 0, 0, 1, 0, 0, 0, 1);
const BINS = 96;
/** Half-width of the constructed arcs: between bins 16 (60 deg) and 17 (63.75 deg), so no end sits on a meridian. */
const HALF_SPAN = 61.3 * DEG;
/** sum of cos(2 pi j / 96) over |j| <= 16: the Dirichlet kernel sin(33 pi / 96) / sin(pi / 96) (closed form). */
const COS_SUM = Math.sin((33 * Math.PI) / 96) / Math.sin(Math.PI / 96);
/**
 * Step of arcs whose crossings' polar angles enter the force: a chord of the circle of
 * polar angle theta, pushed out to the sphere, lies on the great circle and misses theta by
 * up to (step sin theta)^2 |cot theta| / 8 (the small circle's geodesic curvature is
 * cot theta); at 0.01 deg and theta from 84 to 110 deg that is below 1.4e-9 rad, and
 * |dG/dtheta| = sin^2 |Cp - Cp_b| < 1, so each band meridian's G is off by less than 1.4e-9.
 */
const FINE = 0.01 * DEG;
/** Tolerance on C for band-crossing cases: (2/96) x 33 meridians x 1.4e-9, rounded up. */
const CHORD_TOL = 1e-9;

function constructed(profile: SeamModelProfile, points: [number, number, number][]): SeamModel {
  return seamModelOnSamples(profile, resolveResolution({ azimuthBins: BINS }), samplesFrom(points));
}

const G = (deg: number, p: SeamModelProfile) =>
  meridianPressureIntegral(deg * DEG, p.values.suctionFactor, p.values.wakePressureCoefficient);

/** A full trip ring at 30 deg, joined along the non-bin meridian -61.3 deg to an arc at `arcDeg` over |psi| < 61.3 deg. */
function ringAndArc(arcDeg: number): [number, number, number][] {
  return [
    ...arcPoints(30 * DEG, -HALF_SPAN, 2 * Math.PI - HALF_SPAN),
    ...meridianPoints(-HALF_SPAN, 30 * DEG, arcDeg * DEG).slice(1),
    ...outAndBack(arcPoints(arcDeg * DEG, -HALF_SPAN, HALF_SPAN, FINE)).slice(1),
    ...meridianPoints(-HALF_SPAN, arcDeg * DEG, 30 * DEG).slice(1, -1),
  ];
}

describe("the rule on constructed seams (flow frame = ball frame; defaults: laminar 80, turbulent 120, trip 10-50, band 80-120 deg)", () => {
  const d = defaultProfile();

  it("a seam arc at 30 deg (trip zone) over |psi| < 61.3 deg separates those meridians at the turbulent 120 deg, the rest at the laminar 80 deg, and pushes toward +a, the tripped side: C_a = -(2/96)(G(120) - G(80)) sum cos psi_j (closed form) to 1e-13, C_m = 0", () => {
    const m = constructed(d, outAndBack(arcPoints(30 * DEG, -HALF_SPAN, HALF_SPAN)));
    const c = instantaneousCoefficient(m, IDENTITY);
    const expected = (-2 / BINS) * (G(120, d) - G(80, d)) * COS_SUM;
    expect(expected).toBeGreaterThan(0);
    expectAbsolute(c.across, expected, 1e-13);
    expectAbsolute(c.alongMagnus, 0, 1e-13);
    expectAbsolute(c.separationPlusAcrossRad / DEG, 120, 1e-9);
    expectAbsolute(c.separationMinusAcrossRad / DEG, 80, 1e-9);
    expectAbsolute(c.separationPlusMagnusRad / DEG, 80, 1e-9);
    expectAbsolute(c.separationMinusMagnusRad / DEG, 80, 1e-9);
  });

  it("the same arc at 100 deg (fixation band) with the trip ring everywhere fixes those meridians at 100 deg (the rest 120) and pushes the other way, toward -a: C_a = -(2/96)(G(100) - G(120)) sum cos psi_j to 1e-13", () => {
    const m = constructed(d, ringAndArc(100));
    const c = instantaneousCoefficient(m, IDENTITY);
    const expected = (-2 / BINS) * (G(100, d) - G(120, d)) * COS_SUM;
    expect(expected).toBeLessThan(0);
    expectAbsolute(c.across, expected, CHORD_TOL);
    expectAbsolute(c.alongMagnus, 0, 1e-13);
    expectAbsolute(c.separationPlusAcrossRad / DEG, 100, 1e-7);
    expectAbsolute(c.separationMinusAcrossRad / DEG, 120, 1e-9);
  });

  it("trip and early fixation on the same side give opposite signs on a laminar layer too (laminar separation at 88 deg; arc at 30 deg pushes toward +a, arc at 84 deg toward -a)", () => {
    const p = resolveProfile({ name: "late laminar", parameters: { laminarSeparationDeg: 88 } }, "test");
    const trip = instantaneousCoefficient(constructed(p, outAndBack(arcPoints(30 * DEG, -HALF_SPAN, HALF_SPAN))), IDENTITY);
    const fix = instantaneousCoefficient(constructed(p, outAndBack(arcPoints(84 * DEG, -HALF_SPAN, HALF_SPAN, FINE))), IDENTITY);
    expectAbsolute(trip.across, (-2 / BINS) * (G(120, p) - G(88, p)) * COS_SUM, 1e-13);
    expectAbsolute(fix.across, (-2 / BINS) * (G(84, p) - G(88, p)) * COS_SUM, CHORD_TOL);
    expect(trip.across).toBeGreaterThan(0.05);
    expect(fix.across).toBeLessThan(-0.005);
    expectAbsolute(fix.separationPlusAcrossRad / DEG, 84, 1e-7);
  });

  it("crossings that cannot matter change nothing (C = 0 to 1e-15): ahead of the trip zone (5 deg), between trip zone and band (65 deg), in the band behind laminar separation on an untripped layer (100 deg), behind the band (140 deg)", () => {
    for (const deg of [5, 65, 100, 140]) {
      const c = instantaneousCoefficient(constructed(d, outAndBack(arcPoints(deg * DEG, -HALF_SPAN, HALF_SPAN))), IDENTITY);
      expectAbsolute(c.across, 0, 1e-15);
      expectAbsolute(c.alongMagnus, 0, 1e-15);
    }
  });

  it("a separation line the same on every meridian gives zero force: a full trip ring (all at 120 deg) and a full ring in the band after it (all at 100 deg), to 1e-15", () => {
    const ring = instantaneousCoefficient(constructed(d, arcPoints(30 * DEG, 0.1, 0.1 + 2 * Math.PI)), IDENTITY);
    expect(Math.hypot(ring.across, ring.alongMagnus)).toBeLessThan(1e-15);
    expectAbsolute(ring.separationPlusMagnusRad / DEG, 120, 1e-9);
  });

  it("of two band crossings on a tripped meridian the nearer the front wins (arcs at 110 and 100 deg fix at 100 deg)", () => {
    const pts = ringAndArc(110);
    // add a second arc at 100 deg, joined along the same non-bin meridian
    const extra = [
      ...meridianPoints(-HALF_SPAN, 110 * DEG, 100 * DEG).slice(1),
      ...outAndBack(arcPoints(100 * DEG, -HALF_SPAN, HALF_SPAN, FINE)).slice(1),
      ...meridianPoints(-HALF_SPAN, 100 * DEG, 110 * DEG).slice(1, -1),
    ];
    const at = pts.length - meridianPoints(-HALF_SPAN, 110 * DEG, 30 * DEG).slice(1, -1).length;
    const both = [...pts.slice(0, at), ...extra, ...pts.slice(at)];
    const c = instantaneousCoefficient(constructed(d, both), IDENTITY);
    expectAbsolute(c.separationPlusAcrossRad / DEG, 100, 1e-7);
    expectAbsolute(c.across, (-2 / BINS) * (G(100, d) - G(120, d)) * COS_SUM, CHORD_TOL);
  });
});

/**
 * The same rule by a second route: on the exact seam curve (not the arc-length polyline),
 * every crossing of each meridian half-plane by scanning and bisection; acos and the closed
 * form G; no tables, no pseudo-angles.
 */
function directRoute(r: Float64Array, m: SeamModel): { across: number; alongMagnus: number } {
  const steps = 8192;
  const c = new Float64Array(3);
  const flow = (t: number, out: number[]) => {
    seamPoint(DEFAULT_SEAM_SHAPE, t, c);
    out[0] = r[0] * c[0] + r[3] * c[1] + r[6] * c[2];
    out[1] = r[1] * c[0] + r[4] * c[1] + r[7] * c[2];
    out[2] = r[2] * c[0] + r[5] * c[1] + r[8] * c[2];
  };
  const v = m.profile.values;
  const inRange = (deg: number, lo: number, hi: number) => deg >= lo && deg <= hi;
  const nb = m.bins.count;
  const p: number[] = [0, 0, 0];
  const q: number[] = [0, 0, 0];
  let sx = 0;
  let sy = 0;
  for (let j = 0; j < nb; j++) {
    const psi = (2 * Math.PI * j) / nb;
    const nx = -Math.sin(psi);
    const ny = Math.cos(psi);
    let tripped = false;
    let firstBand = Infinity;
    for (let i = 0; i < steps; i++) {
      flow((2 * Math.PI * i) / steps, p);
      flow((2 * Math.PI * (i + 1)) / steps, q);
      let f0 = nx * p[0] + ny * p[1];
      const f1 = nx * q[0] + ny * q[1];
      if (f0 * f1 > 0) continue;
      let lo = (2 * Math.PI * i) / steps;
      let hi = (2 * Math.PI * (i + 1)) / steps;
      for (let k = 0; k < 60; k++) {
        const mid = 0.5 * (lo + hi);
        flow(mid, p);
        const fm = nx * p[0] + ny * p[1];
        if (fm * f0 > 0) {
          lo = mid;
          f0 = fm;
        } else hi = mid;
      }
      flow(0.5 * (lo + hi), p);
      if (p[0] * Math.cos(psi) + p[1] * Math.sin(psi) <= 0) continue; // the other half-plane
      const deg = Math.acos(Math.max(-1, Math.min(1, p[2]))) / DEG;
      if (inRange(deg, v.tripStartDeg, v.tripEndDeg)) tripped = true;
      else if (inRange(deg, v.bandCenterDeg - v.bandWidthDeg / 2, v.bandCenterDeg + v.bandWidthDeg / 2)) firstBand = Math.min(firstBand, deg);
    }
    const sep = Math.min(firstBand, tripped ? v.turbulentSeparationDeg : v.laminarSeparationDeg);
    const dg =
      meridianPressureIntegral(sep * DEG, v.suctionFactor, v.wakePressureCoefficient) -
      meridianPressureIntegral(v.laminarSeparationDeg * DEG, v.suctionFactor, v.wakePressureCoefficient);
    sx += dg * Math.cos(psi);
    sy += dg * Math.sin(psi);
  }
  const k = (-2 / nb) * v.scale;
  return { across: k * sx, alongMagnus: -k * sy };
}

describe("the instantaneous coefficient on the real seam", () => {
  it("equals a direct route on the exact curve (bisection per meridian, closed-form G) within 2e-5 at 6 random orientations (2048 seam points, 96 meridians)", () => {
    const m = seamModel(defaultProfile(), { seamPoints: 2048, azimuthBins: 96 });
    const rnd = lcg(4242);
    for (let k = 0; k < 6; k++) {
      const r = rotationTaking(randomUnit(rnd), 2 * Math.PI * rnd());
      const c = instantaneousCoefficient(m, r);
      const d = directRoute(r, m);
      expectAbsolute(c.across, d.across, 2e-5);
      expectAbsolute(c.alongMagnus, d.alongMagnus, 2e-5);
    }
  });

  it("zero side force, to 1e-13, when the flow meets the ball along one of the seam's three half-turn axes (ball x, y: a seam crossing of the equator; z: a waist), at any roll: the half-turn about the flow axis maps the seam onto itself and the side force onto its negative (geometry/symmetry.ts)", () => {
    const m = seamModel();
    let largest = 0;
    for (const d of [
      [1, 0, 0],
      [0, 1, 0],
      [0, 0, 1],
      [-1, 0, 0],
      [0, 0, -1],
    ] as [number, number, number][]) {
      for (const roll of [0.1, 0.9, 2.2, 4.0]) {
        const c = instantaneousCoefficient(m, rotationTaking(d, roll));
        largest = Math.max(largest, Math.abs(c.across), Math.abs(c.alongMagnus));
      }
    }
    expect(largest).toBeLessThan(1e-13);
    // and not trivially: a generic direction has a side force
    const c = instantaneousCoefficient(m, rotationTaking([0.6, 0.3, Math.sqrt(1 - 0.45)], 0.4));
    expect(Math.hypot(c.across, c.alongMagnus)).toBeGreaterThan(0.01);
  });

  it("with the flow in the seam's mirror plane x = y and that plane mapped to the flow's x-z plane, the force along flow y vanishes (the mirror keeps v and flow x, reverses flow y), to 1e-13", () => {
    const m = seamModel();
    let largestAcross = 0;
    for (const z of [0.2, -0.5, 0.8]) {
      const h = Math.sqrt((1 - z * z) / 2);
      const d = [h, h, z];
      // f1 in the mirror plane, normal to d: z e - sqrt(2) h e_z with e = (1, 1, 0) / sqrt 2
      const f1 = [z * Math.SQRT1_2, z * Math.SQRT1_2, -Math.SQRT2 * h];
      const f2 = [d[1] * f1[2] - d[2] * f1[1], d[2] * f1[0] - d[0] * f1[2], d[0] * f1[1] - d[1] * f1[0]];
      const r = new Float64Array(9);
      for (let col = 0; col < 3; col++) {
        r[3 * col] = f1[col];
        r[3 * col + 1] = f2[col];
        r[3 * col + 2] = d[col];
      }
      const c = instantaneousCoefficient(m, r);
      expectAbsolute(c.alongMagnus, 0, 1e-13);
      largestAcross = Math.max(largestAcross, Math.abs(c.across));
    }
    expect(largestAcross).toBeGreaterThan(0.01); // the in-plane part is not trivially zero
  });

  it("the scale parameter multiplies the coefficient (2.5 x, 1e-13 relative)", () => {
    const r = rotationTaking([0.6, 0.3, Math.sqrt(1 - 0.45)], 0.4);
    const base = instantaneousCoefficient(seamModel(), r);
    const big = instantaneousCoefficient(seamModel(resolveProfile({ name: "x", parameters: { scale: 2.5 } }, "t")), r);
    expectRelative(big.across, 2.5 * base.across, 1e-13);
    expectRelative(big.alongMagnus, 2.5 * base.alongMagnus, 1e-13);
  });

  it("rejects a matrix of the wrong size or with a non-finite entry (RangeError naming it)", () => {
    expect(() => instantaneousCoefficient(seamModel(), [1, 0, 0])).toThrow(/3 entries; it must have 9/);
    expect(() => instantaneousCoefficient(seamModel(), [1, 0, 0, 0, 1, 0, 0, 0, Number.NaN])).toThrow(/entry 8 = NaN/);
  });
});
