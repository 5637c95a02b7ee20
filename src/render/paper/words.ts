/**
 * The words printed on cards, sheets, atlases and handouts: plain sentences a
 * player and a coach read, built from the screen report's numbers
 * (src/screening/report.ts) with the shared number formats (render/numbers.ts), so
 * the paper says what `screen --json` says.
 *
 * A grip is told the way a player sees and feels the ball: each cover half is a
 * dumbbell; where the seam bends round its end it makes a horseshoe; across the
 * middle of each half (the narrow waist) two seams run close together; the ends are
 * wide, smooth lobes. The classic holds are told as coaches teach them (common
 * practice): four-seam, fingers across the wide seams; two-seam, fingers along the
 * two close seams. Ball coordinates and landmark names go on a technical line only.
 */
import { fixed, formatMovementIn } from "../numbers.js";
import type { RankBy } from "../../screening/screen.js";
import type { FingerReport, HoldTurnReport, OrientationReport, ScreenReport } from "../../screening/report.js";

/** The safety caution every card, sheet, atlas and handout carries (our wording). */
export const CAUTION_SHORT =
  "Caution: pitching can injure. Keep to an arm-care programme, build a new grip up gradually and stop at any pain. " +
  "Get qualified coaching and medical advice. Follow league rules on the ball and never alter it.";

export const CAUTION_LONG = [
  "Pitching can injure the shoulder, elbow and back, and the risk grows with fatigue, volume and sudden changes.",
  "Any change of grip, release or arm action changes the stress on the arm. Try a new grip at low intensity and short distance first, and raise volume and effort gradually over weeks, not days.",
  "Follow an arm-care programme and rest guidelines suited to the athlete's age, and stop at pain, numbness or loss of control.",
  "Work with a qualified pitching coach, and with medical staff (a licensed athletic trainer, physiotherapist or physician) for any history of arm trouble.",
  "Follow your league's rules on the ball, grips and substances. Never scuff, cut, mark or otherwise alter the ball.",
  "The numbers here come from a geometric and aerodynamic model, not from measurements of your ball or athlete. Local rules and licensed professional practice always come first.",
];

/** What a player sees on the ball (ours). */
export const SEAM_PICTURE =
  "What you see on the ball: each of the two cover pieces is shaped like a dumbbell. Where the seam bends round the end of a piece it makes a horseshoe; " +
  "across the middle of each piece (its narrow waist) two seams run close together; the ends of the pieces are wide, smooth lobes.";

/** The classic holds as coaches teach them (common practice, no source): where the fingers go. */
export const HOLD_GRIP: Record<string, string> = {
  "four-seam": "four-seam hold: index and middle fingers across the wide seams",
  "two-seam": "two-seam hold: index and middle fingers along the two close seams, where they run nearest each other across the narrow waist",
};

/** The classic holds with the seam passes that name them, which hold for a ball spinning end over end (no gyro); a card gives its own pitch's count. */
export const HOLD_WORDS: Record<string, string> = {
  "four-seam": `${HOLD_GRIP["four-seam"]}, so four seams pass the front of the ball each turn of pure backspin`,
  "two-seam": `${HOLD_GRIP["two-seam"]}, so two seams pass the front each turn of pure backspin`,
};

export const WANT_WORDS: Record<string, string> = { arm: "arm-side", glove: "glove-side", up: "upward", down: "downward", any: "any" };
const DIRECTION_NAMES: Record<string, string> = { arm: "arm side", glove: "glove side", up: "up", down: "down" };
const TOWARD: Record<string, string> = { arm: "Toward the arm side", glove: "Toward the glove side", up: "Upward", down: "Downward" };
/** Angle between the four directions, degrees (arm and glove opposite, up and down across them). */
const DIRECTION_ANGLE: Record<string, Record<string, number>> = {
  arm: { arm: 0, up: 90, down: 90, glove: 180 },
  glove: { glove: 0, up: 90, down: 90, arm: 180 },
  up: { up: 0, arm: 90, glove: 90, down: 180 },
  down: { down: 0, arm: 90, glove: 90, up: 180 },
};
/** Below this share of the strongest seam movement a direction is out of reach (src/screening/screen.ts REACH_FLOOR). */
const REACH_FLOOR_PCT = 5;

