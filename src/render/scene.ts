/**
 * Drawing commands shared by every output: a small retained tree of SVG-shaped
 * nodes (svg, g, path, circle, ellipse, polygon, rect, text, gradients) that a
 * renderer builds once and that is then
 *   - written as SVG text (`serializeScene`: deterministic, numbers rounded),
 *   - painted straight into a pdfkit page (render/paper/pdfScene.ts), and
 *   - rasterised to PNG from that SVG text (render/png.ts).
 * No DOM, no svg.js window: building a node is a plain object, so a page of
 * drawings costs little and the PDF never goes through an SVG parser.
 *
 * Coordinates are user units of the root's viewBox with y down, as in SVG.
 * Text is a node of its own; a label's white halo is a separate text node drawn
 * before (under) the letters (`addText`), never an SVG paint-order, which PDF
 * painters ignore.
 */

export type AttrValue = string | number;
export type Attrs = Record<string, AttrValue>;

/** Decimals kept in attribute numbers unless a renderer asks otherwise (0.01 px). */
export const DEFAULT_SCENE_DIGITS = 2;

const AUTO_ID = "\u0001auto-";

export interface GradientStop {
  readonly offset: number;
  readonly color: string;
  readonly opacity?: number;
}

/** One node of a drawing: an SVG element name, its attributes (in the order set), children and text. */
export class SceneNode {
  readonly tag: string;
  readonly attrs: Attrs = {};
  readonly children: SceneNode[] = [];
  text?: string;
  /**
   * This node's drawing already made as PDF content operators, deflated, in the node's
   * user units (render/sphereMapDrawing.ts sphereMapCellsPdf): the PDF painter places it
   * as one form in place of the children. Other outputs ignore it.
   */
  pdfContent?: Uint8Array;
  /** The root of the tree (for ids and defs). */
  private readonly root: SceneNode;
  private autoIds = 0;
  private defsNode?: SceneNode;

  constructor(tag: string, root?: SceneNode) {
    this.tag = tag;
    this.root = root ?? this;
  }

  /** Sets attributes (an object, or one name and value); returns this node. */
  attr(a: Attrs): this;
  attr(name: string, value: AttrValue): this;
  attr(a: Attrs | string, value?: AttrValue): this {
    if (typeof a === "string") this.attrs[a] = value as AttrValue;
    else for (const k of Object.keys(a)) if (a[k] !== undefined) this.attrs[k] = a[k];
    return this;
  }

  /** Appends a child element `tag`. */
  element(tag: string): SceneNode {
    const n = new SceneNode(tag, this.root);
    this.children.push(n);
    return n;
  }

  /** Sets the node's text content (as svg.js's words()). */
  words(text: string): this {
    this.text = text;
    return this;
  }

  group(): SceneNode {
    return this.element("g");
  }
  path(d?: string): SceneNode {
    const n = this.element("path");
    return d === undefined ? n : n.attr({ d });
  }
  circle(): SceneNode {
    return this.element("circle");
  }
  ellipse(): SceneNode {
    return this.element("ellipse");
  }
  polygon(): SceneNode {
    return this.element("polygon");
  }
  rect(width?: number, height?: number): SceneNode {
    const n = this.element("rect");
    if (width !== undefined) n.attr({ width, height: height ?? width });
    return n;
  }
  /** A text element holding `text` as it is (no line breaking). */
  plain(text: string): SceneNode {
    return this.element("text").words(text);
  }

  /** Fills with a paint (a gradient node or a colour). */
  fill(paint: SceneNode | string): this {
    return this.attr({ fill: typeof paint === "string" ? paint : `url(#${paint.id()})` });
  }

  /** The node's id (one counted within the drawing is given on first use), or sets it. */
  id(): string;
  id(value: string): this;
  id(value?: string): string | this {
    if (value !== undefined) {
      this.attrs.id = value;
      return this;
    }
    if (this.attrs.id === undefined) this.attrs.id = `${AUTO_ID}${++this.root.autoIds}`;
    return String(this.attrs.id);
  }

  /** A gradient in the drawing's <defs>, its stops added by `stops`. */
  gradient(kind: "linear" | "radial", stops: (add: { stop(s: GradientStop): void }) => void): SceneNode {
    const root = this.root;
    if (!root.defsNode) {
      root.defsNode = new SceneNode("defs", root);
      root.children.unshift(root.defsNode);
    }
    const g = root.defsNode.element(kind === "linear" ? "linearGradient" : "radialGradient");
    stops({
      stop: (s) => {
        const st = g.element("stop").attr({ offset: s.offset, "stop-color": s.color });
        if (s.opacity !== undefined) st.attr("stop-opacity", s.opacity);
      },
    });
    return g;
  }

  /** The gradient with id `id` in the drawing's defs, if any. */
  findGradient(id: string): SceneNode | undefined {
    return this.root.defsNode?.children.find((c) => c.attrs.id === id);
  }
}

/** A new drawing of the given size (user units, also its px size in SVG). */
export function createScene(width: number, height: number): SceneNode {
  if (!(width > 0 && height > 0 && Number.isFinite(width) && Number.isFinite(height))) {
    throw new RangeError(`canvas size ${width} x ${height} px must be positive and finite`);
  }
  return new SceneNode("svg").attr({ width, height, viewBox: `0 0 ${width} ${height}` });
}

/**
 * Places drawing `child` (a root from createScene) inside `parent` at (x, y), scaled
 * to fit width x height with its aspect ratio kept and centred, as a nested <svg>.
 */
export function nestScene(parent: SceneNode, child: SceneNode, x: number, y: number, width: number, height: number): SceneNode {
  child.attr({ x, y, width, height });
  parent.children.push(child);
  return child;
}

