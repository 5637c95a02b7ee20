/**
 * A line chart of a one-turn timeline: the in-band seam share on each side of the
 * spin axis at each phase, with each side's turn average as a dashed line. Drawn
 * with svg.js (src/render/svgContext.ts); deterministic.
 */
import { addText, createScene, serializeScene, type SceneNode } from "../scene.js";
import { polylinePath } from "../svgPath.js";

export interface TimelineSeries {
  readonly label: string;
  readonly values: ArrayLike<number>;
  readonly color: string;
}

export interface TimelineChartOptions {
  readonly title: string;
  readonly widthPx?: number;
  readonly heightPx?: number;
  /** Top of the y axis (a share, 0..1); default: the largest value rounded up to 5 %. */
  readonly yMax?: number;
  readonly idPrefix?: string;
}

export function renderTimelineSvg(series: readonly TimelineSeries[], o: TimelineChartOptions): string {
  return serializeScene(timelineScene(series, o), 1, o.idPrefix ?? "tl");
}

/** The chart as drawing commands (render/scene.ts). */
export function timelineScene(series: readonly TimelineSeries[], o: TimelineChartOptions): SceneNode {
  const W = o.widthPx ?? 420;
  const H = o.heightPx ?? 300;
  const left = 46, right = 12, top = 34, bottom = 44 + 14 * series.length;
  const draw = createScene(W, H);
  draw.rect(W, H).attr({ fill: "#ffffff" });
  let max = 0;
  for (const s of series) for (let i = 0; i < s.values.length; i++) max = Math.max(max, s.values[i]);
  const yMax = o.yMax ?? Math.max(0.05, Math.ceil(max * 20) / 20);
  const x = (phaseDeg: number) => left + ((W - left - right) * phaseDeg) / 360;
  const y = (share: number) => H - bottom - ((H - top - bottom) * share) / yMax;
  const g = draw.group();
  addText(draw, W / 2, 18, o.title, { sizePx: 13, weight: "bold", anchor: "middle", fill: "#1b1b1b" });
  // axes and grid
  const step = yMax > 0.4 ? 0.1 : 0.05;
  for (let k = 0; k * step <= yMax + 1e-9; k++) {
    const v = k * step;
    g.path().attr({ d: `M${left} ${y(v)}L${W - right} ${y(v)}`, stroke: "#e2ded5", "stroke-width": 1, fill: "none" });
    addText(draw, left - 6, y(v) + 4, `${Math.round(100 * v)} %`, { sizePx: 10, anchor: "end", fill: "#555555" });
  }
  for (const p of [0, 90, 180, 270, 360]) addText(draw, x(p), H - bottom + 16, `${p}`, { sizePx: 10, anchor: "middle", fill: "#555555" });
  addText(draw, (left + W - right) / 2, H - bottom + 32, "phase through one turn, deg", { sizePx: 10, anchor: "middle", fill: "#555555" });
  g.path().attr({ d: `M${left} ${top}L${left} ${H - bottom}L${W - right} ${H - bottom}`, stroke: "#555555", "stroke-width": 1, fill: "none" });
  series.forEach((s, k) => {
    const n = s.values.length;
    const xy = new Float64Array(2 * (n + 1));
    let sum = 0;
    for (let i = 0; i <= n; i++) {
      const v = s.values[i % n];
      if (i < n) sum += v;
      xy[2 * i] = x((360 * i) / n);
      xy[2 * i + 1] = y(v);
    }
    g.path().attr({ d: polylinePath(xy, false, 1), stroke: s.color, "stroke-width": 1.6, fill: "none" });
    const mean = sum / n;
    g.path().attr({ d: `M${x(0)} ${y(mean)}L${x(360)} ${y(mean)}`, stroke: s.color, "stroke-width": 1.2, "stroke-dasharray": "5 3", fill: "none" });
    addText(draw, left, H - bottom + 46 + 14 * k, `${s.label}; dashed: its turn average, ${(100 * mean).toFixed(1)} %`, { sizePx: 10, fill: s.color });
  });
  return draw;
}
