/**
 * Screening one pitch: every spin-axis position on the ball, the distinct best
 * ones, how forgiving each is, the classic holds beside them, and the fingers.
 *
 * 1. Sweep: the sampler on the equal-area ring grid (geometry/sphereGrid.ts), one
 *    evaluation per symmetry orbit (src/sampling/sphereMap.ts).
 * 2. Score per position: the push's component toward the wanted direction, or the
 *    asymmetry magnitude for "any" (src/screening/pitch.ts). The score is invariant
 *    under the curve's symmetry group, so maxima come in orbits.
 * 3. Candidates: grid cells that beat all their neighbours (one per orbit), the best
 *    of them refined off the grid by a pattern search on the sphere, then merged when
 *    a symmetry maps one within MERGE_RAD of another, and shown in one canonical image
 *    (the image with the largest z, then y, then x).
 * 4. Robustness under release scatter (src/screening/robustness.ts), and a rank:
 *    "strength" = score, "robust" = 10th-percentile score, "blend" (default) = their mean.
 */
import { BoundedCache } from "../../geometry/cache.js";
import { coverModel, type CoverModel } from "../../geometry/coverRegions.js";
import { findLandmarks, nearestLandmark, type Landmark } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { DEFAULT_SEAM_POINTS, type SeamSamples } from "../../geometry/seamSamples.js";
import { equalAreaGrid, gridNeighbours, orbitRepresentatives } from "../../geometry/sphereGrid.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { angleBetween, perpendicularUnit, unit3, type Vec3 } from "../../geometry/vec.js";
import { DEG } from "../../geometry/units.js";
import { DEFAULT_BAND, type Band } from "../sampling/band.js";
import { crossingsPerRevolution } from "../sampling/crossings.js";
import { bandAveragesExact, emptyAverages, type BandAverages } from "../sampling/exact.js";
import { seamFor } from "../sampling/measure.js";
import { computeSphereMap, type SphereMap } from "../sampling/sphereMap.js";
import { DEFAULT_FINGER_SPACING_IN, placeFingers, type Grip } from "./hand.js";
import { assertPitch, pitchFrame, pushInField, scoreFactor, type FieldPush, type Pitch, type PitchFrame } from "./pitch.js";
import { findReferenceAxes, type ReferenceName } from "./references.js";
import { DEFAULT_SPREAD_DEG, robustness, type Robustness } from "./robustness.js";

export type RankBy = "blend" | "strength" | "robust";
export const RANKS: readonly RankBy[] = ["blend", "strength", "robust"];

export const DEFAULT_GRID_SPACING_DEG = 2;
export const DEFAULT_TOP = 5;
/** Accepted screen settings (user units). */
export const GRID_SPACING_RANGE_DEG: readonly [number, number] = [0.5, 10];
export const TOP_RANGE: readonly [number, number] = [1, 50];
export const SPREAD_RANGE_DEG: readonly [number, number] = [0, 30];
/** Candidates closer than this after a symmetry are one candidate (maxima are broad: a few degrees across). */
const MERGE_RAD = 2 * DEG;
/** Pattern-search stopping step and evaluation cap. */
const REFINE_TOLERANCE_RAD = 0.002 * DEG;
const REFINE_MAX_EVALUATIONS = 400;

export interface ScreenSettings {
  readonly seamShape: number;
  readonly seamPoints: number;
  readonly band: Band;
  readonly gridSpacingRad: number;
  readonly spreadRad: number;
  readonly rank: RankBy;
  readonly top: number;
  readonly fingerSpacingIn: number;
}

export const DEFAULT_SCREEN_SETTINGS: ScreenSettings = {
  seamShape: DEFAULT_SEAM_SHAPE,
  seamPoints: DEFAULT_SEAM_POINTS,
  band: DEFAULT_BAND,
  gridSpacingRad: DEFAULT_GRID_SPACING_DEG * DEG,
  spreadRad: DEFAULT_SPREAD_DEG * DEG,
  rank: "blend",
  top: DEFAULT_TOP,
  fingerSpacingIn: DEFAULT_FINGER_SPACING_IN,
};

