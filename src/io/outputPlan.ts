/**
 * Checking every output of a run before anything is computed, so that a run that
 * cannot write its results fails at once, with one line, and writes nothing.
 *
 * What a path means:
 * - `-` is standard output;
 * - a character device or a FIFO (/dev/null, /dev/stdout, a named pipe) is written
 *   straight into: never replaced by a rename. So is whatever a name under /dev or
 *   /proc leads to (/dev/stdout redirected by the shell to a file is appended to,
 *   as the shell's own writes are);
 * - a symbolic link is followed (to the end of a chain) and its final target is
 *   replaced atomically; the link itself stays. `PlannedOutput.path` is that target;
 * - a regular file, or a name that does not exist yet, is written through a
 *   temporary file and a rename (see output.ts);
 * - a socket, a block device or anything else is refused, and so is a folder.
 * Also refused: `""`; an output that is one of the run's inputs or another of its
 * outputs (same resolved path, same real path, or same device and inode: hard
 * links), checked for regular and not-yet-existing files; a file extension that
 * names another format than the one declared (not checked for `-` and devices).
 * Missing folders are created one level at a time, after all other checks pass;
 * the target's folder must be writable (a temporary file is made there and
 * removed at once, so root on a read-only mount is caught too), and so must an
 * existing target file.
 */
import { accessSync, closeSync, constants, existsSync, lstatSync, readlinkSync, realpathSync, statSync, type Stats } from "node:fs";
import { basename, dirname, extname, join, resolve } from "node:path";
import { InputError } from "./errors.js";
import { ensureFolder } from "./folders.js";
import { quote } from "./quote.js";
import { createTemp, removeTemp } from "./tempFiles.js";
import { errnoWords } from "./writeErrors.js";

/** Formats an output can declare. */
export const OUTPUT_FORMATS = ["json", "csv", "pdf", "svg", "png", "html"] as const;
export type OutputFormat = (typeof OUTPUT_FORMATS)[number];

const EXTENSIONS: Record<OutputFormat, readonly string[]> = {
  json: [".json"],
  csv: [".csv"],
  pdf: [".pdf"],
  svg: [".svg"],
  png: [".png"],
  html: [".html", ".htm"],
};

/** Longest chain of dangling symbolic links followed by hand (Linux stops at 40 too). */
const MAX_LINK_HOPS = 40;

/** One output the user asked for. */
export interface OutputRequest {
  /** The option that named it, e.g. `--out`. */
  readonly option: string;
  /** The path as typed; `-` is standard output. */
  readonly path: string;
  readonly format?: OutputFormat;
}

/** One input file of the run (`-` for standard input is ignored). */
export interface InputRef {
  readonly option: string;
  readonly path: string;
}

/** An output checked and ready for writeOutput / openOutputStream. */
export interface PlannedOutput {
  readonly option: string;
  /** The path as typed. */
  readonly given: string;
  /** `stdout`: `-`; `device`: a character device or FIFO written straight into; `file`: replaced atomically. */
  readonly kind: "stdout" | "device" | "file";
  /** `-`, the device's path, or the absolute path of the file to replace (the final target of any links). */
  readonly path: string;
  readonly format?: OutputFormat;
  /** Whether `given` is a symbolic link (it survives; `path` is its target). */
  readonly viaLink: boolean;
}

/** The format a file name's extension names, if any (case-insensitive). */
export function formatOfPath(path: string): OutputFormat | undefined {
  const ext = extname(path).toLowerCase();
  return OUTPUT_FORMATS.find((f) => EXTENSIONS[f].includes(ext));
}

/**
 * Checks every output against the rules in the module header, then creates
 * missing folders. Call it before computing anything.
 * @throws InputError naming the option and the path as typed.
 */
export function planOutputs(outputs: readonly OutputRequest[], inputs: readonly InputRef[]): PlannedOutput[] {
  const planned = outputs.map(classify);
  const identities = new Map<PlannedOutput, Identity | undefined>(planned.map((p) => [p, p.kind === "file" ? identityOf(p.path) : undefined]));
  const inputIds = inputs.filter((i) => i.path !== "-" && i.path !== "").map((i) => ({ input: i, id: identityOf(i.path) }));
  planned.forEach((p, i) => {
    if (p.kind === "stdout") {
      const other = planned.slice(0, i).find((q) => q.kind === "stdout");
      if (other) throw new InputError(`${p.option} "-" and ${other.option} "-" both write to standard output; expected at most one output on standard output`);
      return;
    }
    const id = identities.get(p);
    if (!id) return;
    for (const { input, id: inId } of inputIds) {
      if (inId && sameFile(id, inId)) throw new InputError(`${label(p)} is the same file as the input ${input.option} ${quote(input.path)}; expected a different output file`);
    }
    for (const q of planned.slice(0, i)) {
      const qId = identities.get(q);
      if (qId && sameFile(id, qId)) throw new InputError(`${label(p)} is the same file as ${label(q)}; expected a different file for each output`);
    }
  });
  for (const p of planned) if (p.kind === "file") checkFolder(p);
  return planned;
}

function label(p: { option: string; given: string }): string {
  return `${p.option} ${quote(p.given)}`;
}

