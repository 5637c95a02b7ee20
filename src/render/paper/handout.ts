/**
 * The clinic handout for players: two pages of plain words (ours) on what spin and
 * seams do, in the same words as the cards (story.ts, words.ts), with two figures
 * the seam-force model computes: the instantaneous seam push through one turn
 * (forceTimeline) for the four-seam hold and the two-seam hold, as a share of the
 * ball's weight at the handout's example speed. The sentences about the figures are
 * built from the same numbers. Page 2 draws the two holds in the hand (the cards' hand
 * model and ball drawing). A header carries the clinic's name, date and contact.
 */
import { BALL_MASS_KG, BALL_RADIUS_M } from "../../../geometry/ball.js";
import type { SeamSamples } from "../../../geometry/seamSamples.js";
import { DEG, M_PER_S_PER_MPH } from "../../../geometry/units.js";
import type { SeamModel } from "../../physics/seamModel/model.js";
import { seamForceNewtons } from "../../physics/seamModel/newtons.js";
import type { SeamModelValues } from "../../physics/seamModel/parameters.js";
import { forceTimeline } from "../../physics/seamModel/turn.js";
import { coverModel } from "../../../geometry/coverRegions.js";
import { placeFingers } from "../../screening/hand.js";
import { pitchFrame } from "../../screening/pitch.js";
import { findReferenceAxes } from "../../screening/references.js";
import { ballScene } from "../ballDrawing.js";
import { fixed } from "../numbers.js";
import { createScene, nestScene, type SceneNode } from "../scene.js";
import { pdfOfPages, type Page } from "./document.js";
import type { Layout } from "./layouts.js";
import { PT_PER_IN } from "./pdfScene.js";
import { modelStory } from "./story.js";
import { setText, textHeight, type BoxPt } from "./textLayout.js";
import { timelineScene } from "./timelineChart.js";
import { fingerMarks, releaseViews } from "./views.js";
import { CAUTION_LONG, HOLD_GRIP, HOLD_WORDS, SEAM_PICTURE } from "./words.js";

/** The clinic's own lines for the header (any may be left out). */
export interface Clinic {
  readonly name?: string;
  readonly date?: string;
  readonly contact?: string;
}

export interface HandoutInput {
  readonly layout: Layout;
  readonly model: SeamModel;
  readonly values: SeamModelValues;
  readonly seam: SeamSamples;
  readonly clinic?: Clinic;
}

/** The figures' example pitch: a 92 mph fastball with backspin and 10 deg of gyro, in standard sea-level air (common practice for a fastball, no source). */
export const HANDOUT_SPEED_MPH = 92;
export const HANDOUT_GYRO_DEG = 10;
export const HANDOUT_AIR_DENSITY_KG_M3 = 1.225;
const G_M_PER_S2 = 9.80665;
const PHASES = 360;

export interface HandoutFigure {
  readonly hold: "four-seam" | "two-seam";
  /** Push across the spin axis and along the Magnus direction through a turn, % of the ball's weight. */
  readonly acrossPct: Float64Array;
  readonly magnusPct: Float64Array;
  readonly meanAcrossPct: number;
  readonly meanMagnusPct: number;
  /** Largest size of the push at any instant, %. */
  readonly peakPct: number;
}

/** The example pitch of the figures and the hold drawings: a right-hander's backspin fastball. */
function examplePitch() {
  return {
    // the spin's rate sets nothing a hold drawing shows (its axis is the hold's, its tilt 12:00)
    name: "fastball", pitcher: "", hand: "right" as const, speedMPerS: HANDOUT_SPEED_MPH * M_PER_S_PER_MPH, spinRadPerS: (2200 * 2 * Math.PI) / 60,
    tiltRad: 0, view: "pitcher" as const, gyroRad: HANDOUT_GYRO_DEG * DEG, want: "any" as const,
  };
}

/**
 * A classic hold in the hand, from the pitcher's own view behind the ball (field up at
 * the top): the cards' hand model (screening/hand.ts) on the hold's axis for the example
 * fastball, the fingers at an adult's pad size, the seams, the arm and glove sides.
 */
