/**
 * Calibrating the seam-force model: the profile parameters that best fit a lab's forces
 * and tracked pitches' seam movement, with their uncertainties and what the data
 * cannot pin down.
 *
 * Residuals. Each row gives two: a lab row its force along m and across (N), divided
 * by the stated force uncertainty sigma_N; a tracked row its seam movement toward the
 * arm side and up (m), divided by sigma_M. So newtons and inches are combined as
 * multiples of their own measurement uncertainty (a weighted least squares); with one
 * kind of row the sigma cancels from the fitted values and, through s^2 below, from
 * the uncertainties too.
 *
 * Method. The model's coefficients are proportional to `scale` (instant.ts: the sum
 * carries the factor), so for the other parameters q the best scale has the closed form
 *     s*(q) = clamp(<u(q), y> / <u(q), u(q)>, scale's range),
 * u(q) the weighted predictions at scale 1 and y the weighted measurements, and the fit
 * runs over q alone on r(q) = s*(q) u(q) - y (variable projection: G. H. Golub and
 * V. Pereyra, SIAM J. Numer. Anal. 10, 413-432, 1973). With `scale` the only parameter
 * to fit, that closed form is the whole fit. The search over q is bounded Levenberg-
 * Marquardt (leastSquares.ts) within each parameter's range from the table, from the
 * start profile, with central-difference Jacobians. The trip zone's edges act through
 * whole seam crossings at the model's meridians and phases: each row's prediction is a
 * staircase in them (a step of one meridian's share when a crossing passes an edge),
 * and only the sum over many rows is smooth, on the scale of a few hundredths of a
 * degree for a few hundred rows. So the first pass uses the coarse DIFFERENCE_STEPS
 * (a degree for the trip edges), which find the basin, and up to REFINE_PASSES further
 * passes use steps of REFINE_SIGMAS standard deviations of the previous pass's
 * estimate (within STEP_FLOORS and the coarse steps), which find its bottom; the
 * covariance uses the last pass's steps (DEVELOPERS.md has the study behind these).
 * Cross-parameter checks (parameters.ts) are kept as the search's constraints beyond
 * the box (limits.ts gives their margins): no iterate fails one, and a step that meets
 * one slides along it.
 *
 * Uncertainties: the Gauss-Newton covariance at the optimum, s^2 (J^T J)^-1, with J the
 * Jacobian of the weighted residuals in all fitted parameters (central differences at
 * the fitted scale, and the scale column u exactly) and s^2 = |r|^2 / (m - n) the residual
 * variance (m residuals, n parameters); 1-sigma is the square root of its diagonal. It
 * assumes independent errors and a model that is right up to them, and is linear near
 * the optimum; s^2 near 1 says the stated sigmas match the scatter left.
 *
 * What the data cannot pin down, each with its reason:
 *   - a direction in parameter space along which no prediction changes: a singular
 *     value of J with columns scaled by the parameters' ranges below NULL_RELATIVE of
 *     the largest (e.g. the trip zone's edges when no seam comes near the trip zone);
 *     the parameters loading on it by NULL_LOADING or more get no uncertainty, and the
 *     covariance of the others is taken on the remaining directions (a pseudo-inverse);
 *     scale, wakePressureCoefficient and suctionFactor always form one such direction
 *     when all three are fitted: the force depends on them only through
 *     scale (1 - Cp_b) and scale lambda (pressure.ts: G - G(theta_L) =
 *     (1 - Cp_b) (I2(ts) - I2(theta_L)) - (9 lambda / 4) (I4(ts) - I4(theta_L))), so
 *     then suctionFactor is held at its start value and all three are reported;
 *   - a 1-sigma uncertainty above the value itself (relative uncertainty above 100 %)
 *     or above half the parameter's range;
 *   - a value at a bound of its range, or at a cross-parameter limit (limits.ts).
 */
import { resolveProfile, SEAM_MODEL_PARAMETERS, type SeamModelParameter, type SeamModelParameterName, type SeamModelProfile, type SeamModelValues } from "../seamModel/parameters.js";
import { seamModel } from "../seamModel/model.js";
import { M_PER_IN } from "../../../geometry/units.js";
import { boundedLevenbergMarquardt, finiteDifferenceJacobian, type LeastSquaresProblem, type StopReason } from "./leastSquares.js";
import { gaussNewtonCovariance } from "./covariance.js";
import { crossLimits } from "./limits.js";
import { compileObservations, predict, predictionScratch, type LabObservation, type TrackedObservation } from "./observations.js";

