/**
 * Fuzzing the readers with byte-level mutations of valid inputs, fixed seed: each
 * call returns or throws InputError (never another error type), and the CSV reader
 * gives at most one item per line of input (each restart after a bad record moves
 * at least one line on, so reading is bounded by the input's size). A hang would
 * show as this test's time limit, which is a limit, not a speed check.
 */
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { isBadRecord, readCsv } from "../../src/io/csv.js";
import { InputError } from "../../src/io/errors.js";
import { parseStrictJson } from "../../src/io/json.js";
import { parseDecimal } from "../../src/io/numbers.js";
import { lcg } from "../support/random.js";
import { mutant } from "../mutate.js";

const ROOT = join(dirname(fileURLToPath(import.meta.url)), "..", "..");
const STAFF = readFileSync(join(ROOT, "templates", "demo-staff.json"));
const CSV = Buffer.from(
  [
    "pitcher,pitch,hand,speed_mph,spin_rpm,tilt,move_arm_in,move_up_in",
    "Iris Talvela,sinker,right,92,2150,1:45,15.2,8.1",
    '"Mbeki, Ode","change\r\nup",right,85,1750,1:30,14,6.5',
    "Luz Arrieta,curveball,left,78,2600,5:00,-4.5,-12",
    '"Q ""the arm"" R",slider,right,85,2400,9:30,-3,1',
  ].join("\r\n") + "\r\n",
);
const CASES_PER_INPUT = 300;

function expectInputErrorOrNothing(fn: () => unknown, input: Uint8Array): void {
  try {
    fn();
  } catch (err) {
    if (!(err instanceof InputError)) throw new Error(`${(err as Error).name} on input ${Buffer.from(input).toString("base64")}: ${(err as Error).message}`);
    expect((err as Error).message).not.toContain("\n");
  }
}

describe("fuzz (seeded, byte-level mutations)", () => {
  it(`strict JSON: ${CASES_PER_INPUT} mutations of the demo staff file return or throw InputError`, () => {
    const rnd = lcg(20240611);
    let accepted = 0;
    for (let i = 0; i < CASES_PER_INPUT; i++) {
      const input = mutant(STAFF, rnd);
      expectInputErrorOrNothing(() => {
        parseStrictJson(input, '--pitch "staff.json"');
        accepted++;
      }, input);
    }
    // a harness that rejects everything tests little: some mutants (inside strings) stay valid
    expect(accepted).toBeGreaterThan(0);
    expect(accepted).toBeLessThan(CASES_PER_INPUT);
  });

  it(`CSV: ${CASES_PER_INPUT} mutations of a tracked-pitch CSV read through, at most one item per line`, async () => {
    const rnd = lcg(4180);
    const dir = mkdtempSync(join(tmpdir(), "seam-atlas-fuzz-"));
    let bad = 0;
    let good = 0;
    for (let i = 0; i < CASES_PER_INPUT; i++) {
      const input = mutant(CSV, rnd);
      const path = join(dir, `m${i}.csv`);
      writeFileSync(path, input);
      const lines = 1 + (Buffer.from(input).toString("latin1").match(/\r\n|\r|\n/g) ?? []).length;
      try {
        const r = readCsv(path, { chunkBytes: 1 + Math.floor(rnd() * 64) });
        let items = 0;
        for await (const item of r) {
          items++;
          expect(item.line).toBeGreaterThanOrEqual(2);
          expect(item.line).toBeLessThanOrEqual(lines);
          if (isBadRecord(item)) {
            bad++;
            expect(item.error).not.toContain("\n");
          } else good++;
        }
        expect(items).toBeLessThanOrEqual(lines);
      } catch (err) {
        if (!(err instanceof InputError)) throw new Error(`${(err as Error).name} on input ${Buffer.from(input).toString("base64")}: ${(err as Error).message}`);
      }
    }
    expect(bad).toBeGreaterThan(0);
    expect(good).toBeGreaterThan(0);
  });

  it(`decimal numbers: ${CASES_PER_INPUT} mutations of number texts give a finite number or InputError`, () => {
    const rnd = lcg(1985);
    const bases = ["92", "-1.5", "2.4e3", ".5", "1e308", "0"].map((s) => Buffer.from(s));
    for (let i = 0; i < CASES_PER_INPUT; i++) {
      const input = mutant(bases[i % bases.length], rnd);
      const text = Buffer.from(input).toString("utf8");
      expectInputErrorOrNothing(() => expect(Number.isFinite(parseDecimal(text, "--speed", "mph"))).toBe(true), input);
    }
  });
});
