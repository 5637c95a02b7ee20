/**
 * Legibility of rendered pages, measured as a reader's eye would: every word that
 * poppler finds in a PDF (pdftotext -bbox) is looked at in the page rendered by
 * poppler (pdftoppm, RGB), and the ink inside the word's box is compared with the
 * ground around it by the WCAG 2.x contrast ratio.
 *
 * Relative luminance and contrast ratio: W3C, "Web Content Accessibility Guidelines
 * (WCAG) 2.1", definitions of "relative luminance" and "contrast ratio" (sRGB
 * channels c/255 linearised as c/12.92 below 0.04045 and ((c+0.055)/1.055)^2.4
 * above; L = 0.2126 R + 0.7152 G + 0.0722 B; ratio (L1 + 0.05) / (L2 + 0.05), L1 the
 * lighter). Success criterion 1.4.3 (Contrast, minimum) asks 4.5:1 for text.
 *
 * Per word (a token holding a letter or a digit): inside the word's box, one pixel
 * wider all round, the ink is the darkest pixel and the ground the lightest (each
 * the third from its end, so one stray pixel cannot decide), and the word passes
 * when their contrast ratio reaches the threshold: dark letters against the paper,
 * a tint or a label's halo they sit on (or light letters on a dark ground, the
 * ratio being symmetric). A label whose white outline is painted over its own
 * letters leaves only outline and surroundings in its box, and fails; so does
 * grey text too small or too pale for its ink to come through at the resolution.
 */
import { readFileSync } from "node:fs";
import { run } from "./poppler.js";

export interface WordBox {
  readonly text: string;
  /** Points from the page's top-left. */
  readonly xMin: number;
  readonly yMin: number;
  readonly xMax: number;
  readonly yMax: number;
}

/** The words pdftotext finds on each page: pages[i] for page i + 1. */
export function wordBoxes(pdf: string): WordBox[][] {
  const html = run("pdftotext", ["-bbox", pdf, "-"]);
  return html.split("<page ").slice(1).map((page) =>
    [...page.matchAll(/<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)<\/word>/g)].map((m) => ({
      xMin: Number(m[1]),
      yMin: Number(m[2]),
      xMax: Number(m[3]),
      yMax: Number(m[4]),
      text: m[5].replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&quot;/g, '"').replace(/&amp;/g, "&"),
    })),
  );
}

export interface RgbImage {
  readonly w: number;
  readonly h: number;
  /** Relative luminance of each pixel, 0..1. */
  readonly lum: Float32Array;
}

const linear = (c: number) => {
  const s = c / 255;
  return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
};
const LINEAR = Float64Array.from({ length: 256 }, (_, c) => linear(c));

/** WCAG 2.x relative luminance of an sRGB colour given as 0..255 channels. */
export function relativeLuminance(r: number, g: number, b: number): number {
  return 0.2126 * LINEAR[r] + 0.7152 * LINEAR[g] + 0.0722 * LINEAR[b];
}

/** WCAG 2.x contrast ratio of two relative luminances, 1 to 21. */
export function contrastRatio(l1: number, l2: number): number {
  return (Math.max(l1, l2) + 0.05) / (Math.min(l1, l2) + 0.05);
}

/** One page rendered by pdftoppm at `dpi` as luminances. */
export function renderLuminance(pdf: string, page: number, dpi: number, outStem: string): RgbImage {
  run("pdftoppm", ["-r", String(dpi), "-f", String(page), "-l", String(page), "-singlefile", pdf, outStem]);
  const buf = readFileSync(`${outStem}.ppm`);
  const header = /^P6\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(buf.subarray(0, 64).toString("latin1"))!;
  const w = Number(header[1]);
  const h = Number(header[2]);
  const px = buf.subarray(header[0].length);
  const lum = new Float32Array(w * h);
  for (let i = 0; i < w * h; i++) lum[i] = relativeLuminance(px[3 * i], px[3 * i + 1], px[3 * i + 2]);
  return { w, h, lum };
}

/** The contrast of one word against its ground (see the file's header), or null for a box too small to judge. */
export function wordContrast(img: RgbImage, dpi: number, word: WordBox): { ratio: number; ink: number; ground: number } | null {
  const k = dpi / 72;
  // the box a pixel wider on each side, so anti-aliased edges are inside it
  const x0 = Math.max(0, Math.floor(word.xMin * k) - 1), x1 = Math.min(img.w - 1, Math.ceil(word.xMax * k) + 1);
  const y0 = Math.max(0, Math.floor(word.yMin * k) - 1), y1 = Math.min(img.h - 1, Math.ceil(word.yMax * k) + 1);
  if (x1 - x0 < 3 || y1 - y0 < 4) return null;
  const px: number[] = [];
  for (let y = y0; y <= y1; y++) for (let x = x0; x <= x1; x++) px.push(img.lum[y * img.w + x]);
  px.sort((a, b) => a - b);
  // the ends of the box's luminances, each taken as the third pixel in, so a stray pixel cannot make the pair
  const dark = px[Math.min(2, px.length - 1)];
  const light = px[Math.max(0, px.length - 3)];
  // dark letters on a light ground, or light letters on a dark one: the ratio is the same
  const ink = dark;
  const ground = light;
  return { ratio: contrastRatio(ink, ground), ink, ground };
}

/** Whether a word is one to judge: it holds a letter or a digit (a lone dot, dash or slash is punctuation, too thin for a darkest-pixel measure). */
export function isWord(text: string): boolean {
  return /[\p{L}\p{N}]/u.test(text);
}
