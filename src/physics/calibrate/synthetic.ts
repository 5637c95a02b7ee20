/**
 * Synthetic lab data from a planted profile: the model's own forces at random
 * orientations, plus Gaussian noise of a stated size. For the calibration's tests
 * (recovering a planted truth) and the benchmark. Deterministic for a seed.
 *
 * Random numbers: the 32-bit linear congruential generator with Numerical Recipes'
 * constants (Press et al., Numerical Recipes, 2nd ed., sec. 7.1), as the tests'
 * helper; Gaussian deviates by the Box-Muller transform (G. E. P. Box and
 * M. E. Muller, Ann. Math. Stat. 29, 610-611, 1958). Axes uniform on the sphere
 * (z uniform in [-1, 1], longitude uniform: Archimedes' hat-box theorem).
 */
import { BALL_RADIUS_M } from "../../../geometry/ball.js";
import { DEG, M_PER_S_PER_MPH } from "../../../geometry/units.js";
import type { Vec3 } from "../../../geometry/vec.js";
import { seamModel } from "../seamModel/model.js";
import { seamForceNewtons } from "../seamModel/newtons.js";
import type { SeamModelProfile } from "../seamModel/parameters.js";
import type { SeamModelResolution } from "../seamModel/resolution.js";
import { instantAtPhase, turnAverage } from "../seamModel/turn.js";
import type { LabObservation } from "./observations.js";

export interface SyntheticLabOptions {
  readonly profile: SeamModelProfile;
  readonly count: number;
  readonly seed: number;
  /** Standard deviation of the noise added to each force component, N (>= 0). */
  readonly noiseN: number;
  /** Share of turn-averaged rows, 0 to 1 (every k-th row, evenly spread). */
  readonly turnAveragedShare: number;
  /** Air density, kg/m^3; default 1.225 (sea level, 15 deg C). */
  readonly densityKgM3?: number;
  /** Speeds drawn uniformly from this range, mph; default 55 to 95. */
  readonly speedRangeMph?: readonly [number, number];
  /** Gyro angles drawn uniformly from this range, deg; default -45 to 45. */
  readonly gyroRangeDeg?: readonly [number, number];
  /** Axes: drawn uniformly on the sphere when absent; otherwise this list, taken in turn. */
  readonly axes?: readonly Readonly<Vec3>[];
  readonly resolution?: SeamModelResolution;
}

/** A synthetic row in the lab file's units, and as an observation. */
export interface SyntheticLabRow {
  readonly axisBall: Vec3;
  readonly gyroDeg: number;
  /** undefined: turn-averaged. */
  readonly phaseDeg: number | undefined;
  readonly speedMph: number;
  readonly forceAlongMagnusN: number;
  readonly forceAcrossN: number;
  readonly observation: LabObservation;
}

/** A seeded uniform stream on [0, 1). */
function uniformStream(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 4294967296;
  };
}

/** A seeded standard normal stream (Box-Muller on uniformStream). */
export function normalStream(seed: number): () => number {
  const uniform = uniformStream(seed);
  let spare: number | undefined;
  return () => {
    if (spare !== undefined) {
      const s = spare;
      spare = undefined;
      return s;
    }
    const u1 = 1 - uniform(); // in (0, 1]: log is finite
    const u2 = uniform();
    const r = Math.sqrt(-2 * Math.log(u1));
    spare = r * Math.sin(2 * Math.PI * u2);
    return r * Math.cos(2 * Math.PI * u2);
  };
}

/**
 * `count` rows of the model's forces at the planted profile plus noise (see the header).
 * @throws RangeError for a count below 1, a negative noise or a share outside 0 to 1.
 */
export function syntheticLabRows(o: SyntheticLabOptions): SyntheticLabRow[] {
  if (!(Number.isInteger(o.count) && o.count >= 1)) throw new RangeError(`row count ${o.count} must be a whole number of at least 1`);
  if (!(o.noiseN >= 0)) throw new RangeError(`noise ${o.noiseN} N must be 0 or more`);
  if (!(o.turnAveragedShare >= 0 && o.turnAveragedShare <= 1)) throw new RangeError(`turn-averaged share ${o.turnAveragedShare} must be from 0 to 1`);
  const uniform = uniformStream(o.seed);
  const normal = normalStream(o.seed ^ 0x9e3779b9);
  const model = seamModel(o.profile, o.resolution ?? {});
  const rho = o.densityKgM3 ?? 1.225;
  const [v0, v1] = o.speedRangeMph ?? [55, 95];
  const [g0, g1] = o.gyroRangeDeg ?? [-45, 45];
  const rows: SyntheticLabRow[] = [];
  let turned = 0;
  for (let i = 0; i < o.count; i++) {
    let axis: Vec3;
    if (o.axes && o.axes.length > 0) {
      const a = o.axes[i % o.axes.length];
      axis = [a[0], a[1], a[2]];
    } else {
      const z = 2 * uniform() - 1;
      const lon = 2 * Math.PI * uniform();
      const rr = Math.sqrt(1 - z * z);
      axis = [rr * Math.cos(lon), rr * Math.sin(lon), z];
    }
    const gyroDeg = g0 + (g1 - g0) * uniform();
    const speedMph = v0 + (v1 - v0) * uniform();
    const phaseDraw = 360 * uniform();
    // turn-averaged rows spread evenly: row i is one when the running share falls behind
    const averaged = turned < o.turnAveragedShare * (i + 1) - 1e-9;
    if (averaged) turned++;
    const phaseDeg = averaged ? undefined : phaseDraw;
    const c = phaseDeg === undefined ? turnAverage(model, axis, gyroDeg * DEG) : instantAtPhase(model, axis, gyroDeg * DEG, phaseDeg * DEG);
    const q = seamForceNewtons(1, rho, BALL_RADIUS_M, speedMph * M_PER_S_PER_MPH);
    const forceAlongMagnusN = q * c.alongMagnus + o.noiseN * normal();
    const forceAcrossN = q * c.across + o.noiseN * normal();
    rows.push({
      axisBall: axis,
      gyroDeg,
      phaseDeg,
      speedMph,
      forceAlongMagnusN,
      forceAcrossN,
      observation: { axisBall: axis, gyroRad: gyroDeg * DEG, ...(phaseDeg === undefined ? {} : { phaseRad: phaseDeg * DEG }), dynamicForceN: q, forceAlongMagnusN, forceAcrossN },
    });
  }
  return rows;
}
