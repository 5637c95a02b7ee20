/**
 * Explaining a tracked pitch: how much of its movement the spin predicts, what is
 * left over, which seam orientations would push it by about that much, and how far
 * the movement's direction is from the spin's.
 *
 * Field frame (geometry/frames.ts): x toward the catcher's right, y toward the
 * pitcher, z up. Movements are plate-plane vectors (x, z), reported per hand as
 * (arm side, up) with geometry/frames.ts's toArmSide.
 *
 * Two bases for the observed movement (`basis`):
 *   trade    (default) the trade's reading: induced vertical break and horizontal
 *            break from a constant-acceleration fit over a window from `windowStartM`
 *            (default 50 ft) to the front of the plate, gravity removed, drag's own
 *            deflection left in (tradeMovement.ts). The spin then predicts
 *            P = trade(gravity + drag + Magnus flight), i.e. drag's own deflection
 *            plus the Magnus part; the Magnus part alone is
 *            M = trade(gravity + drag + Magnus) - trade(gravity + drag).
 *   release  the plate crossing against the spinless flight of the same launch
 *            (gravity and drag only), as older data has it: P = M = magnus - spinless.
 * For one pitch, in the plate plane:
 *   residual    R = observed - P
 *   seam        S(o) = c_a(o, g) J_a + c_m(o, g) J_m: (c_a, c_m) the seam-force model's
 *               turn-averaged coefficient for orientation o at the pitch's gyro g
 *               (explainMaps.ts), J_a and J_m the movement on the same basis of a small
 *               coefficient DELTA along a and m added to the spin's flight, divided by
 *               DELTA (the seam force is small beside gravity and drag, so the seam part
 *               is close to linear in the coefficient; taken with Magnus on, so the
 *               seam-Magnus interaction is part of it)
 *   fit error   |R - S(o)|
 *   reach       the most any orientation's seam movement gives along R: max_o S(o) . R/|R|;
 *               R is beyond reach when |R| exceeds it by more than REACH_MARGIN_M.
 * Every orientation of the set (explainMaps.ts, one per proper-rotation orbit) is
 * tried; the matches listed are the best ones at least MATCH_SEPARATION grid spacings
 * apart (up to the ball's rotations), so the list shows distinct answers, not one
 * answer's neighbouring cells.
 *
 * The launch: the default release point, aimed at the middle of a typical zone by one
 * correction of the straight line plus gravity's drop (launchOf), not by pitchFlight's
 * full Newton aim: a few inches at the plate change the breaks by far less than
 * tracking noise.
 * Flights use a 2.5 ms RK4 step (EXPLAIN_STEP_S): against 1 ms the breaks differ by
 * about 0.005 in (a twentieth of the printed precision; 2 ms gives 1e-4 in but costs a
 * third more), and four flights a row are the batch's cost.
 *
 * Direction (movementDirection.ts): the spin-based direction is the Magnus part alone
 * M, the observed one the observed movement, both read on the clock of the pitch's
 * view, and the gap between them in clock minutes and degrees. The trade reads a gap
 * of more than about 15-30 minutes as a sign of seam effects (common practice, no
 * source); `gapFlagMinutes` (default 20) sets where we flag it.
 */
import { armSideSign, toArmSide } from "../../geometry/frames.js";
import { DEG, M_PER_FT, M_PER_IN } from "../../geometry/units.js";
import type { Vec3 } from "../../geometry/vec.js";
import type { Pitch } from "../screening/pitch.js";
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { airState, type AirConditions, type AirState } from "./air.js";
import { simulateFlight, type FlightOptions, type Launch } from "./flight.js";
import { PLATE_FRONT_Y_M } from "./field.js";
import { gyroKeys, memoGyroMaps, computeGyroMap, orientationSet, type GyroMap, type GyroMapSource, type OrientationSet } from "./explainMaps.js";
import { releasePosition, releaseVelocity, type ReleasePoint } from "./launch.js";
import { compareMovementDirections, type DirectionComparison } from "./movementDirection.js";
import { spinVector, ZONE_CENTRE_M } from "./pitchFlight.js";
import { seamHookTurnAverage } from "./seamModel/hooks.js";
import { seamModel, type SeamModel } from "./seamModel/model.js";
import type { SeamModelProfile } from "./seamModel/parameters.js";
import { TRADE_WINDOW_START_M, tradeMovement } from "./tradeMovement.js";
import { recordFlight } from "./trajectory.js";
import { STANDARD_GRAVITY_M_PER_S2 } from "./atmosphere.js";

