/**
 * Azimuth bins about the flow axis and a pseudo-angle to find them without atan2.
 *
 * Flow frame (geometry/flow.ts): azimuth psi about v = +z, from a = +x toward +y.
 * Bin j is the meridian psi_j = 2 pi j / B (B a multiple of 4, so the meridians toward
 * +-a and +-m, psi = 0, pi, 3 pi / 2, pi / 2, are bins 0, B/2, 3B/4, B/4, and the
 * flow-frame mirror y -> -y maps bin j to bin B - j).
 *
 * Pseudo-angle ("diamond angle") of (x, y), in [0, 4): with r = |y| / (|x| + |y|),
 *     r (x >= 0, y >= 0),  2 - r (x < 0, y >= 0),  2 + r (x < 0, y < 0),  4 - r (x >= 0, y < 0);
 * continuous and strictly increasing in psi, one division and no trigonometry. Its
 * slope dp/dpsi = 1 / (|cos psi| + |sin psi|)^2 lies in [1/2, 1], so the thresholds
 * p_j of the meridians are at least pi / B apart, and a lookup table of 4B cells of
 * width 1/B holds at most one threshold per cell: counting the meridians at or below
 * a pseudo-angle takes one table read and one comparison.
 */
import { BoundedCache } from "../../../geometry/cache.js";

export interface AzimuthBins {
  /** B, a multiple of 4. */
  readonly count: number;
  /** cos psi_j, sin psi_j, exact at the quarter points and mirror-symmetric bit for bit. */
  readonly cos: Float64Array;
  readonly sin: Float64Array;
  /** Pseudo-angle p_j of each meridian, ascending, p_0 = 0. */
  readonly threshold: Float64Array;
  /** cellCount[c] = number of thresholds p_j < c / B, c = 0 .. 4B - 1. */
  readonly cellCount: Int32Array;
}

/** Pseudo-angle of (x, y) in [0, 4); (0, 0) gives 0. */
export function pseudoAngle(x: number, y: number): number {
  const ax = x < 0 ? -x : x;
  const ay = y < 0 ? -y : y;
  const d = ax + ay;
  const r = d > 0 ? ay / d : 0;
  // quadrants: r, 2 - r, 2 + r, 4 - r
  const base = y >= 0 ? (x >= 0 ? 0 : 2) : x < 0 ? 2 : 4;
  const sign = (x >= 0) === (y >= 0) ? 1 : -1;
  const p = base + sign * r;
  return p >= 4 ? 0 : p;
}

const cache = new BoundedCache<number, AzimuthBins>("azimuth bins per count", 8);

/** The bins for B azimuths (memoised; B validated by resolution.ts). */
export function azimuthBins(count: number): AzimuthBins {
  return cache.get(count, () => buildBins(count));
}

function buildBins(count: number): AzimuthBins {
  const cos = new Float64Array(count);
  const sin = new Float64Array(count);
  fillUnitCircle(cos, sin);
  const threshold = new Float64Array(count);
  for (let j = 0; j < count; j++) threshold[j] = pseudoAngle(cos[j], sin[j]);
  const cells = 4 * count;
  const cellCount = new Int32Array(cells);
  let j = 0;
  for (let c = 0; c < cells; c++) {
    while (j < count && threshold[j] < c / count) j++;
    cellCount[c] = j;
  }
  return { count, cos, sin, threshold, cellCount };
}

/** Number of meridians with p_j <= p, for p in [0, 4). */
export function meridiansUpTo(bins: AzimuthBins, p: number): number {
  const j = bins.cellCount[(p * bins.count) | 0];
  return j < bins.count && bins.threshold[j] <= p ? j + 1 : j;
}

/**
 * cos and sin of 2 pi j / n into `cos` and `sin` (n = length, a multiple of 4), exact at
 * the quarter turns and with exact quadrant images, so that psi, -psi, psi + pi and
 * pi - psi land on the same numbers up to sign.
 */
export function fillUnitCircle(cos: Float64Array, sin: Float64Array): void {
  const count = cos.length;
  const quarter = count / 4;
  for (let j = 0; j <= quarter; j++) {
    const c = j === quarter ? 0 : Math.cos((2 * Math.PI * j) / count);
    const s = j === 0 ? 0 : j === quarter ? 1 : Math.sin((2 * Math.PI * j) / count);
    cos[j] = c;
    sin[j] = s;
    cos[2 * quarter - j] = -c;
    sin[2 * quarter - j] = s;
    if (j > 0) {
      cos[2 * quarter + j] = -c;
      sin[2 * quarter + j] = -s;
      if (j < quarter) {
        cos[count - j] = c;
        sin[count - j] = -s;
      }
    }
  }
}
