/** `seam-atlas card`, `atlas` and `handout`: the printed outputs. */
import { join } from "node:path";
import type { Argv } from "yargs";
import type { InputRef, OutputFormat } from "../io/outputPlan.js";
import type { Layout } from "../render/paper/layouts.js";
import { textOption, withAirOptions, withCacheOption, withPitchOptions, withSamplerOptions, withScreenOptions, withThreadsOption } from "./options.js";
import { planRun, print, progress, writeOutput, type PlannedOutput, type WantedOutput } from "./output.js";
import { InputError } from "../io/errors.js";

/**
 * Plans a paper command's one output (--out, or out/FALLBACK in the project) before
 * anything is drawn; the layout file is an input it may not replace.
 */
async function planPaper(argv: Record<string, unknown>, layout: Layout, fallback: string, format: OutputFormat): Promise<PlannedOutput>;
async function planPaper(argv: Record<string, unknown>, layout: Layout, fallback: string, format: OutputFormat, more: WantedOutput[]): Promise<{ main: PlannedOutput; more: (PlannedOutput | undefined)[] }>;
async function planPaper(argv: Record<string, unknown>, layout: Layout, fallback: string, format: OutputFormat, more?: WantedOutput[]): Promise<PlannedOutput | { main: PlannedOutput; more: (PlannedOutput | undefined)[] }> {
  const { inputFiles } = await import("../jobs/request/inputs.js");
  const { layoutPath } = await import("../jobs/paperRequest.js");
  const given = typeof argv.layout === "string" ? argv.layout : layout.name;
  const inputs: InputRef[] = [...inputFiles(argv), { option: "--layout", path: given.endsWith(".json") ? layoutPath(given) : layoutPath(layout.name) }];
  const planned = planRun([{ option: "--out", path: argv.out ?? join("out", fallback), format }, ...(more ?? [])], inputs);
  return more === undefined ? planned[0]! : { main: planned[0]!, more: planned.slice(1) };
}

/** What a paper command prints once its file is written ("wrote PATH ..."), unless the file went to standard output. */
function wrote(out: PlannedOutput, details = ""): void {
  if (out.kind !== "stdout") print(`wrote ${out.given}${details}\n`);
}

export function registerPaper(y: Argv): Argv {
  return y
    .command(
      "card",
      "print a grip card (PDF, or SVG with --svg, PNG with --png) or a sheet of cards: the ball in the pitcher's and the catcher's view, how to hold it in a player's words, and the grip beside the four-seam and two-seam holds",
      (c) =>
        withThreadsOption(withCacheOption(withAirOptions(withScreenOptions(
          withSamplerOptions(
            withPitchOptions(c)
              .option("candidate", textOption("which of the screen's candidates (1 = best) [default: 1]"))
              .option("reference", textOption("print a reference hold instead: four-seam or two-seam"))
              .option("layout", textOption("a card or sheet layout from templates/layouts (a sheet holds one pitch's grips and the classic holds, or one card per pitch of a staff)", "index-card-4x6"))
              .option("svg", { type: "boolean", default: false, describe: "write SVG instead of PDF (card layouts only)" })
              .option("png", { type: "boolean", default: false, describe: "write a PNG picture 1600 px wide instead of PDF (card layouts only)" })
              .option("out", textOption("output file, - for standard output [default: out/card.pdf, .svg or .png]"))
              .example("$0 card --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --want arm", "the best grip card for a sinker")
              .example("$0 card --demo --pitch-name 'Iris Talvela/sinker' --layout letter-4-cards-3x5", "a sheet of grip cards and the classic holds to cut out")
              .example("$0 card --demo --layout letter-2-cards-4x6", "a staff sheet: one card per pitch"),
          ),
        ))), "for a staff sheet, one per core (at most 8) for 3 pitches or more, else none"),
      async (argv) => {
        const { parseCard, runCard } = await import("../jobs/paper.js");
        const job = parseCard(argv);
        const out = await planPaper(argv, job.layout, `card.${job.format}`, job.format);
        const made = await runCard(job);
        writeOutput(out, made.bytes);
        wrote(out, made.format === "pdf" && made.pages > 1 ? ` (${made.pages} pages)` : "");
      },
    )
    .command(
      "atlas",
      "print the ranked grip atlas (PDF) for a pitch or a staff: cover, sphere maps, candidate cards beside the reference holds, how to read it, cautions",
      (c) =>
        withThreadsOption(withCacheOption(withAirOptions(withScreenOptions(
          withSamplerOptions(
            withPitchOptions(c)
              .option("top", textOption("candidates per pitch (1 to 12)", "4"))
              .option("layout", textOption("an atlas layout from templates/layouts", "atlas-letter"))
              .option("out", textOption("output PDF, - for standard output [default: out/atlas.pdf]"))
              .example("$0 atlas --demo", "the demo staff's atlas in out/atlas.pdf"),
          ),
        ))), "one per core (at most 8) for 3 pitches or more, else none"),
      async (argv) => {
        const { parseAtlas, runAtlas } = await import("../jobs/atlas.js");
        const job = parseAtlas(argv);
        const out = await planPaper(argv, job.layout, "atlas.pdf", "pdf");
        const made = await runAtlas(job, progress());
        writeOutput(out, made.bytes);
        wrote(out, ` (${made.pages} pages, ${made.pitches === 1 ? "1 pitch" : `${made.pitches} pitches`})`);
      },
    )
    .command(
      "handout",
      "print a clinic handout for players (PDF): what spin and seams do, why the classic holds average out, how to try a grip safely",
      (c) =>
        withSamplerOptions(
          c
            .option("layout", textOption("a handout layout from templates/layouts", "handout-letter"))
            .option("clinic", textOption("the clinic's name, printed in the header"))
            .option("date", textOption("the clinic's date as it should print, e.g. 14 March 2027"))
            .option("contact", textOption("a contact line for the header, e.g. a coach's name and e-mail"))
            .option("out", textOption("output PDF, - for standard output [default: out/handout.pdf]"))
            .option("figures-png", textOption("also write the two figures as PNG pictures, 1600 px wide, into this folder (four-seam-push.png, two-seam-push.png)"))
            .example("$0 handout --clinic 'Harbor Youth Pitching Clinic' --date '14 March 2027' --contact 'Coach R. Ortega, clinic@example.org'", "the handout with the clinic's header"),
        ),
      async (argv) => {
        const { parseHandout, runHandout } = await import("../jobs/paper.js");
        const job = parseHandout(argv);
        const { FIGURE_FILES } = await import("../jobs/paper.js");
        const folder = argv["figures-png"];
        if (folder !== undefined && (typeof folder !== "string" || folder === "" || folder === "-")) {
          throw new InputError(`--figures-png ${JSON.stringify(folder)} is not a folder; expected a folder for the two figure pictures`);
        }
        const figureOutputs = folder === undefined ? [] : FIGURE_FILES.map((f) => ({ option: "--figures-png", path: join(folder as string, f), format: "png" as const }));
        const out = await planPaper(argv, job.layout, "handout.pdf", "pdf", figureOutputs);
        const made = await runHandout(job);
        writeOutput(out.main, made.bytes);
        out.more.forEach((o, i) => o && writeOutput(o, made.figures[i]));
        wrote(out.main, ` (${made.pages} pages)`);
        for (const o of out.more) if (o && o.kind !== "stdout") print(`wrote ${o.given}\n`);
      },
    );
}
