/**
 * One grip card drawn on a page at an origin (inches): a thin cut line, the title,
 * the pitch summary, the two ball drawings, the numbers, the finger placement in
 * words and the caution line, each in the block its card layout names.
 */
import type { Band } from "../../sampling/band.js";
import type { OrientationReport, ScreenReport } from "../../screening/report.js";
import type { ScreenedOrientation } from "../../screening/screen.js";
import type { Layout } from "./layouts.js";
import { drawSvg, PT_PER_IN, rowsInBox, textInBox, type Doc } from "./pdfDoc.js";
import { cardDrawings, type CardDrawings } from "./views.js";
import { CAUTION_SHORT, fingerSentence, holdAdvice, numberLines, orientationTitle, pitchSummary } from "./words.js";

export interface CardContent {
  readonly title: string;
  readonly summary: string;
  readonly drawings: CardDrawings;
  readonly numbers: readonly [string, string][];
  readonly fingers: readonly string[];
  readonly advice: string;
}

/** Everything a card prints, from the screen report (numbers) and the screened orientation (geometry). */
export function cardContent(
  report: ScreenReport,
  orientation: OrientationReport,
  screened: ScreenedOrientation,
  band: Band,
  seamShape: number,
  idPrefix = "card",
): CardContent {
  return {
    title: orientationTitle(report, orientation),
    summary: pitchSummary(report),
    drawings: cardDrawings(screened, band, seamShape, 300, idPrefix),
    numbers: numberLines(report, orientation),
    fingers: orientation.fingers.map(fingerSentence),
    advice: holdAdvice(orientation),
  };
}

export function drawCard(doc: Doc, layout: Layout, c: CardContent, origin: readonly [number, number] = [0, 0]): void {
  const b = layout.blocks;
  const f = layout.fonts;
  doc
    .save()
    .lineWidth(0.5)
    .dash(3, { space: 3 })
    .strokeColor("#9a9a9a")
    .rect(origin[0] * PT_PER_IN, origin[1] * PT_PER_IN, layout.page.widthIn * PT_PER_IN, layout.page.heightIn * PT_PER_IN)
    .stroke()
    .undash()
    .restore();
  textInBox(doc, c.title, b.title, { font: f.bold, sizePt: f.titleSizePt }, origin);
  textInBox(doc, c.summary, b.summary, { font: f.body, sizePt: f.sizePt, color: "#333333" }, origin);
  drawSvg(doc, c.drawings.held, b.viewHeld, origin);
  drawSvg(doc, c.drawings.flow, b.viewFlow, origin);
  rowsInBox(doc, c.numbers, b.numbers, layout, origin);
  textInBox(doc, [...c.fingers, c.advice].join("\n"), b.fingers, { font: f.body, sizePt: f.sizePt, lineGap: 0.5 }, origin);
  textInBox(doc, CAUTION_SHORT, b.caution, { font: f.body, sizePt: Math.max(5.5, f.sizePt - 1), color: "#7a2f1d" }, origin);
}

/** Origins (inches) of the cards of a sheet or atlas page, row by row. */
export function cardOrigins(page: Layout): [number, number][] {
  const card = page.card!;
  const g = page.grid!;
  const usedW = g.columns * card.page.widthIn + (g.columns - 1) * g.gapIn;
  const left = (page.page.widthIn - usedW) / 2;
  const out: [number, number][] = [];
  for (let r = 0; r < g.rows; r++) {
    for (let col = 0; col < g.columns; col++) out.push([left + col * (card.page.widthIn + g.gapIn), page.marginIn + r * (card.page.heightIn + g.gapIn)]);
  }
  return out;
}
