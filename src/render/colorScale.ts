/**
 * Our sequential colour scale "verdigris": spruce black, deep teal, verdigris, moss,
 * sand, bone, interpolated in OKLab (B. Ottosson, "A perceptual color space for image
 * processing", 2020; matrices from that article). The anchors' OKLab lightness rises
 * strictly, so the ramp reads low-to-high as dark-to-light in print, on screens and
 * in grey, and equal steps in value are close to equal steps in perceived lightness.
 */

/** Anchors, low to high value. */
export const VERDIGRIS_ANCHORS: readonly string[] = ["#10242b", "#1f4f5a", "#3f7f74", "#8aa86a", "#d8c37f", "#fbf3dc"];

type Lab = [number, number, number];

const toLinear = (c: number) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
const toGamma = (c: number) => (c <= 0.0031308 ? 12.92 * c : 1.055 * c ** (1 / 2.4) - 0.055);

/** OKLab (L in 0..1) of an sRGB colour "#rrggbb". */
export function hexToOklab(hex: string): Lab {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new RangeError(`colour "${hex}" is not #rrggbb`);
  const [r, g, b] = [m[1], m[2], m[3]].map((h) => toLinear(parseInt(h, 16) / 255));
  const l = Math.cbrt(0.4122214708 * r + 0.5363325363 * g + 0.0514459929 * b);
  const mm = Math.cbrt(0.2119034982 * r + 0.6806995451 * g + 0.1073969566 * b);
  const s = Math.cbrt(0.0883024619 * r + 0.2817188376 * g + 0.6299787005 * b);
  return [
    0.2104542553 * l + 0.793617785 * mm - 0.0040720468 * s,
    1.9779984951 * l - 2.428592205 * mm + 0.4505937099 * s,
    0.0259040371 * l + 0.7827717662 * mm - 0.808675766 * s,
  ];
}

/** "#rrggbb" of an OKLab colour, each channel clipped to the sRGB gamut. */
export function oklabToHex([L, a, b]: Readonly<Lab>): string {
  const l = (L + 0.3963377774 * a + 0.2158037573 * b) ** 3;
  const m = (L - 0.1055613458 * a - 0.0638541728 * b) ** 3;
  const s = (L - 0.0894841775 * a - 1.291485548 * b) ** 3;
  const rgb = [
    4.0767416621 * l - 3.3077115913 * m + 0.2309699292 * s,
    -1.2684380046 * l + 2.6097574011 * m - 0.3413193965 * s,
    -0.0041960863 * l - 0.7034186147 * m + 1.707614701 * s,
  ];
  return `#${rgb.map((c) => Math.round(255 * toGamma(Math.min(1, Math.max(0, c)))).toString(16).padStart(2, "0")).join("")}`;
}

const ANCHOR_LAB = VERDIGRIS_ANCHORS.map(hexToOklab);

/** The ramp's colour at `t` in [0, 1] (clamped); throws RangeError for NaN. */
export function rampColor(t: number): string {
  if (Number.isNaN(t)) throw new RangeError("ramp position is NaN");
  const u = Math.min(1, Math.max(0, t)) * (ANCHOR_LAB.length - 1);
  const i = Math.min(ANCHOR_LAB.length - 2, Math.floor(u));
  const f = u - i;
  const a = ANCHOR_LAB[i], b = ANCHOR_LAB[i + 1];
  return oklabToHex([a[0] + f * (b[0] - a[0]), a[1] + f * (b[1] - a[1]), a[2] + f * (b[2] - a[2])]);
}