export function holdScene(seam: SeamSamples, hold: "four-seam" | "two-seam", idPrefix: string): SceneNode {
  const axis = findReferenceAxes(seam).find((r) => r.name === hold)!.axis;
  const grip = placeFingers(axis, pitchFrame(examplePitch()), seam, coverModel(seam.shape), undefined, "fastball");
  return ballScene(
    { seamShape: seam.shape, view: releaseViews(grip.ballToField).behind, overlays: { fingers: fingerMarks(grip.pads) }, caption: `the ${hold} hold, from behind the ball`, sides: { left: "glove side", right: "arm side" } },
    { sizePx: 300, seamPoints: 256, legend: false, idPrefix },
  );
}

/** The two figures' numbers, from the model. */
export function handoutFigures(model: SeamModel, seam: SeamSamples): HandoutFigure[] {
  const weightN = BALL_MASS_KG * G_M_PER_S2;
  const toPct = (c: number) => (100 * seamForceNewtons(c, HANDOUT_AIR_DENSITY_KG_M3, BALL_RADIUS_M, HANDOUT_SPEED_MPH * M_PER_S_PER_MPH)) / weightN;
  return findReferenceAxes(seam).map((ref) => {
    const t = forceTimeline(model, ref.axis, HANDOUT_GYRO_DEG * DEG, PHASES);
    const acrossPct = t.across.map(toPct);
    const magnusPct = t.alongMagnus.map(toPct);
    let sa = 0, sm = 0, peak = 0;
    for (let i = 0; i < PHASES; i++) {
      sa += acrossPct[i];
      sm += magnusPct[i];
      peak = Math.max(peak, Math.hypot(acrossPct[i], magnusPct[i]));
    }
    return { hold: ref.name, acrossPct, magnusPct, meanAcrossPct: sa / PHASES, meanMagnusPct: sm / PHASES, peakPct: peak };
  });
}

const pt = (xIn: number, yIn: number, wIn: number, hIn: number): BoxPt => ({ x: xIn * PT_PER_IN, y: yIn * PT_PER_IN, w: wIn * PT_PER_IN, h: hIn * PT_PER_IN });

/** What the figures show, in words built from their numbers. */
export function figureWords(figs: readonly HandoutFigure[]): string {
  const d = (f: HandoutFigure) => `${fixed(Math.hypot(f.meanAcrossPct, f.meanMagnusPct), 0)} %`;
  const [four, two] = [figs.find((f) => f.hold === "four-seam")!, figs.find((f) => f.hold === "two-seam")!];
  const mean = (f: HandoutFigure) => Math.hypot(f.meanAcrossPct, f.meanMagnusPct);
  const steadier = mean(two) > mean(four) ? two : four;
  const other = steadier === two ? four : two;
  return (
    `The two figures come from the model itself, for a ${HANDOUT_SPEED_MPH} mph fastball with backspin (and ${HANDOUT_GYRO_DEG}\u00b0 of gyro, as most have). Each line is the seam's push at one moment of a turn, as a share of the ball's weight: across the spin axis (for backspin, sideways) and along the spin's own lift (up or down). ` +
    `With the ${other.hold} hold the push swings back and forth through every turn (at its largest ${fixed(other.peakPct, 0)} % of the ball's weight) and averages only ${d(other)}: the pushes nearly cancel. ` +
    `With the ${steadier.hold} hold the push stays on one side for most of the turn and averages ${d(steadier)} (at its largest ${fixed(steadier.peakPct, 0)} %): that steady push is what moves the pitch at the plate.`
  );
}

/** One figure as a drawing: the push through a turn for a classic hold. */
export function figureScene(h: HandoutFigure): SceneNode {
  return timelineScene(
    [
      { label: "across the spin axis", values: h.acrossPct, color: "#1f4f5a" },
      { label: "along the lift", values: h.magnusPct, color: "#9a3c18" },
    ],
    { title: `${h.hold} hold: the push through one turn`, valueLabel: "% of the ball's weight", tick: (v) => `${fixed(v, 0)} %`, idPrefix: h.hold === "four-seam" ? "fs" : "ts" },
  );
}

