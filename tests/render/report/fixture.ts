/**
 * A bullpen report's model made by hand (invented test data): pitchers with names in
 * several scripts, pitch types with throws on a line through the plot, residuals and
 * orientations of plausible size. Not a physical session: the drawing tests read
 * only what the renderers are given.
 */
import { DEFAULT_SEAM_SHAPE } from "../../../geometry/seamCurve.js";
import type { Vec3 } from "../../../geometry/vec.js";
import { measureText, type FontWeight } from "../../../src/render/fonts.js";
import type { ReportModel, ReportPitcher, ReportPitchType, ReportThrow } from "../../../src/render/report/model.js";
import type { SceneNode } from "../../../src/render/scene.js";

export const NAMES = {
  latin: "Zoë Ångström",
  cyrillic: "Иван Петров",
  greek: "Σοφία Παπαδοπούλου",
  vietnamese: "Nguyễn Thị Hương",
  arabic: "محمد علي",
  hebrew: "דוד לוי",
  chinese: "李小龙",
  japanese: "山田 太郎",
  korean: "김민준",
  // no face shipped holds Thai or emoji: each grapheme prints as U+FFFD
  lacked: "สม 👍🏽 Karim",
} as const;

function throwsOf(n: number, armIn: number, upIn: number, spinMinutes: number, gapMinutes: number): ReportThrow[] {
  return Array.from({ length: n }, (_, k) => ({
    observed: { armSideIn: armIn + 0.4 * k, upIn: upIn - 0.3 * k },
    predicted: { armSideIn: armIn + 0.4 * k - 2, upIn: upIn - 0.3 * k + 1.5 },
    spinMinutes: spinMinutes + 2 * k,
    observedMinutes: spinMinutes + 2 * k + gapMinutes,
  }));
}

export function pitchType(pitch: string, i: number, opts: { rows?: number; beyond?: boolean; orientations?: number } = {}): ReportPitchType {
  const rows = opts.rows ?? 8;
  const axes: Vec3[] = [
    [0.1467, 0.8605, -0.4879],
    [0.3131, 0.9337, -0.1736],
    [0, 0, 1],
  ];
  return {
    pitch,
    rows,
    throws: throwsOf(rows, 4 + 3 * i, 12 - 4 * i, 60 + 45 * i, 10 * (i % 3) - 10),
    residual: { armSideIn: 2.25 + i, verticalIn: -1.85 - i, sdArmSideIn: 1.21, sdVerticalIn: 0.82 },
    reach: { alongResidualIn: opts.beyond ? 1.44 : 7.79, beyondReach: !!opts.beyond },
    orientations: axes.slice(0, opts.orientations ?? 3).map((axis, k) => ({ axis, latLon: `${29 + k}.2S,80.${k}E`, landmark: `node-${k + 1}`, fitErrorIn: 0.79 + 0.1 * k })),
  };
}

export function pitcher(name: string, types: readonly string[], hand = "right"): ReportPitcher {
  return { name, hand, view: "pitcher", types: types.map((t, i) => pitchType(t, i, { beyond: i === 1 })) };
}

export function reportOf(pitchers: readonly ReportPitcher[]): ReportModel {
  return { basis: "trade", windowFt: 50, model: { name: "default", hash: "6c7f8250" }, gapFlagMinutes: 20, seamShape: DEFAULT_SEAM_SHAPE, pitchers };
}

/** A text node's words and its left and right ends (anchor applied, widths from the face) and baseline. */
export interface TextExtent {
  readonly text: string;
  readonly left: number;
  readonly right: number;
  readonly y: number;
}

/**
 * Every text node under `node` with its extent, in the drawing's units; nested
 * drawings (`svg` nodes: the charts and balls on a page) are left out when `nested` is false.
 */
export function textExtents(node: SceneNode, nested = true, inherited = { size: 16, weight: "normal" as FontWeight, anchor: "start" }, out: TextExtent[] = []): TextExtent[] {
  const a = node.attrs;
  const style = {
    size: a["font-size"] !== undefined ? Number(a["font-size"]) : inherited.size,
    weight: (a["font-weight"] !== undefined ? String(a["font-weight"]) : inherited.weight) as FontWeight,
    anchor: a["text-anchor"] !== undefined ? String(a["text-anchor"]) : inherited.anchor,
  };
  if (node.tag === "text") {
    const w = measureText(node.text ?? "", style.size, style.weight);
    const x = Number(a.x);
    const left = style.anchor === "middle" ? x - w / 2 : style.anchor === "end" ? x - w : x;
    out.push({ text: node.text ?? "", left, right: left + w, y: Number(a.y) });
  }
  for (const ch of node.children) if (nested || ch.tag !== "svg") textExtents(ch, nested, style, out);
  return out;
}
