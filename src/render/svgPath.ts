/**
 * Path data text for polylines, with coordinates rounded where they are written
 * (so a path's text is already what `serializeSvg` would leave).
 */
import { formatNumber } from "./scene.js";

/**
 * "M x0 y0 L x1 y1 ..." through flat 2-D points [x0, y0, x1, y1, ...] (px), with "Z" when closed.
 * Returns "" for fewer than two points, so callers can concatenate subpaths freely.
 */
export function polylinePath(xy: ArrayLike<number>, closed: boolean, digits: number): string {
  if (xy.length < 4) return "";
  let d = "";
  for (let i = 0; i + 1 < xy.length; i += 2) {
    d += `${i === 0 ? "M" : "L"}${formatNumber(xy[i], digits)} ${formatNumber(xy[i + 1], digits)}`;
  }
  return closed ? `${d}Z` : d;
}

/** "x0,y0 x1,y1 ..." for a <polygon> or <polyline> `points` attribute. */
export function pointsAttribute(xy: ArrayLike<number>, digits: number): string {
  const parts: string[] = [];
  for (let i = 0; i + 1 < xy.length; i += 2) parts.push(`${formatNumber(xy[i], digits)},${formatNumber(xy[i + 1], digits)}`);
  return parts.join(" ");
}

/**
 * A closed polygon as "M x0 y0 l dx dy ... Z" with relative steps, which is shorter
 * for small shapes. Points are rounded first and the steps taken between rounded
 * points, so the corners land exactly where `polylinePath` would put them (no drift).
 */
export function relativePolygonPath(xy: ArrayLike<number>, digits: number): string {
  if (xy.length < 4) return "";
  const k = 10 ** digits;
  const rx = (i: number) => Math.round(xy[i] * k);
  let d = `M${formatNumber(rx(0) / k, digits)} ${formatNumber(rx(1) / k, digits)}l`;
  for (let i = 2; i + 1 < xy.length; i += 2) {
    // integer steps in units of 10^-digits, so the sums are exact
    const dx = (rx(i) - rx(i - 2)) / k;
    const dy = (rx(i + 1) - rx(i - 1)) / k;
    d += `${i === 2 ? "" : " "}${formatNumber(dx, digits)} ${formatNumber(dy, digits)}`;
  }
  return `${d}Z`;
}