export interface ScreenedOrientation {
  /** Unit spin axis in the ball frame. */
  readonly axis: Vec3;
  readonly landmark: { readonly name: string; readonly angleRad: number };
  readonly score: number;
  readonly averages: BandAverages;
  readonly push: FieldPush;
  readonly crossingsPerRevolution: number;
  readonly robustness: Robustness;
  /** The number the list is ranked by (see RankBy). */
  readonly rankScore: number;
  readonly grip: Grip;
  /** For reference holds: which one. */
  readonly reference?: ReferenceName;
}

export interface ScreenResult {
  readonly pitch: Pitch;
  readonly frame: PitchFrame;
  readonly settings: ScreenSettings;
  /** |a . wanted| (1 for "any"): how much of the push's size can point the wanted way. */
  readonly wantReach: number;
  readonly candidates: readonly ScreenedOrientation[];
  readonly references: readonly ScreenedOrientation[];
  readonly map: SphereMap;
  /** Score per grid cell. */
  readonly scores: Float64Array;
  /** Distinct local maxima found before the top-N cut. */
  readonly maximaFound: number;
}

/** The canonical image of an axis under the seam's symmetry group. */
export function canonicalAxis(axis: Readonly<Vec3>): Vec3 {
  let best: Vec3 = [...axis] as Vec3;
  const key = (v: Vec3) => [Math.round(v[2] * 1e9), Math.round(v[1] * 1e9), Math.round(v[0] * 1e9)];
  for (const g of SEAM_SYMMETRIES) {
    const img = applySymmetry(g, axis);
    const a = key(img);
    const b = key(best);
    if (a[0] > b[0] || (a[0] === b[0] && (a[1] > b[1] || (a[1] === b[1] && a[2] > b[2])))) best = img;
  }
  return best;
}

/** The smallest angle between `a` and any symmetric image of `b`. */
export function symmetricAngle(a: Readonly<Vec3>, b: Readonly<Vec3>): number {
  let best = Infinity;
  for (const g of SEAM_SYMMETRIES) best = Math.min(best, angleBetween(a, applySymmetry(g, b)));
  return best;
}

interface Context {
  readonly pitch: Pitch;
  readonly frame: PitchFrame;
  readonly settings: ScreenSettings;
  readonly seam: SeamSamples;
  readonly factor: number | null;
  readonly landmarks: readonly Landmark[];
  readonly cover: CoverModel;
  readonly scratch: BandAverages;
}

function scoreOf(ctx: Context, x: number, y: number, z: number): number {
  const r = bandAveragesExact(ctx.seam, x, y, z, ctx.pitch.gyroRad, ctx.settings.band, ctx.scratch);
  return ctx.factor === null ? r.magnitude : ctx.factor * r.alongAxis;
}

