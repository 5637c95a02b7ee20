/**
 * The words printed on cards, atlases and handouts: plain sentences built from the
 * screen report's numbers (src/screening/report.ts), with the shared number
 * formats (src/screening/numbers.ts), so the paper says what `screen --json` says.
 */
import { fixed, formatInches, formatMovementIn } from "../numbers.js";
import type { FingerReport, OrientationReport, ScreenReport } from "../../screening/report.js";

/** The safety caution every card, atlas and handout carries (our wording). */
export const CAUTION_SHORT =
  "Caution: pitching can injure. A new grip changes arm stress - build up throwing gradually, " +
  "get qualified coaching and medical advice, follow league rules on the ball and never alter it. Local rules and licensed practice come first.";

export const CAUTION_LONG = [
  "Pitching can injure the shoulder, elbow and back, and the risk grows with fatigue, volume and sudden changes.",
  "Any change of grip, release or arm action changes the stress on the arm. Try a new grip at low intensity and short distance first, and raise volume and effort gradually over weeks, not days.",
  "Follow an arm-care programme and rest guidelines suited to the athlete's age, and stop at pain, numbness or loss of control.",
  "Work with a qualified pitching coach, and with medical staff (a licensed athletic trainer, physiotherapist or physician) for any history of arm trouble.",
  "Follow your league's rules on the ball, grips and substances. Never scuff, cut, mark or otherwise alter the ball.",
  "The numbers here come from a geometric and aerodynamic model, not from measurements of your ball or athlete. Local rules and licensed professional practice always come first.",
];

const FINGER_NAMES: Record<string, string> = { index: "Index pad", middle: "Middle pad", thumb: "Thumb" };
const WANT_WORDS: Record<string, string> = { arm: "arm side", glove: "glove side", up: "up", down: "down", any: "either way" };

function regionWords(f: FingerReport): string {
  const near = f.region.near.replace("-", " ");
  return f.region.part === "lobe" ? `on cover half ${f.region.half}, toward the middle of ${near}` : `on cover half ${f.region.half}, by the narrow ${near}`;
}

/** "Middle pad: on the seam (0.03 in from its centre line)." / "Index pad: 0.34 in inside the seam, on cover half B, by the narrow waist B." */
export function fingerSentence(f: FingerReport): string {
  const name = FINGER_NAMES[f.finger] ?? f.finger;
  if (f.region.part === "seam") return `${name}: on the seam (${formatInches(f.seamDistanceIn)} in from its centre line).`;
  return `${name}: ${formatInches(f.seamDistanceIn)} in inside the seam, ${regionWords(f)}.`;
}

export function pitchSummary(r: ScreenReport): string {
  const p = r.input.pitch;
  return (
    `${p.hand === "right" ? "RHP" : "LHP"}, ${fixed(p.speedMph, 1)} mph, ${fixed(p.spinRpm, 0)} rpm, tilt ${p.tilt} (${p.view}'s view), ` +
    `gyro ${fixed(p.gyroDeg, 1)} deg (${fixed(p.efficiencyPct, 1)} % efficiency); wanted push: ${WANT_WORDS[p.want]}`
  );
}

export function orientationTitle(r: ScreenReport, o: OrientationReport): string {
  const p = r.input.pitch;
  const who = p.pitcher ? `${p.pitcher} - ` : "";
  return o.reference ? `${who}${p.name} - reference: ${o.reference} hold` : `${who}${p.name} - grip #${o.rank}`;
}

/** The numbers block: label / value pairs, in print order (inches of seam movement at the plate, the trade's reading). */
export function numberLines(r: ScreenReport, o: OrientationReport): [string, string][] {
  const m = o.seamMovement;
  const want = r.input.pitch.want;
  return [
    ["axis on ball", o.latLon.text],
    ["nearest mark", `${o.landmark.name}, ${fixed(o.landmark.angleDeg, 0)} deg`],
    ["seam move, in", `${formatMovementIn(m.armSideIn)} arm / ${formatMovementIn(m.verticalIn)} up`],
    ["push toward", m.clock ? `${m.clock} (${r.input.pitch.view})` : "none"],
    [want === "any" ? "score, in" : `toward ${WANT_WORDS[want]}, in`, formatMovementIn(o.score)],
    ["mean / p10, in", `${formatMovementIn(o.robustness.meanIn)} / ${formatMovementIn(o.robustness.p10In)}`],
    ["passes per turn", String(o.crossingsPerRevolution)],
    ["seam in band", `${fixed(100 * o.occupancy.seamInBand, 1)} % (occupancy)`],
  ];
}

/** What a reader should do with a grip card, in one sentence. */
export function holdAdvice(o: OrientationReport): string {
  if (o.reference) return `The classic ${o.reference} hold, for comparison: its seam movement is for this pitch's spin.`;
  return `Set the spin axis through ${o.latLon.text} on the ball; the grip may slide along the spin equator without changing the prediction.`;
}
