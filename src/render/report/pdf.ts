/**
 * The bullpen report as page drawings (render/scene.ts) and as a PDF made of them
 * (render/paper/document.ts pdfOfPages): the same path as the cards, sheets, atlas
 * and handout, so every word is set in Noto Sans (render/fonts.ts) and lines are
 * broken with its metrics, and a label's halo, where one is drawn, lies under its
 * letters. US Letter, landscape, 0.5 in margins; drawing units are points from the
 * page's top-left.
 *
 * Pages:
 *   1. cover: the session (pitchers, pitch types, throws), the basis and window, the
 *      model, how to read the report, and the caution (more pages when the pitchers'
 *      lines do not fit on one);
 *   per pitcher: the movement chart and the direction chart side by side (charts.ts);
 *   per pitcher: the table of pitch types, each with its mark, its residual (mean and
 *      spread), whether it is beyond the seams' reach, and its best orientations, each
 *      drawn on a small ball seen from the spin axis's positive end (the dot at the
 *      centre), with the fit error (more pages when the types do not fit on one).
 * Every page carries the caution line at its foot. Fixed metadata: the same data gives
 * the same bytes.
 */
import type { Vec3 } from "../../../geometry/vec.js";
import { ballScene } from "../ballDrawing.js";
import { fixed, signed } from "../numbers.js";
import { pdfOfPages, type Page } from "../paper/document.js";
import { pageFontFamily, PT_PER_IN, setText, textHeight, type TextStyle } from "../paper/textLayout.js";
import { viewFromDirections } from "../projection.js";
import { createScene, nestScene, type SceneNode } from "../scene.js";
import { CHART_HEIGHT, CHART_WIDTH, directionChartScene, movementChartScene, pitchTypeMark } from "./charts.js";
import { basisWords, REPORT_CAUTION, type ReportModel, type ReportPitcher, type ReportPitchType } from "./model.js";

const PAGE = { w: 11, h: 8.5 };
const M = 0.5;
const INK = "#1b1b1b";
const MUTED = "#555555";
const WARN = "#7a2f1d";
const RULE = "#999999";
const HAIRLINE = "#cccccc";
const TABLE_ROW_IN = 1.55;
const CAUTION_PT = 8.5;
/** Gap between the content and the caution above the page's foot, inches. */
const CAUTION_GAP_IN = 0.15;

const P = (inches: number) => inches * PT_PER_IN;

/** The report's title, as on the cover and in the PDF's metadata. */
const REPORT_TITLE = "Bullpen report: movement against spin, and the seams";

function blankPage(): Page {
  const scene = createScene(P(PAGE.w), P(PAGE.h)).attr({ "font-family": pageFontFamily() });
  scene.rect().attr({ x: 0, y: 0, width: P(PAGE.w), height: P(PAGE.h), fill: "#ffffff", stroke: "none" });
  return { widthIn: PAGE.w, heightIn: PAGE.h, scene };
}

/** `text` set from (xIn, yIn) in a box `wIn` wide, as many lines as it needs; returns its height, inches. */
function para(s: SceneNode, text: string, xIn: number, yIn: number, wIn: number, style: TextStyle): number {
  const h = textHeight(text, P(wIn), style);
  setText(s, text, { x: P(xIn), y: P(yIn), w: P(wIn), h: h + style.sizePt }, style);
  return h / PT_PER_IN;
}

/** The caution at the page's foot; returns where it starts, inches from the top. */
function caution(s: SceneNode): number {
  const style: TextStyle = { sizePt: CAUTION_PT, fill: WARN, leading: 1.25 };
  const h = textHeight(REPORT_CAUTION, P(PAGE.w - 2 * M), style) / PT_PER_IN;
  const top = PAGE.h - M - h;
  para(s, REPORT_CAUTION, M, top, PAGE.w - 2 * M, style);
  return top;
}

/** The page's title and its line under it (each at most two lines); returns where the content starts, inches. */
function heading(s: SceneNode, title: string, sub: string): number {
  const w = PAGE.w - 2 * M;
  const titleStyle: TextStyle = { sizePt: 17, weight: "bold", leading: 1.2 };
  const subStyle: TextStyle = { sizePt: 10, fill: MUTED, leading: 1.25 };
  const th = Math.min(textHeight(title, P(w), titleStyle), 2 * 17 * 1.2) / PT_PER_IN;
  setText(s, title, { x: P(M), y: P(M), w: P(w), h: P(th) + 17 * 0.3 }, titleStyle);
  const y = M + th + 0.08;
  const sh = Math.min(textHeight(sub, P(w), subStyle), 2 * 10 * 1.25) / PT_PER_IN;
  setText(s, sub, { x: P(M), y: P(y), w: P(w), h: P(sh) + 10 * 0.3 }, subStyle);
  return y + sh + 0.15;
}

