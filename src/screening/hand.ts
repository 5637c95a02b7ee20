/**
 * The hand model: which fingers touch the ball for a pitch kind, and where their
 * pads go for a spin-axis position.
 *
 * Model (ours, deliberately simple; the finger patterns are the ones coaches teach,
 * common practice, no source):
 * - At release the working fingers' pads sit at the back of the ball around the
 *   trailing point T of the spin equator (the great circle across the spin axis):
 *   the point of that circle farthest behind the ball's centre, opposite the flight.
 *   Fingers lie side by side along the spin axis, `fingerSpacingIn` apart centre to
 *   centre along the surface (default 0.8 in, about one finger's width), fingertips
 *   pointing the way they pull the ball's back round (T x w: up the back of the ball
 *   for backspin, across it for side spin, where the hand is on the ball's side).
 * - The pitch kind sets the pattern (`FINGER_PATTERNS`):
 *     fastball  index and middle straddle T; thumb beneath the ball
 *               (four-seam, two-seam, sinker, cutter)
 *     changeup  middle and ring straddle T; the index finger curls round to the
 *               thumb on the glove side of the ball, making a circle (circle change)
 *     breaking  offset: the middle finger at T does the work, the index beside it on
 *               the glove side; thumb beneath (curveball, slider, sweeper)
 *   The kind comes from the pitch's name (`pitchKindFromName`); a name that names no
 *   kind is taken as a fastball, and the card says so.
 * - The index finger is on the glove side of the middle finger (the thumb's side of
 *   the throwing hand when the palm faces the plate), the ring finger on the arm side.
 * - Which point of the ball is T is the grip's one free choice: every point of the
 *   spin equator passes T once per turn, and the turn-averaged numbers do not depend
 *   on it. We choose T so that the working pads rest on or beside a seam (the largest
 *   pad-to-seam distance is smallest: a 2 deg search on a coarse seam, then 0.25 deg
 *   around the best on the full one), since pads grip the seams; a coach may slide
 *   the grip along the spin equator without changing any prediction.
 * - Pad sizes (`PAD_SIZE_IN`) are an adult's fingertip pads, width across the finger
 *   and length along it (common practice, no source; a youth hand is smaller).
 *
 * Release orientation: the rotation that takes the ball frame to the field frame at
 * release maps the ball-frame axis to the field spin axis and T to the field's
 * trailing point; renderers use it to draw the ball "as held".
 */
import { coverRegion, type CoverModel, type CoverRegion } from "../../geometry/coverRegions.js";
import { angleToSeam } from "../../geometry/landmarks.js";
import { BALL_RADIUS_IN } from "../../geometry/ball.js";
import type { SeamSamples } from "../../geometry/seamSamples.js";
import { cross3, dot3, perpendicularUnit, rotateAbout, unit3, type Vec3 } from "../../geometry/vec.js";
import type { PitchFrame } from "./pitch.js";

export const DEFAULT_FINGER_SPACING_IN = 0.8;
/** Largest accepted finger spacing, inches (above 0 and at most this). */
export const FINGER_SPACING_MAX_IN = 3;
/** Half the stitched seam's width, inches (the seam band is about 3/16 in wide: common practice, no source). */
export const SEAM_HALF_WIDTH_IN = 3 / 32;
/** Coarse search: 180 steps of 2 deg on a 256-point seam; fine search: 0.25 deg steps within 2 deg of the best, on the full seam. */
const COARSE_STEPS = 180;
const COARSE_SEAM_POINTS = 256;
const FINE_STEP_RAD = (0.25 * Math.PI) / 180;
const FINE_HALF_STEPS = 8;

export type Finger = "index" | "middle" | "ring" | "thumb";
export type PitchKind = "fastball" | "changeup" | "breaking";
export const PITCH_KINDS: readonly PitchKind[] = ["fastball", "changeup", "breaking"];

/** An adult's fingertip pad, inches: width across the finger, length along it (common practice, no source). */
export const PAD_SIZE_IN: Record<Finger, { readonly widthIn: number; readonly lengthIn: number }> = {
  index: { widthIn: 0.6, lengthIn: 0.8 },
  middle: { widthIn: 0.63, lengthIn: 0.85 },
  ring: { widthIn: 0.58, lengthIn: 0.78 },
  thumb: { widthIn: 0.75, lengthIn: 0.95 },
};

/** The finger pattern of each kind, in words (the cards print these). */
export const FINGER_PATTERNS: Record<PitchKind, string> = {
  fastball: "two fingers: index and middle side by side on top, thumb beneath",
  changeup: "three fingers and a circle: middle and ring on top, the index finger curled to the thumb on the side",
  breaking: "offset: the middle finger does the work, the index finger beside it, thumb beneath",
};

