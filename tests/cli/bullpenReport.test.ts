/**
 * explain's bullpen report read back from the files it writes: the table's numbers
 * are the summary JSON's (the same run), the chart pages hold the same drawings as
 * the --report-svg files, and pitcher names in any script print as typed where the
 * face has the script (pdftotext).
 */
import { mkdtempSync, readFileSync, readdirSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect } from "vitest";
import { MISSING_GLYPH } from "../../src/render/fonts.js";
import { fixed, signed } from "../../src/render/numbers.js";
import { bullpenCsv } from "../support/bullpen.js";
import { runCli } from "../support/cli.js";
import { logicalFromGlyphOrder, pdfRawText } from "../support/bidi.js";
import { wordBoxes } from "../support/legibility.js";
import { itWithPoppler, pdfPages, pdfText, run } from "../support/poppler.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-bullpen-"));
const pdf = join(tmp, "bullpen.pdf");
const svgDir = join(tmp, "charts");
const summaryFile = join(tmp, "summary.json");

interface SummaryType {
  pitcher: string;
  pitch: string;
  hand: string;
  rows: number;
  residual: { armSideIn: number; verticalIn: number; sdArmSideIn: number; sdVerticalIn: number };
  reach: { alongResidualIn: number; beyondReach: boolean };
  orientations: { rank: number; latLon: string; landmark: { name: string }; fitErrorIn: number }[];
}

let summary: SummaryType[] = [];
/** Page text with runs of white space as one space. */
const flat = (s: string) => s.normalize("NFC").replace(/\s+/g, " ");

describe("explain --report, read back", () => {
  beforeAll(() => {
    const csv = join(tmp, "session.csv");
    writeFileSync(csv, bullpenCsv());
    const r = runCli(["explain", "--csv-in", csv, "--out", join(tmp, "rows.csv"), "--summary", summaryFile, "--report", pdf, "--report-svg", svgDir, "--cache", join(tmp, "cache")]);
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    summary = JSON.parse(readFileSync(summaryFile, "utf8")).pitches;
  }, 180_000);

  itWithPoppler("prints each pitch type's throws, residual, reach and orientations as the summary JSON gives them, to the digits printed [cross-check: two outputs of one run]", () => {
    expect(summary).toHaveLength(6);
    // the cover, then Zoë (charts, two table pages), Иван (charts, table), the third pitcher (charts, table)
    expect(pdfPages(pdf)).toBe(1 + 3 + 2 + 2);
    // in the order drawn (-raw), so each cell's lines stay together
    const tables = [3, 4, 6, 8].map((p) => flat(run("pdftotext", ["-raw", "-f", String(p), "-l", String(p), pdf, "-"]))).join(" ");
    const cover = flat(pdfText(pdf, 1));
    for (const t of summary) {
      const res = t.residual;
      expect(tables).toContain(`${signed(res.armSideIn, 1)} in arm side (± ${fixed(res.sdArmSideIn, 1)})`);
      expect(tables).toContain(`${signed(res.verticalIn, 1)} in up (± ${fixed(res.sdVerticalIn, 1)})`);
      expect(tables).toContain(t.reach.beyondReach ? `BEYOND REACH: seams reach at most ${fixed(t.reach.alongResidualIn, 1)} in that way` : `seams can reach ${fixed(t.reach.alongResidualIn, 1)} in that way`);
      expect(cover).toContain(`${t.pitch} ${t.rows}`);
      for (const o of t.orientations) {
        expect(tables).toContain(`#${o.rank} ${o.latLon} near ${o.landmark.name} miss ${fixed(o.fitErrorIn, 1)} in`);
      }
    }
  });

  itWithPoppler("prints the names with accents, in Cyrillic, Arabic (right to left, UAX #9) and Chinese as typed, with the Vietnamese name after them whole (pdftotext -raw) [README: Any name]", () => {
    const all = flat(pdfRawText(pdf));
    expect(all).toContain("Zoë Ångström (right-handed): sinker 10, four-seam 10, changeup 10, slider 10");
    expect(all).toContain("Иван Петров (left-handed): curveball 10");
    expect(all).toContain("محمد 李小龙 Nguyễn (right-handed): four-seam 10");
    expect(all).toContain("Zoë Ångström: seam orientations per pitch type (continued)");
    expect(all).toContain("محمد 李小龙 Nguyễn: movement and direction");
    expect(all).not.toContain(MISSING_GLYPH);
  });

  itWithPoppler("holds on each chart page every word of that pitcher's two SVG charts, as often as they hold it [same drawing for both outputs]", () => {
    const files = readdirSync(svgDir).sort();
    expect(files).toEqual(["Zoë-Ångström-direction.svg", "Zoë-Ångström-movement.svg", "Иван-Петров-direction.svg", "Иван-Петров-movement.svg", "محمد-李小龙-Nguyễn-direction.svg", "محمد-李小龙-Nguyễn-movement.svg"].sort());
    const pages = wordBoxes(pdf);
    const chartPages: [string, number][] = [["Zoë-Ångström", 2], ["Иван-Петров", 5], ["محمد-李小龙-Nguyễn", 7]];
    for (const [stem, page] of chartPages) {
      const count = new Map<string, number>();
      for (const w of pages[page - 1]) {
        // -bbox lists an Arabic word's letters in glyph order, right to left drawn: reversed (tests/support/bidi.ts)
        const text = logicalFromGlyphOrder(w.text.replace(/&apos;/g, "'").normalize("NFC"));
        count.set(text, (count.get(text) ?? 0) + 1);
      }
      const want = new Map<string, number>();
      for (const kind of ["movement", "direction"]) {
        const svg = readFileSync(join(svgDir, `${stem}-${kind}.svg`), "utf8");
        expect(svg).toMatch(/^<svg[^>]*viewBox="0 0 520 470"/);
        for (const m of svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)) {
          const text = m[1].replace(/&gt;/g, ">").replace(/&lt;/g, "<").replace(/&quot;/g, '"').replace(/&amp;/g, "&");
          for (const w of text.split(/\s+/).filter(Boolean)) want.set(w, (want.get(w) ?? 0) + 1);
        }
      }
      expect(want.size).toBeGreaterThan(20);
      for (const [w, n] of want) expect(count.get(w) ?? 0, `"${w}" on page ${page}`).toBeGreaterThanOrEqual(n);
    }
  });
});
