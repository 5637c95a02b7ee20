/**
 * The bullpen report's charts as SVG strings (pure: the same data gives the same bytes).
 *
 * movementChartSvg: arm-side movement (x, in) against vertical movement (y, in) for one
 *   pitcher: each throw's observed point (filled mark) and the spin's prediction (open
 *   mark of the same shape) joined by the residual arrow, pointing from predicted to
 *   observed; one shape and colour per pitch type (model.ts PITCH_MARKS) and a legend.
 * directionChartSvg: the spin-based direction (x) against the observed one (y), both
 *   clock readings in the pitcher's view; the diagonal is agreement, the shaded band
 *   is within the flag threshold of it. Clock readings wrap at 12:00, so each observed
 *   reading is drawn at the spin-based reading plus the signed gap (in -6 h to +6 h).
 */
import type { Container } from "@svgdotjs/svg.js";
import { formatClock } from "../../../geometry/clock.js";
import { fixed } from "../numbers.js";
import { createSvgCanvas, serializeSvg } from "../svgContext.js";
import { addText } from "../svgText.js";
import { PITCH_MARKS, type ReportPitcher } from "./model.js";

const FONT = "DejaVu Sans, Verdana, sans-serif";
const INK = "#2c2c2c";
const GRID = "#d9d6cf";
const AXIS = "#6b6b6b";
const WIDTH = 520;
const HEIGHT = 470;
const PLOT = { left: 64, right: 24, top: 40, bottom: 118 };

type Shape = (typeof PITCH_MARKS)[number]["shape"];

/** A mark centred at (x, y) of radius r. */
function mark(g: Container, shape: Shape, x: number, y: number, r: number, attrs: Record<string, string | number>): void {
  const poly = (pts: [number, number][]) => g.polygon(pts.map(([a, b]) => `${x + a * r},${y + b * r}`).join(" ")).attr(attrs);
  switch (shape) {
    case "circle":
      g.circle(2 * r).center(x, y).attr(attrs);
      break;
    case "square":
      g.rect(1.7 * r, 1.7 * r).center(x, y).attr(attrs);
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
      poly([0, 1, 2, 3, 4, 5].map((k) => [Math.cos((k * Math.PI) / 3), Math.sin((k * Math.PI) / 3)] as [number, number]));
      break;
    case "cross":
      poly([[-0.35, -1], [0.35, -1], [0.35, -0.35], [1, -0.35], [1, 0.35], [0.35, 0.35], [0.35, 1], [-0.35, 1], [-0.35, 0.35], [-1, 0.35], [-1, -0.35], [-0.35, -0.35]]);
      break;
    case "star":
      poly(Array.from({ length: 10 }, (_, k) => {
        const a = -Math.PI / 2 + (k * Math.PI) / 5;
        const rr = k % 2 === 0 ? 1.2 : 0.5;
        return [rr * Math.cos(a), rr * Math.sin(a)] as [number, number];
      }));
      break;
  }
}

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

function legend(draw: Container, pitcher: ReportPitcher, top: number, extra: { label: string; swatchPx?: number; draw: (g: Container, x: number, y: number) => void }[]): void {
  const g = draw.group().attr({ class: "sa-legend" });
  let x = PLOT.left;
  let y = top;
  const items: { label: string; swatchPx?: number; draw: (g: Container, x: number, y: number) => void }[] = [
    ...pitcher.types.map((t, i) => ({
      label: `${t.pitch} (${t.rows})`,
      draw: (c: Container, cx: number, cy: number) => {
        const m = PITCH_MARKS[i % PITCH_MARKS.length];
        mark(c, m.shape, cx + 6, cy, 5.5, { fill: m.color, stroke: m.color, "stroke-width": 1 });
      },
    })),
    ...extra,
  ];
  for (const item of items) {
    const sw = item.swatchPx ?? 17;
    const w = sw + 5 + 7.2 * item.label.length;
    if (x + w > WIDTH - 10 && x > PLOT.left) {
      x = PLOT.left;
      y += 20;
    }
    item.draw(g, x, y - 4);
    addText(g, x + sw, y, item.label, { sizePx: 12.5, fill: INK });
    x += w + 10;
  }
}

