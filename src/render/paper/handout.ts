/**
 * The clinic handout for players: two pages of plain words (ours) on what spin and
 * seams do, with two figures the tool draws from the real model: the in-band seam
 * share on each side of the spin axis through one turn, for the symmetric four-seam
 * hold and for an asymmetric orientation.
 */
import { findLandmarks } from "../../../geometry/landmarks.js";
import { latLonToVector } from "../../../geometry/ballCoords.js";
import { DEG } from "../../../geometry/units.js";
import type { Band } from "../../sampling/band.js";
import { measureOrientation } from "../../sampling/measure.js";
import { fixed } from "../numbers.js";
import type { Layout } from "./layouts.js";
import { addPage, drawSvg, finish, newDocument, PT_PER_IN, textInBox } from "./pdfDoc.js";
import { renderTimelineSvg } from "./timelineChart.js";
import { CAUTION_LONG } from "./words.js";

export interface HandoutInput {
  readonly layout: Layout;
  readonly band: Band;
  readonly bandCenterDeg: number;
  readonly bandWidthDeg: number;
  readonly seamShape: number;
  readonly seamPoints: number;
}

/** The asymmetric example: an axis 30 deg off the curve's equator, with 10 deg of gyro (a screened sinker's neighbourhood). */
export const HANDOUT_ASYMMETRIC_AXIS = latLonToVector(30, 100);
export const HANDOUT_ASYMMETRIC_GYRO_DEG = 10;

export async function renderHandoutPdf(input: HandoutInput): Promise<{ bytes: Buffer; pages: number }> {
  const L = input.layout;
  const f = L.fonts;
  const m = L.marginIn;
  const w = L.page.widthIn - 2 * m;
  const opts = { band: input.band, seamShape: input.seamShape, seamPoints: input.seamPoints };
  const four = measureOrientation({ axis: findLandmarks(input.seamShape).find((l) => l.name === "waist-A")!.direction, gyroRad: 0 }, opts);
  const odd = measureOrientation({ axis: HANDOUT_ASYMMETRIC_AXIS, gyroRad: HANDOUT_ASYMMETRIC_GYRO_DEG * DEG }, opts);
  const lo = input.bandCenterDeg - input.bandWidthDeg / 2;
  const hi = input.bandCenterDeg + input.bandWidthDeg / 2;
  const doc = newDocument(L, "Why the same spin can move differently");
  textInBox(doc, "Why the same spin can move differently", { xIn: m, yIn: m, wIn: w, hIn: 0.5 }, { font: f.bold, sizePt: f.titleSizePt });
  const body = [
    "Spin bends the path (Magnus). A spinning ball drags the air around with it. Backspin makes the air leave the ball a little downward, so the ball is pushed up: a fastball seems to rise against what gravity alone would do. Sidespin pushes it sideways. Only the part of the spin that is across the flight does this; the rest (gyro spin, like a bullet's) adds no push.",
    `Seams move the wake (the seam-shifted wake). Air flowing over the ball stays attached to its surface for a while, then breaks away at a line about ${fixed(lo, 0)} to ${fixed(hi, 0)} degrees back from the very front of the ball. A raised seam sitting near that line makes the air break away early on that side. If that happens on one side more than the other, the wake behind the ball shifts, and the ball is pushed toward the side the seam left alone.`,
    "Why the classic holds average out. As the ball turns, its seams sweep past that break-away line. On a four-seam or two-seam hold the seam spends the same time near the line on both sides of the spin axis, so the pushes cancel over each turn. Some other orientations keep more seam near the line on one side for most of every turn: those give a steady extra push, usually across the direction that spin alone moves the ball.",
    "The two figures below come from the tool's own model. Each line is the share of the seam sitting near the break-away line on one side of the spin axis, through one full turn. On the left (four-seam hold) the two sides match on average; on the right (an orientation tipped 30 degrees off the classic one, with a little gyro) one side keeps more seam near the line, turn after turn.",
  ];
  doc.font(f.body).fontSize(f.sizePt).fillColor("#1b1b1b").text(body.join("\n\n"), m * PT_PER_IN, (m + 0.65) * PT_PER_IN, { width: w * PT_PER_IN, lineGap: 2, paragraphGap: 4 });
  const chart = (title: string, t: typeof four, id: string) =>
    renderTimelineSvg(
      [
        { label: "axis side +", values: t.timeline!.axisPlus, color: "#1f4f5a" },
        { label: "axis side -", values: t.timeline!.axisMinus, color: "#b5532b" },
      ],
      { title, idPrefix: id, yMax: 0.3 },
    );
  drawSvg(doc, chart("four-seam hold: the sides balance", four, "fs"), L.blocks.figureSymmetric);
  drawSvg(doc, chart("tipped hold: one side keeps more seam", odd, "as"), L.blocks.figureAsymmetric);
  const cap = `Turn averages: four-seam ${fixed(100 * four.axisPlus, 1)} % / ${fixed(100 * four.axisMinus, 1)} %; tipped hold ${fixed(100 * odd.axisPlus, 1)} % / ${fixed(100 * odd.axisMinus, 1)} % of the seam in the band on the + / - side.`;
  textInBox(doc, cap, { xIn: m, yIn: L.blocks.figureSymmetric.yIn + L.blocks.figureSymmetric.hIn + 0.1, wIn: w, hIn: 0.4 }, { font: f.body, sizePt: f.sizePt - 1.5, color: "#333333" });
  addPage(doc, L);
  textInBox(doc, "Trying a new grip safely", { xIn: m, yIn: m, wIn: w, hIn: 0.5 }, { font: f.bold, sizePt: f.titleSizePt - 2 });
  const safe = [
    "Start easy. Learn the grip playing catch at short distance and low effort. Watch how the ball moves before you add speed.",
    "Build up slowly. Add distance, effort and number of throws over weeks, not in one session. Keep your usual rest days.",
    "Listen to your arm. Stop at pain, tingling, numbness or a loss of control, and tell your coach.",
    "Get help. Work with a qualified pitching coach, and see a licensed athletic trainer, physiotherapist or physician about any arm trouble.",
    "Play by the rules. Use a legal ball and legal grips for your league. Never scratch, cut, mark or otherwise change the ball.",
    "Remember what the model is. These pictures show a simple model of the air around a ball, not a measurement of your ball or your arm. Your league's rules and your coaches' and medical staff's advice come first.",
  ];
  doc.font(f.body).fontSize(f.sizePt).fillColor("#1b1b1b").text(safe.map((s) => `-  ${s}`).join("\n\n"), m * PT_PER_IN, (m + 0.6) * PT_PER_IN, { width: w * PT_PER_IN, lineGap: 2 });
  doc.moveDown(1.5);
  doc.font(f.bold).fontSize(f.sizePt).fillColor("#7a2f1d").text("Cautions", { width: w * PT_PER_IN });
  doc.font(f.body).fontSize(f.sizePt - 1).fillColor("#7a2f1d").text(CAUTION_LONG.join(" "), { width: w * PT_PER_IN, lineGap: 1.5 });
  return { bytes: await finish(doc), pages: 2 };
}
