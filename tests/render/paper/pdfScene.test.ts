/**
 * The PDF painter's two shortcuts against the slow ways they replace: path data turned
 * into PDF operators in one pass (against pdfkit's own SVG-path parser), and a sphere
 * map's cells made apart as one deflated form (against the same cells painted as paths).
 */
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { inflateSync } from "node:zlib";
import PDFDocument from "pdfkit";
import { describe, expect, it } from "vitest";
import { equalAreaGrid } from "../../../geometry/sphereGrid.js";
import { DEG } from "../../../geometry/units.js";
import { pdfOfPages } from "../../../src/render/paper/document.js";
import { pathOperators } from "../../../src/render/paper/pdfScene.js";
import { createScene, nestScene } from "../../../src/render/scene.js";
import { sphereMapCellsPdf, sphereMapScene, type MapCells } from "../../../src/render/sphereMapDrawing.js";
import { itWithPoppler, renderGray } from "../../support/poppler.js";

/** What pdfkit's own path parser writes for `d` (PDF 32000-1:2008, 8.5.2 path-construction operators). */
function pdfkitOperators(d: string): string {
  const doc = new PDFDocument({ autoFirstPage: false, compress: false });
  doc.addPage({ size: [100, 100], margin: 0 });
  const written: string[] = [];
  const page = (doc as unknown as { page: { write(s: string): void } }).page;
  const write = page.write.bind(page);
  page.write = (s: string) => {
    written.push(s);
    write(s);
  };
  doc.path(d);
  return written.join("\n");
}

describe("SVG path data as PDF operators in one pass (pathOperators)", () => {
  const paths = [
    "M10 20L30 40L50 20Z",
    "M141.2 87.5l7.9 -4.1 -2.3 -0.9 -5.6 5Z",
    "m1.5 2.5 3 4 5 6zm10 10 1 1z",
    "M0 0H10V10H0Z M5 5h2v2h-2z",
    "M1 2C3 4 5 6 7 8c1 1 2 2 3 3",
    "M-1.5e1 2E-1L.5 -.25L-0.125-3",
    "M1 1 2 2 3 3",
  ];
  for (const d of paths) {
    it(`writes what pdfkit's parser writes for "${d}" [pdfkit 0.20 SVGPath, the same points rounded alike]`, () => {
      expect(pathOperators(d)).toBe(pdfkitOperators(d));
    });
  }

  it("leaves arcs, quadratics and malformed data to pdfkit's parser (undefined)", () => {
    for (const d of ["M0 0A5 5 0 0 1 10 10", "M0 0Q1 1 2 2", "M0 0L1", "M0 0L1 x", "1 2"]) expect(pathOperators(d)).toBeUndefined();
  });
});

describe("a sphere map's cells made apart as one form (sphereMapCellsPdf)", () => {
  const grid = equalAreaGrid(6 * DEG);
  const values = new Float64Array(grid.count);
  for (let i = 0; i < grid.count; i++) values[i] = Math.sin(3 * grid.points[3 * i]) + grid.points[3 * i + 2] ** 2;
  const options = { widthPx: 720, title: "test map", valueLabel: "value", seamShape: null };

  it("holds one fill-and-stroke per colour step, its corners whole steps of 0.1 px inside the map's box [PDF 32000-1:2008, 8.5.3: B fills and strokes]", () => {
    const ops = inflateSync(sphereMapCellsPdf(values, grid, { widthPx: 720, titled: true }).deflated).toString("latin1");
    const paths = sphereMapScene(values, grid, options).children.find((c) => c.attrs.class === "sa-cells")!.children;
    expect(ops.match(/^B$/gm)!.length).toBe(paths.length);
    // one scaling first (corners as whole steps of 0.1 px), then the corners
    const cm = /^([\d.]+) 0 0 ([\d.]+) 0 0 cm$/m.exec(ops)!;
    expect(Number(cm[1])).toBe(0.1);
    const xs = [...ops.matchAll(/^(-?\d+) (-?\d+) [ml]$/gm)].map((m) => [Number(m[1]) * 0.1, Number(m[2]) * 0.1]);
    expect(xs.length).toBeGreaterThan(grid.count / 2);
    for (const [x, y] of xs) {
      expect(x).toBeGreaterThanOrEqual(0);
      expect(x).toBeLessThanOrEqual(720);
      expect(y).toBeGreaterThanOrEqual(0);
    }
  });

  itWithPoppler("renders the same pixels as the cells painted as paths, at 100 dpi [poppler pdftoppm]", async () => {
    const pageOf = (cellsPdf?: MapCells) => {
      const scene = createScene(612, 792);
      nestScene(scene, sphereMapScene(values, grid, { ...options, ...(cellsPdf ? { cellsPdf } : {}) }), 36, 36, 540, 400);
      return { widthIn: 8.5, heightIn: 11, scene };
    };
    const dir = mkdtempSync(join(tmpdir(), "seam-atlas-form-"));
    const render = async (cellsPdf: MapCells | undefined, name: string) => {
      const f = join(dir, `${name}.pdf`);
      writeFileSync(f, await pdfOfPages([pageOf(cellsPdf)], name));
      return renderGray(f, 1, 100, join(dir, name));
    };
    const paths = await render(undefined, "paths");
    const form = await render(sphereMapCellsPdf(values, grid, { widthPx: 720, titled: true }), "form");
    expect([form.w, form.h]).toEqual([paths.w, paths.h]);
    let differ = 0;
    for (let i = 0; i < paths.px.length; i++) if (Math.abs(paths.px[i] - form.px[i]) > 2) differ++;
    expect(differ).toBe(0);
  });
});
