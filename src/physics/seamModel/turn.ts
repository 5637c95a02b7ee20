/**
 * The seam force through a turn of the ball: the instantaneous timeline and the
 * quasi-steady turn average.
 *
 * Frames and phase: geometry/flow.ts. The ball turns by +phi about the spin axis w;
 * with e1 = unit(pole - (pole . w) w) (pole = ball +z, or +x when w is along z) and
 * e2 = w x e1, a seam point q with components (q.w, q.e1, q.e2) sits in the flow frame at
 *     x = q.w k - s C,   y = -D,   z = q.w s + k C,
 *     C = q.e1 cos phi - q.e2 sin phi,   D = q.e1 sin phi + q.e2 cos phi,
 * s = sin(gyro), k = cos(gyro) (the columns of ballToFlowAtPhase applied to q). So the
 * three components per point are computed once per orientation and each phase costs
 * six multiply-adds per point before the instant (instant.ts).
 *
 * The band sampler as an input. The fixation band is the sampler's Band (one definition:
 * parameters.ts's bandCenterDeg and bandWidthDeg build a src/sampling/band.ts Band, which
 * the caller hands to the sampler too), so a seam point the sampler counts in band at an
 * instant (src/sampling/instant.ts) is exactly one that can fix separation at that
 * instant, and a meridian can only be fixed where such a point's polyline crosses it.
 * The sampler's turn-averaged occupancy (the share of the turn each point spends in the
 * band, exact.ts) cannot weight this model: separation on a meridian depends on which
 * crossing comes first at each instant, which a time share has lost. Its closed form
 * does bound where a point can go in a turn (cos theta within s q.w +- k rho), which
 * could prune segments that never reach the trip zone or the band; measured over 200
 * random axes at 128 seam points, that is no segment at gyro 0, 0.5 % at 30 deg and 6 %
 * at 60 deg, too few to pay for the bookkeeping, so every segment meets the instant's
 * own polar test (a few operations) at every phase.
 */
import { phaseBasis } from "../../../geometry/flow.js";
import { unit3, type Vec3 } from "../../../geometry/vec.js";
import { assertGyro } from "../../sampling/band.js";
import { fillUnitCircle } from "./azimuth.js";
import { emptyInstant, evaluateFlowPoints, readInstant, type InstantCoefficient } from "./instant.js";
import type { SeamModel } from "./model.js";
import { assertMultipleOfFour, PHASES_RANGE } from "./resolution.js";

/** Scratch for the phase basis. */
const BASIS = new Float64Array(6);

/** Turn-averaged coefficients, dimensionless, scale applied. */
export interface TurnAverage {
  /** Along a = unit(w - (w.v) v): the spin axis's part across the flow. */
  across: number;
  /** Along m = unit(w x v): the Magnus direction. */
  alongMagnus: number;
}

/** The instantaneous coefficients and separation angles through one turn. */
export interface ForceTimeline {
  /** Phases per turn; entry j is phase 2 pi j / phases. */
  readonly phases: number;
  readonly across: Float64Array;
  readonly alongMagnus: Float64Array;
  /** Separation angles, rad from the front stagnation point, on the meridians toward +a, -a, +m, -m. */
  readonly separationPlusAcrossRad: Float64Array;
  readonly separationMinusAcrossRad: Float64Array;
  readonly separationPlusMagnusRad: Float64Array;
  readonly separationMinusMagnusRad: Float64Array;
}

/**
 * Loads one orientation into the model's scratch: per point q.w k, q.w s, q.e1, q.e2, and
 * (s, k). Checks the axis and gyro (RangeError).
 */
function prepareOrientation(model: SeamModel, axisBall: Readonly<Vec3>, gyroRad: number): void {
  const w = unit3(axisBall);
  assertGyro(gyroRad);
  const wx = w[0], wy = w[1], wz = w[2];
  const s = Math.sin(gyroRad);
  const k = Math.cos(gyroRad);
  // e1, e2: geometry/flow.ts's phase basis
  const b = phaseBasis(wx, wy, wz, BASIS);
  const e1x = b[0], e1y = b[1], e1z = b[2], e2x = b[3], e2y = b[4], e2z = b[5];
  const sc = model.scratch;
  const pts = model.seam.points;
  const n = model.seam.count;
  const hA = sc.heightAcross, hZ = sc.heightAlong, c1 = sc.e1, c2 = sc.e2;
  for (let i = 0; i < n; i++) {
    const qx = pts[3 * i], qy = pts[3 * i + 1], qz = pts[3 * i + 2];
    const qw = qx * wx + qy * wy + qz * wz;
    hA[i] = qw * k;
    hZ[i] = qw * s;
    c1[i] = qx * e1x + qy * e1y + qz * e1z;
    c2[i] = qx * e2x + qy * e2y + qz * e2z;
  }
  sc.orientation[0] = s;
  sc.orientation[1] = k;
}

