/// <reference lib="dom" />
/**
 * The card face in the browser: the page's build-time stand-in for render/fonts.ts
 * (src/build/bundle.ts puts this module in its place in the page bundle), so the card
 * the page prints is set by the same rule as `seam-atlas card` (render/typeset.ts)
 * over the same files: which subset sets a character comes from each file's own
 * character map (measured when the page was written), and a word's width from the
 * browser laying the word out in that very file (canvas measureText at one pixel per
 * font unit, so the advances, kerning and ligatures are the file's whole units).
 *
 * The page carries the files of the Latin subset (data.ts PageFonts); a word in a
 * subset it does not carry is measured and drawn in the browser's own face, so its
 * line may break a little differently from the command line's.
 */
import type * as NodeFonts from "../render/fonts.js";
import type { PageFonts } from "../render/page3d/data.js";
import { typesetter, type FontWeight, type TypesetFace } from "../render/typeset.js";

export { MISSING_GLYPH, type FontWeight } from "../render/typeset.js";
export const FONT_FAMILY = "Noto Sans";

/** The family each subset file is measured in (distinct from the family the card draws with). */
const measureFamily = (subset: string) => `seam-atlas-${subset}`;

let fonts: PageFonts | null = null;
let context: CanvasRenderingContext2D | OffscreenCanvasRenderingContext2D | null = null;

function bytesOf(base64: string): Uint8Array<ArrayBuffer> {
  const text = atob(base64);
  const out = new Uint8Array(new ArrayBuffer(text.length));
  for (let i = 0; i < text.length; i++) out[i] = text.charCodeAt(i);
  return out;
}

function holds(ranges: readonly number[], cp: number): boolean {
  // ascending [first, last] pairs: binary search on the pairs
  let lo = 0;
  let hi = ranges.length / 2 - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (cp < ranges[2 * mid]) hi = mid - 1;
    else if (cp > ranges[2 * mid + 1]) lo = mid + 1;
    else return true;
  }
  return false;
}

/** CSS unicode-range of the code points a subset is the first to hold (so the drawn face is the one the text was set in). */
function firstHolderRange(data: PageFonts, index: number, weight: FontWeight): string {
  const own = data.subsets[index].coverage[weight];
  const parts: string[] = [];
  for (let k = 0; k < own.length; k += 2) {
    for (let cp = own[k]; cp <= own[k + 1]; cp++) {
      if (data.subsets.slice(0, index).some((s) => holds(s.coverage[weight], cp))) continue;
      const last = parts[parts.length - 1];
      const hex = cp.toString(16).toUpperCase();
      const m = last ? /^U\+([0-9A-F]+)(?:-([0-9A-F]+))?$/.exec(last) : null;
      const end = m ? Number.parseInt(m[2] ?? m[1], 16) : -2;
      if (m && end === cp - 1) parts[parts.length - 1] = `U+${m[1]}-${hex}`;
      else parts.push(`U+${hex}`);
    }
  }
  return parts.join(", ");
}

/**
 * Hands the page's card face to the browser: each carried file under a family of its
 * own (for measuring) and as "Noto Sans" for the code points it is the first to hold
 * (for drawing the card). Resolves once every file is ready.
 */
export async function installPageFonts(data: PageFonts): Promise<void> {
  fonts = data;
  const loads: Promise<FontFace>[] = [];
  data.subsets.forEach((s, index) => {
    if (!s.woff) return;
    for (const weight of ["normal", "bold"] as const) {
      const bytes = bytesOf(s.woff[weight]);
      const descriptors = { weight: weight === "bold" ? "700" : "400", style: "normal" };
      const measure = new FontFace(measureFamily(s.subset), bytes, descriptors);
      const draw = new FontFace(data.family, bytes, { ...descriptors, unicodeRange: firstHolderRange(data, index, weight) });
      for (const f of [measure, draw]) {
        document.fonts.add(f);
        loads.push(f.load());
      }
    }
  });
  await Promise.all(loads);
}

function measuringContext(): CanvasRenderingContext2D | OffscreenCanvasRenderingContext2D {
  if (context) return context;
  const c = document.createElement("canvas").getContext("2d");
  if (!c) throw new Error("this browser gives no 2-D canvas to measure text with");
  return (context = c);
}

function pageFaces(): PageFonts {
  if (!fonts) throw new Error("the card face is not installed yet (installPageFonts)");
  return fonts;
}

interface PageFace extends TypesetFace {
  readonly subset: string;
}

const faceCache = new Map<string, PageFace>();

function face(index: number, weight: FontWeight): PageFace {
  const data = pageFaces();
  const s = data.subsets[index];
  const key = `NotoSans-${s.subset}-${weight === "bold" ? 700 : 400}`;
  let f = faceCache.get(key);
  if (f) return f;
  const upem = data.unitsPerEm;
  const font = `${weight === "bold" ? 700 : 400} ${upem}px "${measureFamily(s.subset)}", "${data.family}", sans-serif`;
  f = {
    key,
    subset: s.subset,
    holds: (cp) => holds(s.coverage[weight], cp),
    wordWidthEm: (word) => {
      const ctx = measuringContext();
      ctx.font = font;
      // at one pixel per font unit the layout is in whole units; the browser's sum carries float noise
      return Math.round(ctx.measureText(word).width) / upem;
    },
  };
  faceCache.set(key, f);
  return f;
}

const text = typesetter<PageFace>({
  get subsetCount() {
    return pageFaces().subsets.length;
  },
  face,
  metricsEm: (weight) => pageFaces().metrics[weight],
});

export const { textRuns, printable, measureText, runsWidth, fontMetricsEm, wrapText } = text;

// the functions the card's text layout takes from render/fonts.ts, with the same types
type Shared = "FONT_FAMILY" | "measureText" | "wrapText" | "fontMetricsEm" | "printable";
export const SAME_AS_NODE: Pick<typeof NodeFonts, Shared> = { FONT_FAMILY, measureText, wrapText, fontMetricsEm, printable };
