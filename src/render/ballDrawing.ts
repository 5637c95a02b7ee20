/**
 * A ball drawing: the seam, its stitches and optional overlays on a shaded disc, as
 * an SVG string. Pure: the model and options in, the same bytes out every time.
 * Frames: the ball frame of geometry/seamCurve.ts; the view of projection.ts.
 * Visual language: ballStyle.ts.
 */
import { assertSeamPointCount } from "../../geometry/seamSamples.js";
import type { Vec3 } from "../../geometry/vec.js";
import { seamPaths, SEAM_HALF_WIDTH_RAD, stitchMarks } from "./ballSeam.js";
import {
  drawFingerPads, drawFingers, drawFlowBand, drawLandmarks, drawPushArrow, drawSpinAxis,
  type FingerMark, type FingerPad, type FlowBandOverlay, type PushArrow,
} from "./ballOverlays.js";
import { BALL_STYLE as S } from "./ballStyle.js";
import type { DiscPlacement, View } from "./projection.js";
import { addText, createScene, DEFAULT_SCENE_DIGITS, serializeScene, type SceneNode } from "./scene.js";

export interface BallOverlays {
  /** Spin axis, ball frame, pointing at the positive end (right-hand rule). */
  readonly spinAxis?: Vec3;
  /** The separation band seen by the flow. */
  readonly flowBand?: FlowBandOverlay;
  readonly fingerPads?: readonly FingerPad[];
  /** Fingers with their real pad sizes and direction (drawn instead of plain pads). */
  readonly fingers?: readonly FingerMark[];
  readonly push?: PushArrow;
  /** Landmark names to label (geometry/landmarks.ts), or "all". */
  readonly landmarks?: "all" | readonly string[];
}

export interface BallModel {
  /** Seam shape b, 0 < b < 1/2 (geometry/seamCurve.ts). */
  readonly seamShape: number;
  readonly view: View;
  readonly overlays?: BallOverlays;
  /** Bold line above the ball. */
  readonly title?: string;
  /** Line under the ball. */
  readonly caption?: string;
  /** Words at the ball's left and right (e.g. "glove side", "arm side"), under its edges. */
  readonly sides?: { readonly left: string; readonly right: string };
}

export interface BallDrawingOptions {
  /** Width of the drawing and height of the ball's square, px, 120 to 4000 (default 360); the ball's radius is 0.36 of it. */
  readonly sizePx?: number;
  /** Decimals kept in coordinates and widths, 0 to 6 (default 2); opacities keep at least 3. */
  readonly digits?: number;
  /** Seam samples, a multiple of 4 from 64 (default 1024; 512 is plenty below 300 px). */
  readonly seamPoints?: number;
  /** Draw the 108 double stitches (default true). */
  readonly stitches?: boolean;
  /** The seam on the far side: a faint dashed line, or left out (default "faded"). */
  readonly hiddenSeam?: "faded" | "omit";
  /** Legend row naming the marks drawn (default true). */
  readonly legend?: boolean;
  /** Prefix of the ids in the SVG, so several drawings can share one page (default "sa"). */
  readonly idPrefix?: string;
}

type LegendKind = "seam" | "far seam" | "axis" | "band" | "pad" | "push";
const LEGEND_TEXT: Record<LegendKind, string> = {
  seam: "seam and stitches",
  "far seam": "seam, far side",
  axis: "spin axis (dot: + end)",
  band: "separation band",
  pad: "finger pad",
  push: "push",
};
const LEGEND_ROW_PX = 16;
const LEGEND_FONT_PX = 10;

/** Legend entries laid out in rows without font metrics: about 0.6 em per character (a wide sans-serif). */
function layoutLegend(kinds: readonly LegendKind[], widthPx: number): { kind: LegendKind; x: number; row: number }[] {
  const out: { kind: LegendKind; x: number; row: number }[] = [];
  let x = 10;
  let row = 0;
  for (const kind of kinds) {
    const w = 26 + 0.6 * LEGEND_FONT_PX * LEGEND_TEXT[kind].length;
    if (x + w > widthPx - 6 && x > 10) {
      row++;
      x = 10;
    }
    out.push({ kind, x, row });
    x += w + 8;
  }
  return out;
}