function frame(draw: Container, xr: [number, number], yr: [number, number], xStep: number, yStep: number, xLabel: (v: number) => string, yLabel: (v: number) => string) {
  const pw = WIDTH - PLOT.left - PLOT.right;
  const ph = HEIGHT - PLOT.top - PLOT.bottom;
  const sx = (v: number) => PLOT.left + ((v - xr[0]) / (xr[1] - xr[0])) * pw;
  const sy = (v: number) => PLOT.top + ph - ((v - yr[0]) / (yr[1] - yr[0])) * ph;
  const g = draw.group().attr({ class: "sa-frame" });
  for (let v = xr[0]; v <= xr[1] + 1e-9; v += xStep) {
    g.line(sx(v), PLOT.top, sx(v), PLOT.top + ph).attr({ stroke: GRID, "stroke-width": 1 });
    addText(g, sx(v), PLOT.top + ph + 17, xLabel(v), { sizePx: 12, fill: INK, anchor: "middle" });
  }
  for (let v = yr[0]; v <= yr[1] + 1e-9; v += yStep) {
    g.line(PLOT.left, sy(v), PLOT.left + pw, sy(v)).attr({ stroke: GRID, "stroke-width": 1 });
    addText(g, PLOT.left - 7, sy(v) + 4, yLabel(v), { sizePx: 12, fill: INK, anchor: "end" });
  }
  g.rect(pw, ph).move(PLOT.left, PLOT.top).attr({ fill: "none", stroke: AXIS, "stroke-width": 1.2 });
  return { sx, sy, pw, ph };
}

/** The movement chart of one pitcher (see the header). */
export function movementChartSvg(pitcher: ReportPitcher, opts: { basis: "trade" | "release"; windowFt: number | null; idPrefix?: string }): string {
  const draw = createSvgCanvas(WIDTH, HEIGHT).attr({ "font-family": FONT });
  draw.rect(WIDTH, HEIGHT).attr({ fill: "#ffffff" });
  const xs: number[] = [];
  const ys: number[] = [];
  for (const t of pitcher.types) for (const p of t.throws) xs.push(p.observed.armSideIn, p.predicted.armSideIn), ys.push(p.observed.upIn, p.predicted.upIn);
  const span = Math.max(10, Math.max(...xs, 0) - Math.min(...xs, 0), Math.max(...ys, 0) - Math.min(...ys, 0));
  const step = tickStep(span, 6);
  const xr = niceRange(xs, -step, step, step);
  const yr = niceRange(ys, -step, step, step);
  const f = frame(draw, xr, yr, step, step, (v) => fixed(v, 0), (v) => fixed(v, 0));
  const g = draw.group().attr({ class: "sa-zero" });
  if (xr[0] < 0 && xr[1] > 0) g.line(f.sx(0), PLOT.top, f.sx(0), PLOT.top + f.ph).attr({ stroke: AXIS, "stroke-width": 1.2 });
  if (yr[0] < 0 && yr[1] > 0) g.line(PLOT.left, f.sy(0), PLOT.left + f.pw, f.sy(0)).attr({ stroke: AXIS, "stroke-width": 1.2 });
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
        layer.line(x0, y0, ex, ey).attr({ stroke: m.color, "stroke-width": 1, opacity: many ? 0.35 : 0.7 });
        layer.polygon(`${ex},${ey} ${ex - 6 * ux - 3 * uy},${ey - 6 * uy + 3 * ux} ${ex - 6 * ux + 3 * uy},${ey - 6 * uy - 3 * ux}`).attr({ fill: m.color, opacity: many ? 0.35 : 0.7 });
      }
      mark(layer, m.shape, x0, y0, 3.6, { fill: "#ffffff", stroke: m.color, "stroke-width": 1.2 });
      mark(layer, m.shape, x1, y1, 4.4, { fill: m.color, stroke: "#ffffff", "stroke-width": 0.6 });
    }
  });
  const vertical = opts.basis === "trade" ? "induced vertical break, in" : "up at the plate, in";
  addText(draw, WIDTH / 2, 24, `${pitcher.name}: movement (${opts.basis === "trade" ? `trade basis, last ${opts.windowFt} ft` : "release basis"})`, { sizePx: 15, fill: INK, anchor: "middle", weight: "bold" });
  addText(draw, PLOT.left + f.pw / 2, PLOT.top + f.ph + 36, "horizontal break toward the arm side, in", { sizePx: 12.5, fill: INK, anchor: "middle" });
  const yl = draw.group().attr({ transform: `translate(16 ${PLOT.top + f.ph / 2}) rotate(-90)` });
  addText(yl, 0, 0, vertical, { sizePx: 12.5, fill: INK, anchor: "middle" });
  legend(draw, pitcher, PLOT.top + f.ph + 62, [
    {
      label: "spin predicts (open) -> observed (filled)",
      swatchPx: 26,
      draw: (c, x, y) => {
        mark(c, "circle", x + 2, y, 3.4, { fill: "#ffffff", stroke: INK, "stroke-width": 1.2 });
        c.line(x + 6, y, x + 13, y).attr({ stroke: INK, "stroke-width": 1 });
        mark(c, "circle", x + 15, y, 3.6, { fill: INK, stroke: "#ffffff", "stroke-width": 0.6 });
      },
    },
  ]);
  return serializeSvg(draw, 2, opts.idPrefix ?? "sa-mv");
}

