/**
 * A score over every spin-axis position on the ball, drawn on the Hammer equal-area
 * map of the sphere (hammer.ts): each cell of the equal-area ring grid
 * (geometry/sphereGrid.ts) filled from our "verdigris" scale (colorScale.ts), the
 * seam curve over it, a 30 deg graticule, optional markers and a legend.
 *
 * Marks (our own): the seam is a coral-red line on a white casing, so it reads on the
 * dark and the light end of the scale alike; numbered candidates are white hexagons
 * carrying their number; reference holds are white squares crossed by an X, their
 * label beside them. Graticule lines are thin translucent graphite.
 *
 * Size: neighbouring cells of a ring that fall in the same colour step are merged
 * into one polygon, all polygons of one colour share one <path>, and cell corners are
 * written as relative steps. Measured on the seam-in-band map (64 steps, 720 px):
 * 1 deg spacing (41,240 cells) about 1.3 MB; 2 deg (10,328 cells) about 460 kB, the
 * recommended spacing for print; 3 deg (4,584 cells) about 300 kB, enough on screen.
 */
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { seamFor } from "../sampling/measure.js";
import type { SphereGrid } from "../../geometry/sphereGrid.js";
import { unit3, type Vec3 } from "../../geometry/vec.js";
import type { ScreenReport } from "../screening/report.js";
import { rampColor } from "./colorScale.js";
import { HAMMER_HALF_HEIGHT, HAMMER_HALF_WIDTH, hammerProject, lonLatOf } from "./hammer.js";
import { addText, createScene, serializeScene, type SceneNode } from "./scene.js";
import { pointsAttribute, polylinePath, relativePolygonPath } from "./svgPath.js";
import { DEG } from "../../geometry/units.js";
import { deflateSync } from "node:zlib";

export interface MapMarker {
  /** Spin-axis direction (positive end), ball frame; normalised here. */
  readonly direction: Vec3;
  readonly label: string;
}

export interface SphereMapOptions {
  /** Drawing width, px, 240 to 4000 (default 720). */
  readonly widthPx?: number;
  readonly title?: string;
  /** What the values are, with units, shown under the colour bar (default "value"). */
  readonly valueLabel?: string;
  /** Values at the two ends of the colour scale (default: the least and greatest finite value). */
  readonly range?: readonly [number, number];
  /** Colour steps, 2 to 256 (default 64). */
  readonly levels?: number;
  /** Seam shape b of the seam drawn over the map (default DEFAULT_SEAM_SHAPE), or null for none. */
  readonly seamShape?: number | null;
  /** Numbered candidates (hexagons); `label` is usually the number. */
  readonly candidates?: readonly MapMarker[];
  /** Reference holds (crossed squares). */
  readonly referenceHolds?: readonly MapMarker[];
  /** Decimals of the legend's min and max (default 3). */
  readonly valueDigits?: number;
  /** Decimals kept in coordinates, 0 to 6 (default 1: 0.1 px). */
  readonly digits?: number;
  /** Prefix of the ids in the SVG (default "sa"). */
  readonly idPrefix?: string;
  /**
   * The cells already drawn as PDF content (sphereMapCellsPdf): the drawing then carries
   * them as one node for the PDF painter instead of a path per colour step. They must
   * have been drawn for this map's width, title, levels, range and digits (checked:
   * RangeError). For PDF only; an SVG of such a drawing has no cells.
   */
  readonly cellsPdf?: MapCells;
}

/** Longest stretch of a parallel drawn as one straight segment, radians. */
const MAX_EDGE_STEP_RAD = 3 * DEG;
const NO_VALUE_COLOUR = "#b8b8b8";
const GRATICULE_STEP_RAD = 30 * DEG;
/** Seam samples for the map's seam line (a 720 px map shows no corners at this count). */
const SEAM_MAP_POINTS = 1024;

/**
 * Renders `values` (one per cell of `grid`, NaN for none) as an SVG map.
 * Throws RangeError when the lengths differ or an option is out of range.
 */
export function renderSphereMapSvg(values: Float64Array, grid: SphereGrid, options: SphereMapOptions = {}): string {
  return serializeScene(sphereMapScene(values, grid, options), options.digits ?? 1, options.idPrefix ?? "sa");
}

