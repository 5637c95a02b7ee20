/**
 * The brute-force twin of the exact sampler: turn the ball in small steps, test
 * every seam point against the band, average. Only the tests (cross-checks of
 * exact.ts's closed form) and the benchmark use it; nothing in the tool does.
 *
 * It works in the flow frame of geometry/flow.ts (v = +z, w = (k, 0, s), a = +x,
 * m = -y) and turns the ball by whole-point rotations, independently of exact.ts's
 * ball-frame algebra; the phases phi_j = 2 pi j / steps carry equal weights.
 */
import { ballToFlowAtPhase } from "../../geometry/flow.js";
import type { SeamSamples } from "../../geometry/seamSamples.js";
import { emptyAverages, SPLIT_TIE, type BandAverages } from "./exact.js";
import type { Band } from "./band.js";

/** Brute-force turn average by time stepping (default 720 steps per turn). */
export function bandAveragesBrute(
  seam: SeamSamples,
  wx: number,
  wy: number,
  wz: number,
  gyroRad: number,
  band: Band,
  steps = 720,
  out: BandAverages = emptyAverages(),
): BandAverages {
  const cosHi = Math.cos(band.centerRad - band.widthRad / 2);
  const cosLo = Math.cos(band.centerRad + band.widthRad / 2);
  const m = new Float64Array(9);
  const pts = seam.points;
  const n = seam.count;
  let inBand = 0;
  let plus = 0;
  let minus = 0;
  let mPlus = 0;
  let mMinus = 0;
  let sumA = 0;
  let sumM = 0;
  for (let j = 0; j < steps; j++) {
    ballToFlowAtPhase(wx, wy, wz, gyroRad, (2 * Math.PI * j) / steps, m);
    const m0 = m[0], m1 = m[1], m2 = m[2], m3 = m[3], m4 = m[4], m5 = m[5], m6 = m[6], m7 = m[7], m8 = m[8];
    for (let i = 0; i < n; i++) {
      // rotate the seam point into the flow frame, then test it
      const x = pts[3 * i];
      const y = pts[3 * i + 1];
      const z = pts[3 * i + 2];
      const qv = m2 * x + m5 * y + m8 * z; // q . v, v = +z
      if (qv < cosLo || qv > cosHi) continue;
      const qa = m0 * x + m3 * y + m6 * z; // q . a, a = +x
      const qm = -(m1 * x + m4 * y + m7 * z); // q . m, m = -y
      inBand += 1;
      if (qa > SPLIT_TIE) plus += 1;
      else if (qa < -SPLIT_TIE) minus += 1;
      else {
        plus += 0.5;
        minus += 0.5;
      }
      if (qm > SPLIT_TIE) mPlus += 1;
      else if (qm < -SPLIT_TIE) mMinus += 1;
      else {
        mPlus += 0.5;
        mMinus += 0.5;
      }
      sumA += qa;
      sumM += qm;
    }
  }
  const w = 1 / (n * steps);
  out.seamInBand = inBand * w;
  out.axisPlus = plus * w;
  out.axisMinus = minus * w;
  out.magnusPlus = mPlus * w;
  out.magnusMinus = mMinus * w;
  out.alongAxis = -sumA * w;
  out.alongMagnus = -sumM * w;
  out.magnitude = Math.hypot(out.alongAxis, out.alongMagnus);
  return out;
}
