/**
 * Lift (Magnus) coefficient models, selectable by name. Lift force
 * F_L = 1/2 rho A C_L v^2 along omega x v, where only the spin component
 * perpendicular to the velocity counts: S = R |omega_perp| / v.
 *
 * "sawicki": G. S. Sawicki, M. Hubbard & W. J. Stronge, "How to hit home runs:
 *   Optimum baseball bat swing parameters for maximum range trajectories",
 *   Am. J. Phys. 71(11), 1152-1162 (2003), their bilinear fit (from memory):
 *       C_L = 1.5 S            for S < 0.1
 *       C_L = 0.09 + 0.6 S     for S >= 0.1
 *   continuous at S = 0.1 (C_L = 0.15). Nathan 2008 measured C_L for S from
 *   about 0.09 to 0.6; the fit is an extrapolation outside that.
 */
import { assertNonNegative } from "../../geometry/check.js";

const LIFT_MODEL_NAMES = ["sawicki"] as const;
export type LiftModelName = (typeof LIFT_MODEL_NAMES)[number];

/** A lift model, by name. */
export type LiftModel = { readonly name: "sawicki" };

/** Default lift model. */
export const DEFAULT_LIFT_MODEL: LiftModel = { name: "sawicki" };

/** Sawicki, Hubbard & Stronge (2003) C_L at spin factor `s` (dimensionless, >= 0). */
export function sawickiLiftCoefficient(s: number): number {
  return s < 0.1 ? 1.5 * s : 0.09 + 0.6 * s;
}

/**
 * Parses a lift model name.
 * @throws RangeError for a name that is not one of LIFT_MODEL_NAMES.
 */
export function parseLiftModelName(name: string): LiftModelName {
  if ((LIFT_MODEL_NAMES as readonly string[]).includes(name)) return name as LiftModelName;
  throw new RangeError(`lift model "${name}" must be one of: ${LIFT_MODEL_NAMES.join(", ")}`);
}

/**
 * Returns the model's C_L as a function of spin factor S (dimensionless), for
 * use inside the integrator.
 * @throws RangeError for an unknown model.
 */
export function liftCoefficientFunction(model: LiftModel): (spinFactor: number) => number {
  parseLiftModelName(model.name);
  return sawickiLiftCoefficient;
}

/**
 * Lift coefficient C_L of `model` at a spin factor.
 *
 * @param model lift model (see LiftModel).
 * @param spinFactor S = R |omega_perp| / v, dimensionless, >= 0.
 * @returns C_L, dimensionless.
 * @throws RangeError for an unknown model or a negative / non-finite S.
 */
export function liftCoefficient(model: LiftModel, spinFactor: number): number {
  assertNonNegative("spin factor", spinFactor, "(dimensionless)");
  return liftCoefficientFunction(model)(spinFactor);
}
