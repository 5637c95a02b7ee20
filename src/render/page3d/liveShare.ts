/**
 * The in-band seam share on each side of the a-split at any phase of the turn,
 * for the page's live readout and for colouring the seam: the sampler's own
 * instantaneous occupancy (src/sampling/instant.ts) at the ball-to-flow rotation of
 * that phase (flow frame and phase convention: geometry/flow.ts).
 */
import { ballToFlowAtPhase } from "../../../geometry/flow.js";
import type { SeamSamples } from "../../../geometry/seamSamples.js";
import { unit3, type Vec3 } from "../../../geometry/vec.js";
import type { Band } from "../../sampling/band.js";
import { instantBandShares, type InstantShares } from "../../sampling/instant.js";

export { SEAM_IN_BAND_MINUS, SEAM_IN_BAND_ON_SPLIT, SEAM_IN_BAND_PLUS, SEAM_OUT_OF_BAND, type InstantShares } from "../../sampling/instant.js";

/** Live band shares for one orientation; allocates once per orientation, nothing per phase. */
export class LiveSeamShares {
  readonly seam: SeamSamples;
  readonly band: Band;
  /** Per-sample state at the last `update` (SEAM_OUT_OF_BAND, ...). */
  readonly states: Uint8Array;
  private axis: Vec3 = [0, 0, 1];
  private gyroRad = 0;
  private readonly rotation = new Float64Array(9);

  constructor(seam: SeamSamples, band: Band) {
    this.seam = seam;
    this.band = band;
    this.states = new Uint8Array(seam.count);
  }

  /** Sets the spin axis (ball frame, any non-zero length) and gyro angle (radians, |gyro| < pi/2). */
  setOrientation(axis: Readonly<Vec3>, gyroRad: number): void {
    this.axis = unit3(axis);
    this.gyroRad = gyroRad;
  }

  /** The shares at phase `phiRad` (radians, any real); also refreshes `states`. Writes into and returns `out`. */
  update(phiRad: number, out: InstantShares = { seamInBand: 0, axisPlus: 0, axisMinus: 0 }): InstantShares {
    const [wx, wy, wz] = this.axis;
    ballToFlowAtPhase(wx, wy, wz, this.gyroRad, phiRad, this.rotation);
    return instantBandShares(this.seam, this.rotation, this.band, out, this.states);
  }
}
