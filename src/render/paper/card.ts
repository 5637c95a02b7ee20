/**
 * One grip card as a drawing (render/scene.ts) in points, from its card layout: a
 * dashed cut line, the title, the pitch, the ball in the pitcher's own view beside
 * the catcher's view, "how to hold it" in a player's words, a table comparing the
 * grip with the four-seam and two-seam holds (the screen's numbers), a technical
 * line and the caution. The same drawing is painted into a PDF, written as SVG or
 * rasterised to PNG, so the three read alike.
 */
import type { OrientationReport, ScreenReport } from "../../screening/report.js";
import { fixed } from "../numbers.js";
import { createScene, nestScene, type SceneNode } from "../scene.js";
import type { Box, Layout } from "./layouts.js";
import { PT_PER_IN, setTable, setText, textHeight, type BoxPt } from "./textLayout.js";
import { cardDrawings, FINGER_LETTERS, type CardDrawings } from "./views.js";
import { CAUTION_SHORT, COMPARE_CAPTION, COMPARE_COLUMNS, compareOwnRow, compareRows, holdLines, orientationTitle, pitchLabel, pitchSummary, reachWords, technicalLine, WANT_WORDS } from "./words.js";

export interface CardContent {
  readonly title: string;
  readonly summary: string;
  /** The ball drawings, or none for a card that names no grip (out of reach). */
  readonly drawings?: CardDrawings;
  /** What the marks on the drawings mean (cardKey). */
  readonly key?: string;
  readonly howTo: readonly string[];
  readonly want: string;
  readonly compare: readonly (readonly string[])[];
  /** The comparison row that is this card's own grip or hold (emphasised), or -1. */
  readonly ownRow: number;
  readonly technical: string;
}

/** Everything a card prints for a grip or a classic hold, from the screen report. */
export function cardContent(report: ScreenReport, o: OrientationReport, seamShape: number, idPrefix = "card"): CardContent {
  return {
    title: orientationTitle(report, o),
    summary: pitchSummary(report),
    drawings: cardDrawings(report, o, seamShape, 180, idPrefix),
    key: cardKey(o),
    howTo: holdLines(report, o),
    want: report.input.pitch.want,
    compare: compareRows(report, o),
    ownRow: compareOwnRow(report, o),
    technical: technicalLine(o),
  };
}

/** The card of a pitch whose wanted direction the seams cannot reach: what they can do instead, and the classic holds' numbers; no grip. */
export function outOfReachContent(report: ScreenReport): CardContent {
  return {
    title: `${pitchLabel(report)}: no grip for ${WANT_WORDS[report.input.pitch.want]} movement`,
    summary: pitchSummary(report),
    howTo: [reachWords(report), "The classic holds below show what this spin does with each."],
    want: report.input.pitch.want,
    compare: compareRows(report),
    ownRow: -1,
    technical: `Technical: reach ${fixed(report.reach.wantPct, 1)} % of the strongest seam movement (${fixed(report.reach.strongestIn, 1)} in); below 5 % a direction counts as out of reach.`,
  };
}

/** The smallest type on any printed page, points (common practice for fine print, no source). */
export const MIN_TEXT_PT = 6;

/** What the marks on a grip's two drawings mean: the letters of the fingers it uses (index, middle, ring, thumb), the axis, the push. */
export function cardKey(o: OrientationReport): string {
  const letters = (Object.keys(FINGER_LETTERS) as (keyof typeof FINGER_LETTERS)[]).filter((f) => o.fingers.some((p) => p.finger === f)).map((f) => FINGER_LETTERS[f]);
  return `${letters.join(" ")}: fingers and thumb \u00b7 dashed line: spin axis \u00b7 arrow: seam push`;
}

const pt = (b: Box): BoxPt => ({ x: b.xIn * PT_PER_IN, y: b.yIn * PT_PER_IN, w: b.wIn * PT_PER_IN, h: b.hIn * PT_PER_IN });