const handWords = (hand: string) => (hand === "right" ? "right-handed" : "left-handed");

/** The cover, continued on further pages when the pitchers' lines run past the first. */
function coverPages(r: ReportModel): Page[] {
  const pages: Page[] = [];
  const w = PAGE.w - 2 * M;
  let page!: Page;
  let y = 0;
  let bottom = 0;
  const open = () => {
    page = blankPage();
    pages.push(page);
    y = heading(page.scene, pages.length === 1 ? REPORT_TITLE : `${REPORT_TITLE} (continued)`, basisWords(r));
    bottom = caution(page.scene) - CAUTION_GAP_IN;
  };
  /** A paragraph, on a new page when it does not fit on this one. */
  const block = (text: string, style: TextStyle, after: number) => {
    const h = textHeight(text, P(w), style) / PT_PER_IN;
    if (y + h > bottom && y > M + 1) open();
    para(page.scene, text, M, y, w, style);
    y += h + after;
  };
  open();
  const rows = r.pitchers.reduce((n, p) => n + p.types.reduce((k, t) => k + t.rows, 0), 0);
  const body: TextStyle = { sizePt: 11, leading: 1.35 };
  block(`${r.pitchers.length} pitcher(s), ${rows} throw(s); seam-force model ${r.model.name} (${r.model.hash}); direction gap flagged beyond ${fixed(r.gapFlagMinutes, 0)} minutes of clock.`, body, 0.12);
  for (const p of r.pitchers) block(`${p.name} (${handWords(p.hand)}): ${p.types.map((t) => `${t.pitch} ${t.rows}`).join(", ")}`, body, 0.02);
  y += 0.2;
  block("How to read it", { sizePt: 13, weight: "bold" }, 0.06);
  const how = [
    `Movement: ${basisWords(r)}. On the trade basis the spin predicts drag's own deflection plus the Magnus part; on the release basis the Magnus part alone.`,
    "Movement chart: each throw's observed movement (filled mark) and what its spin predicts (open mark), joined by an arrow from predicted to observed: the arrow is the residual, what the spin does not explain. Arm side is to the right, whichever the hand.",
    "Direction chart: the spin-based direction (Magnus alone) against the observed one, as clock readings in the view the tilt was given in. Points off the shaded band differ by more than the flag threshold; the trade reads a gap of more than about 15 to 30 minutes as a sign of seam effects (common practice).",
    "Seam orientations: one orientation fitted to all throws of a pitch type at once (each throw with its own speed, spin, tilt and gyro), with the root-mean-square miss in inches. Each ball is seen from the spin axis's positive end: the axis pierces the ball at the centre dot. Orientations that the ball's rotations carry into each other are one; a mirror image is a different orientation (it reverses the Magnus part of the seam force).",
    "Beyond reach: the residual is larger than any seam orientation of this model can push that way; the largest reachable amount is given. Look elsewhere too (tracking, release, the model's scale).",
  ];
  for (const h of how) block(h, { sizePt: 10.5, leading: 1.3 }, 0.1);
  return pages;
}

function chartsPage(r: ReportModel, p: ReportPitcher): Page {
  const page = blankPage();
  const top = heading(page.scene, `${p.name}: movement and direction`, `${handWords(p.hand)}; ${basisWords(r)}; clock in the ${p.view}'s view`);
  const bottom = caution(page.scene) - CAUTION_GAP_IN;
  const gap = 0.3;
  const w = (PAGE.w - 2 * M - gap) / 2;
  // the charts at the top of their room, their own shape kept
  const h = Math.min(bottom - top, (w * CHART_HEIGHT) / CHART_WIDTH);
  nestScene(page.scene, movementChartScene(p, { basis: r.basis, windowFt: r.windowFt }), P(M), P(top), P(w), P(h));
  nestScene(page.scene, directionChartScene(p, { gapFlagMinutes: r.gapFlagMinutes }), P(M + w + gap), P(top), P(w), P(h));
  return page;
}

/** A small ball seen from the spin axis's positive end, the axis's dot at the centre. */
function ballAlongAxis(axis: Vec3, seamShape: number): SceneNode {
  const up: Vec3 = Math.abs(axis[2]) < 0.95 ? [0, 0, 1] : [1, 0, 0];
  return ballScene({ seamShape, view: viewFromDirections(axis, up), overlays: { spinAxis: axis } }, { sizePx: 160, legend: false, seamPoints: 512 });
}

