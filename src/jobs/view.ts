/**
 * The view job: the workbench page (one self-contained HTML file that opens offline):
 * the pitches of a pitch file or of the flags screened here and embedded, or none, and
 * everything the page needs to screen and print on its own (the settings, the model
 * profile, the card layouts).
 */
import { InputError } from "../io/errors.js";
import { writesStraight } from "../io/outputPlan.js";
import { quote } from "../io/quote.js";
import { buildViewHtml, viewData } from "../render/page3d/build.js";
import { modelChoice } from "./request/model.js";
import { PITCH_FLAGS, pitchesFromRequest } from "./request/pitch.js";
import type { Request } from "./request/values.js";
import { runScreen, withMapCache, type ScreenJob } from "./screen.js";
import { SCREEN_SETTINGS, screenJobOf } from "./screenJob.js";

/** Where the page goes unless --out says otherwise. */
export const DEFAULT_VIEW_OUT = "out/view.html";

export interface ViewJob {
  readonly screen: ScreenJob;
  readonly settings: Readonly<Record<string, string>>;
}

export function parseView(request: Request): ViewJob {
  const out = request.out;
  // "" and folders are the output plan's to refuse; a device or pipe has no name to check
  if (typeof out === "string" && out !== "" && !writesStraight(out) && !/\.html?$/i.test(out)) {
    throw new InputError(`--out ${quote(out)} does not end in .html; expected an .html file name such as ${DEFAULT_VIEW_OUT} (browsers open it by that ending)`);
  }
  // no pitch at all: the page starts from its own form
  const noPitch = !request.demo && request.pitch === undefined && request["pitch-name"] === undefined && PITCH_FLAGS.every((k) => request[k] === undefined);
  const screen = withMapCache(screenJobOf(request, { pitches: () => (noPitch ? { pitches: [] } : pitchesFromRequest(request)), profile: () => modelChoice(request).profile }), request);
  const settings: Record<string, string> = {};
  for (const key of SCREEN_SETTINGS) if (request[key] !== undefined) settings[key] = String(request[key]);
  return { screen, settings };
}

export async function runView(job: ViewJob): Promise<{ html: string; pitches: number }> {
  const outcome = runScreen(job.screen);
  const source = { team: job.screen.team, fromFile: job.screen.fromFile, profile: job.screen.model.profile, settings: job.settings };
  const html = await buildViewHtml(viewData(source, outcome.screened));
  return { html, pitches: outcome.screened.length };
}