/** The sphere map as drawing commands (render/scene.ts), for SVG, PDF and PNG alike; see renderSphereMapSvg. */
export function sphereMapScene(values: Float64Array, grid: SphereGrid, options: SphereMapOptions = {}): SceneNode {
  if (values.length !== grid.count) throw new RangeError(`${values.length} values for a grid of ${grid.count} cells`);
  const widthPx = options.widthPx ?? 720;
  if (!(widthPx >= 240 && widthPx <= 4000)) throw new RangeError(`map width ${widthPx} px must be from 240 to 4000 px`);
  const levels = options.levels ?? 64;
  if (!(Number.isInteger(levels) && levels >= 2 && levels <= 256)) throw new RangeError(`colour levels ${levels} must be a whole number from 2 to 256`);
  const digits = options.digits ?? 1;
  const valueDigits = options.valueDigits ?? 3;
  const prefix = options.idPrefix ?? "sa";
  const [lo, hi] = valueRange(values, options.range);

  const { scale, titlePx, mapHeightPx, cx, cy, heightPx, toPx } = mapFrame(widthPx, Boolean(options.title));

  const draw = createScene(widthPx, heightPx).attr({ "font-family": "DejaVu Sans, Verdana, sans-serif" });
  if (options.title) draw.element("title").words(options.title);

  // cells: runs of equal colour step within a ring, one path per step
  const cells = draw.group().attr({ class: "sa-cells" });
  if (options.cellsPdf) {
    assertCellsFit(options.cellsPdf.options, { widthPx, titled: Boolean(options.title), levels, range: options.range, digits });
    cells.pdfContent = options.cellsPdf.deflated;
  } else {
    const byLevel = new Map<number, string[]>();
    forEachCellRun(values, grid, lo, hi, levels, toPx, (level, ring) => {
      const list = byLevel.get(level) ?? [];
      list.push(relativePolygonPath(ring, digits));
      byLevel.set(level, list);
    });
    for (const level of [...byLevel.keys()].sort((a, b) => a - b)) {
      const colour = cellColour(level, levels);
      // a hairline stroke in the fill colour hides the anti-aliasing gaps between cells
      cells.path().attr({ d: byLevel.get(level)!.join(""), fill: colour, stroke: colour, "stroke-width": CELL_STROKE_PX, "stroke-linejoin": "round" });
    }
  }

  // graticule every 30 deg; the map's outline is the meridian at +-180 deg
  let grat = "";
  const lines = Math.round(Math.PI / GRATICULE_STEP_RAD);
  for (let m = 1; m < 2 * lines; m++) {
    const lon = -Math.PI + m * GRATICULE_STEP_RAD;
    const line: number[] = [];
    for (let k = 0; k <= 90; k++) toPx(lon, -Math.PI / 2 + (Math.PI * k) / 90, line);
    grat += polylinePath(line, false, digits);
  }
  for (let m = 1; m < lines; m++) {
    const lat = -Math.PI / 2 + m * GRATICULE_STEP_RAD;
    const line: number[] = [];
    for (let k = 0; k <= 180; k++) toPx(-Math.PI + (2 * Math.PI * k) / 180, lat, line);
    grat += polylinePath(line, false, digits);
  }
  draw.path().attr({ d: grat, fill: "none", stroke: "#3a3a3a", "stroke-opacity": 0.35, "stroke-width": 0.7, class: "sa-graticule" });
  draw.ellipse().attr({ cx, cy, rx: HAMMER_HALF_WIDTH * scale, ry: HAMMER_HALF_HEIGHT * scale, fill: "none", stroke: "#3a3a3a", "stroke-width": 1 });
  const labels = draw.group().attr({ class: "sa-graticule-labels" });
  // where the markers go (drawn last): a longitude label they would cover moves under the
  // equator, or is left out when it is covered there too (the graticule still shows the line)
  const holdsPx = (options.referenceHolds ?? []).map((m) => markerPx(m.direction, toPx));
  const candidatesPx = (options.candidates ?? []).map((m) => markerPx(m.direction, toPx));
  const covered = (x: number, y: number, w: number) =>
    [...holdsPx.map((p) => [p[0], p[1], 30] as const), ...candidatesPx.map((p) => [p[0], p[1], 8] as const)].some(([mx, my, reach]) => mx > x - 8 && mx < x + w + reach && my > y - 8 - 8 && my < y + 8);
  for (const lonDeg of [-120, -60, 0, 60, 120]) {
    const p: number[] = [];
    toPx(lonDeg * DEG, 0, p);
    const text = `${lonDeg}°`;
    const w = 4.6 * text.length; // about the width at 8 px (an overlap test, not a layout)
    const y = [p[1] - 3, p[1] + 11].find((yy) => !covered(p[0] + 2, yy, w));
    if (y !== undefined) addText(labels, p[0] + 2, y, text, { sizePx: 8, fill: "#2c2c2c", haloPx: 2 });
  }
  for (const latDeg of [-60, -30, 30, 60]) {
    const p: number[] = [];
    toPx(-Math.PI, latDeg * DEG, p);
    addText(labels, p[0] - 3, p[1] + 3, `${latDeg}°`, { sizePx: 8, fill: "#2c2c2c", anchor: "end" });
  }

  const seamShape = options.seamShape === undefined ? DEFAULT_SEAM_SHAPE : options.seamShape;
  if (seamShape !== null) {
    const d = seamOnMap(seamShape, toPx, digits);
    const g = draw.group().attr({ class: "sa-seam" });
    g.path().attr({ d, fill: "none", stroke: "#ffffff", "stroke-width": 3.4, "stroke-linecap": "round", "stroke-linejoin": "round" });
    g.path().attr({ d, fill: "none", stroke: "#c2352b", "stroke-width": 1.6, "stroke-linecap": "round", "stroke-linejoin": "round" });
  }

  const markers = draw.group().attr({ class: "sa-markers" });
  for (const [k, m] of (options.referenceHolds ?? []).entries()) {
    const p = holdsPx[k];
    drawHoldMarker(markers, p[0], p[1]);
    addText(markers, p[0] + 8, p[1] + 3.5, m.label, { sizePx: 10, fill: "#111111", haloPx: 2.5, className: "sa-hold-label" });
  }
  for (const [k, m] of (options.candidates ?? []).entries()) {
    const p = candidatesPx[k];
    drawCandidateMarker(markers, p[0], p[1], digits);
    addText(markers, p[0], p[1] + 3, m.label, { sizePx: 8, fill: "#111111", anchor: "middle", weight: "bold", className: "sa-candidate-label" });
  }

  if (options.title) addText(draw, widthPx / 2, 21, options.title, { sizePx: 15, fill: "#1f1f1f", anchor: "middle", weight: "bold", className: "sa-title" });
  drawLegend(draw, { prefix, widthPx, top: titlePx + mapHeightPx + 8, lo, hi, valueDigits, label: options.valueLabel ?? "value" });
  return draw;
}

