import { describe, expect, it } from "vitest";
import { equalAreaGrid } from "../../geometry/sphereGrid.js";
import { rampColor } from "../../src/render/colorScale.js";
import { HAMMER_HALF_HEIGHT, HAMMER_HALF_WIDTH, hammerProject } from "../../src/render/hammer.js";
import { renderSphereMapSvg, scaleRange } from "../../src/render/sphereMapDrawing.js";
import { elements, shoelaceArea, subpaths, texts, xmlProblems } from "../support/svgCheck.js";
import { DEG } from "../../geometry/units.js";

const grid = equalAreaGrid(4 * DEG);
// value = height z of the cell centre: uniform over the sphere's area (Archimedes' hat-box theorem)
const heights = new Float64Array(grid.count).map((_, i) => grid.points[3 * i + 2]);
const WIDTH_PX = 720;
const LEVELS = 8;
const options = {
  widthPx: WIDTH_PX,
  title: "Height of the axis",
  valueLabel: "z (ball radii)",
  levels: LEVELS,
  candidates: [{ direction: [0, 1, 0] as [number, number, number], label: "1" }, { direction: [0.5, -0.5, 0.7] as [number, number, number], label: "2" }],
  referenceHolds: [{ direction: [-1, 0.2, 0.1] as [number, number, number], label: "hold A" }],
};
const svg = renderSphereMapSvg(heights, grid, options);
const outline = elements(svg, "ellipse")[0];
const scale = Number(outline.rx) / HAMMER_HALF_WIDTH; // px per unit-sphere length
const cx = Number(outline.cx), cy = Number(outline.cy);
const group = (cls: string) => new RegExp(`<g class="${cls}">([\\s\\S]*?)</g>`).exec(svg)![1];

describe("sphere map drawing", () => {
  it("is deterministic, free of svg.js ids and one well-formed <svg> element", () => {
    expect(renderSphereMapSvg(heights, grid, options)).toBe(svg);
    expect(svg).not.toMatch(/Svgjs|data-svgjs/);
    expect(xmlProblems(svg)).toEqual([]);
  });

  it("has the Hammer outline: semi-axes 2 sqrt 2 and sqrt 2 at one scale (closed form), to 0.1 px", () => {
    expect(Math.abs(Number(outline.ry) - HAMMER_HALF_HEIGHT * scale)).toBeLessThan(0.1);
  });

  it("tiles the whole ellipse with its cells: their polygon areas add up to pi a b within 0.5 %", () => {
    let area = 0;
    for (const p of elements(group("sa-cells"), "path")) for (const sub of subpaths(p.d)) area += Math.abs(shoelaceArea(sub));
    const ellipse = Math.PI * Number(outline.rx) * Number(outline.ry);
    expect(Math.abs(area / ellipse - 1)).toBeLessThan(5e-3);
  });

  it("gives each colour step the map area its cells have on the sphere (equal area), within 0.002 of the whole", () => {
    const paths = elements(group("sa-cells"), "path");
    expect(paths).toHaveLength(LEVELS);
    const total = paths.reduce((s, p) => s + subpaths(p.d).reduce((t, sub) => t + Math.abs(shoelaceArea(sub)), 0), 0);
    for (let k = 0; k < LEVELS; k++) {
      const colour = rampColor((k + 0.5) / LEVELS);
      const path = paths.find((p) => p.fill === colour)!;
      const area = subpaths(path.d).reduce((t, sub) => t + Math.abs(shoelaceArea(sub)), 0);
      // the same binning as the renderer: level = floor((z - min) / (max - min) * levels)
      let lo = Infinity, hi = -Infinity;
      for (const z of heights) (lo = Math.min(lo, z)), (hi = Math.max(hi, z));
      const cells = heights.filter((z) => Math.min(LEVELS - 1, Math.floor(((z - lo) / (hi - lo)) * LEVELS)) === k).length;
      expect(Math.abs(area / total - cells / grid.count)).toBeLessThan(2e-3);
    }
  });

  it("cuts the seam where it crosses longitude 180 deg: no step longer than a tenth of the map, and the cut ends on the outline", () => {
    const subs = subpaths(elements(group("sa-seam"), "path")[0].d);
    expect(subs.length).toBeGreaterThan(1);
    for (const sub of subs) {
      for (let i = 2; i < sub.length; i += 2) expect(Math.hypot(sub[i] - sub[i - 2], sub[i + 1] - sub[i - 1])).toBeLessThan(0.1 * WIDTH_PX);
    }
    // every cut end lies on the ellipse (x/a)^2 + (y/b)^2 = 1, to the 0.1 px rounding
    let ends = 0;
    for (const sub of subs) {
      for (const i of [0, sub.length - 2]) {
        const u = (sub[i] - cx) / Number(outline.rx), w = (sub[i + 1] - cy) / Number(outline.ry);
        if (Math.abs(u) > 0.5 && Math.abs(Math.hypot(u, w) - 1) < 0.01) ends++;
      }
    }
    expect(ends).toBeGreaterThanOrEqual(2);
  });

  it("puts candidate 1 (+y: lon 90 deg, lat 0) where the Hammer formulas put it, to 0.1 px, as a hexagon with its number", () => {
    const hexagons = elements(svg, "polygon").filter((p) => p.class === "sa-candidate");
    expect(hexagons).toHaveLength(3); // two on the map, one in the legend
    const pts = hexagons[0].points.split(" ").map((q) => q.split(",").map(Number));
    expect(pts).toHaveLength(6);
    const mx = pts.reduce((s, q) => s + q[0], 0) / 6, my = pts.reduce((s, q) => s + q[1], 0) / 6;
    const [hx, hy] = hammerProject(Math.PI / 2, 0);
    expect(Math.abs(mx - (cx + scale * hx))).toBeLessThan(0.1);
    expect(Math.abs(my - (cy - scale * hy))).toBeLessThan(0.1);
    expect(texts(svg)).toEqual(expect.arrayContaining(["1", "2", "hold A"]));
    expect(elements(svg, "rect").filter((r) => r.class === "sa-hold")).toHaveLength(2); // one on the map, one in the legend
  });

  it("names the projection, the value label and the colour range in the legend", () => {
    const t = texts(svg).join(" | ");
    expect(t).toContain("Hammer equal-area projection");
    expect(t).toContain("z (ball radii)");
    const zs = [...heights];
    expect(texts(svg)).toContain(Math.min(...zs).toFixed(3));
    expect(texts(svg)).toContain(Math.max(...zs).toFixed(3));
  });

  it("rejects values that do not match the grid, and an all-NaN field, with a RangeError", () => {
    expect(() => renderSphereMapSvg(new Float64Array(3), grid)).toThrow(RangeError);
    expect(() => renderSphereMapSvg(new Float64Array(grid.count).fill(Number.NaN), grid)).toThrow(RangeError);
  });
});

