/**
 * Explaining a tracked pitch: how much of its movement the spin predicts, what is
 * left over, and which seam orientations would push it by about that much.
 *
 * Observed movement is taken as the tracking systems give it once gravity is
 * removed: the offset at the front of the plate from a flight with no spin-driven
 * force. We compare it with the same launch flown here with gravity and drag only
 * (movement.ts), so drag's own effect cancels.
 *
 * For one pitch, in the plate plane (arm side, up), inches:
 *   Magnus      M = magnusOnly - spinless
 *   residual    R = observed - M
 *   seam        S(o) = c_a(o) J_a + c_m(o) J_m, where (c_a, c_m) is the seam-force model's
 *               turn-averaged coefficient for orientation o (seamForce.ts) and J_a, J_m the
 *               movement of one unit of coefficient along a and m (two flights with a
 *               unit coefficient: the seam force is small, so the movement is linear in it)
 *   fit error   |R - S(o)|
 * Every axis position of an equal-area grid on the ball is tried; coefficient maps are
 * computed at gyro angles every GYRO_STEP_DEG at a reduced model resolution
 * (EXPLAIN_MODEL), kept across rows, and interpolated linearly in gyro between the two
 * nearest, which keeps batch runs fast.
 * Proper symmetries of the curve keep (c_a, c_m); improper ones (mirrors) flip c_m
 * (seamForce.ts tests), so each orbit is evaluated once and both of its variants tried.
 */
import { applySymmetry, SEAM_SYMMETRIES } from "../../geometry/symmetry.js";
import { equalAreaGrid, orbitRepresentatives, type SphereGrid } from "../../geometry/sphereGrid.js";
import { type Vec3 } from "../../geometry/vec.js";
import { DEG } from "../../geometry/units.js";
import type { Pitch } from "../screening/pitch.js";
import { airState, type AirConditions, type AirState } from "./air.js";
import { simulateFlight, type FlightOptions, type Launch } from "./flight.js";
import { releasePosition, releaseVelocity } from "./launch.js";
import { spinVector } from "./pitchFlight.js";
import { seamHookTurnAverage } from "./seamModel/hooks.js";
import { coefficientMap } from "./seamModel/map.js";
import { seamModel, type SeamModel } from "./seamModel/model.js";
import type { SeamModelProfile } from "./seamModel/parameters.js";
import { toArmSide } from "../../geometry/frames.js";

export const DEFAULT_EXPLAIN_GRID_DEG = 4;
export const DEFAULT_EXPLAIN_TOP = 3;
/** Launch used for explaining, rad: 1 deg below level, toward the middle of the plate. */
const EXPLAIN_VERTICAL_RAD = -1 * DEG;
/** Spacing of the gyro angles at which coefficient maps are computed, deg. */
export const GYRO_STEP_DEG = 2.5;

export interface TrackedPitch {
  readonly pitch: Pitch;
  /** Observed movement, m, gravity removed: toward the arm side, and up. */
  readonly observedArmSideM: number;
  readonly observedUpM: number;
}

export interface ExplainMatch {
  /** Unit spin axis in the ball frame. */
  readonly axis: Vec3;
  readonly seamArmSideM: number;
  readonly seamUpM: number;
  readonly fitErrorM: number;
  readonly coefficient: { readonly alongAxis: number; readonly alongMagnus: number };
}

export interface Explanation {
  readonly magnusArmSideM: number;
  readonly magnusUpM: number;
  readonly residualArmSideM: number;
  readonly residualUpM: number;
  /** Seam movement per unit coefficient along a and m, m. */
  readonly unitA: { readonly armSideM: number; readonly upM: number };
  readonly unitM: { readonly armSideM: number; readonly upM: number };
  readonly matches: readonly ExplainMatch[];
}

export interface ExplainOptions {
  readonly gridSpacingRad?: number;
  readonly top?: number;
  readonly air?: AirConditions;
  /** The seam-force model profile; default the built-in one. */
  readonly profile?: SeamModelProfile;
}

interface CoefficientMap {
  readonly grid: SphereGrid;
  /** Orbit representatives and their coefficients. */
  readonly reps: Int32Array;
  readonly ca: Float64Array;
  readonly cm: Float64Array;
}

/** Explains tracked pitches; holds the coefficient maps between rows. */
export class Explainer {
  private readonly maps = new Map<number, CoefficientMap>();
  private readonly grid: SphereGrid;
  private readonly reps: Int32Array;
  private readonly air: AirState;
  private readonly model: SeamModel;
  private readonly top: number;

