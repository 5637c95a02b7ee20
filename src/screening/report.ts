/**
 * The screen result in user units (degrees, inches, clock readings): the one form
 * that the JSON, the CSV, the terminal table, the printed cards and the workbench page all
 * read, so the numbers agree everywhere they appear.
 */
import { BALL_RADIUS_IN, BALL_RADIUS_M } from "../../geometry/ball.js";
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { angleToClock, formatClock } from "../../geometry/clock.js";
import { movementClock } from "../../geometry/frames.js";
import { DEG, M_PER_FT, M_PER_IN } from "../../geometry/units.js";
import { type Vec3 } from "../../geometry/vec.js";
import { seamForceNewtons } from "../physics/seamModel/newtons.js";
import { findLandmarks } from "../../geometry/landmarks.js";
import { angleBetween } from "../../geometry/vec.js";
import { FINGER_PATTERNS, pitchKindFromName, type PitchKind } from "./hand.js";
import { turnFromHold } from "./holdTurn.js";
import { REACH_FLOOR, type RankBy, type ScreenResult, type ScreenedOrientation } from "./screen.js";

export interface FingerReport {
  finger: string;
  direction: Vec3;
  latLon: string;
  seamDistanceIn: number;
  region: { half: string; part: string; near: string };
  /** Whether the pad grips a seam to set the spin (src/screening/hand.ts). */
  working: boolean;
  /** Unit tangent at the pad toward the fingertip, ball frame. */
  pointing: Vec3;
  /** The nearest horseshoe tip and the surface distance to it, inches. */
  nearTip: { name: string; distanceIn: number };
}

/** The turn in the hand from the nearer classic hold to this grip (src/screening/holdTurn.ts), degrees. */
export interface HoldTurnReport {
  hold: string;
  angleDeg: number;
  /** Clockwise as the pitcher sees the ball at release (negative: counter-clockwise). */
  twistClockwiseDeg: number;
  /** The face under the fingers rolls this far, toward armSide / up (unit components). */
  rollDeg: number;
  rollArmSide: number;
  rollUp: number;
}

export interface OrientationReport {
  rank?: number;
  reference?: string;
  axis: Vec3;
  latLon: { latDeg: number; lonDeg: number; text: string };
  landmark: { name: string; angleDeg: number };
  /** Seam movement toward the wanted direction (its size for "any"), inches. */
  score: number;
  /** The seam part of the flight at the plate, trade basis, inches; its direction as a clock reading in the pitch's view. */
  seamMovement: { armSideIn: number; verticalIn: number; horizontalIn: number; clock: string | null; towardWantIn: number };
  /** Score under release scatter of the axis, inches. */
  robustness: { meanIn: number; p10In: number };
  /** What the list is ranked by, inches. */
  rankScore: number;
  /** The model's turn-averaged seam-force coefficient, and the force at release speed and the pitch's air, N. */
  seamForce: { across: number; alongMagnus: number; acrossN: number; alongMagnusN: number };
  crossingsPerRevolution: number;
  /** The sampler's band occupancy through a turn (seam occupancy, not the push). */
  occupancy: { seamInBand: number; axisPlus: number; axisMinus: number };
  fingers: FingerReport[];
  /** From the nearer classic hold (none for the holds themselves). */
  fromHold?: HoldTurnReport;
  release: { ballToField: number[]; trailingPoint: Vec3; fingerSpacingIn: number };
}

export interface PitchEcho {
  name: string;
  pitcher: string;
  hand: string;
  speedMph: number;
  spinRpm: number;
  tilt: string;
  /** The tilt as given in degrees clockwise from 12:00, when it was given so. */
  tiltDeg?: number;
  view: string;
  /** Signed (geometry/frames.ts): positive when the axis's positive end leans toward the plate. */
  gyroDeg: number;
  efficiencyPct: number;
  want: string;
}

export interface ScreenReport {
  input: {
    pitch: PitchEcho;
    settings: {
      gridSpacingDeg: number;
      spreadDeg: number;
      rank: RankBy;
      top: number;
      fingerSpacingIn: number;
      seamShape: number;
      seamPoints: number;
      bandCenterDeg: number;
      bandWidthDeg: number;
    };
    /** The seam-force model profile in use. */
    model: { name: string; hash: string };
    /** The air the flights used. */
    air: { densityKgM3: number };
    /** The trade's movement window: from this distance to the front of the plate. */
    windowFt: number;
  };
  /** The finger pattern: the pitch kind (read from the pitch's name) and its words. */
  grip: { kind: PitchKind; kindFromName: boolean; pattern: string };
  /** How far toward the wanted direction the seams can push, as a share of the strongest seam push anywhere, percent (100 for "any"). */
  reach: {
    wantPct: number;
    bestTowardIn: number;
    strongestIn: number;
    outOfReach: boolean;
    /** The same for each of the four directions: the best seam movement toward it over the grid, inches, and its share of the strongest, percent. */
    directions: Record<"arm" | "glove" | "up" | "down", { bestTowardIn: number; pct: number }>;
  };
  grid: { count: number; spacingDeg: number };
  maximaFound: number;
  candidates: OrientationReport[];
  references: OrientationReport[];
}

/** A clock angle (radians clockwise from 12:00) as "H:MM", or null. */
export function clockText(rad: number | null): string | null {
  return rad === null ? null : formatClock(angleToClock(rad));
}


function nearestTip(r: ScreenResult, p: Vec3): { name: string; distanceIn: number } {
  let best = { name: "", distanceIn: Infinity };
  for (const l of findLandmarks(r.settings.seamShape)) {
    if (l.kind !== "tip") continue;
    const d = angleBetween(p, l.direction) * BALL_RADIUS_IN;
    if (d < best.distanceIn) best = { name: l.name, distanceIn: d };
  }
  return best;
}

