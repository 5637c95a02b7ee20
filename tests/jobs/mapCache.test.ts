import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { DEG } from "../../geometry/units.js";
import { cachedGyroMaps, cachedScreenMaps, mapCachePath, screenMapCachePath, type MapCacheStats } from "../../src/jobs/mapCache.js";
import { encodeCacheEntry } from "../../src/io/cacheFiles.js";
import { coefficientMap } from "../../src/physics/seamModel/map.js";
import { equalAreaGrid } from "../../geometry/sphereGrid.js";
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

describe("the screen's coefficient-map cache", () => {
  const grid = equalAreaGrid(10 * DEG);
  const gyro = 12 * DEG;
  const stats = (): MapCacheStats => ({ hits: 0, computed: 0, written: 0 });

  it("the map read back is the computed one bit for bit [round trip; coefficientMap, physics/seamModel/map.ts]", () => {
    const dir = mkdtempSync(join(tmpdir(), "seam-atlas-cache-"));
    const first = stats();
    const a = cachedScreenMaps(dir, first)(model, gyro, grid);
    expect(first).toEqual({ hits: 0, computed: 1, written: 1 });
    const second = stats();
    const b = cachedScreenMaps(dir, second)(model, gyro, grid);
    expect(second).toEqual({ hits: 1, computed: 0, written: 0 });
    const direct = coefficientMap(model, gyro, grid);
    // the bytes, not a tolerance: the cache must not change a number
    expect(Buffer.from(b.across.buffer)).toEqual(Buffer.from(direct.across.buffer));
    expect(Buffer.from(b.alongMagnus.buffer)).toEqual(Buffer.from(direct.alongMagnus.buffer));
    expect(Buffer.from(a.across.buffer)).toEqual(Buffer.from(direct.across.buffer));
  });

  it("a corrupt or truncated entry is computed again and written over [SHA-256 checksum, FIPS 180-4]", () => {
    const dir = mkdtempSync(join(tmpdir(), "seam-atlas-cache-"));
    cachedScreenMaps(dir)(model, gyro, grid);
    const path = screenMapCachePath(dir, model, gyro, grid);
    const bytes = readFileSync(path);
    for (const bad of [Buffer.concat([bytes.subarray(0, 200), Buffer.from([bytes[200] ^ 0x40]), bytes.subarray(201)]), bytes.subarray(0, 40), Buffer.alloc(0)]) {
      writeFileSync(path, bad);
      const s = stats();
      const m = cachedScreenMaps(dir, s)(model, gyro, grid);
      expect(s).toEqual({ hits: 0, computed: 1, written: 1 });
      expect(Buffer.from(m.alongMagnus.buffer)).toEqual(Buffer.from(coefficientMap(model, gyro, grid).alongMagnus.buffer));
      expect(readFileSync(path)).toEqual(bytes);
    }
  });

  it("a stale entry (whole, but made for other inputs) is computed again and written over [README, the cache]", () => {
    const dir = mkdtempSync(join(tmpdir(), "seam-atlas-cache-"));
    cachedScreenMaps(dir)(model, gyro, grid);
    const path = screenMapCachePath(dir, model, gyro, grid);
    const good = readFileSync(path);
    // a whole entry with a valid checksum, but its header names an older format and other numbers
    const n = grid.count;
    writeFileSync(path, encodeCacheEntry(JSON.stringify({ format: "seam-atlas screen coefficient map", version: 0 }), new Uint8Array(16 * n).fill(7)));
    const s = stats();
    const m = cachedScreenMaps(dir, s)(model, gyro, grid);
    expect(s).toEqual({ hits: 0, computed: 1, written: 1 });
    expect(Buffer.from(m.across.buffer)).toEqual(Buffer.from(coefficientMap(model, gyro, grid).across.buffer));
    expect(readFileSync(path)).toEqual(good);
  });

  it("keys the file by model, gyro and grid [README, the cache]", () => {
    const dir = "/x";
    const other = seamModel(model.profile, { phases: 48 });
    const base = screenMapCachePath(dir, model, gyro, grid);
    expect(screenMapCachePath(dir, other, gyro, grid)).not.toBe(base);
    expect(screenMapCachePath(dir, model, gyro + 1e-12, grid)).not.toBe(base);
    expect(screenMapCachePath(dir, model, gyro, equalAreaGrid(9 * DEG))).not.toBe(base);
    expect(screenMapCachePath(dir, model, gyro, grid)).toBe(base);
  });
});
