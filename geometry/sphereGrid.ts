/**
 * An equal-area ring grid on the unit sphere (ball frame), built to respect the
 * seam's symmetry group exactly.
 *
 * Rings of constant z, symmetric about the equator. Ring i holds n_i cells, n_i a
 * multiple of 4, close to 2 pi cos(latitude) / spacing; the ring heights are then
 * chosen so that every cell has the same area 4 pi / N (a ring of height dz has area
 * 2 pi dz, Archimedes). Cell j of ring i sits at longitude (j + 1/2) 2 pi / n_i and at
 * the ring's middle height. Because the rings pair up under z -> -z and every ring
 * is invariant under quarter-turns and under longitude -> -longitude, each of the
 * eight seam symmetries maps grid points to grid points; `symmetryImage` gives the
 * index map by integer arithmetic, with no floating-point search.
 */
import { DEG } from "./units.js";
import { SEAM_SYMMETRIES } from "./symmetry.js";

export interface SphereGrid {
  /** Nominal spacing, radians. */
  readonly spacingRad: number;
  /** Number of cells N. */
  readonly count: number;
  /** Unit cell centres, flat (3N). */
  readonly points: Float64Array;
  /** Ring of each cell. */
  readonly ring: Int32Array;
  /** Index within its ring. */
  readonly slot: Int32Array;
  /** Cells per ring. */
  readonly ringCount: Int32Array;
  /** Index of the first cell of each ring. */
  readonly ringStart: Int32Array;
  /** Ring boundaries in z, ascending (rings + 1 values from -1 to 1). */
  readonly ringEdges: Float64Array;
}

export const SPHERE_GRID_SPACING_RANGE_DEG: readonly [number, number] = [0.1, 30];

/** Builds the grid with cell spacing about `spacingRad` (about 4 pi / spacing^2 cells). */
export function equalAreaGrid(spacingRad: number): SphereGrid {
  const spacingDeg = spacingRad / DEG;
  if (!(spacingDeg >= SPHERE_GRID_SPACING_RANGE_DEG[0] && spacingDeg <= SPHERE_GRID_SPACING_RANGE_DEG[1])) {
    throw new RangeError(
      `grid spacing ${spacingDeg} deg must be from ${SPHERE_GRID_SPACING_RANGE_DEG[0]} to ${SPHERE_GRID_SPACING_RANGE_DEG[1]} deg`,
    );
  }
  const half = Math.max(1, Math.round(Math.PI / spacingRad / 2));
  const rings = 2 * half;
  const counts = new Int32Array(rings);
  for (let i = 0; i < half; i++) {
    // nominal latitude of ring i counted from the north pole
    const lat = Math.PI / 2 - (i + 0.5) * (Math.PI / rings);
    const nominal = (2 * Math.PI * Math.cos(lat)) / spacingRad;
    const n = Math.max(4, 4 * Math.round(nominal / 4));
    counts[rings - 1 - i] = n;
    counts[i] = n;
  }
  let total = 0;
  for (let i = 0; i < rings; i++) total += counts[i];
  const edges = new Float64Array(rings + 1);
  edges[0] = -1;
  let cum = 0;
  for (let i = 0; i < rings; i++) {
    cum += counts[i];
    edges[i + 1] = -1 + (2 * cum) / total;
  }
  edges[rings] = 1;
  // the middle edge is exactly 0 by the pairing of counts; pin it against rounding
  edges[half] = 0;
  const points = new Float64Array(3 * total);
  const ring = new Int32Array(total);
  const slot = new Int32Array(total);
  const ringStart = new Int32Array(rings);
  // northern rings at their equal-area middle height; southern rings as exact mirror images
  const zRing = new Float64Array(rings);
  for (let i = half; i < rings; i++) {
    zRing[i] = 0.5 * (edges[i] + edges[i + 1]);
    zRing[rings - 1 - i] = -zRing[i];
  }
  let idx = 0;
  for (let i = 0; i < rings; i++) {
    ringStart[i] = idx;
    const z = zRing[i];
    const r = Math.sqrt(Math.max(0, 1 - z * z));
    const n = counts[i];
    for (let j = 0; j < n; j++) {
      const lon = ((j + 0.5) * 2 * Math.PI) / n;
      points[3 * idx] = r * Math.cos(lon);
      points[3 * idx + 1] = r * Math.sin(lon);
      points[3 * idx + 2] = z;
      ring[idx] = i;
      slot[idx] = j;
      idx++;
    }
  }
  return { spacingRad, count: total, points, ring, slot, ringCount: counts, ringStart, ringEdges: edges };
}

/**
 * Index of the image of cell `index` under seam symmetry number `g` (order of SEAM_SYMMETRIES).
 * Longitude slots: a quarter-turn adds n/4; lon -> -lon maps j to n-1-j; the mirror x<->y
 * (lon -> 90 deg - lon) maps j to n/4-1-j; z -> -z maps ring i to rings-1-i.
 */
