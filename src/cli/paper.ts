/** `seam-atlas card`, `atlas` and `handout`: the printed outputs. */
import { join } from "node:path";
import type { Argv } from "yargs";
import { seamMovementIn } from "../physics/pitchFlight.js";
import { renderAtlasPdf, type AtlasPitch } from "../render/paper/atlas.js";
import { cardContent, cardOrigins, drawCard } from "../render/paper/card.js";
import { renderCardSvg } from "../render/paper/cardSvg.js";
import { renderHandoutPdf } from "../render/paper/handout.js";
import { LayoutError, loadLayout, type Layout } from "../render/paper/layouts.js";
import { addPage, finish, newDocument } from "../render/paper/pdfDoc.js";
import type { SeamMovement } from "../render/paper/words.js";
import type { ScreenedOrientation, ScreenResult } from "../screening/screen.js";
import { projectRoot } from "../version.js";
import { InputError } from "./errors.js";
import { withSamplerOptions } from "./measure.js";
import { parseInteger } from "./parse.js";
import { pitchesFromArgs, runScreens, withPitchOptions, withScreenOptions } from "./screen.js";
import { writeAtomic } from "./writeAtomic.js";

export function layoutsDir(): string {
  return join(projectRoot(), "templates", "layouts");
}

function layoutOf(name: string, kinds: readonly string[]): Layout {
  let layout: Layout;
  try {
    layout = loadLayout(layoutsDir(), name);
  } catch (err) {
    if (err instanceof LayoutError) throw new InputError(err.message);
    throw err;
  }
  const a = (k: string) => (/^[aeiou]/.test(k) ? `an ${k}` : `a ${k}`);
  if (!kinds.includes(layout.kind)) throw new InputError(`--layout ${name} is ${a(layout.kind)} layout; this command takes ${a(kinds.join(" or "))} layout`);
  return layout;
}

/** Seam-induced movement of an orientation at the plate, inches (standard air, aimed at the zone). */
export function seamMovement(result: ScreenResult, o: ScreenedOrientation): SeamMovement {
  const s = result.settings;
  return seamMovementIn(result.pitch, o.axis, { band: s.band, seamShape: s.seamShape, seamPoints: s.seamPoints });
}

function outputPath(argv: Record<string, unknown>, fallback: string): string {
  return typeof argv.out === "string" ? argv.out : join(projectRoot(), "out", fallback);
}

/** A progress line on a terminal (stderr), nothing otherwise. */
export function progress(label: string): (done: number, total: number) => void {
  const tty = process.stderr.isTTY === true;
  return (done, total) => {
    if (!tty) return;
    const bar = "#".repeat(Math.round((30 * done) / Math.max(1, total))).padEnd(30, ".");
    process.stderr.write(`\r  ${label} [${bar}] ${done}/${total}${done === total ? "\r\x1b[K" : ""}`);
  };
}

export function registerPaper(y: Argv): Argv {
  return y
    .command(
      "card",
      "print a grip card (PDF, or SVG with --svg): the pitch, two ball drawings, finger placement in words, score, robustness, push and seam movement",
      (c) =>
        withScreenOptions(
          withSamplerOptions(
            withPitchOptions(c)
              .option("candidate", { type: "string", default: "1", describe: "which of the screen's candidates (1 = best)", requiresArg: true })
              .option("reference", { type: "string", describe: "print a reference hold instead: four-seam or two-seam", requiresArg: true })
              .option("layout", { type: "string", default: "index-card-4x6", describe: "a card or sheet layout from templates/layouts (a sheet holds the top candidates)", requiresArg: true })
              .option("svg", { type: "boolean", default: false, describe: "write SVG instead of PDF (card layouts only)" })
              .option("out", { type: "string", describe: "output file [default: out/card.pdf or out/card.svg]", requiresArg: true })
              .example("$0 card --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --want arm", "the best grip card for a sinker")
              .example("$0 card --demo --pitch-name 'Iris Talvela/sinker' --layout letter-sheet-6-cards", "a sheet of cards to cut out"),
          ),
        ),
      (argv) => runCard(argv as unknown as Record<string, unknown>),
    )
    .command(
      "atlas",
      "print the ranked grip atlas (PDF) for a pitch or a staff: cover, sphere maps, candidate cards beside the reference holds, how to read it, cautions",
      (c) =>
        withScreenOptions(
          withSamplerOptions(
            withPitchOptions(c)
              .option("top", { type: "string", default: "4", describe: "candidates per pitch (1 to 12)", requiresArg: true })
              .option("layout", { type: "string", default: "atlas-letter", describe: "an atlas layout from templates/layouts", requiresArg: true })
              .option("out", { type: "string", describe: "output PDF [default: out/atlas.pdf]", requiresArg: true })
              .example("$0 atlas --demo", "the demo staff's atlas in out/atlas.pdf"),
          ),
        ),
      (argv) => runAtlas(argv as unknown as Record<string, unknown>),
    )
    .command(
      "handout",
      "print a clinic handout for players (PDF): what spin and seams do, why the classic holds average out, how to try a grip safely",
      (c) =>
        withSamplerOptions(
          c
            .option("layout", { type: "string", default: "handout-letter", describe: "a handout layout from templates/layouts", requiresArg: true })
            .option("out", { type: "string", describe: "output PDF [default: out/handout.pdf]", requiresArg: true }),
        ),
      (argv) => runHandout(argv as unknown as Record<string, unknown>),
    );
}

