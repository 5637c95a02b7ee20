/**
 * Builds the 3-D page in Node: bundles the page's TypeScript sources (this folder,
 * geometry/ and the samplers, three.js, gl-matrix) with esbuild into one IIFE,
 * and inlines it with the data and the style sheet into one HTML file.
 *
 * The bundle is made from the SOURCE files, found from the project root, not from
 * the compiled out/build/ tree: the CLI runs from out/build/src/cli/, and esbuild
 * reads TypeScript itself. esbuild is imported only when a page is built, so the
 * other commands never load it.
 */
import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { projectRoot, TOOL_NAME, TOOL_VERSION } from "../../version.js";
import type { ScreenResult } from "../../screening/screen.js";
import type { ScreenReport } from "../../screening/report.js";
import type { ViewData, ViewPitch } from "./data.js";
import { renderViewHtml } from "./html.js";
import { PAGE_CSS } from "./styles.js";

/** The page's entry module, relative to the project root. */
export const PAGE_ENTRY = join("src", "render", "page3d", "main.ts");

/** The data the page embeds, from screened pitches (the form `runScreens` returns). */
export function viewData(team: string | undefined, screened: readonly { result: ScreenResult; report: ScreenReport }[]): ViewData {
  const pitches: ViewPitch[] = screened.map(({ result, report }) => ({
    report,
    frame: {
      spinAxis: result.frame.spinAxis,
      flight: result.frame.flight,
      pushLine: result.frame.pushLine,
      magnus: result.frame.magnus,
      armSide: result.frame.armSide,
    },
  }));
  return { tool: TOOL_NAME, version: TOOL_VERSION, command: "view", ...(team ? { team } : {}), pitches };
}

/** A CSP hash source for an inline element's exact text. */
export function cspHash(text: string): string {
  return `'sha256-${createHash("sha256").update(text, "utf8").digest("base64")}'`;
}

/**
 * The page script: `src/render/page3d/main.ts` under `root` bundled into a minified IIFE.
 * Throws Error (not an input error) when the sources or esbuild are missing: that is
 * a broken installation, not a bad command line.
 */
export async function bundlePageScript(root: string = projectRoot()): Promise<string> {
  const entry = join(root, PAGE_ENTRY);
  if (!existsSync(entry)) throw new Error(`the 3-D page's source ${entry} is missing; the view command needs the project's src/ and geometry/ folders`);
  let esbuild: typeof import("esbuild");
  try {
    esbuild = await import("esbuild");
  } catch (err) {
    throw new Error(`the view command needs esbuild to build its page, and it could not be loaded (${(err as Error).message.split("\n")[0]})`);
  }
  let result: import("esbuild").BuildResult<{ write: false; metafile: true }>;
  try {
    result = await esbuild.build({
      entryPoints: [entry],
      absWorkingDir: root,
      bundle: true,
      write: false,
      format: "iife",
      minify: true,
      platform: "browser",
      // fixed, so the bytes do not change with esbuild's default target
      target: "es2022",
      legalComments: "eof",
      charset: "ascii",
      logLevel: "silent",
      metafile: true,
    });
  } catch (err) {
    const first = (err as { errors?: { text: string; location?: { file: string; line: number } | null }[] }).errors?.[0];
    const where = first?.location ? ` (${first.location.file}:${first.location.line})` : "";
    throw new Error(`bundling the 3-D page failed: ${first ? first.text + where : (err as Error).message.split("\n")[0]}`);
  }
  // the bundled packages' licences go with the code (three.js keeps its own short notice; gl-matrix has none inline)
  return result.outputFiles[0].text + licenceNotices(root, Object.keys(result.metafile.inputs));
}

/** The packages that bundled input paths (relative to the project root) come from: name and folder, sorted by name. */
export function bundledPackages(inputs: readonly string[]): { name: string; dir: string }[] {
  const found = new Map<string, string>();
  for (const input of inputs) {
    const m = /^(.*?node_modules\/((?:@[^/]+\/)?[^/]+))\//.exec(input.replace(/\\/g, "/"));
    if (m && !found.has(m[2])) found.set(m[2], m[1]);
  }
  return [...found].sort((a, b) => (a[0] < b[0] ? -1 : 1)).map(([name, dir]) => ({ name, dir }));
}

/** One comment with each bundled package's licence file, ready to append to the script. */
function licenceNotices(root: string, inputs: readonly string[]): string {
  const blocks = bundledPackages(inputs).map(({ name, dir }) => {
    const folder = join(root, dir);
    const file = existsSync(folder) ? readdirSync(folder).sort().find((f) => /^licen[cs]e(\.md|\.txt)?$/i.test(f)) : undefined;
    const text = file ? readFileSync(join(folder, file), "utf8").trim() : "(no licence file found in the package; see its package.json)";
    // nothing in a licence may close the comment or the script element
    return `${name}:\n${text.replace(/\*\//g, "* /").replace(/<\/script/gi, "< /script").replace(/<!--/g, "< !--")}`;
  });
  return blocks.length ? `\n/*! Licences of the bundled packages\n\n${blocks.join("\n\n")}\n*/\n` : "";
}

/** The whole page for `data`. Deterministic: the same data and sources give the same bytes. */
export async function buildViewHtml(data: ViewData, root: string = projectRoot()): Promise<string> {
  const script = await bundlePageScript(root);
  return renderViewHtml({ data, script, css: PAGE_CSS, scriptHash: cspHash(script), styleHash: cspHash(PAGE_CSS) });
}
