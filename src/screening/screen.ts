/**
 * Screening one pitch with the one seam-force model: every spin-axis position on the
 * ball, the distinct best ones, how forgiving each is, the classic holds beside them,
 * and the fingers. Every number is the model's seam movement at the plate, in the
 * trade's reading (physics/tradeMovement.ts: a constant-acceleration fit over the
 * window ending at the plate), for the pitch's air.
 *
 * 1. Sweep: the model's turn-averaged coefficient (along a and along Magnus) at every
 *    cell of the equal-area ring grid (physics/seamModel/map.ts, one evaluation per
 *    symmetry orbit, the Magnus part flipped for mirror images).
 * 2. Seam movement per cell: the seam part of the flight is close to linear in the
 *    coefficient, S = c_a J_a + c_m J_m, with J_a, J_m the seam movement of a unit
 *    coefficient for this pitch (two flights; physics/pitchFlight.ts unitSeamMovement).
 * 3. Score per cell: the seam movement toward the wanted direction (arm side, glove
 *    side, up, down), or its size for "any", inches. Reach: the best movement toward
 *    the wanted direction as a share of the strongest seam movement anywhere.
 * 4. Candidates: cells that beat their neighbours, one per orbit of the four rotations
 *    (a mirror image is a different grip for this model: it reverses the Magnus part),
 *    each kept only when no better one lies within the merge radius (a rotation
 *    counted: the larger of MERGE_RAD, the grid spacing and the release scatter, since a
 *    grip inside the delivery's own scatter of a better one is that grip), refined off
 *    the grid by a pattern search and merged again the same way, shown in one
 *    canonical image.
 * 5. Each listed grip (candidates and the reference holds) is flown in full
 *    (pitchFlight.ts flyPitch, the same flight `flight` makes): its seam movement and
 *    score are the flight's. Robustness: the linear score under release scatter of the
 *    axis (robustness.ts), mean and 10th percentile, with the coefficient read from the
 *    sweep's map between its cells (the scatter spans several cells; read this way it
 *    agrees with turn averages at the scattered axes to a few hundredths of an inch,
 *    tests/screening/screen.test.ts, at a thousandth of their cost). Rank: "strength" = score,
 *    "robust" = p10, "blend" (default) = their mean.
 * The sampler's band occupancy (src/sampling) is reported beside each grip as seam
 * occupancy, not as the push.
 */
import { BoundedCache } from "../../geometry/cache.js";
import { coverModel, type CoverModel } from "../../geometry/coverRegions.js";
import { findLandmarks, nearestLandmark, type Landmark } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { DEFAULT_SEAM_POINTS, type SeamSamples } from "../../geometry/seamSamples.js";
import { equalAreaGrid, gridNeighbours, interpolateOnGrid, orbitRepresentatives, type SphereGrid } from "../../geometry/sphereGrid.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { DEG } from "../../geometry/units.js";
import { angleBetween, perpendicularUnit, unit3, type Vec3 } from "../../geometry/vec.js";
import type { AirConditions } from "../physics/air.js";
import { flyPitch, tradeArmSide, unitSeamMovement, type PitchFlight } from "../physics/pitchFlight.js";
import { coefficientMap, type CoefficientMap } from "../physics/seamModel/map.js";
import type { SeamModel } from "../physics/seamModel/model.js";
import { turnAverage, type TurnAverage } from "../physics/seamModel/turn.js";
import { TRADE_WINDOW_START_M, type TradeBreak } from "../physics/tradeMovement.js";
import { type Band } from "../sampling/band.js";
import { crossingsPerRevolution } from "../sampling/crossings.js";
import { bandAveragesExact, type BandAverages } from "../sampling/exact.js";
import { seamFor } from "../sampling/measure.js";
import { computeSphereMap, type SphereMap } from "../sampling/sphereMap.js";
import { DEFAULT_FINGER_SPACING_IN, pitchKindFromName, placeFingers, type Grip } from "./hand.js";
import { assertPitch, pitchFrame, type Pitch, type PitchFrame, type Want } from "./pitch.js";
import { findReferenceAxes, type ReferenceName } from "./references.js";
import { DEFAULT_SPREAD_DEG, robustness, type Robustness } from "./robustness.js";

