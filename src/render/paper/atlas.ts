/**
 * The ranked grip atlas: a multi-page PDF for one pitch or a staff, every page a
 * drawing (render/scene.ts) painted straight into the PDF.
 *   1. cover: the pitches, each with its best grip (or, when the seams cannot reach
 *      the wanted direction, that in plain words), and the caution
 *   2. how to read the atlas
 *   per pitch: the sphere map of seam movement toward the wanted direction (inches,
 *   Hammer equal-area) with the grips numbered and the classic holds marked, what the
 *   seams can reach, and the comparison table; then the grips ranked as cards with the
 *   two classic holds' cards after them (an out-of-reach pitch gets one card saying so
 *   instead of ranked grips)
 *   last: the caution page
 * Every number comes from the screen report (src/screening/report.ts) through the
 * shared formats, so it equals what `screen --json` gives.
 */
import type { SphereGrid } from "../../../geometry/sphereGrid.js";
import type { ScreenReport } from "../../screening/report.js";
import { TOOL_VERSION } from "../../version.js";
import { createScene, nestScene, type SceneNode } from "../scene.js";
import { mapMarksIn, scaleRange, sphereMapScene, type MapCells } from "../sphereMapDrawing.js";
import { ATLAS_MAP_CELLS } from "./atlasMap.js";
import { cardContent, cardScene, outOfReachContent, placeCards, type CardContent } from "./card.js";
import { openPdf, type Page } from "./document.js";
import type { Layout } from "./layouts.js";
import { PT_PER_IN } from "./pdfScene.js";
import { setTable, setText, textHeight, type BoxPt } from "./textLayout.js";
import { CAUTION_LONG, CAUTION_SHORT, COMPARE_CAPTION, COMPARE_COLUMNS, compareRow, HOLD_WORDS, movementWords, pitchLabel, pitchSummary, RANK_WORDS, reachWords, robustnessWords, SEAM_PICTURE, turnSentence, WANT_WORDS } from "./words.js";
import { MODEL_STORY } from "./story.js";

export interface AtlasPitch {
  readonly report: ScreenReport;
  /** Seam movement toward the wanted direction (its size for "any") per grid cell, inches. */
  readonly mapValuesIn: Float64Array;
  readonly grid: SphereGrid;
  /** The map's cells already made as PDF content (sphereMapCellsPdf with ATLAS_MAP_CELLS), or undefined to draw them here. */
  readonly mapCellsPdf?: MapCells;
}

export interface AtlasInput {
  readonly layout: Layout;
  readonly team?: string;
  readonly pitches: readonly AtlasPitch[];
  readonly seamShape: number;
  readonly onPage?: (done: number, total: number) => void;
}

export const HOW_TO_READ = [
  `What this atlas is. For each pitch it tries every place on the ball where the spin axis could go through it, and ranks the distinct grips by the seam movement they add toward the wanted direction, in inches at the plate. One seam-force model gives every number. The numbers are a model's, for planning bullpen and lab time, not a promise: calibrate the model to your own measurements (README).`,
  SEAM_PICTURE,
  `The classic holds, as coaches teach them. The ${HOLD_WORDS["four-seam"]}. The ${HOLD_WORDS["two-seam"]}. Every grip card tells you which of the two to start from and how far to turn the ball in your hand: how far the side under your fingers rolls (toward your arm side or glove side, your fingertips or your palm) and how far the ball twists as you look at its back.`,
  `The model, in the same words as the cards and the handout. ${MODEL_STORY}`,
  "Seam movement. The seam part of the movement at the front of the plate, read as the trade reads movement (a constant-acceleration fit over the last 50 ft, gravity removed): arm side and up, in inches, and its direction as a clock reading from behind the pitcher or the catcher, as the pitch's tilt is.",
  "The sphere map. Each cell is one place the spin axis could go through the ball, on the Hammer equal-area map of the ball's own frame, coloured by the seam movement toward the wanted direction in inches (the scale under the map). Negative numbers push the other way. Numbered hexagons are the ranked grips, crossed squares the four-seam (4S) and two-seam (2S) holds. When the seams cannot reach the wanted direction (less than 5 % of the strongest seam movement), the page says so and names the nearest direction they can reach, and no grip is ranked.",
  "Robustness. No one places the axis exactly: 'mean' and 'p10' are the movement's average and its 10th percentile when the axis wanders on the ball by about 5 degrees. A grip whose p10 stays close to its number is forgiving.",
  "The comparison table on every card and map page puts each grip beside the four-seam and two-seam holds for the same pitch, with the same numbers as screen --json.",
  "Fingers. Fastballs: index and middle side by side on top, thumb beneath. Changeups: middle and ring on top, the index finger curled round to the thumb (a circle). Breaking balls: offset, the middle finger doing the work with the index beside it. The kind is read from the pitch's name. Pads are drawn at an adult's size, in the pitcher's own view from behind the ball beside the catcher's view; the fingertips point the way they pull the ball round (up its back for backspin, across it for side spin, the hand on the ball's side). The grip may slide along the spin's equator without changing the prediction; the card puts the pads on or nearest a seam.",
];