function page(L: Layout): Page {
  const scene = createScene(L.page.widthIn * PT_PER_IN, L.page.heightIn * PT_PER_IN).attr({ "font-family": "Noto Sans, sans-serif" });
  scene.rect().attr({ x: 0, y: 0, width: L.page.widthIn * PT_PER_IN, height: L.page.heightIn * PT_PER_IN, fill: "#ffffff", stroke: "none" });
  return { widthIn: L.page.widthIn, heightIn: L.page.heightIn, scene };
}

/** The header band: the clinic's name, date and contact; returns its height, inches. */
function header(p: Page, L: Layout, clinic: Clinic | undefined, pageNo: number): number {
  const m = L.marginIn;
  const w = L.page.widthIn - 2 * m;
  const f = L.fonts;
  const top = Math.max(0.3, m - 0.35);
  const left = [clinic?.name, clinic?.date].filter((x): x is string => !!x).join(" \u00b7 ") || "Pitching clinic";
  setText(p.scene, left, pt(m, top, w * 0.7, 0.25), { sizePt: f.sizePt, weight: "bold", fill: "#333333" });
  setText(p.scene, `page ${pageNo} of 2`, pt(m + w * 0.7, top, w * 0.3, 0.25), { sizePt: f.sizePt - 1.5, fill: "#555555", align: "end" });
  if (clinic?.contact) setText(p.scene, clinic.contact, pt(m, top + 0.2, w, 0.22), { sizePt: f.sizePt - 1.5, fill: "#555555" });
  const y = top + (clinic?.contact ? 0.42 : 0.26);
  p.scene.path(`M${m * PT_PER_IN} ${y * PT_PER_IN}L${(m + w) * PT_PER_IN} ${y * PT_PER_IN}`).attr({ stroke: "#b9b2a5", "stroke-width": 0.75, fill: "none" });
  return y + 0.1;
}

/** Paragraphs from `yIn` down; returns where they end, inches. */
function paragraphs(p: Page, L: Layout, yIn: number, paras: readonly string[], sizePt = L.fonts.sizePt): number {
  const m = L.marginIn;
  const w = (L.page.widthIn - 2 * m) * PT_PER_IN;
  let y = yIn * PT_PER_IN;
  const style = { sizePt, leading: 1.3 };
  for (const para of paras) {
    const h = textHeight(para, w, style);
    setText(p.scene, para, { x: m * PT_PER_IN, y, w, h: h + sizePt }, style);
    y += h + sizePt * 0.6;
  }
  return y / PT_PER_IN;
}

