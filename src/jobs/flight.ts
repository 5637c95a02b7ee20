/**
 * The flight job: a pitch with a seam orientation flown to the plate: plate
 * location, time, approach angles, and movement split into Magnus and seam parts.
 */
import { movementClock, toArmSide } from "../../geometry/frames.js";
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { DEG, M_PER_FT, M_PER_IN, KELVIN_AT_0_C, PA_PER_HPA } from "../../geometry/units.js";
import { unit3, type Vec3 } from "../../geometry/vec.js";
import { InputError } from "../io/errors.js";
import type { AirConditions } from "../physics/air.js";
import type { DragModel } from "../physics/drag.js";
import { flyPitch, tradeArmSide, type PitchFlight } from "../physics/pitchFlight.js";
import type { SeamModel } from "../physics/seamModel/model.js";
import type { TradeBreak } from "../physics/tradeMovement.js";
import { DEFAULT_TOP, screenPitch, TOP_RANGE, type CoefficientMapSource } from "../screening/screen.js";
import type { PitchEcho } from "../screening/report.js";
import type { Pitch } from "../screening/pitch.js";
import { onePitch, pitchesFromRequest } from "./request/pitch.js";
import { jobScreenSettings } from "./screenJob.js";
import { buildModel, modelChoice } from "./request/model.js";
import { cachedScreenMaps } from "./mapCache.js";
import { cacheChoice } from "./request/runtime.js";
import { airConditions, dragModel, launchAngles, releasePoint, samplerSettings, screenOptions, spinDecay, windowStart, type SamplerSettings, type ScreenOptions } from "./request/settings.js";
import { oneOf, parseAxis, parseInteger, parseNumber, type Request } from "./request/values.js";

export interface FlightJob {
  readonly pitch: Pitch;
  readonly echo: PitchEcho;
  readonly sampler: SamplerSettings;
  readonly model: SeamModel;
  /** How the orientation was given: an --axis text, "candidate N" or "four-seam reference". */
  readonly axisGiven: string;
  readonly axisRequest: { readonly kind: "axis"; readonly vector: Vec3 } | { readonly kind: "candidate"; readonly n: number } | { readonly kind: "reference"; readonly name: string };
  readonly airMode: "standard" | "none";
  readonly air: AirConditions;
  readonly release: { heightM: number; armSideM: number; extensionM: number };
  readonly launch?: { verticalRad: number; horizontalRad: number };
  readonly drag: DragModel;
  readonly spinDecayS?: number;
  /** Release phase, rad, when given (the seam force then follows the ball's turning from it). */
  readonly phaseRad?: number;
  readonly windowStartM: number;
  readonly trajectory: boolean;
  /** The screen --candidate and --reference read (its grid, scatter, ranking and finger spacing, as `screen` takes them), with its maps' cache. */
  readonly screen: ScreenOptions & { readonly top: number; readonly maps?: CoefficientMapSource };
}

/** The screen's options flight takes for --candidate and --reference; with --axis there is no screen, so they are refused. */
const SCREEN_FLAGS = ["grid", "spread", "rank", "finger-spacing", "top", "cache"] as const;
/** The air's options, which a vacuum (--air none) does not read. */
const AIR_FLAGS = ["elevation-ft", "elevation-m", "temperature-f", "temperature-c", "humidity", "pressure-hpa"] as const;

export interface FlightOutcome {
  readonly job: FlightJob;
  readonly axis: Vec3;
  readonly flight: PitchFlight;
}

export function parseFlight(request: Request): FlightJob {
  const choice = modelChoice(request);
  const sampler = samplerSettings(request, choice.profile);
  const { pitches } = pitchesFromRequest(request);
  const { pitch, echo } = onePitch(request, pitches, "flight", "choose one with --pitch-name");
  const sources = ["axis", "candidate", "reference"].filter((k) => request[k] !== undefined);
  if (sources.length !== 1) throw new InputError(`give exactly one of --axis, --candidate N or --reference four-seam|two-seam`);
  let axisRequest: FlightJob["axisRequest"];
  let axisGiven: string;
  if (request.axis !== undefined) {
    const a = parseAxis("axis", request.axis, sampler.seamShape);
    axisRequest = { kind: "axis", vector: unit3(a.vector) };
    axisGiven = a.given;
    const stray = SCREEN_FLAGS.find((k) => request[k] !== undefined);
    if (stray) throw new InputError(`--${stray} goes with --candidate N or --reference (the screen they come from); with --axis there is no screen, so leave it out`);
  } else if (request.candidate !== undefined) {
    const n = parseInteger("candidate", request.candidate, "a candidate number from the screen, 1 or more");
    if (n < 1 || n > TOP_RANGE[1]) throw new InputError(`--candidate ${n} is out of range; expected 1 to ${TOP_RANGE[1]}`);
    axisRequest = { kind: "candidate", n };
    axisGiven = `candidate ${n}`;
  } else {
    const name = oneOf("reference", request.reference, ["four-seam", "two-seam"] as const);
    axisRequest = { kind: "reference", name };
    axisGiven = `${name} reference`;
  }
  const airMode = oneOf("air", request.air ?? "standard", ["standard", "none"] as const);
  const airFlag = AIR_FLAGS.find((k) => request[k] !== undefined);
  if (airMode === "none" && airFlag) throw new InputError(`--${airFlag} goes with --air standard; --air none flies in a vacuum, so leave it out`);
  return {
    pitch,
    echo,
    sampler,
    model: buildModel(choice.profile, sampler.seamShape),
    axisGiven,
    axisRequest,
    airMode,
    air: airConditions(request),
    release: releasePoint(request),
    launch: launchAngles(request),
    drag: dragModel(request),
    spinDecayS: spinDecay(request),
    phaseRad: request.phase === undefined ? undefined : parseNumber("phase", request.phase, "degrees (the ball's phase at release)") * DEG,
    windowStartM: windowStart(request),
    trajectory: request.trajectory === true,
    screen: { ...screenOptions(request), top: screenTop(request, axisRequest), ...mapsOf(request) },
  };
}

