/**
 * Where output goes, through the built command line: standard output, devices and
 * named pipes written straight into, symbolic links followed to their target, a
 * replaced file's mode kept, whole files when two runs write one file, the batch
 * CSV's edge cases, and sphere maps named per pitch. Each check names its source.
 */
import { chmodSync, existsSync, lstatSync, mkdtempSync, openSync, closeSync, constants, readdirSync, readFileSync, readlinkSync, statSync, symlinkSync, writeFileSync } from "node:fs";
import { readFile } from "node:fs/promises";
import { execFileSync, spawn } from "node:child_process";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { BIN, runCli, runCliAsync } from "../support/cli.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-output-"));
const MEASURE = ["measure", "--axis", "lobe-B1"];
const HEADER = "pitcher,pitch,hand,speed_mph,spin_rpm,tilt,move_arm_in,move_up_in";

function temps(dir: string): string[] {
  return readdirSync(dir).filter((n) => n.endsWith(".tmp"));
}

describe("standard output, devices, pipes and links", () => {
  it("--out /dev/null works: exit 0, the table printed, nothing else written [Linux null(4)]", () => {
    const r = runCli([...MEASURE, "--out", "/dev/null"]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/seam in band, turn average/);
    expect(r.stdout).toMatch(/wrote \/dev\/null\n$/);
    expect(statSync("/dev/null").isCharacterDevice()).toBe(true);
  });

  it("--out - prints the JSON document and nothing else [RFC 8259: the whole of stdout parses]", () => {
    const r = runCli([...MEASURE, "--out", "-"]);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).landmark.name).toBe("lobe-B1");
    // with --json too, the one document is printed once
    const twice = runCli([...MEASURE, "--out", "-", "--json"]);
    expect(twice.stdout).toBe(r.stdout);
  });

  it("a reader that closes the pipe early ends the run quietly, printed or written as --out - [POSIX write(2): EPIPE; sh pipelines]", async () => {
    for (const args of [["screen", "--demo", "--grid", "6", "--json"], ["screen", "--demo", "--grid", "6", "--out", "-"]]) {
      const child = spawn(process.execPath, [BIN, ...args], { stdio: ["ignore", "pipe", "pipe"] });
      child.stdout.destroy(); // the reader is gone before the first byte is written
      let stderr = "";
      child.stderr.setEncoding("utf8").on("data", (d: string) => (stderr += d));
      const code = await new Promise<number | null>((resolve) => child.on("close", (c) => resolve(c)));
      expect(code).toBe(0);
      expect(stderr).toBe("");
    }
  }, 60_000);

  it("explain's batch with --out -: CSV on standard output, the summary on stderr [RFC 4180 sec. 2]", () => {
    const csv = join(tmp, "std.csv");
    writeFileSync(csv, `${HEADER}\nA,sinker,right,92,2150,1:45,16.5,12.5\n`);
    const r = runCli(["explain", "--csv-in", csv, "--out", "-", "--grid", "15"]);
    expect(r.code).toBe(0);
    const lines = r.stdout.trim().split("\n");
    expect(lines).toHaveLength(2);
    expect(lines[0].startsWith("line,pitcher,pitch,")).toBe(true);
    expect(r.stderr).toMatch(/^explained 1 pitch\(es\) .*; wrote standard output\n$/);
  });

  it("a named pipe is written straight into: the reader gets the whole JSON and the pipe stays a pipe [POSIX mkfifo(1), open(2)]", async () => {
    const fifo = join(tmp, "pipe.json");
    execFileSync("mkfifo", [fifo]);
    const reading = readFile(fifo, "utf8");
    let settled = false;
    void reading.finally(() => (settled = true));
    const run = await runCliAsync([...MEASURE, "--out", fifo], { timeoutMs: 60_000 });
    // should the run have failed before opening the pipe, let the reader go
    if (!settled) closeSync(openSync(fifo, constants.O_WRONLY | constants.O_NONBLOCK));
    const text = await reading;
    expect(run.code).toBe(0);
    expect(JSON.parse(text).landmark.name).toBe("lobe-B1");
    expect(lstatSync(fifo).isFIFO()).toBe(true);
    expect(temps(tmp)).toEqual([]);
  }, 60_000);

  it("a symbolic link is followed: its target is replaced, the link stays [POSIX symlink(2), rename(2)]", () => {
    const target = join(tmp, "target.json");
    const link = join(tmp, "link.json");
    writeFileSync(target, "old\n");
    symlinkSync("target.json", link);
    expect(runCli([...MEASURE, "--out", link]).code).toBe(0);
    expect(lstatSync(link).isSymbolicLink()).toBe(true);
    expect(readlinkSync(link)).toBe("target.json");
    expect(JSON.parse(readFileSync(target, "utf8")).landmark.name).toBe("lobe-B1");
  });

  it("a 0600 file keeps its mode after being replaced [POSIX chmod(2), rename(2)]", () => {
    const out = join(tmp, "private.json");
    writeFileSync(out, "old\n");
    chmodSync(out, 0o600);
    expect(runCli([...MEASURE, "--out", out]).code).toBe(0);
    expect(statSync(out).mode & 0o777).toBe(0o600);
    expect(JSON.parse(readFileSync(out, "utf8")).landmark.name).toBe("lobe-B1");
  });

  it("two runs writing one file at once each leave a whole file: the last writer wins [POSIX rename(2) replaces atomically]", async () => {
    const out = join(tmp, "both.json");
    const [a, b] = await Promise.all([
      runCliAsync(["measure", "--axis", "waist-A", "--out", out], { timeoutMs: 60_000 }),
      runCliAsync(["measure", "--axis", "node-2", "--out", out], { timeoutMs: 60_000 }),
    ]);
    expect([a.code, b.code]).toEqual([0, 0]);
    const left = JSON.parse(readFileSync(out, "utf8"));
    expect(["waist-A", "node-2"]).toContain(left.landmark.name);
    expect(temps(tmp)).toEqual([]);
  }, 60_000);
});

