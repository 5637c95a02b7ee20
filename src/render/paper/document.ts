/**
 * A PDF made of page drawings (render/scene.ts, points from the page's top-left):
 * pdfkit with fixed metadata (no timestamps: the same input gives the same bytes),
 * each page painted straight from its drawing (pdfScene.ts), Noto Sans embedded
 * and subset to the glyphs used.
 */
import PDFDocument from "pdfkit";
import type { SceneNode } from "../scene.js";
import { paintSceneAt, PT_PER_IN, type Doc } from "./pdfScene.js";

export { PT_PER_IN, type Doc };

export interface Page {
  readonly widthIn: number;
  readonly heightIn: number;
  readonly scene: SceneNode;
}

/** The PDF of `pages`, with `title` in its metadata; `onPage(done, total)` after each page. */
export function pdfOfPages(pages: readonly Page[], title: string, onPage?: (done: number, total: number) => void): Promise<Buffer> {
  if (!pages.length) throw new RangeError("a document needs at least one page");
  const pdf = openPdf(title, pages[0]);
  pages.forEach((p, i) => {
    pdf.add(p);
    onPage?.(i + 1, pages.length);
  });
  return pdf.end();
}

/** A PDF painted a page at a time, in any order (see openPdf). */
export interface PdfInProgress {
  /** Paints `page` now; returns its number in painting order (0 first). */
  add(page: Page): number;
  /** Pages painted so far. */
  readonly count: number;
  /**
   * Finishes the document. `order`, when given, is every painting number once, in
   * reading order (a page's place in the file is its place in the page tree, not
   * when it was painted).
   */
  end(order?: readonly number[]): Promise<Buffer>;
}

/**
 * A PDF whose pages are painted as they become ready (a page is written out as soon
 * as the next is begun, so memory holds one page's drawing, not the document's), and
 * put in reading order at the end: a job can paint the pages it has while it waits
 * for the others, and paint a cover that lists them all last. `first` sets the
 * document's default size.
 */
export function openPdf(title: string, first: Pick<Page, "widthIn" | "heightIn">): PdfInProgress {
  const doc: Doc = new PDFDocument({
    size: [first.widthIn * PT_PER_IN, first.heightIn * PT_PER_IN],
    margin: 0,
    autoFirstPage: false,
    info: { Title: title, Author: "seam-atlas", Creator: "seam-atlas", Producer: "seam-atlas (pdfkit)", CreationDate: new Date(Date.UTC(2026, 0, 1)) },
  });
  const done = new Promise<Buffer>((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  let count = 0;
  return {
    add(p) {
      doc.addPage({ size: [p.widthIn * PT_PER_IN, p.heightIn * PT_PER_IN], margin: 0 });
      paintSceneAt(doc, p.scene);
      return count++;
    },
    get count() {
      return count;
    },
    end(order) {
      if (!count) throw new RangeError("a document needs at least one page");
      if (order) {
        if (order.length !== count || new Set(order).size !== count || order.some((k) => !(Number.isInteger(k) && k >= 0 && k < count))) {
          throw new RangeError(`a page order must name each of the ${count} pages once`);
        }
        // the page tree's list of pages (pdfkit keeps it until end() writes it; PDF 32000-1:2008, 7.7.3.2)
        const kids = (doc as unknown as { _root: { data: { Pages: { data: { Kids: unknown[] } } } } })._root.data.Pages.data.Kids;
        const painted = [...kids];
        order.forEach((k, i) => (kids[i] = painted[k]));
      }
      doc.end();
      return done;
    },
  };
}
