/**
 * The bullpen report's pages: their order and count, the same bytes for the same
 * data, every word inside its page, and names in any script read back from the PDF
 * by poppler's pdftotext exactly as typed where a face holds the script (accents,
 * Cyrillic, Greek, Vietnamese, Arabic, Hebrew, Chinese, Japanese, Korean), as one U+FFFD per
 * character where none does (Thai, emoji), the next word whole either way.
 */
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { MISSING_GLYPH } from "../../../src/render/fonts.js";
import { PT_PER_IN } from "../../../src/render/paper/textLayout.js";
import { bullpenPages, renderBullpenPdf } from "../../../src/render/report/pdf.js";
import { wordBoxes } from "../../support/legibility.js";
import { pdfRawText, visualWordOrder } from "../../support/bidi.js";
import { itWithPoppler, pdfPages } from "../../support/poppler.js";
import { NAMES, pitcher, reportOf, textExtents } from "./fixture.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-report-"));
const TYPES = ["sinker", "four-seam", "changeup", "slider", "curveball", "sweeper", "splitter"];


describe("bullpen report pages", () => {
  it("are a cover, then per pitcher a charts page and ceil(types / 3) table pages [README: the bullpen report]", () => {
    const r = reportOf([pitcher(NAMES.latin, TYPES), pitcher(NAMES.cyrillic, TYPES.slice(0, 2), "left")]);
    const pages = bullpenPages(r);
    expect(pages).toHaveLength(1 + (1 + 3) + (1 + 1));
    for (const p of pages) expect([p.widthIn, p.heightIn]).toEqual([11, 8.5]);
  });

  it("give the same PDF bytes for the same data [determinism: fixed metadata, STYLE.md]", async () => {
    const r = reportOf([pitcher(NAMES.vietnamese, TYPES.slice(0, 4))]);
    const a = await renderBullpenPdf(r);
    const b = await renderBullpenPdf(structuredClone(r));
    expect(a.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    expect(b.equals(a)).toBe(true);
  });

  it("keep every line of every page inside the 0.5 in margins, with 40 pitchers of long names on the cover [property]", () => {
    const long = `${NAMES.greek} ${NAMES.vietnamese} de la Santísima Trinidad y Arrieta`;
    const r = reportOf(Array.from({ length: 40 }, (_, i) => pitcher(`${long} ${i + 1}`, ["four-seam fastball with a very long label", "slider"])));
    const pages = bullpenPages(r);
    // the cover runs on to more pages, and each pitcher keeps its two
    expect(pages.length).toBeGreaterThan(1 + 2 * 40);
    const covers = pages.length - 2 * 40;
    for (let i = 0; i < covers; i++) expect(textExtents(pages[i].scene, false).some((t) => t.text.startsWith("Caution: pitching can injure"))).toBe(true);
    for (const p of pages) {
      for (const t of textExtents(p.scene, false)) {
        expect(t.left, t.text).toBeGreaterThanOrEqual(0.5 * PT_PER_IN - 1e-6);
        expect(t.right, t.text).toBeLessThanOrEqual(10.5 * PT_PER_IN + 1e-6);
        expect(t.y, t.text).toBeLessThanOrEqual(8 * PT_PER_IN + 1e-6);
      }
    }
  });

  itWithPoppler("print names in Latin with accents, Cyrillic, Greek, Vietnamese, Arabic, Hebrew, Chinese, Japanese and Korean as typed (Arabic and Hebrew words right to left, UAX #9), and Thai and emoji as one U+FFFD each with the next word whole (pdftotext -raw) [README: Any name]", async () => {
    const r = reportOf(Object.values(NAMES).map((n) => pitcher(n, ["sinker", "slider"])));
    const pdf = join(tmp, "names.pdf");
    writeFileSync(pdf, await renderBullpenPdf(r));
    const names = Object.values(NAMES).length;
    const pages = pdfPages(pdf);
    expect(pages).toBeGreaterThanOrEqual(1 + 2 * names);
    // -raw: words in drawing order, right-to-left words read back logically (tests/support/bidi.ts)
    const text = pdfRawText(pdf);
    for (const n of [NAMES.latin, NAMES.cyrillic, NAMES.greek, NAMES.vietnamese, NAMES.arabic, NAMES.hebrew, NAMES.chinese, NAMES.japanese, NAMES.korean]) {
      const shown = visualWordOrder(n);
      expect(text).toContain(`${shown} (right-handed): sinker 8, slider 8`);
      expect(text).toContain(`${shown}: movement and direction`);
      expect(text).toContain(`${shown}: seam orientations per pitch type`);
    }
    // UAX #9 for "محمد علي": the second word drawn first, at the left
    expect(visualWordOrder(NAMES.arabic)).toBe("علي محمد");
    const lacked = `${MISSING_GLYPH.repeat(2)} ${MISSING_GLYPH} Karim`;
    expect(text).toContain(`${lacked} (right-handed): sinker 8, slider 8`);
    expect(text).toContain(`${lacked}: movement and direction`);
    // each name also heads its two charts, read word by word from the chart page
    const words = wordBoxes(pdf).map((page) => page.map((w) => w.text.normalize("NFC")));
    NAMES.cyrillic.split(" ").forEach((w) => expect(words[3].filter((x) => x === w || x === `${w}:`).length).toBeGreaterThanOrEqual(3));
  });
});