export type RankBy = "blend" | "strength" | "robust";
export const RANKS: readonly RankBy[] = ["blend", "strength", "robust"];

/**
 * Progress of one screen (screenPitch's optional last argument): `done` of `total`
 * steps finished, the sweep of the ball first, then each grip and reference hold
 * flown in full.
 */
export type ScreenProgress = (done: number, total: number, stage: "sweep" | "grips") => void;

export const DEFAULT_GRID_SPACING_DEG = 2;
export const DEFAULT_TOP = 5;
/** Accepted screen settings (user units). */
export const GRID_SPACING_RANGE_DEG: readonly [number, number] = [0.5, 10];
export const TOP_RANGE: readonly [number, number] = [1, 50];
export const SPREAD_RANGE_DEG: readonly [number, number] = [0, 30];
/** Candidates closer than this after a rotation are one candidate (maxima are broad: a few degrees across). */
const MERGE_RAD = 2 * DEG;
/**
 * Pattern-search stopping step and evaluation cap. The cap binds first: below a few
 * tenths of a degree the search climbs the model's own staircase (the meridian grid's
 * steps, instant.ts), gaining hundredths of an inch. Measured on the demo staff's 24
 * listed grips, 32 evaluations instead of 64 cost 0.013 in of score on average and
 * 0.06 in at most, for 37 % fewer turn averages.
 */
const REFINE_TOLERANCE_RAD = 0.05 * DEG;
const REFINE_MAX_EVALUATIONS = 32;
/** Below this share of the strongest seam movement, the wanted direction counts as out of reach (README). */
export const REACH_FLOOR = 0.05;

export interface ScreenSettings {
  /** Seam shape and samples for the band occupancy, crossings and fingers (the model has its own resolution). */
  readonly seamShape: number;
  readonly seamPoints: number;
  /** The sampler's band: the model's fixation band. */
  readonly band: Band;
  /** The one seam-force model. */
  readonly model: SeamModel;
  /** The pitch's air; standard air when empty. */
  readonly air: AirConditions;
  /** Where the trade's window starts, m. */
  readonly windowStartM: number;
  readonly gridSpacingRad: number;
  readonly spreadRad: number;
  readonly rank: RankBy;
  readonly top: number;
  readonly fingerSpacingIn: number;
  /** Where the sweep's coefficient maps come from (default: computed, coefficientMap); a caller may keep them, e.g. on disk. */
  readonly maps?: CoefficientMapSource;
}

/**
 * Gives the coefficient map of `model` at `gyroRad` over `grid` (physics/seamModel/map.ts
 * coefficientMap's numbers: a source that keeps maps must give them back bit for bit).
 */
export type CoefficientMapSource = (model: SeamModel, gyroRad: number, grid: SphereGrid) => CoefficientMap;

export const DEFAULT_SCREEN_OPTIONS = {
  seamShape: DEFAULT_SEAM_SHAPE,
  seamPoints: DEFAULT_SEAM_POINTS,
  air: {},
  windowStartM: TRADE_WINDOW_START_M,
  gridSpacingRad: DEFAULT_GRID_SPACING_DEG * DEG,
  spreadRad: DEFAULT_SPREAD_DEG * DEG,
  rank: "blend" as RankBy,
  top: DEFAULT_TOP,
  fingerSpacingIn: DEFAULT_FINGER_SPACING_IN,
};

/** Seam movement at the plate in the trade's reading, m: toward the arm side, up, and toward the catcher's right. */
export interface SeamMovement {
  readonly armSideM: number;
  readonly verticalM: number;
  readonly horizontalM: number;
}

export interface ScreenedOrientation {
  /** Unit spin axis in the ball frame. */
  readonly axis: Vec3;
  readonly landmark: { readonly name: string; readonly angleRad: number };
  /** The model's turn-averaged coefficient. */
  readonly coefficient: TurnAverage;
  /** The flight's seam movement (flyPitch, the same numbers `flight` reports). */
  readonly seamMovement: SeamMovement;
  /** Seam movement toward the wanted direction (or its size for "any"), m. */
  readonly score: number;
  /** Score under release scatter, m (linear in the coefficient). */
  readonly robustness: Robustness;
  /** The number the list is ranked by (see RankBy), m. */
  readonly rankScore: number;
  /** The sampler's band occupancy (seam occupancy, not the push). */
  readonly occupancy: BandAverages;
  readonly crossingsPerRevolution: number;
  readonly grip: Grip;
  readonly flight: PitchFlight;
  /** For reference holds: which one. */
  readonly reference?: ReferenceName;
}

