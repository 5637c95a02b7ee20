/**
 * The bullpen report as a PDF (pdfkit; SVG charts and balls placed as vectors with
 * svg-to-pdfkit). US Letter, landscape, 0.5 in margins; the standard PDF fonts.
 *
 * Pages:
 *   1. cover: the session (pitchers, pitch types, throws), the basis and window, the
 *      model, how to read the report, and the caution;
 *   per pitcher: the movement chart and the direction chart side by side;
 *   per pitcher: the table of pitch types, each with its residual (mean and spread),
 *      whether it is beyond the seams' reach, and its best orientations, each drawn
 *      on a small ball seen from the spin axis's positive end (the dot at the centre),
 *      with the fit error (more pages when the types do not fit on one).
 * Every page carries the caution line at its foot. Fixed metadata: the same data gives
 * the same bytes.
 */
import PDFDocument from "pdfkit";
import SVGtoPDF from "svg-to-pdfkit";
import type { Vec3 } from "../../../geometry/vec.js";
import { renderBallSvg } from "../ballDrawing.js";
import { fixed, signed } from "../numbers.js";
import { viewFromDirections } from "../projection.js";
import { directionChartSvg, movementChartSvg } from "./charts.js";
import { basisWords, PITCH_MARKS, REPORT_CAUTION, type ReportModel, type ReportPitcher } from "./model.js";

const PT = 72;
const PAGE = { w: 11, h: 8.5 };
const M = 0.5;
const FONT = "Helvetica";
const BOLD = "Helvetica-Bold";
const INK = "#1b1b1b";
const MUTED = "#555555";
const WARN = "#7a2f1d";
const TABLE_ROW_IN = 1.55;

type Doc = PDFKit.PDFDocument;

function svgAt(doc: Doc, svg: string, xIn: number, yIn: number, wIn: number, hIn: number): void {
  SVGtoPDF(doc, svg, xIn * PT, yIn * PT, { width: wIn * PT, height: hIn * PT, preserveAspectRatio: "xMidYMid meet", assumePt: false });
}

function text(doc: Doc, s: string, xIn: number, yIn: number, wIn: number, o: { size: number; bold?: boolean; color?: string; align?: "left" | "center" | "right"; hIn?: number }): void {
  doc
    .font(o.bold ? BOLD : FONT)
    .fontSize(o.size)
    .fillColor(o.color ?? INK)
    .text(s, xIn * PT, yIn * PT, { width: wIn * PT, align: o.align ?? "left", lineGap: 1.5, ...(o.hIn !== undefined ? { height: o.hIn * PT, ellipsis: true } : {}) });
}

function caution(doc: Doc): void {
  text(doc, REPORT_CAUTION, M, PAGE.h - M - 0.38, PAGE.w - 2 * M, { size: 8.5, color: WARN });
}

function heading(doc: Doc, title: string, sub: string): void {
  text(doc, title, M, M, PAGE.w - 2 * M, { size: 17, bold: true });
  text(doc, sub, M, M + 0.32, PAGE.w - 2 * M, { size: 10, color: MUTED });
}

function newPage(doc: Doc): void {
  doc.addPage({ size: [PAGE.w * PT, PAGE.h * PT], margin: 0 });
}

function cover(doc: Doc, r: ReportModel): void {
  heading(doc, "Bullpen report: movement against spin, and the seams", basisWords(r));
  const rows = r.pitchers.reduce((n, p) => n + p.types.reduce((k, t) => k + t.rows, 0), 0);
  let y = M + 0.8;
  const line = (s: string, o: { size?: number; bold?: boolean; color?: string } = {}) => {
    text(doc, s, M, y, PAGE.w - 2 * M, { size: o.size ?? 11, bold: o.bold, color: o.color });
    y += ((o.size ?? 11) * 1.45) / PT + 0.02;
  };
  line(`${r.pitchers.length} pitcher(s), ${rows} throw(s); seam-force model ${r.model.name} (${r.model.hash}); direction gap flagged beyond ${fixed(r.gapFlagMinutes, 0)} minutes of clock.`);
  y += 0.1;
  for (const p of r.pitchers) {
    line(`${p.name} (${p.hand === "right" ? "right-handed" : "left-handed"}): ${p.types.map((t) => `${t.pitch} ${t.rows}`).join(", ")}`);
  }
  y += 0.2;
  line("How to read it", { size: 13, bold: true });
  const how = [
    `Movement: ${basisWords(r)}. On the trade basis the spin predicts drag's own deflection plus the Magnus part; on the release basis the Magnus part alone.`,
    "Movement chart: each throw's observed movement (filled mark) and what its spin predicts (open mark), joined by an arrow from predicted to observed: the arrow is the residual, what the spin does not explain. Arm side is to the right, whichever the hand.",
    "Direction chart: the spin-based direction (Magnus alone) against the observed one, as clock readings in the view the tilt was given in. Points off the shaded band differ by more than the flag threshold; the trade reads a gap of more than about 15 to 30 minutes as a sign of seam effects (common practice).",
    "Seam orientations: one orientation fitted to all throws of a pitch type at once (each throw with its own speed, spin, tilt and gyro), with the root-mean-square miss in inches. Each ball is seen from the spin axis's positive end: the axis pierces the ball at the centre dot. Orientations that the ball's rotations carry into each other are one; a mirror image is a different orientation (it reverses the Magnus part of the seam force).",
    "Beyond reach: the residual is larger than any seam orientation of this model can push that way; the largest reachable amount is given. Look elsewhere too (tracking, release, the model's scale).",
  ];
  for (const h of how) {
    text(doc, h, M, y, PAGE.w - 2 * M, { size: 10.5 });
    y += doc.heightOfString(h, { width: (PAGE.w - 2 * M) * PT }) / PT + 0.12;
  }
  caution(doc);
}

