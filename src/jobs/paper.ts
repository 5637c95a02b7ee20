/**
 * The paper jobs: a grip card (PDF or SVG) or a sheet of cards, the ranked atlas,
 * and the clinic handout. Screening and flights go through the one shared path
 * (pipeline.ts); the drawing is src/render/paper/.
 */
import { join } from "node:path";
import { InputError } from "../io/errors.js";
import { renderAtlasPdf } from "../render/paper/atlas.js";
import { cardContent, cardOrigins, drawCard } from "../render/paper/card.js";
import { renderCardSvg } from "../render/paper/cardSvg.js";
import { renderHandoutPdf } from "../render/paper/handout.js";
import { LayoutError, loadLayout, type Layout } from "../render/paper/layouts.js";
import { addPage, finish, newDocument } from "../render/paper/pdfDoc.js";
import { TOP_RANGE } from "../screening/screen.js";
import { projectRoot } from "../version.js";
import { screenAll } from "./pipeline.js";
import { samplerSettings, type SamplerSettings } from "./request/settings.js";
import { parseInteger, type Request } from "./request/values.js";
import { parseScreen, screenOne, type ScreenJob } from "./screen.js";

export function layoutsDir(): string {
  return join(projectRoot(), "templates", "layouts");
}

/** A layout by name, of one of the kinds a command takes. */
export function layoutOf(name: string, kinds: readonly string[]): Layout {
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

/** What a paper job produces. */
export interface PaperOutput {
  readonly bytes: Uint8Array | string;
  readonly format: "pdf" | "svg";
  readonly pages: number;
  readonly pitches: number;
}

export interface CardJob {
  readonly screen: ScreenJob;
  readonly layout: Layout;
  readonly svg: boolean;
  readonly candidate: number;
  readonly reference?: "four-seam" | "two-seam";
}

export function parseCard(request: Request): CardJob {
  const layout = layoutOf(String(request.layout ?? "index-card-4x6"), ["card", "sheet"]);
  const svg = request.svg === true;
  if (svg && layout.kind !== "card") throw new InputError(`--svg draws one card; --layout ${layout.name} is a sheet (leave out --svg for a PDF)`);
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
  const screen = parseScreen({ ...request, top: undefined }, { atLeast: Math.max(n, perPage) });
  if (screen.pitches.length !== 1) throw new InputError(`card takes one pitch; the file has ${screen.pitches.length} (choose one with --pitch-name, or use atlas)`);
  return { screen, layout, svg, candidate: n, reference };
}

export async function runCard(job: CardJob): Promise<PaperOutput> {
  const { layout } = job;
  const screened = screenOne(job.screen, job.screen.pitches[0]);
  const { result, report } = screened;
  const cardLayout = layout.kind === "card" ? layout : layout.card!;
  const perPage = layout.kind === "card" ? 1 : layout.grid!.columns * layout.grid!.rows;
  let picks: { screened: (typeof result.candidates)[number]; rep: (typeof report.candidates)[number] }[];
  if (job.reference !== undefined) {
    const i = result.references.findIndex((r) => r.reference === job.reference);
    picks = [{ screened: result.references[i], rep: report.references[i] }];
  } else {
    const n = job.candidate;
    if (n > result.candidates.length) throw new InputError(`--candidate ${n} is out of range; the screen found ${result.candidates.length} candidate(s)`);
    const first = layout.kind === "card" ? n - 1 : 0;
    picks = result.candidates.slice(first, first + perPage).map((s, k) => ({ screened: s, rep: report.candidates[first + k] }));
  }
  const s = job.screen.sampler;
  const contents = picks.map((p, k) => cardContent(report, p.rep, p.screened, s.band, s.seamShape, `card${k + 1}`));
  if (job.svg) return { bytes: renderCardSvg(cardLayout, contents[0]), format: "svg", pages: 1, pitches: 1 };
  const doc = newDocument(layout, contents[0].title);
  let pages = 1;
  if (layout.kind === "card") drawCard(doc, layout, contents[0]);
  else {
    const origins = cardOrigins(layout);
    contents.forEach((c, k) => {
      if (k > 0 && k % origins.length === 0) {
        addPage(doc, layout);
        pages++;
      }
      drawCard(doc, cardLayout, c, origins[k % origins.length]);
    });
  }
  return { bytes: await finish(doc), format: "pdf", pages, pitches: 1 };
}

export interface AtlasJob {
  readonly screen: ScreenJob;
  readonly layout: Layout;
}

export function parseAtlas(request: Request): AtlasJob {
  const layout = layoutOf(String(request.layout ?? "atlas-letter"), ["atlas"]);
  return { layout, screen: parseScreen(request, { fallback: 4, range: [1, 12] }) };
}

export async function runAtlas(job: AtlasJob, tick: (stage: string, done: number, total: number) => void = () => {}): Promise<PaperOutput> {
  const flown = screenAll(job.screen, tick);
  const s = job.screen.sampler;
  const pdf = await renderAtlasPdf({
    layout: job.layout,
    team: job.screen.team,
    pitches: flown.map((f) => ({ result: f.result, report: f.report })),
    band: s.band,
    seamShape: s.seamShape,
    onPage: (done, total) => tick("pages", done, total),
  });
  return { bytes: pdf.bytes, format: "pdf", pages: pdf.pages, pitches: flown.length };
}

export interface HandoutJob {
  readonly layout: Layout;
  readonly sampler: SamplerSettings;
}

export function parseHandout(request: Request): HandoutJob {
  return { layout: layoutOf(String(request.layout ?? "handout-letter"), ["handout"]), sampler: samplerSettings(request) };
}

export async function runHandout(job: HandoutJob): Promise<PaperOutput> {
  const s = job.sampler;
  const pdf = await renderHandoutPdf({ layout: job.layout, band: s.band, seamShape: s.seamShape, seamPoints: s.seamPoints, bandCenterDeg: s.bandCenterDeg, bandWidthDeg: s.bandWidthDeg });
  return { bytes: pdf.bytes, format: "pdf", pages: pdf.pages, pitches: 0 };
}