/** The stroke in the fill colour around every cell run, px. */
const CELL_STROKE_PX = 0.6;

/** A colour step's colour (-1: no value). */
function cellColour(level: number, levels: number): string {
  return level < 0 ? NO_VALUE_COLOUR : rampColor((level + 0.5) / levels);
}

/** Where the map sits in its drawing, px: one home for the drawing and its cells as PDF. */
function mapFrame(widthPx: number, titled: boolean) {
  const margin = 16;
  const scale = (widthPx - 2 * margin) / (2 * HAMMER_HALF_WIDTH); // px per unit-sphere length
  const titlePx = titled ? 38 : 12;
  const mapHeightPx = 2 * HAMMER_HALF_HEIGHT * scale;
  const legendPx = 82;
  const cx = widthPx / 2;
  const cy = titlePx + mapHeightPx / 2;
  const heightPx = titlePx + mapHeightPx + legendPx;
  const xy: [number, number] = [0, 0];
  const toPx = (lon: number, lat: number, out: number[]) => {
    hammerProject(lon, lat, xy);
    out.push(cx + scale * xy[0], cy - scale * xy[1]);
  };
  return { scale, titlePx, mapHeightPx, cx, cy, heightPx, toPx };
}

/**
 * Every run of neighbouring cells of a ring that fall in the same colour step (runs also
 * end at longitude 180 deg, where the map is cut), as its step (-1: no value) and its
 * outline in px (flat x, y pairs: the lower parallel west to east, the upper back).
 */
