/** `seam-atlas flight`: a pitch with a seam orientation flown to the plate, its movement split into Magnus and seam parts. */
import type { Argv } from "yargs";
import { directionToClockAngle } from "../../geometry/frames.js";
import { angleToClock, formatClock } from "../../geometry/clock.js";
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { unit3, type Vec3 } from "../../geometry/vec.js";
import { DEG } from "../../geometry/units.js";
import type { AirConditions } from "../physics/air.js";
import type { DragModel } from "../physics/drag.js";
import { flyPitch, type PitchFlight } from "../physics/pitchFlight.js";
import { toArmSide } from "../../geometry/frames.js";
import { M_PER_FT, M_PER_IN } from "../../geometry/units.js";
import { formatMovementIn, fixed } from "../render/numbers.js";
import { screenPitch } from "../screening/screen.js";
import { TOOL_NAME, TOOL_VERSION } from "../version.js";
import { InputError } from "./errors.js";
import { parseSamplerSettings, withSamplerOptions } from "./measure.js";
import { parseAxis, parseInteger, parseNumber } from "./parse.js";
import { pitchesFromArgs, withPitchOptions } from "./screen.js";
import { writeAtomic } from "./writeAtomic.js";

/** Environment options shared by flight and explain. */
export function withAirOptions<T>(y: Argv<T>) {
  return y
    .option("elevation-ft", { type: "string", describe: "field elevation, ft (standard atmosphere)", requiresArg: true })
    .option("elevation-m", { type: "string", describe: "field elevation, m", requiresArg: true })
    .option("temperature-f", { type: "string", describe: "air temperature, deg F [default: standard atmosphere]", requiresArg: true })
    .option("temperature-c", { type: "string", describe: "air temperature, deg C", requiresArg: true })
    .option("humidity", { type: "string", describe: "relative humidity, percent [default: 0]", requiresArg: true })
    .option("pressure-hpa", { type: "string", describe: "air pressure, hPa [default: standard atmosphere]", requiresArg: true });
}

/** Air conditions from the options, in SI; one of each pair at most. */
export function parseAir(argv: Record<string, unknown>): AirConditions {
  const both = (a: string, b: string) => {
    if (argv[a] !== undefined && argv[b] !== undefined) throw new InputError(`give --${a} or --${b}, not both`);
  };
  both("elevation-ft", "elevation-m");
  both("temperature-f", "temperature-c");
  const out: { elevationM?: number; temperatureC?: number; relativeHumidityPct?: number; pressurePa?: number } = {};
  if (argv["elevation-ft"] !== undefined) out.elevationM = parseNumber("elevation-ft", argv["elevation-ft"], "feet") * M_PER_FT;
  if (argv["elevation-m"] !== undefined) out.elevationM = parseNumber("elevation-m", argv["elevation-m"], "metres");
  if (out.elevationM !== undefined && !(out.elevationM >= -500 && out.elevationM <= 5000)) {
    throw new InputError(`elevation ${fixed(out.elevationM, 0)} m is out of range; expected -500 to 5000 m (-1640 to 16404 ft)`);
  }
  if (argv["temperature-f"] !== undefined) out.temperatureC = ((parseNumber("temperature-f", argv["temperature-f"], "deg F") - 32) * 5) / 9;
  if (argv["temperature-c"] !== undefined) out.temperatureC = parseNumber("temperature-c", argv["temperature-c"], "deg C");
  if (out.temperatureC !== undefined && !(out.temperatureC >= -40 && out.temperatureC <= 60)) {
    throw new InputError(`temperature ${fixed(out.temperatureC, 1)} deg C is out of range; expected -40 to 60 deg C (-40 to 140 deg F)`);
  }
  if (argv.humidity !== undefined) {
    out.relativeHumidityPct = parseNumber("humidity", argv.humidity, "percent");
    if (!(out.relativeHumidityPct >= 0 && out.relativeHumidityPct <= 100)) throw new InputError(`--humidity ${out.relativeHumidityPct} is out of range; expected 0 to 100 percent`);
  }
  if (argv["pressure-hpa"] !== undefined) {
    const hpa = parseNumber("pressure-hpa", argv["pressure-hpa"], "hPa");
    if (!(hpa >= 500 && hpa <= 1100)) throw new InputError(`--pressure-hpa ${hpa} is out of range; expected 500 to 1100 hPa`);
    out.pressurePa = hpa * 100;
  }
  return out;
}