/** The screen's list length: --top as `screen` reads it, which must reach the candidate asked for; without it the default 5, or the candidate's number when that is more. */
function screenTop(request: Request, ask: FlightJob["axisRequest"]): number {
  if (request.top === undefined) return ask.kind === "candidate" ? Math.max(ask.n, DEFAULT_TOP) : DEFAULT_TOP;
  const top = parseInteger("top", request.top, "a whole number of candidates");
  if (!(top >= TOP_RANGE[0] && top <= TOP_RANGE[1])) throw new InputError(`--top ${top} is out of range; expected ${TOP_RANGE[0]} to ${TOP_RANGE[1]}`);
  if (ask.kind === "candidate" && ask.n > top) throw new InputError(`--candidate ${ask.n} is beyond --top ${top}; expected a candidate from 1 to ${top}`);
  return top;
}

/** The screen's coefficient maps kept in the request's cache folder (--cache; none: computed each run). */
function mapsOf(request: Request): { maps?: CoefficientMapSource } {
  const folder = cacheChoice(request);
  return folder === null ? {} : { maps: cachedScreenMaps(folder) };
}

export function runFlight(job: FlightJob): FlightOutcome {
  let axis: Vec3;
  const ask = job.axisRequest;
  if (ask.kind === "axis") axis = ask.vector;
  else {
    // the screen of this pitch as `screen` makes it with the same options (this flight's air and window)
    const screen = screenPitch(job.pitch, { ...job.screen, ...jobScreenSettings(job) });
    if (ask.kind === "candidate") {
      if (ask.n > screen.candidates.length) throw new InputError(`--candidate ${ask.n} is out of range; the screen found ${screen.candidates.length} candidate(s)`);
      axis = screen.candidates[ask.n - 1].axis;
    } else axis = screen.references.find((r) => r.reference === ask.name)!.axis;
  }
  const flight = flyPitch({
    pitch: job.pitch,
    model: job.model,
    drag: job.drag,
    spinDecayTimeConstantS: job.spinDecayS,
    axisBall: axis,
    air: job.air,
    vacuum: job.airMode === "none",
    release: job.release,
    launch: job.launch,
    phaseRad: job.phaseRad,
    windowStartM: job.windowStartM,
    spread: true,
    trajectory: job.trajectory,
  });
  return { job, axis, flight };
}

const IN = (m: number) => m / M_PER_IN;

/** The flight's numbers in user units (inches, degrees, seconds, newtons): the one form JSON and the terminal read. */
export function flightNumbers(o: FlightOutcome) {
  const f = o.flight;
  const { hand, view } = o.job.pitch;
  const vacuum = o.job.airMode === "none";
  const fr = f.fromRelease;
  const part = (p: { xM: number; zM: number }) => ({
    horizontalIn: IN(p.xM),
    verticalIn: IN(p.zM),
    armSideIn: IN(toArmSide(p.xM, p.zM, hand).armSideM),
  });
  const trade = (b: TradeBreak) => ({
    inducedVerticalBreakIn: IN(b.inducedVerticalBreakM),
    horizontalBreakIn: IN(b.horizontalBreakM),
    armSideIn: IN(tradeArmSide(b, hand).armSideM),
  });
  const t = f.trade;
  const seam = t.seamM;
  const spread = f.seamSpread;
  const range = (r: { min: number; p10: number; p90: number; max: number }) => ({ minIn: IN(r.min), p10In: IN(r.p10), p90In: IN(r.p90), maxIn: IN(r.max) });
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
    seam: {
      mode: f.seamMode,
      ...(f.phaseRad !== undefined ? { phaseDeg: f.phaseRad / DEG } : {}),
      turnsToPlate: f.turns,
      coefficient: { across: f.seamCoefficient.across, alongMagnus: f.seamCoefficient.alongMagnus },
    },
    movement: {
      trade: {
        ...trade(t.total),
        windowFt: f.windowStartM / M_PER_FT,
        magnus: trade(t.magnusM),
        seam: { ...trade(seam), verticalIn: IN(seam.inducedVerticalBreakM), clock: movementClock(seam.horizontalBreakM, seam.inducedVerticalBreakM, view) },
        drag: trade(t.dragM),
      },
      fromRelease: {
        ...part(fr.breakM),
        magnus: part(fr.magnusM),
        seam: { ...part(fr.seamM), clock: movementClock(fr.seamM.xM, fr.seamM.zM, view) },
      },
      ...(spread
        ? { seamSpread: { basis: "trade", releasePhases: spread.phases, horizontalBreak: range(spread.horizontalBreakM), inducedVerticalBreak: range(spread.inducedVerticalBreakM) } }
        : {}),
    },
    ...(f.trajectory
      ? {
          trajectory: Array.from({ length: f.trajectory.tS.length }, (_, i) => ({
            tS: f.trajectory!.tS[i],
            xFt: f.trajectory!.xM[i] / M_PER_FT,
            yFt: f.trajectory!.yM[i] / M_PER_FT,
            zFt: f.trajectory!.zM[i] / M_PER_FT,
          })),
        }
      : {}),
  };
}
