/**
 * The seam model's cross-parameter checks (parameters.ts, checkCrossParameters) as
 * named margins, so a fit can say which one it ended against. A margin is in the unit
 * of its parameters (deg, or 1 for the wake pressure); a strict check holds when its
 * margin is above 0, a non-strict one when it is 0 or above. Feasibility itself is
 * always decided by checkCrossParameters (one rule); tests check that the two agree.
 */
import { DEG } from "../../../geometry/units.js";
import { attachedPressureCoefficient } from "../seamModel/pressure.js";
import { bandOf, type SeamModelParameterName, type SeamModelValues } from "../seamModel/parameters.js";

export interface CrossLimit {
  /** The check in words, e.g. "tripEndDeg <= laminarSeparationDeg". */
  readonly text: string;
  /** The parameters it ties. */
  readonly names: readonly SeamModelParameterName[];
  readonly strict: boolean;
  /** How far inside the check the values are (deg, or 1 for the wake pressure). */
  readonly margin: number;
}

/** The margins of every cross-parameter check at `v`. */
export function crossLimits(v: SeamModelValues): CrossLimit[] {
  const band = bandOf(v);
  const nearDeg = (band.centerRad - band.widthRad / 2) / DEG;
  const farDeg = (band.centerRad + band.widthRad / 2) / DEG;
  const lo = Math.min(v.laminarSeparationDeg, nearDeg) * DEG;
  const hi = Math.max(v.turbulentSeparationDeg, farDeg) * DEG;
  const cpMax = Math.max(attachedPressureCoefficient(lo, v.suctionFactor), attachedPressureCoefficient(hi, v.suctionFactor));
  return [
    { text: "tripStartDeg < tripEndDeg", names: ["tripStartDeg", "tripEndDeg"], strict: true, margin: v.tripEndDeg - v.tripStartDeg },
    { text: "tripEndDeg <= laminarSeparationDeg", names: ["tripEndDeg", "laminarSeparationDeg"], strict: false, margin: v.laminarSeparationDeg - v.tripEndDeg },
    { text: "tripEndDeg <= the fixation band's near edge (bandCenterDeg - bandWidthDeg / 2)", names: ["tripEndDeg", "bandCenterDeg", "bandWidthDeg"], strict: false, margin: nearDeg - v.tripEndDeg },
    { text: "laminarSeparationDeg < turbulentSeparationDeg", names: ["laminarSeparationDeg", "turbulentSeparationDeg"], strict: true, margin: v.turbulentSeparationDeg - v.laminarSeparationDeg },
    {
      text: "wakePressureCoefficient above the attached-flow Cp where separation can happen",
      names: ["wakePressureCoefficient", "suctionFactor", "laminarSeparationDeg", "turbulentSeparationDeg", "bandCenterDeg", "bandWidthDeg"],
      strict: true,
      margin: v.wakePressureCoefficient - cpMax,
    },
  ];
}