  constructor(options: ExplainOptions = {}) {
    const spacing = options.gridSpacingRad ?? DEFAULT_EXPLAIN_GRID_DEG * DEG;
    this.grid = equalAreaGrid(spacing);
    const rep = orbitRepresentatives(this.grid);
    const reps: number[] = [];
    for (let i = 0; i < this.grid.count; i++) if (rep[i] === i) reps.push(i);
    this.reps = Int32Array.from(reps);
    this.air = airState(options.air ?? {});
    this.model = seamModel(options.profile);
    this.top = options.top ?? DEFAULT_EXPLAIN_TOP;
    if (!(Number.isInteger(this.top) && this.top >= 1 && this.top <= 20)) throw new RangeError(`top ${this.top} must be a whole number from 1 to 20`);
  }

  /** The coefficient map at gyro angle key * GYRO_STEP_DEG. */
  private mapAt(key: number): CoefficientMap {
    let m = this.maps.get(key);
    if (!m) {
      const gyro = Math.max(-89.9, Math.min(89.9, key * GYRO_STEP_DEG)) * DEG;
      const map = coefficientMap(this.model, gyro, this.grid);
      const ca = new Float64Array(this.reps.length);
      const cm = new Float64Array(this.reps.length);
      this.reps.forEach((i, k) => {
        ca[k] = map.across[i];
        cm[k] = map.alongMagnus[i];
      });
      m = { grid: this.grid, reps: this.reps, ca, cm };
      this.maps.set(key, m);
    }
    return m;
  }

  explain(t: TrackedPitch): Explanation {
    const p = t.pitch;
    const position = releasePosition({ hand: p.hand });
    const horizontalRad = Math.atan2(-position[0], position[1]);
    const launch: Launch = {
      releasePositionM: position,
      releaseVelocityMPerS: releaseVelocity(p.speedMPerS, EXPLAIN_VERTICAL_RAD, horizontalRad),
      spinRadPerS: spinVector(p),
    };
    const base: FlightOptions = { air: this.air };
    const spinless = simulateFlight(launch, { ...base, magnus: false });
    const magnus = simulateFlight(launch, base);
    const unit = (alongAxis: number, alongMagnus: number) =>
      simulateFlight(launch, {
        ...base,
        magnus: false,
        seamForce: seamHookTurnAverage(this.model, [0, 0, 1], p.gyroRad, { across: alongAxis, alongMagnus }),
      });
    const sx = spinless.plateCrossingM[0];
    const sz = spinless.plateCrossingM[2];
    const off = (f: { plateCrossingM: Vec3 }) => toArmSide(f.plateCrossingM[0] - sx, f.plateCrossingM[2] - sz, p.hand);
    const mg = off(magnus);
    const ja = off(unit(1, 0));
    const jm = off(unit(0, 1));
    const rx = t.observedArmSideM - mg.armSideM;
    const rz = t.observedUpM - mg.upM;
    // best orbits, each tried with (c_a, c_m) and with the mirror variant (c_a, -c_m),
    // the coefficients interpolated in gyro between the two nearest maps
    const u = p.gyroRad / DEG / GYRO_STEP_DEG;
    const k0 = Math.floor(u);
    const f = u - k0;
    const m0 = this.mapAt(k0);
    const m1 = f > 0 ? this.mapAt(k0 + 1) : m0;
    const caOf = (k: number) => (1 - f) * m0.ca[k] + f * m1.ca[k];
    const cmOf = (k: number) => (1 - f) * m0.cm[k] + f * m1.cm[k];
    const map = m0;
    const best: { k: number; mirrored: boolean; err: number }[] = [];
    for (let k = 0; k < map.reps.length; k++) {
      for (const mirrored of [false, true]) {
        const ca = caOf(k);
        const cm = mirrored ? -cmOf(k) : cmOf(k);
        const ex = rx - (ca * ja.armSideM + cm * jm.armSideM);
        const ez = rz - (ca * ja.upM + cm * jm.upM);
        const err = Math.hypot(ex, ez);
        if (best.length < this.top || err < best[best.length - 1].err) {
          best.push({ k, mirrored, err });
          best.sort((a, b) => a.err - b.err);
          if (best.length > this.top) best.pop();
        }
      }
    }
    const mirror = SEAM_SYMMETRIES.find((g) => g.name === "mirror x=y")!;
    const matches = best.map(({ k, mirrored, err }) => {
      const i = map.reps[k];
      const rep: Vec3 = [map.grid.points[3 * i], map.grid.points[3 * i + 1], map.grid.points[3 * i + 2]];
      const ca = caOf(k);
      const cm = mirrored ? -cmOf(k) : cmOf(k);
      return {
        axis: mirrored ? applySymmetry(mirror, rep) : rep,
        seamArmSideM: ca * ja.armSideM + cm * jm.armSideM,
        seamUpM: ca * ja.upM + cm * jm.upM,
        fitErrorM: err,
        coefficient: { alongAxis: ca, alongMagnus: cm },
      };
    });
    return {
      magnusArmSideM: mg.armSideM,
      magnusUpM: mg.upM,
      residualArmSideM: rx,
      residualUpM: rz,
      unitA: ja,
      unitM: jm,
      matches,
    };
  }
}
