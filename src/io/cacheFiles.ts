/**
 * Cache files: results that are slow to compute and cheap to keep (the coefficient
 * maps of screen and explain: jobs/mapCache.ts), stored so that a file is used only
 * when it is whole and was made for exactly the same inputs.
 *
 * Where (cacheFolder): the user's cache folder, never inside the installed package.
 *   - $XDG_CACHE_HOME/seam-atlas when XDG_CACHE_HOME is an absolute path (the XDG Base
 *     Directory Specification; a relative or empty value is ignored, as it says);
 *   - else on Windows %LOCALAPPDATA%\seam-atlas\cache (when LOCALAPPDATA is absolute,
 *     else the same under the home folder's AppData\Local);
 *   - else on macOS ~/Library/Caches/seam-atlas;
 *   - else ~/.cache/seam-atlas.
 * With no home folder at all there is no default cache (null): the run computes.
 * `--cache FOLDER` puts it elsewhere, `--cache none` turns it off.
 *
 * A file holds, in order: the 8 bytes "SACACHE1"; the header's length (4 bytes,
 * little-endian) and the header, UTF-8 JSON naming everything the contents depend
 * on (format version, model hash, resolution, grid ...); the payload's length (4
 * bytes) and the payload; then the SHA-256 of all bytes before it (32 bytes). A file
 * is read only when the magic, both lengths, the checksum and the header (compared
 * byte for byte with the one the caller expects) all agree; anything else, a
 * truncated, corrupt or stale file, reads as missing, and the caller computes the
 * contents again and writes them over it.
 *
 * Bound: entries live in the kinds' subfolders (CACHE_KINDS) as *.bin files; after
 * every write the entries' total size is brought under the bound (DEFAULT_CACHE_BYTES,
 * 64 MiB; SEAM_ATLAS_CACHE_MIB overrides it) by deleting the least recently used
 * first. A read that hits sets the file's modification time to now, so "least
 * recently used" is the oldest modification time. Only files that begin with the
 * magic are ever deleted (and temporary files of ours left over an hour by a run that
 * died), so a --cache pointed at a folder holding other files never loses them.
 *
 * Writing: into a temporary file beside the target (exclusive, random name), then
 * renamed over it, so a reader never sees half a file and two processes writing the
 * same entry each leave a whole one. A cache that cannot be written (a read-only
 * folder, a full disk) is skipped without a word: the run only loses speed.
 */
import { createHash, randomBytes } from "node:crypto";
import { closeSync, constants, openSync, readdirSync, readFileSync, readSync, renameSync, statSync, unlinkSync, utimesSync, writeSync } from "node:fs";
import { homedir } from "node:os";
import { isAbsolute, join } from "node:path";
import { ensureFolder } from "./folders.js";

const MAGIC = Buffer.from("SACACHE1", "latin1");
const HASH_BYTES = 32;
/** The bound on the entries' total size, bytes. */
export const DEFAULT_CACHE_BYTES = 64 * 1024 * 1024;
/** The subfolders that hold entries, one per kind (the only places the bound looks). */
export const CACHE_KINDS = ["coefficient-maps", "screen-maps"] as const;
export type CacheKind = (typeof CACHE_KINDS)[number];
/** A temporary file older than this was left by a run that died, ms. */
const STALE_TEMP_MS = 60 * 60 * 1000;

/** What the default cache folder depends on (the process's by default; tests pass their own). */
export interface CacheHome {
  readonly env?: NodeJS.ProcessEnv;
  readonly platform?: NodeJS.Platform;
  readonly home?: string;
}

