/**
 * The force job: the one seam-force model's instantaneous side force through one
 * turn of the ball about its spin axis, and its turn average, for a seam orientation
 * (ball-frame axis), a gyro angle, a speed and the air. Newtons from the coefficient
 * by F = 1/2 rho pi R^2 v^2 C (the tool's ball, geometry/ball.ts).
 */
import { BALL_RADIUS_M } from "../../geometry/ball.js";
import { DEG, M_PER_S_PER_MPH, RAD_PER_S_PER_RPM } from "../../geometry/units.js";
import { unit3, type Vec3 } from "../../geometry/vec.js";
import { airState, spinFactor, type AirState } from "../physics/air.js";
import { sawickiLiftCoefficient } from "../physics/lift.js";
import { seamForceNewtons } from "../physics/seamModel/newtons.js";
import type { SeamModel } from "../physics/seamModel/model.js";
import { forceTimeline, turnAverage, type ForceTimeline, type TurnAverage } from "../physics/seamModel/turn.js";
import { SPEED_RANGE_MPH, SPIN_RANGE_RPM } from "../screening/pitch.js";
import { buildModel, modelChoice } from "./request/model.js";
import { airConditions, samplerSettings } from "./request/settings.js";
import { parseAxis, parseDegrees, parseInRange, type ParsedAxis, type Request } from "./request/values.js";
import { InputError } from "../io/errors.js";

/** Phases in the timeline (one per degree). */
export const FORCE_TIMELINE_PHASES = 360;

export interface ForceJob {
  readonly axis: ParsedAxis;
  readonly axisBall: Vec3;
  readonly gyroRad: number;
  readonly speedMph: number;
  readonly spinRpm: number;
  readonly air: AirState;
  readonly model: SeamModel;
}

export interface ForceResult {
  readonly job: ForceJob;
  /** 1/2 rho pi R^2 v^2, N: newtons per unit coefficient. */
  readonly dynamicForceN: number;
  readonly timeline: ForceTimeline;
  readonly turnAverage: TurnAverage;
  /** The Magnus force at this spin and speed (Sawicki, Hubbard & Stronge 2003 lift), N, for scale. */
  readonly magnusN: number;
}

export function parseForce(request: Request): ForceJob {
  const choice = modelChoice(request);
  const sampler = samplerSettings(request, choice.profile);
  if (request.axis === undefined) throw new InputError(`--axis is missing; expected X,Y,Z, a landmark name such as waist-A, or 12.5N,45E`);
  const axis = parseAxis("axis", request.axis, sampler.seamShape);
  return {
    axis,
    axisBall: unit3(axis.vector),
    gyroRad: parseDegrees("gyro", request.gyro ?? "0", -90, 90),
    speedMph: parseInRange("speed", request.speed ?? "65", SPEED_RANGE_MPH[0], SPEED_RANGE_MPH[1], "mph"),
    spinRpm: parseInRange("spin", request.spin ?? "0", SPIN_RANGE_RPM[0], SPIN_RANGE_RPM[1], "rpm"),
    air: airState(airConditions(request)),
    model: buildModel(choice.profile, sampler.seamShape),
  };
}

export function runForce(job: ForceJob): ForceResult {
  const speed = job.speedMph * M_PER_S_PER_MPH;
  const dynamicForceN = seamForceNewtons(1, job.air.densityKgM3, BALL_RADIUS_M, speed);
  const timeline = forceTimeline(job.model, job.axisBall, job.gyroRad, FORCE_TIMELINE_PHASES);
  const average = turnAverage(job.model, job.axisBall, job.gyroRad);
  // lift acts on the spin across the flight: cos(gyro) of it
  const s = spinFactor(BALL_RADIUS_M, job.spinRpm * RAD_PER_S_PER_RPM * Math.cos(job.gyroRad), speed);
  const magnusN = job.spinRpm > 0 ? sawickiLiftCoefficient(s) * dynamicForceN : 0;
  return { job, dynamicForceN, timeline, turnAverage: { across: average.across, alongMagnus: average.alongMagnus }, magnusN };
}

/** Degrees of a separation angle. */
export const toDeg = (rad: number) => rad / DEG;
