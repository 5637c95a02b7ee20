/**
 * Calibrating the seam-force model to a lab's measurements and tracked pitches. One
 * entry module, each public export named.
 *
 * observations.ts  lab and tracked rows, compiled; the model's predictions of them
 * unitMovement.ts  a tracked pitch's seam movement per unit coefficient (trade reading)
 * fit.ts           the fit: variable projection on scale, bounded Levenberg-Marquardt,
 *                  Gauss-Newton covariance, what the data cannot pin down
 * leastSquares.ts  bounded Levenberg-Marquardt with constraints beyond the box
 * covariance.ts    Gauss-Newton covariance s^2 (J^T J)^-1 with rank decisions
 * linearAlgebra.ts Cholesky solve, one-sided Jacobi SVD
 * limits.ts        the model's cross-parameter checks as named margins
 * synthetic.ts     noisy lab rows from a planted profile (tests, benchmark)
 *
 *   const result = calibrateSeamModel({ start: defaultProfile(), fit: ["scale", "laminarSeparationDeg"], lab });
 *   result.parameters; result.notIdentified; result.profile; // a profile for seamModel()
 */
export {
  calibratableNames,
  calibrateSeamModel,
  checkFitNames,
  DEFAULT_SIGMA_M,
  DEFAULT_SIGMA_N,
  profileParameters,
} from "./fit.js";
export type { CalibratedParameter, CalibrationOptions, CalibrationResult, NotIdentified } from "./fit.js";
export { compileObservations, predict } from "./observations.js";
export type { LabObservation, ObservationSet, TrackedObservation, UnitMovement } from "./observations.js";
export { unitSeamMovementArmSide } from "./unitMovement.js";
export { boundedLevenbergMarquardt, finiteDifferenceJacobian } from "./leastSquares.js";
export type { LeastSquaresOptions, LeastSquaresProblem, LeastSquaresResult, StopReason } from "./leastSquares.js";
export { gaussNewtonCovariance } from "./covariance.js";
export type { GaussNewtonCovariance, NullDirection } from "./covariance.js";
export { choleskySolve, singularValues } from "./linearAlgebra.js";
export { crossLimits } from "./limits.js";
export type { CrossLimit } from "./limits.js";
export { normalStream, syntheticLabRows } from "./synthetic.js";
export type { SyntheticLabOptions, SyntheticLabRow } from "./synthetic.js";