/** The residual's words in the table: the mean and spread each way, and how far the seams can reach that way. */
function residualWords(t: Pick<ReportPitchType, "residual" | "reach">): string {
  const res = t.residual;
  return (
    `${signed(res.armSideIn, 1)} in arm side (± ${fixed(res.sdArmSideIn, 1)})\n${signed(res.verticalIn, 1)} in up (± ${fixed(res.sdVerticalIn, 1)})\n` +
    (t.reach.beyondReach ? `BEYOND REACH: seams reach at most ${fixed(t.reach.alongResidualIn, 1)} in that way` : `seams can reach ${fixed(t.reach.alongResidualIn, 1)} in that way`)
  );
}

function tablePages(r: ReportModel, p: ReportPitcher): Page[] {
  const pages: Page[] = [];
  const cols = { mark: M, type: M + 0.22, rows: M + 1.5, residual: M + 2.05, balls: M + 4.3 };
  const ballW = 1.9;
  const ballIn = 0.95;
  let start = 0;
  while (start < p.types.length || pages.length === 0) {
    const page = blankPage();
    const s = page.scene;
    pages.push(page);
    let y = heading(s, `${p.name}: seam orientations per pitch type${start > 0 ? " (continued)" : ""}`, `one orientation fitted to all throws of each pitch type; ${basisWords(r)}`);
    const bottom = caution(s) - CAUTION_GAP_IN;
    const head: TextStyle = { sizePt: 9.5, weight: "bold", fill: MUTED };
    para(s, "pitch type", cols.mark, y, cols.rows - cols.mark - 0.05, head);
    para(s, "throws", cols.rows, y, cols.residual - cols.rows - 0.05, head);
    para(s, "residual (mean, spread)", cols.residual, y, cols.balls - cols.residual - 0.1, head);
    para(s, "best orientations (ball seen from the spin axis; miss)", cols.balls, y, PAGE.w - M - cols.balls, head);
    y += 0.22;
    s.path(`M${P(M)} ${P(y)}L${P(PAGE.w - M)} ${P(y)}`).attr({ stroke: RULE, "stroke-width": 0.6, fill: "none" });
    // at least one row per page, however small the page's room
    const perPage = Math.max(1, Math.floor((bottom - y) / TABLE_ROW_IN));
    const end = Math.min(p.types.length, start + perPage);
    for (let i = start; i < end; i++) {
      const t = p.types[i];
      const top = y + 0.08;
      pitchTypeMark(s, i, P(cols.mark + 0.08), P(top + 0.1), 5);
      setText(s, t.pitch, { x: P(cols.type), y: P(top), w: P(cols.rows - cols.type - 0.08), h: P(1.3) }, { sizePt: 12, weight: "bold", leading: 1.2 });
      para(s, String(t.rows), cols.rows, top + 0.01, cols.residual - cols.rows - 0.05, { sizePt: 11 });
      setText(s, residualWords(t), { x: P(cols.residual), y: P(top + 0.02), w: P(cols.balls - cols.residual - 0.1), h: P(TABLE_ROW_IN - 0.15) }, { sizePt: 9.5, fill: t.reach.beyondReach ? WARN : INK, leading: 1.3 });
      t.orientations.slice(0, 3).forEach((o, k) => {
        const x = cols.balls + k * ballW;
        nestScene(s, ballAlongAxis(o.axis, r.seamShape), P(x), P(top - 0.05), P(ballIn), P(ballIn));
        setText(s, `#${k + 1}\n${o.latLon}\nnear ${o.landmark}\nmiss ${fixed(o.fitErrorIn, 1)} in`, { x: P(x + ballIn + 0.03), y: P(top + 0.05), w: P(ballW - ballIn - 0.08), h: P(TABLE_ROW_IN - 0.2) }, { sizePt: 8.5, leading: 1.3 });
      });
      if (t.orientations.length === 0) para(s, "no orientation fitted", cols.balls, top + 0.02, 3, { sizePt: 9.5, fill: MUTED });
      y += TABLE_ROW_IN;
      s.path(`M${P(M)} ${P(y)}L${P(PAGE.w - M)} ${P(y)}`).attr({ stroke: HAIRLINE, "stroke-width": 0.4, fill: "none" });
    }
    start = end;
    if (p.types.length === 0) break;
  }
  return pages;
}

/** The report's pages in order: the cover, then per pitcher the charts page and the table pages. */
export function bullpenPages(r: ReportModel): Page[] {
  const pages = coverPages(r);
  for (const p of r.pitchers) pages.push(chartsPage(r, p), ...tablePages(r, p));
  return pages;
}

/** The report's PDF bytes. */
export function renderBullpenPdf(r: ReportModel): Promise<Buffer> {
  return pdfOfPages(bullpenPages(r), "Bullpen report");
}
