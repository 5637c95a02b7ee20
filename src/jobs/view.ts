/** The view job: the screen drawn as one self-contained 3-D page (one HTML file) that opens offline. */
import { InputError } from "../io/errors.js";
import { writesStraight } from "../io/outputPlan.js";
import { quote } from "../io/quote.js";
import { buildViewHtml, viewData } from "../render/page3d/build.js";
import type { Request } from "./request/values.js";
import { parseScreen, runScreen, type ScreenJob } from "./screen.js";

/** Where the page goes unless --out says otherwise. */
export const DEFAULT_VIEW_OUT = "out/view.html";

export interface ViewJob {
  readonly screen: ScreenJob;
}

export function parseView(request: Request): ViewJob {
  const out = request.out;
  // "" and folders are the output plan's to refuse; a device or pipe has no name to check
  if (typeof out === "string" && out !== "" && !writesStraight(out) && !/\.html?$/i.test(out)) {
    throw new InputError(`--out ${quote(out)} does not end in .html; expected an .html file name such as ${DEFAULT_VIEW_OUT} (browsers open it by that ending)`);
  }
  return { screen: parseScreen(request) };
}

export async function runView(job: ViewJob): Promise<{ html: string; pitches: number }> {
  const outcome = runScreen(job.screen);
  const html = await buildViewHtml(viewData(job.screen.team, outcome.screened));
  return { html, pitches: outcome.screened.length };
}
