/**
 * Option declarations shared by several commands (yargs). Declarations only: every
 * value is read, checked and converted by the jobs (src/jobs/request/).
 */
import type { Argv } from "yargs";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { DEFAULT_SEAM_POINTS, SEAM_POINTS_RANGE } from "../../geometry/seamSamples.js";
import { DEFAULT_BAND_CENTER_DEG, DEFAULT_BAND_WIDTH_DEG } from "../sampling/band.js";
import { DEFAULT_FINGER_SPACING_IN } from "../screening/hand.js";
import { DEFAULT_SPREAD_DEG } from "../screening/robustness.js";
import { DEFAULT_GRID_SPACING_DEG, GRID_SPACING_RANGE_DEG, SPREAD_RANGE_DEG } from "../screening/screen.js";

/** A string option that takes a value. */
const text = (describe: string, defaultValue?: string) => ({ type: "string" as const, describe, requiresArg: true, ...(defaultValue !== undefined ? { default: defaultValue } : {}) });

/** The pitch: flags, a pitch file or the demo staff. */
export function withPitchOptions<T>(y: Argv<T>) {
  return y
    .option("hand", text("throwing hand: right, left, R or L"))
    .option("speed", text("release speed, mph"))
    .option("spin", text("spin rate, rpm"))
    .option("tilt", text("tilt as a clock reading H:MM (12:00 = pure backspin)"))
    .option("tilt-deg", text("tilt in degrees clockwise from 12:00 as seen from --view, 0 to below 360 (instead of --tilt)"))
    .option("view", text("whose view the clock is read from: pitcher (behind the pitcher) or catcher"))
    .option("gyro", text("gyro angle, deg (positive: the axis's positive end leans toward the plate) [default: 0]"))
    .option("efficiency", text("spin efficiency, percent (instead of --gyro; below 100 it needs --gyro-sign)"))
    .option("gyro-sign", text("the gyro's sign with --efficiency: pos (the axis's positive end leans toward the plate) or neg"))
    .option("want", text("wanted direction of the seam movement: arm, glove, up, down or any (its size) [default: any]"))
    .option("name", text("a label for the pitch"))
    .option("pitch", text("a pitch file (one pitch or a staff; see README)"))
    .option("pitch-name", text("only this pitch of the file: NAME or PITCHER/NAME"))
    .option("demo", { type: "boolean", default: false, describe: "use the built-in demo staff (templates/demo-staff.json)" });
}

/** The seam and the separation band. */
export function withSamplerOptions<T>(y: Argv<T>) {
  return y
    .option("seam-shape", text(`seam shape b of the curve, 0 < b < 0.5 [default: ${DEFAULT_SEAM_SHAPE.toFixed(6)}, fitted to a published cover's waist]`))
    .option("band-center", text(`separation band centre, deg from the front stagnation point [default: the model profile's, ${DEFAULT_BAND_CENTER_DEG}]`))
    .option("band-width", text(`separation band width, deg [default: the model profile's, ${DEFAULT_BAND_WIDTH_DEG}]`))
    .option("model", text("a seam-force model profile (JSON; see README) [default: the built-in defaults]"))
    .option("seam-points", text(`seam samples, a multiple of 4 from ${SEAM_POINTS_RANGE[0]} to ${SEAM_POINTS_RANGE[1]}`, String(DEFAULT_SEAM_POINTS)));
}

/** The screen's own options (grid, scatter, ranking, fingers): what each means and its default. */
const SCREEN_OPTIONS: readonly (readonly [name: string, describe: string, fallback: string])[] = [
  ["grid", `spacing of the axis-position grid on the ball, deg (${GRID_SPACING_RANGE_DEG[0]} to ${GRID_SPACING_RANGE_DEG[1]})`, String(DEFAULT_GRID_SPACING_DEG)],
  ["spread", `release scatter of the axis on the ball, deg per direction (${SPREAD_RANGE_DEG[0]} to ${SPREAD_RANGE_DEG[1]})`, String(DEFAULT_SPREAD_DEG)],
  ["rank", "rank by strength (score), robust (10th-percentile score) or blend (their mean)", "blend"],
  ["finger-spacing", "centre-to-centre spacing of the index and middle pads, inches", String(DEFAULT_FINGER_SPACING_IN)],
];

/** The screen's options with their defaults, and the trade's window. */
export function withScreenOptions<T>(y: Argv<T>) {
  let out = y;
  for (const [name, describe, fallback] of SCREEN_OPTIONS) out = out.option(name, text(describe, fallback));
  return out.option("window-ft", text("where the trade's movement window starts, ft from home plate (10 to 55)", "50"));
}

/**
 * The screen's options for a command that screens only when asked (flight with
 * --candidate or --reference): the same words, and no yargs default, so that a flag
 * given where no screen is made can be refused.
 */
export function withScreenChoiceOptions<T>(y: Argv<T>) {
  let out = y;
  for (const [name, describe, fallback] of SCREEN_OPTIONS) out = out.option(name, text(`with --candidate or --reference, the screen's ${describe} [default: ${fallback}]`));
  return out.option("top", text("with --candidate, how many candidates the screen lists, as screen takes it [default: 5]"));
}

/** The air. */
export function withAirOptions<T>(y: Argv<T>) {
  return y
    .option("elevation-ft", text("field elevation, ft (standard atmosphere)"))
    .option("elevation-m", text("field elevation, m"))
    .option("temperature-f", text("air temperature, deg F [default: standard atmosphere]"))
    .option("temperature-c", text("air temperature, deg C"))
    .option("humidity", text("relative humidity, percent [default: 0]"))
    .option("pressure-hpa", text("air pressure, hPa [default: standard atmosphere]"));
}

/** Where slow results are kept between runs (io/cacheFiles.ts); every command that screens or explains takes it. */
export function withCacheOption<T>(y: Argv<T>) {
  return y.option(
    "cache",
    text("folder for the cache of coefficient maps (kept under 64 MiB, least recently used dropped first), or none [default: $XDG_CACHE_HOME/seam-atlas, else ~/.cache/seam-atlas; on Windows %LOCALAPPDATA%\\seam-atlas\\cache, on macOS ~/Library/Caches/seam-atlas]"),
  );
}

/** Worker threads of the pool (src/jobs/pool.ts); `auto` says what the command does by default. */
export function withThreadsOption<T>(y: Argv<T>, auto: string) {
  return y.option("threads", text(`worker threads, 0 for this thread only [default: auto, ${auto}]`));
}

export { text as textOption };