/** The direction chart of one pitcher (see the header). */
export function directionChartSvg(pitcher: ReportPitcher, opts: { gapFlagMinutes: number; idPrefix?: string }): string {
  const draw = createSvgCanvas(WIDTH, HEIGHT).attr({ "font-family": FONT });
  draw.rect(WIDTH, HEIGHT).attr({ fill: "#ffffff" });
  const pts: { x: number; y: number; type: number }[] = [];
  pitcher.types.forEach((t, i) => {
    for (const p of t.throws) {
      if (p.spinMinutes === null || p.observedMinutes === null) continue;
      let gap = (p.observedMinutes - p.spinMinutes) % 720;
      if (gap > 360) gap -= 720;
      if (gap <= -360) gap += 720;
      pts.push({ x: p.spinMinutes, y: p.spinMinutes + gap, type: i });
    }
  });
  const values = pts.flatMap((p) => [p.x, p.y]);
  const lo = values.length ? Math.min(...values) : 0;
  const hi = values.length ? Math.max(...values) : 720;
  // clock ticks on whole quarter hours, half hours or hours
  const span = Math.max(60, hi - lo);
  const step = [15, 30, 60, 90, 120, 180].find((s) => span / s <= 7) ?? 180;
  const r: [number, number] = [Math.floor((lo - step / 2) / step) * step, Math.ceil((hi + step / 2) / step) * step];
  const label = (v: number) => formatClock(((v % 720) + 720) % 720);
  const f = frame(draw, r, r, step, step, label, label);
  // agreement and the band within the flag threshold of it
  const band = opts.gapFlagMinutes;
  const poly = [
    [r[0], r[0] - band], [r[1], r[1] - band], [r[1], r[1] + band], [r[0], r[0] + band],
  ].map(([x, y]) => `${f.sx(x)},${f.sy(Math.max(r[0], Math.min(r[1], y)))}`);
  const clip = draw.clip().add(draw.rect(f.pw, f.ph).move(PLOT.left, PLOT.top));
  draw.polygon(poly.join(" ")).attr({ fill: "#7fa7c9", "fill-opacity": 0.18, stroke: "none" }).clipWith(clip);
  draw.line(f.sx(r[0]), f.sy(r[0]), f.sx(r[1]), f.sy(r[1])).attr({ stroke: "#3d6f9e", "stroke-width": 1.2, "stroke-dasharray": "5 3" });
  const layer = draw.group().attr({ class: "sa-points" });
  for (const p of pts) {
    const m = PITCH_MARKS[p.type % PITCH_MARKS.length];
    mark(layer, m.shape, f.sx(p.x), f.sy(p.y), 4.4, { fill: m.color, stroke: "#ffffff", "stroke-width": 0.6, "fill-opacity": 0.85 });
  }
  addText(draw, WIDTH / 2, 24, `${pitcher.name}: spin-based against observed direction (${pitcher.view}'s view)`, { sizePx: 15, fill: INK, anchor: "middle", weight: "bold" });
  addText(draw, PLOT.left + f.pw / 2, PLOT.top + f.ph + 36, "spin-based direction (Magnus alone), clock", { sizePx: 12.5, fill: INK, anchor: "middle" });
  const yl = draw.group().attr({ transform: `translate(16 ${PLOT.top + f.ph / 2}) rotate(-90)` });
  addText(yl, 0, 0, "observed direction, clock", { sizePx: 12.5, fill: INK, anchor: "middle" });
  legend(draw, pitcher, PLOT.top + f.ph + 62, [
    {
      label: `within ${fixed(band, 0)} min of agreement`,
      draw: (c, x, y) => {
        c.rect(14, 10).move(x, y - 5).attr({ fill: "#7fa7c9", "fill-opacity": 0.35 });
      },
    },
  ]);
  return serializeSvg(draw, 2, opts.idPrefix ?? "sa-dir");
}
