/// <reference lib="dom" />
/**
 * The turn at a glance: the in-band seam share on each side of the a-split at
 * phases 0..359 deg (the same 360-step timeline `measure` prints as text), each
 * side's turn average as a dashed line, and a cursor at the current phase.
 */
import { PALETTE } from "./palette.js";

export interface TimelineSeries {
  readonly plus: ArrayLike<number>;
  readonly minus: ArrayLike<number>;
  readonly averagePlus: number;
  readonly averageMinus: number;
}

const PAD = { left: 44, right: 18, top: 10, bottom: 24 };

/** Draws the timeline into `canvas` (its CSS size, at the device's pixel ratio). */
export function drawTimeline(canvas: HTMLCanvasElement, series: TimelineSeries, phaseDeg: number): void {
  const ratio = Math.min(2, window.devicePixelRatio || 1);
  const cssWidth = canvas.clientWidth || 320;
  const cssHeight = canvas.clientHeight || 120;
  if (canvas.width !== Math.round(cssWidth * ratio) || canvas.height !== Math.round(cssHeight * ratio)) {
    canvas.width = Math.round(cssWidth * ratio);
    canvas.height = Math.round(cssHeight * ratio);
  }
  const ctx = canvas.getContext("2d");
  if (!ctx) return;
  ctx.setTransform(ratio, 0, 0, ratio, 0, 0);
  ctx.clearRect(0, 0, cssWidth, cssHeight);
  const n = series.plus.length;
  let max = Math.max(series.averagePlus, series.averageMinus);
  for (let i = 0; i < n; i++) max = Math.max(max, series.plus[i], series.minus[i]);
  // round the top up to a whole 5 % so the scale reads easily
  const top = Math.max(0.05, Math.ceil(max / 0.05) * 0.05);
  const w = cssWidth - PAD.left - PAD.right;
  const h = cssHeight - PAD.top - PAD.bottom;
  const x = (deg: number) => PAD.left + (w * deg) / 360;
  const y = (share: number) => PAD.top + h * (1 - share / top);

  ctx.font = `11px system-ui, "Segoe UI", "DejaVu Sans", sans-serif`;
  ctx.fillStyle = PALETTE.muted;
  ctx.strokeStyle = PALETTE.panelEdge;
  ctx.lineWidth = 1;
  ctx.textAlign = "right";
  ctx.textBaseline = "middle";
  for (const share of [0, top / 2, top]) {
    ctx.beginPath();
    ctx.moveTo(PAD.left, y(share));
    ctx.lineTo(PAD.left + w, y(share));
    ctx.stroke();
    const pct = 100 * share;
    ctx.fillText(`${Number.isInteger(Math.round(pct * 10) / 10) ? pct.toFixed(0) : pct.toFixed(1)} %`, PAD.left - 6, y(share));
  }
  ctx.textAlign = "center";
  ctx.textBaseline = "top";
  for (const deg of [0, 90, 180, 270, 360]) ctx.fillText(`${deg}\u00b0`, x(deg), PAD.top + h + 6);

  const line = (values: ArrayLike<number>, color: string) => {
    ctx.strokeStyle = color;
    ctx.lineWidth = 1.8;
    ctx.setLineDash([]);
    ctx.beginPath();
    for (let i = 0; i <= n; i++) {
      const v = values[i % n];
      if (i === 0) ctx.moveTo(x((360 * i) / n), y(v));
      else ctx.lineTo(x((360 * i) / n), y(v));
    }
    ctx.stroke();
  };
  const average = (value: number, color: string) => {
    ctx.strokeStyle = color;
    ctx.lineWidth = 1.2;
    ctx.setLineDash([5, 4]);
    ctx.beginPath();
    ctx.moveTo(PAD.left, y(value));
    ctx.lineTo(PAD.left + w, y(value));
    ctx.stroke();
    ctx.setLineDash([]);
  };
  average(series.averagePlus, PALETTE.sidePlus);
  average(series.averageMinus, PALETTE.sideMinus);
  line(series.plus, PALETTE.sidePlus);
  line(series.minus, PALETTE.sideMinus);

  const phase = ((phaseDeg % 360) + 360) % 360;
  ctx.strokeStyle = PALETTE.text;
  ctx.lineWidth = 1;
  ctx.beginPath();
  ctx.moveTo(x(phase), PAD.top);
  ctx.lineTo(x(phase), PAD.top + h);
  ctx.stroke();
}
