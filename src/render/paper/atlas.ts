/**
 * The ranked grip atlas: a multi-page PDF for one pitch or a staff.
 *   1. cover: the pitches, each with its best grip, and the caution
 *   2. how to read the atlas
 *   per pitch: the sphere map of scores (Hammer equal-area) with the candidates
 *   numbered and the reference holds marked, then the candidates ranked as cards,
 *   the reference holds beside them
 *   last: the caution page
 * Every number comes from the screen report (src/screening/report.ts) through the
 * shared formats, so it equals what `screen --json` gives.
 */
import { M_PER_IN } from "../../../geometry/units.js";
import type { Band } from "../../sampling/band.js";
import { fixed, formatMovementIn } from "../numbers.js";
import type { ScreenReport } from "../../screening/report.js";
import type { ScreenResult } from "../../screening/screen.js";
import { TOOL_VERSION } from "../../version.js";
import { renderSphereMapSvg } from "../sphereMapDrawing.js";
import { cardContent, cardOrigins, drawCard } from "./card.js";
import type { Layout } from "./layouts.js";
import { addPage, drawSvg, finish, newDocument, PT_PER_IN, textInBox, type Doc } from "./pdfDoc.js";
import { CAUTION_LONG, CAUTION_SHORT, pitchSummary } from "./words.js";

export interface AtlasPitch {
  readonly result: ScreenResult;
  readonly report: ScreenReport;
}

export interface AtlasInput {
  readonly layout: Layout;
  readonly team?: string;
  readonly pitches: readonly AtlasPitch[];
  readonly band: Band;
  readonly seamShape: number;
  readonly onPage?: (done: number, total: number) => void;
}

const WANT: Record<string, string> = { arm: "arm side", glove: "glove side", up: "up", down: "down", any: "either way" };

export const HOW_TO_READ = [
  "What this atlas is. For each pitch it screens every place on the ball where the spin axis could pierce it, and ranks the distinct grips by the seam movement they add toward the wanted direction, in inches at the plate. One seam-force model gives every number: the direction, the inches and the ranking. The numbers are a model's, for planning lab time, not a promise: calibrate it to your own measurements (README).",
  "The model. At each instant the air leaves the ball at a separation line. Where a seam sits well ahead of that line it trips the boundary layer, which then clings longer on that side; where a seam sits in the separation band it fixes the line at itself. A ball pushed by an uneven separation line moves toward the side that separates later. As the ball turns these change; the model follows them through each turn.",
  "Seam movement. The seam part of the movement at the front of the plate, read as the trade reads movement (a constant-acceleration fit over the last 50 ft, gravity removed): arm side and up, in inches, and its direction as a clock reading from behind the pitcher or the catcher, as the pitch's tilt is.",
  "The sphere map. Each cell is one spin-axis position on the ball, drawn on the Hammer equal-area projection of the ball's own frame (longitude from the seam's node-1, latitude toward waist-A), coloured by the seam movement toward the wanted direction, in inches. The seam is drawn over it. Numbered hexagons are the candidates, crossed squares the four-seam and two-seam holds.",
  "Score and robustness. The score is the seam movement toward the wanted direction (its size when any direction will do). No one places the axis exactly: 'mean' and 'p10' are the score's average and its 10th percentile when the axis wanders on the ball by about 5 degrees. A grip whose p10 stays close to its score is forgiving.",
  "Seam passes per turn and seam in band. How many times a seam crosses the front of the ball per revolution (4 for the four-seam hold, 2 for the two-seam), and the share of the seam that sits in the separation band through a turn (occupancy, not the push).",
  "Finger placement. Index and middle pads sit side by side along the spin axis at the back of the ball at release, with the thumb beneath. The grip may slide along the spin equator without changing the prediction; the card puts the pads where they rest on or nearest a seam.",
];

