/// <reference lib="dom" />
/**
 * The turn at a glance (svg.js on the page's own DOM): the in-band seam share on each
 * side of the a-split at phases 0..359 deg (the same 360-step timeline `measure`
 * prints as text), each side's turn average as a dashed line, and a cursor at the
 * current phase, moved without redrawing the rest.
 */
import { SVG, type Line, type Svg } from "@svgdotjs/svg.js";
import { PALETTE } from "../render/page3d/palette.js";

export interface TimelineSeries {
  readonly plus: ArrayLike<number>;
  readonly minus: ArrayLike<number>;
  readonly averagePlus: number;
  readonly averageMinus: number;
}

const W = 360;
const H = 130;
const PAD = { left: 40, right: 16, top: 8, bottom: 22 };

export class TimelinePlot {
  private readonly svg: Svg;
  private cursor: Line | null = null;

  constructor(host: HTMLElement) {
    this.svg = SVG().addTo(host).viewbox(0, 0, W, H).attr({ preserveAspectRatio: "xMidYMid meet", focusable: "false" });
  }

  private x(deg: number): number {
    return PAD.left + ((W - PAD.left - PAD.right) * deg) / 360;
  }

  /** Redraws the series (once per orientation). */
  draw(series: TimelineSeries): void {
    const s = this.svg;
    s.clear();
    const n = series.plus.length;
    let max = Math.max(series.averagePlus, series.averageMinus);
    for (let i = 0; i < n; i++) max = Math.max(max, series.plus[i], series.minus[i]);
    // round the top up to a whole 5 % so the scale reads easily
    const top = Math.max(0.05, Math.ceil(max / 0.05 - 1e-9) * 0.05);
    const h = H - PAD.top - PAD.bottom;
    const y = (share: number) => PAD.top + h * (1 - share / top);
    const font = { size: 10, family: "system-ui, sans-serif" };
    for (const share of [0, top / 2, top]) {
      s.line(PAD.left, y(share), this.x(360), y(share)).attr({ stroke: PALETTE.panelEdge });
      const pct = Math.round(1000 * share) / 10;
      s.text(`${Number.isInteger(pct) ? pct.toFixed(0) : pct.toFixed(1)} %`).font({ ...font, anchor: "end" }).attr({ fill: PALETTE.muted, x: PAD.left - 5, y: y(share) + 3.5 });
    }
    for (const deg of [0, 90, 180, 270, 360]) s.text(`${deg}\u00b0`).font({ ...font, anchor: "middle" }).attr({ fill: PALETTE.muted, x: this.x(deg), y: H - 6 });
    const average = (value: number, colour: string) => s.line(PAD.left, y(value), this.x(360), y(value)).attr({ stroke: colour, "stroke-width": 1.2, "stroke-dasharray": "5 4" });
    const curve = (values: ArrayLike<number>, colour: string) => {
      const points: [number, number][] = [];
      for (let i = 0; i <= n; i++) points.push([this.x((360 * i) / n), y(values[i % n])]);
      s.polyline(points).attr({ fill: "none", stroke: colour, "stroke-width": 1.8 });
    };
    average(series.averagePlus, PALETTE.sidePlus);
    average(series.averageMinus, PALETTE.sideMinus);
    if (n) {
      curve(series.plus, PALETTE.sidePlus);
      curve(series.minus, PALETTE.sideMinus);
    }
    this.cursor = s.line(this.x(0), PAD.top, this.x(0), PAD.top + h).attr({ stroke: PALETTE.text, "stroke-width": 1 }).addClass("phase-cursor");
  }

  /** Moves the phase cursor, degrees. */
  setPhase(phaseDeg: number): void {
    const x = this.x(((phaseDeg % 360) + 360) % 360);
    this.cursor?.attr({ x1: x, x2: x });
  }
}