const FINGER_NAMES: Record<string, string> = { index: "Index", middle: "Middle", ring: "Ring", thumb: "Thumb" };

export function pitchLabel(r: ScreenReport): string {
  const p = r.input.pitch;
  return p.pitcher ? `${p.pitcher} \u2013 ${p.name}` : p.name;
}

export function pitchSummary(r: ScreenReport): string {
  const p = r.input.pitch;
  const want = p.want === "any" ? "wanted: seam movement in any direction" : `wanted: ${WANT_WORDS[p.want]} seam movement`;
  return (
    `${p.hand === "right" ? "RHP" : "LHP"} \u00b7 ${fixed(p.speedMph, 1)} mph \u00b7 ${fixed(p.spinRpm, 0)} rpm \u00b7 tilt ${p.tilt} (${p.view}'s view) \u00b7 ` +
    `gyro ${fixed(p.gyroDeg, 1)}\u00b0 (${fixed(p.efficiencyPct, 1)} % spin efficiency) \u00b7 ${want}`
  );
}

export function orientationTitle(r: ScreenReport, o: OrientationReport): string {
  return o.reference ? `${pitchLabel(r)}: ${o.reference} hold, for comparison` : `${pitchLabel(r)}: grip ${o.rank}`;
}

/** Where the spin axis goes through the ball, in a player's words. */
export function axisWords(o: OrientationReport): string {
  const name = o.landmark.name;
  const off = o.landmark.angleDeg < 4 ? "" : ` (about ${fixed(o.landmark.angleDeg, 0)}\u00b0 off it)`;
  if (name.startsWith("tip")) return `The spin axis goes through the ball at a horseshoe's bend${off}.`;
  if (name.startsWith("waist")) return `The spin axis goes through the middle of a narrow waist, between the two close seams${off}.`;
  if (name.startsWith("lobe")) return `The spin axis goes through the middle of a wide, smooth lobe${off}.`;
  return `The spin axis goes through a seam where it crosses from one lobe to the next${off}.`;
}

/** Within this of a horseshoe's apex a pad is "at the bend", inches (about half a pad). */
const AT_TIP_IN = 0.3;
/** Within this, "near the bend", inches. */
const NEAR_TIP_IN = 0.5;

function seamPlace(f: FingerReport): string {
  const atTip = f.nearTip.distanceIn <= AT_TIP_IN;
  const near = f.region.near;
  if (f.region.part === "seam") {
    if (near.startsWith("waist")) return `on one of the two close seams${f.nearTip.distanceIn <= NEAR_TIP_IN ? ", near a horseshoe's bend" : ""}`;
    return atTip ? "on the seam at the horseshoe's bend" : "on a wide seam, along a lobe";
  }
  const off = `${fixed(f.seamDistanceIn, 2)} in off the seam`;
  if (atTip) return `inside the horseshoe's bend, ${off}`;
  return f.region.part === "waist" ? `in the narrow waist between the two close seams, ${off}` : `on the smooth wide lobe, ${off}`;
}

/** "Index: on one of the two close seams." */
export function fingerSentence(f: FingerReport): string {
  const name = FINGER_NAMES[f.finger] ?? f.finger;
  if (f.finger === "thumb") return `${name}: beneath the ball, ${seamPlace(f)}.`;
  if (!f.working) return `${name}: curled to meet the thumb on the glove side (the circle), ${seamPlace(f)}.`;
  return `${name}: ${seamPlace(f)}.`;
}

function rollDirection(t: HoldTurnReport): string {
  const parts: string[] = [];
  if (Math.abs(t.rollArmSide) >= 0.38) parts.push(t.rollArmSide > 0 ? "your arm side" : "your glove side");
  if (Math.abs(t.rollUp) >= 0.38) parts.push(t.rollUp > 0 ? "your fingertips" : "your palm");
  return parts.join(" and ");
}

/** Turns smaller than this are left out of the words, degrees. */
const TURN_WORDS_MIN_DEG = 3;

