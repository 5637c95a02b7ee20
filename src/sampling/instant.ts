/**
 * The seam's band occupancy at one instant of the turn: the share of the seam's
 * length inside the separation band, split by the side of the across direction a
 * (flow frame and phase convention: geometry/flow.ts). This is what the timelines
 * (`measure`, the workbench page's live readout) show through a turn; its average over a
 * whole turn is what the exact sampler (exact.ts) computes in closed form.
 */
import type { SeamSamples } from "../../geometry/seamSamples.js";
import type { Band } from "./band.js";
import { SPLIT_TIE } from "./exact.js";

/** Where one seam sample is at an instant. */
export const SEAM_OUT_OF_BAND = 0;
export const SEAM_IN_BAND_PLUS = 1;
export const SEAM_IN_BAND_MINUS = 2;
/** In the band and on the split plane (|q . a| within SPLIT_TIE): counted half to each side. */
export const SEAM_IN_BAND_ON_SPLIT = 3;

export interface InstantShares {
  /** Share of the seam length in the band, 0..1. */
  seamInBand: number;
  /** The same with q . a > 0 (ties counted half). */
  axisPlus: number;
  /** The same with q . a < 0 (ties counted half). */
  axisMinus: number;
}

export function emptyShares(): InstantShares {
  return { seamInBand: 0, axisPlus: 0, axisMinus: 0 };
}

/**
 * The shares for one ball attitude.
 * @param seam arc-length samples (equal weights)
 * @param ballToFlow column-major 3x3 rotation from the ball frame to the flow frame (geometry/flow.ts)
 * @param band the separation band
 * @param out overwritten and returned
 * @param states when given (length seam.count), receives each sample's SEAM_* state
 */
export function instantBandShares(
  seam: SeamSamples,
  ballToFlow: ArrayLike<number>,
  band: Band,
  out: InstantShares = emptyShares(),
  states?: Uint8Array,
): InstantShares {
  const m = ballToFlow;
  const cosHi = Math.cos(band.centerRad - band.widthRad / 2);
  const cosLo = Math.cos(band.centerRad + band.widthRad / 2);
  const pts = seam.points;
  const n = seam.count;
  let plus = 0;
  let minus = 0;
  for (let i = 0; i < n; i++) {
    const x = pts[3 * i], y = pts[3 * i + 1], z = pts[3 * i + 2];
    const qv = m[2] * x + m[5] * y + m[8] * z;
    if (qv < cosLo || qv > cosHi) {
      if (states) states[i] = SEAM_OUT_OF_BAND;
      continue;
    }
    const qa = m[0] * x + m[3] * y + m[6] * z;
    if (qa > SPLIT_TIE) {
      plus += 1;
      if (states) states[i] = SEAM_IN_BAND_PLUS;
    } else if (qa < -SPLIT_TIE) {
      minus += 1;
      if (states) states[i] = SEAM_IN_BAND_MINUS;
    } else {
      plus += 0.5;
      minus += 0.5;
      if (states) states[i] = SEAM_IN_BAND_ON_SPLIT;
    }
  }
  out.axisPlus = plus / n;
  out.axisMinus = minus / n;
  out.seamInBand = out.axisPlus + out.axisMinus;
  return out;
}
