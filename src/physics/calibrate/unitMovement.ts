/**
 * The seam movement one unit of seam-force coefficient gives a tracked pitch, in the
 * trade's reading (tradeMovement.ts: a constant-acceleration fit over the window from
 * 50 ft, or the start given, to the front of the plate), toward the arm side and up.
 *
 * As src/physics/pitchFlight.ts's unitSeamMovement: the pitch is aimed at the middle of
 * the zone from the default release point with drag and Magnus, then flown without
 * Magnus with a constant seam coefficient along a and along m, and the spinless flight's
 * reading is taken off. Unlike it, the coefficient flown is a probe of realistic size,
 * +-PROBE_COEFFICIENT, and J = (S(+c) - S(-c)) / 2c: a whole unit of coefficient is a
 * force of several newtons, three times the ball's weight, whose path bends far enough
 * to make S 10-15 % off linear at the coefficients a seam gives (0.01-0.1); the central
 * probe cancels the even orders, and the odd ones are small at that size
 * (tests/physics/calibrate.test.ts: within 1 % at (0.06, -0.04)). J depends on the
 * pitch (speed, spin, tilt, gyro, hand) and the air, not on the model's parameters.
 */
import type { Pitch } from "../../screening/pitch.js";
import { airState, type AirConditions } from "../air.js";
import type { FlightOptions } from "../flight.js";
import { pitchLaunch, tradeArmSide } from "../pitchFlight.js";
import { seamHookTurnAverage } from "../seamModel/hooks.js";
import type { SeamModel } from "../seamModel/model.js";
import { TRADE_WINDOW_START_M, tradeMovement } from "../tradeMovement.js";
import { recordFlight } from "../trajectory.js";
import type { UnitMovement } from "./observations.js";

/** The coefficient flown to read J, dimensionless: the size of a strong seam effect. */
export const PROBE_COEFFICIENT = 0.05;

/**
 * J_a and J_m of the header for a pitch, m per unit coefficient.
 * @param model any seam model (only its flight hook's plumbing is used; the coefficient is given).
 * @param options air (default standard sea level) and the trade window's start, m from the
 *   rear point of home plate (default 50 ft).
 * @throws RangeError when the pitch cannot be aimed at the zone.
 */
export function unitSeamMovementArmSide(pitch: Pitch, model: SeamModel, options: { air?: AirConditions; windowStartM?: number } = {}): UnitMovement {
  const air = airState(options.air ?? {});
  const base: FlightOptions = { air };
  const { launch } = pitchLaunch({ pitch }, base);
  const fit = { windowStartM: options.windowStartM ?? TRADE_WINDOW_START_M };
  const seamOnly = (across: number, alongMagnus: number) => {
    const hook = seamHookTurnAverage(model, [0, 0, 1], pitch.gyroRad, { across, alongMagnus });
    return tradeMovement(recordFlight(launch, { ...base, magnus: false, seamForce: hook }).samples, fit);
  };
  const c = PROBE_COEFFICIENT;
  const slope = (across: number, alongMagnus: number) => {
    const plus = seamOnly(across * c, alongMagnus * c);
    const minus = seamOnly(-across * c, -alongMagnus * c);
    return tradeArmSide(
      { horizontalBreakM: (plus.horizontalBreakM - minus.horizontalBreakM) / (2 * c), inducedVerticalBreakM: (plus.inducedVerticalBreakM - minus.inducedVerticalBreakM) / (2 * c) },
      pitch.hand,
    );
  };
  const a = slope(1, 0);
  const m = slope(0, 1);
  return { acrossArmSideM: a.armSideM, acrossUpM: a.verticalM, alongMagnusArmSideM: m.armSideM, alongMagnusUpM: m.verticalM };
}
