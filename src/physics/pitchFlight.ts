/**
 * A screened pitch in flight: from the pitch description and a spin-axis position
 * on the ball to the plate, with air, drag, Magnus and the one seam-force model
 * (src/physics/seamModel/).
 *
 * Field frame (geometry/frames.ts; origin at the rear point of home plate, see
 * field.ts). Launch angles: given, or solved so that the full flight crosses the
 * front of the plate at the middle of a typical zone (x = 0, z = 2.5 ft: common
 * practice, no source) by a damped Newton iteration.
 *
 * Movement is reported two ways (tradeMovementParts.ts):
 *   trade        the trade's reading: a constant-acceleration fit over a window
 *                ending at the plate (default from 50 ft), gravity removed, drag's
 *                own deflection left in; the Magnus and seam parts are differences
 *                of fits of flights with and without each force;
 *   fromRelease  the plate crossing against the spinless flight of the same launch
 *                (gravity and drag only), split the same way.
 *
 * The seam force: the ball turns at its spin rate during the flight. When it makes
 * at least TURN_AVERAGE_MIN_TURNS turns before the plate, the quasi-steady turn
 * average is used (the fast path: it equals the time-resolved flight averaged over
 * release phases); otherwise, or when a release phase is given, the instantaneous
 * force at the ball's phase (time-resolved). `seamSpread` gives the seam part's range
 * over release phases.
 */
import { BALL_RADIUS_M } from "../../geometry/ball.js";
import { spinAxisFromTilt, toArmSide, TOWARD_PLATE } from "../../geometry/frames.js";
import { M_PER_FT } from "../../geometry/units.js";
import type { Vec3 } from "../../geometry/vec.js";
import type { Pitch } from "../screening/pitch.js";
import { airState, reynoldsNumber, spinFactor, type AirConditions, type AirState } from "./air.js";
import type { DragModel } from "./drag.js";
import { simulateFlight, type FlightOptions, type FlightResult, type Launch } from "./flight.js";
import { releasePosition, releaseVelocity, type ReleasePoint } from "./launch.js";
import { seamHookTimeResolved, seamHookTurnAverage } from "./seamModel/hooks.js";
import type { SeamModel } from "./seamModel/model.js";
import { turnAverage, type TurnAverage } from "./seamModel/turn.js";
import type { SeamForceHook } from "./forces.js";
import { TRADE_WINDOW_START_M, tradeMovement, type TradeBreak, type TradeMovement } from "./tradeMovement.js";
import { tradeMovementParts, type TradeMovementParts } from "./tradeMovementParts.js";
import { recordFlight } from "./trajectory.js";

/** Where an aimed pitch crosses the front of the plate: the middle of a typical zone, m. */
export const ZONE_CENTRE_M: readonly [number, number] = [0, 2.5 * M_PER_FT];
const AIM_MAX_ITERATIONS = 12;
/** Aim tolerance at the plate, m. */
const AIM_TOLERANCE_M = 1e-5;
const AIM_PROBE_RAD = 1e-4;
/** At least this many turns before the plate: the turn-averaged seam force (see the header). */
const TURN_AVERAGE_MIN_TURNS = 8;
/** Release phases sampled for the seam part's spread. */
const SPREAD_PHASES = 24;

export interface PitchFlightInput {
  readonly pitch: Pitch;
  /** Spin axis in the ball frame (unit). */
  readonly axisBall: Readonly<Vec3>;
  /** The seam-force model (src/physics/seamModel). */
  readonly model: SeamModel;
  /** Air conditions; standard atmosphere at sea level when empty. */
  readonly air?: AirConditions;
  /** No air at all (a vacuum check). */
  readonly vacuum?: boolean;
  readonly release?: Omit<ReleasePoint, "hand">;
  /** Launch angles, rad; when absent the pitch is aimed at ZONE_CENTRE_M. */
  readonly launch?: { readonly verticalRad: number; readonly horizontalRad: number };
  /** Drag model (drag.ts); default the Giordano-Nakanishi fit. */
  readonly drag?: DragModel;
  /** Exponential spin decay time constant, s; default none. */
  readonly spinDecayTimeConstantS?: number;
  /** Release phase, rad (geometry/flow.ts): forces the time-resolved seam force at this phase. */
  readonly phaseRad?: number;
  /** y where the trade's window starts, m; default 50 ft. */
  readonly windowStartM?: number;
  /** Also compute the seam part's spread over release phases. */
  readonly spread?: boolean;
  /** Also record the full flight's trajectory. */
  readonly trajectory?: boolean;
}