export function handoutPages(input: HandoutInput): Page[] {
  const L = input.layout;
  const f = L.fonts;
  const m = L.marginIn;
  const w = L.page.widthIn - 2 * m;
  const figs = handoutFigures(input.model, input.seam);
  const p1 = page(L);
  let y = header(p1, L, input.clinic, 1);
  setText(p1.scene, "Why the same spin can move differently", pt(m, y, w, 0.45), { sizePt: f.titleSizePt, weight: "bold" });
  y += 0.5;
  const fig = L.blocks.figureSymmetric;
  y = paragraphs(p1, L, y, [
    "Spin bends the path (Magnus). A spinning ball drags the air round with it. Backspin makes the air leave the ball a little downward, so the ball is pushed up: a fastball seems to rise against what gravity alone would do. Sidespin pushes it sideways. Only the part of the spin across the flight does this; the rest (gyro spin, like a bullet's) adds no lift.",
    `${SEAM_PICTURE} The ${HOLD_WORDS["four-seam"]}. The ${HOLD_WORDS["two-seam"]}.`,
    `Seams move the air too (the seam-shifted wake). ${modelStory(input.values)}`,
    figureWords(figs),
  ], f.sizePt - 0.5);
  const figTop = Math.max(y + 0.05, fig.yIn);
  const figH = Math.min(fig.hIn, L.page.heightIn - m - 0.35 - figTop);
  const [four, two] = [figs.find((x) => x.hold === "four-seam")!, figs.find((x) => x.hold === "two-seam")!];
  const a = L.blocks.figureSymmetric, b = L.blocks.figureAsymmetric;
  nestScene(p1.scene, figureScene(four), a.xIn * PT_PER_IN, figTop * PT_PER_IN, a.wIn * PT_PER_IN, figH * PT_PER_IN);
  nestScene(p1.scene, figureScene(two), b.xIn * PT_PER_IN, figTop * PT_PER_IN, b.wIn * PT_PER_IN, figH * PT_PER_IN);
  setText(p1.scene, `Figures: computed by the seam-force model at ${HANDOUT_SPEED_MPH} mph in standard sea-level air, ${HANDOUT_GYRO_DEG}\u00b0 of gyro; the ball's weight is ${fixed(BALL_MASS_KG * 1000, 0)} g.`, pt(m, figTop + figH + 0.05, w, 0.3), { sizePt: f.sizePt - 2, fill: "#555555" });
  const p2 = page(L);
  y = header(p2, L, input.clinic, 2);
  setText(p2.scene, "Trying a new grip safely", pt(m, y, w, 0.45), { sizePt: f.titleSizePt - 2, weight: "bold" });
  y += 0.5;
  y = paragraphs(p2, L, y, [
    "\u2022  Start easy. Learn the grip playing catch at short distance and low effort. Watch how the ball moves before you add speed.",
    "\u2022  Build up slowly. Add distance, effort and number of throws over weeks, not in one session. Keep your usual rest days.",
    "\u2022  Listen to your arm. Stop at pain, tingling, numbness or a loss of control, and tell your coach.",
    "\u2022  Get help. Work with a qualified pitching coach, and see a licensed athletic trainer, physiotherapist or physician about any arm trouble.",
    "\u2022  Play by the rules. Use a legal ball and legal grips for your league. Never scratch, cut, mark or otherwise change the ball.",
    "\u2022  Remember what the model is. These pictures show a simple model of the air round a ball, not a measurement of your ball or your arm. Your league's rules and your coaches' and medical staff's advice come first.",
  ]);
  setText(p2.scene, "Cautions", pt(m, y + 0.1, w, 0.3), { sizePt: f.sizePt, weight: "bold", fill: "#7a2f1d" });
  const cw = w * PT_PER_IN;
  const cy = (y + 0.4) * PT_PER_IN;
  const text = CAUTION_LONG.join(" ");
  const ch = textHeight(text, cw, { sizePt: f.sizePt - 1 }) + f.sizePt;
  setText(p2.scene, text, { x: m * PT_PER_IN, y: cy, w: cw, h: ch }, { sizePt: f.sizePt - 1, fill: "#7a2f1d" });
  // the two classic holds in the hand, where the page has room (a right-hander's; a left-hander's is the mirror image)
  const top = (cy + ch) / PT_PER_IN + 0.25;
  const room = L.page.heightIn - m - 0.3 - top;
  if (room >= 2.7) {
    setText(p2.scene, "The two classic holds in your hand", pt(m, top, w, 0.3), { sizePt: f.sizePt + 1, weight: "bold" });
    setText(p2.scene, `A right-hander's hand seen from behind the ball (a left-hander's is the mirror image): I index, M middle, T thumb. ${HOLD_GRIP["four-seam"].replace(/^./, (c) => c.toUpperCase())}; ${HOLD_GRIP["two-seam"]}.`, pt(m, top + 0.3, w, 0.5), { sizePt: f.sizePt - 1, fill: "#333333" });
    const size = Math.min(room - 0.85, w / 2 - 0.2, 3.2);
    (["four-seam", "two-seam"] as const).forEach((hold, k) => {
      const x = m + (k === 0 ? w / 4 : (3 * w) / 4) - size / 2;
      nestScene(p2.scene, holdScene(input.seam, hold, `hold${k}`), x * PT_PER_IN, (top + 0.8) * PT_PER_IN, size * PT_PER_IN, size * PT_PER_IN);
    });
  }
  return [p1, p2];
}

export async function renderHandoutPdf(input: HandoutInput): Promise<{ bytes: Buffer; pages: number }> {
  const pages = handoutPages(input);
  return { bytes: await pdfOfPages(pages, "Why the same spin can move differently"), pages: pages.length };
}
