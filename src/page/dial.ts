/// <reference lib="dom" />
/**
 * The seam-movement dial (svg.js on the page's own DOM): the plate seen from behind
 * the pitcher, the arm side on the pitcher's throwing side; one arrow per grip and
 * classic hold in the list from the centre to its seam movement at the plate (inches,
 * the screen's numbers), the chosen one bold; rings every few inches; the wanted
 * direction marked on the rim; and, shaded, how far the seams can push toward each of
 * the four directions over the whole ball (the screen report's reach).
 */
import { SVG, type Svg } from "@svgdotjs/svg.js";
import { fixed } from "../render/numbers.js";
import type { ListedOrientation } from "../render/page3d/data.js";
import { PALETTE } from "../render/page3d/palette.js";
import type { ScreenReport } from "../screening/report.js";

const SIZE = 260;
const CENTRE = SIZE / 2;
const RADIUS = 96;

/** Ring spacing that puts two to five rings inside `maxIn`, inches. */
function ringStep(maxIn: number): number {
  for (const step of [1, 2, 5, 10]) if (maxIn / step <= 5) return step;
  return 20;
}

export class MovementDial {
  private readonly svg: Svg;

  constructor(host: HTMLElement) {
    this.svg = SVG().addTo(host).viewbox(0, 0, SIZE, SIZE).attr({ preserveAspectRatio: "xMidYMid meet", focusable: "false" });
  }

  /** Redraws for a pitch's list with `chosen` bold. */
  draw(report: ScreenReport, listed: readonly ListedOrientation[], chosen: number): void {
    const s = this.svg;
    s.clear();
    const right = report.input.pitch.hand === "right";
    // from behind the pitcher: the catcher's right (field +x) is on the screen's left
    const at = (horizontalIn: number, upIn: number, scale: number): [number, number] => [CENTRE - horizontalIn * scale, CENTRE - upIn * scale];
    const d = report.reach.directions;
    const maxIn = Math.max(1, report.reach.strongestIn, ...listed.map((l) => Math.hypot(l.orientation.seamMovement.horizontalIn, l.orientation.seamMovement.verticalIn)));
    const step = ringStep(maxIn);
    const rings = Math.ceil(maxIn / step);
    const scale = RADIUS / (rings * step);
    // the arm side's sign along field +x (the catcher's right): a right-hander's arm side is -x
    const armX = right ? -1 : 1;
    const reach = [at(armX * d.arm.bestTowardIn, 0, scale), at(0, d.up.bestTowardIn, scale), at(-armX * d.glove.bestTowardIn, 0, scale), at(0, -d.down.bestTowardIn, scale)];
    s.polygon(reach.map((p) => p.join(",")).join(" ")).attr({ fill: PALETTE.flight, "fill-opacity": 0.16, stroke: PALETTE.flight, "stroke-opacity": 0.5, "stroke-width": 1 });
    for (let k = 1; k <= rings; k++) {
      s.circle(2 * k * step * scale).center(CENTRE, CENTRE).attr({ fill: "none", stroke: PALETTE.panelEdge, "stroke-width": 1 });
      // on the ring, up and to the right of the vertical axis, clear of the axis words
      const a = (60 * Math.PI) / 180;
      s.text(`${k * step} in`).font({ size: 10, family: "system-ui, sans-serif" }).attr({ fill: PALETTE.muted, x: CENTRE + k * step * scale * Math.cos(a) + 2, y: CENTRE - k * step * scale * Math.sin(a) - 2 });
    }
    s.line(CENTRE - RADIUS - 6, CENTRE, CENTRE + RADIUS + 6, CENTRE).attr({ stroke: PALETTE.panelEdge });
    s.line(CENTRE, CENTRE - RADIUS - 6, CENTRE, CENTRE + RADIUS + 6).attr({ stroke: PALETTE.panelEdge });
    const word = (text: string, x: number, y: number, anchor: "start" | "middle" | "end") =>
      s.text(text).font({ size: 12, family: "system-ui, sans-serif", anchor, weight: "600" }).attr({ fill: PALETTE.text, x, y });
    word("up", CENTRE, 14, "middle");
    word("down", CENTRE, SIZE - 4, "middle");
    word(right ? "glove side" : "arm side", 4, CENTRE - 6, "start");
    word(right ? "arm side" : "glove side", SIZE - 4, CENTRE - 6, "end");
    const want = report.input.pitch.want;
    if (want !== "any") {
      const dir: Record<string, [number, number]> = { arm: [armX, 0], glove: [-armX, 0], up: [0, 1], down: [0, -1] };
      const [hx, uy] = dir[want];
      const [tx, ty] = at(hx * (RADIUS + 4) / scale, uy * (RADIUS + 4) / scale, scale);
      s.circle(10).center(tx, ty).attr({ fill: PALETTE.caution, stroke: PALETTE.background, "stroke-width": 1.5 }).addClass("want-mark");
    }
    listed.forEach((item, i) => {
      const m = item.orientation.seamMovement;
      const [x, y] = at(m.horizontalIn, m.verticalIn, scale);
      const isChosen = i === chosen;
      const colour = isChosen ? PALETTE.push : item.orientation.reference ? PALETTE.muted : PALETTE.splitLine;
      const line = s.line(CENTRE, CENTRE, x, y).attr({ stroke: colour, "stroke-width": isChosen ? 3.2 : 1.3, "stroke-linecap": "round", "stroke-opacity": isChosen ? 1 : 0.7 });
      if (item.orientation.reference) line.attr({ "stroke-dasharray": "4 3" });
      s.circle(isChosen ? 8 : 5).center(x, y).attr({ fill: colour });
      line.addClass(isChosen ? "chosen" : "other").data("inches", fixed(Math.hypot(m.horizontalIn, m.verticalIn), 1));
    });
    s.findOne(".chosen")?.front();
  }
}
