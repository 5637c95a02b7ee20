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

const LABELS: Record<string, string> = { index: "I", middle: "M", ring: "R", thumb: "T" };
/** Seam samples for a card's drawings: about 0.035 in apart on the ball, below a printed dot at a card's 1.5 in ball. */
const CARD_SEAM_POINTS = 256;

export interface CardDrawings {
  readonly pitcher: SceneNode;
  readonly catcher: SceneNode;
}

export function cardDrawings(r: ScreenReport, o: OrientationReport, seamShape: number, sizePx = 300, idPrefix = "card"): CardDrawings {
  const toBall = transposeRotation(o.release.ballToField);
  const b = (v: Vec3) => applyRotation(toBall, v);
  const up = b([0, 0, 1]);
  const fingers: FingerMark[] = o.fingers.map((f) => {
    const size = PAD_SIZE_IN[f.finger as Finger] ?? PAD_SIZE_IN.index;
    return { direction: f.direction, pointing: f.pointing, widthIn: size.widthIn, lengthIn: size.lengthIn, label: LABELS[f.finger] ?? f.finger, working: f.working };
  });
  // the seam movement at the plate (plate plane: x toward the catcher's right, z up)
  const push: Vec3 = [o.seamMovement.horizontalIn, 0, o.seamMovement.verticalIn];
  const hasPush = Math.hypot(...push) > 0.05;
  const pushOverlay = (label?: string) => (hasPush ? { push: { direction: b(push), frame: "ball" as const, ...(label ? { label } : {}) } } : {});
  // the arm side is field -x for a right-hander; the pitcher's right is -x, the catcher's right +x
  const armOnPitchersRight = r.input.pitch.hand === "right";
  const pitcher = ballScene(
    {
      seamShape,
      view: viewFromDirections(b([0, 1, 0]), up),
      overlays: { spinAxis: o.axis, fingers, ...pushOverlay("push") },
      caption: "your view, from behind the ball",
      sides: armOnPitchersRight ? { left: "glove side", right: "arm side" } : { left: "arm side", right: "glove side" },
    },
    { sizePx, seamPoints: CARD_SEAM_POINTS, legend: false, idPrefix: `${idPrefix}-p` },
  );
  const catcher = ballScene(
    {
      seamShape,
      view: viewFromDirections(b([0, -1, 0]), up),
      overlays: { spinAxis: o.axis, fingers, ...pushOverlay() },
      caption: "the catcher's view",
      sides: armOnPitchersRight ? { left: "arm side", right: "glove side" } : { left: "glove side", right: "arm side" },
    },
    { sizePx, seamPoints: CARD_SEAM_POINTS, legend: false, idPrefix: `${idPrefix}-c` },
  );
  return { pitcher, catcher };
}