function drawLegendSwatch(g: SceneNode, kind: LegendKind, x: number, y: number): void {
  const line = (attrs: Record<string, string | number>) => g.path().attr({ d: `M${x} ${y}L${x + 18} ${y}`, fill: "none", ...attrs });
  if (kind === "seam") {
    line({ stroke: S.seamBand, "stroke-width": 6 });
    g.path().attr({ d: `M${x + 3} ${y - 3}L${x + 6} ${y}L${x + 3} ${y + 3}M${x + 11} ${y - 3}L${x + 14} ${y}L${x + 11} ${y + 3}`, fill: "none", stroke: S.stitch, "stroke-width": 1.2 });
  } else if (kind === "far seam") line({ stroke: S.hiddenSeam, "stroke-width": 1.2, "stroke-dasharray": "3 2", opacity: 0.5 });
  else if (kind === "axis") {
    line({ stroke: S.axis, "stroke-width": 2 });
    g.circle().attr({ cx: x + 14, cy: y, r: 3.5, fill: S.axis });
  } else if (kind === "band") g.rect().attr({ x, y: y - 5, width: 18, height: 10, fill: S.bandTint, "fill-opacity": 0.45, stroke: S.bandEdge, "stroke-width": 1 });
  else if (kind === "pad") g.ellipse().attr({ cx: x + 9, cy: y, rx: 8, ry: 5, fill: S.padFill, "fill-opacity": S.padFillOpacity, stroke: S.padOutline, "stroke-width": 1 });
  else {
    line({ stroke: S.push, "stroke-width": 2.5 });
    g.polygon().attr({ points: `${x + 20},${y} ${x + 13},${y - 4} ${x + 13},${y + 4}`, fill: S.push });
  }
}

/**
 * Renders the ball as seen in `model.view` (orthographic), with the overlays asked for.
 * The seam band has the real seam width (SEAM_WIDTH_IN on the nominal ball); stitches
 * are drawn on the side facing the viewer only.
 * Throws RangeError for an invalid seam shape, option or overlay.
 */
export function renderBallSvg(model: BallModel, options: BallDrawingOptions = {}): string {
  return serializeScene(ballScene(model, options), options.digits ?? DEFAULT_SCENE_DIGITS, options.idPrefix ?? "sa");
}