function chartsPage(doc: Doc, r: ReportModel, p: ReportPitcher, idBase: string): void {
  newPage(doc);
  heading(doc, `${p.name}: movement and direction`, `${p.hand}-handed; ${basisWords(r)}; clock in the ${p.view}'s view`);
  const w = (PAGE.w - 2 * M - 0.3) / 2;
  const h = PAGE.h - 2 * M - 1.4;
  svgAt(doc, movementChartSvg(p, { basis: r.basis, windowFt: r.windowFt, idPrefix: `${idBase}-mv` }), M, M + 0.75, w, h);
  svgAt(doc, directionChartSvg(p, { gapFlagMinutes: r.gapFlagMinutes, idPrefix: `${idBase}-dir` }), M + w + 0.3, M + 0.75, w, h);
  caution(doc);
}

function ballSvg(axis: Vec3, seamShape: number, idPrefix: string): string {
  const up: Vec3 = Math.abs(axis[2]) < 0.95 ? [0, 0, 1] : [1, 0, 0];
  return renderBallSvg({ seamShape, view: viewFromDirections(axis, up), overlays: { spinAxis: axis } }, { sizePx: 160, legend: false, seamPoints: 512, idPrefix });
}

function tablePages(doc: Doc, r: ReportModel, p: ReportPitcher, idBase: string): void {
  const perPage = Math.floor((PAGE.h - 2 * M - 1.45) / TABLE_ROW_IN);
  const cols = { type: M, rows: M + 1.6, residual: M + 2.2, balls: M + 4.3 };
  const ballW = 1.9;
  for (let start = 0; start < p.types.length; start += perPage) {
    newPage(doc);
    heading(doc, `${p.name}: seam orientations per pitch type${start > 0 ? " (continued)" : ""}`, `one orientation fitted to all throws of each pitch type; ${basisWords(r)}`);
    let y = M + 0.75;
    const head = (s: string, x: number, w: number) => text(doc, s, x, y, w, { size: 9.5, bold: true, color: MUTED });
    head("pitch type", cols.type, 1.55);
    head("throws", cols.rows, 0.55);
    head("residual (mean, spread)", cols.residual, 2.05);
    head("best orientations (ball seen from the spin axis; miss)", cols.balls, 6);
    y += 0.25;
    doc.moveTo(M * PT, y * PT).lineTo((PAGE.w - M) * PT, y * PT).lineWidth(0.6).strokeColor("#999999").stroke();
    for (let i = start; i < Math.min(p.types.length, start + perPage); i++) {
      const t = p.types[i];
      const top = y + 0.08;
      const mk = PITCH_MARKS[i % PITCH_MARKS.length];
      text(doc, t.pitch, cols.type, top, 1.55, { size: 12, bold: true, color: mk.color, hIn: 1.3 });
      text(doc, String(t.rows), cols.rows, top, 0.55, { size: 11 });
      const res = t.residual;
      text(
        doc,
        `${signed(res.armSideIn, 1)} in arm side (± ${fixed(res.sdArmSideIn, 1)})\n${signed(res.verticalIn, 1)} in up (± ${fixed(res.sdVerticalIn, 1)})` +
          (t.reach.beyondReach ? `\nBEYOND REACH: seams reach at most ${fixed(t.reach.alongResidualIn, 1)} in that way` : `\nseams can reach ${fixed(t.reach.alongResidualIn, 1)} in that way`),
        cols.residual,
        top,
        2.05,
        { size: 9.5, color: t.reach.beyondReach ? WARN : INK },
      );
      t.orientations.slice(0, 3).forEach((o, k) => {
        const x = cols.balls + k * ballW;
        svgAt(doc, ballSvg(o.axis, r.seamShape, `${idBase}-b${i}-${k}`), x, top - 0.05, 0.95, 0.95);
        text(doc, `#${k + 1}\n${o.latLon}\nnear ${o.landmark}\nmiss ${fixed(o.fitErrorIn, 1)} in`, x + 0.98, top + 0.05, ballW - 1.0, { size: 8.5 });
      });
      if (t.orientations.length === 0) text(doc, "no orientation fitted", cols.balls, top, 3, { size: 9.5, color: MUTED });
      y += TABLE_ROW_IN;
      doc.moveTo(M * PT, y * PT).lineTo((PAGE.w - M) * PT, y * PT).lineWidth(0.4).strokeColor("#cccccc").stroke();
    }
    caution(doc);
  }
}

/** The report's PDF bytes. */
export function renderBullpenPdf(r: ReportModel): Promise<Buffer> {
  const doc = new PDFDocument({
    size: [PAGE.w * PT, PAGE.h * PT],
    margin: 0,
    autoFirstPage: true,
    info: { Title: "Bullpen report", Author: "seam-atlas", Creator: "seam-atlas", Producer: "seam-atlas (pdfkit)", CreationDate: new Date(Date.UTC(2026, 0, 1)) },
  });
  cover(doc, r);
  r.pitchers.forEach((p, i) => {
    chartsPage(doc, r, p, `p${i}`);
    tablePages(doc, r, p, `p${i}`);
  });
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    doc.end();
  });
}
