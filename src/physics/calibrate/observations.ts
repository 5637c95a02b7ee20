/**
 * What a calibration fits: a lab's force measurements and tracked pitches' seam
 * movement, and the seam-force model's predictions of both.
 *
 * Lab observation: a spin axis in the ball frame (geometry/seamCurve.ts), a gyro angle
 * and either a phase of the turn (geometry/flow.ts's convention: the instantaneous
 * force, instantAtPhase) or none (the quasi-steady turn average, turnAverage), the
 * dynamic force 1/2 rho pi R^2 v^2 at the row's speed and air (newtons per unit
 * coefficient), and the measured force along m = unit(w x v) ("alongMagnus") and along
 * a, the spin axis projected across the flight ("across"), newtons.
 *
 * Tracked observation: a pitch's seam orientation (axis, gyro) and its observed seam
 * movement in the trade's reading (toward the arm side and up, m: the movement left
 * once the spin's own Magnus part is taken off), with the movement one unit of
 * coefficient gives along a and along m (unitMovement.ts). The seam part of the trade's
 * movement is close to linear in the coefficient (the seam force is small beside
 * gravity and drag: src/physics/pitchFlight.ts, unitSeamMovement), so the prediction is
 *     S = c_a J_a + c_m J_m,
 * with (c_a, c_m) the model's turn average for the orientation and J the unit movements,
 * which do not depend on the model's parameters and are computed once per row.
 *
 * Prediction layout (Float64Array, 2 entries per row): lab row i at 2i (along Magnus, N)
 * and 2i + 1 (across, N); tracked row k at 2(L + k) (arm side, m) and 2(L + k) + 1
 * (up, m), L the number of lab rows.
 *
 * Rows that share an orientation (same unit axis, gyro and phase, or both turn-averaged)
 * share one model evaluation: a lab that measures one hold at several speeds pays once.
 */
import { unit3, type Vec3 } from "../../../geometry/vec.js";
import type { SeamModel } from "../seamModel/model.js";
import { instantAtPhase, turnAverage, type TurnAverage } from "../seamModel/turn.js";
import { emptyInstant } from "../seamModel/instant.js";

export interface LabObservation {
  /** Spin axis's positive end, ball frame, any non-zero length. */
  readonly axisBall: Readonly<Vec3>;
  /** Gyro angle, rad, |gyro| < pi/2. */
  readonly gyroRad: number;
  /** Phase of the turn, rad; undefined for a turn-averaged measurement. */
  readonly phaseRad?: number;
  /** 1/2 rho pi R^2 v^2, N per unit coefficient (seamForceNewtons(1, rho, R, v)). */
  readonly dynamicForceN: number;
  /** Measured force along m = unit(w x v), N. */
  readonly forceAlongMagnusN: number;
  /** Measured force along a (the spin axis across the flight), N. */
  readonly forceAcrossN: number;
}

/** Seam movement per unit coefficient, m (trade reading, arm side and up). */
export interface UnitMovement {
  readonly acrossArmSideM: number;
  readonly acrossUpM: number;
  readonly alongMagnusArmSideM: number;
  readonly alongMagnusUpM: number;
}

export interface TrackedObservation {
  readonly axisBall: Readonly<Vec3>;
  readonly gyroRad: number;
  readonly unitMovement: UnitMovement;
  /** Observed seam movement toward the arm side and up, m. */
  readonly seamArmSideM: number;
  readonly seamUpM: number;
}

/** The observations compiled for repeated prediction. */
export interface ObservationSet {
  readonly labCount: number;
  readonly trackedCount: number;
  /** Lab rows whose phase is absent (turn-averaged). */
  readonly labTurnAveragedCount: number;
  /** Measured values in the prediction layout (N and m). */
  readonly measured: Float64Array;
  /** Distinct orientations: unit axis (3 per entry), gyro, phase (NaN: turn average). */
  readonly orientationAxis: Float64Array;
  readonly orientationGyro: Float64Array;
  readonly orientationPhase: Float64Array;
  /** Orientation index of each row (lab rows first). */
  readonly rowOrientation: Int32Array;
  /** Per lab row: dynamic force, N. Per tracked row: J in the order of UnitMovement's fields (4 per row). */
  readonly labDynamicForceN: Float64Array;
  readonly trackedUnit: Float64Array;
}

/**
 * Checks and compiles observations.
 * @throws RangeError naming the row (1-based within its kind) for a zero or non-finite
 *   axis, |gyro| >= pi/2, a non-finite phase, force, movement or unit movement, or a
 *   dynamic force that is not positive.
 */