export const DEFAULT_EXPLAIN_GRID_DEG = 4;
export const DEFAULT_EXPLAIN_TOP = 3;
export const EXPLAIN_TOP_RANGE: readonly [number, number] = [1, 20];
/** RK4 step of explain's flights, s (see the header). */
const EXPLAIN_STEP_S = 0.0025;
/** Aim corrections of the launch (launchOf). */
const AIM_CORRECTIONS = 1;
/** RK4 step of the aiming flight, s: its plate crossing moves by well under a millimetre against 1 ms. */
const AIM_STEP_S = 0.005;
/** Coefficient of the probe flights that measure J_a and J_m (a typical seam coefficient's size). */
const DELTA = 0.02;
/** Matches listed are at least this many grid spacings apart, up to the ball's rotations. */
const MATCH_SEPARATION = 2.5;
/** A residual is beyond reach when it exceeds the reach by more than this, m (0.1 in: the printed precision). */
export const REACH_MARGIN_M = 0.1 * M_PER_IN;
/** The seam's proper rotations: they leave the model's coefficients unchanged. */
const PROPER_ROTATIONS = SEAM_SYMMETRIES.filter((g) => g.proper);
/** Default gap between spin-based and observed directions that is flagged, clock minutes. */
export const DEFAULT_GAP_FLAG_MINUTES = 20;

export type MovementBasis = "trade" | "release";
export const MOVEMENT_BASES: readonly MovementBasis[] = ["trade", "release"];

/** A movement in the plate plane for a hand, m. */
export interface ArmUp {
  readonly armSideM: number;
  readonly upM: number;
}

export interface TrackedPitch {
  readonly pitch: Pitch;
  /** Observed movement on the explainer's basis, m: toward the arm side, and up (gravity removed). */
  readonly observedArmSideM: number;
  readonly observedUpM: number;
}

export interface ExplainMatch {
  /** Unit spin axis in the ball frame. */
  readonly axis: Vec3;
  /** Index in the orientation set. */
  readonly index: number;
  readonly seamArmSideM: number;
  readonly seamUpM: number;
  readonly fitErrorM: number;
  readonly coefficient: { readonly alongAxis: number; readonly alongMagnus: number };
}

export interface Explanation {
  readonly basis: MovementBasis;
  /** Window start on the trade basis, m; null on the release basis. */
  readonly windowStartM: number | null;
  /** What the spin predicts on this basis (trade: drag's own deflection plus Magnus). */
  readonly predicted: ArmUp;
  /** The Magnus part alone. */
  readonly magnus: ArmUp;
  /** Drag's own deflection (trade basis; zero on the release basis). */
  readonly drag: ArmUp;
  readonly residual: ArmUp;
  /** Seam movement per unit coefficient along a and m, m. */
  readonly unitA: ArmUp;
  readonly unitM: ArmUp;
  /** The most any orientation gives along the residual, m. */
  readonly reachM: number;
  readonly beyondReach: boolean;
  /** Spin-based (Magnus alone) against observed direction, in the pitch's view. */
  readonly direction: DirectionComparison;
  /** |gap| above the flag threshold (false when either direction is undefined). */
  readonly gapFlagged: boolean;
  readonly matches: readonly ExplainMatch[];
}

export interface ExplainOptions {
  readonly gridSpacingRad?: number;
  readonly top?: number;
  readonly air?: AirConditions;
  /** The seam-force model profile; default the built-in one (ignored when `model` is given). */
  readonly profile?: SeamModelProfile;
  readonly model?: SeamModel;
  readonly basis?: MovementBasis;
  /** Trade window start, m (10 to 55 ft from the rear of the plate); default 50 ft. */
  readonly windowStartM?: number;
  readonly release?: Omit<ReleasePoint, "hand">;
  /** Where the coefficient maps come from (a cache); default computed in memory. */
  readonly maps?: (model: SeamModel, set: OrientationSet) => GyroMapSource;
  readonly gapFlagMinutes?: number;
}

/** Per-throw numbers a joint fit needs (explainFit.ts). */
export interface ThrowFitData {
  readonly residualArmSideM: number;
  readonly residualUpM: number;
  readonly unitA: ArmUp;
  readonly unitM: ArmUp;
  readonly gyroRad: number;
}

/**
 * Sums over the throws of one pitch type, per orientation of the set: squared fit
 * error and the seam movement (arm side, up). Add throws with `Explainer.accumulate`,
 * merge partial sums (from workers) with `addSums`.
 */
