/**
 * Coefficient maps kept on disk (io/cacheFiles.ts): the turn-averaged seam force over
 * a set of spin axes at one gyro, the slowest part of both screen and explain,
 * computed once per model profile, resolution, grid and gyro, and read back by every
 * later run and every worker thread.
 *
 *   CACHE/coefficient-maps/<16 hex digits>/gyro<key>.bin    explain's orientation set, per gyro key
 *   CACHE/screen-maps/<16 hex digits>/<16 hex digits>.bin   the screen's grid, per gyro
 *
 * The folder name is the SHA-256 of the header without the gyro (the file name, for
 * the screen, the SHA-256 of the whole header); the header (checked byte for byte on
 * every read) names the format version, the tool's version, the model profile's hash,
 * the model's resolution and seam shape, the grid, the gyro and the number of cells.
 * Any change to those gives other files; a file that does not match, is truncated or
 * fails its checksum is computed again and written over. The maps read back are the
 * computed ones bit for bit (Float64 written as it is in memory), so the numbers of a
 * run do not depend on the cache.
 */
import { createHash } from "node:crypto";
import { cacheEntryPath, readCacheEntry, writeCacheEntry } from "../io/cacheFiles.js";
import { computeGyroMap, GYRO_STEP_DEG, type GyroMap, type GyroMapSource, type OrientationSet } from "../physics/explainMaps.js";
import { coefficientMap, type CoefficientMap } from "../physics/seamModel/map.js";
import type { SeamModel } from "../physics/seamModel/model.js";
import type { CoefficientMapSource } from "../screening/screen.js";
import type { SphereGrid } from "../../geometry/sphereGrid.js";
import { DEG } from "../../geometry/units.js";
import { TOOL_VERSION } from "../version.js";

/** Bumped whenever the file's layout or the maps' meaning changes. */
export const MAP_CACHE_FORMAT = 1;

export interface MapCacheStats {
  hits: number;
  computed: number;
  written: number;
}

const hex16 = (text: string) => createHash("sha256").update(text).digest("hex").slice(0, 16);

function headerOf(model: SeamModel, set: OrientationSet, key: number | null): string {
  return JSON.stringify({
    format: "seam-atlas explain coefficient map",
    version: MAP_CACHE_FORMAT,
    tool: TOOL_VERSION,
    modelHash: model.profile.hash,
    resolution: model.resolution,
    gridDeg: Math.round((set.grid.spacingRad / DEG) * 1e9) / 1e9,
    gyroStepDeg: GYRO_STEP_DEG,
    orientations: set.cells.length,
    ...(key === null ? {} : { key }),
  });
}

/** The file of one key's map. */
export function mapCachePath(folder: string, model: SeamModel, set: OrientationSet, key: number): string {
  return cacheEntryPath(folder, "coefficient-maps", `${hex16(headerOf(model, set, null))}/gyro${key}.bin`);
}

/** Two Float64 arrays of n values as one payload, and back (copied out, so aligned). */
function packPair(a: Float64Array, b: Float64Array): Uint8Array {
  const all = new Float64Array(a.length + b.length);
  all.set(a, 0);
  all.set(b, a.length);
  return new Uint8Array(all.buffer);
}
function unpackPair(payload: Uint8Array | undefined, n: number): [Float64Array, Float64Array] | undefined {
  if (!payload || payload.byteLength !== 16 * n) return undefined;
  const all = new Float64Array(payload.buffer, payload.byteOffset, 2 * n);
  return [all.slice(0, n), all.slice(n)];
}

/**
 * A map source that reads each key's map from the cache, or computes and stores it.
 * @param folder the cache folder (io/cacheFiles.ts cacheFolder()); null computes in memory only.
 */
export function cachedGyroMaps(folder: string | null, stats?: MapCacheStats): (model: SeamModel, set: OrientationSet) => GyroMapSource {
  return (model, set) => (key) => {
    const n = set.cells.length;
    if (folder === null) {
      if (stats) stats.computed++;
      return computeGyroMap(model, set, key);
    }
    const path = mapCachePath(folder, model, set, key);
    const header = headerOf(model, set, key);
    const hit = unpackPair(readCacheEntry(path, header), n);
    if (hit) {
      if (stats) stats.hits++;
      return { across: hit[0], alongMagnus: hit[1] } satisfies GyroMap;
    }
    const map = computeGyroMap(model, set, key);
    if (stats) stats.computed++;
    if (writeCacheEntry(folder, path, header, packPair(map.across, map.alongMagnus)) && stats) stats.written++;
    return map;
  };
}

function screenHeaderOf(model: SeamModel, gyroRad: number, grid: SphereGrid): string {
  return JSON.stringify({
    format: "seam-atlas screen coefficient map",
    version: MAP_CACHE_FORMAT,
    tool: TOOL_VERSION,
    modelHash: model.profile.hash,
    resolution: model.resolution,
    // both exact: JSON writes a double's shortest round-tripping digits
    gridSpacingRad: grid.spacingRad,
    cells: grid.count,
    gyroRad,
  });
}

/** The file of the screen's map for one model, gyro and grid. */
export function screenMapCachePath(folder: string, model: SeamModel, gyroRad: number, grid: SphereGrid): string {
  const { gyroRad: _, ...rest } = JSON.parse(screenHeaderOf(model, gyroRad, grid)) as Record<string, unknown>;
  return cacheEntryPath(folder, "screen-maps", `${hex16(JSON.stringify(rest))}/${hex16(screenHeaderOf(model, gyroRad, grid))}.bin`);
}

/**
 * The screen's coefficient maps (screening/screen.ts CoefficientMapSource) read from
 * the cache folder, or computed and stored there.
 */
export function cachedScreenMaps(folder: string, stats?: MapCacheStats): CoefficientMapSource {
  return (model, gyroRad, grid) => {
    const n = grid.count;
    const path = screenMapCachePath(folder, model, gyroRad, grid);
    const header = screenHeaderOf(model, gyroRad, grid);
    const hit = unpackPair(readCacheEntry(path, header), n);
    if (hit) {
      if (stats) stats.hits++;
      // `evaluated` counts the model's work for a computed map: none for one read back
      return { across: hit[0], alongMagnus: hit[1], evaluated: 0 } satisfies CoefficientMap;
    }
    const map = coefficientMap(model, gyroRad, grid);
    if (stats) stats.computed++;
    if (writeCacheEntry(folder, path, header, packPair(map.across, map.alongMagnus)) && stats) stats.written++;
    return map;
  };
}
