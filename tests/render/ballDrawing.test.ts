import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { angleToSeam } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { BALL_RADIUS_IN } from "../../geometry/ball.js";
import { sampleSeam } from "../../geometry/seamSamples.js";
import { stitchLayout } from "../../geometry/stitches.js";
import { angleBetween, cross3, dot3, perpendicularUnit, unit3, type Vec3 } from "../../geometry/vec.js";
import { DEFAULT_BAND } from "../../src/sampling/band.js";
import { renderBallSvg, type BallModel } from "../../src/render/ballDrawing.js";
import { SEAM_HALF_WIDTH_RAD } from "../../src/render/ballSeam.js";
import { projectPoint, viewFromDirections, viewLookingAlong, type View } from "../../src/render/projection.js";
import { elements, shoelaceArea, subpaths, texts, xmlProblems } from "../support/svgCheck.js";

const b = DEFAULT_SEAM_SHAPE;
const SIZE_PX = 360;
/** Disc of the default layout without a title: R = 0.36 size, centred in the top square (ballDrawing.ts). */
const R = 0.36 * SIZE_PX, CX = SIZE_PX / 2, CY = SIZE_PX / 2;
/** Coordinates are written to 0.01 px, so they sit within half of that of the exact value. */
const ROUND_PX = 0.005 + 1e-9;

const waistView = viewLookingAlong([0, 0, -1], [0, 1, 0]);
const obliqueView = viewFromDirections([1, 1, 1], [0, 0, 1]);

/** The ball-frame point under drawing position (x, y) on the visible hemisphere (inverse of the projection), with its height z toward the viewer. */
function unproject(view: View, x: number, y: number): { p: Vec3; z: number } {
  const X = (x - CX) / R, Y = (CY - y) / R;
  const z = Math.sqrt(Math.max(0, 1 - X * X - Y * Y));
  const p: Vec3 = [0, 1, 2].map((k) => X * view.right[k] + Y * view.up[k] + z * view.toViewer[k]) as Vec3;
  return { p, z };
}

/** The d attribute of the first path inside the element with class `cls` (or of the path with that class). */
function pathOf(svg: string, cls: string, nth = 0): string {
  const own = elements(svg, "path").filter((a) => a.class === cls);
  if (own.length) return own[nth].d;
  const m = new RegExp(`<g class="${cls}">([\\s\\S]*?)</g>`).exec(svg);
  if (!m) throw new Error(`no ${cls} in the drawing`);
  return elements(m[1], "path")[nth].d;
}

const fullModel: BallModel = {
  seamShape: b,
  view: waistView,
  title: "Waist A toward the viewer",
  caption: "orthographic, b = 0.301",
  overlays: {
    spinAxis: [1, 0.4, 0.5],
    flowBand: { flowDirection: [0.3, -0.8, 0.5], band: DEFAULT_BAND },
    fingerPads: [
      { direction: [0.2, 0.5, 1], label: "index", radiusIn: 0.3 },
      { direction: [-0.4, 0.5, 1], label: "middle", radiusIn: 0.3 },
      { direction: [0, -1, -0.3], label: "thumb", radiusIn: 0.35 },
    ],
    push: { direction: [1, 1, 0], frame: "view", label: "push" },
    landmarks: "all",
  },
};

describe("ball drawing: output", () => {
  it("is deterministic: two renders, with other drawings between them, give identical strings with no svg.js ids", () => {
    const first = renderBallSvg(fullModel);
    renderBallSvg({ seamShape: 0.25, view: obliqueView });
    const second = renderBallSvg(fullModel);
    expect(second).toBe(first);
    expect(first).not.toMatch(/Svgjs|data-svgjs/);
  });

  it("is one well-formed <svg> element whose attribute numbers have at most 2 decimals (opacities 3)", () => {
    const svg = renderBallSvg(fullModel);
    expect(xmlProblems(svg)).toEqual([]);
    expect(svg.match(/<svg\b/g)).toHaveLength(1);
    for (const m of svg.matchAll(/\s([\w:-]+)="([^"]*)"/g)) {
      const limit = /opacity$|^offset$/.test(m[1]) ? 3 : 2;
      expect(m[2]).not.toMatch(new RegExp(`\\d\\.\\d{${limit + 1}}`));
    }
  });

  it("names its gradient with the caller's id prefix, so two drawings can share a page", () => {
    const svg = renderBallSvg({ seamShape: b, view: waistView }, { idPrefix: "card3" });
    expect(svg).toContain('id="card3-cover-shade"');
    expect(svg).toContain('fill="url(#card3-cover-shade)"');
  });
});

