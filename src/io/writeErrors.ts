/**
 * System errors as words for one-line messages. Wording follows the C library's
 * strerror texts (POSIX error names), lower-cased and with "directory" said as
 * "folder" as everywhere else in seam-atlas.
 */
import { InputError } from "./errors.js";
import { quote } from "./quote.js";

const WORDS: Record<string, string> = {
  ENOSPC: "no space left on device",
  EDQUOT: "disk quota exceeded",
  EFBIG: "file too large",
  EACCES: "permission denied",
  EPERM: "operation not permitted",
  EROFS: "the file system is read-only",
  EISDIR: "it is a folder",
  ENOTDIR: "a part of the path is not a folder",
  ENOENT: "no such file or folder",
  ENOTEMPTY: "a folder is in the way",
  EEXIST: "a file is in the way",
  ELOOP: "too many levels of symbolic links",
  ENAMETOOLONG: "the name is too long",
  EIO: "input/output error",
  EPIPE: "the reading end of the pipe is closed",
  ENXIO: "no such device or address",
  EMFILE: "too many open files",
  ENFILE: "too many open files in the system",
  EBUSY: "device or resource busy",
  ETXTBSY: "the file is busy",
  EXDEV: "the temporary file is on another device",
  EINVAL: "invalid argument",
  EAGAIN: "the device is not ready",
  EBADF: "bad file descriptor",
};

/** A system error (or anything thrown) as a few words, one line. */
export function errnoWords(err: unknown): string {
  const code = (err as NodeJS.ErrnoException | undefined)?.code;
  if (typeof code === "string" && WORDS[code]) return WORDS[code];
  if (typeof code === "string") return code;
  return (err instanceof Error ? err.message : String(err)).split("\n")[0];
}

/**
 * What to throw for a failed write: a system error (one with an errno code) becomes
 * the InputError `cannot write "PATH": WORDS`; an InputError passes through; any
 * other error (a defect) is returned unchanged so it is not mistaken for bad input.
 */
export function writeError(path: string, err: unknown): Error {
  if (err instanceof InputError) return err;
  if (typeof (err as NodeJS.ErrnoException | undefined)?.code === "string") return new InputError(`cannot write ${quote(path)}: ${errnoWords(err)}`, { cause: err });
  return err instanceof Error ? err : new Error(String(err));
}
