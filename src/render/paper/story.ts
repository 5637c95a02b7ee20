/**
 * The one plain-words story of what the seams do, told on cards' atlas, sheets and
 * the handout in the same words, with the seam-force model's own angles
 * (src/physics/seamModel/MODEL.md: a seam in the trip zone ahead of laminar
 * separation trips the boundary layer and that side separates later; a seam in the
 * separation band fixes separation at itself; the ball is pushed toward the side
 * that separates later). The angles come from the model profile in use.
 */
import { defaultValues, type SeamModelValues } from "../../physics/seamModel/parameters.js";

/** The story for a model profile's values (default: the built-in profile). */
export function modelStory(v: SeamModelValues = defaultValues()): string {
  const r = (x: number) => Math.round(x);
  const lo = v.bandCenterDeg - v.bandWidthDeg / 2;
  const hi = v.bandCenterDeg + v.bandWidthDeg / 2;
  return (
    `Air flowing over the ball clings to it for a while, then leaves it along a line: about ${r(v.laminarSeparationDeg)}\u00b0 back from the very front of the ball when nothing disturbs it. ` +
    `A raised seam well ahead of that line (${r(v.tripStartDeg)}\u00b0 to ${r(v.tripEndDeg)}\u00b0 back from the front) roughens the thin layer of air next to the ball, and on that side the air clings on longer, leaving near ${r(v.turbulentSeparationDeg)}\u00b0. ` +
    `A seam sitting in the band where the air leaves (${r(lo)}\u00b0 to ${r(hi)}\u00b0) holds the line at the seam itself. ` +
    `The ball is pushed toward the side where the air leaves later. As the ball spins these change from moment to moment; the model follows them through every turn and adds them up. ` +
    `Depending on where the spin axis goes through the ball, that push can point sideways, up or down, or cancel out.`
  );
}

export const MODEL_STORY = modelStory();
