/**
 * Paints a drawing (render/scene.ts) straight into a pdfkit page: every node
 * becomes pdfkit path, paint and text calls, with no SVG text in between. Handles
 * the subset of SVG our renderers write: svg (viewBox, placed "xMidYMid meet" in a
 * box), g, path, circle, ellipse (with a rotate() transform), polygon, rect, text
 * (x, y, size, anchor, weight, fill, stroke for halos, opacity), linear and radial
 * gradients in object-bounding-box units, fill and stroke colours and opacities,
 * dashes, caps, joins and the even-odd rule. Fill, stroke, stroke-width and font
 * attributes inherit as in SVG; opacity applies to the node it is on.
 *
 * Text is set in Noto Sans and its fallback faces (render/fonts.ts), run by run in
 * the file that holds each character, runs in visual order from left to right (a
 * right-to-left word is its own run, which pdfkit's layout, fontkit, shapes and
 * reverses), with a halo text node (drawn first) as stroked letters under the
 * filled ones.
 */
import type { Box } from "./layouts.js";
import { runsWidth, visualRuns, type FontFace, type FontWeight } from "../fonts.js";
import { sceneSize, type SceneNode } from "../scene.js";

export type Doc = PDFKit.PDFDocument;
import { PT_PER_IN } from "./textLayout.js";

export { PT_PER_IN };

interface Style {
  fill: string;
  stroke: string;
  strokeWidth: number;
  fontSize: number;
  fontWeight: FontWeight;
  anchor: string;
  linecap?: string;
  linejoin?: string;
  dash?: string;
  fillRule?: string;
  fillOpacity: number;
  strokeOpacity: number;
}

const ROOT_STYLE: Style = { fill: "#000000", stroke: "none", strokeWidth: 1, fontSize: 16, fontWeight: "normal", anchor: "start", fillOpacity: 1, strokeOpacity: 1 };

const registered = new WeakMap<Doc, Set<string>>();

/** Selects `face` on `doc`, registering it on first use (pdfkit embeds the glyphs used). */
export function useFace(doc: Doc, face: FontFace): void {
  let set = registered.get(doc);
  if (!set) registered.set(doc, (set = new Set()));
  if (!set.has(face.key)) {
    doc.registerFont(face.key, face.sfnt);
    set.add(face.key);
  }
  doc.font(face.key);
}

function num(v: unknown, fallback = 0): number {
  if (v === undefined) return fallback;
  const n = typeof v === "number" ? v : parseFloat(String(v));
  return Number.isFinite(n) ? n : fallback;
}

function inherit(parent: Style, a: SceneNode["attrs"]): Style {
  const s = { ...parent, fillOpacity: 1, strokeOpacity: 1 };
  if (a.fill !== undefined) s.fill = String(a.fill);
  if (a.stroke !== undefined) s.stroke = String(a.stroke);
  if (a["stroke-width"] !== undefined) s.strokeWidth = num(a["stroke-width"], 1);
  if (a["font-size"] !== undefined) s.fontSize = num(a["font-size"], 16);
  if (a["font-weight"] !== undefined) s.fontWeight = String(a["font-weight"]) === "bold" ? "bold" : "normal";
  if (a["text-anchor"] !== undefined) s.anchor = String(a["text-anchor"]);
  if (a["stroke-linecap"] !== undefined) s.linecap = String(a["stroke-linecap"]);
  if (a["stroke-linejoin"] !== undefined) s.linejoin = String(a["stroke-linejoin"]);
  if (a["stroke-dasharray"] !== undefined) s.dash = String(a["stroke-dasharray"]);
  if (a["fill-rule"] !== undefined) s.fillRule = String(a["fill-rule"]);
  const o = num(a.opacity, 1);
  s.fillOpacity = o * num(a["fill-opacity"], 1);
  s.strokeOpacity = o * num(a["stroke-opacity"], 1);
  return s;
}