function forEachCellRun(
  values: Float64Array,
  grid: SphereGrid,
  lo: number,
  hi: number,
  levels: number,
  toPx: (lon: number, lat: number, out: number[]) => void,
  visit: (level: number, ring: number[]) => void,
): void {
  const levelOf = (v: number) => (Number.isFinite(v) ? Math.min(levels - 1, Math.max(0, Math.floor(((v - lo) / (hi - lo)) * levels))) : -1);
  for (let i = 0; i < grid.ringCount.length; i++) {
    const n = grid.ringCount[i];
    const lat0 = Math.asin(grid.ringEdges[i]);
    const lat1 = Math.asin(grid.ringEdges[i + 1]);
    let j0 = 0;
    for (let j = 1; j <= n; j++) {
      const level = levelOf(values[grid.ringStart[i] + j0]);
      if (j < n && j !== n / 2 && levelOf(values[grid.ringStart[i] + j]) === level) continue;
      const shift = j0 >= n / 2 ? 2 * Math.PI : 0;
      const lonA = (2 * Math.PI * j0) / n - shift;
      const lonB = (2 * Math.PI * j) / n - shift;
      const steps = Math.max(1, Math.ceil((lonB - lonA) / MAX_EDGE_STEP_RAD));
      const ring: number[] = [];
      for (let k = 0; k <= steps; k++) toPx(lonA + ((lonB - lonA) * k) / steps, lat0, ring);
      for (let k = steps; k >= 0; k--) toPx(lonA + ((lonB - lonA) * k) / steps, lat1, ring);
      visit(level, ring);
      j0 = j;
    }
  }
}

/** What fixes a map's cells: the drawing's width and title, and the colour scale. */
export interface MapCellsOptions {
  readonly widthPx: number;
  readonly titled: boolean;
  readonly levels?: number;
  readonly range?: readonly [number, number];
  readonly digits?: number;
}

/** A map's cells as deflated PDF content, with the options they were drawn for. */
export interface MapCells {
  readonly options: MapCellsOptions;
  readonly deflated: Uint8Array;
}

/** Throws RangeError unless cells drawn with `drawn` fall where a map drawn with `map` puts its cells. */
function assertCellsFit(drawn: MapCellsOptions, map: Required<Omit<MapCellsOptions, "range">> & Pick<MapCellsOptions, "range">): void {
  const same =
    drawn.widthPx === map.widthPx &&
    drawn.titled === map.titled &&
    (drawn.levels ?? 64) === map.levels &&
    (drawn.digits ?? 1) === map.digits &&
    (drawn.range === undefined ? map.range === undefined : map.range !== undefined && drawn.range[0] === map.range[0] && drawn.range[1] === map.range[1]);
  if (!same) throw new RangeError(`map cells drawn for ${JSON.stringify(drawn)} do not fit a map drawn with ${JSON.stringify(map)}`);
}

/**
 * The map's cells as PDF content operators (the drawing's px, y down, as sphereMapScene
 * places them), deflated: each colour step filled and stroked in its colour, every
 * corner at the coordinates the drawing's paths round to. Built apart from the page
 * (for the atlas, on the worker that screened the pitch) and painted as one form
 * (render/paper/pdfScene.ts), so the page's own thread neither builds nor compresses
 * thousands of subpaths.
 */
export function sphereMapCellsPdf(values: Float64Array, grid: SphereGrid, options: MapCellsOptions): MapCells {
  if (values.length !== grid.count) throw new RangeError(`${values.length} values for a grid of ${grid.count} cells`);
  const levels = options.levels ?? 64;
  const digits = options.digits ?? 1;
  const [lo, hi] = valueRange(values, options.range);
  const { toPx } = mapFrame(options.widthPx, options.titled);
  // corners as whole steps of 10^-digits px (what the drawing's paths round to), written
  // as integers under one scaling: shorter to write, to compress and to read
  const k = 10 ** digits;
  const byLevel = new Map<number, string[]>();
  forEachCellRun(values, grid, lo, hi, levels, toPx, (level, ring) => {
    let ops = `${Math.round(ring[0] * k)} ${Math.round(ring[1] * k)} m`;
    for (let i = 2; i + 1 < ring.length; i += 2) ops += `\n${Math.round(ring[i] * k)} ${Math.round(ring[i + 1] * k)} l`;
    const list = byLevel.get(level);
    if (list) list.push(ops);
    else byLevel.set(level, [ops]);
  });
  let out = `${1 / k} 0 0 ${1 / k} 0 0 cm\n${CELL_STROKE_PX * k} w\n1 j\n`;
  for (const level of [...byLevel.keys()].sort((a, b) => a - b)) {
    const hex = cellColour(level, levels);
    const rgb = [1, 3, 5].map((i) => Math.round((parseInt(hex.slice(i, i + 2), 16) / 255) * 1e4) / 1e4).join(" ");
    out += `${rgb} rg\n${rgb} RG\n${byLevel.get(level)!.join("\nh\n")}\nh\nB\n`;
  }
  return { options, deflated: deflateSync(Buffer.from(out, "latin1")) };
}