const KIND_WORDS: readonly [RegExp, PitchKind][] = [
  [/change|circle|straight ?change|vulcan|split|fork|palm/i, "changeup"],
  [/curve|slider|sweep|slurve|knuckle[- ]?curve|\bkc\b|breaking|\bsl\b|\bcb\b|\bcu\b/i, "breaking"],
  [/four[- ]?seam|4[- ]?seam|two[- ]?seam|2[- ]?seam|fastball|sinker|cutter|heater|\bff\b|\bfb\b|\bsi\b|\bfc\b/i, "fastball"],
];

/**
 * The pitch kind a name names (case-insensitive words: change, circle, split,
 * fork, palm -> changeup; curve, slider, sweep, slurve -> breaking; four-seam,
 * two-seam, fastball, sinker, cutter -> fastball), and whether the name said so or
 * the fastball pattern was taken for want of a kind.
 */
export function pitchKindFromName(name: string): { kind: PitchKind; fromName: boolean } {
  for (const [re, kind] of KIND_WORDS) if (re.test(name)) return { kind, fromName: true };
  return { kind: "fastball", fromName: false };
}

export interface FingerPad {
  readonly finger: Finger;
  /** Pad centre, unit vector in the ball frame. */
  readonly direction: Vec3;
  /** Unit tangent at the pad toward the fingertip, ball frame. */
  readonly pointing: Vec3;
  /** Surface distance from the pad centre to the seam's centre line, inches. */
  readonly seamDistanceIn: number;
  readonly region: CoverRegion;
  /** Whether the pad grips a seam to set the spin (the working fingers), or rests (thumb, a circle's index). */
  readonly working: boolean;
}

export interface Grip {
  readonly kind: PitchKind;
  readonly pads: readonly FingerPad[];
  /** Ball-frame trailing point T at release. */
  readonly trailingPoint: Vec3;
  /** Row-major 3x3 rotation, ball frame to field frame at release. */
  readonly ballToField: readonly number[];
  readonly fingerSpacingIn: number;
}

/** Row-major rotation taking orthonormal right-handed (a1, a2, a3) to (b1, b2, b3). */
function basisRotation(a: readonly Vec3[], b: readonly Vec3[]): number[] {
  const m: number[] = [];
  for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) m.push(b[0][r] * a[0][c] + b[1][r] * a[1][c] + b[2][r] * a[2][c]);
  return m;
}

export function applyRotation(m: readonly number[], v: Readonly<Vec3>): Vec3 {
  return [m[0] * v[0] + m[1] * v[1] + m[2] * v[2], m[3] * v[0] + m[4] * v[1] + m[5] * v[2], m[6] * v[0] + m[7] * v[1] + m[8] * v[2]];
}

/** The inverse (transpose) of a row-major rotation. */
export function transposeRotation(m: readonly number[]): number[] {
  return [m[0], m[3], m[6], m[1], m[4], m[7], m[2], m[5], m[8]];
}

/** The point `angleRad` along the great circle from unit p toward unit tangent u. */
function along(p: Readonly<Vec3>, u: Readonly<Vec3>, angleRad: number): Vec3 {
  const c = Math.cos(angleRad), s = Math.sin(angleRad);
  return unit3([c * p[0] + s * u[0], c * p[1] + s * u[1], c * p[2] + s * u[2]]);
}

/** The unit tangent at p toward direction d (d's part across p), or a perpendicular when d is along p. */
function tangentToward(p: Readonly<Vec3>, d: Readonly<Vec3>): Vec3 {
  const k = dot3(p, d);
  const t: Vec3 = [d[0] - k * p[0], d[1] - k * p[1], d[2] - k * p[2]];
  return Math.hypot(...t) > 1e-9 ? unit3(t) : perpendicularUnit(p);
}

/**
 * Working pad centres (ball frame) for trailing point t and spin axis w, ordered from
 * the +w side: fastball [+s/2, -s/2], breaking [0, +-s] (the second toward `gloveSign`
 * w), changeup [+s/2, -s/2] (middle and ring).
 */
function workingPads(kind: PitchKind, t: Vec3, w: Vec3, halfRad: number, gloveSign: number): Vec3[] {
  if (kind === "breaking") return [t, along(t, gloveSign > 0 ? w : [-w[0], -w[1], -w[2]], 2 * halfRad)];
  return [along(t, w, halfRad), along(t, [-w[0], -w[1], -w[2]], halfRad)];
}

/**
 * Finger placement for a ball-frame spin axis.
 * @param axisBall unit spin axis in the ball frame
 * @param frame the pitch's field-frame directions (src/screening/pitch.ts)
 * @param seam seam samples for distances (dense: 2048 or more)
 * @param cover cover model for region names
 * @param kind the finger pattern (default fastball)
 */
