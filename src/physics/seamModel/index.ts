/**
 * THE seam-force model: from the seams to newtons. One entry module, each public
 * export named.
 *
 * parameters.ts  the physical parameters (table, profiles, hash)
 * resolution.ts  seam points, azimuth bins, phases (separate from the physics)
 * pressure.ts    attached-flow pressure and the per-meridian integral G(theta_s)
 * azimuth.ts     meridians about the flow axis and the pseudo-angle that finds them
 * model.ts       seamModel(): a validated model with its tables (not reentrant)
 * instant.ts     THE RULE (trip and fixation) and the instantaneous coefficient
 * turn.ts        the timeline through a turn and the quasi-steady turn average
 * hooks.ts       flight hooks: turn-averaged and time-resolved
 * map.ts         the turn average over a sphere grid, one cell per symmetry orbit
 *
 * Frames: geometry/flow.ts (flow frame and phase), geometry/seamCurve.ts (ball frame),
 * geometry/frames.ts (field frame, in the hooks). Force in newtons:
 * F = 1/2 rho pi R^2 v^2 C (the coefficients already carry the profile's scale).
 *
 * How the defaults were chosen, the published checks' results, the convergence study
 * and speed figures: DEVELOPERS.md in this folder.
 *
 * For a calibration (lab rows of axis, gyro, phase, speed, spin, forces along m and a):
 * a row with a phase is instantAtPhase(model, axis, gyro, phase); a turn-averaged row is
 * turnAverage(model, axis, gyro); either times 1/2 rho pi R^2 v^2 gives newtons (the
 * model has no spin-rate or Reynolds-number dependence), and `scale` enters linearly.
 * Rebuilding the model per parameter vector costs about 0.035 ms (seam samples and
 * azimuth bins are shared; only the pressure table is rebuilt).
 */
export {
  SEAM_MODEL_PARAMETERS,
  SEAM_MODEL_PARAMETER_NAMES,
  bandOf,
  canonicalValuesJson,
  defaultProfile,
  defaultValues,
  profileHash,
  resolveProfile,
} from "./parameters.js";
export type { SeamModelParameter, SeamModelParameterName, SeamModelProfile, SeamModelValues } from "./parameters.js";
export { AZIMUTH_BINS_RANGE, DEFAULT_RESOLUTION, PHASES_RANGE, resolveResolution } from "./resolution.js";
export type { ResolvedResolution, SeamModelResolution } from "./resolution.js";
export { attachedPressureCoefficient, meridianPressureIntegral } from "./pressure.js";
export { seamModel } from "./model.js";
export type { SeamModel } from "./model.js";
export { emptyInstant, instantaneousCoefficient } from "./instant.js";
export type { InstantCoefficient } from "./instant.js";
export { forceTimeline, instantAtPhase, turnAverage } from "./turn.js";
export type { ForceTimeline, TurnAverage } from "./turn.js";
export { DEFAULT_HOOK_TIMELINE_PHASES, seamHookTimeResolved, seamHookTurnAverage } from "./hooks.js";
export type { TimeResolvedHookOptions } from "./hooks.js";
export { coefficientMap } from "./map.js";
export type { CoefficientMap } from "./map.js";
export { seamForceNewtons } from "./newtons.js";