/**
 * Default uncertainty of a lab force component, N: 0.02 N, about 5 % of a typical seam
 * force (0.4 N at 90 mph, MODEL.md) and of the order of a wind-tunnel balance's scatter
 * on a ball-sized model (common practice, no source). A stated choice: set it to your
 * own rig's figure.
 */
export const DEFAULT_SIGMA_N = 0.02;
/**
 * Default uncertainty of a tracked seam-movement component, m: 1 inch, the pitch-to-pitch
 * scatter of one pitcher's movement readings for one pitch type (common practice, from
 * memory), which the seam part inherits whole.
 */
export const DEFAULT_SIGMA_M = 1 * M_PER_IN;

/**
 * Finite-difference steps of the first pass per parameter (the table's units). Trip
 * edges a degree (see the header); separation angles a quarter degree
 * (theta_s = min(theta_band, theta_L) is continuous in them); the pressure numbers
 * 0.005 (the force is linear in them).
 */
const DIFFERENCE_STEPS: Readonly<Record<SeamModelParameterName, number>> = {
  laminarSeparationDeg: 0.25,
  turbulentSeparationDeg: 0.25,
  tripStartDeg: 1,
  tripEndDeg: 1,
  bandCenterDeg: 0.25,
  bandWidthDeg: 0.25,
  wakePressureCoefficient: 0.005,
  suctionFactor: 0.005,
  scale: 0.005,
};

/** A singular value of the range-scaled Jacobian below this fraction of the largest is a direction the data do not see. */
const NULL_RELATIVE = 1e-7;
/** A parameter takes part in such a direction when its share of the unit singular vector is at least this. */
const NULL_LOADING = 0.1;
/** Smallest difference steps of the refining passes (the table's units): below them the staircase's treads show. */
const STEP_FLOORS: Readonly<Record<SeamModelParameterName, number>> = {
  laminarSeparationDeg: 0.01,
  turbulentSeparationDeg: 0.01,
  tripStartDeg: 0.02,
  tripEndDeg: 0.02,
  bandCenterDeg: 0.01,
  bandWidthDeg: 0.01,
  wakePressureCoefficient: 1e-4,
  suctionFactor: 1e-4,
  scale: 1e-4,
};
/** Refining passes after the first, and their difference steps in standard deviations. */
const REFINE_PASSES = 2;
const REFINE_SIGMAS = 5;
/** A refining pass is skipped when no step would change by this factor. */
const REFINE_CHANGE = 1.5;

/**
 * The search stops when the full Gauss-Newton step would move the parameters by less
 * than this many standard deviations (in the metric of the covariance s^2 (J^T J)^-1):
 * closer than that the data cannot tell points apart.
 */
const STOP_SIGMAS = 0.01;
/** A value within this fraction of its range from a bound is at the bound. */
const BOUND_TOLERANCE = 1e-6;
/** A cross-parameter margin within this fraction of the parameter's difference step is at the limit. */
const CROSS_LIMIT_TOLERANCE = 0.01;

export interface CalibrationOptions {
  /** Where the fit starts, and the values of the parameters not fitted. */
  readonly start: SeamModelProfile;
  /** Parameters to fit: calibratable names from SEAM_MODEL_PARAMETERS, each once. */
  readonly fit: readonly SeamModelParameterName[];
  readonly lab?: readonly LabObservation[];
  readonly tracked?: readonly TrackedObservation[];
  /** Uncertainty of a lab force component, N (> 0); default DEFAULT_SIGMA_N. */
  readonly sigmaN?: number;
  /** Uncertainty of a tracked movement component, m (> 0); default DEFAULT_SIGMA_M. */
  readonly sigmaM?: number;
  /** Name of the fitted profile; default "calibrated". */
  readonly name?: string;
  /** Called after each iteration with the root-mean-square weighted residual. */
  readonly onIteration?: (iteration: number, rmsWeighted: number) => void;
}

export interface CalibratedParameter {
  readonly name: SeamModelParameterName;
  readonly unit: "deg" | "1";
  readonly start: number;
  readonly value: number;
  /** 1-sigma, in the parameter's unit; undefined when the data do not determine it (see notIdentified). */
  readonly uncertainty: number | undefined;
  /** "min" or "max" at a table bound, a cross-parameter check's text at its limit; undefined inside. */
  readonly atBound: string | undefined;
}

export interface NotIdentified {
  readonly name: SeamModelParameterName;
  readonly reason: string;
}

