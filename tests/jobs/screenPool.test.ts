import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { workerFile } from "../../src/jobs/pool.js";
import { parseScreen, screenOne } from "../../src/jobs/screen.js";
import { autoScreenThreads, gyroGroups, POOL_MIN_PITCHES, screenAllPooled } from "../../src/jobs/screenPool.js";

const REQUEST = { demo: true, grid: "8", top: "2" };

describe("the screen on the worker pool", () => {
  it("groups pitches by gyro, one coefficient map per group, in the order of their first pitch [screening/screen.ts: one map per model, gyro and grid]", () => {
    expect(gyroGroups([5, 10, 15, 40, 10, 15])).toEqual([[0], [1, 4], [2, 5], [3]]);
    expect(gyroGroups([])).toEqual([]);
    // every index exactly once
    const g = gyroGroups([1, 1, 1, 2, 3, 2]).flat().sort();
    expect(g).toEqual([0, 1, 2, 3, 4, 5]);
  });

  it("auto: no worker below three pitches, else one per core and at most one per gyro group [README, Threads]", () => {
    expect(autoScreenThreads(POOL_MIN_PITCHES - 1)).toBe(0);
    expect(autoScreenThreads(6, 1)).toBe(1);
    expect(autoScreenThreads(6, 4)).toBeGreaterThanOrEqual(1);
    expect(autoScreenThreads(6, 4)).toBeLessThanOrEqual(4);
  });

  it("under the test runner (TypeScript sources, no compiled worker) every thread count screens on this thread, with the numbers of screenOne [DEVELOPERS, one pool]", async () => {
    expect(workerFile()).toBeUndefined();
    const job = parseScreen({ ...REQUEST, cache: "none" });
    const order: number[] = [];
    let waited = 0;
    const pooled = await screenAllPooled(job, REQUEST, {}, 2, { onPitch: (i) => order.push(i), meanwhile: () => { waited++; } });
    expect(order).toEqual([0, 1, 2, 3, 4, 5]);
    expect(waited).toBe(1);
    job.pitches.forEach((p, i) => {
      const direct = screenOne(job, p);
      expect(pooled[i].report).toEqual(direct.report);
      expect(Buffer.from(pooled[i].mapValuesIn.buffer)).toEqual(Buffer.from(direct.result.scores.map((x) => x / 0.0254).buffer));
    });
  });

  it("the screen through the disk cache gives the same reports as without it, cold and warm [README, the cache: no number changes]", () => {
    const cache = mkdtempSync(join(tmpdir(), "seam-atlas-pool-"));
    const plain = parseScreen({ ...REQUEST, cache: "none" });
    expect(plain.maps).toBeUndefined();
    const ref = plain.pitches.map((p) => screenOne(plain, p).report);
    for (let run = 0; run < 2; run++) {
      // a new job each run: a fresh model, so the in-memory maps are empty and the disk is read
      const cached = parseScreen({ ...REQUEST, cache });
      expect(cached.maps).toBeDefined();
      expect(cached.pitches.map((p) => screenOne(cached, p).report)).toEqual(ref);
    }
  });
});
