/**
 * Text on a drawing without font metrics: svg.js's text() measures glyphs to place
 * lines, which ties the output to the fonts on the machine, so labels are plain
 * <text> elements positioned by attributes alone.
 */
import type { Container } from "@svgdotjs/svg.js";

export interface TextStyle {
  /** Font size, px. */
  readonly sizePx: number;
  readonly fill: string;
  readonly anchor?: "start" | "middle" | "end";
  readonly weight?: "normal" | "bold";
  readonly italic?: boolean;
  /** A white outline under the glyphs (its own element, drawn first), px wide, so labels stay legible over marks. */
  readonly haloPx?: number;
  readonly opacity?: number;
  readonly className?: string;
}

/**
 * Adds `text` with its baseline at (xPx, yPx). A halo is a separate text element drawn
 * first (under the letters), not an SVG paint-order, which PDF converters ignore.
 */
export function addText(parent: Container, xPx: number, yPx: number, text: string, style: TextStyle): void {
  const place = (t: ReturnType<Container["plain"]>) => {
    t.attr({ x: xPx, y: yPx, "font-size": style.sizePx });
    if (style.anchor && style.anchor !== "start") t.attr("text-anchor", style.anchor);
    if (style.weight === "bold") t.attr("font-weight", "bold");
    if (style.italic) t.attr("font-style", "italic");
    if (style.opacity !== undefined && style.opacity < 1) t.attr("opacity", style.opacity);
    return t;
  };
  if (style.haloPx) {
    place(parent.plain(text)).attr({ fill: "#ffffff", stroke: "#ffffff", "stroke-width": style.haloPx, "stroke-linejoin": "round", class: "sa-halo" });
  }
  const t = place(parent.plain(text)).attr({ fill: style.fill });
  if (style.className) t.attr("class", style.className);
}