export function placeFingers(
  axisBall: Readonly<Vec3>,
  frame: PitchFrame,
  seam: SeamSamples,
  cover: CoverModel,
  fingerSpacingIn: number = DEFAULT_FINGER_SPACING_IN,
  kind: PitchKind = "fastball",
): Grip {
  if (!(fingerSpacingIn > 0 && fingerSpacingIn <= FINGER_SPACING_MAX_IN)) {
    throw new RangeError(`finger spacing ${fingerSpacingIn} in must be above 0 and at most ${FINGER_SPACING_MAX_IN} in`);
  }
  const w = unit3(axisBall);
  const halfRad = fingerSpacingIn / 2 / BALL_RADIUS_IN;
  const e1 = perpendicularUnit(w);
  // the field directions at release: w_f, T_f, and which way along w_f is the glove side
  const wf = frame.spinAxis;
  const v = frame.flight;
  const vw = dot3(v, wf);
  const tf = unit3([-(v[0] - vw * wf[0]), -(v[1] - vw * wf[1]), -(v[2] - vw * wf[2])]);
  const glove: Vec3 = [-frame.armSide[0], -frame.armSide[1], -frame.armSide[2]];
  const gloveSign = dot3(wf, glove) >= 0 ? 1 : -1;
  const coarse = COARSE_SEAM_POINTS < seam.count && seam.count % COARSE_SEAM_POINTS === 0 ? everyNth(seam.points, seam.count / COARSE_SEAM_POINTS) : seam.points;
  const cost = (t: Vec3, pts: Float64Array) => {
    let worst = 0;
    for (const p of workingPads(kind, t, w, halfRad, gloveSign)) worst = Math.max(worst, angleToSeam(p, pts));
    return worst;
  };
  let bestK = 0;
  let bestCost = Infinity;
  for (let k = 0; k < COARSE_STEPS; k++) {
    const c = cost(rotateAbout(e1, w, (2 * Math.PI * k) / COARSE_STEPS), coarse);
    if (c < bestCost - 1e-12) {
      bestCost = c;
      bestK = k;
    }
  }
  let bestT: Vec3 = rotateAbout(e1, w, (2 * Math.PI * bestK) / COARSE_STEPS);
  bestCost = Infinity;
  for (let j = -FINE_HALF_STEPS; j <= FINE_HALF_STEPS; j++) {
    const t = rotateAbout(e1, w, (2 * Math.PI * bestK) / COARSE_STEPS + j * FINE_STEP_RAD);
    const c = cost(t, seam.points);
    if (c < bestCost - 1e-12) {
      bestCost = c;
      bestT = t;
    }
  }
  // release orientation: (w, T, w x T) in the ball frame -> (w_f, T_f, w_f x T_f) in the field
  const ballToField = basisRotation([w, bestT, cross3(w, bestT)], [wf, tf, cross3(wf, tf)]);
  const fieldToBall = transposeRotation(ballToField);
  const toBall = (f: Vec3) => applyRotation(fieldToBall, f);
  const halfWidthRad = SEAM_HALF_WIDTH_IN / BALL_RADIUS_IN;
  // the working fingertips point the way they pull the ball's back round, against the
  // surface's motion at T: T x w, up the back for backspin, sideways for side spin (so the
  // fingers lying side by side along the spin axis never lie one over the other)
  const pull = unit3(cross3(tf, wf));
  const pad = (finger: Finger, p: Vec3, working: boolean, pointingField: Vec3 = pull): FingerPad => {
    const region = coverRegion(cover, p, halfWidthRad);
    const pointing = tangentToward(p, toBall(pointingField));
    return { finger, direction: p, pointing, seamDistanceIn: region.seamDistanceRad * BALL_RADIUS_IN, region, working };
  };
  const thumbBeneath = toBall([0, 0, -1]);
  const [p1, p2] = workingPads(kind, bestT, w, halfRad, gloveSign);
  const pads: FingerPad[] = [];
  if (kind === "breaking") {
    pads.push(pad("middle", p1, true), pad("index", p2, true));
  } else {
    // p1 is on the +w side; the glove-side pad is the index (fastball) or the middle (changeup)
    const [gloveSide, armSide] = gloveSign > 0 ? [p1, p2] : [p2, p1];
    if (kind === "fastball") pads.push(pad("index", gloveSide, true), pad("middle", armSide, true));
    else {
      pads.push(pad("middle", gloveSide, true), pad("ring", armSide, true));
      // the circle: the index pad on the glove side of the ball, level with the centre and
      // 70 deg round from the back; the thumb's pad 0.9 in below it, tips meeting
      const side = along(toBall(tf), toBall(glove), (70 * Math.PI) / 180);
      pads.push(pad("index", side, false, [0, 0, -1]));
      pads.push(pad("thumb", along(side, tangentToward(side, thumbBeneath), 0.9 / BALL_RADIUS_IN), false, [0, 0, 1]));
    }
  }
  if (kind !== "changeup") pads.push(pad("thumb", thumbBeneath, false, [...v] as Vec3));
  return { kind, pads, trailingPoint: bestT, ballToField, fingerSpacingIn };
}

/** Every `step`-th point of flat unit points (a coarser copy of the seam). */
function everyNth(points: Float64Array, step: number): Float64Array {
  const n = points.length / 3 / step;
  const out = new Float64Array(3 * n);
  for (let i = 0; i < n; i++) for (let k = 0; k < 3; k++) out[3 * i + k] = points[3 * step * i + k];
  return out;
}