export interface OrientationSums {
  count: number;
  readonly errorSquared: Float64Array;
  readonly seamArmSide: Float64Array;
  readonly seamUp: Float64Array;
}

export function emptySums(orientations: number): OrientationSums {
  return { count: 0, errorSquared: new Float64Array(orientations), seamArmSide: new Float64Array(orientations), seamUp: new Float64Array(orientations) };
}

export function addSums(into: OrientationSums, from: OrientationSums): void {
  into.count += from.count;
  for (let k = 0; k < into.errorSquared.length; k++) {
    into.errorSquared[k] += from.errorSquared[k];
    into.seamArmSide[k] += from.seamArmSide[k];
    into.seamUp[k] += from.seamUp[k];
  }
}

/** Explains tracked pitches; holds the model, the orientation set and the coefficient maps between rows. Not reentrant. */
export class Explainer {
  readonly set: OrientationSet;
  readonly model: SeamModel;
  readonly basis: MovementBasis;
  readonly windowStartM: number;
  readonly top: number;
  readonly gapFlagMinutes: number;
  private readonly maps: GyroMapSource;
  private readonly air: AirState;
  private readonly release: Omit<ReleasePoint, "hand">;
  private readonly ca: Float64Array;
  private readonly cm: Float64Array;
  private readonly err: Float64Array;
  private readonly order: Int32Array;

  constructor(options: ExplainOptions = {}) {
    const spacing = options.gridSpacingRad ?? DEFAULT_EXPLAIN_GRID_DEG * DEG;
    this.set = orientationSet(spacing);
    this.model = options.model ?? seamModel(options.profile);
    this.maps = memoGyroMaps(options.maps ? options.maps(this.model, this.set) : (key) => computeGyroMap(this.model, this.set, key));
    this.air = airState(options.air ?? {});
    this.basis = options.basis ?? "trade";
    if (!(this.basis === "trade" || this.basis === "release")) throw new RangeError(`movement basis "${this.basis}" must be trade or release`);
    this.windowStartM = options.windowStartM ?? TRADE_WINDOW_START_M;
    if (!(this.windowStartM >= 10 * M_PER_FT && this.windowStartM <= 55 * M_PER_FT)) throw new RangeError(`window start ${this.windowStartM} m must be from 10 to 55 ft`);
    this.release = options.release ?? {};
    this.top = options.top ?? DEFAULT_EXPLAIN_TOP;
    if (!(Number.isInteger(this.top) && this.top >= EXPLAIN_TOP_RANGE[0] && this.top <= EXPLAIN_TOP_RANGE[1])) throw new RangeError(`top ${this.top} must be a whole number from 1 to 20`);
    this.gapFlagMinutes = options.gapFlagMinutes ?? DEFAULT_GAP_FLAG_MINUTES;
    const n = this.set.cells.length;
    this.ca = new Float64Array(n);
    this.cm = new Float64Array(n);
    this.err = new Float64Array(n);
    this.order = new Int32Array(n);
  }

  /** Number of orientations tried. */
  get orientations(): number {
    return this.set.cells.length;
  }

  /** The unit axis of orientation k (ball frame). */
  axisOf(k: number): Vec3 {
    const a = this.set.axes;
    return [a[3 * k], a[3 * k + 1], a[3 * k + 2]];
  }

  /** The map at a gyro key (through the source: computed or cached). */
  mapAt(key: number): GyroMap {
    return this.maps(key);
  }

  /**
   * The launch explain flies for a pitch: the default release point, aimed at the
   * middle of a typical zone (ZONE_CENTRE_M) with the spin's flight: the straight line
   * plus gravity's drop, then AIM_CORRECTIONS corrections of both angles by the miss
   * over the distance flown (each divides the miss by about 30). The aim matters: drag's
   * own deflection, which stays in the trade's break, follows the sideways and vertical
   * velocity the aim needs.
   */
  launchOf(p: Pitch): Launch {
    const position = releasePosition({ ...this.release, hand: p.hand });
    const dy = position[1] - PLATE_FRONT_Y_M;
    const v = p.speedMPerS;
    const spin = spinVector(p);
    let vertical = Math.atan2(ZONE_CENTRE_M[1] - position[2], dy) + (STANDARD_GRAVITY_M_PER_S2 * dy) / (2 * v * v);
    let horizontal = Math.atan2(ZONE_CENTRE_M[0] - position[0], dy);
    // the aim needs the plate crossing to a few millimetres only: a coarser step
    const options: FlightOptions = { air: this.air, stepS: AIM_STEP_S };
    for (let i = 0; i < AIM_CORRECTIONS; i++) {
      const f = simulateFlight({ releasePositionM: position, releaseVelocityMPerS: releaseVelocity(v, vertical, horizontal), spinRadPerS: spin }, options);
      vertical -= (f.plateCrossingM[2] - ZONE_CENTRE_M[1]) / dy;
      horizontal -= (f.plateCrossingM[0] - ZONE_CENTRE_M[0]) / dy;
    }
    return { releasePositionM: position, releaseVelocityMPerS: releaseVelocity(v, vertical, horizontal), spinRadPerS: spin };
  }

