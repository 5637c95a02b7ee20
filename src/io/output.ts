/**
 * The one output writer for every command: whole files or nothing.
 *
 * Plan first (planOutputs, outputPlan.ts), compute, then write each planned output:
 * - `stdout` (`-`): written to standard output;
 * - `device` (a character device, a FIFO, or what /dev/stdout and the like lead
 *   to): opened for writing (append, no create, no truncate) and written straight
 *   into; no temporary file, no rename. Opening a FIFO waits for a reader, as a
 *   shell redirection does;
 * - `file`: written to a temporary file beside the target, created exclusively
 *   under a random name (tempFiles.ts), then fsync, then the old file's mode (and,
 *   when run as root, its owner) is given to it, then it is renamed over the
 *   target; a new file gets 0o666 less the umask. A symbolic link given as the
 *   output is left in place and its target is the file replaced.
 * On any failure the temporary file is removed and one InputError line says
 * `cannot write "PATH": WHY` (no space left on device, permission denied, ...);
 * on SIGINT/SIGTERM while a temporary file exists it is removed too.
 *
 * Concurrent runs writing the same file: each writes its own temporary file and
 * renames it into place, and rename(2) replaces atomically, so the file is always
 * one run's whole output: the last rename wins. Hard links to a replaced file keep
 * the old contents (a rename gives the name a new inode).
 *
 * The streamed form buffers up to FLUSH_BYTES and writes in order. `commit()` makes
 * what was written the output; `abort()` throws it away (a batch stopped by a bad row).
 */
import { close, closeSync, constants, fchmodSync, fchownSync, fstat, fstatSync, fsync, fsyncSync, open, openSync, renameSync, statSync, write, writeSync, type Stats } from "node:fs";
import { dirname } from "node:path";
import { InputError } from "./errors.js";
import type { PlannedOutput } from "./outputPlan.js";
import { quote } from "./quote.js";
import { createTemp, removeTemp, untrackTemp } from "./tempFiles.js";
import { writeError } from "./writeErrors.js";

export { formatOfPath, OUTPUT_FORMATS, planOutputs, writesStraight, type InputRef, type OutputFormat, type OutputRequest, type PlannedOutput } from "./outputPlan.js";
export { uniqueSlugs } from "./slugs.js";

/** Bytes gathered by an output stream before they are written. */
export const FLUSH_BYTES = 64 * 1024;

const DEVICE_FLAGS = constants.O_WRONLY | constants.O_APPEND | (constants.O_NOCTTY ?? 0);

/** A streamed output; see the module header. */
export interface OutputStream {
  readonly target: PlannedOutput;
  /** Adds text (as UTF-8) or bytes; resolves when the data is buffered or written. */
  write(chunk: string | Uint8Array): Promise<void>;
  /** Writes what is buffered and puts the output in place. */
  commit(): Promise<void>;
  /** Throws away what was written (the temporary file is removed); safe to call twice. */
  abort(): void;
}

/**
 * Writes `data` (text as UTF-8) to a planned output, synchronously.
 * @throws InputError `cannot write "PATH": WHY`; the old file, if any, is untouched.
 */
export function writeOutput(target: PlannedOutput, data: string | Uint8Array): void {
  const bytes = typeof data === "string" ? Buffer.from(data, "utf8") : data;
  if (target.kind === "stdout") {
    try {
      writeAllSync(1, bytes);
    } catch (err) {
      throw writeError("-", err);
    }
    return;
  }
  if (target.kind === "device") {
    let fd: number | undefined;
    try {
      fd = openSync(target.path, DEVICE_FLAGS);
      checkStillDevice(target, fstatSync(fd));
      writeAllSync(fd, bytes);
    } catch (err) {
      throw writeError(target.given, err);
    } finally {
      if (fd !== undefined) closeQuietly(fd);
    }
    return;
  }
  const old = existingFile(target);
  let temp: { path: string; fd: number } | undefined;
  let fdOpen = false;
  try {
    temp = createTemp(target.path);
    fdOpen = true;
    keepOwnerAndMode(temp.fd, old);
    writeAllSync(temp.fd, bytes);
    fsyncSync(temp.fd);
    fdOpen = false;
    closeSync(temp.fd);
    renameSync(temp.path, target.path);
    untrackTemp(temp.path);
  } catch (err) {
    if (temp) {
      if (fdOpen) closeQuietly(temp.fd);
      removeTemp(temp.path);
    }
    throw writeError(target.given, err);
  }
  syncFolder(dirname(target.path));
}

