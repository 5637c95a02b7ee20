/**
 * Labels of the bullpen report that must fit a width, measured with the printed
 * face (render/fonts.ts): a title shrunk, then broken, to fit; a one-line label cut
 * with an ellipsis. Widths and sizes in the drawing's own units.
 */
import { measureText, wrapText, type FontWeight } from "../fonts.js";

const ELLIPSIS = "\u2026";

/** `text` on one line no wider than `maxWidth`: as it is when it fits, else cut between graphemes and ended with an ellipsis. */
export function fitLine(text: string, maxWidth: number, size: number, weight: FontWeight = "normal"): string {
  if (measureText(text, size, weight) <= maxWidth) return text;
  const graphemes = [...new Intl.Segmenter(undefined, { granularity: "grapheme" }).segment(text)].map((s) => s.segment);
  let lo = 0;
  let hi = graphemes.length;
  // the longest head that fits with the ellipsis (widths grow with the head)
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (measureText(`${graphemes.slice(0, mid).join("").trimEnd()}${ELLIPSIS}`, size, weight) <= maxWidth) lo = mid;
    else hi = mid - 1;
  }
  return `${graphemes.slice(0, lo).join("").trimEnd()}${ELLIPSIS}`;
}

/**
 * A title in at most `maxLines` lines no wider than `maxWidth`: at `size` when it
 * fits on one line, else at the largest size down to `minSize` (in steps of 0.5) that
 * fits on one line, else broken into lines at `minSize`, the last cut with an ellipsis.
 */
export function fitTitle(text: string, maxWidth: number, size: number, minSize: number, weight: FontWeight = "normal", maxLines = 2): { size: number; lines: string[] } {
  for (let s = size; s >= minSize - 1e-9; s -= 0.5) {
    if (measureText(text, s, weight) <= maxWidth) return { size: s, lines: [text] };
  }
  const lines = wrapText(text, maxWidth, minSize, weight);
  if (lines.length <= maxLines) return { size: minSize, lines };
  const kept = lines.slice(0, maxLines);
  kept[maxLines - 1] = fitLine(`${lines.slice(maxLines - 1).join(" ")}`, maxWidth, minSize, weight);
  return { size: minSize, lines: kept };
}
