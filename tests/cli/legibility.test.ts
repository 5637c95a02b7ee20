/**
 * Every word on every page of a card, a sheet, a staff sheet, an atlas, the
 * handout and a bullpen report sits on enough contrast to read, as poppler renders the PDF at 150 dpi:
 * the WCAG 2.x contrast ratio of each word's ink against its ground is at least
 * 4.5:1 (WCAG 2.1 success criterion 1.4.3; method in tests/support/legibility.ts).
 * A control PDF with a label's white outline painted over its own letters (what a
 * PDF painter that ignores SVG paint-order does) fails the same check.
 */
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import PDFDocument from "pdfkit";
import { describe, expect } from "vitest";
import { bullpenCsv } from "../support/bullpen.js";
import { runCli } from "../support/cli.js";
import { contrastRatio, isWord, relativeLuminance, renderLuminance, wordBoxes, wordContrast } from "../support/legibility.js";
import { itWithPoppler, pdfPages } from "../support/poppler.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-legible-"));
const DPI = 150;
/** WCAG 2.1 SC 1.4.3, contrast (minimum) for text. */
const MIN_CONTRAST = 4.5;

function illegibleWords(pdf: string): string[] {
  const bad: string[] = [];
  wordBoxes(pdf).forEach((words, p) => {
    const img = renderLuminance(pdf, p + 1, DPI, join(tmp, `page-${p + 1}`));
    for (const w of words) {
      if (!isWord(w.text)) continue;
      const c = wordContrast(img, DPI, w);
      if (c && c.ratio < MIN_CONTRAST) bad.push(`page ${p + 1} "${w.text}" at (${w.xMin.toFixed(0)}, ${w.yMin.toFixed(0)}) pt: ${c.ratio.toFixed(2)}:1`);
    }
  });
  return bad;
}

describe("legibility: WCAG 2.x contrast of every word at 150 dpi", () => {
  itWithPoppler("the check's formulas match WCAG 2.1's worked ends: black on white 21:1, equal colours 1:1, #777777 on white about 4.48:1", () => {
    expect(contrastRatio(relativeLuminance(0, 0, 0), relativeLuminance(255, 255, 255))).toBeCloseTo(21, 10);
    expect(contrastRatio(relativeLuminance(90, 90, 90), relativeLuminance(90, 90, 90))).toBeCloseTo(1, 12);
    // #777777 on white is the well-known just-failing grey for 4.5:1
    expect(contrastRatio(relativeLuminance(0x77, 0x77, 0x77), 1)).toBeCloseTo(4.48, 2);
  });

  itWithPoppler("fails a control label whose white outline is painted over its letters, and passes it painted under them", async () => {
    const doc = new PDFDocument({ size: [200, 80], margin: 0 });
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    const done = new Promise<void>((r) => doc.on("end", () => r()));
    doc.rect(0, 0, 200, 80).fill("#c98a4b");
    doc.font("Helvetica-Bold").fontSize(9);
    // each text in its own graphics state: pdfkit leaves a stroke text mode set for the next text otherwise
    const text = (word: string, x: number, o: { fill: string; stroke?: string }) => {
      doc.save().fillColor(o.fill);
      if (o.stroke) doc.lineWidth(2.5).lineJoin("round").strokeColor(o.stroke);
      doc.text(word, x, 20, { lineBreak: false, fill: true, stroke: !!o.stroke } as PDFKit.Mixins.TextOptions);
      doc.restore();
    };
    // over: letters first, then the white outline on top of them
    text("push", 20, { fill: "#6b4a12" });
    text("push", 20, { fill: "#ffffff", stroke: "#ffffff" });
    // under: the outline first, then the letters
    text("mark", 120, { fill: "#ffffff", stroke: "#ffffff" });
    text("mark", 120, { fill: "#6b4a12" });
    doc.end();
    await done;
    const pdf = join(tmp, "control.pdf");
    writeFileSync(pdf, Buffer.concat(chunks));
    const bad = illegibleWords(pdf);
    expect(bad.some((b) => b.includes('"push"'))).toBe(true);
    expect(bad.some((b) => b.includes('"mark"'))).toBe(false);
  });

  const cases: [string, string[]][] = [
    ["a 4 x 6 in card", ["card", "--demo", "--pitch-name", "Iris Talvela/sinker"]],
    ["a 3 x 5 in card of a changeup", ["card", "--demo", "--pitch-name", "Ode Mbeki/changeup", "--layout", "index-card-3x5"]],
    ["a sheet of four 3 x 5 in cards with the classic holds", ["card", "--demo", "--pitch-name", "Luz Arrieta/curveball", "--layout", "letter-4-cards-3x5"]],
    ["a staff sheet", ["card", "--demo", "--layout", "a4-2-cards-4x6"]],
    ["an atlas", ["atlas", "--demo", "--pitch-name", "Ode Mbeki/slider", "--top", "2", "--grid", "4"]],
    ["the handout", ["handout", "--clinic", "Clínica de Pitcheo Łódź · Σπάρτη · Новосибирск", "--date", "14 March 2027", "--contact", "Coach R. Ortega, clinic@example.org"]],
  ];
  for (const [what, args] of cases) {
    itWithPoppler(`every word of ${what} has ink at ${MIN_CONTRAST}:1 or more against its ground`, () => {
      const pdf = join(tmp, `${what.replace(/\W+/g, "-")}.pdf`);
      const r = runCli([...args, "--out", pdf]);
      expect(r.code, r.stderr).toBe(0);
      const words = wordBoxes(pdf).flat().length;
      expect(words).toBeGreaterThan(50);
      expect(illegibleWords(pdf)).toEqual([]);
    });
  }

  itWithPoppler(`every word on every page of a bullpen report (cover, charts, tables; names in several scripts) has ink at ${MIN_CONTRAST}:1 or more against its ground`, () => {
    const csv = join(tmp, "bullpen.csv");
    writeFileSync(csv, bullpenCsv());
    const pdf = join(tmp, "bullpen.pdf");
    const r = runCli(["explain", "--csv-in", csv, "--out", join(tmp, "bullpen-rows.csv"), "--report", pdf, "--cache", join(tmp, "cache")]);
    expect(r.code, r.stderr).toBe(0);
    const pages = wordBoxes(pdf);
    expect(pages).toHaveLength(pdfPages(pdf));
    expect(pages.length).toBe(8);
    for (const words of pages) expect(words.filter((w) => isWord(w.text)).length).toBeGreaterThan(40);
    expect(illegibleWords(pdf)).toEqual([]);
  }, 180_000);
});