const pt = (xIn: number, yIn: number, wIn: number, hIn: number): BoxPt => ({ x: xIn * PT_PER_IN, y: yIn * PT_PER_IN, w: wIn * PT_PER_IN, h: hIn * PT_PER_IN });

function newPage(L: Layout): Page {
  const scene = createScene(L.page.widthIn * PT_PER_IN, L.page.heightIn * PT_PER_IN).attr({ "font-family": "Noto Sans, sans-serif" });
  scene.rect().attr({ x: 0, y: 0, width: L.page.widthIn * PT_PER_IN, height: L.page.heightIn * PT_PER_IN, fill: "#ffffff", stroke: "none" });
  return { widthIn: L.page.widthIn, heightIn: L.page.heightIn, scene };
}

function cautionBox(s: SceneNode, L: Layout, yIn: number, hIn: number): void {
  const m = L.marginIn;
  const w = L.page.widthIn - 2 * m;
  s.rect().attr({ x: m * PT_PER_IN, y: yIn * PT_PER_IN, width: w * PT_PER_IN, height: hIn * PT_PER_IN, fill: "#f6efe6", stroke: "none" });
  setText(s, CAUTION_SHORT, pt(m + 0.15, yIn + 0.12, w - 0.3, hIn - 0.2), { sizePt: L.fonts.sizePt, fill: "#7a2f1d" });
}

function bestLine(r: ScreenReport): string {
  const best = r.candidates[0];
  if (r.reach.outOfReach || !best) return reachWords(r);
  const turn = best.fromHold ? ` ${turnSentence(best.fromHold)}` : "";
  return `Best grip: ${movementWords(r, best)}; ${robustnessWords(r, best)}.${turn}`;
}

function coverPages(input: AtlasInput): Page[] {
  const L = input.layout;
  const f = L.fonts;
  const m = L.marginIn;
  const w = L.page.widthIn - 2 * m;
  const pages: Page[] = [];
  let page = newPage(L);
  pages.push(page);
  setText(page.scene, "Grip atlas", pt(m, m, w, 0.5), { sizePt: f.titleSizePt + 6, weight: "bold" });
  setText(page.scene, input.team ?? "One pitch", pt(m, m + 0.55, w, 0.3), { sizePt: f.sizePt + 2, fill: "#333333" });
  setText(page.scene, `Seam orientations ranked by the seam movement they add at the plate. seam-atlas ${TOOL_VERSION}.`, pt(m, m + 0.9, w, 0.3), { sizePt: f.sizePt, fill: "#555555" });
  const bottom = L.page.heightIn - m - 1.3;
  let y = m + 1.35;
  for (const p of input.pitches) {
    const r = p.report;
    const body = `${pitchSummary(r)}\n${bestLine(r)}`;
    const hIn = (f.sizePt * 1.4 + textHeight(body, (w - 0.15) * PT_PER_IN, { sizePt: f.sizePt - 1 })) / PT_PER_IN + 0.15;
    if (y + hIn > bottom) {
      page = newPage(L);
      pages.push(page);
      setText(page.scene, "Grip atlas (continued)", pt(m, m, w, 0.4), { sizePt: f.titleSizePt, weight: "bold" });
      y = m + 0.6;
    }
    setText(page.scene, pitchLabel(r), pt(m, y, w, 0.3), { sizePt: f.sizePt + 1, weight: "bold" });
    setText(page.scene, body, pt(m + 0.15, y + (f.sizePt * 1.4) / PT_PER_IN, w - 0.15, hIn), { sizePt: f.sizePt - 1, fill: "#333333" });
    y += hIn;
  }
  cautionBox(pages[0].scene, L, L.page.heightIn - m - 1.1, 1.0);
  return pages;
}