export function compileObservations(lab: readonly LabObservation[], tracked: readonly TrackedObservation[]): ObservationSet {
  const L = lab.length;
  const T = tracked.length;
  const measured = new Float64Array(2 * (L + T));
  const rowOrientation = new Int32Array(L + T);
  const labDynamicForceN = new Float64Array(L);
  const trackedUnit = new Float64Array(4 * T);
  const keys = new Map<string, number>();
  const axes: number[] = [];
  const gyros: number[] = [];
  const phases: number[] = [];
  const orientation = (what: string, axisBall: Readonly<Vec3>, gyroRad: number, phaseRad: number): number => {
    if (!axisBall.every(Number.isFinite) || Math.hypot(axisBall[0], axisBall[1], axisBall[2]) < 1e-12) {
      throw new RangeError(`${what}: spin axis (${axisBall.join(", ")}) must be three finite numbers, not all zero`);
    }
    if (!(Math.abs(gyroRad) < Math.PI / 2)) throw new RangeError(`${what}: gyro ${gyroRad} rad must be strictly between -pi/2 and pi/2`);
    const u = unit3(axisBall);
    const key = `${u[0]},${u[1]},${u[2]},${gyroRad},${phaseRad}`;
    let k = keys.get(key);
    if (k === undefined) {
      k = gyros.length;
      keys.set(key, k);
      axes.push(u[0], u[1], u[2]);
      gyros.push(gyroRad);
      phases.push(phaseRad);
    }
    return k;
  };
  let turnAveraged = 0;
  lab.forEach((o, i) => {
    const what = `lab row ${i + 1}`;
    const phase = o.phaseRad === undefined ? NaN : o.phaseRad;
    if (o.phaseRad !== undefined && !Number.isFinite(o.phaseRad)) throw new RangeError(`${what}: phase ${o.phaseRad} rad must be a finite number`);
    if (o.phaseRad === undefined) turnAveraged++;
    if (!(o.dynamicForceN > 0 && Number.isFinite(o.dynamicForceN))) throw new RangeError(`${what}: dynamic force ${o.dynamicForceN} N must be a finite number above 0`);
    if (!Number.isFinite(o.forceAlongMagnusN) || !Number.isFinite(o.forceAcrossN)) {
      throw new RangeError(`${what}: forces (${o.forceAlongMagnusN}, ${o.forceAcrossN}) N must be finite numbers`);
    }
    rowOrientation[i] = orientation(what, o.axisBall, o.gyroRad, phase);
    labDynamicForceN[i] = o.dynamicForceN;
    measured[2 * i] = o.forceAlongMagnusN;
    measured[2 * i + 1] = o.forceAcrossN;
  });
  tracked.forEach((o, k) => {
    const what = `tracked row ${k + 1}`;
    const j = o.unitMovement;
    const unit = [j.acrossArmSideM, j.acrossUpM, j.alongMagnusArmSideM, j.alongMagnusUpM];
    if (!unit.every(Number.isFinite)) throw new RangeError(`${what}: unit movement (${unit.join(", ")}) m must be finite numbers`);
    if (!Number.isFinite(o.seamArmSideM) || !Number.isFinite(o.seamUpM)) throw new RangeError(`${what}: seam movement (${o.seamArmSideM}, ${o.seamUpM}) m must be finite numbers`);
    rowOrientation[L + k] = orientation(what, o.axisBall, o.gyroRad, NaN);
    trackedUnit.set(unit, 4 * k);
    measured[2 * (L + k)] = o.seamArmSideM;
    measured[2 * (L + k) + 1] = o.seamUpM;
  });
  return {
    labCount: L,
    trackedCount: T,
    labTurnAveragedCount: turnAveraged,
    measured,
    orientationAxis: Float64Array.from(axes),
    orientationGyro: Float64Array.from(gyros),
    orientationPhase: Float64Array.from(phases),
    rowOrientation,
    labDynamicForceN,
    trackedUnit,
  };
}

/** Scratch for predict(): the coefficients per distinct orientation. */
export interface PredictionScratch {
  readonly across: Float64Array;
  readonly alongMagnus: Float64Array;
}

export function predictionScratch(set: ObservationSet): PredictionScratch {
  return { across: new Float64Array(set.orientationGyro.length), alongMagnus: new Float64Array(set.orientationGyro.length) };
}

/**
 * The model's predictions in the layout of the module header (N and m), the profile's
 * scale included.
 * @param out length 2 (labCount + trackedCount); overwritten and returned.
 */
export function predict(model: SeamModel, set: ObservationSet, out: Float64Array, scratch: PredictionScratch = predictionScratch(set)): Float64Array {
  const no = set.orientationGyro.length;
  const axis: Vec3 = [0, 0, 0];
  const average: TurnAverage = { across: 0, alongMagnus: 0 };
  const instant = emptyInstant();
  for (let k = 0; k < no; k++) {
    axis[0] = set.orientationAxis[3 * k];
    axis[1] = set.orientationAxis[3 * k + 1];
    axis[2] = set.orientationAxis[3 * k + 2];
    const phase = set.orientationPhase[k];
    if (Number.isNaN(phase)) {
      turnAverage(model, axis, set.orientationGyro[k], average);
      scratch.across[k] = average.across;
      scratch.alongMagnus[k] = average.alongMagnus;
    } else {
      instantAtPhase(model, axis, set.orientationGyro[k], phase, instant);
      scratch.across[k] = instant.across;
      scratch.alongMagnus[k] = instant.alongMagnus;
    }
  }
  const L = set.labCount;
  for (let i = 0; i < L; i++) {
    const k = set.rowOrientation[i];
    const q = set.labDynamicForceN[i];
    out[2 * i] = q * scratch.alongMagnus[k];
    out[2 * i + 1] = q * scratch.across[k];
  }
  const J = set.trackedUnit;
  for (let t = 0; t < set.trackedCount; t++) {
    const k = set.rowOrientation[L + t];
    const ca = scratch.across[k];
    const cm = scratch.alongMagnus[k];
    out[2 * (L + t)] = ca * J[4 * t] + cm * J[4 * t + 2];
    out[2 * (L + t) + 1] = ca * J[4 * t + 1] + cm * J[4 * t + 3];
  }
  return out;
}