/** The user's cache folder for seam-atlas (see the header), or null when there is no home to put it in. */
export function cacheFolder(where: CacheHome = {}): string | null {
  const env = where.env ?? process.env;
  const platform = where.platform ?? process.platform;
  const absolute = (v: string | undefined) => v !== undefined && v !== "" && isAbsolute(v);
  if (absolute(env.XDG_CACHE_HOME)) return join(env.XDG_CACHE_HOME!, "seam-atlas");
  let home = where.home;
  if (home === undefined) {
    try {
      home = homedir();
    } catch {
      home = "";
    }
  }
  if (platform === "win32") {
    if (absolute(env.LOCALAPPDATA)) return join(env.LOCALAPPDATA!, "seam-atlas", "cache");
    return home && isAbsolute(home) ? join(home, "AppData", "Local", "seam-atlas", "cache") : null;
  }
  if (!home || !isAbsolute(home)) return null;
  if (platform === "darwin") return join(home, "Library", "Caches", "seam-atlas");
  return join(home, ".cache", "seam-atlas");
}

/** The bound on the cache's size, bytes: SEAM_ATLAS_CACHE_MIB when it is a positive number, else DEFAULT_CACHE_BYTES. */
export function cacheLimitBytes(env: NodeJS.ProcessEnv = process.env): number {
  const mib = Number(env.SEAM_ATLAS_CACHE_MIB);
  return env.SEAM_ATLAS_CACHE_MIB !== undefined && Number.isFinite(mib) && mib > 0 ? Math.floor(mib * 1024 * 1024) : DEFAULT_CACHE_BYTES;
}

function isFolder(path: string): boolean {
  try {
    return statSync(path).isDirectory();
  } catch {
    return false;
  }
}

function sha256(bytes: Uint8Array): Buffer {
  return createHash("sha256").update(bytes).digest();
}

/** The bytes of a cache entry. */
export function encodeCacheEntry(header: string, payload: Uint8Array): Buffer {
  const h = Buffer.from(header, "utf8");
  const body = Buffer.alloc(MAGIC.length + 4 + h.length + 4 + payload.length);
  let o = MAGIC.copy(body, 0);
  o = body.writeUInt32LE(h.length, o);
  o += h.copy(body, o);
  o = body.writeUInt32LE(payload.length, o);
  Buffer.from(payload.buffer, payload.byteOffset, payload.byteLength).copy(body, o);
  return Buffer.concat([body, sha256(body)]);
}

/** The payload of an entry's bytes if they are whole and carry `header`; undefined otherwise. */
export function decodeCacheEntry(bytes: Uint8Array, header: string): Uint8Array | undefined {
  const b = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  if (b.length < MAGIC.length + 8 + HASH_BYTES || !b.subarray(0, MAGIC.length).equals(MAGIC)) return undefined;
  const body = b.subarray(0, b.length - HASH_BYTES);
  if (!sha256(body).equals(b.subarray(b.length - HASH_BYTES))) return undefined;
  let o = MAGIC.length;
  const hl = body.readUInt32LE(o);
  o += 4;
  if (o + hl + 4 > body.length) return undefined;
  if (body.subarray(o, o + hl).toString("utf8") !== header) return undefined;
  o += hl;
  const pl = body.readUInt32LE(o);
  o += 4;
  if (o + pl !== body.length) return undefined;
  // copied out, so the caller may view it as any typed array (aligned)
  return new Uint8Array(body.subarray(o, o + pl));
}

/** An entry's file: CACHE/KIND/NAME (NAME may hold one subfolder level, "dir/file.bin"). */
export function cacheEntryPath(folder: string, kind: CacheKind, name: string): string {
  return join(folder, kind, name);
}

/**
 * Reads an entry; undefined when it is missing, unreadable, corrupt or made for other
 * inputs. A hit marks the file as just used (its modification time, for the bound).
 */
export function readCacheEntry(path: string, header: string): Uint8Array | undefined {
  let bytes: Buffer;
  try {
    bytes = readFileSync(path);
  } catch {
    return undefined;
  }
  const payload = decodeCacheEntry(bytes, header);
  if (payload) {
    try {
      const now = new Date();
      utimesSync(path, now, now);
    } catch {
      // a read-only cache still serves; it only forgets the order of use
    }
  }
  return payload;
}

/**
 * Writes an entry whole (temporary file, then rename), then holds the cache folder
 * under `limitBytes`; false when the cache cannot be written.
 * @param folder the cache folder (the bound counts the entries under it).
 */
