/**
 * The bullpen report from an explain batch's per-pitch-type results: groups the pitch
 * types by pitcher, builds the report's model (render/report/model.ts) and renders the
 * PDF and, when asked, each chart as SVG and as PNG (PITCHER-movement.svg,
 * PITCHER-direction.svg, .png alike, names made unique by io/slugs.ts): the files are
 * written from the same chart drawings the PDF pages hold (render/report/charts.ts). Loaded only when a report is
 * asked for (pdfkit).
 */
import { uniqueSlugs } from "../io/slugs.js";
import { sceneToPng } from "../render/png.js";
import { directionChartScene, directionChartSvg, movementChartScene, movementChartSvg } from "../render/report/charts.js";
import type { ReportModel, ReportPitcher } from "../render/report/model.js";
import { renderBullpenPdf } from "../render/report/pdf.js";
import { basisNumbers, type PitchTypeResult } from "./explain.js";
import type { ExplainSettings } from "./explainBatch.js";

/** The report's model: pitchers in the order they first appear, their pitch types in the same order. */
export function reportModel(settings: ExplainSettings, types: readonly PitchTypeResult[]): ReportModel {
  const byPitcher = new Map<string, { name: string; hand: string; view: string; types: ReportPitcher["types"][number][] }>();
  for (const t of types) {
    const n = t.numbers;
    const name = n.pitcher === "" ? "(no pitcher named)" : n.pitcher;
    let p = byPitcher.get(name);
    if (!p) {
      p = { name, hand: n.hand, view: t.view, types: [] };
      byPitcher.set(name, p);
    }
    p.types.push({
      pitch: n.pitch === "" ? "(no pitch type)" : n.pitch,
      rows: n.rows,
      throws: t.points,
      residual: n.residual,
      reach: n.reach,
      orientations: n.orientations.map((o) => ({ axis: o.axis, latLon: o.latLon, landmark: o.landmark.name, fitErrorIn: o.fitErrorIn })),
    });
  }
  const b = basisNumbers(settings);
  return {
    basis: b.basis,
    windowFt: b.windowFt === null ? null : Math.round(b.windowFt * 10) / 10,
    model: { name: settings.profile.name, hash: settings.profile.hash },
    gapFlagMinutes: settings.gapFlagMinutes,
    seamShape: settings.seamShape,
    pitchers: [...byPitcher.values()],
  };
}

export async function buildBullpenReport(
  settings: ExplainSettings,
  types: readonly PitchTypeResult[],
  want: { pdf: boolean; svg: boolean; png?: boolean },
): Promise<{ pdf?: Buffer; svgs: { name: string; svg: string }[]; pngs: { name: string; png: Buffer }[] }> {
  const model = reportModel(settings, types);
  const svgs: { name: string; svg: string }[] = [];
  const pngs: { name: string; png: Buffer }[] = [];
  if (want.svg || want.png) {
    const stems = uniqueSlugs(model.pitchers.map((p) => p.name));
    model.pitchers.forEach((p, i) => {
      if (want.svg) {
        svgs.push({ name: `${stems[i]}-movement.svg`, svg: movementChartSvg(p, { basis: model.basis, windowFt: model.windowFt }) });
        svgs.push({ name: `${stems[i]}-direction.svg`, svg: directionChartSvg(p, { gapFlagMinutes: model.gapFlagMinutes }) });
      }
      if (want.png) {
        // the same scenes as the SVG files and the PDF's chart pages
        pngs.push({ name: `${stems[i]}-movement.png`, png: sceneToPng(movementChartScene(p, { basis: model.basis, windowFt: model.windowFt })) });
        pngs.push({ name: `${stems[i]}-direction.png`, png: sceneToPng(directionChartScene(p, { gapFlagMinutes: model.gapFlagMinutes })) });
      }
    });
  }
  return { ...(want.pdf ? { pdf: await renderBullpenPdf(model) } : {}), svgs, pngs };
}