async function runCard(argv: Record<string, unknown>): Promise<void> {
  const layout = layoutOf(String(argv.layout), ["card", "sheet"]);
  if (argv.svg && layout.kind !== "card") throw new InputError(`--svg draws one card; --layout ${layout.name} is a sheet (leave out --svg for a PDF)`);
  const n = parseInteger("candidate", argv.candidate, "a candidate number, 1 or more");
  if (n < 1) throw new InputError(`--candidate ${n} is out of range; expected 1 or more`);
  const cardLayout = layout.kind === "card" ? layout : layout.card!;
  const perPage = layout.kind === "card" ? 1 : layout.grid!.columns * layout.grid!.rows;
  const count = pitchesFromArgs(argv).pitches.length;
  if (count !== 1) throw new InputError(`card takes one pitch; the file has ${count} (choose one with --pitch-name, or use atlas)`);
  const { results, sampler } = runScreens(argv, Math.max(n, perPage));
  if (results.length !== 1) throw new InputError(`card takes one pitch; the file has ${results.length} (choose one with --pitch-name, or use atlas)`);
  const { result, report } = results[0];
  let picks: { screened: ScreenedOrientation; rep: (typeof report.candidates)[number] }[];
  if (argv.reference !== undefined) {
    const i = result.references.findIndex((r) => r.reference === argv.reference);
    if (i < 0) throw new InputError(`--reference "${String(argv.reference)}" is not one of four-seam, two-seam`);
    picks = [{ screened: result.references[i], rep: report.references[i] }];
  } else {
    if (n > result.candidates.length) throw new InputError(`--candidate ${n} is out of range; the screen found ${result.candidates.length} candidate(s)`);
    const first = layout.kind === "card" ? n - 1 : 0;
    picks = result.candidates.slice(first, first + perPage).map((screened, k) => ({ screened, rep: report.candidates[first + k] }));
  }
  const contents = picks.map((p, k) =>
    cardContent(report, p.rep, p.screened, sampler.band, sampler.seamShape, seamMovement(result, p.screened), `card${k + 1}`),
  );
  if (argv.svg) {
    const out = outputPath(argv, "card.svg");
    writeAtomic(out, renderCardSvg(cardLayout, contents[0]));
    process.stdout.write(`wrote ${out}\n`);
    return;
  }
  const doc = newDocument(layout, contents[0].title);
  if (layout.kind === "card") drawCard(doc, layout, contents[0]);
  else {
    const origins = cardOrigins(layout);
    contents.forEach((c, k) => {
      if (k > 0 && k % origins.length === 0) addPage(doc, layout);
      drawCard(doc, cardLayout, c, origins[k % origins.length]);
    });
  }
  const out = outputPath(argv, "card.pdf");
  writeAtomic(out, await finish(doc));
  process.stdout.write(`wrote ${out}\n`);
}

async function runAtlas(argv: Record<string, unknown>): Promise<void> {
  const layout = layoutOf(String(argv.layout), ["atlas"]);
  const top = parseInteger("top", argv.top, "a whole number from 1 to 12");
  if (!(top >= 1 && top <= 12)) throw new InputError(`--top ${top} is out of range; expected 1 to 12`);
  const tick = progress("screening");
  const { team, results, sampler } = runScreens(argv, top);
  tick(1, 1);
  const pitches: AtlasPitch[] = [];
  const flyTick = progress("flights");
  let done = 0;
  const total = results.reduce((s, r) => s + r.result.candidates.length + r.result.references.length, 0);
  for (const r of results) {
    const moves = [...r.result.candidates, ...r.result.references].map((o) => {
      const m = seamMovement(r.result, o);
      flyTick(++done, total);
      return m;
    });
    pitches.push({ result: r.result, report: r.report, movements: moves });
  }
  const pageTick = progress("pages");
  const pdf = await renderAtlasPdf({ layout, team, pitches, band: sampler.band, seamShape: sampler.seamShape, onPage: pageTick });
  const out = outputPath(argv, "atlas.pdf");
  writeAtomic(out, pdf.bytes);
  process.stdout.write(`wrote ${out} (${pdf.pages} pages, ${results.length} pitch(es))\n`);
}

async function runHandout(argv: Record<string, unknown>): Promise<void> {
  const layout = layoutOf(String(argv.layout), ["handout"]);
  const { parseSamplerSettings } = await import("./measure.js");
  const s = parseSamplerSettings(argv);
  const pdf = await renderHandoutPdf({ layout, band: s.band, seamShape: s.seamShape, seamPoints: s.seamPoints, bandCenterDeg: s.bandCenterDeg, bandWidthDeg: s.bandWidthDeg });
  const out = outputPath(argv, "handout.pdf");
  writeAtomic(out, pdf.bytes);
  process.stdout.write(`wrote ${out} (${pdf.pages} pages)\n`);
}