function pct(v: unknown, fallback: number): number {
  if (v === undefined) return fallback;
  const t = String(v);
  return t.endsWith("%") ? parseFloat(t) / 100 : parseFloat(t);
}

/** A pdfkit gradient for `url(#id)` over the bounding box (x, y, w, h), or null. */
function gradientPaint(doc: Doc, root: SceneNode, ref: string, bbox: readonly [number, number, number, number]) {
  const id = /^url\(#(.+)\)$/.exec(ref)?.[1];
  const g = id ? root.findGradient(id) : undefined;
  if (!g) return null;
  const [x, y, w, h] = bbox;
  const a = g.attrs;
  let grad;
  if (g.tag === "radialGradient") {
    const cx = x + w * pct(a.cx, 0.5), cy = y + h * pct(a.cy, 0.5);
    const r = Math.sqrt((w * w + h * h) / 2) * pct(a.r, 0.5);
    const fx = x + w * pct(a.fx ?? a.cx, 0.5), fy = y + h * pct(a.fy ?? a.cy, 0.5);
    grad = doc.radialGradient(fx, fy, 0, cx, cy, r);
  } else {
    grad = doc.linearGradient(x + w * pct(a.x1, 0), y + h * pct(a.y1, 0), x + w * pct(a.x2, 1), y + h * pct(a.y2, 0));
  }
  for (const st of g.children) grad.stop(num(st.attrs.offset), String(st.attrs["stop-color"]), num(st.attrs["stop-opacity"], 1));
  return grad;
}

function applyStroke(doc: Doc, s: Style): void {
  doc.lineWidth(s.strokeWidth);
  if (s.linecap) doc.lineCap(s.linecap as "round");
  if (s.linejoin) doc.lineJoin(s.linejoin as "round");
  if (s.dash && s.dash !== "none") {
    const parts = s.dash.split(/[\s,]+/).map(Number).filter((x) => x > 0);
    // pdfkit 0.20 takes an array of lengths; its type declarations know only (length, options)
    if (parts.length) (doc as unknown as { dash(l: number[]): void }).dash(parts);
  }
}

/** Fills and strokes the current path as `s` asks. */
function paint(doc: Doc, root: SceneNode, s: Style, bbox: () => [number, number, number, number]): void {
  const hasFill = s.fill !== "none" && s.fillOpacity > 0;
  const hasStroke = s.stroke !== "none" && s.strokeOpacity > 0 && s.strokeWidth > 0;
  const rule = s.fillRule === "evenodd" ? "even-odd" : "non-zero";
  let fillPaint: unknown = null;
  if (hasFill) {
    fillPaint = s.fill.startsWith("url(") ? gradientPaint(doc, root, s.fill, bbox()) : s.fill;
    if (fillPaint === null) fillPaint = "#000000";
    if (typeof fillPaint === "string") doc.fillColor(fillPaint, s.fillOpacity);
    else doc.fillOpacity(s.fillOpacity as number);
  }
  if (hasStroke) {
    doc.strokeColor(s.stroke, s.strokeOpacity);
    applyStroke(doc, s);
  }
  if (hasFill && hasStroke) {
    if (typeof fillPaint === "string") doc.fillAndStroke(fillPaint, s.stroke, rule);
    else doc.fillAndStroke(fillPaint as PDFKit.Mixins.ColorValue, s.stroke, rule);
  } else if (hasFill) doc.fill(fillPaint as PDFKit.Mixins.ColorValue, rule);
  else if (hasStroke) doc.stroke();
}

function pointsOf(v: unknown): number[] {
  return String(v ?? "").trim().split(/[\s,]+/).filter(Boolean).map(Number);
}

/** pdfkit's number rounding (PDFObject.number), so the operators read as its own path methods would write them. */
const pdfNumber = (n: number): number => Math.round(n * 1e6) / 1e6;

/** Arguments per command letter (char code), -1 for a letter this fast path does not take. */
const ARITY = new Int8Array(128).fill(-1);
for (const [letters, k] of [["Mm", 2], ["Ll", 2], ["Hh", 1], ["Vv", 1], ["Cc", 6], ["Zz", 0]] as const) for (const ch of letters) ARITY[ch.charCodeAt(0)] = k;

/**
 * PDF path-construction operators for SVG path data made of M, L, H, V, C, Z and their
 * relative forms (what our drawings write), built as pdfkit's own path parser would
 * build them (the same points, summed in the same order, rounded alike), in one string
 * and one pass: the atlas's sphere maps hold thousands of subpaths, which pdfkit's
 * parser reads a character at a time. Undefined for any other command (arcs,
 * quadratics) or malformed data: pdfkit's parser then takes the path.
 */
export function pathOperators(d: string): string | undefined {
  const n = d.length;
  let out = "";
  let i = 0;
  let cmd = 0; // char code of the current command
  let want = -1; // its arity
  let cx = 0, cy = 0, sx = 0, sy = 0;
  let a0 = 0, a1 = 0, a2 = 0, a3 = 0, a4 = 0;
  let have = 0;
  while (i < n) {
    const ch = d.charCodeAt(i);
    if (ch === 32 || ch === 44 || ch === 10 || ch === 9 || ch === 13) {
      i++;
      continue;
    }
    if (ch >= 65) {
      if (ch >= 128 || ARITY[ch] < 0 || have !== 0) return undefined;
      cmd = ch;
      want = ARITY[ch];
      i++;
      if (want === 0) {
        out += out ? "\nh" : "h";
        cx = sx;
        cy = sy;
      }
      continue;
    }
    // a number: sign, digits with at most one point, exponent
    let j = i;
    if (ch === 45 || ch === 43) j++;
    let digits = false, point = false;
    for (; j < n; j++) {
      const c = d.charCodeAt(j);
      if (c >= 48 && c <= 57) digits = true;
      else if (c === 46 && !point) point = true;
      else break;
    }
    if (!digits) return undefined;
    if (j < n && (d.charCodeAt(j) | 32) === 101) {
      let k = j + 1;
      if (k < n && (d.charCodeAt(k) === 45 || d.charCodeAt(k) === 43)) k++;
      const k0 = k;
      while (k < n && d.charCodeAt(k) >= 48 && d.charCodeAt(k) <= 57) k++;
      if (k === k0) return undefined;
      j = k;
    }
    if (want <= 0) return undefined;
    const v = Number(d.slice(i, j));
    i = j;
    if (have < want - 1) {
      if (have === 0) a0 = v;
      else if (have === 1) a1 = v;
      else if (have === 2) a2 = v;
      else if (have === 3) a3 = v;
      else a4 = v;
      have++;
      continue;
    }
    have = 0;
    const rel = cmd >= 97;
    const ox = rel ? cx : 0, oy = rel ? cy : 0;
    const sep = out ? "\n" : "";
    switch (cmd | 32) {
      case 109: // m: further pairs are linetos (SVG)
        cx = ox + a0;
        cy = oy + v;
        sx = cx;
        sy = cy;
        out += `${sep}${pdfNumber(cx)} ${pdfNumber(cy)} m`;
        cmd = rel ? 108 : 76;
        break;
      case 108: // l
        cx = ox + a0;
        cy = oy + v;
        out += `${sep}${pdfNumber(cx)} ${pdfNumber(cy)} l`;
        break;
      case 104: // h
        cx = ox + v;
        out += `${sep}${pdfNumber(cx)} ${pdfNumber(cy)} l`;
        break;
      case 118: // v
        cy = oy + v;
        out += `${sep}${pdfNumber(cx)} ${pdfNumber(cy)} l`;
        break;
      default: {
        // c
        const x1 = ox + a0, y1 = oy + a1, x2 = ox + a2, y2 = oy + a3;
        cx = ox + a4;
        cy = oy + v;
        out += `${sep}${pdfNumber(x1)} ${pdfNumber(y1)} ${pdfNumber(x2)} ${pdfNumber(y2)} ${pdfNumber(cx)} ${pdfNumber(cy)} c`;
      }
    }
  }
  return have !== 0 ? undefined : out;
}

function drawText(doc: Doc, node: SceneNode, s: Style): void {
  const text = node.text ?? "";
  if (!text) return;
  const runs = visualRuns(text, s.fontWeight);
  const width = runsWidth(runs, s.fontSize);
  let x = num(node.attrs.x) - (s.anchor === "middle" ? width / 2 : s.anchor === "end" ? width : 0);
  const y = num(node.attrs.y);
  const hasFill = s.fill !== "none" && s.fillOpacity > 0;
  const hasStroke = s.stroke !== "none" && s.strokeOpacity > 0 && s.strokeWidth > 0;
  if (hasFill) doc.fillColor(s.fill, s.fillOpacity);
  if (hasStroke) {
    doc.strokeColor(s.stroke, s.strokeOpacity);
    applyStroke(doc, s);
  }
  for (const r of runs) {
    useFace(doc, r.face);
    doc.fontSize(s.fontSize);
    const w = runsWidth([r], s.fontSize);
    // textWidth: the run's width, known already (pdfkit would lay the run out again to learn it)
    doc.text(r.text, x, y, { lineBreak: false, baseline: "alphabetic", fill: hasFill, stroke: hasStroke, textWidth: w } as PDFKit.Mixins.TextOptions);
    x += w;
  }
}

/** The pdfkit 0.20 methods its type declarations leave out (raw content, object references, a page's XObject resources). */
function pdfkitInternals(doc: Doc) {
  return doc as unknown as {
    addContent(s: string): void;
    ref(data: object): { end(chunk: Uint8Array): void };
    page: { xobjects: Record<string, unknown> };
  };
}

const forms = new WeakMap<Doc, number>();

/**
 * Places deflated PDF content (SceneNode.pdfContent) on the page as a form XObject
 * (PDF 32000-1:2008, 8.10) in the current user space, bounded by the drawing's box.
 * The bytes go into the file as they are (the stream's filter is given, so pdfkit does
 * not compress them again).
 */
function placeForm(doc: Doc, deflated: Uint8Array, box: { width: number; height: number }): void {
  const n = (forms.get(doc) ?? 0) + 1;
  forms.set(doc, n);
  const name = `Fm${n}`;
  const d = pdfkitInternals(doc);
  const ref = d.ref({ Type: "XObject", Subtype: "Form", BBox: [0, 0, box.width, box.height], Filter: "FlateDecode" });
  ref.end(deflated);
  d.page.xobjects[name] = ref;
  d.addContent(`/${name} Do`);
}

function paintNode(doc: Doc, root: SceneNode, node: SceneNode, parent: Style): void {
  const a = node.attrs;
  switch (node.tag) {
    case "defs":
    case "title":
    case "stop":
    case "linearGradient":
    case "radialGradient":
      return;
  }
  const s = inherit(parent, a);
  if (node.tag === "svg" && node !== root) {
    // a nested drawing: its viewBox fitted into (x, y, width, height), "xMidYMid meet"
    const { width, height } = sceneSize(node);
    const w = num(a.width, width), h = num(a.height, height);
    const k = Math.min(w / width, h / height);
    doc.save();
    doc.translate(num(a.x) + (w - k * width) / 2, num(a.y) + (h - k * height) / 2);
    doc.scale(k);
    for (const c of node.children) paintNode(doc, node, c, s);
    doc.restore();
    return;
  }
  if (node.pdfContent) {
    placeForm(doc, node.pdfContent, sceneSize(root));
    return;
  }
  if (node.tag === "g" || node.tag === "svg") {
    const tr = a.transform !== undefined ? /translate\(\s*([-\d.e]+)[\s,]+([-\d.e]+)\s*\)/.exec(String(a.transform)) : null;
    if (tr) {
      doc.save();
      doc.translate(Number(tr[1]), Number(tr[2]));
    }
    for (const c of node.children) paintNode(doc, root, c, s);
    if (tr) doc.restore();
    return;
  }
  doc.save();
  const t = a.transform !== undefined ? /rotate\(\s*([-\d.e]+)(?:[\s,]+([-\d.e]+)[\s,]+([-\d.e]+))?\s*\)/.exec(String(a.transform)) : null;
  if (t) doc.rotate(Number(t[1]), { origin: [Number(t[2] ?? 0), Number(t[3] ?? 0)] });
  switch (node.tag) {
    case "path": {
      const d = String(a.d ?? "");
      if (d) {
        const ops = pathOperators(d);
        if (ops === undefined) doc.path(d);
        else pdfkitInternals(doc).addContent(ops);
        paint(doc, root, s, () => [0, 0, 1, 1]);
      }
      break;
    }
    case "circle": {
      const cx = num(a.cx), cy = num(a.cy), r = num(a.r);
      doc.circle(cx, cy, r);
      paint(doc, root, s, () => [cx - r, cy - r, 2 * r, 2 * r]);
      break;
    }
    case "ellipse": {
      const cx = num(a.cx), cy = num(a.cy), rx = num(a.rx), ry = num(a.ry);
      doc.ellipse(cx, cy, rx, ry);
      paint(doc, root, s, () => [cx - rx, cy - ry, 2 * rx, 2 * ry]);
      break;
    }
    case "polygon": {
      const p = pointsOf(a.points);
      if (p.length >= 4) {
        doc.moveTo(p[0], p[1]);
        for (let i = 2; i + 1 < p.length; i += 2) doc.lineTo(p[i], p[i + 1]);
        doc.closePath();
        paint(doc, root, s, () => {
          let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
          for (let i = 0; i + 1 < p.length; i += 2) {
            x0 = Math.min(x0, p[i]); x1 = Math.max(x1, p[i]);
            y0 = Math.min(y0, p[i + 1]); y1 = Math.max(y1, p[i + 1]);
          }
          return [x0, y0, x1 - x0, y1 - y0];
        });
      }
      break;
    }
    case "rect": {
      const x = num(a.x), y = num(a.y), w = num(a.width), h = num(a.height);
      doc.rect(x, y, w, h);
      paint(doc, root, s, () => [x, y, w, h]);
      break;
    }
    case "text":
      drawText(doc, node, s);
      break;
  }
  doc.restore();
}

/**
 * Paints `scene` into `box` (inches from the page's top-left, offset by `origin`),
 * scaled to fit with its aspect ratio kept and centred (SVG's "xMidYMid meet").
 */
export function paintScene(doc: Doc, scene: SceneNode, box: Box, origin: readonly [number, number] = [0, 0]): void {
  const { width, height } = sceneSize(scene);
  const w = box.wIn * PT_PER_IN, h = box.hIn * PT_PER_IN;
  const k = Math.min(w / width, h / height);
  const x = (origin[0] + box.xIn) * PT_PER_IN + (w - k * width) / 2;
  const y = (origin[1] + box.yIn) * PT_PER_IN + (h - k * height) / 2;
  doc.save();
  doc.translate(x, y);
  doc.scale(k);
  paintNode(doc, scene, scene, ROOT_STYLE);
  doc.restore();
}

/** Paints `scene` with its user units taken as points, its top-left at (xPt, yPt). */
export function paintSceneAt(doc: Doc, scene: SceneNode, xPt = 0, yPt = 0): void {
  doc.save();
  doc.translate(xPt, yPt);
  paintNode(doc, scene, scene, ROOT_STYLE);
  doc.restore();
}
