import { existsSync, mkdirSync, mkdtempSync, readdirSync, statSync, utimesSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { cacheEntryPath, cacheFolder, cacheLimitBytes, DEFAULT_CACHE_BYTES, readCacheEntry, trimCache, writeCacheEntry } from "../../src/io/cacheFiles.js";
import { TEST_CACHE_HOME } from "../support/cacheHome.js";

const fresh = () => mkdtempSync(join(tmpdir(), "seam-atlas-cachefiles-"));
const KIB = 1024;

describe("where the cache lives", () => {
  it("$XDG_CACHE_HOME/seam-atlas when XDG_CACHE_HOME is absolute [XDG Base Directory Specification 0.8, $XDG_CACHE_HOME]", () => {
    expect(cacheFolder({ env: { XDG_CACHE_HOME: "/var/tmp/xc" }, platform: "linux", home: "/home/ann" })).toBe("/var/tmp/xc/seam-atlas");
    // the specification wins on every system where it is set
    expect(cacheFolder({ env: { XDG_CACHE_HOME: "/var/tmp/xc" }, platform: "darwin", home: "/Users/ann" })).toBe("/var/tmp/xc/seam-atlas");
  });

  it("a relative or empty XDG_CACHE_HOME is ignored: ~/.cache/seam-atlas [XDG Base Directory Specification 0.8: relative paths are invalid and should be ignored; default $HOME/.cache]", () => {
    expect(cacheFolder({ env: { XDG_CACHE_HOME: "rel/cache" }, platform: "linux", home: "/home/ann" })).toBe("/home/ann/.cache/seam-atlas");
    expect(cacheFolder({ env: { XDG_CACHE_HOME: "" }, platform: "linux", home: "/home/ann" })).toBe("/home/ann/.cache/seam-atlas");
    expect(cacheFolder({ env: {}, platform: "linux", home: "/home/ann" })).toBe("/home/ann/.cache/seam-atlas");
  });

  it("macOS: ~/Library/Caches/seam-atlas [Apple, File System Programming Guide: Library/Caches]", () => {
    expect(cacheFolder({ env: {}, platform: "darwin", home: "/Users/ann" })).toBe("/Users/ann/Library/Caches/seam-atlas");
  });

  it("Windows: %LOCALAPPDATA%\\seam-atlas\\cache, else under the home's AppData\\Local [Microsoft, Known folders: FOLDERID_LocalAppData]", () => {
    // path.join is the host's; on this POSIX host the parts join with "/"
    expect(cacheFolder({ env: { LOCALAPPDATA: "/c/Users/ann/AppData/Local" }, platform: "win32", home: "/c/Users/ann" })).toBe(join("/c/Users/ann/AppData/Local", "seam-atlas", "cache"));
    expect(cacheFolder({ env: {}, platform: "win32", home: "/c/Users/ann" })).toBe(join("/c/Users/ann", "AppData", "Local", "seam-atlas", "cache"));
  });

  it("never inside the package: no home and no XDG_CACHE_HOME means no cache [README, the cache]", () => {
    expect(cacheFolder({ env: {}, platform: "linux", home: "" })).toBeNull();
    const def = cacheFolder();
    expect(def).not.toBeNull();
    expect(def!.includes("node_modules")).toBe(false);
  });

  it("under the test runner the default is the test file's own cache home, never the user's [tests/support/cacheHome.ts]", () => {
    expect(cacheFolder()).toBe(join(TEST_CACHE_HOME, "seam-atlas"));
  });

  it("the bound is 64 MiB unless SEAM_ATLAS_CACHE_MIB gives a positive number [README, the cache]", () => {
    expect(DEFAULT_CACHE_BYTES).toBe(64 * 1024 * 1024);
    expect(cacheLimitBytes({})).toBe(DEFAULT_CACHE_BYTES);
    expect(cacheLimitBytes({ SEAM_ATLAS_CACHE_MIB: "2" })).toBe(2 * 1024 * 1024);
    for (const bad of ["0", "-5", "lots", ""]) expect(cacheLimitBytes({ SEAM_ATLAS_CACHE_MIB: bad })).toBe(DEFAULT_CACHE_BYTES);
  });
});

describe("the cache's bound: least recently used first", () => {
  const payload = (k: number) => new Uint8Array(10 * KIB).fill(k);

  it("writing past the bound drops the entries used longest ago, and a read counts as a use [common practice (no source): LRU eviction]", () => {
    const dir = fresh();
    const path = (k: number) => cacheEntryPath(dir, "screen-maps", `t/${k}.bin`);
    const limit = 35 * KIB; // three entries of about 10 KiB fit, four do not
    for (let k = 0; k < 3; k++) {
      expect(writeCacheEntry(dir, path(k), `h${k}`, payload(k), limit)).toBe(true);
      // distinct, increasing times of use (a file system may keep whole seconds only)
      const t = new Date(Date.UTC(2026, 0, 1, 0, 0, k));
      utimesSync(path(k), t, t);
    }
    // entry 0 is read now: it becomes the most recently used
    expect(readCacheEntry(path(0), "h0")).toEqual(payload(0));
    expect(writeCacheEntry(dir, path(3), "h3", payload(3), limit)).toBe(true);
    expect([0, 1, 2, 3].map((k) => existsSync(path(k)))).toEqual([true, false, true, true]);
    const total = readdirSync(join(dir, "screen-maps", "t")).reduce((s, f) => s + statSync(join(dir, "screen-maps", "t", f)).size, 0);
    expect(total).toBeLessThanOrEqual(limit);
  });

  it("the entry just written stays even when the others must all go [README, the cache]", () => {
    const dir = fresh();
    const a = cacheEntryPath(dir, "coefficient-maps", "x/a.bin");
    const b = cacheEntryPath(dir, "coefficient-maps", "x/b.bin");
    expect(writeCacheEntry(dir, a, "a", payload(1), 15 * KIB)).toBe(true);
    expect(writeCacheEntry(dir, b, "b", payload(2), 15 * KIB)).toBe(true);
    expect(existsSync(a)).toBe(false);
    expect(readCacheEntry(b, "b")).toEqual(payload(2));
  });

  it("files that are not cache entries are never deleted, whatever the bound [README, the cache: --cache pointed at a folder with other files]", () => {
    const dir = fresh();
    mkdirSync(join(dir, "screen-maps", "mine"), { recursive: true });
    const foreign = join(dir, "screen-maps", "mine", "photo.bin");
    writeFileSync(foreign, new Uint8Array(50 * KIB));
    const beside = join(dir, "notes.bin");
    writeFileSync(beside, new Uint8Array(50 * KIB));
    trimCache(dir, 1);
    expect(existsSync(foreign)).toBe(true);
    expect(existsSync(beside)).toBe(true);
  });

  it("a cache folder that cannot be written is skipped: false, no throw, nothing read [README, the cache]", () => {
    // /proc refuses new entries (ENOENT) for every user, root included
    const dir = "/proc/seam-atlas-no-cache";
    expect(writeCacheEntry(dir, cacheEntryPath(dir, "screen-maps", "a/b.bin"), "h", payload(1))).toBe(false);
    expect(readCacheEntry(cacheEntryPath(dir, "screen-maps", "a/b.bin"), "h")).toBeUndefined();
    // a folder path that is a file
    const file = join(fresh(), "a-file");
    writeFileSync(file, "x");
    expect(writeCacheEntry(file, cacheEntryPath(file, "screen-maps", "a/b.bin"), "h", payload(1))).toBe(false);
  });
});
