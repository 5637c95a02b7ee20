/**
 * explain's coefficient maps kept on disk (io/cacheFiles.ts), one file per gyro key:
 * computed once per model profile, resolution, grid and gyro step, and read back by
 * every later run and every worker thread.
 *
 *   CACHE/coefficient-maps/<16 hex digits>/gyro<key>.bin
 *
 * The folder name is the SHA-256 of the header without the key; the header (checked
 * byte for byte on every read) names the format version, the tool's version, the
 * model profile's hash, the model's resolution and seam shape, the grid spacing, the
 * gyro step, the key and the number of orientations. Any change to those gives other
 * files; a file that does not match, is truncated or fails its checksum is computed
 * again and written over.
 */
import { createHash } from "node:crypto";
import { join } from "node:path";
import { readCacheEntry, writeCacheEntry } from "../io/cacheFiles.js";
import { computeGyroMap, GYRO_STEP_DEG, type GyroMap, type GyroMapSource, type OrientationSet } from "../physics/explainMaps.js";
import type { SeamModel } from "../physics/seamModel/model.js";
import { DEG } from "../../geometry/units.js";
import { TOOL_VERSION } from "../version.js";

/** Bumped whenever the file's layout or the maps' meaning changes. */
export const MAP_CACHE_FORMAT = 1;

export interface MapCacheStats {
  hits: number;
  computed: number;
  written: number;
}

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
  const dir = createHash("sha256").update(headerOf(model, set, null)).digest("hex").slice(0, 16);
  return join(folder, "coefficient-maps", dir, `gyro${key}.bin`);
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
    const payload = readCacheEntry(path, header);
    if (payload && payload.byteLength === 16 * n) {
      const all = new Float64Array(payload.buffer, payload.byteOffset, 2 * n);
      if (stats) stats.hits++;
      return { across: all.slice(0, n), alongMagnus: all.slice(n) } satisfies GyroMap;
    }
    const map = computeGyroMap(model, set, key);
    if (stats) stats.computed++;
    const all = new Float64Array(2 * n);
    all.set(map.across, 0);
    all.set(map.alongMagnus, n);
    if (writeCacheEntry(path, header, new Uint8Array(all.buffer)) && stats) stats.written++;
    return map;
  };
}