export interface CalibrationResult {
  readonly start: SeamModelProfile;
  readonly profile: SeamModelProfile;
  /** The fitted parameters, in table order. */
  readonly parameters: readonly CalibratedParameter[];
  readonly notIdentified: readonly NotIdentified[];
  readonly rows: { readonly lab: number; readonly labTurnAveraged: number; readonly tracked: number };
  /** Root mean square over both components of every row of a kind; undefined without rows of that kind. */
  readonly rms: {
    readonly labBeforeN: number | undefined;
    readonly labAfterN: number | undefined;
    readonly trackedBeforeM: number | undefined;
    readonly trackedAfterM: number | undefined;
  };
  /** Per row, two entries each (observations.ts layout; N and m): measured, predicted at the start, fitted. */
  readonly measured: Float64Array;
  readonly predictedBefore: Float64Array;
  readonly predictedAfter: Float64Array;
  readonly sigmaN: number;
  readonly sigmaM: number;
  readonly method: {
    /** "closed form" (scale alone) or "levenberg-marquardt". */
    readonly search: "closed form" | "levenberg-marquardt";
    readonly iterations: number;
    /** Model evaluations over every row (one each per residual vector). */
    readonly evaluations: number;
    readonly converged: boolean;
    readonly stopReason: StopReason | "closed form";
    /** s^2: weighted residual sum of squares over (m - n). */
    readonly residualVariance: number;
    readonly degreesOfFreedom: number;
    /** Singular values of the range-scaled Jacobian over the largest, largest first. */
    readonly relativeSingularValues: readonly number[];
    /** Correlation matrix of the fitted parameters (table order); NaN where a parameter has no uncertainty. */
    readonly correlation: readonly (readonly number[])[];
  };
}

const TABLE = new Map<string, SeamModelParameter>(SEAM_MODEL_PARAMETERS.map((p) => [p.name, p]));
/** The parameters that enter the force only through two combinations (module header). */
const TRIPLE: readonly SeamModelParameterName[] = ["scale", "wakePressureCoefficient", "suctionFactor"];

/** Checks a list of parameter names to fit (RangeError naming the bad one). */
export function checkFitNames(names: readonly string[]): SeamModelParameterName[] {
  if (names.length === 0) throw new RangeError(`no parameters to fit; expected one or more of ${calibratableNames().join(", ")}`);
  const seen = new Set<string>();
  for (const name of names) {
    const p = TABLE.get(name);
    if (!p) throw new RangeError(`"${name}" is not a seam model parameter; expected one of the calibratable ones: ${calibratableNames().join(", ")}`);
    if (!p.calibratable) throw new RangeError(`${name} is not calibratable (${p.description}); expected one of ${calibratableNames().join(", ")}`);
    if (seen.has(name)) throw new RangeError(`${name} is named twice; expected each parameter once`);
    seen.add(name);
  }
  return SEAM_MODEL_PARAMETERS.filter((p) => seen.has(p.name)).map((p) => p.name);
}

/** The names a calibration may fit, in table order. */
export function calibratableNames(): SeamModelParameterName[] {
  return SEAM_MODEL_PARAMETERS.filter((p) => p.calibratable).map((p) => p.name);
}

function rmsOf(a: Float64Array, b: Float64Array, from: number, to: number): number | undefined {
  if (to <= from) return undefined;
  let s = 0;
  for (let i = from; i < to; i++) s += (a[i] - b[i]) ** 2;
  return Math.sqrt(s / (to - from));
}

/**
 * Fits the profile (see the module header).
 * @throws RangeError for a bad parameter list, no rows, fewer rows than parameters, a
 *   bad observation (observations.ts) or a sigma that is not a positive number.
 */