/** Pattern search for a local maximum of the score on the sphere, from `start`. */
function refine(ctx: Context, start: Vec3, stepRad: number): { axis: Vec3; score: number } {
  let p = start;
  let best = scoreOf(ctx, p[0], p[1], p[2]);
  let step = stepRad;
  let evaluations = 1;
  while (step > REFINE_TOLERANCE_RAD && evaluations < REFINE_MAX_EVALUATIONS) {
    const e1 = perpendicularUnit(p);
    const e2: Vec3 = [p[1] * e1[2] - p[2] * e1[1], p[2] * e1[0] - p[0] * e1[2], p[0] * e1[1] - p[1] * e1[0]];
    let moved = false;
    for (const [u, v] of [
      [1, 0],
      [-1, 0],
      [0, 1],
      [0, -1],
      [0.7071067811865476, 0.7071067811865476],
      [-0.7071067811865476, -0.7071067811865476],
      [0.7071067811865476, -0.7071067811865476],
      [-0.7071067811865476, 0.7071067811865476],
    ]) {
      const c = Math.cos(step);
      const s = Math.sin(step);
      const q = unit3([
        c * p[0] + s * (u * e1[0] + v * e2[0]),
        c * p[1] + s * (u * e1[1] + v * e2[1]),
        c * p[2] + s * (u * e1[2] + v * e2[2]),
      ]);
      const value = scoreOf(ctx, q[0], q[1], q[2]);
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

/** Everything reported for one axis. */
function describe(ctx: Context, axisIn: Readonly<Vec3>, reference?: ReferenceName): ScreenedOrientation {
  const axis = unit3(axisIn);
  const averages = { ...bandAveragesExact(ctx.seam, axis[0], axis[1], axis[2], ctx.pitch.gyroRad, ctx.settings.band) };
  const score = ctx.factor === null ? averages.magnitude : ctx.factor * averages.alongAxis;
  const rob = robustness(axis, ctx.settings.spreadRad, (x, y, z) => scoreOf(ctx, x, y, z));
  const rankScore = ctx.settings.rank === "strength" ? score : ctx.settings.rank === "robust" ? rob.p10 : 0.5 * (score + rob.p10);
  const near = nearestLandmark(ctx.landmarks, axis);
  return {
    axis,
    landmark: { name: near.landmark.name, angleRad: near.angleRad },
    score,
    averages,
    push: pushInField(ctx.frame, ctx.pitch.view, averages.alongAxis),
    crossingsPerRevolution: crossingsPerRevolution(ctx.seam, axis[0], axis[1], axis[2], ctx.pitch.gyroRad),
    robustness: rob,
    rankScore,
    grip: placeFingers(axis, ctx.frame, ctx.seam, ctx.cover, ctx.settings.fingerSpacingIn),
    ...(reference ? { reference } : {}),
  };
}

const coverCache = new BoundedCache<number, CoverModel>("cover models per seam shape", 4);
function coverFor(b: number): CoverModel {
  return coverCache.get(b, () => coverModel(b));
}

/** Screens one pitch. Throws RangeError for an invalid pitch or settings. */
export function screenPitch(pitch: Pitch, settingsIn: Partial<ScreenSettings> = {}): ScreenResult {
  const settings: ScreenSettings = { ...DEFAULT_SCREEN_SETTINGS, ...settingsIn };
  assertPitch(pitch);
  if (!(Number.isInteger(settings.top) && settings.top >= TOP_RANGE[0] && settings.top <= TOP_RANGE[1])) {
    throw new RangeError(`top ${settings.top} must be a whole number from ${TOP_RANGE[0]} to ${TOP_RANGE[1]}`);
  }
  if (!(settings.spreadRad >= SPREAD_RANGE_DEG[0] * DEG && settings.spreadRad <= SPREAD_RANGE_DEG[1] * DEG)) {
    throw new RangeError(`scatter spread ${settings.spreadRad / DEG} deg must be from ${SPREAD_RANGE_DEG[0]} to ${SPREAD_RANGE_DEG[1]} deg`);
  }
  const frame = pitchFrame(pitch);
  const seam = seamFor(settings.seamShape, settings.seamPoints);
  const factor = scoreFactor(frame, pitch.want);
  const ctx: Context = {
    pitch,
    frame,
    settings,
    seam,
    factor,
    landmarks: findLandmarks(settings.seamShape),
    cover: coverFor(settings.seamShape),
    scratch: emptyAverages(),
  };

  const map = computeSphereMap(seam, pitch.gyroRad, settings.band, equalAreaGrid(settings.gridSpacingRad));
  const grid = map.grid;
  const scores = new Float64Array(grid.count);
  for (let i = 0; i < grid.count; i++) scores[i] = factor === null ? map.magnitude[i] : factor * map.alongAxis[i];

  // local maxima, one per symmetry orbit
  const rep = orbitRepresentatives(grid);
  const nb = new Int32Array(16);
  const maxima: number[] = [];
  for (let i = 0; i < grid.count; i++) {
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
  const seeds = maxima.slice(0, 3 * settings.top + 10);

  const refined: { axis: Vec3; score: number }[] = [];
  for (const i of seeds) {
    const r = refine(ctx, [grid.points[3 * i], grid.points[3 * i + 1], grid.points[3 * i + 2]], settings.gridSpacingRad / 2);
    const axis = canonicalAxis(r.axis);
    const twin = refined.find((x) => symmetricAngle(x.axis, axis) < Math.max(MERGE_RAD, settings.gridSpacingRad));
    if (twin) {
      if (r.score > twin.score) {
        twin.axis = axis;
        twin.score = r.score;
      }
    } else refined.push({ axis, score: r.score });
  }
  const described = refined.map((r) => describe(ctx, r.axis));
  described.sort((p, q) => q.rankScore - p.rankScore || q.score - p.score);
  const references = findReferenceAxes(seam).map((r) => describe(ctx, canonicalAxis(r.axis), r.name));
  return {
    pitch,
    frame,
    settings,
    wantReach: factor === null ? 1 : Math.abs(factor),
    candidates: described.slice(0, settings.top),
    references,
    map,
    scores,
    maximaFound: refined.length,
  };
}
