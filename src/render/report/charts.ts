/**
 * The bullpen report's charts as drawings (render/scene.ts), the same drawing giving
 * the SVG file, the PDF page (render/paper/pdfScene.ts) and a PNG (render/png.ts).
 * Pure: the same data gives the same drawing and the same bytes.
 *
 * movementChartScene: arm-side movement (x, in) against vertical movement (y, in) for
 *   one pitcher: each throw's observed point (filled mark) and the spin's prediction
 *   (open mark of the same shape) joined by the residual arrow, pointing from predicted
 *   to observed; one shape and colour per pitch type (model.ts PITCH_MARKS) and a legend.
 * directionChartScene: the spin-based direction (x) against the observed one (y), both
 *   clock readings in the pitcher's view; the diagonal is agreement, the shaded band
 *   is within the flag threshold of it. Clock readings wrap at 12:00, so each observed
 *   reading is drawn at the spin-based reading plus the signed gap (in -6 h to +6 h).
 *
 * Drawing units are px of a 520 x 470 drawing, y down. Every label is set horizontally
 * in Noto Sans and measured with it (render/fonts.ts), so titles and legend rows are
 * fitted to the width they are printed at; the vertical axis is named above the axis,
 * not along it. No label sits inside the plot, where marks are.
 */
import { formatClock } from "../../../geometry/clock.js";
import { measureText, SVG_FONT_FAMILY } from "../fonts.js";
import { fixed } from "../numbers.js";
import { addText, createScene, serializeScene, type Attrs, type SceneNode } from "../scene.js";
import { fitLine, fitTitle } from "./labels.js";
import { PITCH_MARKS, type ReportPitcher } from "./model.js";

const INK = "#2c2c2c";
const GRID = "#d9d6cf";
const AXIS = "#6b6b6b";
/** The drawing's size, px. */
export const CHART_WIDTH = 520;
export const CHART_HEIGHT = 470;
const LEFT = 56;
const RIGHT = 24;
const TITLE_PX = 15;
/** Smallest size a one-line title is shrunk to before it is broken into two lines. */
const TITLE_MIN_PX = 13;
const LABEL_PX = 12.5;
const TICK_PX = 12;
const LEGEND_ROW = 20;

type Shape = (typeof PITCH_MARKS)[number]["shape"];

const pts = (list: readonly (readonly [number, number])[]) => list.map(([a, b]) => `${a},${b}`).join(" ");

/** A mark centred at (x, y) of radius r. */
function mark(g: SceneNode, shape: Shape, x: number, y: number, r: number, attrs: Attrs): void {
  const poly = (unit: readonly (readonly [number, number])[]) => g.polygon().attr({ points: pts(unit.map(([a, b]) => [x + a * r, y + b * r] as const)), ...attrs });
  switch (shape) {
    case "circle":
      g.circle().attr({ cx: x, cy: y, r, ...attrs });
      break;
    case "square":
      g.rect().attr({ x: x - 0.85 * r, y: y - 0.85 * r, width: 1.7 * r, height: 1.7 * r, ...attrs });
      break;
    case "triangle":
      poly([[0, -1.15], [1, 0.7], [-1, 0.7]]);
      break;
    case "down":
      poly([[0, 1.15], [1, -0.7], [-1, -0.7]]);
      break;
    case "diamond":
      poly([[0, -1.2], [1.1, 0], [0, 1.2], [-1.1, 0]]);
      break;
    case "hexagon":
      poly([0, 1, 2, 3, 4, 5].map((k) => [Math.cos((k * Math.PI) / 3), Math.sin((k * Math.PI) / 3)] as const));
      break;
    case "cross":
      poly([[-0.35, -1], [0.35, -1], [0.35, -0.35], [1, -0.35], [1, 0.35], [0.35, 0.35], [0.35, 1], [-0.35, 1], [-0.35, 0.35], [-1, 0.35], [-1, -0.35], [-0.35, -0.35]]);
      break;
    case "star":
      poly(Array.from({ length: 10 }, (_, k) => {
        const a = -Math.PI / 2 + (k * Math.PI) / 5;
        const rr = k % 2 === 0 ? 1.2 : 0.5;
        return [rr * Math.cos(a), rr * Math.sin(a)] as const;
      }));
      break;
  }
}

