/**
 * The flight job: a pitch with a seam orientation flown to the plate: plate
 * location, time, approach angles, and movement split into Magnus and seam parts.
 */
import { toArmSide, directionToClockAngle } from "../../geometry/frames.js";
import { angleToClock, formatClock } from "../../geometry/clock.js";
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { DEG, M_PER_IN, KELVIN_AT_0_C, PA_PER_HPA } from "../../geometry/units.js";
import { unit3, type Vec3 } from "../../geometry/vec.js";
import { InputError } from "../io/errors.js";
import type { AirConditions } from "../physics/air.js";
import type { DragModel } from "../physics/drag.js";
import { flyPitch, type PitchFlight } from "../physics/pitchFlight.js";
import { SEAM_FORCE_SCALE_RANGE } from "../physics/seamForce.js";
import { DEFAULT_TOP, screenPitch, TOP_RANGE } from "../screening/screen.js";
import type { PitchEcho } from "../screening/report.js";
import type { Pitch } from "../screening/pitch.js";
import { pitchesFromRequest } from "./request/pitch.js";
import { airConditions, dragModel, launchAngles, releasePoint, samplerSettings, spinDecay, type SamplerSettings } from "./request/settings.js";
import { oneOf, parseAxis, parseInRange, parseInteger, type Request } from "./request/values.js";

export interface FlightJob {
  readonly pitch: Pitch;
  readonly echo: PitchEcho;
  readonly source?: string;
  readonly sampler: SamplerSettings;
  /** How the orientation was given: an --axis text, "candidate N" or "four-seam reference". */
  readonly axisGiven: string;
  readonly axisRequest: { readonly kind: "axis"; readonly vector: Vec3 } | { readonly kind: "candidate"; readonly n: number } | { readonly kind: "reference"; readonly name: string };
  readonly airMode: "standard" | "none";
  readonly air: AirConditions;
  readonly release: { heightM: number; armSideM: number; extensionM: number };
  readonly launch?: { verticalRad: number; horizontalRad: number };
  readonly drag: DragModel;
  readonly spinDecayS?: number;
  readonly seamScale: number;
}

export interface FlightOutcome {
  readonly job: FlightJob;
  readonly axis: Vec3;
  readonly flight: PitchFlight;
}

export function parseFlight(request: Request): FlightJob {
  const sampler = samplerSettings(request);
  const { pitches, source } = pitchesFromRequest(request);
  if (pitches.length !== 1) throw new InputError(`flight takes one pitch; the file has ${pitches.length} (choose one with --pitch-name)`);
  const { pitch, echo } = pitches[0];
  const sources = ["axis", "candidate", "reference"].filter((k) => request[k] !== undefined);
  if (sources.length !== 1) throw new InputError(`give exactly one of --axis, --candidate N or --reference four-seam|two-seam`);
  let axisRequest: FlightJob["axisRequest"];
  let axisGiven: string;
  if (request.axis !== undefined) {
    const a = parseAxis("axis", request.axis, sampler.seamShape);
    axisRequest = { kind: "axis", vector: unit3(a.vector) };
    axisGiven = a.given;
  } else if (request.candidate !== undefined) {
    const n = parseInteger("candidate", request.candidate, "a candidate number from the screen, 1 or more");
    if (n < 1) throw new InputError(`--candidate ${n} is out of range; expected 1 or more`);
    axisRequest = { kind: "candidate", n };
    axisGiven = `candidate ${n}`;
  } else {
    const name = oneOf("reference", request.reference, ["four-seam", "two-seam"] as const);
    axisRequest = { kind: "reference", name };
    axisGiven = `${name} reference`;
  }
  return {
    pitch,
    echo,
    source,
    sampler,
    axisGiven,
    axisRequest,
    airMode: oneOf("air", request.air ?? "standard", ["standard", "none"] as const),
    air: airConditions(request),
    release: releasePoint(request),
    launch: launchAngles(request),
    drag: dragModel(request),
    spinDecayS: spinDecay(request),
    seamScale: parseInRange("seam-scale", request["seam-scale"] ?? "1", SEAM_FORCE_SCALE_RANGE[0], SEAM_FORCE_SCALE_RANGE[1], ""),
  };
}

export function runFlight(job: FlightJob): FlightOutcome {
  const s = job.sampler;
  let axis: Vec3;
  const ask = job.axisRequest;
  if (ask.kind === "axis") axis = ask.vector;
  else {
    const screen = screenPitch(job.pitch, { seamShape: s.seamShape, seamPoints: s.seamPoints, band: s.band, top: ask.kind === "candidate" ? Math.min(Math.max(ask.n, DEFAULT_TOP), TOP_RANGE[1]) : DEFAULT_TOP });
    if (ask.kind === "candidate") {
      if (ask.n > screen.candidates.length) throw new InputError(`--candidate ${ask.n} is out of range; the screen found ${screen.candidates.length} candidate(s)`);
      axis = screen.candidates[ask.n - 1].axis;
    } else axis = screen.references.find((r) => r.reference === ask.name)!.axis;
  }
  const flight = flyPitch({
    pitch: job.pitch,
    drag: job.drag,
    spinDecayTimeConstantS: job.spinDecayS,
    axisBall: axis,
    air: job.air,
    vacuum: job.airMode === "none",
    release: job.release,
    launch: job.launch,
    seamForce: { band: s.band, seamShape: s.seamShape, seamPoints: s.seamPoints, scale: job.seamScale },
  });
  return { job, axis, flight };
}

const IN = (m: number) => m / M_PER_IN;

/** The flight's numbers in user units (inches, degrees, seconds): the one form JSON and the terminal read. */
export function flightNumbers(o: FlightOutcome) {
  const f = o.flight;
  const { hand, view } = o.job.pitch;
  const vacuum = o.job.airMode === "none";
  const mv = f.movement;
  const part = (p: { xM: number; zM: number }) => ({
    horizontalIn: IN(p.xM),
    verticalIn: IN(p.zM),
    armSideIn: IN(toArmSide(p.xM, p.zM, hand).armSideM),
  });
  const seamClock = directionToClockAngle([mv.seamBreakM.xM, 0, mv.seamBreakM.zM], view);
  return {
    axis: { ball: o.axis, latLon: formatLatLon(vectorToLatLon(o.axis)) },
    air: {
      densityKgM3: vacuum ? 0 : f.air.densityKgM3,
      viscosityPaS: f.air.viscosityPaS,
      reynolds: vacuum ? 0 : f.reynolds,
      spinFactor: f.spinFactor,
      temperatureC: f.air.temperatureK - KELVIN_AT_0_C,
      pressureHpa: f.air.pressurePa / PA_PER_HPA,
      humidityPct: f.air.relativeHumidityPct,
    },
    launch: { verticalDeg: f.launchAngles.verticalRad / DEG, horizontalDeg: f.launchAngles.horizontalRad / DEG, aimed: o.job.launch === undefined },
    timeToPlateS: f.flight.timeToPlateS,
    plate: { xIn: IN(f.flight.plateCrossingM[0]), zIn: IN(f.flight.plateCrossingM[2]) },
    approach: { verticalDeg: f.flight.verticalApproachAngleRad / DEG, horizontalDeg: f.flight.horizontalApproachAngleRad / DEG },
    movement: {
      ...part(mv.breakM),
      magnus: part(mv.magnusBreakM),
      seam: { ...part(mv.seamBreakM), clock: seamClock === null ? null : formatClock(angleToClock(seamClock)) },
    },
    seamCoefficient: { alongAxis: f.seamCoefficient.alongAxis, alongMagnus: f.seamCoefficient.alongMagnus },
  };
}
