/**
 * The screen result in user units (degrees, inches, clock readings): the one form
 * that the JSON, the CSV, the terminal table, the printed cards and the 3-D page all
 * read, so the numbers agree everywhere they appear.
 */
import { BALL_RADIUS_M } from "../../geometry/ball.js";
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { angleToClock, formatClock } from "../../geometry/clock.js";
import { movementClock } from "../../geometry/frames.js";
import { DEG, M_PER_FT, M_PER_IN } from "../../geometry/units.js";
import { type Vec3 } from "../../geometry/vec.js";
import { seamForceNewtons } from "../physics/seamModel/newtons.js";
import { REACH_FLOOR, type ScreenResult, type ScreenedOrientation } from "./screen.js";

export interface FingerReport {
  finger: string;
  direction: Vec3;
  latLon: string;
  seamDistanceIn: number;
  region: { half: string; part: string; near: string };
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
      rank: string;
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
  /** How far toward the wanted direction the seams can push, as a share of the strongest seam push anywhere, percent (100 for "any"). */
  reach: { wantPct: number; bestTowardIn: number; strongestIn: number; outOfReach: boolean };
  grid: { count: number; spacingDeg: number };
  maximaFound: number;
  candidates: OrientationReport[];
  references: OrientationReport[];
}

/** A clock angle (radians clockwise from 12:00) as "H:MM", or null. */
export function clockText(rad: number | null): string | null {
  return rad === null ? null : formatClock(angleToClock(rad));
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
    })),
    release: { ballToField: [...o.grip.ballToField], trailingPoint: o.grip.trailingPoint, fingerSpacingIn: o.grip.fingerSpacingIn },
  };
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
    reach: {
      wantPct: 100 * r.reach.wantFraction,
      bestTowardIn: r.reach.bestTowardM / M_PER_IN,
      strongestIn: r.reach.strongestM / M_PER_IN,
      outOfReach: r.reach.wantFraction < REACH_FLOOR,
    },
    grid: { count: r.grid.count, spacingDeg: s.gridSpacingRad / DEG },
    maximaFound: r.maximaFound,
    candidates: r.candidates.map((c, i) => orientationReport(r, c, i + 1)),
    references: r.references.map((c) => orientationReport(r, c)),
  };
}