/** Pages of paragraphs under a title, continued on as many pages as they need. */
function textPages(L: Layout, title: string, paragraphs: readonly string[]): Page[] {
  const f = L.fonts;
  const m = L.marginIn;
  const w = (L.page.widthIn - 2 * m) * PT_PER_IN;
  const style = { sizePt: f.sizePt, leading: 1.3 };
  const pages: Page[] = [];
  let page = newPage(L);
  pages.push(page);
  setText(page.scene, title, pt(m, m, L.page.widthIn - 2 * m, 0.5), { sizePt: f.titleSizePt, weight: "bold" });
  let y = (m + 0.7) * PT_PER_IN;
  const bottom = (L.page.heightIn - m) * PT_PER_IN;
  for (const para of paragraphs) {
    const h = textHeight(para, w, style);
    if (y + h > bottom) {
      page = newPage(L);
      pages.push(page);
      y = m * PT_PER_IN;
    }
    setText(page.scene, para, { x: m * PT_PER_IN, y, w, h: h + f.sizePt }, style);
    y += h + f.sizePt * 0.7;
  }
  return pages;
}

function mapPage(input: Omit<AtlasInput, "pitches">, p: AtlasPitch, index: number): Page {
  const L = input.layout;
  const f = L.fonts;
  const m = L.marginIn;
  const w = L.page.widthIn - 2 * m;
  const r = p.report;
  const pp = r.input.pitch;
  const page = newPage(L);
  const s = page.scene;
  setText(s, `${pitchLabel(r)}: where the spin axis could go`, pt(m, m, w, 0.4), { sizePt: f.titleSizePt - 4, weight: "bold" });
  setText(s, pitchSummary(r), pt(m, m + 0.42, w, 0.4), { sizePt: f.sizePt - 1, fill: "#333333" });
  const toward = pp.want === "any" ? "seam movement (its size) at every place the spin axis could go" : `seam movement toward the ${WANT_WORDS[pp.want].replace("-side", " side").replace("upward", "top").replace("downward", "ground")} at every place the spin axis could go`;
  const map = sphereMapScene(p.mapValuesIn, p.grid, {
    widthPx: ATLAS_MAP_CELLS.widthPx,
    range: scaleRange(p.mapValuesIn, mapMarksIn(r)),
    cellsPdf: p.mapCellsPdf,
    title: toward,
    valueLabel: pp.want === "any" ? "seam movement at the plate, inches" : `seam movement ${pp.want === "arm" ? "toward the arm side" : pp.want === "glove" ? "toward the glove side" : `${pp.want}ward`}, inches at the plate (negative: the other way)`,
    seamShape: input.seamShape,
    candidates: r.reach.outOfReach ? [] : r.candidates.map((c) => ({ direction: c.axis, label: String(c.rank) })),
    referenceHolds: r.references.map((c) => ({ direction: c.axis, label: c.reference === "four-seam" ? "4S" : "2S" })),
    valueDigits: 1,
    idPrefix: `map${index}`,
  });
  const b = L.blocks.map;
  nestScene(s, map, b.xIn * PT_PER_IN, b.yIn * PT_PER_IN, b.wIn * PT_PER_IN, b.hIn * PT_PER_IN);
  const notes = L.blocks.mapNotes;
  const nb = pt(notes.xIn, notes.yIn, notes.wIn, notes.hIn);
  const reach = setText(s, reachWords(r), { ...nb, h: nb.h / 3 }, { sizePt: f.sizePt - 0.5, weight: r.reach.outOfReach ? "bold" : "normal", fill: r.reach.outOfReach ? "#7a2f1d" : "#1b1b1b" });
  let y = nb.y + reach.heightPt + f.sizePt * 0.6;
  const rows = [...(r.reach.outOfReach ? [] : r.candidates.map((o) => compareRow(`grip ${o.rank}`, o))), ...r.references.map((o) => compareRow(`${o.reference} hold`, o))];
  y += setText(s, COMPARE_CAPTION, { ...nb, y, h: f.sizePt * 3 }, { sizePt: f.sizePt - 1.5, fill: "#444444" }).heightPt + f.sizePt * 0.3;
  y += setTable(s, COMPARE_COLUMNS(pp.want), rows, { ...nb, y, h: nb.y + nb.h - y }, f.sizePt - 1) + f.sizePt * 0.4;
  setText(s, `${r.grid.count.toLocaleString("en-US")} spin-axis positions ${r.input.settings.gridSpacingDeg}\u00b0 apart; ${r.maximaFound} distinct local maxima on the map; ranked by ${RANK_WORDS[r.input.settings.rank]}.`, { ...nb, y, h: nb.y + nb.h - y }, { sizePt: f.sizePt - 1.5, fill: "#555555" });
  return page;
}