function classify(req: OutputRequest): PlannedOutput {
  const { option, path: given, format } = req;
  const base = { option, given, format, viaLink: false };
  const where = label({ option, given });
  if (format !== undefined && !OUTPUT_FORMATS.includes(format)) throw new Error(`unknown output format ${format}`);
  if (given === "") throw new InputError(`${where}: the path is empty; expected a file path, or - for standard output`);
  if (given === "-") return { ...base, kind: "stdout", path: "-" };
  if (/\/$/.test(given) && !existsSync(given)) throw new InputError(`${where} names a folder; expected a file path`);
  const found = locate(given, where);
  const { stats, viaLink } = found;
  if (stats?.isDirectory()) throw new InputError(`${where} is a folder; expected a file path`);
  if (stats && (stats.isCharacterDevice() || stats.isFIFO())) return { ...base, kind: "device", path: given, viaLink };
  if (stats && !stats.isFile()) {
    const what = stats.isSocket() ? "a socket" : stats.isBlockDevice() ? "a block device" : "not a regular file";
    throw new InputError(`${where} is ${what}; expected a regular file, a new file, a character device, a named pipe or -`);
  }
  // /dev/stdout, /dev/fd/N, /proc/self/fd/N lead to whatever the shell opened: write
  // into it as a redirection would, never replace the file behind it
  if (stats && SYSTEM_FOLDERS.test(resolve(given))) return { ...base, kind: "device", path: given, viaLink };
  if (format !== undefined) {
    const named = formatOfPath(given);
    if (named !== undefined && named !== format) {
      throw new InputError(`${where}: the extension ${extname(given)} names ${named}, but this output is ${format}; expected a name ending in ${EXTENSIONS[format].join(" or ")}`);
    }
  }
  return { ...base, kind: "file", path: found.path, viaLink };
}

/**
 * Whether `path` (as typed) is written straight into rather than replaced: `-`, a
 * character device, a FIFO, or a file that a name under /dev or /proc leads to.
 * Such outputs have no file name to tell a format by.
 */
export function writesStraight(path: string): boolean {
  if (path === "-") return true;
  try {
    const st = statSync(path);
    return st.isCharacterDevice() || st.isFIFO() || (st.isFile() && SYSTEM_FOLDERS.test(resolve(path)));
  } catch {
    return false;
  }
}

/** Folders whose files are the system's, never replaced by a rename. */
const SYSTEM_FOLDERS = /^\/(dev|proc)\//;

/**
 * What `given` leads to. The kernel follows links first (that also resolves the
 * magic links under /proc/self/fd); a link whose chain ends nowhere is followed by
 * hand to the file it would create. `stats` is undefined when nothing exists there.
 */
function locate(given: string, where: string): { path: string; viaLink: boolean; stats?: Stats } {
  let viaLink = false;
  try {
    viaLink = lstatSync(given).isSymbolicLink();
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    if (code !== "ENOENT") throw pathError(where, err);
    return { path: canonicalNew(resolve(given)), viaLink };
  }
  try {
    const stats = statSync(given);
    return { path: stats.isFile() ? realpathSync(given) : resolve(given), viaLink, stats };
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== "ENOENT") throw pathError(where, err);
  }
  // a dangling link: the file it names will be created
  let path = resolve(given);
  for (let hop = 0; hop < MAX_LINK_HOPS; hop++) {
    let l: Stats;
    try {
      l = lstatSync(path);
    } catch {
      return { path: canonicalNew(path), viaLink };
    }
    if (!l.isSymbolicLink()) break;
    path = resolve(dirname(path), readlinkSync(path));
  }
  throw new InputError(`${where}: the chain of symbolic links does not end; expected a link to a file`);
}

function pathError(where: string, err: unknown): InputError {
  const code = (err as NodeJS.ErrnoException).code;
  if (code === "ENOTDIR") return new InputError(`${where}: a part of the path is a file, not a folder; expected a path through folders`);
  return new InputError(`${where}: ${errnoWords(err)}`);
}

/** The real path of a file that does not exist yet: its nearest existing folder, resolved, plus the rest. */
function canonicalNew(path: string): string {
  const rest: string[] = [];
  let d = path;
  while (!existsSync(d)) {
    rest.unshift(basename(d));
    const up = dirname(d);
    if (up === d) break;
    d = up;
  }
  try {
    return join(realpathSync(d), ...rest);
  } catch {
    return path;
  }
}

interface Identity {
  readonly real: string;
  readonly devIno?: string;
}

/** How to recognise a regular or not-yet-existing file; undefined for devices, folders and the like. */
function identityOf(path: string): Identity | undefined {
  let st: Stats;
  try {
    st = statSync(path);
  } catch {
    return { real: canonicalNew(resolve(path)) };
  }
  if (!st.isFile()) return undefined;
  return { real: realpathSync(path), devIno: `${st.dev}:${st.ino}` };
}

function sameFile(a: Identity, b: Identity): boolean {
  return a.real === b.real || (a.devIno !== undefined && a.devIno === b.devIno);
}

function checkFolder(p: PlannedOutput): void {
  const where = label(p);
  const dir = dirname(p.path);
  ensureFolder(dir, where);
  try {
    accessSync(dir, constants.W_OK);
    // access(2) answers for the permission bits only, and yes to root everywhere; a
    // file made and removed at once also meets a read-only mount, a file system
    // that takes no new files (sysfs) and a full quota of inodes
    const probe = createTemp(p.path);
    closeSync(probe.fd);
    removeTemp(probe.path);
  } catch (err) {
    throw new InputError(`${where}: cannot write into the folder ${quote(dir)}: ${errnoWords(err)}`);
  }
  if (existsSync(p.path)) {
    try {
      accessSync(p.path, constants.W_OK);
    } catch (err) {
      throw new InputError(`${where}: cannot replace the file: ${errnoWords(err)}`);
    }
  }
}
