/**
 * The screen result in user units (degrees, inches, clock readings): the one form
 * that the JSON, the CSV, the terminal table and the printed cards all read, so the
 * numbers agree everywhere they appear.
 */
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { angleToClock, formatClock } from "../../geometry/clock.js";
import { type Vec3 } from "../../geometry/vec.js";
import { DEG } from "../../geometry/units.js";
import type { ScreenResult, ScreenedOrientation } from "./screen.js";
import { pushInField } from "./pitch.js";

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
  score: number;
  push: { clock: string | null; armSide: number; up: number };
  crossingsPerRevolution: number;
  robustness: { mean: number; p10: number };
  rankScore: number;
  seamInBand: number;
  sides: { axisPlus: number; axisMinus: number; magnusPlus: number; magnusMinus: number };
  asymmetry: { alongAxis: number; alongMagnus: number; magnitude: number };
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
  view: string;
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
  };
  /** The line the seam push acts along: the +a direction in field terms. */
  pushLine: { clock: string | null; armSide: number; up: number };
  wantReach: number;
  grid: { count: number; spacingDeg: number };
  maximaFound: number;
  candidates: OrientationReport[];
  references: OrientationReport[];
}

/** A clock angle (radians clockwise from 12:00) as "H:MM", or null. */
export function clockText(rad: number | null): string | null {
  return rad === null ? null : formatClock(angleToClock(rad));
}

function orientationReport(o: ScreenedOrientation, rank?: number): OrientationReport {
  const ll = vectorToLatLon(o.axis);
  const a = o.averages;
  return {
    ...(rank !== undefined ? { rank } : {}),
    ...(o.reference ? { reference: o.reference } : {}),
    axis: o.axis,
    latLon: { latDeg: ll.latDeg, lonDeg: ll.lonDeg, text: formatLatLon(ll) },
    landmark: { name: o.landmark.name, angleDeg: o.landmark.angleRad / DEG },
    score: o.score,
    push: { clock: clockText(o.push.clockRad), armSide: o.push.armSide, up: o.push.up },
    crossingsPerRevolution: o.crossingsPerRevolution,
    robustness: { mean: o.robustness.mean, p10: o.robustness.p10 },
    rankScore: o.rankScore,
    seamInBand: a.seamInBand,
    sides: { axisPlus: a.axisPlus, axisMinus: a.axisMinus, magnusPlus: a.magnusPlus, magnusMinus: a.magnusMinus },
    asymmetry: { alongAxis: a.alongAxis, alongMagnus: a.alongMagnus, magnitude: a.magnitude },
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

export function screenReport(r: ScreenResult, echo: PitchEcho, bandCenterDeg: number, bandWidthDeg: number): ScreenReport {
  const s = r.settings;
  const line = pushInField(r.frame, r.pitch.view, 1);
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
        bandCenterDeg,
        bandWidthDeg,
      },
    },
    pushLine: { clock: clockText(line.clockRad), armSide: line.armSide, up: line.up },
    wantReach: r.wantReach,
    grid: { count: r.map.grid.count, spacingDeg: s.gridSpacingRad / DEG },
    maximaFound: r.maximaFound,
    candidates: r.candidates.map((c, i) => orientationReport(c, i + 1)),
    references: r.references.map((c) => orientationReport(c)),
  };
}