/** The ball drawing as drawing commands (render/scene.ts), for SVG, PDF and PNG alike; see renderBallSvg. */
export function ballScene(model: BallModel, options: BallDrawingOptions = {}): SceneNode {
  const sizePx = options.sizePx ?? 360;
  if (!(sizePx >= 120 && sizePx <= 4000)) throw new RangeError(`drawing size ${sizePx} px must be from 120 to 4000 px`);
  const digits = options.digits ?? DEFAULT_SCENE_DIGITS;
  const seamPoints = options.seamPoints ?? 1024;
  assertSeamPointCount(seamPoints);
  const prefix = options.idPrefix ?? "sa";
  if (!/^[A-Za-z][\w-]*$/.test(prefix)) throw new RangeError(`id prefix "${prefix}" must start with a letter and hold only letters, digits, _ and -`);
  const ov = model.overlays ?? {};
  const faded = (options.hiddenSeam ?? "faded") === "faded";

  const kinds: LegendKind[] = ["seam"];
  if (faded) kinds.push("far seam");
  if (ov.spinAxis) kinds.push("axis");
  if (ov.flowBand) kinds.push("band");
  if (ov.fingerPads?.length || ov.fingers?.length) kinds.push("pad");
  if (ov.push) kinds.push("push");
  const legend = options.legend ?? true ? layoutLegend(kinds, sizePx) : [];
  const titlePx = model.title ? 30 : 0;
  const captionPx = model.caption ? 20 : 0;
  const legendPx = legend.length ? (legend[legend.length - 1].row + 1) * LEGEND_ROW_PX + 6 : 0;
  const heightPx = titlePx + sizePx + captionPx + legendPx;
  const disc: DiscPlacement = { radiusPx: 0.36 * sizePx, centerXPx: sizePx / 2, centerYPx: titlePx + sizePx / 2 };

  const draw = createScene(sizePx, heightPx).attr({ "font-family": S.font });
  if (model.title) draw.element("title").words(model.title);
  const shade = draw
    .gradient("radial", (add) => {
      add.stop({ offset: 0, color: S.coverLight });
      add.stop({ offset: 0.55, color: S.coverMid });
      add.stop({ offset: 1, color: S.coverLimb });
    })
    .id(`${prefix}-cover-shade`)
    // light from the upper left: the highlight sits up and left of the centre
    .attr({ cx: "40%", cy: "36%", r: "70%", fx: "34%", fy: "28%" });

  const under: SceneNode = draw.group().attr({ class: "sa-under" });
  draw.circle().attr({ cx: disc.centerXPx, cy: disc.centerYPx, r: disc.radiusPx, fill: `url(#${shade.id()})`, class: "sa-cover" });
  const surface = draw.group().attr({ class: "sa-surface" });
  if (ov.flowBand) drawFlowBand(surface, model.view, disc, ov.flowBand, digits);
  const seam = seamPaths(model.seamShape, model.view, disc, seamPoints, digits);
  if (faded && seam.hiddenLine) {
    surface.path().attr({
      d: seam.hiddenLine, fill: "none", stroke: S.hiddenSeam, "stroke-width": 1, "stroke-dasharray": "3 2",
      opacity: S.hiddenSeamOpacity, class: "sa-seam-far",
    });
  }
  surface.path().attr({ d: seam.visibleBand, fill: S.seamBand, stroke: "none", class: "sa-seam" });
  if (options.stitches ?? true) {
    // stitch thread about a sixth of the seam width, never thinner than a hairline
    const threadPx = Math.max(0.6, (SEAM_HALF_WIDTH_RAD * disc.radiusPx) / 3);
    const stitches = stitchMarks(model.seamShape, model.view, disc, digits);
    surface.path().attr({
      d: stitches.path, fill: "none", stroke: S.stitch, "stroke-width": threadPx, "stroke-linecap": "round",
      "stroke-linejoin": "round", class: "sa-stitches",
    });
  }
  draw.circle().attr({ cx: disc.centerXPx, cy: disc.centerYPx, r: disc.radiusPx, fill: "none", stroke: S.coverOutline, "stroke-width": 1.2 });
  const marks = draw.group().attr({ class: "sa-marks" });
  // every mark's words in one layer over all the marks, each on its halo: no arrow or pad covers a letter
  const labels = draw.group().attr({ class: "sa-labels" });
  if (ov.fingerPads?.length) drawFingerPads(marks, model.view, disc, ov.fingerPads, digits, labels);
  if (ov.fingers?.length) drawFingers(marks, model.view, disc, ov.fingers, digits, labels);
  if (ov.landmarks) drawLandmarks(marks, model.view, disc, model.seamShape, ov.landmarks, labels);
  if (ov.spinAxis) drawSpinAxis(under, marks, model.view, disc, ov.spinAxis, digits);
  if (ov.push) drawPushArrow(marks, model.view, disc, ov.push, digits, labels);

  if (model.title) addText(draw, sizePx / 2, 21, model.title, { sizePx: 15, fill: S.ink, anchor: "middle", weight: "bold", className: "sa-title" });
  if (model.sides) {
    const y = disc.centerYPx + disc.radiusPx + 12;
    addText(draw, disc.centerXPx - disc.radiusPx * 1.02, y, model.sides.left, { sizePx: 11, fill: S.ink, haloPx: 2.5, className: "sa-side" });
    addText(draw, disc.centerXPx + disc.radiusPx * 1.02, y, model.sides.right, { sizePx: 11, fill: S.ink, anchor: "end", haloPx: 2.5, className: "sa-side" });
  }
  if (model.caption) {
    addText(draw, sizePx / 2, titlePx + sizePx + 14, model.caption, { sizePx: 11, fill: S.ink, anchor: "middle", className: "sa-caption" });
  }
  if (legend.length) {
    const g = draw.group().attr({ class: "sa-legend" });
    const top = titlePx + sizePx + captionPx + 4;
    for (const item of legend) {
      const y = top + item.row * LEGEND_ROW_PX + 8;
      drawLegendSwatch(g, item.kind, item.x, y);
      addText(g, item.x + 24, y + 3.5, LEGEND_TEXT[item.kind], { sizePx: LEGEND_FONT_PX, fill: S.ink });
    }
  }
  return draw;
}