export function registerFlight(y: Argv): Argv {
  return y.command(
    "flight",
    "fly a pitch with a seam orientation to the plate: plate location, time, approach angles, movement split into Magnus and seam parts",
    (c) =>
      withAirOptions(
        withSamplerOptions(
          withPitchOptions(c)
            .option("axis", { type: "string", describe: "spin axis on the ball: X,Y,Z, a landmark name, or 12.5N,45E", requiresArg: true })
            .option("candidate", { type: "string", describe: "use the screen's candidate N for this pitch instead of --axis", requiresArg: true })
            .option("reference", { type: "string", describe: "use a reference hold instead of --axis: four-seam or two-seam", requiresArg: true })
            .option("air", { type: "string", default: "standard", describe: "standard (the air options apply) or none (a vacuum check)", requiresArg: true })
            .option("release-height-ft", { type: "string", default: "6", describe: "release height above the ground, ft", requiresArg: true })
            .option("release-side-ft", { type: "string", default: "1.5", describe: "release point toward the arm side of the rubber's middle, ft", requiresArg: true })
            .option("extension-ft", { type: "string", default: "6", describe: "release extension in front of the rubber, ft", requiresArg: true })
            .option("vertical-angle", { type: "string", describe: "launch angle above level, deg (with --horizontal-angle; default: aim at the middle of the zone)", requiresArg: true })
            .option("horizontal-angle", { type: "string", describe: "launch angle toward the catcher's right, deg", requiresArg: true })
            .option("drag", { type: "string", default: "giordano", describe: "drag model: giordano (Giordano & Nakanishi's speed-dependent fit, scaled to the air's density) or constant", requiresArg: true })
            .option("drag-coefficient", { type: "string", describe: "C_D for --drag constant [default: 0.35]", requiresArg: true })
            .option("spin-decay-s", { type: "string", describe: "spin decays as exp(-t / TAU), TAU in seconds [default: no decay]", requiresArg: true })
            .option("seam-scale", { type: "string", default: "1", describe: "calibration factor on the seam force, 0 to 10", requiresArg: true })
            .option("json", { type: "boolean", default: false, describe: "print JSON" })
            .option("out", { type: "string", describe: "also write the JSON to this file", requiresArg: true })
            .example("$0 flight --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --candidate 1", "the screen's best grip, in inches")
            .example("$0 flight --hand right --speed 94 --spin 2350 --tilt 12:45 --axis waist-A --elevation-ft 5200", "a four-seam hold at altitude"),
        ),
      ),
    (argv) => runFlight(argv as unknown as Record<string, unknown>),
  );
}

const IN = (m: number) => m / M_PER_IN;