/** The mark of the `index`-th pitch type of a pitcher, drawn filled at (x, y) of radius r (tables and legends). */
export function pitchTypeMark(g: SceneNode, index: number, x: number, y: number, r: number): void {
  const m = PITCH_MARKS[index % PITCH_MARKS.length];
  mark(g, m.shape, x, y, r, { fill: m.color, stroke: m.color, "stroke-width": 1 });
}

const line = (g: SceneNode, x0: number, y0: number, x1: number, y1: number, attrs: Attrs) => g.path(`M${x0} ${y0}L${x1} ${y1}`).attr({ fill: "none", ...attrs });

/** Nice tick step for a span. */
function tickStep(span: number, target: number): number {
  const raw = span / target;
  const p = 10 ** Math.floor(Math.log10(raw));
  for (const m of [1, 2, 5, 10]) if (m * p >= raw) return m * p;
  return 10 * p;
}

/** A range covering the values and [lo, hi], widened to whole steps. */
function niceRange(values: number[], lo: number, hi: number, step: number): [number, number] {
  // a mark on the frame's edge is half hidden: keep a fifth of a step clear
  const min = Math.min(lo, ...values) - step / 5;
  const max = Math.max(hi, ...values) + step / 5;
  return [Math.floor(min / step) * step, Math.ceil(max / step) * step];
}

interface LegendItem {
  readonly label: string;
  /** Width of the swatch before the label, px. */
  readonly swatchPx?: number;
  readonly draw: (g: SceneNode, x: number, y: number) => void;
}

const LEGEND_LEFT = LEFT;
const LEGEND_RIGHT = CHART_WIDTH - 10;

/** The legend's items placed in rows: each label fitted to a row, rows broken at the right edge. */
function layoutLegend(items: readonly LegendItem[]): { item: LegendItem; label: string; x: number; row: number }[] {
  const out: { item: LegendItem; label: string; x: number; row: number }[] = [];
  let x = LEGEND_LEFT;
  let row = 0;
  for (const item of items) {
    const sw = item.swatchPx ?? 17;
    const label = fitLine(item.label, LEGEND_RIGHT - LEGEND_LEFT - sw, LABEL_PX);
    const w = sw + measureText(label, LABEL_PX);
    if (x + w > LEGEND_RIGHT && x > LEGEND_LEFT) {
      x = LEGEND_LEFT;
      row++;
    }
    out.push({ item, label, x, row });
    x += w + 14;
  }
  return out;
}

function pitchTypeItems(pitcher: ReportPitcher): LegendItem[] {
  return pitcher.types.map((t, i) => ({
    label: `${t.pitch} (${t.rows})`,
    draw: (c: SceneNode, cx: number, cy: number) => pitchTypeMark(c, i, cx + 6, cy, 5.5),
  }));
}

interface Frame {
  readonly sx: (v: number) => number;
  readonly sy: (v: number) => number;
  readonly left: number;
  readonly top: number;
  readonly pw: number;
  readonly ph: number;
}

/**
 * The chart's title, the vertical axis's name above the plot, the frame with its grid
 * and ticks, the horizontal axis's name and the legend; the plot takes what is left.
 */
