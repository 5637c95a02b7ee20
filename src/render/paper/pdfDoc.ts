/**
 * pdfkit helpers: a document with fixed metadata (so the same input gives the same
 * pages), SVG drawings placed as vectors (svg-to-pdfkit), text in boxes, and the
 * finished PDF as bytes.
 */
import PDFDocument from "pdfkit";
import SVGtoPDF from "svg-to-pdfkit";
import type { Box, Layout } from "./layouts.js";

export type Doc = PDFKit.PDFDocument;
export const PT_PER_IN = 72;

/** A new document whose first page has the layout's size. */
export function newDocument(layout: Layout, title: string): Doc {
  return new PDFDocument({
    size: [layout.page.widthIn * PT_PER_IN, layout.page.heightIn * PT_PER_IN],
    margin: layout.marginIn * PT_PER_IN,
    autoFirstPage: true,
    info: { Title: title, Author: "seam-atlas", Creator: "seam-atlas", Producer: "seam-atlas (pdfkit)", CreationDate: new Date(Date.UTC(2026, 0, 1)) },
  });
}

export function addPage(doc: Doc, layout: Layout): void {
  doc.addPage({ size: [layout.page.widthIn * PT_PER_IN, layout.page.heightIn * PT_PER_IN], margin: layout.marginIn * PT_PER_IN });
}

/** Places an SVG drawing into `box` (inches, offset by `origin`), keeping its aspect ratio. */
export function drawSvg(doc: Doc, svg: string, box: Box, origin: readonly [number, number] = [0, 0]): void {
  SVGtoPDF(doc, svg, (origin[0] + box.xIn) * PT_PER_IN, (origin[1] + box.yIn) * PT_PER_IN, {
    width: box.wIn * PT_PER_IN,
    height: box.hIn * PT_PER_IN,
    preserveAspectRatio: "xMidYMid meet",
    assumePt: false,
  });
}

export interface TextOptions {
  readonly font: string;
  readonly sizePt: number;
  readonly color?: string;
  readonly align?: "left" | "center" | "right";
  readonly lineGap?: number;
}

/** Writes `text` inside `box` (inches, offset by `origin`), wrapping, clipped to the box height. */
export function textInBox(doc: Doc, text: string, box: Box, o: TextOptions, origin: readonly [number, number] = [0, 0]): void {
  doc
    .font(o.font)
    .fontSize(o.sizePt)
    .fillColor(o.color ?? "#1b1b1b")
    .text(text, (origin[0] + box.xIn) * PT_PER_IN, (origin[1] + box.yIn) * PT_PER_IN, {
      width: box.wIn * PT_PER_IN,
      height: box.hIn * PT_PER_IN,
      align: o.align ?? "left",
      lineGap: o.lineGap ?? 1,
      ellipsis: true,
    });
}

/** Label/value rows in a box: labels left, values after a tab stop at `labelFraction` of the width. */
export function rowsInBox(doc: Doc, rows: readonly (readonly [string, string])[], box: Box, layout: Layout, origin: readonly [number, number] = [0, 0], labelFraction = 0.45): void {
  const x = (origin[0] + box.xIn) * PT_PER_IN;
  let y = (origin[1] + box.yIn) * PT_PER_IN;
  const w = box.wIn * PT_PER_IN;
  const size = layout.fonts.sizePt;
  const bottom = (origin[1] + box.yIn + box.hIn) * PT_PER_IN;
  for (const [label, value] of rows) {
    if (y + size > bottom) break;
    doc.font(layout.fonts.body).fontSize(size).fillColor("#555555").text(label, x, y, { lineBreak: false });
    doc.font(layout.fonts.bold).fontSize(size).fillColor("#1b1b1b").text(value, x + w * labelFraction, y, { lineBreak: false });
    y += size * 1.45;
  }
}

/** The finished PDF as bytes. */
export function finish(doc: Doc): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    doc.end();
  });
}