export function symmetryImage(grid: SphereGrid, index: number, g: number): number {
  const rings = grid.ringCount.length;
  const i = grid.ring[index];
  const j = grid.slot[index];
  const n = grid.ringCount[i];
  const q = n / 4;
  const wrap = (x: number) => ((x % n) + n) % n;
  let ni = i;
  let nj = j;
  switch (SEAM_SYMMETRIES[g].name) {
    case "identity":
      break;
    case "half-turn x": // (x, -y, -z): lon -> -lon, z -> -z
      ni = rings - 1 - i;
      nj = wrap(n - 1 - j);
      break;
    case "half-turn y": // (-x, y, -z): lon -> 180 - lon, z -> -z
      ni = rings - 1 - i;
      nj = wrap(2 * q - 1 - j);
      break;
    case "half-turn z": // lon -> lon + 180
      nj = wrap(j + 2 * q);
      break;
    case "rotoreflection +90": // (-y, x, -z): lon -> lon + 90, z -> -z
      ni = rings - 1 - i;
      nj = wrap(j + q);
      break;
    case "rotoreflection -90": // (y, -x, -z): lon -> lon - 90, z -> -z
      ni = rings - 1 - i;
      nj = wrap(j - q);
      break;
    case "mirror x=y": // (y, x, z): lon -> 90 - lon
      nj = wrap(q - 1 - j);
      break;
    case "mirror x=-y": // (-y, -x, z): lon -> -90 - lon
      nj = wrap(-q - 1 - j);
      break;
    default:
      throw new Error(`unknown symmetry ${SEAM_SYMMETRIES[g].name}`);
  }
  return grid.ringStart[ni] + nj;
}

/**
 * For each cell, the smallest index in its orbit under the seam symmetries
 * (the representative whose value stands for the whole orbit); with `properOnly`,
 * under the four rotations alone (for numbers a mirror changes).
 */
export function orbitRepresentatives(grid: SphereGrid, properOnly = false): Int32Array {
  const rep = new Int32Array(grid.count);
  for (let idx = 0; idx < grid.count; idx++) {
    let best = idx;
    for (let g = 1; g < SEAM_SYMMETRIES.length; g++) {
      if (properOnly && !SEAM_SYMMETRIES[g].proper) continue;
      const image = symmetryImage(grid, idx, g);
      if (image < best) best = image;
    }
    rep[idx] = best;
  }
  return rep;
}

/**
 * The cells that touch cell `index`: its two ring neighbours and, in each adjacent
 * ring, the cells whose longitude spans meet its own (writes into `out`, returns the count).
 */
export function gridNeighbours(grid: SphereGrid, index: number, out: Int32Array): number {
  const rings = grid.ringCount.length;
  const i = grid.ring[index];
  const j = grid.slot[index];
  const n = grid.ringCount[i];
  let count = 0;
  out[count++] = grid.ringStart[i] + ((j + 1) % n);
  out[count++] = grid.ringStart[i] + ((j + n - 1) % n);
  const lon0 = j / n;
  const lon1 = (j + 1) / n;
  for (const ni of [i - 1, i + 1]) {
    if (ni < 0 || ni >= rings) continue;
    const m = grid.ringCount[ni];
    const first = Math.floor(lon0 * m);
    const last = Math.ceil(lon1 * m) - 1;
    for (let s = first; s <= last && count < out.length; s++) out[count++] = grid.ringStart[ni] + (((s % m) + m) % m);
  }
  return count;
}

/**
 * A value at the unit vector (x, y, z) read from per-cell `values` of `grid`: linear in
 * longitude between the two nearest cell centres of each ring, then linear in z between
 * the two rings whose centres bracket z. Above the last ring's centre (toward a pole) the
 * ring's reading is blended linearly in z with the pole's value, the mean of that ring.
 * Exact at every cell centre; continuous everywhere. Error for a smooth field: second
 * order in the spacing h away from the poles; within about ten cells of a pole, where a
 * ring holds few cells and linear steps in longitude cut across its small circle, first
 * order (tests/geometry/sphereGrid.test.ts).
 */
export function interpolateOnGrid(grid: SphereGrid, values: ArrayLike<number>, x: number, y: number, z: number): number {
  const rings = grid.ringCount.length;
  const edges = grid.ringEdges;
  // ring holding z (edges ascending), then the neighbour ring on z's side of its centre
  let lo = 0;
  let hi = rings;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (z >= edges[mid]) lo = mid;
    else hi = mid;
  }
  const i = lo;
  const zi = grid.points[3 * grid.ringStart[i] + 2];
  let lon = Math.atan2(y, x);
  if (lon < 0) lon += 2 * Math.PI;
  const vi = ringValue(grid, values, i, lon);
  const k = z >= zi ? i + 1 : i - 1;
  if (k < 0 || k >= rings) {
    // past the outermost ring's centre: toward the pole's value, the ring's mean
    const n = grid.ringCount[i];
    let mean = 0;
    for (let j = 0; j < n; j++) mean += values[grid.ringStart[i] + j];
    mean /= n;
    const pole = k < 0 ? -1 : 1;
    const t = (z - zi) / (pole - zi);
    return (1 - t) * vi + t * mean;
  }
  const zk = grid.points[3 * grid.ringStart[k] + 2];
  const t = (z - zi) / (zk - zi);
  return (1 - t) * vi + t * ringValue(grid, values, k, lon);
}

/** Ring i's value at longitude lon in [0, 2 pi): linear between its two nearest cell centres. */
function ringValue(grid: SphereGrid, values: ArrayLike<number>, i: number, lon: number): number {
  const n = grid.ringCount[i];
  const u = (lon * n) / (2 * Math.PI) - 0.5;
  const f0 = Math.floor(u);
  const f = u - f0;
  const j0 = ((f0 % n) + n) % n;
  const j1 = j0 + 1 === n ? 0 : j0 + 1;
  const s = grid.ringStart[i];
  return (1 - f) * values[s + j0] + f * values[s + j1];
}
