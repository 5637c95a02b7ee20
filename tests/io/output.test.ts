/**
 * The output writer, one table of cases. Each case gets a fresh temporary folder.
 * References: POSIX open(2) (O_CREAT|O_EXCL fails with EEXIST on any existing entry,
 * a symbolic link included; the new file's mode is the mode argument less the
 * umask), POSIX rename(2) (atomic replacement of the new name), Linux full(4)
 * (/dev/full fails every write with ENOSPC), POSIX mkfifo(1), and exit status
 * 128 + signal number for a process ended by a signal (POSIX sh, "Exit Status").
 */
import { execFileSync, spawn, spawnSync, type ChildProcess } from "node:child_process";
import {
  chmodSync,
  closeSync,
  existsSync,
  linkSync,
  lstatSync,
  mkdirSync,
  mkdtempSync,
  openSync,
  readdirSync,
  readFileSync,
  readlinkSync,
  realpathSync,
  statSync,
  symlinkSync,
  writeFileSync,
} from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it, vi } from "vitest";
import { InputError } from "../../src/io/errors.js";
import { openOutputStream, planOutputs, writeOutput, type OutputFormat, type PlannedOutput } from "../../src/io/output.js";

// A switch for a predictable "random" temporary name (case: planted link at the next name).
const rnd = vi.hoisted(() => ({ fixed: undefined as Buffer | undefined }));
vi.mock("node:crypto", async (importOriginal) => {
  const real = await importOriginal<typeof import("node:crypto")>();
  return { ...real, randomBytes: (n: number) => (rnd.fixed ? Buffer.from(rnd.fixed) : real.randomBytes(n)) };
});

const ROOT = join(dirname(fileURLToPath(import.meta.url)), "..", "..");
const CHILD = join(ROOT, "tests", "io", "fixtures", "outputChild.ts");
const CHILD_ARGS = ["--import", "tsx", CHILD];

function plan(path: string, format?: OutputFormat, inputs: { option: string; path: string }[] = []): PlannedOutput {
  return planOutputs([{ option: "--out", path, format }], inputs)[0];
}

/** The InputError message of `fn`, checked to be one line. */
function refusal(fn: () => unknown): string {
  try {
    fn();
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    const m = (err as Error).message;
    expect(m).not.toContain("\n");
    return m;
  }
  throw new Error("not refused");
}

function temps(dir: string): string[] {
  return readdirSync(dir).filter((n) => n.endsWith(".tmp"));
}

function runChild(args: string[], stdio?: ("ignore" | "pipe" | number)[]): { status: number | null; signal: NodeJS.Signals | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [...CHILD_ARGS, ...args], { cwd: ROOT, encoding: "utf8", timeout: 60_000, stdio: stdio ?? "pipe" });
  return { status: r.status, signal: r.signal, stdout: r.stdout ?? "", stderr: r.stderr ?? "" };
}

function exited(p: ChildProcess): Promise<{ code: number | null; signal: NodeJS.Signals | null }> {
  return new Promise((resolve) => p.once("exit", (code, signal) => resolve({ code, signal })));
}

function saidReady(p: ChildProcess): Promise<void> {
  return new Promise((resolve, reject) => {
    let out = "";
    p.stdout!.on("data", (d) => {
      out += String(d);
      if (out.includes("ready")) resolve();
    });
    p.once("exit", () => reject(new Error(`child ended before it was ready: ${out}`)));
  });
}

interface Case {
  readonly name: string;
  run(dir: string): void | Promise<void>;
}