function coverPage(doc: Doc, input: AtlasInput): void {
  const L = input.layout;
  const f = L.fonts;
  const m = L.marginIn;
  const w = L.page.widthIn - 2 * m;
  textInBox(doc, "Grip atlas", { xIn: m, yIn: m, wIn: w, hIn: 0.5 }, { font: f.bold, sizePt: f.titleSizePt + 6 });
  textInBox(doc, input.team ?? "One pitch", { xIn: m, yIn: m + 0.55, wIn: w, hIn: 0.3 }, { font: f.body, sizePt: f.sizePt + 2, color: "#333333" });
  textInBox(doc, `Seam orientations ranked by predicted wake asymmetry. seam-atlas ${TOOL_VERSION}.`, { xIn: m, yIn: m + 0.9, wIn: w, hIn: 0.3 }, { font: f.body, sizePt: f.sizePt, color: "#555555" });
  let y = m + 1.4;
  for (const p of input.pitches) {
    const r = p.report;
    const best = r.candidates[0];
    const head = `${r.input.pitch.pitcher ? `${r.input.pitch.pitcher} - ` : ""}${r.input.pitch.name}`;
    textInBox(doc, head, { xIn: m, yIn: y, wIn: w, hIn: 0.25 }, { font: f.bold, sizePt: f.sizePt + 1 });
    const line2 = pitchSummary(r);
    const line3 =
      best && !r.reach.outOfReach
        ? `best grip #1: axis ${best.latLon.text}, seam movement ${formatMovementIn(best.seamMovement.armSideIn)} in arm side / ${formatMovementIn(best.seamMovement.verticalIn)} in up toward ${best.seamMovement.clock ?? "-"}, robustness ${formatMovementIn(best.robustness.meanIn)} / ${formatMovementIn(best.robustness.p10In)} in, ${best.crossingsPerRevolution} seam passes per turn`
        : `the seams cannot push this pitch ${WANT[r.input.pitch.want]} (at most ${fixed(r.reach.wantPct, 0)} % of the strongest seam movement)`;
    textInBox(doc, `${line2}\n${line3}`, { xIn: m + 0.15, yIn: y + 0.24, wIn: w - 0.15, hIn: 0.6 }, { font: f.body, sizePt: f.sizePt - 1, color: "#333333" });
    y += 0.95;
    if (y > L.page.heightIn - m - 1.6) break;
  }
  doc.save().rect(m * PT_PER_IN, (L.page.heightIn - m - 1.1) * PT_PER_IN, w * PT_PER_IN, 1.0 * PT_PER_IN).fillColor("#f6efe6").fill().restore();
  textInBox(doc, CAUTION_SHORT, { xIn: m + 0.15, yIn: L.page.heightIn - m - 1.0, wIn: w - 0.3, hIn: 0.85 }, { font: f.body, sizePt: f.sizePt, color: "#7a2f1d" });
}

function textPage(doc: Doc, L: Layout, title: string, paragraphs: readonly string[]): void {
  const f = L.fonts;
  const m = L.marginIn;
  const w = L.page.widthIn - 2 * m;
  textInBox(doc, title, { xIn: m, yIn: m, wIn: w, hIn: 0.5 }, { font: f.bold, sizePt: f.titleSizePt });
  doc.font(f.body).fontSize(f.sizePt).fillColor("#1b1b1b");
  doc.text(paragraphs.join("\n\n"), m * PT_PER_IN, (m + 0.7) * PT_PER_IN, { width: w * PT_PER_IN, lineGap: 2, paragraphGap: 4 });
}

