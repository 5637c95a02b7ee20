/** `seam-atlas card`, `atlas` and `handout`: the printed outputs. */
import { join } from "node:path";
import type { Argv } from "yargs";
import { projectRoot } from "../version.js";
import { textOption, withAirOptions, withPitchOptions, withSamplerOptions, withScreenOptions } from "./options.js";
import { print, progress, writeAtomic } from "./output.js";

function outputPath(argv: Record<string, unknown>, fallback: string): string {
  return typeof argv.out === "string" ? argv.out : join(projectRoot(), "out", fallback);
}

export function registerPaper(y: Argv): Argv {
  return y
    .command(
      "card",
      "print a grip card (PDF, or SVG with --svg): the pitch, two ball drawings, finger placement in words, score, robustness, push and seam movement",
      (c) =>
        withAirOptions(withScreenOptions(
          withSamplerOptions(
            withPitchOptions(c)
              .option("candidate", textOption("which of the screen's candidates (1 = best)", "1"))
              .option("reference", textOption("print a reference hold instead: four-seam or two-seam"))
              .option("layout", textOption("a card or sheet layout from templates/layouts (a sheet holds the top candidates)", "index-card-4x6"))
              .option("svg", { type: "boolean", default: false, describe: "write SVG instead of PDF (card layouts only)" })
              .option("out", textOption("output file [default: out/card.pdf or out/card.svg]"))
              .example("$0 card --hand right --speed 92 --spin 2150 --tilt 1:45 --gyro 10 --want arm", "the best grip card for a sinker")
              .example("$0 card --demo --pitch-name 'Iris Talvela/sinker' --layout letter-sheet-6-cards", "a sheet of cards to cut out"),
          ),
        )),
      async (argv) => {
        const { parseCard, runCard } = await import("../jobs/paper.js");
        const made = await runCard(parseCard(argv));
        const out = outputPath(argv, made.format === "svg" ? "card.svg" : "card.pdf");
        writeAtomic(out, made.bytes);
        print(`wrote ${out}\n`);
      },
    )
    .command(
      "atlas",
      "print the ranked grip atlas (PDF) for a pitch or a staff: cover, sphere maps, candidate cards beside the reference holds, how to read it, cautions",
      (c) =>
        withAirOptions(withScreenOptions(
          withSamplerOptions(
            withPitchOptions(c)
              .option("top", textOption("candidates per pitch (1 to 12)", "4"))
              .option("layout", textOption("an atlas layout from templates/layouts", "atlas-letter"))
              .option("out", textOption("output PDF [default: out/atlas.pdf]"))
              .example("$0 atlas --demo", "the demo staff's atlas in out/atlas.pdf"),
          ),
        )),
      async (argv) => {
        const { parseAtlas, runAtlas } = await import("../jobs/paper.js");
        const made = await runAtlas(parseAtlas(argv), progress());
        const out = outputPath(argv, "atlas.pdf");
        writeAtomic(out, made.bytes);
        print(`wrote ${out} (${made.pages} pages, ${made.pitches} pitch(es))\n`);
      },
    )
    .command(
      "handout",
      "print a clinic handout for players (PDF): what spin and seams do, why the classic holds average out, how to try a grip safely",
      (c) =>
        withSamplerOptions(
          c.option("layout", textOption("a handout layout from templates/layouts", "handout-letter")).option("out", textOption("output PDF [default: out/handout.pdf]")),
        ),
      async (argv) => {
        const { parseHandout, runHandout } = await import("../jobs/paper.js");
        const made = await runHandout(parseHandout(argv));
        const out = outputPath(argv, "handout.pdf");
        writeAtomic(out, made.bytes);
        print(`wrote ${out} (${made.pages} pages)\n`);
      },
    );
}
