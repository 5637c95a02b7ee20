/** `seam-atlas landmarks`: the named places on the ball, in the ball frame. */
import type { Argv } from "yargs";
import { formatLatLon, vectorToLatLon } from "../../geometry/ballCoords.js";
import { findLandmarks } from "../../geometry/landmarks.js";
import { DEFAULT_SEAM_SHAPE, assertSeamShape } from "../../geometry/seamCurve.js";
import { BALL_RADIUS_IN } from "../../geometry/ball.js";
import { DEG } from "../../geometry/units.js";
import { TOOL_NAME, TOOL_VERSION } from "../version.js";
import { InputError } from "./errors.js";
import { fixed } from "./format.js";
import { parseNumber } from "./parse.js";

const KIND_WORDS = { tip: "horseshoe tip", waist: "waist middle", lobe: "lobe centre", node: "seam on the equator" } as const;

export function registerLandmarks(y: Argv): Argv {
  return y.command(
    "landmarks",
    "list the named places on the ball (horseshoe tips, waists, lobe centres, equator crossings)",
    (c) =>
      c
        .option("seam-shape", { type: "string", describe: `seam shape b, 0 < b < 0.5 [default: ${DEFAULT_SEAM_SHAPE.toFixed(6)}]`, requiresArg: true })
        .option("json", { type: "boolean", default: false, describe: "print JSON" }),
    (argv) => {
      const b = argv["seam-shape"] === undefined ? DEFAULT_SEAM_SHAPE : parseNumber("seam-shape", argv["seam-shape"], "b strictly between 0 and 0.5");
      try {
        assertSeamShape(b);
      } catch (err) {
        throw new InputError(`--seam-shape: ${(err as Error).message}`);
      }
      const list = findLandmarks(b).map((l) => ({
        name: l.name,
        kind: l.kind,
        direction: l.direction,
        latLon: formatLatLon(vectorToLatLon(l.direction)),
        seamDistanceDeg: l.seamDistanceRad / DEG,
        seamDistanceIn: l.seamDistanceRad * BALL_RADIUS_IN,
      }));
      if (argv.json) {
        process.stdout.write(JSON.stringify({ tool: TOOL_NAME, version: TOOL_VERSION, command: "landmarks", seamShape: b, landmarks: list }, null, 2) + "\n");
        return;
      }
      process.stdout.write(`landmarks of the seam with shape b = ${b.toFixed(6)} (ball frame; seam distance along the surface)\n`);
      for (const l of list) {
        const dir = l.direction.map((v) => fixed(v, 4).padStart(7)).join(" ");
        process.stdout.write(
          `  ${l.name.padEnd(8)} ${KIND_WORDS[l.kind].padEnd(19)} ${dir}   ${l.latLon.padEnd(14)} ${l.seamDistanceDeg.toFixed(1).padStart(5)} deg  ${l.seamDistanceIn.toFixed(2)} in\n`,
        );
      }
    },
  );
}