function mapPage(doc: Doc, input: AtlasInput, p: AtlasPitch, index: number): void {
  const L = input.layout;
  const f = L.fonts;
  const m = L.marginIn;
  const w = L.page.widthIn - 2 * m;
  const r = p.report;
  const pp = r.input.pitch;
  textInBox(doc, `${pp.pitcher ? `${pp.pitcher} - ` : ""}${pp.name}: where the spin axis could sit`, { xIn: m, yIn: m, wIn: w, hIn: 0.4 }, { font: f.bold, sizePt: f.titleSizePt - 4 });
  textInBox(doc, pitchSummary(r), { xIn: m, yIn: m + 0.45, wIn: w, hIn: 0.4 }, { font: f.body, sizePt: f.sizePt - 1, color: "#333333" });
  const values = p.result.scores.map((x) => x / M_PER_IN);
  const svg = renderSphereMapSvg(values, p.result.grid, {
    widthPx: 720,
    title: pp.want === "any" ? "seam movement over every spin-axis position" : `seam movement toward ${WANT[pp.want]} over every spin-axis position`,
    valueLabel: "seam movement, in",
    seamShape: input.seamShape,
    candidates: r.candidates.map((c) => ({ direction: c.axis, label: String(c.rank) })),
    referenceHolds: r.references.map((c) => ({ direction: c.axis, label: c.reference === "four-seam" ? "4S" : "2S" })),
    valueDigits: 1,
    idPrefix: `map${index}`,
  });
  drawSvg(doc, svg, L.blocks.map);
  const lines = [
    `The strongest seam movement anywhere on the ball is ${fixed(r.reach.strongestIn, 1)} in.` +
      (pp.want === "any" ? "" : r.reach.outOfReach ? ` The seams cannot push ${WANT[pp.want]} for this spin (${fixed(r.reach.wantPct, 0)} % of that at best).` : ` Toward ${WANT[pp.want]} the best is ${fixed(r.reach.bestTowardIn, 1)} in (${fixed(r.reach.wantPct, 0)} %).`),
    `${r.grid.count.toLocaleString("en-US")} positions at ${r.input.settings.gridSpacingDeg} deg; ${r.maximaFound} distinct maxima; ranked by ${r.input.settings.rank}.`,
    "",
    ...[...r.candidates, ...r.references].map((o, k) => {
      const label = o.reference ? `${o.reference} hold` : `#${o.rank}`;
      const mv = o.seamMovement;
      return `${label}: axis ${o.latLon.text} (${o.landmark.name}), seam movement ${formatMovementIn(mv.armSideIn)} in arm side / ${formatMovementIn(mv.verticalIn)} in up toward ${mv.clock ?? "-"}, score ${formatMovementIn(o.score)} in, robustness ${formatMovementIn(o.robustness.meanIn)} / ${formatMovementIn(o.robustness.p10In)} in, ${o.crossingsPerRevolution} passes per turn`;
    }),
  ];
  textInBox(doc, lines.join("\n"), L.blocks.mapNotes, { font: f.body, sizePt: f.sizePt - 1.5, lineGap: 1.5 });
}

export async function renderAtlasPdf(input: AtlasInput): Promise<{ bytes: Buffer; pages: number }> {
  const L = input.layout;
  const perPage = L.grid!.columns * L.grid!.rows;
  const total = 3 + input.pitches.reduce((s, p) => s + 1 + Math.ceil((p.report.candidates.length + p.report.references.length) / perPage), 0);
  let pages = 1;
  const tick = () => input.onPage?.(pages, total);
  const doc = newDocument(L, `Grip atlas${input.team ? ` - ${input.team}` : ""}`);
  coverPage(doc, input);
  tick();
  addPage(doc, L);
  pages++;
  textPage(doc, L, "How to read this atlas", HOW_TO_READ);
  tick();
  input.pitches.forEach((p, i) => {
    addPage(doc, L);
    pages++;
    mapPage(doc, input, p, i);
    tick();
    const all = [
      ...p.report.candidates.map((rep, k) => ({ rep, screened: p.result.candidates[k] })),
      ...p.report.references.map((rep, k) => ({ rep, screened: p.result.references[k] })),
    ];
    const origins = cardOrigins(L);
    all.forEach((o, k) => {
      if (k % perPage === 0) {
        addPage(doc, L);
        pages++;
        tick();
      }
      const content = cardContent(p.report, o.rep, o.screened, input.band, input.seamShape, `p${i}c${k}`);
      drawCard(doc, L.card!, content, origins[k % perPage]);
    });
  });
  addPage(doc, L);
  pages++;
  textPage(doc, L, "Cautions", CAUTION_LONG);
  tick();
  return { bytes: await finish(doc), pages };
}