/** A seam part's range over release phases, m (trade basis). */
export interface SeamSpread {
  readonly phases: number;
  readonly horizontalBreakM: { readonly min: number; readonly p10: number; readonly p90: number; readonly max: number };
  readonly inducedVerticalBreakM: { readonly min: number; readonly p10: number; readonly p90: number; readonly max: number };
}

export interface PitchFlight {
  readonly air: AirState;
  readonly reynolds: number;
  readonly spinFactor: number;
  readonly launch: Launch;
  readonly launchAngles: { readonly verticalRad: number; readonly horizontalRad: number };
  /** The model's turn-averaged coefficient for the release orientation. */
  readonly seamCoefficient: TurnAverage;
  /** How the seam force was applied. */
  readonly seamMode: "turn-average" | "time-resolved";
  readonly phaseRad?: number;
  /** Turns the ball makes before the plate. */
  readonly turns: number;
  readonly windowStartM: number;
  /** The trade's reading of the movement, with the parts. */
  readonly trade: TradeMovementParts;
  /** Plate-crossing offsets against the spinless flight, m (x toward the catcher's right, z up). */
  readonly fromRelease: { readonly breakM: PlateOffset; readonly magnusM: PlateOffset; readonly seamM: PlateOffset; readonly interactionM: PlateOffset };
  readonly seamSpread?: SeamSpread;
  /** The full flight at the plate. */
  readonly flight: FlightResult;
  readonly trajectory?: { readonly tS: ArrayLike<number>; readonly xM: ArrayLike<number>; readonly yM: ArrayLike<number>; readonly zM: ArrayLike<number> };
}

export interface PlateOffset {
  readonly xM: number;
  readonly zM: number;
}

/** The pitch's spin vector in the field frame, rad/s. */
export function spinVector(pitch: Pitch): Vec3 {
  const w = spinAxisFromTilt(pitch.tiltRad, pitch.gyroRad, pitch.view, TOWARD_PLATE);
  return [w[0] * pitch.spinRadPerS, w[1] * pitch.spinRadPerS, w[2] * pitch.spinRadPerS];
}

/** Launch angles that put `options`' flight through `target` (x, z) at the plate. */
export function aimLaunch(
  position: Readonly<Vec3>,
  speedMPerS: number,
  spin: Readonly<Vec3>,
  options: FlightOptions,
  target: readonly [number, number] = ZONE_CENTRE_M,
): { verticalRad: number; horizontalRad: number } {
  // first guess: the straight line to the target, plus gravity's drop over the flight
  const dy = position[1];
  let v = Math.atan2(target[1] - position[2], dy) + (9.80665 * dy) / (2 * speedMPerS * speedMPerS);
  let h = Math.atan2(target[0] - position[0], dy);
  const miss = (vr: number, hr: number): [number, number] => {
    const f = simulateFlight({ releasePositionM: position, releaseVelocityMPerS: releaseVelocity(speedMPerS, vr, hr), spinRadPerS: spin }, { ...options, trajectory: undefined });
    return [f.plateCrossingM[0] - target[0], f.plateCrossingM[2] - target[1]];
  };
  for (let it = 0; it < AIM_MAX_ITERATIONS; it++) {
    const [ex, ez] = miss(v, h);
    if (Math.hypot(ex, ez) < AIM_TOLERANCE_M) return { verticalRad: v, horizontalRad: h };
    const [exv, ezv] = miss(v + AIM_PROBE_RAD, h);
    const [exh, ezh] = miss(v, h + AIM_PROBE_RAD);
    // Jacobian of (ex, ez) in (v, h), by forward differences
    const a = (exv - ex) / AIM_PROBE_RAD, b = (exh - ex) / AIM_PROBE_RAD;
    const c = (ezv - ez) / AIM_PROBE_RAD, d = (ezh - ez) / AIM_PROBE_RAD;
    const det = a * d - b * c;
    if (!(Math.abs(det) > 1e-12)) break;
    v -= (d * ex - b * ez) / det;
    h -= (-c * ex + a * ez) / det;
  }
  const [ex, ez] = miss(v, h);
  if (!(Math.hypot(ex, ez) < 1e-3)) throw new RangeError(`could not aim the pitch at the zone: it misses by ${Math.hypot(ex, ez).toFixed(3)} m after ${AIM_MAX_ITERATIONS} steps`);
  return { verticalRad: v, horizontalRad: h };
}