describe("ball drawing: geometry on the page", () => {
  // no title, so the disc sits at (CX, CY)
  const svg = renderBallSvg({ ...fullModel, title: undefined, caption: undefined }, { legend: false });

  it("puts the seam band's edges half the seam width (3/32 in on the 9 1/8 in ball, common practice) from the seam centre line, within 0.001 rad", () => {
    const seam = sampleSeam(b, 8192).points;
    let checked = 0;
    for (const sub of subpaths(pathOf(svg, "sa-seam"))) {
      for (let i = 0; i < sub.length; i += 2) {
        const { p, z } = unproject(waistView, sub[i], sub[i + 1]);
        if (z < 0.3) continue; // near the limb the inverse projection magnifies the 0.01 px rounding
        expect(Math.abs(angleToSeam(p, seam) - SEAM_HALF_WIDTH_RAD)).toBeLessThan(1e-3);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(500);
    expect(Math.abs(SEAM_HALF_WIDTH_RAD * BALL_RADIUS_IN - 3 / 32)).toBeLessThan(1e-12);
  });

  it("draws one V per double stitch whose centre faces the viewer (count cross-checked against stitchLayout), each of 3 points", () => {
    const layout = stitchLayout(b);
    let facing = 0;
    for (let j = 0; j < layout.count; j++) {
      const c: Vec3 = [layout.centres[3 * j], layout.centres[3 * j + 1], layout.centres[3 * j + 2]];
      if (projectPoint(waistView, { radiusPx: R, centerXPx: CX, centerYPx: CY }, c).depthPx > 0) facing++;
    }
    const vs = subpaths(pathOf(svg, "sa-stitches"));
    expect(vs).toHaveLength(facing);
    expect(facing).toBeGreaterThan(30);
    expect(facing).toBeLessThan(78);
    for (const v of vs) expect(v).toHaveLength(6);
  });

  it("draws the band edges at c -+ w/2 = 80 and 120 deg from the stagnation point and tints only between them (unprojected, within 0.002 rad)", () => {
    const v: Vec3 = [0.3, -0.8, 0.5];
    const [t1, t2] = [DEFAULT_BAND.centerRad - DEFAULT_BAND.widthRad / 2, DEFAULT_BAND.centerRad + DEFAULT_BAND.widthRad / 2];
    const tint = subpaths(pathOf(svg, "sa-band", 0));
    const edges = subpaths(pathOf(svg, "sa-band", 1));
    let n = 0;
    for (const sub of edges) {
      for (let i = 0; i < sub.length; i += 2) {
        const { p, z } = unproject(waistView, sub[i], sub[i + 1]);
        if (z < 0.3) continue;
        const theta = angleBetween(p, v);
        expect(Math.min(Math.abs(theta - t1), Math.abs(theta - t2))).toBeLessThan(2e-3);
        n++;
      }
    }
    expect(n).toBeGreaterThan(50);
    for (const sub of tint) {
      for (let i = 0; i < sub.length; i += 2) {
        const { p, z } = unproject(waistView, sub[i], sub[i + 1]);
        if (z < 0.3) continue;
        const theta = angleBetween(p, v);
        expect(theta).toBeGreaterThan(t1 - 2e-3);
        expect(theta).toBeLessThan(t2 + 2e-3);
      }
    }
  });

  // one flight direction facing the viewer and one facing away: in the second, the band's far edge (120 deg) shows and its near edge (80 deg) does not
  it.each([
    [[0.3, -0.8, 0.5]],
    [[0.3, -0.8, -0.5]],
  ] as [Vec3][])("tints exactly the visible part of the band for flight %j: the tint's area is R^2 times the integral of max(0, p . toViewer) over the band (orthographic area), within 1 %", (flight) => {
    const v = unit3(flight);
    const [t1, t2] = [DEFAULT_BAND.centerRad - DEFAULT_BAND.widthRad / 2, DEFAULT_BAND.centerRad + DEFAULT_BAND.widthRad / 2];
    const e1 = perpendicularUnit(v), e2 = cross3(v, e1);
    // midpoint rule in (theta, phi); dA = sin(theta) dtheta dphi
    const nt = 400, np = 720;
    let expected = 0;
    for (let i = 0; i < nt; i++) {
      const th = t1 + ((i + 0.5) * (t2 - t1)) / nt;
      for (let j = 0; j < np; j++) {
        const ph = ((j + 0.5) * 2 * Math.PI) / np;
        const p = [0, 1, 2].map((k) => Math.cos(th) * v[k] + Math.sin(th) * (Math.cos(ph) * e1[k] + Math.sin(ph) * e2[k])) as Vec3;
        expected += Math.max(0, dot3(p, waistView.toViewer)) * Math.sin(th);
      }
    }
    expected *= R * R * ((t2 - t1) / nt) * ((2 * Math.PI) / np);
    const one = renderBallSvg({ seamShape: b, view: waistView, overlays: { flowBand: { flowDirection: flight, band: DEFAULT_BAND } } });
    const drawn = subpaths(pathOf(one, "sa-band", 0)).reduce((a, sub) => a + Math.abs(shoelaceArea(sub)), 0);
    expect(expected).toBeGreaterThan(1000); // the band is well in view
    expect(Math.abs(drawn / expected - 1)).toBeLessThan(0.01);
  });

  it("seen from the stagnation point, tints the ring from theta = 80 deg (radius R sin 80 deg) out to the limb and draws no 120 deg edge (closed form), to 0.01 px", () => {
    const v: Vec3 = [0.3, -0.8, 0.5];
    const one = renderBallSvg({ seamShape: b, view: viewFromDirections(v, [0, 0, 1]), overlays: { flowBand: { flowDirection: v, band: DEFAULT_BAND } } });
    const tint = subpaths(pathOf(one, "sa-band", 0));
    expect(tint).toHaveLength(2);
    const radii = tint.map((sub) => sub.filter((_, i) => i % 2 === 0).map((x, k) => Math.hypot(x - CX, sub[2 * k + 1] - CY)));
    for (const r of radii[0]) expect(Math.abs(r - R * Math.sin((80 * Math.PI) / 180))).toBeLessThan(0.01);
    for (const r of radii[1]) expect(Math.abs(r - R)).toBeLessThan(0.01);
    expect(subpaths(pathOf(one, "sa-band", 1))).toHaveLength(1); // only the 80 deg circle shows
  });

  it("draws a pad facing the viewer as the exact ellipse: centre R cos(a) sin(beta) right of centre, rx = R sin a, ry = R sin a cos beta, turned 90 deg (closed form)", () => {
    const beta = (30 * Math.PI) / 180;
    const radiusIn = 0.4;
    const a = radiusIn / BALL_RADIUS_IN;
    const one = renderBallSvg({ seamShape: b, view: waistView, overlays: { fingerPads: [{ direction: [Math.sin(beta), 0, Math.cos(beta)], label: "P", radiusIn }] } });
    const [e] = elements(one, "ellipse").filter((x) => x["fill-opacity"]);
    expect(Math.abs(Number(e.cx) - (CX + R * Math.cos(a) * Math.sin(beta)))).toBeLessThan(ROUND_PX);
    expect(Math.abs(Number(e.cy) - CY)).toBeLessThan(ROUND_PX);
    expect(Math.abs(Number(e.rx) - R * Math.sin(a))).toBeLessThan(ROUND_PX);
    expect(Math.abs(Number(e.ry) - R * Math.sin(a) * Math.cos(beta))).toBeLessThan(ROUND_PX);
    expect(e.transform.startsWith("rotate(90 ")).toBe(true);
  });

  it("draws a pad cut by the limb as a filled outline that stays on the disc and follows the limb where the cap turns away, to 0.01 px", () => {
    // a 0.4 in pad centred 85 deg from the line of sight reaches past the limb (its angular radius is about 16 deg)
    const e = (85 * Math.PI) / 180;
    const one = renderBallSvg({ seamShape: b, view: waistView, overlays: { fingerPads: [{ direction: [Math.sin(e), 0, Math.cos(e)], label: "L", radiusIn: 0.4 }] } }, { legend: false });
    expect(elements(one, "ellipse")).toHaveLength(0);
    const [outline] = subpaths(pathOf(one, "sa-pads"));
    const r = outline.filter((_, i) => i % 2 === 0).map((x, k) => Math.hypot(x - CX, outline[2 * k + 1] - CY));
    expect(Math.max(...r)).toBeLessThan(R + 0.01);
    expect(r.filter((q) => Math.abs(q - R) < 0.01).length).toBeGreaterThan(5);
    expect(texts(one)).toContain("L");
  });

  it("marks the spin axis's positive end solid where it faces the viewer and the negative end faded: +z from (1, 1, 1)/sqrt 3 pierces at (cx, cy - 2R/sqrt 6) (closed form)", () => {
    const one = renderBallSvg({ seamShape: b, view: obliqueView, overlays: { spinAxis: [0, 0, 1] } });
    const [plus] = elements(one, "circle").filter((c) => c.class === "sa-axis-plus");
    const [minus] = elements(one, "circle").filter((c) => c.class === "sa-axis-minus");
    expect(Math.abs(Number(plus.cx) - CX)).toBeLessThan(ROUND_PX);
    expect(Math.abs(Number(plus.cy) - (CY - (2 * R) / Math.sqrt(6)))).toBeLessThan(ROUND_PX);
    expect(plus.opacity).toBe("1");
    expect(Math.abs(Number(minus.cy) - (CY + (2 * R) / Math.sqrt(6)))).toBeLessThan(ROUND_PX);
    expect(Number(minus.opacity)).toBeLessThan(1);
  });

  it("draws a view-frame push (1, 0, 0) as an arrow whose head tip is 1.25 R right of the centre", () => {
    const one = renderBallSvg({ seamShape: b, view: waistView, overlays: { push: { direction: [1, 0, 0], frame: "view" } } });
    const m = /<g class="sa-push">[\s\S]*?<polygon points="([^"]*)"/.exec(one)!;
    const [x, y] = m[1].split(" ")[0].split(",").map(Number);
    expect(Math.abs(x - (CX + 1.25 * R))).toBeLessThan(ROUND_PX);
    expect(Math.abs(y - CY)).toBeLessThan(ROUND_PX);
  });
});

