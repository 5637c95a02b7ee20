/**
 * The two ball drawings of a grip card, from a grip in the screen report
 * (src/screening/report.ts: its axis, release rotation and finger pads):
 *   "your view"       the pitcher's own view at release: behind the ball, looking
 *                     toward the plate, field up at the top; the fingertips point the
 *                     way they pull the ball round (up its back for backspin) and the
 *                     thumb is beneath; the fingers at their real pad sizes
 *                     (src/screening/hand.ts PAD_SIZE_IN);
 *   "catcher's view"  from the plate, looking back at the pitcher: the face of the
 *                     ball that comes at the hitter, the fingers behind it.
 * Both show the spin axis, the seam push at the plate (its direction) and which side
 * is the arm side. Directions go from the field frame to the ball frame through the
 * release rotation of the hand model.
 */
import type { Vec3 } from "../../../geometry/vec.js";
import { applyRotation, PAD_SIZE_IN, transposeRotation, type Finger } from "../../screening/hand.js";
import type { OrientationReport, ScreenReport } from "../../screening/report.js";
import { ballScene } from "../ballDrawing.js";
import type { FingerMark } from "../ballOverlays.js";
import { viewFromDirections } from "../projection.js";
import type { SceneNode } from "../scene.js";

/** The letter each finger is drawn with, in the order keys list them. */
export const FINGER_LETTERS: Readonly<Record<Finger, string>> = { index: "I", middle: "M", ring: "R", thumb: "T" };

/** A grip's pads as drawn: at an adult's pad size (src/screening/hand.ts PAD_SIZE_IN), lettered. */
export function fingerMarks(pads: readonly { readonly finger: string; readonly direction: Vec3; readonly pointing: Vec3; readonly working: boolean }[]): FingerMark[] {
  return pads.map((f) => {
    const size = PAD_SIZE_IN[f.finger as Finger] ?? PAD_SIZE_IN.index;
    return { direction: f.direction, pointing: f.pointing, widthIn: size.widthIn, lengthIn: size.lengthIn, label: FINGER_LETTERS[f.finger as Finger] ?? f.finger, working: f.working };
  });
}

/** Field directions in the ball frame at release (the hand model's rotation), and the two views: from behind the ball (the pitcher's) and from the plate. */
export function releaseViews(ballToField: readonly number[]) {
  const toBall = transposeRotation(ballToField);
  const b = (v: Vec3) => applyRotation(toBall, v);
  const up = b([0, 0, 1]);
  return { toBall: b, behind: viewFromDirections(b([0, 1, 0]), up), fromPlate: viewFromDirections(b([0, -1, 0]), up) };
}
/** Seam samples for a card's drawings: about 0.035 in apart on the ball, below a printed dot at a card's 1.5 in ball. */
const CARD_SEAM_POINTS = 256;

export interface CardDrawings {
  readonly pitcher: SceneNode;
  readonly catcher: SceneNode;
}

export function cardDrawings(r: ScreenReport, o: OrientationReport, seamShape: number, sizePx = 300, idPrefix = "card"): CardDrawings {
  const { toBall: b, behind, fromPlate } = releaseViews(o.release.ballToField);
  const fingers = fingerMarks(o.fingers);
  // the seam movement at the plate (plate plane: x toward the catcher's right, z up)
  const push: Vec3 = [o.seamMovement.horizontalIn, 0, o.seamMovement.verticalIn];
  const hasPush = Math.hypot(...push) > 0.05;
  const pushOverlay = (label?: string) => (hasPush ? { push: { direction: b(push), frame: "ball" as const, ...(label ? { label } : {}) } } : {});
  // the arm side is field -x for a right-hander; the pitcher's right is -x, the catcher's right +x
  const armOnPitchersRight = r.input.pitch.hand === "right";
  const pitcher = ballScene(
    {
      seamShape,
      view: behind,
      overlays: { spinAxis: o.axis, fingers, ...pushOverlay("push") },
      caption: "your view, from behind the ball",
      sides: armOnPitchersRight ? { left: "glove side", right: "arm side" } : { left: "arm side", right: "glove side" },
    },
    { sizePx, seamPoints: CARD_SEAM_POINTS, legend: false, idPrefix: `${idPrefix}-p` },
  );
  const catcher = ballScene(
    {
      seamShape,
      view: fromPlate,
      overlays: { spinAxis: o.axis, fingers, ...pushOverlay() },
      caption: "the catcher's view",
      sides: armOnPitchersRight ? { left: "arm side", right: "glove side" } : { left: "glove side", right: "arm side" },
    },
    { sizePx, seamPoints: CARD_SEAM_POINTS, legend: false, idPrefix: `${idPrefix}-c` },
  );
  return { pitcher, catcher };
}
