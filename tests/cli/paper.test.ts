import { existsSync, mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { formatMovementIn as inches } from "../../src/render/numbers.js";
import { runCli, ROOT } from "../support/cli.js";
import { inkSpread, itWithPoppler, pdfPages, pdfPageSizePt, pdfText, renderGray } from "../support/poppler.js";
import { loadLayout } from "../../src/render/paper/layouts.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-paper-"));
const SINKER = ["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--gyro", "10", "--want", "arm", "--name", "sinker"];
const layouts = join(ROOT, "templates", "layouts");

describe("grip card", () => {
  const pdf = join(tmp, "card.pdf");
  const made = runCli(["card", ...SINKER, "--out", pdf]);
  const screen = JSON.parse(runCli(["screen", ...SINKER, "--json"]).stdout);

  it("writes a PDF", () => {
    expect(made.code).toBe(0);
    expect(readFileSync(pdf).subarray(0, 5).toString()).toBe("%PDF-");
  });

  itWithPoppler("is one 6 x 4 in page (432 x 288 pt) that a real reader opens (pdfinfo)", () => {
    expect(pdfPages(pdf)).toBe(1);
    const [w, h] = pdfPageSizePt(pdf);
    expect(w).toBeCloseTo(432, 1);
    expect(h).toBeCloseTo(288, 1);
  });

  itWithPoppler("prints the same seam movement, score, robustness, crossings and push direction as screen --json (pdftotext)", () => {
    const text = pdfText(pdf).replace(/\s+/g, " ");
    const c = screen.candidates[0];
    expect(text).toContain(`${inches(c.seamMovement.armSideIn)} arm / ${inches(c.seamMovement.verticalIn)} up`);
    expect(text).toContain(inches(c.score));
    expect(text).toContain(`${inches(c.robustness.meanIn)} / ${inches(c.robustness.p10In)}`);
    expect(text).toContain(`${c.seamMovement.clock} (pitcher)`);
    expect(text).toContain(c.latLon.text);
    expect(text).toMatch(new RegExp(`passes per turn ${c.crossingsPerRevolution}`));
    expect(text).toContain("Index pad:");
  });

  itWithPoppler("carries the caution line", () => {
    const text = pdfText(pdf).replace(/\s+/g, " ");
    expect(text).toContain("pitching can injure");
    expect(text).toContain("never alter it");
  });

  itWithPoppler("has ink where the two balls are drawn and little in an empty margin (pdftoppm at 40 dpi)", () => {
    const card = loadLayout(layouts, "index-card-4x6");
    const img = renderGray(pdf, 1, 40, join(tmp, "card-page"));
    expect(inkSpread(img, 40, card.blocks.viewHeld)).toBeGreaterThan(30);
    expect(inkSpread(img, 40, card.blocks.viewFlow)).toBeGreaterThan(30);
    expect(inkSpread(img, 40, { xIn: 5.82, yIn: 0.6, wIn: 0.12, hIn: 2 })).toBeLessThan(5);
  });

  it("as SVG is deterministic: two runs give the same bytes", () => {
    const a = join(tmp, "a.svg");
    const b = join(tmp, "b.svg");
    expect(runCli(["card", ...SINKER, "--svg", "--out", a]).code).toBe(0);
    expect(runCli(["card", ...SINKER, "--svg", "--out", b]).code).toBe(0);
    const sa = readFileSync(a, "utf8");
    expect(sa).toBe(readFileSync(b, "utf8"));
    expect(sa.startsWith("<svg")).toBe(true);
    expect(sa).toContain(inches(screen.candidates[0].score));
    expect(sa).not.toMatch(/Svgjs/);
  });

  it("prints a sheet of cards on letter paper", () => {
    const out = join(tmp, "sheet.pdf");
    expect(runCli(["card", ...SINKER, "--layout", "letter-sheet-6-cards", "--out", out]).code).toBe(0);
  });

  for (const [what, args, message] of [
    ["an unknown layout", ["--layout", "postcard"], /layout "postcard" not found .*expected one of/],
    ["a handout layout for a card", ["--layout", "handout-letter"], /is a handout layout; this command takes a card or sheet layout/],
    ["SVG of a sheet", ["--layout", "letter-sheet-6-cards", "--svg"], /--svg draws one card/],
  ] as const) {
    it(`rejects ${what}: one line, exit 2, no file`, () => {
      const out = join(tmp, `bad-${what.replace(/\W+/g, "-")}.pdf`);
      const r = runCli(["card", ...SINKER, ...args, "--out", out]);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(r.stderr.trim().split("\n")).toHaveLength(1);
      expect(existsSync(out)).toBe(false);
    });
  }
});

describe("atlas", () => {
  const pdf = join(tmp, "atlas.pdf");
  const made = runCli(["atlas", "--demo", "--top", "2", "--grid", "4", "--out", pdf]);
  const screen = JSON.parse(runCli(["screen", "--demo", "--top", "2", "--grid", "4", "--json"]).stdout);

  it("writes the demo staff's atlas", () => {
    expect(made.code).toBe(0);
    expect(made.stdout).toMatch(/wrote .* pages, 6 pitch/);
  });

  itWithPoppler("has a cover, how-to-read, one map page and card pages per pitch, and a caution page (pdfinfo)", () => {
    const perPitch = screen.pitches.map((p: { candidates: unknown[]; references: unknown[] }) => 1 + Math.ceil((p.candidates.length + p.references.length) / 2));
    expect(pdfPages(pdf)).toBe(3 + perPitch.reduce((a: number, b: number) => a + b, 0));
  });

  itWithPoppler("prints every candidate's and reference hold's score as screen --json gives it (pdftotext)", () => {
    const text = pdfText(pdf).replace(/\s+/g, " ");
    for (const p of screen.pitches) {
      for (const o of [...p.candidates, ...p.references]) expect(text).toContain(`score ${inches(o.score)} in`);
    }
    expect(text).toContain("How to read this atlas");
  });

  itWithPoppler("ends with the cautions", () => {
    const last = pdfText(pdf, pdfPages(pdf)).replace(/\s+/g, " ");
    expect(last).toContain("Cautions");
    expect(last).toContain("Never scuff, cut, mark or otherwise alter the ball");
    expect(last).toContain("licensed professional practice");
  });

  itWithPoppler("draws the sphere map: the map page has ink across the map block", () => {
    const atlas = loadLayout(layouts, "atlas-letter");
    const img = renderGray(pdf, 3, 30, join(tmp, "atlas-map"));
    expect(inkSpread(img, 30, atlas.blocks.map)).toBeGreaterThan(30);
  });
});

describe("handout", () => {
  const pdf = join(tmp, "handout.pdf");
  const made = runCli(["handout", "--out", pdf]);

  itWithPoppler("is two pages of plain words with the safety advice and two figures from the model", () => {
    expect(made.code).toBe(0);
    expect(pdfPages(pdf)).toBe(2);
    const text = pdfText(pdf).replace(/\s+/g, " ");
    for (const s of ["Spin bends the path (Magnus)", "Seams move the wake", "Why the classic holds average out", "Trying a new grip safely", "Never scratch, cut, mark"]) expect(text).toContain(s);
    const h = loadLayout(layouts, "handout-letter");
    const img = renderGray(pdf, 1, 30, join(tmp, "handout-1"));
    expect(inkSpread(img, 30, h.blocks.figureSymmetric)).toBeGreaterThan(20);
    expect(inkSpread(img, 30, h.blocks.figureAsymmetric)).toBeGreaterThan(20);
  });
});