/** Turns a ball spinning at `spinRadPerS` makes in `timeS` (with exponential decay tau, s). */
function turnsIn(spinRadPerS: number, timeS: number, tauS = Infinity): number {
  const phase = tauS === Infinity ? spinRadPerS * timeS : -spinRadPerS * tauS * Math.expm1(-timeS / tauS);
  return phase / (2 * Math.PI);
}

/** The release (position, velocity, spin) of a pitch, aimed at the zone unless angles are given. */
export function pitchLaunch(input: Pick<PitchFlightInput, "pitch" | "release" | "launch">, options: FlightOptions): { launch: Launch; angles: { verticalRad: number; horizontalRad: number } } {
  const { pitch } = input;
  const spin = spinVector(pitch);
  const position = releasePosition({ ...input.release, hand: pitch.hand });
  const angles = input.launch ?? aimLaunch(position, pitch.speedMPerS, spin, options);
  return {
    launch: { releasePositionM: position, releaseVelocityMPerS: releaseVelocity(pitch.speedMPerS, angles.verticalRad, angles.horizontalRad), spinRadPerS: spin },
    angles,
  };
}

function plateOffset(a: FlightResult, b: FlightResult): PlateOffset {
  return { xM: a.plateCrossingM[0] - b.plateCrossingM[0], zM: a.plateCrossingM[2] - b.plateCrossingM[2] };
}

function percentiles(values: number[]): { min: number; p10: number; p90: number; max: number } {
  const v = [...values].sort((a, b) => a - b);
  const at = (q: number) => {
    const r = q * (v.length - 1);
    const lo = Math.floor(r);
    return lo + 1 < v.length ? v[lo] + (r - lo) * (v[lo + 1] - v[lo]) : v[lo];
  };
  return { min: v[0], p10: at(0.1), p90: at(0.9), max: v[v.length - 1] };
}

/** Flies a pitch with the seam orientation `axisBall`. */
export function flyPitch(input: PitchFlightInput): PitchFlight {
  const { pitch, model } = input;
  const air = airState(input.air ?? {});
  const coefficient = turnAverage(model, input.axisBall, pitch.gyroRad);
  const base: FlightOptions = {
    air,
    vacuum: input.vacuum ?? false,
    ...(input.drag ? { drag: input.drag } : {}),
    ...(input.spinDecayTimeConstantS !== undefined ? { spinDecayTimeConstantS: input.spinDecayTimeConstantS } : {}),
  };
  const tau = input.spinDecayTimeConstantS ?? Infinity;
  const averaged = seamHookTurnAverage(model, input.axisBall, pitch.gyroRad, coefficient);
  // aim with the turn-averaged force (the aim only sets the launch; the phase changes the path a little)
  const { launch, angles } = pitchLaunch(input, { ...base, seamForce: averaged });
  const timeToPlate = simulateFlight(launch, { ...base, seamForce: averaged }).timeToPlateS;
  const turns = turnsIn(pitch.spinRadPerS, timeToPlate, tau);
  const resolved = (phaseRad: number): SeamForceHook =>
    seamHookTimeResolved(model, input.axisBall, pitch.gyroRad, { phaseRad, spinRadPerS: pitch.spinRadPerS, spinDecayTimeConstantS: tau });
  const timeResolved = input.phaseRad !== undefined || turns < TURN_AVERAGE_MIN_TURNS;
  const hook = timeResolved ? resolved(input.phaseRad ?? 0) : averaged;
  const options: FlightOptions = { ...base, seamForce: hook };
  const windowStartM = input.windowStartM ?? TRADE_WINDOW_START_M;
  const trade = tradeMovementParts(launch, options, { windowStartM });
  const f = trade.flights;
  const breakM = plateOffset(f.full, f.spinless);
  const magnusM = plateOffset(f.magnusOnly, f.spinless);
  const seamM = plateOffset(f.seamOnly, f.spinless);
  let seamSpread: SeamSpread | undefined;
  if (input.spread) {
    const spinless = recordFlight(launch, { ...base, magnus: false });
    const fit = { windowStartM, ...(options.plateYM !== undefined ? { plateYM: options.plateYM } : {}) };
    const baseFit = tradeMovement(spinless.samples, fit);
    const hx: number[] = [];
    const hz: number[] = [];
    for (let j = 0; j < SPREAD_PHASES; j++) {
      const seamOnly = recordFlight(launch, { ...base, magnus: false, seamForce: resolved((2 * Math.PI * j) / SPREAD_PHASES) });
      const t = tradeMovement(seamOnly.samples, fit);
      hx.push(t.horizontalBreakM - baseFit.horizontalBreakM);
      hz.push(t.inducedVerticalBreakM - baseFit.inducedVerticalBreakM);
    }
    seamSpread = { phases: SPREAD_PHASES, horizontalBreakM: percentiles(hx), inducedVerticalBreakM: percentiles(hz) };
  }
  const trajectory = input.trajectory ? recordFlight(launch, options).samples : undefined;
  return {
    air,
    reynolds: reynoldsNumber(pitch.speedMPerS, 2 * BALL_RADIUS_M, air.densityKgM3, air.viscosityPaS),
    spinFactor: spinFactor(BALL_RADIUS_M, pitch.spinRadPerS, pitch.speedMPerS),
    launch,
    launchAngles: angles,
    seamCoefficient: { across: coefficient.across, alongMagnus: coefficient.alongMagnus },
    seamMode: timeResolved ? "time-resolved" : "turn-average",
    ...(timeResolved ? { phaseRad: input.phaseRad ?? 0 } : {}),
    turns,
    windowStartM,
    trade,
    fromRelease: {
      breakM,
      magnusM,
      seamM,
      interactionM: { xM: breakM.xM - magnusM.xM - seamM.xM, zM: breakM.zM - magnusM.zM - seamM.zM },
    },
    ...(seamSpread ? { seamSpread } : {}),
    flight: f.full,
    ...(trajectory ? { trajectory } : {}),
  };
}