export interface ScreenResult {
  readonly pitch: Pitch;
  readonly frame: PitchFrame;
  readonly settings: ScreenSettings;
  /** Seam movement per unit coefficient along a and along Magnus (trade basis), m. */
  readonly unit: { readonly across: TradeBreak; readonly alongMagnus: TradeBreak };
  /** Best movement toward the wanted direction over the grid, as a share of the strongest movement anywhere (1 for "any"). */
  readonly reach: {
    readonly wantFraction: number;
    readonly bestTowardM: number;
    readonly strongestM: number;
    /** The best seam movement toward each of the four directions, m (0 when none points that way). */
    readonly directions: { readonly arm: number; readonly glove: number; readonly up: number; readonly down: number };
  };
  readonly candidates: readonly ScreenedOrientation[];
  readonly references: readonly ScreenedOrientation[];
  readonly grid: SphereGrid;
  /** Per grid cell: the model's coefficient, the (linear) seam movement, m, and the score, m. */
  readonly across: Float64Array;
  readonly alongMagnus: Float64Array;
  readonly armSideM: Float64Array;
  readonly verticalM: Float64Array;
  readonly scores: Float64Array;
  /** The sampler's occupancy map (seam occupancy, for the full sphere-map output), made on first use. */
  readonly occupancy: SphereMap;
  /** Local maxima of the map on the grid, one per orbit of the seam's rotations, none within the merge radius of a better one: the distinct best grips, whatever `top`. */
  readonly maximaFound: number;
}

/** The wanted direction in the plate plane as (arm side, up) components, or null for "any". */
export function wantVector(want: Want): readonly [number, number] | null {
  switch (want) {
    case "arm":
      return [1, 0];
    case "glove":
      return [-1, 0];
    case "up":
      return [0, 1];
    case "down":
      return [0, -1];
    default:
      return null;
  }
}

/** Score of a seam movement (arm side, up; m) for a want. */
export function scoreOf(want: Want, armSideM: number, verticalM: number): number {
  const d = wantVector(want);
  return d === null ? Math.hypot(armSideM, verticalM) : d[0] * armSideM + d[1] * verticalM;
}

const PROPER = SEAM_SYMMETRIES.filter((g) => g.proper);

/** The canonical image of an axis under the seam's rotations (largest z, then y, then x). */
export function canonicalAxis(axis: Readonly<Vec3>): Vec3 {
  let best: Vec3 = [...axis] as Vec3;
  const key = (v: Vec3) => [Math.round(v[2] * 1e9), Math.round(v[1] * 1e9), Math.round(v[0] * 1e9)];
  for (const g of PROPER) {
    const img = applySymmetry(g, axis);
    const a = key(img);
    const b = key(best);
    if (a[0] > b[0] || (a[0] === b[0] && (a[1] > b[1] || (a[1] === b[1] && a[2] > b[2])))) best = img;
  }
  return best;
}

/** The smallest angle between `a` and any rotated image of `b`. */
export function symmetricAngle(a: Readonly<Vec3>, b: Readonly<Vec3>): number {
  let best = Infinity;
  for (const g of PROPER) best = Math.min(best, angleBetween(a, applySymmetry(g, b)));
  return best;
}

interface Context {
  readonly pitch: Pitch;
  readonly frame: PitchFrame;
  readonly settings: ScreenSettings;
  readonly seam: SeamSamples;
  readonly landmarks: readonly Landmark[];
  readonly cover: CoverModel;
  readonly unit: { readonly across: TradeBreak; readonly alongMagnus: TradeBreak };
  readonly scratch: TurnAverage;
  /** The sweep's grid and coefficient map (robustness reads the map between its cells). */
  readonly grid: SphereGrid;
  readonly map: CoefficientMap;
  /** Called once each grip or hold is flown (the screen's progress). */
  flown?: () => void;
}

