/**
 * The in-band seam share on each side of the a-split at any phase of the turn,
 * for the page's live readout and for colouring the seam.
 *
 * Frames and phase: the flow frame and phase convention of src/sampling/brute.ts
 * (v = +z, a = +x, w = (k, 0, s); the ball turns by +phi about w). Turning the ball
 * by phi about the flow-frame w is the same as turning the seam by phi about the
 * ball-frame axis w_b and then applying the phase-0 map:
 *     turn(w, phi) q0 = q0 turn(w_b, phi),   since q0 maps w_b to w.
 * So the numbers come from the brute-force sampler itself (`bandAveragesBrute` with
 * one step) run on the seam turned by phi in the ball frame: the very per-step
 * kernel behind `measure`'s timeline, not a second copy of it.
 */
import type { SeamSamples } from "../../../geometry/seamSamples.js";
import { mat3, quat, vec3, unit3, type Vec3 } from "../../../geometry/vec.js";
import type { Band } from "../../sampling/band.js";
import { ballToFlowAtPhaseZero, bandAveragesBrute } from "../../sampling/brute.js";
import { emptyAverages, SPLIT_TIE, type BandAverages } from "../../sampling/exact.js";

/** Where one seam sample is at the current phase. */
export const SEAM_OUT_OF_BAND = 0;
export const SEAM_IN_BAND_PLUS = 1;
export const SEAM_IN_BAND_MINUS = 2;
/** In the band and on the split plane (|q . a| within SPLIT_TIE): counted half to each side. */
export const SEAM_IN_BAND_ON_SPLIT = 3;

export interface InstantShares {
  /** Share of the seam length in the band at this phase, 0..1. */
  seamInBand: number;
  /** The same with q . a > 0 (ties counted half). */
  axisPlus: number;
  /** The same with q . a < 0 (ties counted half). */
  axisMinus: number;
}

/** Live band shares for one orientation; allocates once per orientation, nothing per phase. */
export class LiveSeamShares {
  readonly seam: SeamSamples;
  readonly band: Band;
  /** Per-sample state at the last `update` (SEAM_OUT_OF_BAND, ...). */
  readonly states: Uint8Array;
  private readonly turned: Float64Array;
  private readonly turnedSeam: SeamSamples;
  private axis: Vec3 = [0, 0, 1];
  private readonly axisVec = vec3.fromValues(0, 0, 1);
  private gyroRad = 0;
  private readonly toFlow = mat3.create();
  private readonly turn = quat.create();
  private readonly turnMatrix = mat3.create();
  private readonly averages: BandAverages = emptyAverages();
  private readonly plus = new Float64Array(1);
  private readonly minus = new Float64Array(1);
  private readonly cosHi: number;
  private readonly cosLo: number;

  constructor(seam: SeamSamples, band: Band) {
    this.seam = seam;
    this.band = band;
    this.states = new Uint8Array(seam.count);
    this.turned = new Float64Array(seam.points.length);
    this.turnedSeam = { ...seam, points: this.turned };
    this.cosHi = Math.cos(band.centerRad - band.widthRad / 2);
    this.cosLo = Math.cos(band.centerRad + band.widthRad / 2);
  }

  /** Sets the spin axis (ball frame, any non-zero length) and gyro angle (radians, |gyro| < pi/2). */
  setOrientation(axis: Readonly<Vec3>, gyroRad: number): void {
    this.axis = unit3(axis);
    this.gyroRad = gyroRad;
    vec3.set(this.axisVec, this.axis[0], this.axis[1], this.axis[2]);
    mat3.fromQuat(this.toFlow, ballToFlowAtPhaseZero(this.axis[0], this.axis[1], this.axis[2], gyroRad));
  }

  /** The shares at phase `phiRad` (radians, any real); also refreshes `states`. Writes into and returns `out`. */
  update(phiRad: number, out: InstantShares = { seamInBand: 0, axisPlus: 0, axisMinus: 0 }): InstantShares {
    const [wx, wy, wz] = this.axis;
    quat.setAxisAngle(this.turn, this.axisVec, phiRad);
    mat3.fromQuat(this.turnMatrix, this.turn);
    const r = this.turnMatrix;
    const p = this.seam.points;
    const t = this.turned;
    for (let i = 0; i < this.seam.count; i++) {
      const x = p[3 * i], y = p[3 * i + 1], z = p[3 * i + 2];
      t[3 * i] = r[0] * x + r[3] * y + r[6] * z;
      t[3 * i + 1] = r[1] * x + r[4] * y + r[7] * z;
      t[3 * i + 2] = r[2] * x + r[5] * y + r[8] * z;
    }
    bandAveragesBrute(this.turnedSeam, wx, wy, wz, this.gyroRad, this.band, { steps: 1, plusTimeline: this.plus, minusTimeline: this.minus }, this.averages);
    out.seamInBand = this.averages.seamInBand;
    out.axisPlus = this.plus[0];
    out.axisMinus = this.minus[0];
    this.classify();
    return out;
  }

  /** Per-sample band state for drawing, from the turned seam (the same test as the sampler's: band by q . v, side by q . a). */
  private classify(): void {
    const m = this.toFlow;
    const t = this.turned;
    for (let i = 0; i < this.seam.count; i++) {
      const x = t[3 * i], y = t[3 * i + 1], z = t[3 * i + 2];
      const qa = m[0] * x + m[3] * y + m[6] * z;
      const qv = m[2] * x + m[5] * y + m[8] * z;
      if (qv < this.cosLo || qv > this.cosHi) this.states[i] = SEAM_OUT_OF_BAND;
      else if (qa > SPLIT_TIE) this.states[i] = SEAM_IN_BAND_PLUS;
      else if (qa < -SPLIT_TIE) this.states[i] = SEAM_IN_BAND_MINUS;
      else this.states[i] = SEAM_IN_BAND_ON_SPLIT;
    }
  }
}