describe("ball drawing: overlays appear only when asked for", () => {
  const bare = renderBallSvg({ seamShape: b, view: waistView });
  const full = renderBallSvg(fullModel);

  it("labels the finger pads, the push and the facing landmarks, and not the hidden waist-B", () => {
    const t = texts(full);
    for (const label of ["index", "middle", "thumb", "push", "waist-A", "Waist A toward the viewer", "orthographic, b = 0.301"]) expect(t).toContain(label);
    expect(t).not.toContain("waist-B");
    expect(texts(bare).some((x) => ["index", "push", "waist-A"].includes(x))).toBe(false);
  });

  it("has the band, the axis, pads and the push only in the drawing that asks for them, and legend entries to match", () => {
    for (const cls of ["sa-band", "sa-axis", "sa-pads", "sa-push", "sa-landmarks"]) {
      expect(full).toContain(`class="${cls}"`);
      expect(bare).not.toContain(`class="${cls}"`);
    }
    expect(texts(full)).toContain("separation band");
    expect(texts(bare)).not.toContain("separation band");
  });

  it("labels only the landmarks named (case-insensitive), and only where they face the viewer", () => {
    const one = renderBallSvg({ seamShape: b, view: waistView, overlays: { landmarks: ["TIP-B1", "waist-A", "waist-B"] } });
    // the dots in the landmarks' group, their names in the one layer of words over every mark
    const dots = /<g class="sa-landmarks">([\s\S]*?)<\/g>/.exec(one)!;
    expect(dots[1].match(/<circle /g)).toHaveLength(2);
    const words = /<g class="sa-labels">([\s\S]*?)<\/g>/.exec(one)!;
    expect(texts(words[1]).sort()).toEqual(["tip-B1", "waist-A"]);
  });

  it("leaves the far-side seam out when asked, and draws it faded by default", () => {
    expect(bare).toContain('class="sa-seam-far"');
    expect(renderBallSvg({ seamShape: b, view: waistView }, { hiddenSeam: "omit" })).not.toContain('class="sa-seam-far"');
  });

  it("rejects an invalid seam shape, pad radius or size with a RangeError", () => {
    expect(() => renderBallSvg({ seamShape: 0.6, view: waistView })).toThrow(RangeError);
    expect(() => renderBallSvg({ seamShape: b, view: waistView, overlays: { fingerPads: [{ direction: [0, 0, 1], label: "x", radiusIn: 0 }] } })).toThrow(RangeError);
    expect(() => renderBallSvg({ seamShape: b, view: waistView }, { sizePx: 10 })).toThrow(RangeError);
  });
});

