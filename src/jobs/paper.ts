/**
 * The paper jobs: a grip card (PDF, SVG or PNG), a sheet of cards (one pitch's grips
 * with the classic holds, or one card per pitch for a staff), the ranked atlas, the
 * clinic handout, and the sphere map as a picture. One pitch is screened here; a
 * staff sheet's pitches on the worker pool as the atlas's are (screenPool.ts); the
 * drawing is src/render/paper/.
 */
import { InputError } from "../io/errors.js";
import { cardContent, cardScene, outOfReachContent, sheetScenes, type CardContent } from "../render/paper/card.js";
import { renderCardSvg } from "../render/paper/cardSvg.js";
import { pdfOfPages, type Page } from "../render/paper/document.js";
import { figureScene, handoutFigures, renderHandoutPdf, type Clinic } from "../render/paper/handout.js";
import type { Layout } from "../render/paper/layouts.js";
import { nearestReachable, WANT_WORDS } from "../render/paper/words.js";
import { sceneToPng } from "../render/png.js";
import { mapMarksIn, scaleRange, sphereMapScene } from "../render/sphereMapDrawing.js";
import { fixed } from "../render/numbers.js";
import type { ScreenReport } from "../screening/report.js";
import { TOP_RANGE } from "../screening/screen.js";
import { buildModel, modelChoice } from "./request/model.js";
import { samplerSettings } from "./request/settings.js";
import { onePitch } from "./request/pitch.js";
import { threadsChoice } from "./request/runtime.js";
import { parseInteger, type Request } from "./request/values.js";
import { seamFor } from "../sampling/measure.js";
import { mapValuesIn, parseScreen, screenOne, type ScreenedPitch, type ScreenJob } from "./screen.js";
import { assertPrintable, checkNames, layoutOf } from "./paperRequest.js";
import type { TopChoice } from "./screenJob.js";
import { screenAllPooled } from "./screenPool.js";

/** What a paper job produces. */
export interface PaperOutput {
  readonly bytes: Uint8Array | string;
  readonly format: "pdf" | "svg" | "png";
  readonly pages: number;
  readonly pitches: number;
}

export type PictureFormat = "pdf" | "svg" | "png";

export interface CardJob {
  readonly screen: ScreenJob;
  /** The screen's request and top options: a worker thread builds the same job from them (screenPool.ts). */
  readonly screenRequest: Request;
  readonly top: TopChoice;
  /** Worker threads for a staff sheet (--threads; "auto": screenPool.ts autoScreenThreads). */
  readonly threads: number | "auto";
  readonly layout: Layout;
  readonly format: PictureFormat;
  readonly candidate: number;
  readonly reference?: "four-seam" | "two-seam";
}

export function parseCard(request: Request): CardJob {
  const layout = layoutOf(String(request.layout ?? "index-card-4x6"), ["card", "sheet"]);
  if (request.svg === true && request.png === true) throw new InputError("give --svg or --png, not both");
  const format: PictureFormat = request.svg === true ? "svg" : request.png === true ? "png" : "pdf";
  if (format !== "pdf" && layout.kind !== "card") throw new InputError(`--${format} draws one card; --layout ${layout.name} is a sheet (leave out --${format} for a PDF)`);
  if (request.candidate !== undefined && request.reference !== undefined) throw new InputError(`give --candidate N or --reference four-seam|two-seam, not both`);
  const n = parseInteger("candidate", request.candidate ?? "1", "a candidate number, 1 or more");
  if (n < 1 || n > TOP_RANGE[1]) throw new InputError(`--candidate ${n} is out of range; expected 1 to ${TOP_RANGE[1]}`);
  let reference: CardJob["reference"];
  if (request.reference !== undefined) {
    const r = String(request.reference);
    if (r !== "four-seam" && r !== "two-seam") throw new InputError(`--reference "${r}" is not one of four-seam, two-seam`);
    reference = r;
  }
  const perPage = layout.kind === "card" ? 1 : layout.grid!.columns * layout.grid!.rows;
  const screenRequest: Request = { ...request, top: undefined };
  const top: TopChoice = { atLeast: Math.max(n, perPage) };
  const screen = parseScreen(screenRequest, top);
  if (layout.kind === "card") onePitch(request, screen.pitches, "card", "a card layout prints one: choose one with --pitch-name, or give a sheet layout for a staff sheet, one card per pitch");
  checkNames(screen);
  return { screen, screenRequest, top, threads: threadsChoice(request), layout, format, candidate: n, reference };
}

/** The one line `card` stops with when the wanted direction is out of reach. */
export function outOfReachMessage(r: ScreenReport): string {
  const want = r.input.pitch.want;
  const near = nearestReachable(r);
  const instead = near ? `; the nearest direction they can add to is ${near.name} (up to ${fixed(near.bestTowardIn, 1)} in, ${fixed(near.pct, 0)} %): try --want ${near.key}` : "";
  return (
    `--want ${want} is out of reach for this spin: the seams add at most ${fixed(r.reach.bestTowardIn, 1)} in of ${WANT_WORDS[want]} movement, ` +
    `${fixed(r.reach.wantPct, 0)} % of their strongest (${fixed(r.reach.strongestIn, 1)} in), so no grip is ranked${instead}, or print a classic hold with --reference four-seam|two-seam`
  );
}

const cardPage = (layout: Layout, c: CardContent): Page => ({ widthIn: layout.page.widthIn, heightIn: layout.page.heightIn, scene: cardScene(layout, c) });