function chartFrame(
  draw: SceneNode,
  o: {
    title: string;
    xName: string;
    yName: string;
    legend: readonly LegendItem[];
    xr: [number, number];
    yr: [number, number];
    xStep: number;
    yStep: number;
    xTick: (v: number) => string;
    yTick: (v: number) => string;
  },
): Frame {
  // room for two title lines whatever the title, so the two charts of a page line up
  const title = fitTitle(o.title, CHART_WIDTH - 16, TITLE_PX, TITLE_MIN_PX, "bold");
  const pitch = 1.2 * TITLE_MIN_PX;
  const lastBaseline = 6 + 0.95 * TITLE_MIN_PX + pitch;
  let y = title.lines.length === 1 ? (6 + lastBaseline + 0.7 * title.size) / 2 : lastBaseline - pitch;
  for (const l of title.lines) {
    addText(draw, CHART_WIDTH / 2, y, l, { sizePx: title.size, fill: INK, anchor: "middle", weight: "bold" });
    y += pitch;
  }
  const yNameAt = lastBaseline + 22;
  addText(draw, 8, yNameAt, fitLine(o.yName, CHART_WIDTH - 16, LABEL_PX), { sizePx: LABEL_PX, fill: INK });
  const top = yNameAt + 12;
  const legend = layoutLegend(o.legend);
  const rows = legend.length ? legend[legend.length - 1].row + 1 : 0;
  // under the plot: tick labels, the axis name, then the legend rows
  const bottom = 62 + LEGEND_ROW * (rows - 1) + 12;
  const left = LEFT;
  const pw = CHART_WIDTH - LEFT - RIGHT;
  const ph = CHART_HEIGHT - top - bottom;
  const sx = (v: number) => left + ((v - o.xr[0]) / (o.xr[1] - o.xr[0])) * pw;
  const sy = (v: number) => top + ph - ((v - o.yr[0]) / (o.yr[1] - o.yr[0])) * ph;
  const g = draw.group().attr({ class: "sa-frame" });
  for (let v = o.xr[0]; v <= o.xr[1] + 1e-9; v += o.xStep) {
    line(g, sx(v), top, sx(v), top + ph, { stroke: GRID, "stroke-width": 1 });
    addText(g, sx(v), top + ph + 17, o.xTick(v), { sizePx: TICK_PX, fill: INK, anchor: "middle" });
  }
  for (let v = o.yr[0]; v <= o.yr[1] + 1e-9; v += o.yStep) {
    line(g, left, sy(v), left + pw, sy(v), { stroke: GRID, "stroke-width": 1 });
    addText(g, left - 7, sy(v) + 4, o.yTick(v), { sizePx: TICK_PX, fill: INK, anchor: "end" });
  }
  g.rect().attr({ x: left, y: top, width: pw, height: ph, fill: "none", stroke: AXIS, "stroke-width": 1.2 });
  addText(draw, left + pw / 2, top + ph + 36, fitLine(o.xName, CHART_WIDTH - 16, LABEL_PX), { sizePx: LABEL_PX, fill: INK, anchor: "middle" });
  const lg = draw.group().attr({ class: "sa-legend" });
  for (const l of legend) {
    const ly = top + ph + 62 + LEGEND_ROW * l.row;
    l.item.draw(lg, l.x, ly - 4);
    addText(lg, l.x + (l.item.swatchPx ?? 17), ly, l.label, { sizePx: LABEL_PX, fill: INK });
  }
  return { sx, sy, left, top, pw, ph };
}

