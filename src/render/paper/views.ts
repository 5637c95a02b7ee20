/**
 * The two ball drawings of a grip card, from a screened orientation:
 *   "as held"   seen from behind the ball at release, looking toward the plate, field
 *               up at the top: the finger pads face the viewer;
 *   "the flow"  seen from the side, across both the flight line and the push line:
 *               the separation band (a ring about the flight line) shows as a strip
 *               and the push arrow (the direction of the seam movement) lies in the page.
 * Directions go from the field frame to the ball frame through the release rotation
 * of the hand model (src/screening/hand.ts).
 */
import { cross3 as cross, dot3 as dot, type Vec3 } from "../../../geometry/vec.js";
import type { Band } from "../../sampling/band.js";
import { applyRotation, transposeRotation } from "../../screening/hand.js";
import type { ScreenedOrientation } from "../../screening/screen.js";
import { renderBallSvg } from "../ballDrawing.js";
import { viewFromDirections } from "../projection.js";

const PAD_RADIUS_IN = 0.3;
const PAD_LABELS: Record<string, string> = { index: "I", middle: "M", thumb: "T" };

export interface CardDrawings {
  readonly held: string;
  readonly flow: string;
}

export function cardDrawings(o: ScreenedOrientation, band: Band, seamShape: number, sizePx = 300, idPrefix = "card"): CardDrawings {
  const toBall = transposeRotation(o.grip.ballToField);
  const b = (v: Vec3) => applyRotation(toBall, v);
  const up = b([0, 0, 1]);
  const pads = o.grip.pads.map((p) => ({ direction: p.direction, label: PAD_LABELS[p.finger] ?? p.finger, radiusIn: PAD_RADIUS_IN }));
  // the push: the direction of the seam movement at the plate (plate plane: x toward the catcher's right, z up)
  const push: Vec3 = [o.seamMovement.horizontalM, 0, o.seamMovement.verticalM];
  const pushBall = b(push);
  const hasPush = Math.hypot(...push) > 1e-9;
  const held = renderBallSvg(
    {
      seamShape,
      view: viewFromDirections(b([0, 1, 0]), up),
      overlays: { spinAxis: o.axis, fingerPads: pads, ...(hasPush ? { push: { direction: pushBall, frame: "ball" as const, label: "push" } } : {}) },
      caption: "as held: from behind, at release",
    },
    { sizePx, seamPoints: 512, legend: false, idPrefix: `${idPrefix}-h` },
  );
  // the flow view looks across both the flight line and the push line, so the band (a
  // ring about the flight line) shows as a strip and the push arrow lies in the page
  const v: Vec3 = [0, -1, 0];
  const a = push;
  let side = cross(v, Math.hypot(...a) > 1e-12 ? a : [0, 0, 1]);
  if (Math.hypot(...side) < 1e-9) side = [1, 0, 0];
  if (side[2] < 0 || (side[2] === 0 && side[0] < 0)) side = [-side[0], -side[1], -side[2]];
  const sideUp: Vec3 = Math.abs(side[2]) > 0.9 ? [0, 1, 0] : [0, 0, 1];
  const flowView = viewFromDirections(b(side), b(sideUp));
  const flightInView = [dot(flowView.right, b(v)), dot(flowView.up, b(v))];
  const heading = Math.abs(flightInView[0]) >= Math.abs(flightInView[1]) ? (flightInView[0] > 0 ? "right" : "left") : flightInView[1] > 0 ? "top" : "bottom";
  const flow = renderBallSvg(
    {
      seamShape,
      view: flowView,
      overlays: { spinAxis: o.axis, flowBand: { flowDirection: b([0, -1, 0]), band }, ...(hasPush ? { push: { direction: pushBall, frame: "ball" as const, label: "push" } } : {}) },
      caption: `the flow: flight toward the ${heading}`,
    },
    { sizePx, seamPoints: 512, legend: false, idPrefix: `${idPrefix}-f` },
  );
  return { held, flow };
}