function sheetPages(layout: Layout, contents: readonly CardContent[]): Page[] {
  return sheetScenes(layout, contents).map((scene) => ({ widthIn: layout.page.widthIn, heightIn: layout.page.heightIn, scene }));
}

export async function runCard(job: CardJob): Promise<PaperOutput> {
  const { layout } = job;
  const s = job.screen.sampler;
  const reports =
    job.screen.pitches.length === 1
      ? [screenOne(job.screen, job.screen.pitches[0]).report]
      : (await screenAllPooled(job.screen, job.screenRequest, job.top, job.threads)).map((p) => p.report);
  const contents: CardContent[] = [];
  if (reports.length === 1) {
    const report = reports[0];
    if (job.reference !== undefined) {
      const o = report.references.find((r) => r.reference === job.reference)!;
      contents.push(cardContent(report, o, s.seamShape, "card1"));
    } else {
      if (report.reach.outOfReach) throw new InputError(outOfReachMessage(report));
      const n = job.candidate;
      if (n > report.candidates.length) throw new InputError(`--candidate ${n} is out of range; the screen found ${report.candidates.length} grip(s)`);
      const first = layout.kind === "card" ? n - 1 : 0;
      const count = layout.kind === "card" ? 1 : report.candidates.length - first;
      report.candidates.slice(first, first + count).forEach((o, k) => contents.push(cardContent(report, o, s.seamShape, `card${k + 1}`)));
      // a sheet carries the classic holds after the grips
      if (layout.kind === "sheet") report.references.forEach((o, k) => contents.push(cardContent(report, o, s.seamShape, `hold${k + 1}`)));
    }
  } else {
    // a staff sheet: one card per pitch, its best grip or, out of reach, what the seams can do instead
    reports.forEach((report, i) => {
      if (job.reference !== undefined) contents.push(cardContent(report, report.references.find((r) => r.reference === job.reference)!, s.seamShape, `p${i}`));
      else if (report.reach.outOfReach || !report.candidates.length) contents.push(outOfReachContent(report));
      else contents.push(cardContent(report, report.candidates[Math.min(job.candidate, report.candidates.length) - 1], s.seamShape, `p${i}`));
    });
  }
  if (job.format === "svg") return { bytes: renderCardSvg(layout, contents[0]), format: "svg", pages: 1, pitches: reports.length };
  if (job.format === "png") return { bytes: sceneToPng(cardScene(layout, contents[0])), format: "png", pages: 1, pitches: reports.length };
  const pages = layout.kind === "card" ? [cardPage(layout, contents[0])] : sheetPages(layout, contents);
  return { bytes: await pdfOfPages(pages, contents[0].title), format: "pdf", pages: pages.length, pitches: reports.length };
}

/** The sphere map of one screened pitch as a PNG picture (what `screen --map-png` writes). */
export function mapPng(p: ScreenedPitch, seamShape: number): Buffer {
  const r = p.report;
  const want = r.input.pitch.want;
  const values = mapValuesIn(p);
  const scene = sphereMapScene(values, p.result.grid, {
    widthPx: 720,
    range: scaleRange(values, mapMarksIn(r)),
    title: `${r.input.pitch.pitcher ? `${r.input.pitch.pitcher} \u2013 ` : ""}${r.input.pitch.name}: seam movement ${want === "any" ? "(its size)" : `toward ${WANT_WORDS[want]}`} at the plate`,
    valueLabel: want === "any" ? "seam movement, inches" : "seam movement toward the wanted direction, inches (negative: the other way)",
    seamShape,
    candidates: r.reach.outOfReach ? [] : r.candidates.map((c) => ({ direction: c.axis, label: String(c.rank) })),
    referenceHolds: r.references.map((c) => ({ direction: c.axis, label: c.reference === "four-seam" ? "4S" : "2S" })),
    valueDigits: 1,
  });
  return sceneToPng(scene);
}

export interface HandoutJob {
  readonly layout: Layout;
  readonly request: Request;
  readonly clinic: Clinic;
}

export function parseHandout(request: Request): HandoutJob {
  const layout = layoutOf(String(request.layout ?? "handout-letter"), ["handout"]);
  const text = (name: string): string | undefined => {
    const v = request[name];
    if (v === undefined) return undefined;
    if (Array.isArray(v)) throw new InputError(`--${name} was given ${v.length} times; expected it once`);
    const s = String(v);
    assertPrintable(`--${name}`, s);
    if (s.length > 200) throw new InputError(`--${name} is ${s.length} characters long; expected at most 200 for the header line`);
    return s;
  };
  // the model and seam settings are checked now, so a bad value stops the run before any output is planned
  samplerSettings(request, modelChoice(request).profile);
  return { layout, request, clinic: { name: text("clinic"), date: text("date"), contact: text("contact") } };
}

/** The handout's figures' file names in a --figures-png folder. */
export const FIGURE_FILES = ["four-seam-push.png", "two-seam-push.png"] as const;

export async function runHandout(job: HandoutJob): Promise<PaperOutput & { figures: Buffer[] }> {
  const choice = modelChoice(job.request);
  const s = samplerSettings(job.request, choice.profile);
  const model = buildModel(choice.profile, s.seamShape);
  const seam = seamFor(s.seamShape, s.seamPoints);
  const pdf = await renderHandoutPdf({ layout: job.layout, model, values: choice.profile.values, seam, clinic: job.clinic });
  const figures = job.request["figures-png"] === undefined ? [] : handoutFigures(model, seam).map((f) => sceneToPng(figureScene(f)));
  return { bytes: pdf.bytes, format: "pdf", pages: pdf.pages, pitches: 0, figures };
}