/** The numbers (inches) of the grips a screen's sphere map marks: the listed grips unless out of reach, and the classic holds. */
export function mapMarksIn(r: ScreenReport): number[] {
  return [...(r.reach.outOfReach ? [] : r.candidates), ...r.references].map((o) => o.score);
}

/**
 * The colour scale's ends for a map whose marked grips carry numbers of their own
 * (`marks`: refined between the cells and flown in full, so a grip can beat every cell):
 * the least and greatest of the cells and the marks, so no marked grip lies off the scale.
 */
export function scaleRange(values: Float64Array, marks: readonly number[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  for (const v of marks) {
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  return [lo, hi];
}

function valueRange(values: Float64Array, range?: readonly [number, number]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  if (range) [lo, hi] = range;
  else {
    for (const v of values) {
      if (!Number.isFinite(v)) continue;
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
  }
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || hi < lo) {
    throw new RangeError(`colour range ${lo} to ${hi} must be finite and ascending (are all values NaN?)`);
  }
  // a constant field still needs a scale: widen it symmetrically
  if (hi === lo) return [lo - 0.5 * Math.max(1e-12, Math.abs(lo)), hi + 0.5 * Math.max(1e-12, Math.abs(hi))];
  return [lo, hi];
}

/**
 * The seam as map polylines, cut where it crosses longitude +-180 deg: each cut ends
 * one polyline at the map's edge and starts the next at the opposite edge, at the
 * latitude interpolated linearly in longitude across the cut.
 */
function seamOnMap(b: number, toPx: (lon: number, lat: number, out: number[]) => void, digits: number): string {
  const seam = seamFor(b, SEAM_MAP_POINTS);
  const n = seam.count;
  const lonLat = (i: number) => lonLatOf(seam.points[3 * (i % n)], seam.points[3 * (i % n) + 1], seam.points[3 * (i % n) + 2]);
  let d = "";
  let line: number[] = [];
  let [lonPrev, latPrev] = lonLat(0);
  toPx(lonPrev, latPrev, line);
  for (let i = 1; i <= n; i++) {
    const [lon, lat] = lonLat(i);
    if (Math.abs(lon - lonPrev) > Math.PI) {
      const edge = lonPrev > 0 ? Math.PI : -Math.PI;
      const unwrapped = lon + 2 * edge; // the same meridian, continued past the edge
      const latCut = latPrev + ((edge - lonPrev) / (unwrapped - lonPrev)) * (lat - latPrev);
      toPx(edge, latCut, line);
      d += polylinePath(line, false, digits);
      line = [];
      toPx(-edge, latCut, line);
    }
    toPx(lon, lat, line);
    lonPrev = lon;
    latPrev = lat;
  }
  return d + polylinePath(line, false, digits);
}

function markerPx(direction: Readonly<Vec3>, toPx: (lon: number, lat: number, out: number[]) => void): number[] {
  const u = unit3(direction);
  const p: number[] = [];
  const [lon, lat] = lonLatOf(u[0], u[1], u[2]);
  toPx(lon, lat, p);
  return p;
}

function drawCandidateMarker(g: SceneNode, x: number, y: number, digits: number): void {
  const pts: number[] = [];
  for (let k = 0; k < 6; k++) pts.push(x + 7 * Math.cos((Math.PI / 3) * k), y + 7 * Math.sin((Math.PI / 3) * k));
  g.polygon().attr({ points: pointsAttribute(pts, digits), fill: "#ffffff", stroke: "#111111", "stroke-width": 1.2, class: "sa-candidate" });
}

function drawHoldMarker(g: SceneNode, x: number, y: number): void {
  const h = 4.5;
  const d = `M${x - h} ${y - h}L${x + h} ${y + h}M${x - h} ${y + h}L${x + h} ${y - h}`;
  g.rect().attr({ x: x - h, y: y - h, width: 2 * h, height: 2 * h, fill: "#ffffff", stroke: "#111111", "stroke-width": 1.2, class: "sa-hold" });
  g.path().attr({ d, stroke: "#111111", "stroke-width": 1 });
}

interface LegendLayout {
  readonly prefix: string;
  readonly widthPx: number;
  readonly top: number;
  readonly lo: number;
  readonly hi: number;
  readonly valueDigits: number;
  readonly label: string;
}

/** A round step (1, 2 or 5 times a power of ten) near `raw`. */
function niceStep(raw: number): number {
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  return (m < 1.5 ? 1 : m < 3.5 ? 2 : m < 7.5 ? 5 : 10) * p;
}

function drawLegend(draw: SceneNode, l: LegendLayout): void {
  const g = draw.group().attr({ class: "sa-legend" });
  const barW = Math.min(300, 0.4 * l.widthPx);
  const barX = l.widthPx / 2 - barW / 2;
  const ramp = draw
    .gradient("linear", (add) => {
      for (let k = 0; k <= 16; k++) add.stop({ offset: k / 16, color: rampColor(k / 16) });
    })
    .id(`${l.prefix}-ramp`);
  g.rect().attr({ x: barX, y: l.top + 6, width: barW, height: 12, fill: `url(#${ramp.id()})`, stroke: "#3a3a3a", "stroke-width": 0.6 });
  const t = { sizePx: 10, fill: "#1f1f1f" } as const;
  // min and max beside the bar's ends and the label under it, so no text can overlap
  addText(g, barX - 6, l.top + 15.5, l.lo.toFixed(l.valueDigits), { ...t, anchor: "end" });
  addText(g, barX + barW + 6, l.top + 15.5, l.hi.toFixed(l.valueDigits), { ...t, anchor: "start" });
  // a scale with round numbers under the bar
  const step = niceStep((l.hi - l.lo) / 5);
  let ticks = "";
  for (let v = Math.ceil(l.lo / step - 1e-9) * step; v <= l.hi + 1e-9 * step; v += step) {
    const x = barX + (barW * (v - l.lo)) / (l.hi - l.lo);
    ticks += `M${x.toFixed(2)} ${l.top + 18}L${x.toFixed(2)} ${l.top + 22}`;
    const digits = step >= 1 ? 0 : step >= 0.1 ? 1 : 2;
    addText(g, x, l.top + 31, (Math.abs(v) < step * 1e-6 ? 0 : v).toFixed(digits), { sizePx: 9, fill: "#1f1f1f", anchor: "middle", className: "sa-tick" });
  }
  g.path().attr({ d: ticks, stroke: "#3a3a3a", "stroke-width": 0.8, fill: "none" });
  addText(g, l.widthPx / 2, l.top + 45, l.label, { ...t, anchor: "middle", className: "sa-value-label" });
  // marker key, left of the bar
  const kx = 20;
  g.path().attr({ d: `M${kx} ${l.top + 12}L${kx + 16} ${l.top + 12}`, stroke: "#ffffff", "stroke-width": 3.4, fill: "none" });
  g.path().attr({ d: `M${kx} ${l.top + 12}L${kx + 16} ${l.top + 12}`, stroke: "#c2352b", "stroke-width": 1.6, fill: "none" });
  addText(g, kx + 22, l.top + 15.5, "seam", t);
  drawCandidateMarker(g, kx + 8, l.top + 30, 2);
  addText(g, kx + 22, l.top + 33.5, "candidate", t);
  drawHoldMarker(g, kx + 8, l.top + 48);
  addText(g, kx + 22, l.top + 51.5, "reference hold", t);
  addText(
    g,
    l.widthPx / 2,
    l.top + 64,
    `Hammer equal-area projection · longitude from ball +x toward +y · latitude from the seam's equator plane · graticule 30° · colours dark (least) to light (most)`,
    { sizePx: 8, fill: "#4a4a4a", anchor: "middle", className: "sa-projection-note" },
  );
}