/** The turn from the nearer of the two classic holds. */
function holdTurnReport(r: ScreenResult, o: ScreenedOrientation): HoldTurnReport | undefined {
  let best: HoldTurnReport | undefined;
  for (const h of r.references) {
    const t = turnFromHold(o.axis, h.axis, h.grip.ballToField, r.frame);
    if (!best || t.angleRad / DEG < best.angleDeg) {
      best = { hold: h.reference!, angleDeg: t.angleRad / DEG, twistClockwiseDeg: t.twistRad / DEG, rollDeg: t.rollRad / DEG, rollArmSide: t.rollArmSide, rollUp: t.rollUp };
    }
  }
  return best;
}

function orientationReport(r: ScreenResult, o: ScreenedOrientation, rank?: number): OrientationReport {
  const ll = vectorToLatLon(o.axis);
  const m = o.seamMovement;
  const dynamic = seamForceNewtons(1, o.flight.air.densityKgM3, BALL_RADIUS_M, r.pitch.speedMPerS);
  return {
    ...(rank !== undefined ? { rank } : {}),
    ...(o.reference ? { reference: o.reference } : {}),
    axis: o.axis,
    latLon: { latDeg: ll.latDeg, lonDeg: ll.lonDeg, text: formatLatLon(ll) },
    landmark: { name: o.landmark.name, angleDeg: o.landmark.angleRad / DEG },
    score: o.score / M_PER_IN,
    seamMovement: {
      armSideIn: m.armSideM / M_PER_IN,
      verticalIn: m.verticalM / M_PER_IN,
      horizontalIn: m.horizontalM / M_PER_IN,
      clock: movementClock(m.horizontalM, m.verticalM, r.pitch.view),
      towardWantIn: o.score / M_PER_IN,
    },
    robustness: { meanIn: o.robustness.mean / M_PER_IN, p10In: o.robustness.p10 / M_PER_IN },
    rankScore: o.rankScore / M_PER_IN,
    seamForce: {
      across: o.coefficient.across,
      alongMagnus: o.coefficient.alongMagnus,
      acrossN: o.coefficient.across * dynamic,
      alongMagnusN: o.coefficient.alongMagnus * dynamic,
    },
    crossingsPerRevolution: o.crossingsPerRevolution,
    occupancy: { seamInBand: o.occupancy.seamInBand, axisPlus: o.occupancy.axisPlus, axisMinus: o.occupancy.axisMinus },
    fingers: o.grip.pads.map((p) => ({
      finger: p.finger,
      direction: p.direction,
      latLon: formatLatLon(vectorToLatLon(p.direction)),
      seamDistanceIn: p.seamDistanceIn,
      region: { half: p.region.half, part: p.region.part, near: p.region.near },
      working: p.working,
      pointing: p.pointing,
      nearTip: nearestTip(r, p.direction),
    })),
    ...(o.reference ? {} : { fromHold: holdTurnReport(r, o) }),
    release: { ballToField: [...o.grip.ballToField], trailingPoint: o.grip.trailingPoint, fingerSpacingIn: o.grip.fingerSpacingIn },
  };
}

/** Best seam movement toward each of the four directions (the screen's reach: grid and flown grips). */
function reachByDirection(r: ScreenResult): ScreenReport["reach"]["directions"] {
  const { arm, glove, up, down } = r.reach.directions;
  const strongest = r.reach.strongestM;
  const one = (m: number) => ({ bestTowardIn: m / M_PER_IN, pct: strongest > 0 ? (100 * m) / strongest : 0 });
  return { arm: one(arm), glove: one(glove), up: one(up), down: one(down) };
}

function kindOf(name: string): { kind: PitchKind; kindFromName: boolean } {
  const k = pitchKindFromName(name);
  return { kind: k.kind, kindFromName: k.fromName };
}

export function screenReport(r: ScreenResult, echo: PitchEcho): ScreenReport {
  const s = r.settings;
  const band = s.band;
  const air = r.references[0]?.flight.air ?? r.candidates[0]?.flight.air;
  return {
    input: {
      pitch: echo,
      settings: {
        gridSpacingDeg: s.gridSpacingRad / DEG,
        spreadDeg: s.spreadRad / DEG,
        rank: s.rank,
        top: s.top,
        fingerSpacingIn: s.fingerSpacingIn,
        seamShape: s.seamShape,
        seamPoints: s.seamPoints,
        bandCenterDeg: band.centerRad / DEG,
        bandWidthDeg: band.widthRad / DEG,
      },
      model: { name: s.model.profile.name, hash: s.model.profile.hash },
      air: { densityKgM3: air ? air.densityKgM3 : 0 },
      windowFt: s.windowStartM / M_PER_FT,
    },
    grip: { ...kindOf(echo.name), pattern: FINGER_PATTERNS[kindOf(echo.name).kind] },
    reach: {
      wantPct: 100 * r.reach.wantFraction,
      bestTowardIn: r.reach.bestTowardM / M_PER_IN,
      strongestIn: r.reach.strongestM / M_PER_IN,
      outOfReach: r.reach.wantFraction < REACH_FLOOR,
      directions: reachByDirection(r),
    },
    grid: { count: r.grid.count, spacingDeg: s.gridSpacingRad / DEG },
    maximaFound: r.maximaFound,
    candidates: r.candidates.map((c, i) => orientationReport(r, c, i + 1)),
    references: r.references.map((c) => orientationReport(r, c)),
  };
}
