import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { DEG } from "../../geometry/units.js";
import { cachedGyroMaps, mapCachePath, type MapCacheStats } from "../../src/jobs/explainCache.js";
import { computeGyroMap, orientationSet } from "../../src/physics/explainMaps.js";
import { seamModel } from "../../src/physics/seamModel/model.js";

const model = seamModel();
const set = orientationSet(15 * DEG);

describe("explain's coefficient-map cache", () => {
  it("computes a map once, then reads the same numbers back bit for bit [round trip]", () => {
    const dir = mkdtempSync(join(tmpdir(), "seam-atlas-cache-"));
    const first: MapCacheStats = { hits: 0, computed: 0, written: 0 };
    const a = cachedGyroMaps(dir, first)(model, set)(4);
    expect(first).toEqual({ hits: 0, computed: 1, written: 1 });
    const second: MapCacheStats = { hits: 0, computed: 0, written: 0 };
    const b = cachedGyroMaps(dir, second)(model, set)(4);
    expect(second).toEqual({ hits: 1, computed: 0, written: 0 });
    expect(Array.from(b.across)).toEqual(Array.from(a.across));
    expect(Array.from(b.alongMagnus)).toEqual(Array.from(a.alongMagnus));
    const direct = computeGyroMap(model, set, 4);
    expect(Array.from(b.across)).toEqual(Array.from(direct.across));
  });

  it("never trusts a corrupt or truncated file: it is computed again and written over [SHA-256 checksum, FIPS 180-4]", () => {
    const dir = mkdtempSync(join(tmpdir(), "seam-atlas-cache-"));
    cachedGyroMaps(dir)(model, set)(-2);
    const path = mapCachePath(dir, model, set, -2);
    const bytes = readFileSync(path);
    for (const bad of [Buffer.concat([bytes.subarray(0, 100), Buffer.from([bytes[100] ^ 1]), bytes.subarray(101)]), bytes.subarray(0, bytes.length - 9), Buffer.from("not a cache")]) {
      writeFileSync(path, bad);
      const stats: MapCacheStats = { hits: 0, computed: 0, written: 0 };
      const m = cachedGyroMaps(dir, stats)(model, set)(-2);
      expect(stats).toEqual({ hits: 0, computed: 1, written: 1 });
      expect(Array.from(m.alongMagnus)).toEqual(Array.from(computeGyroMap(model, set, -2).alongMagnus));
      expect(readFileSync(path)).toEqual(bytes);
    }
  });

  it("keys the file by model, resolution and grid: another profile or grid is another file", () => {
    const dir = mkdtempSync(join(tmpdir(), "seam-atlas-cache-"));
    const other = seamModel(model.profile, { phases: 48 });
    expect(mapCachePath(dir, other, set, 0)).not.toBe(mapCachePath(dir, model, set, 0));
    expect(mapCachePath(dir, model, orientationSet(12 * DEG), 0)).not.toBe(mapCachePath(dir, model, set, 0));
    expect(mapCachePath(dir, model, set, 1)).not.toBe(mapCachePath(dir, model, set, 0));
  });

  it("a cache that cannot be written only costs speed: the map still comes back [README, For analysts: the cache]", () => {
    const stats: MapCacheStats = { hits: 0, computed: 0, written: 0 };
    const m = cachedGyroMaps("/proc/seam-atlas-no-cache", stats)(model, set)(0);
    expect(stats.computed).toBe(1);
    expect(stats.written).toBe(0);
    expect(m.across.length).toBe(set.cells.length);
  });
});
