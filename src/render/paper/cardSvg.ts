/**
 * A grip card as one SVG file: the card's drawing (card.ts) written out, at its
 * real size in inches. Text names Noto Sans first; the letters are the card's own.
 */
import { serializeScene } from "../scene.js";
import { cardScene, type CardContent } from "./card.js";
import type { Layout } from "./layouts.js";

export function renderCardSvg(layout: Layout, c: CardContent): string {
  const scene = cardScene(layout, c);
  scene.attr({ width: `${layout.page.widthIn}in`, height: `${layout.page.heightIn}in` });
  return `${serializeScene(scene, 2, "card")}\n`;
}