const cases: Case[] = [
  {
    name: "/dev/null is a sink: written straight into, still the same character device after",
    async run() {
      const before = statSync("/dev/null");
      const p = plan("/dev/null", "json");
      expect(p.kind).toBe("device");
      writeOutput(p, "{}\n");
      const s = openOutputStream(p);
      await s.write("x".repeat(200_000));
      await s.commit();
      const after = statSync("/dev/null");
      expect(after.isCharacterDevice()).toBe(true);
      expect([after.ino, after.rdev]).toEqual([before.ino, before.rdev]);
    },
  },
  {
    name: "a FIFO made with mkfifo is written straight into, with a reader on the other end (sync and streamed)",
    async run(dir) {
      const fifo = join(dir, "pipe");
      execFileSync("mkfifo", [fifo]);
      const data = "row,".repeat(100_000) + "end\n"; // more than a pipe's 64 KiB buffer
      for (const streamed of [false, true]) {
        const got = join(dir, `got-${streamed}.txt`);
        const reader = spawn("sh", ["-c", 'cat "$0" > "$1"', fifo, got]);
        const done = exited(reader);
        const p = plan(fifo, "csv");
        expect(p.kind).toBe("device");
        if (streamed) {
          const s = openOutputStream(p);
          await s.write(data.slice(0, 1000));
          await s.write(data.slice(1000));
          await s.commit();
        } else writeOutput(p, data);
        expect((await done).code).toBe(0);
        expect(readFileSync(got, "utf8")).toBe(data);
      }
      expect(lstatSync(fifo).isFIFO()).toBe(true);
      expect(temps(dir)).toEqual([]);
    },
  },
  {
    name: "a symbolic link is followed: its target is replaced and the link survives",
    run(dir) {
      const real = join(dir, "real.json");
      const link = join(dir, "link.json");
      writeFileSync(real, "old");
      symlinkSync("real.json", link);
      const p = plan(link, "json");
      expect([p.kind, p.viaLink, p.path]).toEqual(["file", true, realpathSync(real)]);
      writeOutput(p, "new");
      expect(lstatSync(link).isSymbolicLink()).toBe(true);
      expect(readlinkSync(link)).toBe("real.json");
      expect(readFileSync(real, "utf8")).toBe("new");
      expect(temps(dir)).toEqual([]);
    },
  },
  {
    name: "a dangling symbolic link creates the file it names and stays a link",
    run(dir) {
      const link = join(dir, "link.json");
      symlinkSync("made.json", link);
      writeOutput(plan(link), "made");
      expect(lstatSync(link).isSymbolicLink()).toBe(true);
      expect(readFileSync(join(dir, "made.json"), "utf8")).toBe("made");
    },
  },
  {
    name: "/dev/stdout redirected to a file is appended to, never replaced (same inode)",
    run(dir) {
      const log = join(dir, "log.txt");
      writeFileSync(log, "before\n");
      const ino = statSync(log).ino;
      const fd = openSync(log, "a");
      try {
        const r = runChild(["write", "/dev/stdout", "after\n"], ["ignore", fd, "pipe"]);
        expect(r.stderr).toBe("");
        expect(r.status).toBe(0);
      } finally {
        closeSync(fd);
      }
      expect(readFileSync(log, "utf8")).toBe("before\nafter\n");
      expect(statSync(log).ino).toBe(ino);
    },
  },
  {
    name: "a link planted at the old predictable temporary name (.NAME.PID.tmp) does not redirect the write",
    run(dir) {
      const victim = join(dir, "victim.txt");
      writeFileSync(victim, "secret");
      symlinkSync(victim, join(dir, `.out.json.${process.pid}.tmp`));
      writeOutput(plan(join(dir, "out.json")), "data");
      expect(readFileSync(victim, "utf8")).toBe("secret");
      expect(readFileSync(join(dir, "out.json"), "utf8")).toBe("data");
    },
  },
  {
    name: "even a link planted at the exact next temporary name cannot redirect the write (O_CREAT|O_EXCL)",
    run(dir) {
      const victim = join(dir, "victim.txt");
      writeFileSync(victim, "secret");
      // planned first (the plan makes and removes a probe file under a random name)
      const target = plan(join(dir, "out.json"));
      rnd.fixed = Buffer.alloc(6, 0xab);
      try {
        const planted = join(dir, ".out.json.abababababab.tmp");
        symlinkSync(victim, planted);
        const m = refusal(() => writeOutput(target, "data"));
        expect(m).toMatch(/^cannot write ".*out\.json": a file is in the way$/);
        expect(readFileSync(victim, "utf8")).toBe("secret");
        expect(lstatSync(planted).isSymbolicLink()).toBe(true);
        expect(existsSync(join(dir, "out.json"))).toBe(false);
      } finally {
        rnd.fixed = undefined;
      }
    },
  },
  {
    name: "an existing file's mode 0600 is kept after an overwrite, and the file is replaced (new inode)",
    run(dir) {
      const f = join(dir, "private.json");
      writeFileSync(f, "old");
      chmodSync(f, 0o600);
      const ino = statSync(f).ino;
      writeOutput(plan(f), "new");
      expect(statSync(f).mode & 0o7777).toBe(0o600);
      expect(statSync(f).ino).not.toBe(ino);
      expect(readFileSync(f, "utf8")).toBe("new");
    },
  },
  {
    name: "a new file gets mode 0666 less the umask, as writeFileSync (open(2) with mode 0666) gives",
    run(dir) {
      const old = process.umask(0o027);
      try {
        writeFileSync(join(dir, "ref"), "x");
        writeOutput(plan(join(dir, "new.json")), "x");
        const streamed = openOutputStream(plan(join(dir, "streamed.json")));
        return streamed.commit().then(() => {
          const ref = statSync(join(dir, "ref")).mode & 0o7777;
          expect(ref).toBe(0o640);
          expect(statSync(join(dir, "new.json")).mode & 0o7777).toBe(ref);
          expect(statSync(join(dir, "streamed.json")).mode & 0o7777).toBe(ref);
        });
      } finally {
        process.umask(old);
      }
    },
  },
  {
    name: "an output that is one of the inputs is refused: same path, other spellings, a link, a hard link",
    run(dir) {
      const input = join(dir, "in.json");
      writeFileSync(input, "{}");
      mkdirSync(join(dir, "sub"));
      symlinkSync(input, join(dir, "alias.json"));
      linkSync(input, join(dir, "hard.json"));
      const inputs = [{ option: "--pitch", path: input }];
      for (const out of [input, join(dir, "sub", "..", "in.json"), join(dir, "alias.json"), join(dir, "hard.json")]) {
        expect(refusal(() => plan(out, "json", inputs))).toMatch(/^--out ".*" is the same file as the input --pitch ".*in\.json"; expected a different output file$/);
      }
      expect(plan(join(dir, "other.json"), "json", inputs).kind).toBe("file");
    },
  },
  {
    name: "two outputs naming one file are refused (also through a link), and so are two -",
    run(dir) {
      const a = join(dir, "a.svg");
      symlinkSync(a, join(dir, "b.svg"));
      const same = () => planOutputs([{ option: "--svg", path: a }, { option: "--card", path: a }], []);
      expect(refusal(same)).toMatch(/^--card ".*a\.svg" is the same file as --svg ".*a\.svg"; expected a different file for each output$/);
      expect(refusal(() => planOutputs([{ option: "--svg", path: a }, { option: "--card", path: join(dir, "b.svg") }], []))).toMatch(/is the same file as --svg/);
      expect(refusal(() => planOutputs([{ option: "--out", path: "-" }, { option: "--csv", path: "-" }], []))).toMatch(/both write to standard output/);
    },
  },
  {
    name: "a folder as output is refused",
    run(dir) {
      expect(refusal(() => plan(dir))).toMatch(/^--out ".*" is a folder; expected a file path$/);
      expect(refusal(() => plan(join(dir, "newfolder") + "/"))).toMatch(/names a folder; expected a file path$/);
    },
  },
  {
    name: 'an empty path is refused and the message shows ""',
    run() {
      expect(refusal(() => plan(""))).toBe('--out "": the path is empty; expected a file path, or - for standard output');
    },
  },
  {
    name: "- goes to standard output, written whole and streamed",
    run() {
      const a = runChild(["write", "-", "hello\n"]);
      expect([a.status, a.stdout, a.stderr]).toEqual([0, "hello\n", ""]);
      const b = runChild(["stream", "-", "a|b|c"]);
      expect([b.status, b.stdout, b.stderr]).toEqual([0, "abc", ""]);
      expect(plan("-", "svg")).toMatchObject({ kind: "stdout", path: "-" });
    },
  },
  {
    name: "an extension naming another format is refused; case is ignored; -, devices and unknown extensions are not checked",
    run(dir) {
      expect(refusal(() => plan(join(dir, "x.pdf"), "svg"))).toMatch(/^--out ".*x\.pdf": the extension \.pdf names pdf, but this output is svg; expected a name ending in \.svg$/);
      expect(refusal(() => plan(join(dir, "x.json"), "csv"))).toMatch(/expected a name ending in \.csv$/);
      expect(plan(join(dir, "x.SVG"), "svg").kind).toBe("file");
      expect(plan(join(dir, "x.htm"), "html").kind).toBe("file");
      expect(plan(join(dir, "x.txt"), "json").kind).toBe("file");
      expect(plan("/dev/null", "pdf").kind).toBe("device");
    },
  },
  {
    name: "a socket is refused",
    async run(dir) {
      const sock = join(dir, "s.sock");
      const server = createServer();
      await new Promise<void>((resolve) => server.listen(sock, resolve));
      try {
        expect(refusal(() => plan(sock))).toMatch(/is a socket; expected a regular file/);
      } finally {
        await new Promise<void>((resolve) => server.close(() => resolve()));
      }
    },
  },
  {
    name: "a folder that cannot be created (under /proc) fails at once; a file in the path is named",
    run(dir) {
      expect(refusal(() => plan("/proc/seam-atlas-none/a/b.json"))).toMatch(/^--out ".*": cannot create the folder "\/proc\/seam-atlas-none": no such file or folder$/);
      writeFileSync(join(dir, "file"), "");
      expect(refusal(() => plan(join(dir, "file", "x.json")))).toMatch(/not a folder/);
    },
  },
  {
    name: "a folder that takes no new files even for root (Linux sysfs(5)) is refused at planning, and the probe leaves nothing behind",
    run(dir) {
      expect(refusal(() => plan("/sys/kernel/seam-atlas.json"))).toMatch(/^--out "\/sys\/kernel\/seam-atlas\.json": cannot write into the folder "\/sys\/kernel": (permission denied|operation not permitted|the file system is read-only)$/);
      plan(join(dir, "fine.json"));
      expect(readdirSync(dir)).toEqual([]);
    },
  },
  {
    name: "missing folders are created, one level at a time",
    run(dir) {
      const out = join(dir, "a", "b", "c", "out.json");
      const p = plan(out);
      expect(statSync(join(dir, "a", "b", "c")).isDirectory()).toBe(true);
      writeOutput(p, "{}");
      expect(readFileSync(out, "utf8")).toBe("{}");
    },
  },
  {
    name: "a write that fails midway (file too large under a 256 KiB file-size limit) removes its temporary file and keeps the old file",
    run(dir) {
      const f = join(dir, "big.json");
      writeFileSync(f, "old");
      const r = spawnSync("bash", ["-c", 'ulimit -f 256; exec "$0" "$@"', process.execPath, ...CHILD_ARGS, "big", f, String(1024 * 1024)], { cwd: ROOT, encoding: "utf8", timeout: 60_000 });
      expect(r.stderr).toMatch(/^cannot write ".*big\.json": file too large\n$/);
      expect(r.status).toBe(2);
      expect(temps(dir)).toEqual([]);
      expect(readFileSync(f, "utf8")).toBe("old");
    },
  },
  {
    name: "a full device reports no space left on device (Linux full(4))",
    async run() {
      expect(refusal(() => writeOutput(plan("/dev/full"), "x"))).toBe('cannot write "/dev/full": no space left on device');
      const s = openOutputStream(plan("/dev/full"));
      await s.write("x");
      await expect(s.commit()).rejects.toThrow('cannot write "/dev/full": no space left on device');
    },
  },
  {
    name: "an aborted stream leaves no temporary file and the old file as it was",
    async run(dir) {
      const f = join(dir, "out.csv");
      writeFileSync(f, "old");
      const s = openOutputStream(plan(f, "csv"));
      await s.write("a,b\n");
      await s.write("x".repeat(200_000)); // past the buffer: some bytes are in the temporary file
      expect(temps(dir)).toHaveLength(1);
      s.abort();
      s.abort();
      expect(temps(dir)).toEqual([]);
      expect(readFileSync(f, "utf8")).toBe("old");
      await expect(s.write("more")).rejects.toThrow();
    },
  },
  {
    name: "a batch stopped on a bad row commits the rows written before it",
    async run(dir) {
      const f = join(dir, "rows.csv");
      const s = openOutputStream(plan(f, "csv"));
      await s.write("line,value\n");
      await s.write("2,ok\n");
      await s.write("3,ok\n");
      // row 4 is bad: the run stops and keeps what it has
      await s.commit();
      expect(readFileSync(f, "utf8")).toBe("line,value\n2,ok\n3,ok\n");
      expect(temps(dir)).toEqual([]);
    },
  },
  ...(["SIGTERM", "SIGINT"] as const).map(
    (signal): Case => ({
      name: `${signal} while a stream is open removes the temporary file and ends the run by the signal (${signal === "SIGTERM" ? 143 : 130})`,
      async run(dir) {
        const f = join(dir, "out.json");
        writeFileSync(f, "old");
        const p = spawn(process.execPath, [...CHILD_ARGS, "hang", f], { cwd: ROOT, stdio: ["ignore", "pipe", "pipe"] });
        const done = exited(p);
        await saidReady(p);
        expect(temps(dir)).toHaveLength(1);
        p.kill(signal);
        const { code, signal: got } = await done;
        expect(got === signal || code === (signal === "SIGTERM" ? 143 : 130)).toBe(true);
        expect(temps(dir)).toEqual([]);
        expect(readFileSync(f, "utf8")).toBe("old");
      },
    }),
  ),
  {
    name: "SIGTERM that arrives during a synchronous write is still handled: the file is renamed whole, no temporary file stays, the run ends by the signal",
    run(dir) {
      const f = join(dir, "out.json");
      writeFileSync(f, "old");
      const r = runChild(["selfterm", f, "new"]);
      expect(r.stdout).toBe("");
      expect(r.signal === "SIGTERM" || r.status === 143).toBe(true);
      expect(temps(dir)).toEqual([]);
      expect(readFileSync(f, "utf8")).toBe("new");
    },
  },
  {
    name: "a run that exits (process.exit) while a stream is open leaves no temporary file and the old file",
    run(dir) {
      const f = join(dir, "out.csv");
      writeFileSync(f, "old");
      const r = runChild(["exit", f]);
      expect(r.status).toBe(2);
      expect(temps(dir)).toEqual([]);
      expect(readFileSync(f, "utf8")).toBe("old");
    },
  },
  {
    name: "two interleaved streams on one file each leave a whole file; the last rename wins",
    async run(dir) {
      const f = join(dir, "same.json");
      for (const lastIsB of [true, false]) {
        const a = openOutputStream(plan(f));
        const b = openOutputStream(plan(f));
        await a.write("A".repeat(100_000));
        await b.write("B".repeat(150_000));
        await a.write("A".repeat(100_000));
        if (lastIsB) {
          await a.commit();
          await b.commit();
        } else {
          await b.commit();
          await a.commit();
        }
        expect(readFileSync(f, "latin1")).toBe(lastIsB ? "B".repeat(150_000) : "A".repeat(200_000));
        expect(temps(dir)).toEqual([]);
      }
    },
  },
  {
    name: "two processes writing one file again and again: every read sees one whole version",
    async run(dir) {
      const f = join(dir, "shared.json");
      const size = 300_000;
      writeFileSync(f, "O".repeat(size));
      const kids = ["A", "B"].map((ch) => spawn(process.execPath, [...CHILD_ARGS, "repeat", f, ch, String(size), "25"], { cwd: ROOT, stdio: "ignore" }));
      const done = Promise.all(kids.map(exited));
      let running = true;
      void done.then(() => (running = false));
      let reads = 0;
      while (running) {
        const s = readFileSync(f, "latin1");
        expect(s.length).toBe(size);
        expect(s === "O".repeat(size) || s === "A".repeat(size) || s === "B".repeat(size)).toBe(true);
        reads++;
        await new Promise((r) => setTimeout(r, 2));
      }
      expect((await done).map((e) => e.code)).toEqual([0, 0]);
      expect(reads).toBeGreaterThan(0);
      const last = readFileSync(f, "latin1");
      expect(last === "A".repeat(size) || last === "B".repeat(size)).toBe(true);
      expect(temps(dir)).toEqual([]);
    },
  },
  {
    name: "replacing a hard-linked file gives the name a new file; the other name keeps the old contents",
    run(dir) {
      const f = join(dir, "a.json");
      writeFileSync(f, "old");
      linkSync(f, join(dir, "b.json"));
      writeOutput(plan(f), "new");
      expect(readFileSync(f, "utf8")).toBe("new");
      expect(readFileSync(join(dir, "b.json"), "utf8")).toBe("old");
    },
  },
];

describe("output writer", () => {
  for (const c of cases) {
    it(c.name, async () => {
      const dir = mkdtempSync(join(tmpdir(), "seam-atlas-io-"));
      await c.run(dir);
    });
  }
});
