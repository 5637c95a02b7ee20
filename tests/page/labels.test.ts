/** Label layout on the ball picture (src/page/labels.ts): no two shown labels overlap, none leaves the picture. */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { behindBall, LABEL_GAP_PX, placeLabels } from "../../src/page/labels.js";

function disjoint(a: { left: number; top: number; w: number; h: number }, b: { left: number; top: number; w: number; h: number }): boolean {
  return a.left + a.w + LABEL_GAP_PX <= b.left || b.left + b.w + LABEL_GAP_PX <= a.left || a.top + a.h + LABEL_GAP_PX <= b.top || b.top + b.h + LABEL_GAP_PX <= a.top;
}

describe("placing labels beside their anchors", () => {
  it("never lets two shown labels overlap (a gap of 3 px kept) and keeps each inside the picture, whatever the anchors", () => {
    const box = fc.record({ x: fc.integer({ min: 0, max: 600 }), y: fc.integer({ min: 0, max: 400 }), width: fc.integer({ min: 8, max: 120 }), height: fc.integer({ min: 14, max: 24 }) });
    fc.assert(
      fc.property(fc.array(box, { minLength: 1, maxLength: 12 }), (boxes) => {
        const placed = placeLabels(boxes, 600, 400);
        const shown = placed.map((p, i) => ({ ...p, w: boxes[i].width, h: boxes[i].height })).filter((p) => p.shown);
        for (const p of shown) {
          expect(p.left).toBeGreaterThanOrEqual(0);
          expect(p.top).toBeGreaterThanOrEqual(0);
          expect(p.left + p.w).toBeLessThanOrEqual(600);
          expect(p.top + p.h).toBeLessThanOrEqual(400);
        }
        for (let i = 0; i < shown.length; i++) for (let j = i + 1; j < shown.length; j++) expect(disjoint(shown[i], shown[j])).toBe(true);
      }),
      { seed: 1301, numRuns: 300 },
    );
  });

  it("shows the first label of two on the same anchor right of it and moves the second off it (the case of '+ side' over 'spin axis')", () => {
    const [a, b] = placeLabels([{ x: 300, y: 200, width: 60, height: 20 }, { x: 305, y: 204, width: 70, height: 20 }], 600, 400);
    expect(a).toEqual({ left: 306, top: 190, shown: true });
    expect(b.shown).toBe(true);
    expect(disjoint({ ...a, w: 60, h: 20 }, { ...b, w: 70, h: 20 })).toBe(true);
  });

  it("hides a label it is told is hidden, and one with no free place left", () => {
    expect(placeLabels([{ x: 10, y: 10, width: 20, height: 20 }], 600, 400, [true])[0].shown).toBe(false);
    // a picture just big enough for one label: the second finds no place
    const tight = placeLabels([{ x: 20, y: 12, width: 30, height: 20 }, { x: 20, y: 12, width: 30, height: 20 }], 60, 24);
    expect(tight.map((p) => p.shown)).toEqual([true, false]);
  });
});

describe("whether the ball hides a point from the camera (closed form: the segment's first crossing of the unit sphere)", () => {
  it("hides a point on the far side and shows one on the near side or beside the ball", () => {
    const camera = [0, 0, 5] as const;
    expect(behindBall(camera, [0, 0, -1.03])).toBe(true);
    expect(behindBall(camera, [0, 0, 1.03])).toBe(false);
    // off to the side, the line of sight passes 1.5 from the centre: clear of the ball
    expect(behindBall(camera, [1.5, 0, -1])).toBe(false);
    // grazing: the line of sight x = 0.999 at z = 0 passes inside the ball
    expect(behindBall(camera, [0.999 * 2, 0, -5])).toBe(true);
  });
});