describe("sphere map colour scale", () => {
  it("reaches the numbers of the grips it marks, which are refined between the cells and can beat every cell (the legend's top is never below the best grip printed beside it)", () => {
    const grid = equalAreaGrid(10 * DEG);
    const values = new Float64Array(grid.count).map((_, i) => (i % 7) / 2);
    const [lo, hi] = scaleRange(values, [3.4, -0.2]);
    expect(lo).toBe(-0.2);
    expect(hi).toBe(3.4);
    expect(scaleRange(values, [])).toEqual([0, 3]);
    const svg = renderSphereMapSvg(values, grid, { range: scaleRange(values, [3.4]), valueDigits: 1 });
    expect(texts(svg)).toContain("3.4");
  });
});

describe("sphere map labels and markers", () => {
  it("moves a longitude label that a grip's marker would cover under the equator, or leaves it out (the marker stays readable; the graticule line stays)", () => {
    const grid = equalAreaGrid(10 * DEG);
    const values = new Float64Array(grid.count).fill(1);
    const plain = renderSphereMapSvg(values, grid, {});
    const marked = renderSphereMapSvg(values, grid, { candidates: [{ direction: [1, 0, 0], label: "1" }] });
    const zeroLabel = (svg: string) => {
      const g = /<g class="sa-graticule-labels">([\s\S]*?)<\/g>/.exec(svg)![1];
      const m = [...g.matchAll(/<text x="([\d.]+)" y="([\d.]+)"[^>]*>0°<\/text>/g)].map((x) => [Number(x[1]), Number(x[2])]);
      return m.length ? m[m.length - 1] : undefined;
    };
    const before = zeroLabel(plain)!;
    const after = zeroLabel(marked);
    // lon 0, lat 0 is where the marker sits: the label is no longer just above it
    if (after) expect(after[1]).toBeGreaterThan(before[1] + 8);
    expect(marked).toContain('class="sa-candidate"');
  });
});