function runFlight(argv: Record<string, unknown>): void {
  const sampler = parseSamplerSettings(argv);
  const { pitches } = pitchesFromArgs(argv);
  if (pitches.length !== 1) throw new InputError(`flight takes one pitch; the file has ${pitches.length} (choose one with --pitch-name)`);
  const { pitch, echo } = pitches[0];
  const sources = ["axis", "candidate", "reference"].filter((k) => argv[k] !== undefined);
  if (sources.length !== 1) throw new InputError(`give exactly one of --axis, --candidate N or --reference four-seam|two-seam`);
  let axis: Vec3;
  let axisGiven: string;
  if (argv.axis !== undefined) {
    const a = parseAxis("axis", argv.axis, sampler.seamShape);
    axis = unit3(a.vector);
    axisGiven = a.given;
  } else {
    const screen = screenPitch(pitch, { seamShape: sampler.seamShape, seamPoints: sampler.seamPoints, band: sampler.band });
    if (argv.candidate !== undefined) {
      const n = parseInteger("candidate", argv.candidate, "a candidate number from the screen, 1 or more");
      if (!(n >= 1 && n <= screen.candidates.length)) throw new InputError(`--candidate ${n} is out of range; the screen found ${screen.candidates.length} candidate(s)`);
      axis = screen.candidates[n - 1].axis;
      axisGiven = `candidate ${n}`;
    } else {
      const name = String(argv.reference);
      const ref = screen.references.find((r) => r.reference === name);
      if (!ref) throw new InputError(`--reference "${name}" is not one of four-seam, two-seam`);
      axis = ref.axis;
      axisGiven = `${name} reference`;
    }
  }
  const airMode = String(argv.air);
  if (airMode !== "standard" && airMode !== "none") throw new InputError(`--air "${airMode}" is not one of standard, none`);
  const air = parseAir(argv);
  const heightFt = parseNumber("release-height-ft", argv["release-height-ft"], "feet");
  const sideFt = parseNumber("release-side-ft", argv["release-side-ft"], "feet");
  const extensionFt = parseNumber("extension-ft", argv["extension-ft"], "feet");
  if (!(heightFt > 0 && heightFt <= 9)) throw new InputError(`--release-height-ft ${heightFt} is out of range; expected above 0 and at most 9 ft`);
  if (!(sideFt >= -6 && sideFt <= 6)) throw new InputError(`--release-side-ft ${sideFt} is out of range; expected -6 to 6 ft`);
  if (!(extensionFt >= 0 && extensionFt <= 9)) throw new InputError(`--extension-ft ${extensionFt} is out of range; expected 0 to 9 ft`);
  if ((argv["vertical-angle"] === undefined) !== (argv["horizontal-angle"] === undefined)) {
    throw new InputError(`give both --vertical-angle and --horizontal-angle, or neither (to aim at the middle of the zone)`);
  }
  let launch: { verticalRad: number; horizontalRad: number } | undefined;
  if (argv["vertical-angle"] !== undefined) {
    const v = parseNumber("vertical-angle", argv["vertical-angle"], "degrees");
    const h = parseNumber("horizontal-angle", argv["horizontal-angle"], "degrees");
    if (!(Math.abs(v) < 45 && Math.abs(h) < 45)) throw new InputError(`launch angles ${v}, ${h} deg are out of range; expected each strictly between -45 and 45 deg`);
    launch = { verticalRad: v * DEG, horizontalRad: h * DEG };
  }
  const scale = parseNumber("seam-scale", argv["seam-scale"], "a factor from 0 to 10");
  if (!(scale >= 0 && scale <= 10)) throw new InputError(`--seam-scale ${scale} is out of range; expected 0 to 10`);
  const dragName = String(argv.drag);
  if (dragName !== "giordano" && dragName !== "constant") throw new InputError(`--drag "${dragName}" is not one of giordano, constant`);
  if (argv["drag-coefficient"] !== undefined && dragName !== "constant") throw new InputError(`--drag-coefficient goes with --drag constant`);
  let drag: DragModel = { name: "giordano" };
  if (dragName === "constant") {
    const cd = argv["drag-coefficient"] === undefined ? 0.35 : parseNumber("drag-coefficient", argv["drag-coefficient"], "a drag coefficient from 0 to 2");
    if (!(cd >= 0 && cd <= 2)) throw new InputError(`--drag-coefficient ${cd} is out of range; expected 0 to 2`);
    drag = { name: "constant", dragCoefficient: cd };
  }
  let spinDecayTimeConstantS: number | undefined;
  if (argv["spin-decay-s"] !== undefined) {
    spinDecayTimeConstantS = parseNumber("spin-decay-s", argv["spin-decay-s"], "seconds above 0");
    if (!(spinDecayTimeConstantS > 0)) throw new InputError(`--spin-decay-s ${spinDecayTimeConstantS} must be above 0 seconds`);
  }
  const f = flyPitch({
    pitch,
    drag,
    spinDecayTimeConstantS,
    axisBall: axis,
    air,
    vacuum: airMode === "none",
    release: { heightM: heightFt * M_PER_FT, armSideM: sideFt * M_PER_FT, extensionM: extensionFt * M_PER_FT },
    launch,
    seamForce: { band: sampler.band, seamShape: sampler.seamShape, seamPoints: sampler.seamPoints, scale },
  });
  const doc = {
    tool: TOOL_NAME,
    version: TOOL_VERSION,
    command: "flight",
    input: {
      pitch: echo,
      axis: axisGiven,
      airModel: airMode,
      elevationM: air.elevationM ?? 0,
      temperatureC: air.temperatureC ?? null,
      humidityPct: air.relativeHumidityPct ?? 0,
      pressureHpa: air.pressurePa !== undefined ? air.pressurePa / 100 : null,
      releaseHeightFt: heightFt,
      releaseSideFt: sideFt,
      extensionFt,
      seamScale: scale,
      drag: dragName,
      dragCoefficient: drag.name === "constant" ? drag.dragCoefficient : null,
      spinDecayS: spinDecayTimeConstantS ?? null,
      bandCenterDeg: sampler.bandCenterDeg,
      bandWidthDeg: sampler.bandWidthDeg,
      seamShape: sampler.seamShape,
    },
    ...flightJson(f, axis, pitch.hand, pitch.view, airMode === "none", launch === undefined),
  };
  const json = JSON.stringify(doc, null, 2) + "\n";
  if (typeof argv.out === "string") writeAtomic(argv.out, json);
  if (argv.json) {
    process.stdout.write(json);
    return;
  }
  const m = doc.movement;
  const lines: [string, string][] = [
    ["pitch", `${echo.pitcher ? `${echo.pitcher}, ` : ""}${echo.name}: ${fixed(echo.speedMph, 1)} mph, ${fixed(echo.spinRpm, 0)} rpm, tilt ${echo.tilt} (${echo.view}), gyro ${fixed(echo.gyroDeg, 1)} deg`],
    ["seam orientation", `${doc.axis.latLon} (${axisGiven})`],
    ["air", airMode === "none" ? "none (vacuum)" : `${fixed(doc.air.densityKgM3, 4)} kg/m^3, Re ${fixed(doc.air.reynolds / 1e5, 2)}e5, spin factor ${fixed(doc.air.spinFactor, 3)}`],
    ["launch", `${fixed(doc.launch.verticalDeg, 2)} deg up, ${fixed(doc.launch.horizontalDeg, 2)} deg right${doc.launch.aimed ? " (aimed at the middle of the zone)" : ""}`],
    ["time to plate", `${fixed(doc.timeToPlateS, 3)} s`],
    ["at the plate", `${fixed(doc.plate.xIn, 1)} in right of centre, ${fixed(doc.plate.zIn, 1)} in high`],
    ["approach", `${fixed(doc.approach.verticalDeg, 2)} deg vertical, ${fixed(doc.approach.horizontalDeg, 2)} deg horizontal`],
    ["movement vs spinless", `${formatMovementIn(m.armSideIn)} in arm side, ${formatMovementIn(m.verticalIn)} in up`],
    ["  Magnus part", `${formatMovementIn(m.magnus.armSideIn)} in arm side, ${formatMovementIn(m.magnus.verticalIn)} in up`],
    ["  seam part", `${formatMovementIn(m.seam.armSideIn)} in arm side, ${formatMovementIn(m.seam.verticalIn)} in up, toward ${m.seam.clock ?? "-"} (${echo.view}'s view)`],
  ];
  const w = Math.max(...lines.map((l) => l[0].length));
  process.stdout.write(lines.map(([k, v]) => `  ${k.padEnd(w)}  ${v}`).join("\n") + "\n");
}