export function calibrateSeamModel(options: CalibrationOptions): CalibrationResult {
  const fit = checkFitNames(options.fit);
  const lab = options.lab ?? [];
  const tracked = options.tracked ?? [];
  const sigmaN = options.sigmaN ?? DEFAULT_SIGMA_N;
  const sigmaM = options.sigmaM ?? DEFAULT_SIGMA_M;
  if (!(sigmaN > 0 && Number.isFinite(sigmaN))) throw new RangeError(`force uncertainty ${sigmaN} N must be a finite number above 0`);
  if (!(sigmaM > 0 && Number.isFinite(sigmaM))) throw new RangeError(`movement uncertainty ${sigmaM} m must be a finite number above 0`);
  const rowCount = lab.length + tracked.length;
  if (rowCount === 0) throw new RangeError(`no rows to fit; expected lab or tracked rows, at least one per parameter fitted (${fit.length})`);
  if (rowCount < fit.length) throw new RangeError(`${rowCount} row(s) to fit ${fit.length} parameters; expected at least one row per parameter`);
  const set = compileObservations(lab, tracked);
  const m = 2 * rowCount;
  const weight = new Float64Array(m);
  weight.fill(1 / sigmaN, 0, 2 * set.labCount);
  weight.fill(1 / sigmaM, 2 * set.labCount);
  const y = new Float64Array(m);
  for (let i = 0; i < m; i++) y[i] = weight[i] * set.measured[i];
  const start = options.start;
  const scaleFitted = fit.includes("scale");
  // with all three of the degenerate triple asked for, suctionFactor is held at its start (any value fits alike)
  const tripleFitted = TRIPLE.every((t) => fit.includes(t));
  const nonlinear = fit.filter((n) => n !== "scale" && !(tripleFitted && n === "suctionFactor"));
  const scaleParam = TABLE.get("scale")!;
  const scratch = predictionScratch(set);

  // the start's values with `names` set from x and the scale given
  const valuesAt = (names: readonly SeamModelParameterName[], x: ArrayLike<number>, scale: number): Record<string, number> => {
    const v: Record<string, number> = { ...start.values, scale };
    names.forEach((name, j) => (v[name] = x[j]));
    return v;
  };
  let evaluations = 0;
  // weighted predictions at scale 1; false when the values fail a cross-parameter check
  const unitPredictions = (names: readonly SeamModelParameterName[], x: ArrayLike<number>, out: Float64Array): boolean => {
    let profile: SeamModelProfile;
    try {
      profile = resolveProfile({ name: "trial", parameters: valuesAt(names, x, 1) }, "calibration");
    } catch (err) {
      if (err instanceof RangeError) return false;
      throw err;
    }
    evaluations++;
    predict(seamModel(profile), set, out, scratch);
    for (let i = 0; i < m; i++) out[i] *= weight[i];
    return true;
  };
  const bestScale = (u: Float64Array): number => {
    if (!scaleFitted) return start.values.scale;
    let uy = 0;
    let uu = 0;
    for (let i = 0; i < m; i++) {
      uy += u[i] * y[i];
      uu += u[i] * u[i];
    }
    if (!(uu > 0)) return start.values.scale;
    return Math.min(scaleParam.max, Math.max(scaleParam.min, uy / uu));
  };
  const u = new Float64Array(m);
  const problem: LeastSquaresProblem = {
    size: nonlinear.length,
    residualCount: m,
    lower: nonlinear.map((n) => TABLE.get(n)!.min),
    upper: nonlinear.map((n) => TABLE.get(n)!.max),
    step: nonlinear.map((n) => DIFFERENCE_STEPS[n]),
    residuals(x, out) {
      if (!unitPredictions(nonlinear, x, u)) return false;
      const s = bestScale(u);
      for (let i = 0; i < m; i++) out[i] = s * u[i] - y[i];
      return true;
    },
    margins: (x) => crossLimits(valuesAt(nonlinear, x, 1) as SeamModelValues).map((l) => l.margin),
  };
  const x0 = Float64Array.from(nonlinear.map((n) => start.values[n]));
  let x: Float64Array = x0;
  let search: CalibrationResult["method"]["search"] = "closed form";
  let iterations = 0;
  let finalSteps: number[] = [];
  let converged = true;
  let stopReason: StopReason | "closed form" = "closed form";
  const onIteration = options.onIteration;
  if (nonlinear.length > 0) {
    search = "levenberg-marquardt";
    const defaults = nonlinear.map((name) => DIFFERENCE_STEPS[name]);
    let steps = defaults.slice();
    let current: Float64Array = x0;
    for (let pass = 0; pass <= REFINE_PASSES; pass++) {
      const result = boundedLevenbergMarquardt({ ...problem, step: steps }, current, {
        central: true,
        // a step of STOP_SIGMAS standard deviations changes the cost by STOP_SIGMAS^2 s^2 / 2, s^2 = 2 cost / (m - n)
        costResolution: (cost) => (STOP_SIGMAS * STOP_SIGMAS * cost) / Math.max(1, m - fit.length),
        ...(onIteration ? { onIteration: (k: number, cost: number) => onIteration(iterations + k, Math.sqrt((2 * cost) / m)) } : {}),
      });
      current = result.x;
      iterations += result.iterations;
      converged = result.converged;
      stopReason = result.stopReason;
      if (pass === REFINE_PASSES) break;
      // difference steps of REFINE_SIGMAS standard deviations (within their floor and default) for the next pass
      const sigma = searchSigmas({ ...problem, step: steps }, current, result.residuals);
      const next = nonlinear.map((name, j) => {
        const sj = sigma[j];
        return Number.isFinite(sj) ? Math.min(defaults[j], Math.max(STEP_FLOORS[name], REFINE_SIGMAS * sj)) : defaults[j];
      });
      if (next.every((h, j) => h > steps[j] / REFINE_CHANGE && h < steps[j] * REFINE_CHANGE)) break;
      steps = next;
    }
    x = current;
    finalSteps = steps;
  }
  if (!unitPredictions(nonlinear, x, u)) throw new Error("the fitted point fails a cross-parameter check (a defect: every iterate is feasible)");
  const scale = bestScale(u);
  const fittedValues = valuesAt(nonlinear, x, scale);
  const profile = resolveProfile({ name: options.name ?? "calibrated", parameters: fittedValues }, "calibration");
  const predictedBefore = predict(seamModel(start), set, new Float64Array(m));
  const predictedAfter = predict(seamModel(profile), set, new Float64Array(m));
  evaluations += 2;

  // the Jacobian in every fitted parameter at the optimum (table order), weighted
  const r = new Float64Array(m);
  for (let i = 0; i < m; i++) r[i] = scale * u[i] - y[i];
  // every fitted parameter but scale, by central differences at the fitted scale; scale's column is u itself
  const others: SeamModelParameterName[] = fit.filter((name) => name !== "scale");
  const atFixedScale: LeastSquaresProblem = {
    size: others.length,
    residualCount: m,
    lower: others.map((name) => TABLE.get(name)!.min),
    upper: others.map((name) => TABLE.get(name)!.max),
    step: others.map((name) => (nonlinear.includes(name) ? finalSteps[nonlinear.indexOf(name)] : DIFFERENCE_STEPS[name])),
    residuals(xx, out) {
      if (!unitPredictions(others, xx, out)) return false;
      for (let i = 0; i < m; i++) out[i] = scale * out[i] - y[i];
      return true;
    },
  };
  const n = fit.length;
  const jac = new Float64Array(m * n);
  const xOthers = Float64Array.from(others.map((name) => fittedValues[name]));
  const fd = others.length > 0 ? finiteDifferenceJacobian(atFixedScale, xOthers, r, true).jacobian : new Float64Array(0);
  fit.forEach((name, j) => {
    const k = others.indexOf(name);
    jac.set(k < 0 ? u : fd.subarray(m * k, m * (k + 1)), m * j);
  });
  const ranges = fit.map((name) => TABLE.get(name)!.max - TABLE.get(name)!.min);
  const gn = gaussNewtonCovariance(jac, r, m, n, { columnScales: ranges, nullRelative: NULL_RELATIVE, nullLoading: NULL_LOADING });
  const cov = gn.covariance;
  const s2 = gn.residualVariance;
  const dof = gn.degreesOfFreedom;
  const unseen = new Set<number>();
  const notIdentified: NotIdentified[] = [];
  const reasons = new Map<SeamModelParameterName, string>();
  if (tripleFitted) {
    // exact, whatever the data (the module header): name all three whichever way the singular vector leans
    const why = `the force depends on scale * (1 - wakePressureCoefficient) and scale * suctionFactor only, so no data fix all three (fit at most two of them)`;
    for (const name of TRIPLE) {
      unseen.add(fit.indexOf(name));
      reasons.set(
        name,
        name === "suctionFactor"
          ? `held at its start value ${start.values.suctionFactor}: ${why}`
          : `fitted with suctionFactor held at ${start.values.suctionFactor}, so its value rests on that choice: ${why}`,
      );
    }
  }
  for (const direction of gn.nullDirections) {
    const members = direction.members.map((i) => fit[i]).filter((name) => !(tripleFitted && TRIPLE.includes(name)));
    const ratio = direction.relative;
    for (const name of members) {
      unseen.add(fit.indexOf(name));
      if (reasons.has(name)) continue;
      reasons.set(
        name,
        members.length === 1
          ? `no row's prediction changes when it changes (the scaled Jacobian's singular value for it is ${ratio.toExponential(1)} of the largest): no row reaches the part of the model it sets`
          : `the data cannot tell it apart from ${members.filter((o) => o !== name).join(" and ")}: together they can change without changing any prediction (singular value ${ratio.toExponential(1)} of the largest)`,
      );
    }
  }
  for (const [name, reason] of reasons) notIdentified.push({ name, reason });
  const limits = crossLimits(profile.values);
  const parameters: CalibratedParameter[] = fit.map((name, j) => {
    const p = TABLE.get(name)!;
    const value = profile.values[name];
    const uncertainty = unseen.has(j) ? undefined : Math.sqrt(Math.max(0, cov[n * j + j]));
    const range = p.max - p.min;
    let atBound: string | undefined;
    if (value - p.min <= BOUND_TOLERANCE * range) atBound = "min";
    else if (p.max - value <= BOUND_TOLERANCE * range) atBound = "max";
    else {
      const limit = limits.find((l) => l.names.includes(name) && l.margin <= CROSS_LIMIT_TOLERANCE * DIFFERENCE_STEPS[name]);
      if (limit) atBound = limit.text;
    }
    const held = tripleFitted && name === "suctionFactor";
    if (held) atBound = undefined;
    if (atBound === "min" || atBound === "max") {
      notIdentified.push({ name, reason: `at the ${atBound === "min" ? "lower" : "upper"} end of its range (${p.min} to ${p.max}${p.unit === "deg" ? " deg" : ""}): the data push it further, so its uncertainty does not hold` });
    } else if (atBound !== undefined) {
      notIdentified.push({ name, reason: `at the cross-parameter limit ${atBound}: the data push it across, so its uncertainty does not hold` });
    }
    if (uncertainty !== undefined) {
      if (uncertainty > Math.abs(value)) {
        notIdentified.push({ name, reason: `its 1-sigma uncertainty ${uncertainty.toPrecision(2)} is larger than its value ${value.toPrecision(3)} (relative uncertainty above 100 %)` });
      } else if (uncertainty > range / 2) {
        notIdentified.push({ name, reason: `its 1-sigma uncertainty ${uncertainty.toPrecision(2)} is larger than half its range (${p.min} to ${p.max})` });
      }
    }
    return { name, unit: p.unit, start: start.values[name], value, uncertainty, atBound };
  });
  notIdentified.sort((a, b) => fit.indexOf(a.name) - fit.indexOf(b.name));
  const correlation = fit.map((_, i) =>
    fit.map((__, j) => (unseen.has(i) || unseen.has(j) ? NaN : cov[n * i + j] / Math.sqrt(cov[n * i + i] * cov[n * j + j]))),
  );
  const L2 = 2 * set.labCount;
  return {
    start,
    profile,
    parameters,
    notIdentified,
    rows: { lab: set.labCount, labTurnAveraged: set.labTurnAveragedCount, tracked: set.trackedCount },
    rms: {
      labBeforeN: rmsOf(predictedBefore, set.measured, 0, L2),
      labAfterN: rmsOf(predictedAfter, set.measured, 0, L2),
      trackedBeforeM: rmsOf(predictedBefore, set.measured, L2, m),
      trackedAfterM: rmsOf(predictedAfter, set.measured, L2, m),
    },
    measured: set.measured,
    predictedBefore,
    predictedAfter,
    sigmaN,
    sigmaM,
    method: {
      search,
      iterations,
      evaluations,
      converged,
      stopReason,
      residualVariance: s2,
      degreesOfFreedom: dof,
      relativeSingularValues: gn.relativeSingularValues,
      correlation,
    },
  };
}

/**
 * 1-sigma of each unknown of a search problem at x from the central-difference Jacobian
 * of its residuals (variable projection's: the scale profiled out), s^2 = |r|^2 / dof,
 * on the directions the data see; NaN for an unknown on a direction they do not.
 */
function searchSigmas(problem: LeastSquaresProblem, x: Float64Array, r: Float64Array): number[] {
  const n = problem.size;
  const m = problem.residualCount;
  const { jacobian } = finiteDifferenceJacobian(problem, x, r, true);
  const gn = gaussNewtonCovariance(jacobian, r, m, n, { columnScales: problem.step, nullRelative: NULL_RELATIVE, nullLoading: NULL_LOADING });
  const unseen = new Set(gn.nullDirections.flatMap((d) => d.members));
  return Array.from({ length: n }, (_, j) => (unseen.has(j) ? NaN : Math.sqrt(gn.covariance[n * j + j])));
}

/** The values of a profile as a plain record (for writing a profile file). */
export function profileParameters(values: SeamModelValues): Record<SeamModelParameterName, number> {
  return Object.fromEntries(SEAM_MODEL_PARAMETERS.map((p) => [p.name, values[p.name]])) as Record<SeamModelParameterName, number>;
}

