/**
 * Labels that never overlap: each label is anchored at a point on the screen and
 * placed beside it, trying places round the anchor (right, left, above, below, then
 * farther out) until its box touches no label placed before it and stays inside the
 * picture; a label with no free place is hidden rather than drawn over another.
 * Earlier labels in the list are placed first (they win). Pure: boxes in, places out.
 */

export interface LabelBox {
  /** Anchor on the screen, px (y down). */
  readonly x: number;
  readonly y: number;
  /** The label's size, px. */
  readonly width: number;
  readonly height: number;
}

export interface Placed {
  /** Top-left corner, px; null when the label is hidden. */
  readonly left: number;
  readonly top: number;
  readonly shown: boolean;
}

/** Clear space kept between two labels, px. */
export const LABEL_GAP_PX = 3;
/** Distance from the anchor to the nearest edge of its label, px, in the first ring of places. */
const OFFSET_PX = 6;
const RINGS = 4;

interface Rect {
  l: number;
  t: number;
  r: number;
  b: number;
}

function overlaps(a: Rect, b: Rect, gap: number): boolean {
  return a.l < b.r + gap && b.l < a.r + gap && a.t < b.b + gap && b.t < a.b + gap;
}

/** Places the labels (in order of precedence) inside a picture `width` x `height` px; `hidden[i]` labels take no place. */
export function placeLabels(boxes: readonly LabelBox[], width: number, height: number, hidden: readonly boolean[] = []): Placed[] {
  const taken: Rect[] = [];
  return boxes.map((box, i) => {
    if (hidden[i]) return { left: 0, top: 0, shown: false };
    const { x, y, width: w, height: h } = box;
    for (let ring = 0; ring < RINGS; ring++) {
      const o = OFFSET_PX + ring * (h + LABEL_GAP_PX);
      const places: [number, number][] = [
        [x + o, y - h / 2],
        [x - o - w, y - h / 2],
        [x - w / 2, y - o - h],
        [x - w / 2, y + o],
        [x + o, y - o - h],
        [x - o - w, y - o - h],
        [x + o, y + o],
        [x - o - w, y + o],
      ];
      for (const [l, t] of places) {
        const rect = { l, t, r: l + w, b: t + h };
        if (rect.l < 0 || rect.t < 0 || rect.r > width || rect.b > height) continue;
        if (taken.some((q) => overlaps(q, rect, LABEL_GAP_PX))) continue;
        taken.push(rect);
        return { left: l, top: t, shown: true };
      }
    }
    return { left: 0, top: 0, shown: false };
  });
}

/** Whether the segment from the camera to a point passes through the ball (unit radius, centred at the origin) before reaching it. */
export function behindBall(camera: readonly [number, number, number], point: readonly [number, number, number], radius = 1): boolean {
  const dx = point[0] - camera[0], dy = point[1] - camera[1], dz = point[2] - camera[2];
  const a = dx * dx + dy * dy + dz * dz;
  const b = 2 * (camera[0] * dx + camera[1] * dy + camera[2] * dz);
  const c = camera[0] ** 2 + camera[1] ** 2 + camera[2] ** 2 - radius * radius;
  const disc = b * b - 4 * a * c;
  if (disc <= 0) return false;
  // where the segment enters the ball, as a share of the way to the point
  const t = (-b - Math.sqrt(disc)) / (2 * a);
  return t > 0 && t < 1 - 1e-9;
}