/** Linear seam movement (arm side, up; m) of a coefficient for the pitch. */
function linearMovement(ctx: Context, across: number, alongMagnus: number): [number, number] {
  const a = tradeArmSide(ctx.unit.across, ctx.pitch.hand);
  const m = tradeArmSide(ctx.unit.alongMagnus, ctx.pitch.hand);
  return [across * a.armSideM + alongMagnus * m.armSideM, across * a.verticalM + alongMagnus * m.verticalM];
}

function linearScore(ctx: Context, x: number, y: number, z: number): number {
  const c = turnAverage(ctx.settings.model, [x, y, z], ctx.pitch.gyroRad, ctx.scratch);
  const [arm, up] = linearMovement(ctx, c.across, c.alongMagnus);
  return scoreOf(ctx.pitch.want, arm, up);
}

/** The linear score with the coefficient read from the sweep's map between its cells (geometry/sphereGrid.ts interpolateOnGrid). */
function mapScore(ctx: Context, x: number, y: number, z: number): number {
  const across = interpolateOnGrid(ctx.grid, ctx.map.across, x, y, z);
  const alongMagnus = interpolateOnGrid(ctx.grid, ctx.map.alongMagnus, x, y, z);
  const [arm, up] = linearMovement(ctx, across, alongMagnus);
  return scoreOf(ctx.pitch.want, arm, up);
}

const PATTERN = [
  [1, 0],
  [-1, 0],
  [0, 1],
  [0, -1],
  [0.7071067811865476, 0.7071067811865476],
  [-0.7071067811865476, -0.7071067811865476],
  [0.7071067811865476, -0.7071067811865476],
  [-0.7071067811865476, 0.7071067811865476],
] as const;

/** Pattern search for a local maximum of the linear score on the sphere, from `start`. */
function refine(ctx: Context, start: Vec3, startScore: number, stepRad: number): { axis: Vec3; score: number } {
  let p = start;
  let best = startScore;
  let step = stepRad;
  let evaluations = 0;
  while (step > REFINE_TOLERANCE_RAD && evaluations < REFINE_MAX_EVALUATIONS) {
    const e1 = perpendicularUnit(p);
    const e2: Vec3 = [p[1] * e1[2] - p[2] * e1[1], p[2] * e1[0] - p[0] * e1[2], p[0] * e1[1] - p[1] * e1[0]];
    let moved = false;
    const c = Math.cos(step);
    const s = Math.sin(step);
    for (const [u, v] of PATTERN) {
      const q = unit3([c * p[0] + s * (u * e1[0] + v * e2[0]), c * p[1] + s * (u * e1[1] + v * e2[1]), c * p[2] + s * (u * e1[2] + v * e2[2])]);
      const value = linearScore(ctx, q[0], q[1], q[2]);
      evaluations++;
      if (value > best) {
        best = value;
        p = q;
        moved = true;
        break;
      }
    }
    if (!moved) step /= 2;
  }
  return { axis: p, score: best };
}

/** Everything reported for one axis: the full flight, robustness, occupancy, fingers. */
function describe(ctx: Context, axisIn: Readonly<Vec3>, reference?: ReferenceName): ScreenedOrientation {
  const axis = unit3(axisIn);
  const s = ctx.settings;
  const flight = flyPitch({ pitch: ctx.pitch, axisBall: axis, model: s.model, air: s.air, windowStartM: s.windowStartM });
  const move = tradeArmSide(flight.trade.seamM, ctx.pitch.hand);
  const seamMovement = { armSideM: move.armSideM, verticalM: move.verticalM, horizontalM: flight.trade.seamM.horizontalBreakM };
  const score = scoreOf(ctx.pitch.want, seamMovement.armSideM, seamMovement.verticalM);
  const rob = robustness(axis, s.spreadRad, (x, y, z) => mapScore(ctx, x, y, z));
  const rankScore = s.rank === "strength" ? score : s.rank === "robust" ? rob.p10 : 0.5 * (score + rob.p10);
  const near = nearestLandmark(ctx.landmarks, axis);
  ctx.flown?.();
  return {
    axis,
    landmark: { name: near.landmark.name, angleRad: near.angleRad },
    coefficient: flight.seamCoefficient,
    seamMovement,
    score,
    robustness: rob,
    rankScore,
    occupancy: { ...bandAveragesExact(ctx.seam, axis[0], axis[1], axis[2], ctx.pitch.gyroRad, s.band) },
    crossingsPerRevolution: crossingsPerRevolution(ctx.seam, axis[0], axis[1], axis[2], ctx.pitch.gyroRad),
    // the classic holds are fastball holds, held as coaches teach them whatever the pitch
    grip: placeFingers(axis, ctx.frame, ctx.seam, ctx.cover, s.fingerSpacingIn, reference ? "fastball" : pitchKindFromName(ctx.pitch.name).kind),
    flight,
    ...(reference ? { reference } : {}),
  };
}

