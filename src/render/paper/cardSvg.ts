/**
 * A grip card as one SVG (the same blocks as the PDF card, at 96 px per inch): the
 * ball drawings are nested <svg> elements; text is wrapped by a simple character
 * count (about 0.5 em per character for a sans-serif), so it is deterministic.
 */
import type { Box, Layout } from "./layouts.js";
import type { CardContent } from "./card.js";
import { CAUTION_SHORT } from "./words.js";

const PX_PER_IN = 96;
const PX_PER_PT = 96 / 72;

function esc(s: string): string {
  return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

function wrap(text: string, maxChars: number): string[] {
  const out: string[] = [];
  for (const para of text.split("\n")) {
    let line = "";
    for (const word of para.split(/\s+/)) {
      if ((line + " " + word).trim().length > maxChars && line) {
        out.push(line);
        line = word;
      } else line = (line + " " + word).trim();
    }
    out.push(line);
  }
  return out;
}

function textBlock(text: string, box: Box, sizePt: number, weight: string, color: string): string {
  const size = sizePt * PX_PER_PT;
  const maxChars = Math.max(8, Math.floor((box.wIn * PX_PER_IN) / (0.5 * size)));
  const maxLines = Math.max(1, Math.floor((box.hIn * PX_PER_IN) / (size * 1.25)));
  const lines = wrap(text, maxChars).slice(0, maxLines);
  const x = (box.xIn * PX_PER_IN).toFixed(1);
  return lines
    .map((l, i) => `<text x="${x}" y="${(box.yIn * PX_PER_IN + size * (1 + 1.25 * i)).toFixed(1)}" font-family="Helvetica, Arial, sans-serif" font-size="${size.toFixed(1)}" font-weight="${weight}" fill="${color}">${esc(l)}</text>`)
    .join("\n");
}

function nested(svg: string, box: Box): string {
  const inner = svg.replace(/^<\?xml[^>]*>\s*/, "");
  return inner.replace(/^<svg\b([^>]*)>/, (_m, attrs: string) => {
    const kept = attrs.replace(/\s(width|height|x|y)="[^"]*"/g, "");
    return `<svg x="${(box.xIn * PX_PER_IN).toFixed(1)}" y="${(box.yIn * PX_PER_IN).toFixed(1)}" width="${(box.wIn * PX_PER_IN).toFixed(1)}" height="${(box.hIn * PX_PER_IN).toFixed(1)}"${kept}>`;
  });
}

export function renderCardSvg(layout: Layout, c: CardContent): string {
  const b = layout.blocks;
  const f = layout.fonts;
  const w = layout.page.widthIn * PX_PER_IN;
  const h = layout.page.heightIn * PX_PER_IN;
  const rows = c.numbers
    .map(([k, v], i) => {
      const y = b.numbers.yIn * PX_PER_IN + f.sizePt * PX_PER_PT * (1 + 1.45 * i);
      const x = b.numbers.xIn * PX_PER_IN;
      const size = (f.sizePt * PX_PER_PT).toFixed(1);
      return `<text x="${x.toFixed(1)}" y="${y.toFixed(1)}" font-family="Helvetica, Arial, sans-serif" font-size="${size}" fill="#555555">${esc(k)}</text><text x="${(x + 0.45 * b.numbers.wIn * PX_PER_IN).toFixed(1)}" y="${y.toFixed(1)}" font-family="Helvetica, Arial, sans-serif" font-size="${size}" font-weight="bold" fill="#1b1b1b">${esc(v)}</text>`;
    })
    .join("\n");
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}" viewBox="0 0 ${w} ${h}">`,
    `<rect x="0.5" y="0.5" width="${w - 1}" height="${h - 1}" fill="#ffffff" stroke="#9a9a9a" stroke-dasharray="4 4"/>`,
    textBlock(c.title, b.title, f.titleSizePt, "bold", "#1b1b1b"),
    textBlock(c.summary, b.summary, f.sizePt, "normal", "#333333"),
    nested(c.drawings.held, b.viewHeld),
    nested(c.drawings.flow, b.viewFlow),
    rows,
    textBlock([...c.fingers, c.advice].join("\n"), b.fingers, f.sizePt, "normal", "#1b1b1b"),
    textBlock(CAUTION_SHORT, b.caution, Math.max(5.5, f.sizePt - 1), "normal", "#7a2f1d"),
    `</svg>`,
    "",
  ].join("\n");
}
