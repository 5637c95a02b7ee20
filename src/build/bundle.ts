/**
 * The build's second step (after tsc): bundles, with esbuild, what must load fast
 * or run in a browser.
 *
 * 1. The command line (src/cli/main.ts) into out/build/cli/: one ES module plus a
 *    chunk per command family, and the worker threads' one entry (src/jobs/worker.ts,
 *    out/build/cli/worker.js, sharing the chunks; it screens and explains for the pool,
 *    src/jobs/pool.ts), so `--help` reads one small file and each command
 *    loads only its own stack. Packages whose code reads files next to itself at run
 *    time (pdfkit's fonts), the browser-only three.js and the worker-pool
 *    package stay outside the bundle and load from node_modules when a command needs them.
 * 2. The workbench page's script (src/page/main.ts with three.js, gl-matrix, svg.js
 *    and the tool's own library: the page runs the screen itself, in a worker made from
 *    this same script) into out/build/page/page.js: a minified IIFE with the bundled
 *    packages' licences appended, which `view` inlines into its HTML. The card face's
 *    text functions are the browser's (src/page/pageFonts.ts stands in for
 *    src/render/fonts.ts, which reads the font files in Node). The installed package
 *    ships the script, so nothing is bundled at run time.
 */
import { existsSync, mkdirSync, rmSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import * as esbuild from "esbuild";
import { licenceNotices } from "./licences.js";

/** Packages the CLI bundle leaves in node_modules. */
export const CLI_EXTERNAL = ["pdfkit", "@svgdotjs/svg.js", "three", "esbuild", "piscina", "@resvg/resvg-js", "fontkit", "@fontsource/noto-sans"];

function projectRootFrom(file: string): string {
  let dir = dirname(file);
  for (let i = 0; i < 8; i++) {
    if (existsSync(join(dir, "package.json")) && existsSync(join(dir, "templates"))) return dir;
    dir = dirname(dir);
  }
  throw new Error(`cannot find the project root above ${file}`);
}

async function bundleCli(root: string): Promise<void> {
  const outdir = join(root, "out", "build", "cli");
  rmSync(outdir, { recursive: true, force: true });
  await esbuild.build({
    // the command line and the pool's worker (its own entry: a worker loads a file; screen and explain tasks alike)
    entryPoints: [
      { in: join(root, "src", "cli", "main.ts"), out: "main" },
      { in: join(root, "src", "jobs", "worker.ts"), out: "worker" },
    ],
    absWorkingDir: root,
    bundle: true,
    splitting: true,
    format: "esm",
    platform: "node",
    target: "node20",
    outdir,
    chunkNames: "chunks/[name]-[hash]",
    external: CLI_EXTERNAL,
    // yargs and friends are CommonJS-free ESM; a few dependencies still call require()
    banner: { js: "import { createRequire as __seamAtlasRequire } from 'node:module'; const require = __seamAtlasRequire(import.meta.url);" },
    legalComments: "linked",
    logLevel: "warning",
  });
}

/** In the page, render/fonts.ts (fontkit over the font files) is src/page/pageFonts.ts (the browser over the files the page carries). */
function browserFonts(root: string): esbuild.Plugin {
  const nodeFonts = join(root, "src", "render", "fonts.ts");
  const pageFonts = join(root, "src", "page", "pageFonts.ts");
  return {
    name: "seam-atlas-browser-fonts",
    setup(build) {
      build.onResolve({ filter: /(^|\/)fonts\.js$/ }, (args) => {
        const target = join(args.resolveDir, args.path.replace(/\.js$/, ".ts"));
        return target === nodeFonts ? { path: pageFonts } : undefined;
      });
    },
  };
}

async function bundlePage(root: string): Promise<void> {
  const outdir = join(root, "out", "build", "page");
  mkdirSync(outdir, { recursive: true });
  const result = await esbuild.build({
    entryPoints: [join(root, "src", "page", "main.ts")],
    plugins: [browserFonts(root)],
    absWorkingDir: root,
    bundle: true,
    write: false,
    outdir,
    format: "iife",
    minify: true,
    platform: "browser",
    // fixed, so the bytes do not change with esbuild's default target
    target: "es2022",
    legalComments: "eof",
    charset: "ascii",
    logLevel: "warning",
    metafile: true,
  });
  // the page also carries files of the Noto Sans face (render/page3d/build.ts pageFonts): its licence goes with the others
  const inputs = [...Object.keys(result.metafile.inputs), "node_modules/@fontsource/noto-sans/LICENSE"];
  const script = result.outputFiles[0].text + licenceNotices(root, inputs);
  writeFileSync(join(outdir, "page.js"), script);
  // what each package adds to the minified script (esbuild's own accounting), for npm run bench
  const sizes: Record<string, number> = {};
  for (const [input, info] of Object.entries(result.metafile.outputs[Object.keys(result.metafile.outputs)[0]].inputs)) {
    const pkg = /node_modules\/((?:@[^/]+\/)?[^/]+)\//.exec(input)?.[1] ?? "seam-atlas";
    sizes[pkg] = (sizes[pkg] ?? 0) + info.bytesInOutput;
  }
  writeFileSync(join(outdir, "page-sizes.json"), JSON.stringify({ scriptBytes: script.length, bytesInOutput: sizes }, null, 2) + "\n");
}

async function main(): Promise<void> {
  const root = projectRootFrom(fileURLToPath(import.meta.url));
  await bundleCli(root);
  await bundlePage(root);
}

main().catch((err) => {
  process.stderr.write(`bundling failed: ${(err as Error).message}\n`);
  process.exit(1);
});