/** "Start from the two-seam hold and turn the ball 16° ..." */
export function turnSentence(t: HoldTurnReport): string {
  const hold = `the ${t.hold} hold`;
  if (t.angleDeg < TURN_WORDS_MIN_DEG) return `This is ${hold} (within ${fixed(Math.max(1, t.angleDeg), 0)}\u00b0): hold it as coaches teach it.`;
  const parts: string[] = [];
  // each part that is 3 deg or more, and always the larger one
  const rollFirst = t.rollDeg >= Math.abs(t.twistClockwiseDeg);
  if (t.rollDeg >= TURN_WORDS_MIN_DEG || rollFirst) parts.push(`the side under your fingers rolls ${fixed(t.rollDeg, 0)}\u00b0 toward ${rollDirection(t) || "the spin axis's end"}`);
  if (Math.abs(t.twistClockwiseDeg) >= TURN_WORDS_MIN_DEG || !rollFirst) {
    parts.push(`the ball twists ${fixed(Math.abs(t.twistClockwiseDeg), 0)}\u00b0 ${t.twistClockwiseDeg > 0 ? "clockwise" : "counter-clockwise"} as you look at its back`);
  }
  return `Start from ${hold} and turn the ball ${fixed(t.angleDeg, 0)}\u00b0 in your hand: ${parts.join(", and ")}. Then settle the fingers on the nearest seams, as drawn.`;
}

/** The lines of "How to hold it" for a grip or a classic hold. */
export function holdLines(r: ScreenReport, o: OrientationReport): string[] {
  const g = r.grip;
  const kind = g.kind === "breaking" ? "Breaking-ball grip" : g.kind === "changeup" ? "Changeup grip" : "Fastball grip";
  // a classic hold is a fastball hold, told as coaches teach it; a grip gets its pitch kind's pattern and the turn to it
  const lines = o.reference
    ? [`The ${HOLD_GRIP[o.reference] ?? o.reference}; thumb beneath. With this pitch's spin, ${o.crossingsPerRevolution === 1 ? "1 seam passes" : `${o.crossingsPerRevolution} seams pass`} the front of the ball each turn.`]
    : [`${kind}, ${g.pattern}${g.kindFromName ? "" : ` (the name "${r.input.pitch.name}" names no pitch kind, so the fastball pattern is used)`}.`];
  if (!o.reference && o.fromHold) lines.push(turnSentence(o.fromHold));
  lines.push(...o.fingers.map(fingerSentence));
  lines.push(axisWords(o));
  return lines;
}

/** The technical line: ball coordinates and landmark names, for whoever checks the numbers. */
export function technicalLine(o: OrientationReport): string {
  const f = o.fingers.map((p) => `${p.finger} ${p.region.part === "seam" ? "seam" : p.region.near} ${fixed(p.seamDistanceIn, 2)} in`).join(", ");
  return (
    `Technical: axis ${o.latLon.text} (nearest ${o.landmark.name}, ${fixed(o.landmark.angleDeg, 0)}\u00b0); ${o.crossingsPerRevolution} seam passes per turn; ` +
    `seam in band ${fixed(100 * o.occupancy.seamInBand, 1)} % (occupancy); pads: ${f}.`
  );
}