// Golden file: a small drawing compared byte for byte. Regenerate only by hand, on a
// developer's machine, after checking the drawing by eye: UPDATE_GOLDEN=1 npx vitest run tests/render
const GOLDEN = fileURLToPath(new URL("./golden/ball-waist-view.svg", import.meta.url));
const goldenModel: BallModel = {
  seamShape: b,
  view: viewLookingAlong([0, 0, -1], [0, 1, 0]),
  title: "Waist A",
  overlays: {
    spinAxis: [1, 0, 0.35],
    flowBand: { flowDirection: [0, -0.6, 0.8], band: DEFAULT_BAND },
    fingerPads: [{ direction: [0.25, 0.45, 1], label: "I", radiusIn: 0.3 }],
    push: { direction: [0, 1, 0], frame: "view", label: "push" },
  },
};

describe("ball drawing: labels stay legible in every output", () => {
  it("draws each haloed label's white outline as its own text element before the letters (no paint-order, which PDF painters ignore)", () => {
    const svg = renderBallSvg(fullModel);
    expect(svg).not.toContain("paint-order");
    const all = [...svg.matchAll(/<text\b([^>]*)>([^<]*)<\/text>/g)];
    const halos = all.filter((m) => /class="sa-halo"/.test(m[1]));
    expect(halos.length).toBeGreaterThanOrEqual(4); // three pad labels and the push label at least
    for (const h of halos) {
      const k = all.indexOf(h);
      const next = all[k + 1];
      expect(next[2]).toBe(h[2]); // the letters follow their halo at once, so they are painted over it
      expect(next[1]).not.toMatch(/stroke=/);
      expect(h[1]).toMatch(/stroke="#ffffff"/);
    }
  });
});

describe("ball drawing: golden file", () => {
  it("matches tests/render/golden/ball-waist-view.svg byte for byte (2 decimals, 256 seam points, 240 px)", () => {
    const svg = `${renderBallSvg(goldenModel, { sizePx: 240, seamPoints: 256 })}\n`;
    if (process.env.UPDATE_GOLDEN === "1" && !process.env.CI) writeFileSync(GOLDEN, svg);
    if (!existsSync(GOLDEN)) {
      throw new Error(`golden file ${GOLDEN} is missing; a developer regenerates it locally with UPDATE_GOLDEN=1 npx vitest run tests/render (never in CI), checks it by eye and commits it`);
    }
    expect(svg).toBe(readFileSync(GOLDEN, "utf8"));
  });
});