describe("explain's batch CSV", () => {
  it("reads quoted commas and line breaks, CRLF and a BOM; an unclosed quote mid-file is one bad row with its line, then the rest is read; formula cells are neutralised [RFC 4180 sec. 2; Unicode sec. 23.8; OWASP CSV injection]", () => {
    const csv = join(tmp, "edge.csv");
    const rows = [
      HEADER,
      '"Mbeki, Ode","change\r\nup",right,85,1750,1:30,14,6.5', // lines 2-3
      'B,"broken,right,92,2150,1:45,16.5,12.5', // line 4: the quote is never closed
      "=HYPERLINK(1),sinker,right,92,2150,1:45,16.5,12.5", // line 5
    ];
    writeFileSync(csv, Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(rows.join("\r\n") + "\r\n")]));
    const out = join(tmp, "edge-out.csv");
    const r = runCli(["explain", "--csv-in", csv, "--out", out, "--grid", "15"]);
    expect(r.code).toBe(0);
    const skipped = r.stderr.trim().split("\n");
    expect(skipped).toHaveLength(1);
    expect(skipped[0]).toMatch(/^seam-atlas: skipped --csv-in ".*edge\.csv" line 4: a quoted cell is not closed .*reading goes on at line 5/);
    expect(r.stdout).toMatch(/explained 2 pitch\(es\) .*skipped 1 bad row\(s\)/);
    const text = readFileSync(out, "utf8");
    expect(text.startsWith("line,pitcher,pitch,")).toBe(true);
    // the quoted line break is kept inside its quoted cell; the row starts on line 2
    expect(text).toContain('\n2,"Mbeki, Ode","change\r\nup",');
    // a cell starting with = is written with a leading ' so spreadsheets do not run it
    expect(text).toContain("\n5,'=HYPERLINK(1),sinker,");
  });

  it("--on-bad-row stop: exit 2, one line naming the row, nothing written and no temporary file left [README, explain; Bad input]", () => {
    const csv = join(tmp, "stop.csv");
    writeFileSync(csv, `${HEADER}\nA,sinker,right,92,2150,1:45,16.5,12.5\nB,sinker,right,92,2150,1:45,16.5,NaN\nC,sinker,right,92,2150,1:45,16.5,12.5\n`);
    const out = join(tmp, "stop.json");
    const r = runCli(["explain", "--csv-in", csv, "--out", out, "--grid", "15", "--on-bad-row", "stop"]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stderr).toMatch(/^seam-atlas: stopped at --csv-in ".*stop\.csv" line 3, column "move_up_in": "NaN" is not a number; expected a number of inches \(--on-bad-row stop: nothing written\)\n$/);
    expect(existsSync(out)).toBe(false);
    expect(temps(tmp)).toEqual([]);
  });
});

describe("screen --map on a staff", () => {
  it("writes one file per pitch named PITCHER-PITCH, unique and readable in any script [Unicode properties L, N, M; case-insensitive file systems]", () => {
    const staff = join(tmp, "names.json");
    const pitch = (name: string) => `{ "name": "${name}", "speedMph": 90, "spinRpm": 2100, "tilt": "1:30" }`;
    writeFileSync(
      staff,
      JSON.stringify({
        pitchers: [
          { name: "Ana Ruiz", hand: "right", pitches: [JSON.parse(pitch("sinker"))] },
          { name: "ANA RUIZ", hand: "right", pitches: [JSON.parse(pitch("sinker"))] },
          { name: "山田 太郎", hand: "left", pitches: [JSON.parse(pitch("カーブ"))] },
          { name: "Bo/Li", hand: "left", pitches: [JSON.parse(pitch("../slider"))] },
        ],
      }),
    );
    const maps = join(tmp, "maps");
    const r = runCli(["screen", "--pitch", staff, "--grid", "10", "--top", "1", "--map", maps]);
    expect(r.code).toBe(0);
    expect(readdirSync(maps).sort()).toEqual(["ANA-RUIZ-sinker-2.json", "Ana-Ruiz-sinker.json", "Bo-Li-slider.json", "山田-太郎-カーブ.json"].sort());
    expect(JSON.parse(readFileSync(join(maps, "Bo-Li-slider.json"), "utf8")).columns).toContain("scoreIn");
  });

  it("says in --help that --map names a folder for a staff [README, Screening]", () => {
    expect(runCli(["screen", "--help"]).stdout.replace(/\s+/g, " ")).toMatch(/--map .*several pitches \(a staff\).* a folder: one PITCHER-PITCH\.json per pitch/);
  });
});
