import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { openPdf, pdfOfPages, type Page } from "../../../src/render/paper/document.js";
import { createScene } from "../../../src/render/scene.js";
import { setText } from "../../../src/render/paper/textLayout.js";
import { itWithPoppler, pdfPages, pdfText } from "../../support/poppler.js";

function page(word: string): Page {
  const scene = createScene(288, 432);
  setText(scene, word, { x: 36, y: 36, w: 216, h: 40 }, { sizePt: 14 });
  return { widthIn: 4, heightIn: 6, scene };
}

const save = (bytes: Buffer) => {
  const f = join(mkdtempSync(join(tmpdir(), "seam-atlas-doc-")), "d.pdf");
  writeFileSync(f, bytes);
  return f;
};

describe("a PDF painted page by page, put in reading order at the end", () => {
  itWithPoppler("pages painted Alpha, Bravo, Charlie and ordered [2, 0, 1] read Charlie, Alpha, Bravo [PDF 32000-1:2008, 7.7.3.2: the page tree's Kids order is the page order]", async () => {
    const pdf = openPdf("order", { widthIn: 4, heightIn: 6 });
    for (const w of ["Alpha", "Bravo", "Charlie"]) pdf.add(page(w));
    const f = save(await pdf.end([2, 0, 1]));
    expect(pdfPages(f)).toBe(3);
    expect([1, 2, 3].map((k) => pdfText(f, k).trim())).toEqual(["Charlie", "Alpha", "Bravo"]);
  });

  it("the same pages painted in the same order give the same bytes, whether ordered at the end or not [determinism]", async () => {
    const a = await pdfOfPages([page("Alpha"), page("Bravo")], "same");
    const pdf = openPdf("same", { widthIn: 4, heightIn: 6 });
    pdf.add(page("Alpha"));
    pdf.add(page("Bravo"));
    expect((await pdf.end([0, 1])).equals(a)).toBe(true);
  });

  it("an order that does not name every page once is refused [PDF 32000-1:2008, 7.7.3.2: each page once in the tree]", () => {
    for (const bad of [[0], [0, 0], [0, 2], [1, 0.5]]) {
      const pdf = openPdf("bad", { widthIn: 4, heightIn: 6 });
      pdf.add(page("Alpha"));
      pdf.add(page("Bravo"));
      expect(() => pdf.end(bad)).toThrow(RangeError);
    }
  });
});