/** One pitch's pages: its map page, then its cards (the grips, or the out-of-reach card, then the classic holds). */
export function pitchPages(input: Omit<AtlasInput, "pitches">, p: AtlasPitch, i: number): Page[] {
  const L = input.layout;
  const perPage = L.grid!.columns * L.grid!.rows;
  const pages = [mapPage(input, p, i)];
  const r = p.report;
  const contents: CardContent[] = [
    ...(r.reach.outOfReach ? [outOfReachContent(r)] : r.candidates.map((o, k) => cardContent(r, o, input.seamShape, `p${i}c${k}`))),
    ...r.references.map((o, k) => cardContent(r, o, input.seamShape, `p${i}h${k}`)),
  ];
  for (let k = 0; k < contents.length; k += perPage) {
    const page = newPage(L);
    placeCards(page.scene, L, contents.slice(k, k + perPage).map((c) => cardScene(L.card!, c)));
    pages.push(page);
  }
  return pages;
}

/** The pages before the pitches: the cover (which lists every pitch) and how to read the atlas. */
export function frontPages(input: AtlasInput): Page[] {
  return [...coverPages(input), ...textPages(input.layout, "How to read this atlas", HOW_TO_READ)];
}

export function cautionPages(L: Layout): Page[] {
  return textPages(L, "Cautions", CAUTION_LONG);
}

/** Pages of the atlas for a staff, without painting them (in reading order). */
export function atlasPages(input: AtlasInput, ready?: readonly (readonly Page[])[]): Page[] {
  return [...frontPages(input), ...input.pitches.flatMap((p, i) => ready?.[i] ?? pitchPages(input, p, i)), ...cautionPages(input.layout)];
}

/** An atlas being painted (startAtlas). */
export interface AtlasInProgress {
  /** Pitch `i` is screened: its pages are drawn now, and painted once every pitch before it is. */
  pitch(i: number, p: AtlasPitch): void;
  /** Every pitch is in: the cover (which lists them all) is painted and the pages put in reading order. */
  finish(pitches: readonly AtlasPitch[]): Promise<{ bytes: Buffer; pages: number }>;
}

/**
 * The atlas painted while its pitches are still being screened: the pages that need
 * no pitch (how to read it, the cautions) at once, each pitch's pages as soon as it
 * and every pitch before it are in, the cover last; the page tree then puts them in
 * reading order (cover, how to read, the pitches, cautions). The painting order is
 * fixed (it does not depend on which screen returns first), so the bytes are the same
 * however the pitches were screened.
 */
export function startAtlas(input: Omit<AtlasInput, "pitches">, count: number): AtlasInProgress {
  const L = input.layout;
  const pdf = openPdf(`Grip atlas${input.team ? ` - ${input.team}` : ""}`, L.page);
  const howTo = textPages(L, "How to read this atlas", HOW_TO_READ).map((p) => pdf.add(p));
  const cautions = cautionPages(L).map((p) => pdf.add(p));
  const drawn: (Page[] | undefined)[] = new Array(count);
  const painted: number[][] = [];
  let next = 0;
  return {
    pitch(i, p) {
      if (!(Number.isInteger(i) && i >= 0 && i < count) || i < next || drawn[i]) throw new RangeError(`pitch ${i} is not awaited`);
      drawn[i] = pitchPages(input, p, i);
      while (next < count && drawn[next]) {
        painted.push(drawn[next]!.map((page) => pdf.add(page)));
        drawn[next] = undefined;
        next++;
      }
    },
    async finish(pitches) {
      if (next !== count || pitches.length !== count) throw new RangeError(`the atlas has ${next} of ${count} pitches painted`);
      const cover = coverPages({ ...input, pitches }).map((p) => pdf.add(p));
      const order = [...cover, ...howTo, ...painted.flat(), ...cautions];
      input.onPage?.(order.length, order.length);
      return { bytes: await pdf.end(order), pages: order.length };
    },
  };
}

/** The atlas as PDF bytes (startAtlas with every pitch in hand). */
export async function renderAtlasPdf(input: AtlasInput): Promise<{ bytes: Buffer; pages: number }> {
  const atlas = startAtlas(input, input.pitches.length);
  input.pitches.forEach((p, i) => atlas.pitch(i, p));
  return atlas.finish(input.pitches);
}
