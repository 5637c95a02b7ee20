/**
 * Drag coefficient models, selectable by name. Drag force F_D = 1/2 rho A C_D v^2
 * against the velocity, A = pi R^2.
 *
 * "constant": a fixed C_D chosen by the user (default 0.35).
 *
 * "giordano": N. J. Giordano & H. Nakanishi, Computational Physics, 2nd ed.
 *   (Pearson 2006), chapter 2, the baseball example (chapter from memory), give the drag on a baseball as an acceleration
 *   -(B2/m) v |v| with
 *       B2/m = 0.0039 + 0.0058 / (1 + exp((v - 35 m/s) / 5 m/s))   per metre.
 *   B2/m already contains rho/m for sea-level air and one particular ball. We
 *   turn it into a coefficient once, at a reference state (1976 sea-level density
 *   1.225 kg/m^3 and the Nathan 2008 ball, 0.145 kg, 0.0364 m; the book does not
 *   state its density, sea level is our assumption):
 *       C_D(v) = 2 m_ref (B2/m)(v) / (rho_ref A_ref)
 *   so the model scales with the actual air density and ball. This gives C_D about
 *   0.55 at low speed, 0.39 at 35 m/s and 0.31 at 40 m/s. The speed dependence
 *   stands in for the drag crisis; it is a function of speed, not of Reynolds
 *   number, so it does not move with viscosity.
 */
import { assertInRange, assertNonNegative } from "../../geometry/check.js";
import { SEA_LEVEL_DENSITY_KG_M3 } from "./atmosphere.js";
import { crossSectionM2 } from "../../geometry/ball.js";

export const DRAG_MODEL_NAMES = ["constant", "giordano"] as const;
export type DragModelName = (typeof DRAG_MODEL_NAMES)[number];

/** A drag model: by name, with its parameter where it has one. */
export type DragModel = { readonly name: "constant"; readonly dragCoefficient?: number } | { readonly name: "giordano" };

/** Default C_D of the "constant" model, dimensionless. */
export const DEFAULT_CONSTANT_DRAG_COEFFICIENT = 0.35;
/** Accepted C_D range for the "constant" model (0 switches drag off). */
export const DRAG_COEFFICIENT_MAX = 2;
/** Default drag model. */
export const DEFAULT_DRAG_MODEL: DragModel = { name: "giordano" };

/** Giordano & Nakanishi B2/m, 1/m, at speed `speedMPerS` (m/s). */
export function giordanoB2PerMass(speedMPerS: number): number {
  return 0.0039 + 0.0058 / (1 + Math.exp((speedMPerS - 35) / 5));
}

/**
 * The reference ball of the conversion below (Nathan 2008: 0.145 kg, 0.0364 m): the
 * ball the fit's B2/m is read for, not the tool's ball (geometry/ball.ts), which
 * then feels C_D through its own area and mass.
 */
const GIORDANO_REFERENCE_MASS_KG = 0.145;
const GIORDANO_REFERENCE_RADIUS_M = 0.0364;

/** 2 m_ref / (rho_ref A_ref), m: converts B2/m (1/m) into C_D at the reference state. */
const GIORDANO_CD_PER_B2M = (2 * GIORDANO_REFERENCE_MASS_KG) / (SEA_LEVEL_DENSITY_KG_M3 * crossSectionM2(GIORDANO_REFERENCE_RADIUS_M));

/**
 * Parses a drag model name (as typed on a command line).
 * @throws RangeError for a name that is not one of DRAG_MODEL_NAMES.
 */
export function parseDragModelName(name: string): DragModelName {
  if ((DRAG_MODEL_NAMES as readonly string[]).includes(name)) return name as DragModelName;
  throw new RangeError(`drag model "${name}" must be one of: ${DRAG_MODEL_NAMES.join(", ")}`);
}

/** Throws RangeError for an unknown model or a constant C_D outside 0 to 2. */
function assertDragModel(model: DragModel): void {
  parseDragModelName(model.name);
  if (model.name === "constant" && model.dragCoefficient !== undefined) {
    assertInRange("drag coefficient", model.dragCoefficient, 0, DRAG_COEFFICIENT_MAX, "(dimensionless)");
  }
}

/**
 * Returns the model's C_D as a function of speed (m/s), for use inside the
 * integrator (validated once here, not per call).
 * @throws RangeError for an invalid model.
 */
export function dragCoefficientFunction(model: DragModel): (speedMPerS: number) => number {
  assertDragModel(model);
  if (model.name === "constant") {
    const cd = model.dragCoefficient ?? DEFAULT_CONSTANT_DRAG_COEFFICIENT;
    return () => cd;
  }
  return (v) => GIORDANO_CD_PER_B2M * giordanoB2PerMass(v);
}

/**
 * Drag coefficient C_D of `model` at a flight speed.
 *
 * @param model drag model (see DragModel).
 * @param speedMPerS flight speed, m/s, >= 0.
 * @returns C_D, dimensionless.
 * @throws RangeError for an invalid model or a negative / non-finite speed.
 */
export function dragCoefficient(model: DragModel, speedMPerS: number): number {
  assertNonNegative("speed", speedMPerS, "m/s");
  return dragCoefficientFunction(model)(speedMPerS);
}