/** The movement chart of one pitcher (see the header). */
export function movementChartScene(pitcher: ReportPitcher, opts: { basis: "trade" | "release"; windowFt: number | null }): SceneNode {
  const draw = createScene(CHART_WIDTH, CHART_HEIGHT).attr({ "font-family": SVG_FONT_FAMILY });
  draw.rect(CHART_WIDTH, CHART_HEIGHT).attr({ fill: "#ffffff" });
  const xs: number[] = [];
  const ys: number[] = [];
  for (const t of pitcher.types) for (const p of t.throws) xs.push(p.observed.armSideIn, p.predicted.armSideIn), ys.push(p.observed.upIn, p.predicted.upIn);
  const span = Math.max(10, Math.max(...xs, 0) - Math.min(...xs, 0), Math.max(...ys, 0) - Math.min(...ys, 0));
  const step = tickStep(span, 6);
  const xr = niceRange(xs, -step, step, step);
  const yr = niceRange(ys, -step, step, step);
  const f = chartFrame(draw, {
    title: `${pitcher.name}: movement (${opts.basis === "trade" ? `trade basis, last ${opts.windowFt} ft` : "release basis"})`,
    xName: "horizontal break toward the arm side, in",
    yName: opts.basis === "trade" ? "induced vertical break, in" : "up at the plate, in",
    legend: [
      ...pitchTypeItems(pitcher),
      {
        label: "spin predicts (open) -> observed (filled)",
        swatchPx: 26,
        draw: (c, x, y) => {
          mark(c, "circle", x + 2, y, 3.4, { fill: "#ffffff", stroke: INK, "stroke-width": 1.2 });
          line(c, x + 6, y, x + 13, y, { stroke: INK, "stroke-width": 1 });
          mark(c, "circle", x + 15, y, 3.6, { fill: INK, stroke: "#ffffff", "stroke-width": 0.6 });
        },
      },
    ],
    xr,
    yr,
    xStep: step,
    yStep: step,
    xTick: (v) => fixed(v, 0),
    yTick: (v) => fixed(v, 0),
  });
  const g = draw.group().attr({ class: "sa-zero" });
  if (xr[0] < 0 && xr[1] > 0) line(g, f.sx(0), f.top, f.sx(0), f.top + f.ph, { stroke: AXIS, "stroke-width": 1.2 });
  if (yr[0] < 0 && yr[1] > 0) line(g, f.left, f.sy(0), f.left + f.pw, f.sy(0), { stroke: AXIS, "stroke-width": 1.2 });
  const many = pitcher.types.reduce((n, t) => n + t.throws.length, 0) > 150;
  pitcher.types.forEach((t, i) => {
    const m = PITCH_MARKS[i % PITCH_MARKS.length];
    const layer = draw.group().attr({ class: "sa-type" });
    for (const p of t.throws) {
      const x0 = f.sx(p.predicted.armSideIn), y0 = f.sy(p.predicted.upIn);
      const x1 = f.sx(p.observed.armSideIn), y1 = f.sy(p.observed.upIn);
      const len = Math.hypot(x1 - x0, y1 - y0);
      if (len > 6) {
        // the residual arrow: predicted -> observed, the head stopping short of the observed mark
        const ux = (x1 - x0) / len, uy = (y1 - y0) / len;
        const ex = x1 - 5 * ux, ey = y1 - 5 * uy;
        line(layer, x0, y0, ex, ey, { stroke: m.color, "stroke-width": 1, opacity: many ? 0.35 : 0.7 });
        layer.polygon().attr({
          points: pts([[ex, ey], [ex - 6 * ux - 3 * uy, ey - 6 * uy + 3 * ux], [ex - 6 * ux + 3 * uy, ey - 6 * uy - 3 * ux]]),
          fill: m.color,
          opacity: many ? 0.35 : 0.7,
        });
      }
      mark(layer, m.shape, x0, y0, 3.6, { fill: "#ffffff", stroke: m.color, "stroke-width": 1.2 });
      mark(layer, m.shape, x1, y1, 4.4, { fill: m.color, stroke: "#ffffff", "stroke-width": 0.6 });
    }
  });
  return draw;
}

/**
 * The convex polygon `poly` clipped to the rectangle [x0, x1] x [y0, y1]
 * (Sutherland and Hodgman, "Reentrant polygon clipping", CACM 17(1), 1974), one edge at a time.
 */
function clipToRect(poly: readonly (readonly [number, number])[], x0: number, y0: number, x1: number, y1: number): [number, number][] {
  let out: [number, number][] = poly.map(([x, y]) => [x, y]);
  const edges: [(p: readonly [number, number]) => number][] = [[(p) => p[0] - x0], [(p) => x1 - p[0]], [(p) => p[1] - y0], [(p) => y1 - p[1]]];
  for (const [inside] of edges) {
    const src = out;
    out = [];
    for (let i = 0; i < src.length; i++) {
      const a = src[i], b = src[(i + 1) % src.length];
      const da = inside(a), db = inside(b);
      if (da >= 0) out.push(a);
      if ((da >= 0) !== (db >= 0)) {
        const t = da / (da - db);
        out.push([a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1])]);
      }
    }
    if (!out.length) break;
  }
  return out;
}

