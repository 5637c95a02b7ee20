/// <reference lib="dom" />
/**
 * Printing from the page: the chosen grip as the card `seam-atlas card` prints (the
 * same drawing, render/paper/card.ts, written as SVG by the same function as
 * `card --svg`, its words and numbers the screen report's), then a sheet of the grips
 * ticked for it, as `card --layout` sheets lay them out. The page's print style sheet
 * shows only these pages, each on paper of its own size (a 6 x 4 in card, Letter or
 * A4 sheets); the drawings are vector, so they print at the printer's resolution.
 */
import { cardContent, outOfReachContent, sheetScenes, type CardContent } from "../render/paper/card.js";
import { renderCardSvg } from "../render/paper/cardSvg.js";
import type { ListedOrientation, ViewData } from "../render/page3d/data.js";
import { serializeScene } from "../render/scene.js";
import type { ScreenReport } from "../screening/report.js";

export type Paper = "letter" | "a4";

/** The card of one listed grip or hold, as `card` makes it (candidate N, or --reference). */
export function listedCard(report: ScreenReport, item: ListedOrientation, seamShape: number): CardContent {
  return cardContent(report, item.orientation, seamShape, "card1");
}

/** The card as `card --svg` writes it. */
export function cardSvg(data: ViewData, report: ScreenReport, item: ListedOrientation): string {
  return renderCardSvg(data.layouts.card, listedCard(report, item, report.input.settings.seamShape));
}

/** The sheet's pages as SVG: the ticked grips, then the ticked holds (and, when the wanted direction is out of reach, what the seams can do instead first). */
export function sheetSvgs(data: ViewData, report: ScreenReport, ticked: readonly ListedOrientation[], paper: Paper): string[] {
  const shape = report.input.settings.seamShape;
  const contents: CardContent[] = [];
  if (report.reach.outOfReach) contents.push(outOfReachContent(report));
  let grips = 0;
  let holds = 0;
  for (const item of ticked) {
    const o = item.orientation;
    contents.push(cardContent(report, o, shape, o.reference ? `hold${++holds}` : `card${++grips}`));
  }
  if (!contents.length) return [];
  const layout = data.layouts.sheets[paper];
  return sheetScenes(layout, contents).map((scene) => {
    scene.attr({ width: `${layout.page.widthIn}in`, height: `${layout.page.heightIn}in` });
    return serializeScene(scene, 2, "sheet");
  });
}

/** Fills the print area: the card's page, then the sheet's pages. */
export function fillPrintArea(area: HTMLElement, card: string, sheets: readonly string[], paper: Paper): void {
  const page = (kind: string, svg: string) => `<div class="print-page ${kind}">${svg}</div>`;
  area.innerHTML = [page("print-card", card), ...sheets.map((s) => page(`print-sheet-${paper}`, s))].join("");
}