const coverCache = new BoundedCache<number, CoverModel>("cover models per seam shape", 4);

// A staff often has pitches with the same gyro: their sweeps are the same coefficient
// map (it depends on the model, the gyro and the grid only), computed once per model.
const mapCaches = new WeakMap<SeamModel, BoundedCache<string, CoefficientMap>>();
function coefficientMapFor(model: SeamModel, gyroRad: number, grid: SphereGrid, spacingRad: number, source: CoefficientMapSource = coefficientMap): CoefficientMap {
  let cache = mapCaches.get(model);
  if (!cache) mapCaches.set(model, (cache = new BoundedCache<string, CoefficientMap>("coefficient maps per gyro and grid", 8)));
  return cache.get(`${gyroRad}/${spacingRad}`, () => source(model, gyroRad, grid));
}
function coverFor(b: number): CoverModel {
  return coverCache.get(b, () => coverModel(b));
}

/**
 * How far the seams reach: the extremes of the seam movement over the grid (the linear
 * map) and over the orientations flown in full (the listed grips and holds), so that no
 * printed grip ever beats the "strongest" it is compared with.
 */
function reachOf(want: Want, armSideM: Float64Array, verticalM: Float64Array, flown: readonly ScreenedOrientation[]): ScreenResult["reach"] {
  let strongest = 0, bestToward = 0, arm = 0, glove = 0, up = 0, down = 0;
  const take = (a: number, v: number) => {
    strongest = Math.max(strongest, Math.hypot(a, v));
    bestToward = Math.max(bestToward, scoreOf(want, a, v));
    arm = Math.max(arm, a);
    glove = Math.max(glove, -a);
    up = Math.max(up, v);
    down = Math.max(down, -v);
  };
  for (let i = 0; i < armSideM.length; i++) take(armSideM[i], verticalM[i]);
  for (const o of flown) take(o.seamMovement.armSideM, o.seamMovement.verticalM);
  return {
    wantFraction: want === "any" ? 1 : strongest > 0 ? bestToward / strongest : 0,
    bestTowardM: bestToward,
    strongestM: strongest,
    directions: { arm, glove, up, down },
  };
}

