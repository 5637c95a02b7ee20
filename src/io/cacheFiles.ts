/**
 * Cache files: results that are slow to compute and cheap to keep (explain's
 * coefficient maps), stored so that a file is used only when it is whole and was
 * made for exactly the same inputs.
 *
 * Where: $XDG_CACHE_HOME/seam-atlas when XDG_CACHE_HOME is set to an absolute path
 * (the XDG Base Directory Specification), else out/cache in the project's folder.
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
 * Writing: into a temporary file beside the target (exclusive, random name), then
 * renamed over it, so a reader never sees half a file and two processes writing the
 * same entry each leave a whole one. A cache that cannot be written (a read-only
 * folder, a full disk) is skipped without a word: the run only loses speed.
 */
import { createHash, randomBytes } from "node:crypto";
import { closeSync, constants, openSync, readFileSync, renameSync, unlinkSync, writeSync } from "node:fs";
import { isAbsolute, join } from "node:path";
import { projectRoot } from "../version.js";
import { ensureFolder } from "./folders.js";

const MAGIC = Buffer.from("SACACHE1", "latin1");
const HASH_BYTES = 32;

/** The cache folder (see the header). */
export function cacheFolder(env: NodeJS.ProcessEnv = process.env): string {
  const xdg = env.XDG_CACHE_HOME;
  if (xdg !== undefined && xdg !== "" && isAbsolute(xdg)) return join(xdg, "seam-atlas");
  return join(projectRoot(), "out", "cache");
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

/** Reads an entry; undefined when it is missing, unreadable, corrupt or made for other inputs. */
export function readCacheEntry(path: string, header: string): Uint8Array | undefined {
  let bytes: Buffer;
  try {
    bytes = readFileSync(path);
  } catch {
    return undefined;
  }
  return decodeCacheEntry(bytes, header);
}

/** Writes an entry whole (temporary file, then rename); false when the cache cannot be written. */
export function writeCacheEntry(path: string, header: string, payload: Uint8Array): boolean {
  const folder = join(path, "..");
  const temp = join(folder, `.${randomBytes(6).toString("hex")}.tmp`);
  let fd: number | undefined;
  try {
    // one level at a time (folders.ts: Node's recursive mkdir never returns under /proc)
    ensureFolder(folder, "the cache");
    fd = openSync(temp, constants.O_CREAT | constants.O_EXCL | constants.O_WRONLY, 0o644);
    const bytes = encodeCacheEntry(header, payload);
    let done = 0;
    while (done < bytes.length) done += writeSync(fd, bytes, done, bytes.length - done);
    closeSync(fd);
    fd = undefined;
    renameSync(temp, path);
    return true;
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
}
