/**
 * The seam movement one unit of seam-force coefficient gives a tracked pitch, in the
 * trade's reading (tradeMovement.ts: a constant-acceleration fit over the window from
 * 50 ft, or the start given, to the front of the plate), toward the arm side and up.
 *
 * It is src/physics/pitchFlight.ts's unitSeamMovement (the pitch aimed at the middle
 * of the zone from the default release point, flown without Magnus with a constant
 * seam coefficient along a and along m, read by central differences at
 * +-UNIT_PROBE_COEFFICIENT; tests/physics/calibrate.test.ts: within 1 % of a flight at
 * (0.06, -0.04)) read toward the arm side. J depends on the pitch (speed, spin, tilt,
 * gyro, hand) and the air, not on the model's parameters.
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
  const { across, alongMagnus } = unitSeamMovement(pitch, model, options);
  const a = tradeArmSide(across, pitch.hand);
  const m = tradeArmSide(alongMagnus, pitch.hand);
  return { acrossArmSideM: a.armSideM, acrossUpM: a.verticalM, alongMagnusArmSideM: m.armSideM, alongMagnusUpM: m.verticalM };
}
