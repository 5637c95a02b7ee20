/**
 * A fresh svg.js canvas per drawing, and deterministic serialisation.
 *
 * svg.js draws into whichever window was registered last and numbers generated ids
 * from one process-wide counter (SvgjsG1001, ...). So every canvas gets its own
 * svgdom window (drawings never share a document), and `serializeSvg` turns any
 * generated id into one counted within the drawing, drops svg.js's private
 * `data-svgjs` attributes and rounds every number inside an attribute value to a
 * fixed count of decimals (at least 3 for opacities and gradient offsets, which are
 * fractions): equal inputs give equal bytes in any process.
 * Text content is left alone (a label such as "2.50 in" is the caller's).
 */
import { createSVGWindow } from "svgdom";
import { SVG, registerWindow, type Svg } from "@svgdotjs/svg.js";

/** Decimals kept in attribute numbers unless a renderer asks otherwise (0.01 px). */
export const DEFAULT_SVG_DIGITS = 2;

/** A new, empty root <svg> of the given size in px, in a window of its own. */
export function createSvgCanvas(widthPx: number, heightPx: number): Svg {
  if (!(widthPx > 0 && heightPx > 0 && Number.isFinite(widthPx) && Number.isFinite(heightPx))) {
    throw new RangeError(`canvas size ${widthPx} x ${heightPx} px must be positive and finite`);
  }
  const window = createSVGWindow();
  registerWindow(window, window.document);
  const draw = SVG(window.document.documentElement) as Svg;
  return draw.attr({ width: widthPx, height: heightPx, viewBox: `0 0 ${widthPx} ${heightPx}` });
}

/** `x` rounded to `digits` decimals as the shortest decimal text; never "-0". */
export function formatNumber(x: number, digits: number): string {
  const r = Number(x.toFixed(digits));
  return r === 0 ? "0" : String(r);
}

// Numbers inside attribute values. Whole numbers pass through unchanged, so ids such
// as "sa-auto-12" keep their text; a number may not follow a letter ("w3.org"),
// except in path data, where command letters run into their numbers ("M1.5 2L3 4").
const NUMBER_IN_VALUE = /(?<![\w.])-?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/g;
const NUMBER_IN_PATH = /(?<![\d.])-?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/g;
const ATTRIBUTE = /\s([\w:-]+)="([^"]*)"/g;
const GENERATED_ID = /Svgjs[A-Za-z]*\d+/g;

/**
 * Serialises the canvas: generated ids renamed `${idPrefix}-auto-1`, ... in order
 * of first appearance, `data-svgjs` attributes removed, attribute numbers rounded.
 * @param digits decimals kept, 0..6
 */
export function serializeSvg(draw: Svg, digits: number = DEFAULT_SVG_DIGITS, idPrefix = "sa"): string {
  if (!(Number.isInteger(digits) && digits >= 0 && digits <= 6)) {
    throw new RangeError(`digits ${digits} must be a whole number from 0 to 6`);
  }
  const ids = new Map<string, string>();
  return draw
    .svg()
    .replace(/\sdata-svgjs="[^"]*"/g, "")
    .replace(GENERATED_ID, (id) => {
      if (!ids.has(id)) ids.set(id, `${idPrefix}-auto-${ids.size + 1}`);
      return ids.get(id) as string;
    })
    .replace(ATTRIBUTE, (whole: string, name: string, value: string) => {
      // hex colours are not numbers
      if (value.startsWith("#")) return whole;
      const pattern = name === "d" ? NUMBER_IN_PATH : NUMBER_IN_VALUE;
      // opacities and gradient offsets are fractions, not px: coarse rounding would erase them
      const keep = /opacity$/.test(name) || name === "offset" ? Math.max(digits, 3) : digits;
      const rounded = value.replace(pattern, (n) => (/[.eE]/.test(n) ? formatNumber(Number(n), keep) : n));
      return ` ${name}="${rounded}"`;
    });
}
