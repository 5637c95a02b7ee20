#!/usr/bin/env node
/** The `seam-atlas` command: parse, validate, call the library, write. */
import yargs from "yargs";
import { hideBin } from "yargs/helpers";
import { TOOL_VERSION } from "../version.js";
import { exitWithError, InputError } from "./errors.js";
import { registerLandmarks } from "./landmarks.js";
import { registerMeasure } from "./measure.js";
import { registerScreen } from "./screen.js";
import { registerFlight } from "./flight.js";
import { registerExplain } from "./explain.js";
import { registerPaper } from "./paper.js";
import { registerView } from "./view.js";
import { registerForce } from "./force.js";
import { registerCalibrate } from "./calibrate.js";

export async function main(args: string[]): Promise<void> {
  let cli = yargs(args)
    .scriptName("seam-atlas")
    .usage("$0 <command> [options]\n\nSeam-orientation geometry: where the spin axis pierces the ball, how much seam sits in the separation band through a turn, and the seam-shifted-wake push that follows.")
    .version(TOOL_VERSION)
    .strict()
    .demandCommand(1, "give a command: atlas, card, handout, view, screen, measure, flight, force, explain or landmarks (see --help)")
    .recommendCommands()
    .wrap(Math.min(110, process.stdout.columns || 100))
    .fail((msg, err) => {
      // yargs' own complaints (unknown option, missing value) are input errors too
      if (err && err.name !== "YError") throw err;
      throw new InputError((msg ?? err?.message ?? "bad command line").replace(/\s+/g, " ").trim());
    });
  cli = registerMeasure(cli);
  cli = registerScreen(cli);
  cli = registerFlight(cli);
  cli = registerExplain(cli);
  cli = registerPaper(cli);
  cli = registerView(cli);
  cli = registerForce(cli);
  cli = registerLandmarks(cli);
  cli = registerCalibrate(cli);
  await cli.parseAsync();
}

main(hideBin(process.argv)).catch(exitWithError);
