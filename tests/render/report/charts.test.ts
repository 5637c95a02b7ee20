/**
 * The bullpen report's charts as drawings: the same data gives the same SVG bytes,
 * every label lies inside the drawing whatever the name's length or script, the
 * shaded band of agreement has the area of a band about the diagonal of a square,
 * and the same drawing rasterises to PNG.
 */
import { describe, expect, it } from "vitest";
import { PNG_WIDTH_PX, sceneToPng } from "../../../src/render/png.js";
import { CHART_HEIGHT, CHART_WIDTH, directionChartScene, directionChartSvg, movementChartScene, movementChartSvg } from "../../../src/render/report/charts.js";
import type { SceneNode } from "../../../src/render/scene.js";
import { NAMES, pitcher, pitchType, textExtents } from "./fixture.js";


function find(node: SceneNode, pred: (n: SceneNode) => boolean, out: SceneNode[] = []): SceneNode[] {
  if (pred(node)) out.push(node);
  for (const c of node.children) find(c, pred, out);
  return out;
}

const LONG = `${NAMES.vietnamese} ${NAMES.greek} ${NAMES.cyrillic} de la Santísima Trinidad`;

describe("bullpen report charts", () => {
  it("give the same SVG bytes for the same data, with the drawing's 520 x 470 px viewBox [determinism: STYLE.md]", () => {
    const p = pitcher(NAMES.latin, ["sinker", "slider"]);
    const a = movementChartSvg(p, { basis: "trade", windowFt: 50 });
    expect(movementChartSvg(structuredClone(p), { basis: "trade", windowFt: 50 })).toBe(a);
    expect(a).toMatch(/^<svg[^>]*viewBox="0 0 520 470"/);
    expect(a).toContain(`${NAMES.latin}: movement (trade basis, last 50 ft)`);
    const d = directionChartSvg(p, { gapFlagMinutes: 20 });
    expect(directionChartSvg(structuredClone(p), { gapFlagMinutes: 20 })).toBe(d);
    expect(d).toContain("within 20 min of agreement");
  });

  it("keep every label inside the drawing (0 to 520 px across, 0 to 470 px down), long names and eight pitch types included [property]", () => {
    const many = ["four-seam fastball", "two-seam fastball", "changeup", "curveball", "slider", "sweeper", "splitter", "knuckle curve"];
    for (const name of [NAMES.latin, LONG, `${LONG} ${LONG}`]) {
      const p = pitcher(name, many);
      for (const scene of [movementChartScene(p, { basis: "trade", windowFt: 50 }), directionChartScene(p, { gapFlagMinutes: 20 })]) {
        const texts = textExtents(scene);
        expect(texts.length).toBeGreaterThan(20);
        for (const t of texts) {
          expect(t.left, t.text).toBeGreaterThanOrEqual(0);
          expect(t.right, t.text).toBeLessThanOrEqual(CHART_WIDTH);
          expect(t.y, t.text).toBeGreaterThan(0);
          expect(t.y, t.text).toBeLessThanOrEqual(CHART_HEIGHT);
        }
      }
    }
  });

  it("draws one filled and one open mark per throw on the movement chart [definition: charts.ts header]", () => {
    const p = pitcher(NAMES.cyrillic, ["sinker", "slider", "changeup"]);
    const throws = p.types.reduce((n, t) => n + t.throws.length, 0);
    const scene = movementChartScene(p, { basis: "release", windowFt: null });
    const layers = find(scene, (n) => n.attrs.class === "sa-type");
    expect(layers).toHaveLength(3);
    const marks = layers.flatMap((l) => l.children.filter((c) => c.tag !== "path" && !(c.tag === "polygon" && c.attrs.opacity !== undefined)));
    expect(marks.filter((m) => m.attrs.fill === "#ffffff")).toHaveLength(throws);
    expect(marks.filter((m) => m.attrs.fill !== "#ffffff")).toHaveLength(throws);
    expect(textExtents(scene).map((t) => t.text)).toContain("up at the plate, in");
  });

  it("shades the band |observed - spin-based| <= 20 min over the plot: area share 1 - (1 - b/L)^2 of the square, L the plot's 90 min side [closed form: a square less two corner triangles]", () => {
    // spin-based 1:00 to 1:30 and observed on it: the plot runs 0:45 to 2:15 in 15 min steps (charts.ts)
    const t = pitchType("sinker", 0, { rows: 16 });
    const p = { name: "Ode Mbeki", hand: "right", view: "pitcher", types: [{ ...t, throws: t.throws.map((x, k) => ({ ...x, spinMinutes: 60 + 4 * k, observedMinutes: 60 + 4 * k })) }] };
    const scene = directionChartScene(p, { gapFlagMinutes: 20 });
    const frame = find(scene, (n) => n.attrs.class === "sa-frame")[0].children.find((c) => c.tag === "rect")!;
    const plotArea = Number(frame.attrs.width) * Number(frame.attrs.height);
    const band = find(scene, (n) => n.tag === "polygon" && n.attrs["fill-opacity"] === 0.18)[0];
    const xy = String(band.attrs.points).split(" ").map((s) => s.split(",").map(Number));
    let twice = 0;
    for (let i = 0; i < xy.length; i++) {
      const [x0, y0] = xy[i];
      const [x1, y1] = xy[(i + 1) % xy.length];
      twice += x0 * y1 - x1 * y0;
      // every corner on or inside the plot
      expect(x0).toBeGreaterThanOrEqual(Number(frame.attrs.x) - 1e-9);
      expect(x0).toBeLessThanOrEqual(Number(frame.attrs.x) + Number(frame.attrs.width) + 1e-9);
      expect(y0).toBeGreaterThanOrEqual(Number(frame.attrs.y) - 1e-9);
      expect(y0).toBeLessThanOrEqual(Number(frame.attrs.y) + Number(frame.attrs.height) + 1e-9);
    }
    const share = Math.abs(twice) / 2 / plotArea;
    expect(share).toBeCloseTo(1 - (1 - 20 / 90) ** 2, 9);
  });

  it("rasterises the same drawing to a PNG 1600 px wide, 1600 x 470 / 520 px high [PNG, ISO/IEC 15948 sec. 11.2.2: IHDR width and height]", () => {
    const png = sceneToPng(directionChartScene(pitcher(NAMES.greek, ["sinker"]), { gapFlagMinutes: 20 }));
    expect(png.subarray(0, 8).toString("latin1")).toBe("\x89PNG\r\n\x1a\n");
    expect(png.readUInt32BE(16)).toBe(PNG_WIDTH_PX);
    expect(Math.abs(png.readUInt32BE(20) - Math.round((PNG_WIDTH_PX * CHART_HEIGHT) / CHART_WIDTH))).toBeLessThanOrEqual(1);
  });
});