export function writeCacheEntry(folder: string, path: string, header: string, payload: Uint8Array, limitBytes = cacheLimitBytes()): boolean {
  const dir = join(path, "..");
  const temp = join(dir, `.${randomBytes(6).toString("hex")}.tmp`);
  let fd: number | undefined;
  try {
    // one level at a time (folders.ts: Node's recursive mkdir never returns under /proc);
    // another thread or process may make the same folder meanwhile
    try {
      ensureFolder(dir, "the cache");
    } catch (err) {
      if (!isFolder(dir)) throw err;
    }
    fd = openSync(temp, constants.O_CREAT | constants.O_EXCL | constants.O_WRONLY, 0o644);
    const bytes = encodeCacheEntry(header, payload);
    let done = 0;
    while (done < bytes.length) done += writeSync(fd, bytes, done, bytes.length - done);
    closeSync(fd);
    fd = undefined;
    renameSync(temp, path);
  } catch {
    if (fd !== undefined) {
      try {
        closeSync(fd);
      } catch {
        // already closed
      }
    }
    try {
      unlinkSync(temp);
    } catch {
      // never made
    }
    return false;
  }
  trimCache(folder, limitBytes, path);
  return true;
}

interface EntryFile {
  readonly path: string;
  readonly bytes: number;
  readonly usedMs: number;
}

/** Entries and stale temporary files in a kind's folder and its subfolders (two levels). */
function listEntries(folder: string): { entries: EntryFile[]; staleTemps: string[] } {
  const entries: EntryFile[] = [];
  const staleTemps: string[] = [];
  const now = Date.now();
  const visit = (dir: string, depth: number) => {
    let names: string[];
    try {
      names = readdirSync(dir);
    } catch {
      return;
    }
    for (const name of names) {
      const path = join(dir, name);
      let st;
      try {
        st = statSync(path);
      } catch {
        continue;
      }
      if (st.isDirectory()) {
        if (depth > 0) visit(path, depth - 1);
      } else if (st.isFile() && name.endsWith(".bin")) entries.push({ path, bytes: st.size, usedMs: st.mtimeMs });
      else if (st.isFile() && /^\.[0-9a-f]{12}\.tmp$/.test(name) && now - st.mtimeMs > STALE_TEMP_MS) staleTemps.push(path);
    }
  };
  for (const kind of CACHE_KINDS) visit(join(folder, kind), 1);
  return { entries, staleTemps };
}

function startsWithMagic(path: string): boolean {
  let fd: number | undefined;
  try {
    fd = openSync(path, "r");
    const head = Buffer.alloc(MAGIC.length);
    return readSync(fd, head, 0, head.length, 0) === head.length && head.equals(MAGIC);
  } catch {
    return false;
  } finally {
    if (fd !== undefined) closeSync(fd);
  }
}

/**
 * Deletes the least recently used entries until their total is at most `limitBytes`
 * (`keep`, the entry just written, goes last and only if it alone is over the bound).
 * Returns the bytes the entries hold afterwards. Errors are ignored: the bound is
 * restored by the next write that can.
 */
export function trimCache(folder: string, limitBytes: number, keep?: string): number {
  const { entries, staleTemps } = listEntries(folder);
  for (const t of staleTemps) {
    try {
      unlinkSync(t);
    } catch {
      // another run's, or read-only
    }
  }
  let total = entries.reduce((s, e) => s + e.bytes, 0);
  if (total <= limitBytes) return total;
  // oldest use first; the one just written last of all
  entries.sort((a, b) => (a.path === keep ? 1 : 0) - (b.path === keep ? 1 : 0) || a.usedMs - b.usedMs || (a.path < b.path ? -1 : 1));
  for (const e of entries) {
    if (total <= limitBytes) break;
    if (!startsWithMagic(e.path)) continue;
    try {
      unlinkSync(e.path);
      total -= e.bytes;
    } catch {
      // gone already, or read-only
    }
  }
  return total;
}