/** A trade break as arm-side and vertical components for a hand, m. */
export function tradeArmSide(b: TradeBreak, hand: Pitch["hand"]): { armSideM: number; verticalM: number } {
  return { armSideM: toArmSide(b.horizontalBreakM, b.inducedVerticalBreakM, hand).armSideM, verticalM: b.inducedVerticalBreakM };
}

/** The coefficient of the probe flights that measure the seam movement per unit coefficient (central differences). */
const UNIT_PROBE_COEFFICIENT = 0.05;

/**
 * Seam movement per unit coefficient for a pitch (trade basis, m): the slope of the
 * seam part of the flight in a constant coefficient along a, and along m, by central
 * differences at +-UNIT_PROBE_COEFFICIENT (a realistic size: a whole unit would be a
 * force of several newtons and bend the path, 10-15 % off linear). The seam force is
 * small beside gravity and drag, so the seam part is close to linear in the
 * coefficient: S(c) ~ c_a J_a + c_m J_m (the screen's map uses this; the listed grips
 * are flown in full).
 */
export function unitSeamMovement(
  pitch: Pitch,
  model: SeamModel,
  options: { air?: AirConditions; windowStartM?: number; release?: Omit<ReleasePoint, "hand">; drag?: DragModel } = {},
): { across: TradeBreak; alongMagnus: TradeBreak; launch: Launch } {
  const air = airState(options.air ?? {});
  const base: FlightOptions = { air, ...(options.drag ? { drag: options.drag } : {}) };
  const { launch } = pitchLaunch({ pitch, release: options.release }, base);
  const fit = { windowStartM: options.windowStartM ?? TRADE_WINDOW_START_M };
  const seamPart = (across: number, alongMagnus: number): TradeMovement => {
    const hook = seamHookTurnAverage(model, [0, 0, 1], pitch.gyroRad, { across, alongMagnus });
    return tradeMovement(recordFlight(launch, { ...base, magnus: false, seamForce: hook }).samples, fit);
  };
  const d = UNIT_PROBE_COEFFICIENT;
  const slope = (plus: TradeMovement, minus: TradeMovement): TradeBreak => ({
    horizontalBreakM: (plus.horizontalBreakM - minus.horizontalBreakM) / (2 * d),
    inducedVerticalBreakM: (plus.inducedVerticalBreakM - minus.inducedVerticalBreakM) / (2 * d),
  });
  return { across: slope(seamPart(d, 0), seamPart(-d, 0)), alongMagnus: slope(seamPart(0, d), seamPart(0, -d)), launch };
}