/**
 * Opens a planned output for writing in pieces. For a file the temporary file is
 * created at once (so a folder that cannot be written fails here); a device is
 * opened on the first write.
 * @throws InputError when the temporary file cannot be created.
 */
export function openOutputStream(target: PlannedOutput): OutputStream {
  const sink = target.kind === "stdout" ? new StdoutSink() : target.kind === "device" ? new DeviceSink(target) : new FileSink(target);
  return new BufferedOutput(target, sink);
}

interface Sink {
  write(data: Buffer): Promise<void>;
  commit(): Promise<void>;
  /** Drops the output; `idle` settles when no write is in flight any more. */
  abort(idle: Promise<void>): void;
}

class BufferedOutput implements OutputStream {
  private pending: Buffer[] = [];
  private pendingBytes = 0;
  private chain: Promise<void> = Promise.resolve();
  private state: "open" | "committing" | "done" | "failed" = "open";
  private failure: Error | undefined;

  constructor(
    readonly target: PlannedOutput,
    private readonly sink: Sink,
  ) {}

  async write(chunk: string | Uint8Array): Promise<void> {
    this.assertOpen();
    // a copy: the caller may reuse its buffer once the promise settles
    const b = typeof chunk === "string" ? Buffer.from(chunk, "utf8") : Buffer.from(chunk);
    this.pending.push(b);
    this.pendingBytes += b.length;
    if (this.pendingBytes >= FLUSH_BYTES) await this.flush();
  }

  async commit(): Promise<void> {
    this.assertOpen();
    this.state = "committing";
    try {
      await this.flush();
      await this.sink.commit();
      this.state = "done";
    } catch (err) {
      throw this.fail(err);
    }
  }

  abort(): void {
    if (this.state === "done" || this.state === "failed") return;
    this.state = "failed";
    this.failure = new Error("the output was aborted");
    this.pending = [];
    this.pendingBytes = 0;
    this.sink.abort(this.chain.catch(() => undefined));
  }

  private assertOpen(): void {
    if (this.failure) throw this.failure;
    if (this.state !== "open") throw new Error(`output ${quote(this.target.given)} is already ${this.state === "done" ? "committed" : "closing"}`);
  }

  private async flush(): Promise<void> {
    if (this.pendingBytes === 0) return this.chain;
    const data = Buffer.concat(this.pending, this.pendingBytes);
    this.pending = [];
    this.pendingBytes = 0;
    this.chain = this.chain.then(() => this.sink.write(data));
    try {
      await this.chain;
    } catch (err) {
      throw this.fail(err);
    }
  }

  private fail(err: unknown): Error {
    if (this.state !== "failed") {
      this.state = "failed";
      this.failure = writeError(this.target.given, err);
      this.chain = this.chain.catch(() => undefined);
      this.sink.abort(this.chain);
    }
    return this.failure!;
  }
}

class FileSink implements Sink {
  private readonly temp: { path: string; fd: number };
  private closed = false;

  constructor(private readonly target: PlannedOutput) {
    const old = existingFile(target);
    try {
      this.temp = createTemp(target.path);
    } catch (err) {
      throw writeError(target.given, err);
    }
    try {
      keepOwnerAndMode(this.temp.fd, old);
    } catch (err) {
      closeQuietly(this.temp.fd);
      removeTemp(this.temp.path);
      throw writeError(target.given, err);
    }
  }

  write(data: Buffer): Promise<void> {
    return writeAll(this.temp.fd, data);
  }

  async commit(): Promise<void> {
    await new Promise<void>((res, rej) => fsync(this.temp.fd, (err) => (err ? rej(err) : res())));
    this.closed = true;
    await new Promise<void>((res, rej) => close(this.temp.fd, (err) => (err ? rej(err) : res())));
    renameSync(this.temp.path, this.target.path);
    untrackTemp(this.temp.path);
    syncFolder(dirname(this.target.path));
  }

