/**
 * The cache and the worker pool through the command line: neither may change a number.
 * Every run here has its own cache folder (a temporary XDG_CACHE_HOME or --cache), never
 * the user's (tests/support/cacheHome.ts).
 */
import { existsSync, mkdtempSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { ROOT, runCli } from "../support/cli.js";

const fresh = () => mkdtempSync(join(tmpdir(), "seam-atlas-cachepool-"));

/** Every file under `dir`, relative path to bytes. */
function files(dir: string, prefix = ""): Map<string, Buffer> {
  const out = new Map<string, Buffer>();
  if (!existsSync(join(dir, prefix))) return out;
  for (const name of readdirSync(join(dir, prefix))) {
    const rel = join(prefix, name);
    if (statSync(join(dir, rel)).isDirectory()) for (const [k, v] of files(dir, rel)) out.set(k, v);
    else out.set(rel, readFileSync(join(dir, rel)));
  }
  return out;
}

// the demo staff at a coarse grid: six pitches, four gyros, quick to screen
const STAFF = ["--demo", "--grid", "6"];

describe("the screen's coefficient maps on disk", () => {
  it("screen --json: the same bytes with a cold cache, a warm cache and --cache none; the cache is XDG_CACHE_HOME/seam-atlas [README, the cache; XDG Base Directory Specification 0.8]", () => {
    const home = fresh();
    const env = { XDG_CACHE_HOME: home };
    const cold = runCli(["screen", ...STAFF, "--json"], { env });
    expect(cold.code).toBe(0);
    const entries = files(join(home, "seam-atlas", "screen-maps"));
    // one map per distinct gyro of the demo staff (5, 10, 15 and 40 deg: templates/demo-staff.json)
    expect(entries.size).toBe(4);
    const warm = runCli(["screen", ...STAFF, "--json"], { env });
    const none = runCli(["screen", ...STAFF, "--json", "--cache", "none"], { env: { XDG_CACHE_HOME: fresh() } });
    expect(warm.stdout).toBe(cold.stdout);
    expect(none.stdout).toBe(cold.stdout);
    // the warm run read the entries and wrote none anew
    expect(files(join(home, "seam-atlas", "screen-maps"))).toEqual(entries);
    // nothing inside the package
    expect(existsSync(join(ROOT, "out", "cache", "screen-maps"))).toBe(false);
  });

  it("--cache none writes no cache at all [README, the cache]", () => {
    const home = fresh();
    const r = runCli(["screen", "--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--grid", "8", "--cache", "none"], { env: { XDG_CACHE_HOME: home } });
    expect(r.code).toBe(0);
    expect(readdirSync(home)).toEqual([]);
  });

  it("corrupt entries are computed again, written whole, and the numbers do not change [SHA-256 checksum, FIPS 180-4]", () => {
    const cache = fresh();
    const first = runCli(["screen", ...STAFF, "--json", "--cache", cache]);
    const good = files(cache);
    expect(good.size).toBe(4);
    let k = 0;
    for (const [rel, bytes] of good) {
      const bad = Buffer.from(bytes);
      // a flipped bit, a truncated file, an empty one, garbage
      if (k % 4 === 0) bad[bad.length >> 1] ^= 1;
      writeFileSync(join(cache, rel), k % 4 === 1 ? bad.subarray(0, 100) : k % 4 === 2 ? Buffer.alloc(0) : k % 4 === 3 ? Buffer.from("not a cache entry") : bad);
      k++;
    }
    const again = runCli(["screen", ...STAFF, "--json", "--cache", cache]);
    expect(again.code).toBe(0);
    expect(again.stdout).toBe(first.stdout);
    expect(files(cache)).toEqual(good);
  });

  it("a cache folder that cannot be written is skipped without a word [README, the cache]", () => {
    const r = runCli(["screen", "--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--grid", "8", "--json", "--cache", "/proc/seam-atlas-cache"]);
    const ref = runCli(["screen", "--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--grid", "8", "--json", "--cache", "none"]);
    expect(r.code).toBe(0);
    expect(r.stderr).toBe("");
    expect(r.stdout).toBe(ref.stdout);
  });

  it("SEAM_ATLAS_CACHE_MIB bounds the folder: the oldest maps go, the run's numbers stay [README, the cache]", () => {
    const cache = fresh();
    // four maps of 4,584 cells at 3 deg, 16 bytes a cell (about 73 KiB each): two fit under 0.16 MiB
    const r = runCli(["screen", "--demo", "--grid", "3", "--top", "2", "--json", "--cache", cache], { env: { SEAM_ATLAS_CACHE_MIB: "0.16" } });
    expect(r.code).toBe(0);
    const left = files(cache);
    const total = [...left.values()].reduce((s, b) => s + b.length, 0);
    expect(total).toBeLessThanOrEqual(0.16 * 1024 * 1024);
    expect(left.size).toBe(2);
    const ref = runCli(["screen", "--demo", "--grid", "3", "--top", "2", "--json", "--cache", "none"]);
    expect(r.stdout).toBe(ref.stdout);
  });
});

describe("one worker pool", () => {
  it("atlas: the same PDF bytes on this thread (--threads 0) and on 2 worker threads, cold and warm cache [determinism: one code path, the same inputs]", () => {
    const dir = fresh();
    const cache = join(dir, "cache");
    const staff = ["--demo", "--grid", "8", "--top", "2"];
    const args = (threads: string, out: string) => ["atlas", ...staff, "--threads", threads, "--cache", cache, "--out", join(dir, out)];
    expect(runCli(args("2", "two-cold.pdf")).code).toBe(0);
    expect(runCli(["atlas", ...staff, "--threads", "0", "--cache", "none", "--out", join(dir, "zero-none.pdf")]).code).toBe(0);
    expect(runCli(args("2", "two-warm.pdf")).code).toBe(0);
    const ref = readFileSync(join(dir, "zero-none.pdf"));
    expect(ref.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    for (const f of ["two-cold.pdf", "two-warm.pdf"]) expect(readFileSync(join(dir, f)).equals(ref)).toBe(true);
  });

  it("card: a staff sheet has the same PDF bytes on this thread (--threads 0) and on 2 worker threads [determinism: one code path, the same inputs]", () => {
    const dir = fresh();
    const cache = join(dir, "cache");
    const args = (threads: string, out: string) => ["card", "--demo", "--grid", "8", "--layout", "letter-2-cards-4x6", "--threads", threads, "--cache", cache, "--out", join(dir, out)];
    for (const [t, f] of [["2", "two.pdf"], ["0", "zero.pdf"]]) expect(runCli(args(t, f)).code).toBe(0);
    const ref = readFileSync(join(dir, "zero.pdf"));
    expect(ref.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    expect(readFileSync(join(dir, "two.pdf")).equals(ref)).toBe(true);
  });
});
