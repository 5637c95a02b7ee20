/**
 * Text set on a page drawing (render/scene.ts), in points from the page's top-left:
 * paragraphs wrapped with the face's own metrics (render/fonts.ts) into one text
 * node per line, and simple tables. Because lines are broken here, not by the PDF
 * library, the PDF, the SVG and the PNG of a page break every line alike.
 */
import { FONT_FAMILY, fontMetricsEm, measureText, wrapText, type FontWeight } from "../fonts.js";
import { addText, type SceneNode } from "../scene.js";

/** A box on the page, points. */
export interface BoxPt {
  readonly x: number;
  readonly y: number;
  readonly w: number;
  readonly h: number;
}

export interface TextStyle {
  readonly sizePt: number;
  readonly weight?: FontWeight;
  readonly fill?: string;
  /** Line pitch as a multiple of the size (default 1.25). */
  readonly leading?: number;
  /** Extra space after each paragraph, as a multiple of the size (default 0). */
  readonly paragraphGap?: number;
  readonly align?: "start" | "middle" | "end";
  readonly className?: string;
}

export interface SetText {
  /** Height used, points. */
  readonly heightPt: number;
  /** Lines that did not fit and were cut (the last shown line ends in an ellipsis). */
  readonly cut: number;
}

/** Points per inch (PDF's user unit). */
export const PT_PER_IN = 72;

export const INK = "#1b1b1b";
const ELLIPSIS = "\u2026";

/**
 * Sets `text` (paragraphs at line feeds) in `box`, top-aligned; lines that would
 * run below the box are left out and the last shown line gets an ellipsis.
 */
export function setText(parent: SceneNode, text: string, box: BoxPt, style: TextStyle): SetText {
  const size = style.sizePt;
  const weight = style.weight ?? "normal";
  const pitch = size * (style.leading ?? 1.25);
  const gap = size * (style.paragraphGap ?? 0);
  const ascent = fontMetricsEm(weight).ascent * size;
  let y = box.y + ascent;
  const bottom = box.y + box.h;
  let cut = 0;
  const paras = text.split("\n");
  const shown: { line: string; y: number }[] = [];
  for (let p = 0; p < paras.length; p++) {
    const lines = wrapText(paras[p], box.w, size, weight);
    for (const line of lines) {
      if (y - ascent + size * 1.1 > bottom + 1e-6) {
        cut++;
        continue;
      }
      shown.push({ line, y });
      y += pitch;
    }
    y += gap;
  }
  if (cut && shown.length) {
    const last = shown[shown.length - 1];
    let t = last.line;
    while (t && measureText(`${t}${ELLIPSIS}`, size, weight) > box.w) t = t.slice(0, -1);
    last.line = `${t.trimEnd()}${ELLIPSIS}`;
  }
  const anchor = style.align ?? "start";
  const x = anchor === "middle" ? box.x + box.w / 2 : anchor === "end" ? box.x + box.w : box.x;
  for (const s of shown) {
    if (!s.line) continue;
    addText(parent, x, s.y, s.line, { sizePx: size, fill: style.fill ?? INK, weight, anchor, className: style.className });
  }
  const used = shown.length ? shown[shown.length - 1].y - box.y + size * 0.3 : 0;
  return { heightPt: used, cut };
}

/** The height `text` needs in a box `widthPt` wide, points. */
export function textHeight(text: string, widthPt: number, style: TextStyle): number {
  const pitch = style.sizePt * (style.leading ?? 1.25);
  let lines = 0;
  let paras = 0;
  for (const para of text.split("\n")) {
    lines += wrapText(para, widthPt, style.sizePt, style.weight ?? "normal").length;
    paras++;
  }
  return lines * pitch + paras * style.sizePt * (style.paragraphGap ?? 0);
}

export interface TableColumn {
  readonly title: string;
  /** Share of the table's width. */
  readonly share: number;
  readonly align?: "start" | "end";
}

/** The smallest type a table shrinks to so that its cells fit (points). */
export const MIN_TABLE_PT = 6;

/**
 * A table: a bold header row, then the rows, each cell one line; each column as wide
 * as its widest cell and the room left shared by the columns' shares, the type made
 * smaller (to MIN_TABLE_PT at least) when the cells need more than the box, and a cell
 * still too wide cut with an ellipsis; hairlines under the header; one row
 * (`emphasise`) can be set in bold on a tint. Returns the height used, points.
 */
export function setTable(parent: SceneNode, columns: readonly TableColumn[], rows: readonly (readonly string[])[], box: BoxPt, size: number, emphasise = -1): number {
  const total = columns.reduce((s, c) => s + c.share, 0);
  const GAP = 3;
  // each column as wide as its widest cell, the room left shared out by the columns' shares;
  // when the cells need more than the box, the type smaller (to MIN_TABLE_PT at least)
  const natural = (sz: number) =>
    columns.map((c, k) => {
      let w = measureText(c.title, sz, "bold");
      rows.forEach((r, i) => (w = Math.max(w, measureText(r[k], sz, i === emphasise ? "bold" : "normal"))));
      return w + GAP;
    });
  let sizePt = size;
  let need = natural(sizePt);
  let sum = need.reduce((a, b) => a + b, 0);
  if (sum > box.w) {
    sizePt = Math.max(Math.min(size, MIN_TABLE_PT), (0.999 * sizePt * box.w) / sum);
    need = natural(sizePt);
    sum = need.reduce((a, b) => a + b, 0);
  }
  const spare = Math.max(0, box.w - sum);
  const widths = columns.map((c, k) => (sum > box.w ? (box.w * c.share) / total : need[k] + (spare * c.share) / total));
  const pitch = sizePt * 1.3;
  const ascent = fontMetricsEm().ascent * sizePt;
  const xs: number[] = [];
  let x = box.x;
  for (const w of widths) {
    xs.push(x);
    x += w;
  }
  const cell = (text: string, k: number, y: number, weight: FontWeight, fill: string) => {
    const c = columns[k];
    const w = widths[k] - GAP;
    let t = text;
    if (measureText(t, sizePt, weight) > w) {
      while (t && measureText(`${t}${ELLIPSIS}`, sizePt, weight) > w) t = t.slice(0, -1);
      t = `${t}${ELLIPSIS}`;
    }
    const at = c.align === "end" ? xs[k] + w : xs[k];
    addText(parent, at, y, t, { sizePx: sizePt, fill, weight, anchor: c.align === "end" ? "end" : "start" });
  };
  let y = box.y + ascent;
  columns.forEach((c, k) => cell(c.title, k, y, "bold", "#444444"));
  parent.path(`M${box.x} ${y + sizePt * 0.3}L${box.x + box.w} ${y + sizePt * 0.3}`).attr({ stroke: "#9a9a9a", "stroke-width": 0.5, fill: "none" });
  y += pitch;
  rows.forEach((row, i) => {
    if (y - ascent + sizePt > box.y + box.h + 1e-6) return;
    if (i === emphasise) {
      // from just over the capitals to just under the descenders: clear of the row above and its rule
      parent.rect().attr({ x: box.x - 1, y: y - 0.9 * sizePt, width: box.w + 2, height: 1.2 * sizePt, fill: "#f1ece2", stroke: "none" });
    }
    row.forEach((text, k) => cell(text, k, y, i === emphasise ? "bold" : "normal", INK));
    y += pitch;
  });
  return y - pitch - box.y + sizePt * 0.4;
}

/** The root attributes that make a page drawing name its face for SVG viewers. */
export function pageFontFamily(): string {
  return `${FONT_FAMILY}, sans-serif`;
}