/** The direction chart of one pitcher (see the header). */
export function directionChartScene(pitcher: ReportPitcher, opts: { gapFlagMinutes: number }): SceneNode {
  const draw = createScene(CHART_WIDTH, CHART_HEIGHT).attr({ "font-family": SVG_FONT_FAMILY });
  draw.rect(CHART_WIDTH, CHART_HEIGHT).attr({ fill: "#ffffff" });
  const points: { x: number; y: number; type: number }[] = [];
  pitcher.types.forEach((t, i) => {
    for (const p of t.throws) {
      if (p.spinMinutes === null || p.observedMinutes === null) continue;
      let gap = (p.observedMinutes - p.spinMinutes) % 720;
      if (gap > 360) gap -= 720;
      if (gap <= -360) gap += 720;
      points.push({ x: p.spinMinutes, y: p.spinMinutes + gap, type: i });
    }
  });
  const values = points.flatMap((p) => [p.x, p.y]);
  const lo = values.length ? Math.min(...values) : 0;
  const hi = values.length ? Math.max(...values) : 720;
  // clock ticks on whole quarter hours, half hours or hours
  const span = Math.max(60, hi - lo);
  const step = [15, 30, 60, 90, 120, 180].find((s) => span / s <= 7) ?? 180;
  const r: [number, number] = [Math.floor((lo - step / 2) / step) * step, Math.ceil((hi + step / 2) / step) * step];
  const label = (v: number) => formatClock(((v % 720) + 720) % 720);
  const band = opts.gapFlagMinutes;
  const f = chartFrame(draw, {
    title: `${pitcher.name}: spin-based against observed direction (${pitcher.view}'s view)`,
    xName: "spin-based direction (Magnus alone), clock",
    yName: "observed direction, clock",
    legend: [
      ...pitchTypeItems(pitcher),
      {
        label: `within ${fixed(band, 0)} min of agreement`,
        draw: (c, x, y) => {
          c.rect().attr({ x, y: y - 5, width: 14, height: 10, fill: "#7fa7c9", "fill-opacity": 0.35 });
        },
      },
    ],
    xr: r,
    yr: r,
    xStep: step,
    yStep: step,
    xTick: label,
    yTick: label,
  });
  // agreement and the band within the flag threshold of it, clipped to the plot
  const corners = ([[r[0], r[0] - band], [r[1], r[1] - band], [r[1], r[1] + band], [r[0], r[0] + band]] as const).map(([x, y]) => [f.sx(x), f.sy(y)] as const);
  const shaded = clipToRect(corners, f.left, f.top, f.left + f.pw, f.top + f.ph);
  if (shaded.length >= 3) draw.polygon().attr({ points: pts(shaded), fill: "#7fa7c9", "fill-opacity": 0.18, stroke: "none" });
  line(draw, f.sx(r[0]), f.sy(r[0]), f.sx(r[1]), f.sy(r[1]), { stroke: "#3d6f9e", "stroke-width": 1.2, "stroke-dasharray": "5 3" });
  const layer = draw.group().attr({ class: "sa-points" });
  for (const p of points) {
    const m = PITCH_MARKS[p.type % PITCH_MARKS.length];
    mark(layer, m.shape, f.sx(p.x), f.sy(p.y), 4.4, { fill: m.color, stroke: "#ffffff", "stroke-width": 0.6, "fill-opacity": 0.85 });
  }
  return draw;
}

/** The movement chart as SVG text. */
export function movementChartSvg(pitcher: ReportPitcher, opts: { basis: "trade" | "release"; windowFt: number | null; idPrefix?: string }): string {
  return `${serializeScene(movementChartScene(pitcher, opts), 2, opts.idPrefix ?? "sa-mv")}\n`;
}

/** The direction chart as SVG text. */
export function directionChartSvg(pitcher: ReportPitcher, opts: { gapFlagMinutes: number; idPrefix?: string }): string {
  return `${serializeScene(directionChartScene(pitcher, opts), 2, opts.idPrefix ?? "sa-dir")}\n`;
}