/** Screens one pitch. Throws RangeError for an invalid pitch or settings. */
export function screenPitch(pitch: Pitch, settings: ScreenSettings, onProgress?: ScreenProgress): ScreenResult {
  assertPitch(pitch);
  if (!(Number.isInteger(settings.top) && settings.top >= TOP_RANGE[0] && settings.top <= TOP_RANGE[1])) {
    throw new RangeError(`top ${settings.top} must be a whole number from ${TOP_RANGE[0]} to ${TOP_RANGE[1]}`);
  }
  if (!(settings.spreadRad >= SPREAD_RANGE_DEG[0] * DEG && settings.spreadRad <= SPREAD_RANGE_DEG[1] * DEG)) {
    throw new RangeError(`scatter spread ${settings.spreadRad / DEG} deg must be from ${SPREAD_RANGE_DEG[0]} to ${SPREAD_RANGE_DEG[1]} deg`);
  }
  const frame = pitchFrame(pitch);
  const seam = seamFor(settings.seamShape, settings.seamPoints);
  const { across: ua, alongMagnus: um } = unitSeamMovement(pitch, settings.model, { air: settings.air, windowStartM: settings.windowStartM });
  const grid = equalAreaGrid(settings.gridSpacingRad);
  const map = coefficientMapFor(settings.model, pitch.gyroRad, grid, settings.gridSpacingRad, settings.maps);
  const ctx: Context = {
    pitch,
    frame,
    settings,
    seam,
    landmarks: findLandmarks(settings.seamShape),
    cover: coverFor(settings.seamShape),
    unit: { across: ua, alongMagnus: um },
    scratch: { across: 0, alongMagnus: 0 },
    grid,
    map,
  };

  const n = grid.count;
  const armSideM = new Float64Array(n);
  const verticalM = new Float64Array(n);
  const scores = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const [arm, up] = linearMovement(ctx, map.across[i], map.alongMagnus[i]);
    armSideM[i] = arm;
    verticalM[i] = up;
    scores[i] = scoreOf(pitch.want, arm, up);
  }

  // local maxima, one per orbit of the rotations
  const rep = orbitRepresentatives(grid, true);
  const nb = new Int32Array(16);
  const maxima: number[] = [];
  for (let i = 0; i < n; i++) {
    if (rep[i] !== i || !(scores[i] > 0)) continue;
    const count = gridNeighbours(grid, i, nb);
    let isMax = true;
    for (let c = 0; c < count && isMax; c++) {
      const j = nb[c];
      if (scores[j] > scores[i] || (scores[j] === scores[i] && j < i)) isMax = false;
    }
    if (isMax) maxima.push(i);
  }
  maxima.sort((p, q) => scores[q] - scores[p]);
  const mergeRad = Math.max(MERGE_RAD, settings.gridSpacingRad, settings.spreadRad);
  const cell = (i: number): Vec3 => [grid.points[3 * i], grid.points[3 * i + 1], grid.points[3 * i + 2]];
  const distinct: number[] = [];
  for (const i of maxima) if (!distinct.some((j) => symmetricAngle(cell(j), cell(i)) < mergeRad)) distinct.push(i);
  // the pool ranked is the same for every --top up to the default, so a shorter list is the
  // first grips of the default one (the atlas's four are the screen's first four)
  const pool = Math.max(settings.top, DEFAULT_TOP);
  const seeds = distinct.slice(0, pool + 3);

  const refined: { axis: Vec3; score: number }[] = [];
  for (const i of seeds) {
    const r = refine(ctx, cell(i), scores[i], settings.gridSpacingRad / 2);
    const axis = canonicalAxis(r.axis);
    const twin = refined.find((x) => symmetricAngle(x.axis, axis) < mergeRad);
    if (twin) {
      if (r.score > twin.score) {
        twin.axis = axis;
        twin.score = r.score;
      }
    } else refined.push({ axis, score: r.score });
  }
  refined.sort((p, q) => q.score - p.score);
  if (onProgress) {
    // one step for the sweep, one for each grip and classic hold flown
    const total = 1 + Math.min(refined.length, pool + 2) + findReferenceAxes(seam).length;
    let done = 1;
    onProgress(done, total, "sweep");
    ctx.flown = () => onProgress(++done, total, "grips");
  }
  const described = refined.slice(0, pool + 2).map((r) => describe(ctx, r.axis));
  described.sort((p, q) => q.rankScore - p.rankScore || q.score - p.score);
  const references = findReferenceAxes(seam).map((r) => describe(ctx, canonicalAxis(r.axis), r.name));
  const reach = reachOf(pitch.want, armSideM, verticalM, [...described, ...references]);
  // the occupancy map is read only by the full sphere-map output (--map): made on first use
  let occupancy: SphereMap | undefined;
  return {
    pitch,
    frame,
    settings,
    unit: ctx.unit,
    reach,
    candidates: described.slice(0, settings.top),
    references,
    grid,
    across: map.across,
    alongMagnus: map.alongMagnus,
    armSideM,
    verticalM,
    scores,
    get occupancy(): SphereMap {
      return (occupancy ??= computeSphereMap(seam, pitch.gyroRad, settings.band, grid));
    },
    maximaFound: distinct.length,
  };
}