  /** Fills this.ca / this.cm with the coefficients at the pitch's gyro. */
  private coefficientsAt(gyroRad: number): void {
    const { k0, f } = gyroKeys(gyroRad);
    const m0 = this.maps(k0);
    const n = this.ca.length;
    if (f === 0) {
      this.ca.set(m0.across);
      this.cm.set(m0.alongMagnus);
      return;
    }
    const m1 = this.maps(k0 + 1);
    for (let k = 0; k < n; k++) {
      this.ca[k] = (1 - f) * m0.across[k] + f * m1.across[k];
      this.cm[k] = (1 - f) * m0.alongMagnus[k] + f * m1.alongMagnus[k];
    }
  }

  /** The flights of one pitch on this basis: what the spin predicts, the Magnus and drag parts, and J_a, J_m. */
  movements(p: Pitch): { predicted: ArmUp; magnus: ArmUp; drag: ArmUp; unitA: ArmUp; unitM: ArmUp; predictedXM: number; magnusXM: number; magnusZM: number } {
    const launch = this.launchOf(p);
    const base: FlightOptions = { air: this.air, stepS: EXPLAIN_STEP_S };
    const hook = (ca: number, cm: number) => seamHookTurnAverage(this.model, [0, 0, 1], p.gyroRad, { across: ca, alongMagnus: cm });
    let spinless: [number, number], magnus: [number, number], withA: [number, number], withM: [number, number];
    if (this.basis === "trade") {
      const fit = { windowStartM: this.windowStartM };
      const trade = (o: FlightOptions): [number, number] => {
        const t = tradeMovement(recordFlight(launch, o).samples, fit);
        return [t.horizontalBreakM, t.inducedVerticalBreakM];
      };
      spinless = trade({ ...base, magnus: false });
      magnus = trade(base);
      withA = trade({ ...base, seamForce: hook(DELTA, 0) });
      withM = trade({ ...base, seamForce: hook(0, DELTA) });
    } else {
      const plate = (o: FlightOptions): [number, number] => {
        const f = recordFlight(launch, o).flight.plateCrossingM;
        return [f[0], f[2]];
      };
      spinless = plate({ ...base, magnus: false });
      magnus = plate(base);
      withA = plate({ ...base, seamForce: hook(DELTA, 0) });
      withM = plate({ ...base, seamForce: hook(0, DELTA) });
    }
    const hand = p.hand;
    const arm = (x: number, z: number): ArmUp => {
      const a = toArmSide(x, z, hand);
      return { armSideM: a.armSideM, upM: a.upM };
    };
    const mx = magnus[0] - spinless[0];
    const mz = magnus[1] - spinless[1];
    const trade = this.basis === "trade";
    return {
      predicted: trade ? arm(magnus[0], magnus[1]) : arm(mx, mz),
      magnus: arm(mx, mz),
      drag: trade ? arm(spinless[0], spinless[1]) : { armSideM: 0, upM: 0 },
      unitA: arm((withA[0] - magnus[0]) / DELTA, (withA[1] - magnus[1]) / DELTA),
      unitM: arm((withM[0] - magnus[0]) / DELTA, (withM[1] - magnus[1]) / DELTA),
      predictedXM: trade ? magnus[0] : mx,
      magnusXM: mx,
      magnusZM: mz,
    };
  }

  /** Explains one tracked pitch (see the header). */
  explain(t: TrackedPitch): Explanation {
    return this.explainWith(t).explanation;
  }