/** `x` rounded to `digits` decimals as the shortest decimal text; never "-0". */
export function formatNumber(x: number, digits: number): string {
  // x.toFixed(digits) read back as a number: the same decimals, fast for the common case
  const k = POW10[digits];
  if (k !== undefined && Math.abs(x) < 1e9) {
    const r = Math.round(x * k) / k;
    return r === 0 ? "0" : String(r);
  }
  const r = Number(x.toFixed(digits));
  return r === 0 ? "0" : String(r);
}
const POW10 = [1, 10, 100, 1000, 10000, 100000, 1000000];

/** The width and height of a drawing's viewBox. */
export function sceneSize(root: SceneNode): { width: number; height: number } {
  const vb = String(root.attrs.viewBox ?? `0 0 ${root.attrs.width} ${root.attrs.height}`).trim().split(/[\s,]+/).map(Number);
  return { width: vb[2], height: vb[3] };
}

const NUMBER_IN_VALUE = /(?<![\w.])-?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/g;
const NUMBER_IN_PATH = /(?<![\d.])-?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/g;
/** Attributes that hold text, not numbers. */
const VERBATIM = new Set(["id", "class", "font-family", "xmlns", "text-anchor", "font-weight", "font-style", "stroke-linejoin", "stroke-linecap", "fill-rule"]);

/** Escapes text for SVG/XML content and attribute values; drops characters XML 1.0 cannot hold (NUL and other C0 controls but tab, line feed, return). */
export function escapeXml(s: string): string {
  return s
    // eslint-disable-next-line no-control-regex
    .replace(/[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]/g, "")
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;");
}

function attrText(name: string, value: AttrValue, digits: number, prefix: string): string {
  // opacities and gradient offsets are fractions, not px: coarse rounding would erase them
  const keep = /opacity$/.test(name) || name === "offset" ? Math.max(digits, 3) : digits;
  if (typeof value === "number") return formatNumber(value, keep);
  const v = value.split(AUTO_ID).join(`${prefix}-auto-`);
  if (VERBATIM.has(name) || v.startsWith("#") || v.startsWith("url(")) return escapeXml(v);
  const pattern = name === "d" ? NUMBER_IN_PATH : NUMBER_IN_VALUE;
  return escapeXml(v.replace(pattern, (n) => (/[.eE]/.test(n) ? formatNumber(Number(n), keep) : n)));
}

function write(node: SceneNode, digits: number, prefix: string, out: string[]): void {
  out.push(`<${node.tag}`);
  if (node.tag === "svg" && node.attrs.xmlns === undefined) out.push(` xmlns="http://www.w3.org/2000/svg"`);
  for (const k of Object.keys(node.attrs)) out.push(` ${k}="${attrText(k, node.attrs[k], digits, prefix)}"`);
  if (!node.children.length && node.text === undefined) {
    out.push(node.tag === "svg" || node.tag === "g" || node.tag === "defs" || node.tag === "text" ? `></${node.tag}>` : "/>");
    return;
  }
  out.push(">");
  if (node.text !== undefined) out.push(escapeXml(node.text));
  for (const c of node.children) write(c, digits, prefix, out);
  out.push(`</${node.tag}>`);
}

/**
 * The drawing as SVG text: attribute numbers rounded to `digits` decimals (at least
 * 3 for opacities and gradient offsets), ids given on first use named
 * `${idPrefix}-auto-1`, ... in order of creation, text and attribute values escaped.
 * Equal drawings give equal bytes.
 * @param digits decimals kept, 0..6
 */
export function serializeScene(root: SceneNode, digits: number = DEFAULT_SCENE_DIGITS, idPrefix = "sa"): string {
  if (!(Number.isInteger(digits) && digits >= 0 && digits <= 6)) {
    throw new RangeError(`digits ${digits} must be a whole number from 0 to 6`);
  }
  const out: string[] = [];
  write(root, digits, idPrefix, out);
  return out.join("");
}

export interface TextStyle {
  /** Font size, user units. */
  readonly sizePx: number;
  readonly fill: string;
  readonly anchor?: "start" | "middle" | "end";
  readonly weight?: "normal" | "bold";
  /** A white outline under the glyphs, this wide, so labels stay legible over marks. */
  readonly haloPx?: number;
  /** The halo's colour (default white). */
  readonly haloColor?: string;
  readonly opacity?: number;
  readonly className?: string;
}

/**
 * Adds `text` with its baseline at (x, y). A halo is its own text node, drawn
 * first: the same letters stroked wide in the halo colour, then the letters on top,
 * so every painter (browsers, resvg, the PDF painter) puts the outline under them.
 * @returns the letters' node
 */
export function addText(parent: SceneNode, x: number, y: number, text: string, style: TextStyle): SceneNode {
  const common = (t: SceneNode) => {
    t.attr({ x, y, "font-size": style.sizePx });
    if (style.anchor && style.anchor !== "start") t.attr("text-anchor", style.anchor);
    if (style.weight === "bold") t.attr("font-weight", "bold");
    if (style.opacity !== undefined && style.opacity < 1) t.attr("opacity", style.opacity);
    return t;
  };
  if (style.haloPx) {
    const halo = common(parent.plain(text)).attr({
      fill: style.haloColor ?? "#ffffff",
      stroke: style.haloColor ?? "#ffffff",
      "stroke-width": style.haloPx,
      "stroke-linejoin": "round",
      class: "sa-halo",
    });
    void halo;
  }
  const t = common(parent.plain(text)).attr({ fill: style.fill });
  if (style.className) t.attr("class", style.className);
  return t;
}
