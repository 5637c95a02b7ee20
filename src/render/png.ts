/**
 * Drawings (render/scene.ts) as PNG, rasterised by resvg (@resvg/resvg-js) from the
 * drawing's SVG text. Every text node is first replaced by the outline of its
 * letters in the embedded face (render/fonts.ts textOutline), so the picture needs
 * no font on the machine and shows the same letters, halos included, as the PDF.
 *
 * Resolution: PNG_WIDTH_PX wide (1600 px, enough for a full-width slide at 1600 x
 * 900 or a 6 in card printed at over 250 dpi), height in proportion.
 */
import { createRequire } from "node:module";
import { measureText, textOutline, type FontWeight } from "./fonts.js";
import { SceneNode, serializeScene } from "./scene.js";

/** Width of every PNG the tool writes, px. */
export const PNG_WIDTH_PX = 1600;

function num(v: unknown, fallback: number): number {
  const n = typeof v === "number" ? v : parseFloat(String(v ?? ""));
  return Number.isFinite(n) ? n : fallback;
}

/** A copy of the tree with each text node turned into a path of its letters' outlines. */
function outlined(node: SceneNode, inherited: { size: number; weight: FontWeight; anchor: string }): SceneNode {
  const a = node.attrs;
  const style = {
    size: num(a["font-size"], inherited.size),
    weight: (a["font-weight"] !== undefined ? (String(a["font-weight"]) === "bold" ? "bold" : "normal") : inherited.weight) as FontWeight,
    anchor: a["text-anchor"] !== undefined ? String(a["text-anchor"]) : inherited.anchor,
  };
  if (node.tag === "text") {
    const text = node.text ?? "";
    const width = measureText(text, style.size, style.weight);
    const x = num(a.x, 0) - (style.anchor === "middle" ? width / 2 : style.anchor === "end" ? width : 0);
    const out = new SceneNode("path");
    out.attr({ d: textOutline(text, x, num(a.y, 0), style.size, style.weight) || "M0 0" });
    for (const k of ["fill", "stroke", "stroke-width", "stroke-linejoin", "opacity", "class"]) if (a[k] !== undefined) out.attrs[k] = a[k];
    return out;
  }
  const copy = new SceneNode(node.tag);
  Object.assign(copy.attrs, a);
  copy.text = node.text;
  for (const c of node.children) copy.children.push(outlined(c, style));
  return copy;
}

/**
 * The drawing as PNG bytes, `widthPx` wide on white.
 * @throws RangeError for a width outside 16 to 8000 px
 */
export function sceneToPng(scene: SceneNode, widthPx: number = PNG_WIDTH_PX): Buffer {
  if (!(Number.isInteger(widthPx) && widthPx >= 16 && widthPx <= 8000)) throw new RangeError(`PNG width ${widthPx} px must be a whole number from 16 to 8000`);
  const svg = serializeScene(outlined(scene, { size: 16, weight: "normal", anchor: "start" }), 2);
  // a native module: loaded only when a picture is asked for
  const { Resvg } = createRequire(import.meta.url)("@resvg/resvg-js") as typeof import("@resvg/resvg-js");
  return new Resvg(svg, { fitTo: { mode: "width", value: widthPx }, background: "#ffffff", font: { loadSystemFonts: false }, logLevel: "off" }).render().asPng();
}
