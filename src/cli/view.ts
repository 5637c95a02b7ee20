/** `seam-atlas view`: the screen, drawn as one self-contained 3-D page that opens offline from any folder. */
import { statSync } from "node:fs";
import type { Argv } from "yargs";
import { buildViewHtml, viewData } from "../render/page3d/build.js";
import { DEFAULT_TOP } from "../screening/screen.js";
import { InputError } from "./errors.js";
import { withSamplerOptions } from "./measure.js";
import { parseInteger } from "./parse.js";
import { runScreens, withPitchOptions, withScreenOptions } from "./screen.js";
import { writeAtomic } from "./writeAtomic.js";

/** Where the page goes unless --out says otherwise. */
export const DEFAULT_VIEW_OUT = "out/view.html";

export function registerView(y: Argv): Argv {
  return y.command(
    "view",
    "screen a pitch and write a self-contained 3-D page (one HTML file, no network needed): the ball turning in the separation band, the push, the candidates and the reference holds",
    (c) =>
      withScreenOptions(
        withSamplerOptions(
          withPitchOptions(c)
            .option("top", { type: "string", default: String(DEFAULT_TOP), describe: "how many candidates to show (1 to 50)", requiresArg: true })
            .option("out", { type: "string", default: DEFAULT_VIEW_OUT, describe: "the HTML file to write (written whole or not at all)", requiresArg: true })
            .example("$0 view --demo", "the demo staff, to out/view.html")
            .example("$0 view --hand right --speed 92 --spin 2150 --tilt 1:45 --want arm", "one pitch, to out/view.html"),
        ),
      ),
    (argv) => runView(argv as unknown as Record<string, unknown>),
  );
}

/** The --out path, checked: one value, an .html or .htm name, not an existing folder. */
export function parseViewOut(value: unknown): string {
  if (Array.isArray(value)) throw new InputError(`--out was given ${value.length} times; give it once (an .html file name)`);
  const path = String(value ?? "").trim();
  if (path === "") throw new InputError(`--out is empty; expected an .html file name such as ${DEFAULT_VIEW_OUT}`);
  if (!/\.html?$/i.test(path)) throw new InputError(`--out "${path}" does not end in .html; expected an .html file name such as ${DEFAULT_VIEW_OUT} (browsers open it by that ending)`);
  let isDirectory = false;
  try {
    isDirectory = statSync(path).isDirectory();
  } catch {
    // a path that does not exist yet is what we expect
  }
  if (isDirectory) throw new InputError(`--out "${path}" is a folder; expected an .html file name`);
  return path;
}

export async function runView(argv: Record<string, unknown>): Promise<void> {
  const top = parseInteger("top", argv.top, "a whole number from 1 to 50");
  if (!(top >= 1 && top <= 50)) throw new InputError(`--top ${top} is out of range; expected 1 to 50`);
  const out = parseViewOut(argv.out);
  const { team, results } = runScreens(argv, top);
  const html = await buildViewHtml(viewData(team, results));
  writeAtomic(out, html);
  const count = results.length === 1 ? "1 pitch" : `${results.length} pitches`;
  process.stdout.write(`wrote ${out} (${count}, ${Math.round(Buffer.byteLength(html) / 1024)} KB; opens offline in a browser with WebGL)\n`);
}
