/**
 * The seam movement one unit of seam-force coefficient gives a tracked pitch, in the
 * trade's reading (tradeMovement.ts: a constant-acceleration fit over the window from
 * 50 ft, or the start given, to the front of the plate), toward the arm side and up.
 *
 * From src/physics/pitchFlight.ts's unitSeamMovement: the pitch is aimed at the middle
 * of the zone from the default release point with drag and Magnus, then flown without
 * Magnus with a constant seam coefficient (1, 0) along a and (0, 1) along m; each minus
 * the spinless flight's reading is J_a, J_m. They depend on the pitch (speed, spin,
 * tilt, gyro, hand) and the air, not on the seam model's parameters.
 */
import type { Pitch } from "../../screening/pitch.js";
import type { AirConditions } from "../air.js";
import { tradeArmSide, unitSeamMovement } from "../pitchFlight.js";
import type { SeamModel } from "../seamModel/model.js";
import type { UnitMovement } from "./observations.js";

/**
 * J_a and J_m of the header for a pitch, m per unit coefficient.
 * @param model any seam model (only its flight hook's plumbing is used; the coefficient is given).
 * @param options air (default standard sea level) and the trade window's start, m from the
 *   rear point of home plate (default 50 ft).
 * @throws RangeError when the pitch cannot be aimed at the zone.
 */
export function unitSeamMovementArmSide(pitch: Pitch, model: SeamModel, options: { air?: AirConditions; windowStartM?: number } = {}): UnitMovement {
  const j = unitSeamMovement(pitch, model, options);
  const a = tradeArmSide(j.across, pitch.hand);
  const m = tradeArmSide(j.alongMagnus, pitch.hand);
  return { acrossArmSideM: a.armSideM, acrossUpM: a.verticalM, alongMagnusArmSideM: m.armSideM, alongMagnusUpM: m.verticalM };
}
