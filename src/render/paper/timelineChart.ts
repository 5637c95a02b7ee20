/**
 * A line chart of a one-turn timeline (render/scene.ts): any number of series over
 * the phase 0..360 deg, each with its turn average as a dashed line, a zero line
 * when the values change sign, and round ticks on the value axis. Deterministic.
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
  /** What the values are, with their unit, printed beside the value axis. */
  readonly valueLabel?: string;
  readonly widthPx?: number;
  readonly heightPx?: number;
  /** Value axis limits (default: the data's, rounded out to a tick). */
  readonly yMin?: number;
  readonly yMax?: number;
  /** Tick text for a value (default: the value with the step's decimals). */
  readonly tick?: (value: number) => string;
  readonly idPrefix?: string;
}

function niceStep(raw: number): number {
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  return (m < 1.5 ? 1 : m < 3.5 ? 2 : m < 7.5 ? 5 : 10) * p;
}

export function renderTimelineSvg(series: readonly TimelineSeries[], o: TimelineChartOptions): string {
  return serializeScene(timelineScene(series, o), 1, o.idPrefix ?? "tl");
}

/** The chart as drawing commands (render/scene.ts). */
export function timelineScene(series: readonly TimelineSeries[], o: TimelineChartOptions): SceneNode {
  const W = o.widthPx ?? 420;
  const H = o.heightPx ?? 300;
  const left = 52, right = 12, top = 34, bottom = 44 + 14 * series.length;
  const draw = createScene(W, H).attr({ "font-family": "Noto Sans, sans-serif" });
  draw.rect(W, H).attr({ fill: "#ffffff" });
  let lo = Infinity, hi = -Infinity;
  for (const s of series) for (let i = 0; i < s.values.length; i++) {
    lo = Math.min(lo, s.values[i]);
    hi = Math.max(hi, s.values[i]);
  }
  if (!(hi > lo)) hi = lo + 1;
  const step = niceStep(((o.yMax ?? hi) - (o.yMin ?? Math.min(0, lo))) / 5);
  const yMin = o.yMin ?? Math.floor(Math.min(0, lo) / step) * step;
  const yMax = o.yMax ?? Math.ceil(hi / step) * step;
  const x = (phaseDeg: number) => left + ((W - left - right) * phaseDeg) / 360;
  const y = (v: number) => H - bottom - ((H - top - bottom) * (v - yMin)) / (yMax - yMin);
  const g = draw.group();
  addText(draw, W / 2, 18, o.title, { sizePx: 13, weight: "bold", anchor: "middle", fill: "#1b1b1b" });
  const digits = step >= 1 ? 0 : step >= 0.1 ? 1 : 2;
  const tick = o.tick ?? ((v: number) => v.toFixed(digits));
  for (let k = Math.ceil(yMin / step - 1e-9); k * step <= yMax + 1e-9 * step; k++) {
    const v = k * step;
    g.path().attr({ d: `M${left} ${y(v)}L${W - right} ${y(v)}`, stroke: Math.abs(v) < step * 1e-9 ? "#8a8a8a" : "#e2ded5", "stroke-width": 1, fill: "none" });
    addText(draw, left - 6, y(v) + 4, tick(Math.abs(v) < step * 1e-9 ? 0 : v), { sizePx: 10, anchor: "end", fill: "#444444" });
  }
  if (o.valueLabel) addText(draw, left, top - 6, o.valueLabel, { sizePx: 10, fill: "#444444" });
  for (const p of [0, 90, 180, 270, 360]) addText(draw, x(p), H - bottom + 16, `${p}`, { sizePx: 10, anchor: "middle", fill: "#444444" });
  addText(draw, (left + W - right) / 2, H - bottom + 32, "phase through one turn, degrees", { sizePx: 10, anchor: "middle", fill: "#444444" });
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
    addText(draw, left, H - bottom + 46 + 14 * k, `${s.label}; dashed: its turn average, ${tick(mean)}`, { sizePx: 10, fill: s.color });
  });
  return draw;
}