  abort(idle: Promise<void>): void {
    removeTemp(this.temp.path);
    if (this.closed) return;
    this.closed = true;
    // close only when no write is in flight: a closed descriptor number can be
    // reused at once, and a late write must not land in another file
    void idle.then(() => closeQuietly(this.temp.fd));
  }
}

class DeviceSink implements Sink {
  private fd: Promise<number> | undefined;
  private closed = false;

  constructor(private readonly target: PlannedOutput) {}

  private opened(): Promise<number> {
    this.fd ??= new Promise<number>((res, rej) =>
      open(this.target.path, DEVICE_FLAGS, (err, fd) => {
        if (err) return rej(err);
        fstat(fd, (e, st) => {
          try {
            if (e) throw e;
            checkStillDevice(this.target, st);
            res(fd);
          } catch (bad) {
            closeQuietly(fd);
            rej(bad);
          }
        });
      }),
    );
    return this.fd;
  }

  async write(data: Buffer): Promise<void> {
    await writeAll(await this.opened(), data);
  }

  async commit(): Promise<void> {
    const fd = await this.opened();
    this.closed = true;
    await new Promise<void>((res, rej) => close(fd, (err) => (err ? rej(err) : res())));
  }

  abort(idle: Promise<void>): void {
    if (this.closed || !this.fd) return;
    this.closed = true;
    const fd = this.fd;
    void idle.then(() => fd.then(closeQuietly, () => undefined));
  }
}

class StdoutSink implements Sink {
  write(data: Buffer): Promise<void> {
    return new Promise<void>((res, rej) => {
      const onError = (err: Error) => rej(err);
      process.stdout.once("error", onError);
      process.stdout.write(data, (err) => {
        process.stdout.removeListener("error", onError);
        if (err) rej(err);
        else res();
      });
    });
  }

  async commit(): Promise<void> {}

  abort(): void {}
}

/** The target's current stats when it is an existing regular file; refuses anything else that appeared since planning. */
function existingFile(target: PlannedOutput): Stats | undefined {
  let st: Stats;
  try {
    st = statSync(target.path);
  } catch {
    return undefined;
  }
  if (!st.isFile()) throw new InputError(`${target.option} ${quote(target.given)} is no longer a regular file; expected a file to replace`);
  return st;
}

function checkStillDevice(target: PlannedOutput, st: Stats): void {
  if (st.isCharacterDevice() || st.isFIFO() || st.isFile()) return;
  throw new InputError(`${target.option} ${quote(target.given)} is no longer a device or a pipe; expected something to write into`);
}

/** Gives a new temporary file the replaced file's owner (as root) and permission bits. */
function keepOwnerAndMode(fd: number, old: Stats | undefined): void {
  if (!old) return;
  if (process.getuid?.() === 0) {
    try {
      fchownSync(fd, old.uid, old.gid);
    } catch {
      // a file system without owners: the mode below still holds
    }
  }
  fchmodSync(fd, old.mode & 0o7777);
}

/** Writes all of `bytes`, retrying short writes; a non-blocking descriptor that is full is waited for. */
function writeAllSync(fd: number, bytes: Uint8Array): void {
  let off = 0;
  while (off < bytes.length) {
    try {
      off += writeSync(fd, bytes, off, bytes.length - off);
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== "EAGAIN") throw err;
      Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 1);
    }
  }
}

function writeAll(fd: number, data: Buffer): Promise<void> {
  return new Promise<void>((res, rej) => {
    const step = (off: number) => {
      if (off >= data.length) return res();
      write(fd, data, off, data.length - off, null, (err, n) => {
        if (err && err.code === "EAGAIN") return void setTimeout(() => step(off), 1);
        if (err) return rej(err);
        step(off + n);
      });
    };
    step(0);
  });
}

function closeQuietly(fd: number): void {
  try {
    closeSync(fd);
  } catch {
    // already closed
  }
}

/** Makes the rename durable (the folder's entry); a file system that cannot is no error. */
function syncFolder(dir: string): void {
  try {
    const fd = openSync(dir, constants.O_RDONLY);
    try {
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
  } catch {
    // not supported here
  }
}
