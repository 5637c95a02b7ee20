/**
 * The command line under seeded byte-level mutations (tests/mutate.ts) of a pitch
 * file and of a batch CSV: every run ends by itself (a per-run time limit, a limit
 * against hangs and not a speed check) with exit status 0 or 2, never a crash
 * (exit 1, a signal) or a stack trace; a run refused with 2 says one line; no
 * temporary file is left. Small inputs and a coarse grid keep each test near a
 * minute on two cores; the test's own limit (6 min) is generous because other test
 * files share the cores, and hangs are caught per run.
 */
import { mkdtempSync, readdirSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { lcg } from "../support/random.js";
import { mutant } from "../mutate.js";
import { runCliAsync, type CliRun } from "../support/cli.js";

/** Mutants per input. */
const CASES = 150;
/** Runs side by side. */
const PARALLEL = 2;
/** Longest a run may take before it counts as hung, ms. */
const RUN_LIMIT_MS = 30_000;

const STAFF = Buffer.from(
  JSON.stringify(
    {
      team: "Fuzz Club",
      pitchers: [
        { name: "Ana Ruiz", hand: "right", pitches: [{ name: "sinker", speedMph: 92, spinRpm: 2150, tilt: "1:45", gyroDeg: 10, want: "arm" }] },
        { name: "Bo Li", hand: "left", pitches: [{ name: "slider", speedMph: 84.5, spinRpm: 2400, tilt: "2:30", view: "catcher", efficiencyPct: 40, gyroSign: "pos", want: "down" }] },
      ],
    },
    null,
    2,
  ),
);
const CSV = Buffer.from(
  [
    "pitcher,pitch,hand,speed_mph,spin_rpm,tilt,view,gyro_deg,move_arm_in,move_up_in",
    'Ana Ruiz,sinker,right,92,2150,1:45,pitcher,10,16.5,12.5',
    '"Li, Bo","slider\r\nhard",left,84.5,2400,2:30,catcher,40,-6.2,2.1',
  ].join("\r\n") + "\r\n",
);

/** Runs `argsOf(i)` for i < CASES, PARALLEL at a time, and checks each run as the header says. */
async function fuzz(label: string, seed: number, base: Uint8Array, file: string, argsOf: (input: string, i: number) => string[]): Promise<{ ok: number; refused: number }> {
  const dir = mkdtempSync(join(tmpdir(), `seam-atlas-cli-fuzz-${label}-`));
  const rnd = lcg(seed);
  const inputs = Array.from({ length: CASES }, (_, i) => {
    const path = join(dir, `m${i}-${file}`);
    writeFileSync(path, mutant(base, rnd));
    return path;
  });
  let ok = 0;
  let refused = 0;
  const check = (i: number, r: CliRun) => {
    const where = `${label} mutant ${i} (${inputs[i]})`;
    expect(r.timedOut, `${where}: hung`).toBe(false);
    expect([0, 2], `${where}: exit ${r.code} ${r.signal ?? ""}\n${r.stderr}`).toContain(r.code);
    expect(r.stderr, where).not.toMatch(/internal error|\n\s+at |\.js:\d+:\d+/);
    if (r.code === 2) {
      expect(r.stderr.trim().split("\n").filter((l) => !l.startsWith("seam-atlas: skipped ")), where).toHaveLength(1);
      refused++;
    } else ok++;
  };
  let next = 0;
  const worker = async () => {
    while (next < CASES) {
      const i = next++;
      check(i, await runCliAsync(argsOf(inputs[i], i), { timeoutMs: RUN_LIMIT_MS }));
    }
  };
  await Promise.all(Array.from({ length: PARALLEL }, worker));
  expect(readdirSync(dir).filter((n) => n.endsWith(".tmp"))).toEqual([]);
  return { ok, refused };
}

describe("fuzz through the command line (seeded)", () => {
  it(`${CASES} mutants of a staff file: screen exits 0 or 2, one line when 2, never a crash or a hang [RFC 8259; The Unicode Standard Table 3-7]`, async () => {
    const { ok, refused } = await fuzz("pitch", 8259, STAFF, "staff.json", (input, i) => ["screen", "--pitch", input, "--grid", "10", "--top", "1", "--json", "--out", `${input}.out${i}.json`]);
    // a harness that refuses everything tests little: some mutants (inside strings) stay valid
    expect(ok).toBeGreaterThan(0);
    expect(refused).toBeGreaterThan(0);
  }, 360_000);

  it(`${CASES} mutants of a batch CSV: explain exits 0 or 2 under skip and stop, never a crash or a hang [RFC 4180; The Unicode Standard Table 3-7]`, async () => {
    const { ok, refused } = await fuzz("csv", 4180, CSV, "batch.csv", (input, i) => [
      "explain", "--csv-in", input, "--out", `${input}.out.${i % 2 === 0 ? "csv" : "json"}`, "--grid", "15", "--top", "1", "--on-bad-row", i % 3 === 0 ? "stop" : "skip",
    ]);
    expect(ok).toBeGreaterThan(0);
    expect(refused).toBeGreaterThan(0);
  }, 360_000);
});
