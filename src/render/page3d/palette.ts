/**
 * The page's colours, in one place for the CSS and the 3-D scene so that a
 * legend swatch and the thing it names are always the same colour.
 * Our own scheme: a dark ink background so the cream ball and the two band
 * sides (teal for the + side of the a-split, amber for the - side) stand out.
 */
export const PALETTE = {
  background: "#16202a",
  panel: "#1f2b37",
  panelEdge: "#2f3e4d",
  text: "#e8edf2",
  muted: "#a9b6c3",
  cover: "#efe8d8",
  seam: "#59636e",
  stitch: "#c4473b",
  sidePlus: "#23b5a4",
  sideMinus: "#e6a23c",
  splitLine: "#f4f6f8",
  flight: "#6fb6ff",
  spinAxis: "#a68cf0",
  push: "#ff6d8a",
  caution: "#ffd27a",
  /** A pad that grips a seam, and the thumb and the curled finger (deep blues, to read on the cream cover). */
  finger: "#2457a6",
  fingerOther: "#5b86c4",
  /** A pad's label: white letters on this. */
  fingerLabel: "#1d3f73",
  /** A refused value's message beside its field. */
  error: "#ffa394",
  /** The chosen entry of a list, behind the text. */
  chosen: "#26405a",
} as const;

export type PaletteName = keyof typeof PALETTE;

/** "#rrggbb" to the integer three.js takes for a colour. */
export function hexToInt(hex: string): number {
  return Number.parseInt(hex.slice(1), 16);
}