/** The card as a drawing in points, its top-left at (0, 0). */
export function cardScene(layout: Layout, c: CardContent): SceneNode {
  const b = layout.blocks;
  const f = layout.fonts;
  const W = layout.page.widthIn * PT_PER_IN;
  const H = layout.page.heightIn * PT_PER_IN;
  // the smallest text on a card: 6 pt, dark enough to read in print (tests/cli/legibility.test.ts)
  const small = Math.max(MIN_TEXT_PT, f.sizePt - 1);
  const card = createScene(W, H).attr({ "font-family": "Noto Sans, sans-serif" });
  card.rect().attr({ x: 0.25, y: 0.25, width: W - 0.5, height: H - 0.5, fill: "#ffffff", stroke: "#9a9a9a", "stroke-width": 0.5, "stroke-dasharray": "3 3", class: "sa-cut" });
  setText(card, c.title, pt(b.title), { sizePt: f.titleSizePt, weight: "bold", leading: 1.15 });
  setText(card, c.summary, pt(b.summary), { sizePt: f.sizePt - 0.5, fill: "#333333", leading: 1.2 });
  if (c.drawings) {
    const p = pt(b.viewPitcher), q = pt(b.viewCatcher);
    const keyH = f.sizePt * 1.3;
    nestScene(card, c.drawings.pitcher, p.x, p.y, p.w, p.h - keyH);
    nestScene(card, c.drawings.catcher, q.x, q.y, q.w, q.h - keyH);
    setText(card, c.key ?? "", { x: p.x + 4, y: p.y + p.h - keyH, w: q.x + q.w - p.x - 4, h: keyH }, { sizePt: small, fill: "#333333" });
    // every sentence, the type a point and a half smaller at most, before the last ones
    // (where the axis goes, which the technical line also says; then the thumb) give way
    const box = pt(b.howTo);
    const fits = (lines: readonly string[], sizePt: number) => textHeight(lines.join("\n"), box.w, { sizePt, leading: 1.2, paragraphGap: 0.25 }) <= box.h;
    const smallest = Math.max(MIN_TEXT_PT, f.sizePt - 1.5);
    let lines = [...c.howTo];
    let size: number;
    for (;;) {
      size = f.sizePt;
      while (size > smallest && !fits(lines, size)) size = Math.max(smallest, size - 0.25);
      if (fits(lines, size) || lines.length <= 2) break;
      lines = lines.slice(0, -1);
    }
    setText(card, lines.join("\n"), box, { sizePt: size, leading: 1.2, paragraphGap: 0.25 });
  } else {
    // no grip to show: the words take the drawings' place
    const p = pt(b.viewPitcher), h = pt(b.howTo);
    const x0 = Math.min(p.x, h.x), x1 = Math.max(p.x + p.w, h.x + h.w);
    setText(card, c.howTo.join("\n"), { x: x0, y: p.y, w: x1 - x0, h: Math.max(p.h, h.h) }, { sizePt: f.sizePt + 1, leading: 1.25, paragraphGap: 0.4 });
  }
  const cmp = pt(b.compare);
  const cap = small;
  const capH = setText(card, COMPARE_CAPTION, { ...cmp, h: cap * 2.6 }, { sizePt: cap, fill: "#333333", leading: 1.15 }).heightPt;
  setTable(card, COMPARE_COLUMNS(c.want), c.compare, { ...cmp, y: cmp.y + capH + cap * 0.2, h: cmp.h - capH - cap * 0.2 }, f.sizePt, c.ownRow);
  setText(card, c.technical, pt(b.technical), { sizePt: small, fill: "#333333", leading: 1.15 });
  setText(card, CAUTION_SHORT, pt(b.caution), { sizePt: small, fill: "#7a2f1d", leading: 1.2 });
  return card;
}

/** Origins (inches) of the cards of a sheet or atlas page, row by row, the grid centred across the page. */
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

/** The pages of a sheet layout holding `contents` in order, as many cards to a page as its grid holds (points). */
export function sheetScenes(layout: Layout, contents: readonly CardContent[]): SceneNode[] {
  const per = layout.grid!.columns * layout.grid!.rows;
  const pages: SceneNode[] = [];
  for (let k = 0; k < contents.length; k += per) {
    const scene = createScene(layout.page.widthIn * PT_PER_IN, layout.page.heightIn * PT_PER_IN).attr({ "font-family": "Noto Sans, sans-serif" });
    placeCards(scene, layout, contents.slice(k, k + per).map((c) => cardScene(layout.card!, c)));
    pages.push(scene);
  }
  return pages;
}

/** Places card drawings on a page drawing at the sheet's grid origins. */
export function placeCards(page: SceneNode, layout: Layout, cards: readonly SceneNode[]): void {
  const origins = cardOrigins(layout);
  const card = layout.card!;
  cards.forEach((c, k) => {
    const [x, y] = origins[k];
    nestScene(page, c, x * PT_PER_IN, y * PT_PER_IN, card.page.widthIn * PT_PER_IN, card.page.heightIn * PT_PER_IN);
  });
}