/** The flight's JSON fields (inches, degrees, seconds). */
export function flightJson(f: PitchFlight, axis: Vec3, hand: "right" | "left", view: "pitcher" | "catcher", vacuum: boolean, aimed: boolean) {
  const mv = f.movement;
  const part = (o: { xM: number; zM: number }) => ({
    horizontalIn: IN(o.xM),
    verticalIn: IN(o.zM),
    armSideIn: IN(toArmSide(o.xM, o.zM, hand).armSideM),
  });
  const seamClock = directionToClockAngle([mv.seamBreakM.xM, 0, mv.seamBreakM.zM], view);
  return {
    axis: { ball: axis, latLon: formatLatLon(vectorToLatLon(axis)) },
    air: {
      densityKgM3: vacuum ? 0 : f.air.densityKgM3,
      viscosityPaS: f.air.viscosityPaS,
      reynolds: vacuum ? 0 : f.reynolds,
      spinFactor: f.spinFactor,
      temperatureC: f.air.temperatureK - 273.15,
      pressureHpa: f.air.pressurePa / 100,
      humidityPct: f.air.relativeHumidityPct,
    },
    launch: { verticalDeg: f.launchAngles.verticalRad / DEG, horizontalDeg: f.launchAngles.horizontalRad / DEG, aimed },
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
