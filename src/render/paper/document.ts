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
  const doc: Doc = new PDFDocument({
    size: [pages[0].widthIn * PT_PER_IN, pages[0].heightIn * PT_PER_IN],
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
  pages.forEach((p, i) => {
    doc.addPage({ size: [p.widthIn * PT_PER_IN, p.heightIn * PT_PER_IN], margin: 0 });
    paintSceneAt(doc, p.scene);
    onPage?.(i + 1, pages.length);
  });
  doc.end();
  return done;
}