/**
 * The quasi-steady turn average of the instantaneous coefficients over the model's
 * phases 2 pi j / phases (the periodic rectangle rule), dimensionless, scale applied.
 * @param axisBall spin axis's positive end in the ball frame (any non-zero length).
 * @param gyroRad gyro angle, rad, |gyro| < pi/2.
 * @param out overwritten and returned.
 * @throws RangeError for a zero axis or |gyro| >= pi/2.
 */
export function turnAverage(
  model: SeamModel,
  axisBall: Readonly<Vec3>,
  gyroRad: number,
  out: TurnAverage = { across: 0, alongMagnus: 0 },
): TurnAverage {
  prepareOrientation(model, axisBall, gyroRad);
  const phases = model.resolution.phases;
  const pc = model.phaseCos, ps = model.phaseSin;
  const r = model.scratch.result;
  let sx = 0;
  let sy = 0;
  for (let j = 0; j < phases; j++) {
    evaluateFlowPoints(model, pc[j], ps[j]);
    sx += r[0];
    sy += r[1];
  }
  out.across = sx / phases;
  out.alongMagnus = -sy / phases;
  return out;
}

/**
 * The instantaneous coefficients and the four separation angles at phases
 * 2 pi j / phases, j = 0 .. phases - 1 (geometry/flow.ts's convention).
 * @param phases a multiple of 4 from 4 to 36000.
 * @throws RangeError for a zero axis, |gyro| >= pi/2 or a bad phase count.
 */
export function forceTimeline(model: SeamModel, axisBall: Readonly<Vec3>, gyroRad: number, phases: number): ForceTimeline {
  assertMultipleOfFour("timeline phases", phases, PHASES_RANGE);
  prepareOrientation(model, axisBall, gyroRad);
  const pc = new Float64Array(phases);
  const ps = new Float64Array(phases);
  fillUnitCircle(pc, ps);
  const out: ForceTimeline = {
    phases,
    across: new Float64Array(phases),
    alongMagnus: new Float64Array(phases),
    separationPlusAcrossRad: new Float64Array(phases),
    separationMinusAcrossRad: new Float64Array(phases),
    separationPlusMagnusRad: new Float64Array(phases),
    separationMinusMagnusRad: new Float64Array(phases),
  };
  const r = model.scratch.result;
  for (let j = 0; j < phases; j++) {
    evaluateFlowPoints(model, pc[j], ps[j]);
    out.across[j] = r[0];
    out.alongMagnus[j] = -r[1];
    out.separationPlusAcrossRad[j] = Math.acos(r[2]);
    out.separationMinusMagnusRad[j] = Math.acos(r[3]);
    out.separationMinusAcrossRad[j] = Math.acos(r[4]);
    out.separationPlusMagnusRad[j] = Math.acos(r[5]);
  }
  return out;
}

/**
 * The instantaneous coefficients at one phase of the turn (geometry/flow.ts's convention),
 * by the timeline's own arithmetic: equal to forceTimeline's entry j at phaseRad = 2 pi j / n
 * when cos and sin of the phase round alike. For single lab rows with a measured phase.
 * @param phaseRad any finite number, rad.
 * @param out overwritten and returned.
 * @throws RangeError for a zero axis, |gyro| >= pi/2 or a non-finite phase.
 */
export function instantAtPhase(
  model: SeamModel,
  axisBall: Readonly<Vec3>,
  gyroRad: number,
  phaseRad: number,
  out: InstantCoefficient = emptyInstant(),
): InstantCoefficient {
  if (!Number.isFinite(phaseRad)) throw new RangeError(`phase ${phaseRad} rad must be a finite number`);
  prepareOrientation(model, axisBall, gyroRad);
  evaluateFlowPoints(model, Math.cos(phaseRad), Math.sin(phaseRad));
  return readInstant(model, out);
}