/** The push of the seams at the plate: "+5.4 in arm side, -6.7 in up (toward 7:30, pitcher's view)". */
export function movementWords(r: ScreenReport, o: OrientationReport): string {
  const m = o.seamMovement;
  const side = `${fixed(Math.abs(m.armSideIn), 1)} in ${m.armSideIn < 0 ? "glove side" : "arm side"}`;
  const vertical = `${fixed(Math.abs(m.verticalIn), 1)} in ${m.verticalIn < 0 ? "down" : "up"}`;
  return `${side}, ${vertical}${m.clock ? ` (toward ${m.clock}, ${r.input.pitch.view}'s view)` : ""}`;
}

/** How forgiving a grip is, in words: its seam movement toward the wanted direction with the axis off (the screen's robustness). */
export function robustnessWords(r: ScreenReport, o: OrientationReport): string {
  const want = r.input.pitch.want;
  const what = want === "any" ? "of seam movement" : want === "arm" || want === "glove" ? `toward the ${DIRECTION_NAMES[want]}` : DIRECTION_NAMES[want];
  return `with the axis about ${fixed(r.input.settings.spreadDeg, 0)}\u00b0 off it keeps ${fixed(o.robustness.meanIn, 1)} in ${what} on average, ${fixed(o.robustness.p10In, 1)} in at the 10th percentile`;
}

/** How the grips were ranked (the screen's --rank), in words. */
export const RANK_WORDS: Record<RankBy, string> = {
  blend: "the mean of each grip's seam movement toward the wanted direction and its 10th percentile with the axis off",
  strength: "seam movement toward the wanted direction",
  robust: "the 10th percentile of the seam movement toward the wanted direction with the axis off",
};

/** The comparison table's columns (inches; the caption above the table says so). */
export const COMPARE_COLUMNS = (want: string) =>
  [
    { title: "grip", share: 1.5 },
    { title: "arm side", share: 1.15, align: "end" as const },
    { title: "up", share: 0.65, align: "end" as const },
    { title: want === "any" ? "size" : want === "arm" || want === "glove" ? `to ${want}` : want, share: 0.9, align: "end" as const },
    { title: "mean / p10", share: 1.35, align: "end" as const },
    { title: "passes", share: 0.8, align: "end" as const },
  ] as const;

/** The line over the comparison table. */
export const COMPARE_CAPTION = "Inches at the plate, the screen's numbers; mean / p10 with the axis about 5\u00b0 off; passes: seams past the front per turn.";

/** One row of the comparison table, the numbers in screen --json's terminal format. */
export function compareRow(label: string, o: OrientationReport): string[] {
  const m = o.seamMovement;
  return [label, formatMovementIn(m.armSideIn), formatMovementIn(m.verticalIn), formatMovementIn(o.score), `${formatMovementIn(o.robustness.meanIn)} / ${formatMovementIn(o.robustness.p10In)}`, String(o.crossingsPerRevolution)];
}

/** The comparison table's rows: this grip (if any) against the two classic holds. */
export function compareRows(r: ScreenReport, o?: OrientationReport): string[][] {
  const rows: string[][] = [];
  if (o && !o.reference) rows.push(compareRow(`grip ${o.rank}`, o));
  for (const h of r.references) rows.push(compareRow(`${h.reference} hold`, h));
  return rows;
}

/** Which row of compareRows is the card's own grip or hold (emphasised), or -1. */
export function compareOwnRow(r: ScreenReport, o?: OrientationReport): number {
  if (!o) return -1;
  if (!o.reference) return 0;
  return r.references.findIndex((h) => h.reference === o.reference);
}

/** The direction the seams can add to that is nearest the wanted one, with its reach, or null. */
export function nearestReachable(r: ScreenReport): { name: string; key: string; pct: number; bestTowardIn: number } | null {
  const want = r.input.pitch.want;
  if (want === "any") return null;
  const options = Object.entries(r.reach.directions)
    .filter(([k, d]) => k !== want && d.pct >= REACH_FLOOR_PCT)
    .sort((a, b) => DIRECTION_ANGLE[want][a[0]] - DIRECTION_ANGLE[want][b[0]] || b[1].pct - a[1].pct);
  if (!options.length) return null;
  const [key, d] = options[0];
  return { name: DIRECTION_NAMES[key], key, pct: d.pct, bestTowardIn: d.bestTowardIn };
}

/** What the seams can and cannot do for this pitch's wanted direction, in plain words. */
export function reachWords(r: ScreenReport): string {
  const want = r.input.pitch.want;
  const re = r.reach;
  if (want === "any") return `The strongest seam movement any grip gives this spin is ${fixed(re.strongestIn, 1)} in at the plate.`;
  if (!re.outOfReach) {
    return `${TOWARD[want]} the best grip adds ${fixed(re.bestTowardIn, 1)} in at the plate, ${fixed(re.wantPct, 0)} % of the strongest seam movement any grip gives this spin (${fixed(re.strongestIn, 1)} in).`;
  }
  const near = nearestReachable(r);
  const instead = near
    ? ` The nearest direction they can add to is ${near.key === "arm" || near.key === "glove" ? "the " : ""}${near.name}: up to ${fixed(near.bestTowardIn, 1)} in (${fixed(near.pct, 0)} %); screen for it with --want ${near.key}.`
    : "";
  return (
    `Out of reach: with this spin the seams cannot add ${WANT_WORDS[want]} movement. The best any grip gives ${want === "arm" || want === "glove" ? `toward the ${DIRECTION_NAMES[want]}` : `${want}ward`} is ${fixed(re.bestTowardIn, 1)} in, ` +
    `${fixed(re.wantPct, 0)} % of the strongest seam movement (${fixed(re.strongestIn, 1)} in), so no grip is ranked for it.${instead}`
  );
}
