/**
 * The seam-force model's turn-averaged coefficients over the orientations that
 * `explain` tries, at gyro angles every GYRO_STEP_DEG, for one model.
 *
 * Orientations: the cells of an equal-area ring grid on the ball (ball frame,
 * geometry/seamCurve.ts; grid: geometry/sphereGrid.ts), one per orbit of the seam's
 * PROPER rotations. The proper rotations of the seam's group leave both coefficients
 * (c_a, c_m) unchanged (seamModel/map.ts), so each such orbit is one orientation for
 * this model; the mirrors reverse c_m, so a mirror image is a different orientation
 * and is kept as its own cell. (An orbit fixed by a mirror has c_m = 0 exactly.)
 *
 * A `GyroMap` holds (c_a, c_m) at each representative for one gyro key k (gyro
 * k * GYRO_STEP_DEG, clamped inside +-89.9 deg); coefficients at other gyro angles are
 * interpolated linearly between the two nearest keys. Maps come from a
 * `GyroMapSource`: `computeGyroMap` here, or a cache that stores its results
 * (src/jobs/explainCache.ts); the library itself never touches the disk.
 */
import { equalAreaGrid, orbitRepresentatives, type SphereGrid } from "../../geometry/sphereGrid.js";
import { DEG } from "../../geometry/units.js";
import type { Vec3 } from "../../geometry/vec.js";
import { coefficientMap } from "./seamModel/map.js";
import type { SeamModel } from "./seamModel/model.js";
import { turnAverage } from "./seamModel/turn.js";

/** Spacing of the gyro angles at which coefficient maps are computed, deg. */
export const GYRO_STEP_DEG = 2.5;
/** Largest |gyro| a map is computed at, deg (the model needs |gyro| < 90). */
const GYRO_CLAMP_DEG = 89.9;

/** The orientations tried: a grid and one cell per proper-rotation orbit. */
export interface OrientationSet {
  readonly grid: SphereGrid;
  /** Cell index of each representative. */
  readonly cells: Int32Array;
  /** Unit axes of the representatives, flat (3 per representative). */
  readonly axes: Float64Array;
}

/** (c_a, c_m) at each representative of an OrientationSet for one gyro key. */
export interface GyroMap {
  readonly across: Float64Array;
  readonly alongMagnus: Float64Array;
}

/** Where maps come from (computed, or read from a cache). */
export type GyroMapSource = (key: number) => GyroMap;

/** The orientation set of a grid with spacing `spacingRad`. */
export function orientationSet(spacingRad: number): OrientationSet {
  const grid = equalAreaGrid(spacingRad);
  const rep = orbitRepresentatives(grid, true);
  const cells: number[] = [];
  for (let i = 0; i < grid.count; i++) if (rep[i] === i) cells.push(i);
  const axes = new Float64Array(3 * cells.length);
  cells.forEach((c, k) => {
    axes[3 * k] = grid.points[3 * c];
    axes[3 * k + 1] = grid.points[3 * c + 1];
    axes[3 * k + 2] = grid.points[3 * c + 2];
  });
  return { grid, cells: Int32Array.from(cells), axes };
}

/** The gyro angle of key k, rad. */
export function gyroOfKey(key: number): number {
  return Math.max(-GYRO_CLAMP_DEG, Math.min(GYRO_CLAMP_DEG, key * GYRO_STEP_DEG)) * DEG;
}

/** The two keys around a gyro angle and the weight of the upper one: c = (1 - f) c(k0) + f c(k0 + 1). */
export function gyroKeys(gyroRad: number): { k0: number; f: number } {
  const u = gyroRad / DEG / GYRO_STEP_DEG;
  const k0 = Math.floor(u);
  return { k0, f: u - k0 };
}

/** Computes the map at gyro key `key` for `set` (one turn average per mirror-pair of orbits). */
export function computeGyroMap(model: SeamModel, set: OrientationSet, key: number): GyroMap {
  const map = coefficientMap(model, gyroOfKey(key), set.grid);
  const n = set.cells.length;
  const across = new Float64Array(n);
  const alongMagnus = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    across[k] = map.across[set.cells[k]];
    alongMagnus[k] = map.alongMagnus[set.cells[k]];
  }
  return { across, alongMagnus };
}

/** A memo of maps by key in front of a source (maps are small: 2 doubles per orientation). */
export function memoGyroMaps(source: GyroMapSource): GyroMapSource {
  const maps = new Map<number, GyroMap>();
  return (key) => {
    let m = maps.get(key);
    if (!m) {
      m = source(key);
      maps.set(key, m);
    }
    return m;
  };
}

/**
 * The coefficient at one axis (ball frame) and gyro, interpolated between the gyro
 * keys exactly as the maps are (so an axis on the grid gets the map's numbers):
 * for refining an orientation off the grid.
 */
export function coefficientAt(model: SeamModel, axis: Readonly<Vec3>, gyroRad: number, out: { across: number; alongMagnus: number }): { across: number; alongMagnus: number } {
  const { k0, f } = gyroKeys(gyroRad);
  const c0 = turnAverage(model, axis, gyroOfKey(k0));
  let ca = c0.across;
  let cm = c0.alongMagnus;
  if (f > 0) {
    const c1 = turnAverage(model, axis, gyroOfKey(k0 + 1));
    ca = (1 - f) * ca + f * c1.across;
    cm = (1 - f) * cm + f * c1.alongMagnus;
  }
  out.across = ca;
  out.alongMagnus = cm;
  return out;
}