  /**
   * Explains one tracked pitch and returns the numbers a joint fit needs; with `sums`,
   * also adds this throw's squared error and seam movement per orientation to them.
   */
  explainWith(t: TrackedPitch, sums?: OrientationSums): { explanation: Explanation; fit: ThrowFitData } {
    const p = t.pitch;
    const mv = this.movements(p);
    const rx = t.observedArmSideM - mv.predicted.armSideM;
    const rz = t.observedUpM - mv.predicted.upM;
    const ja = mv.unitA;
    const jm = mv.unitM;
    this.coefficientsAt(p.gyroRad);
    const n = this.ca.length;
    const rNorm = Math.hypot(rx, rz);
    const ux = rNorm > 0 ? rx / rNorm : 0;
    const uz = rNorm > 0 ? rz / rNorm : 0;
    let reach = 0;
    const ca = this.ca, cm = this.cm, err = this.err;
    for (let k = 0; k < n; k++) {
      const sx = ca[k] * ja.armSideM + cm[k] * jm.armSideM;
      const sz = ca[k] * ja.upM + cm[k] * jm.upM;
      const ex = rx - sx;
      const ez = rz - sz;
      const e2 = ex * ex + ez * ez;
      err[k] = e2;
      const along = sx * ux + sz * uz;
      if (along > reach) reach = along;
      if (sums) {
        sums.errorSquared[k] += e2;
        sums.seamArmSide[k] += sx;
        sums.seamUp[k] += sz;
      }
    }
    if (sums) sums.count++;
    const picked = this.distinctBest(err, this.top);
    const matches = picked.map((k) => ({
      axis: this.axisOf(k),
      index: k,
      seamArmSideM: ca[k] * ja.armSideM + cm[k] * jm.armSideM,
      seamUpM: ca[k] * ja.upM + cm[k] * jm.upM,
      fitErrorM: Math.sqrt(err[k]),
      coefficient: { alongAxis: ca[k], alongMagnus: cm[k] },
    }));
    const sign = armSideSign(p.hand);
    const direction = compareMovementDirections(
      { horizontalM: mv.magnusXM, verticalM: mv.magnusZM },
      { horizontalM: sign * t.observedArmSideM, verticalM: t.observedUpM },
      p.view,
    );
    return {
      explanation: {
        basis: this.basis,
        windowStartM: this.basis === "trade" ? this.windowStartM : null,
        predicted: mv.predicted,
        magnus: mv.magnus,
        drag: mv.drag,
        residual: { armSideM: rx, upM: rz },
        unitA: ja,
        unitM: jm,
        reachM: reach,
        beyondReach: rNorm > reach + REACH_MARGIN_M,
        direction,
        gapFlagged: direction.differenceMinutes !== null && Math.abs(direction.differenceMinutes) > this.gapFlagMinutes,
        matches,
      },
      fit: { residualArmSideM: rx, residualUpM: rz, unitA: ja, unitM: jm, gyroRad: p.gyroRad },
    };
  }

  /**
   * The `count` orientations with the smallest `score`, each at least MATCH_SEPARATION
   * grid spacings (up to the ball's rotations) from those before it: repeated scans for
   * the smallest score not yet excluded, each pick excluding its precomputed neighbours
   * (no sort, no angle per orientation).
   */
  distinctBest(score: Float64Array, count: number): number[] {
    const n = score.length;
    const excluded = this.order;
    excluded.fill(0);
    const near = this.separationNeighbours();
    const picked: number[] = [];
    while (picked.length < count) {
      let best = -1;
      for (let k = 0; k < n; k++) if (excluded[k] === 0 && (best < 0 || score[k] < score[best])) best = k;
      if (best < 0) break;
      picked.push(best);
      const list = near[best];
      for (let j = 0; j < list.length; j++) excluded[list[j]] = 1;
    }
    return picked;
  }

  private neighbours: Int32Array[] | undefined;

  /**
   * For each orientation, those closer than MATCH_SEPARATION grid spacings to it or to
   * one of its proper images (itself included): computed once per orientation set, by
   * the largest dot product with the images.
   */
  private separationNeighbours(): Int32Array[] {
    if (this.neighbours) return this.neighbours;
    const n = this.set.cells.length;
    const axes = this.set.axes;
    const cosSep = Math.cos(MATCH_SEPARATION * this.set.grid.spacingRad);
    const out: Int32Array[] = [];
    for (let i = 0; i < n; i++) {
      const images = PROPER_ROTATIONS.map((g) => applySymmetry(g, this.axisOf(i)));
      const list: number[] = [];
      for (let k = 0; k < n; k++) {
        const x = axes[3 * k], y = axes[3 * k + 1], z = axes[3 * k + 2];
        if (images.some((b) => x * b[0] + y * b[1] + z * b[2] > cosSep)) list.push(k);
      }
      out.push(Int32Array.from(list));
    }
    this.neighbours = out;
    return out;
  }
}
