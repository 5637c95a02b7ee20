/**
 * What the bullpen report draws, in user units (inches, clock minutes), built by the
 * explain job (src/jobs/explainReport.ts). Plain data: the renderers here read only this.
 *
 * Movement is per hand: arm side positive toward the throwing arm's side, up positive
 * (on the trade basis: induced vertical break). Clock minutes are 0 to 719 past 12:00
 * in the pitcher's view given (`view`).
 */
import type { Vec3 } from "../../../geometry/vec.js";

export interface ReportThrow {
  readonly observed: { readonly armSideIn: number; readonly upIn: number };
  readonly predicted: { readonly armSideIn: number; readonly upIn: number };
  readonly spinMinutes: number | null;
  readonly observedMinutes: number | null;
}

export interface ReportOrientation {
  readonly axis: Vec3;
  readonly latLon: string;
  readonly landmark: string;
  readonly fitErrorIn: number;
}

export interface ReportPitchType {
  readonly pitch: string;
  readonly rows: number;
  readonly throws: readonly ReportThrow[];
  readonly residual: { readonly armSideIn: number; readonly verticalIn: number; readonly sdArmSideIn: number; readonly sdVerticalIn: number };
  readonly reach: { readonly alongResidualIn: number; readonly beyondReach: boolean };
  readonly orientations: readonly ReportOrientation[];
}

export interface ReportPitcher {
  readonly name: string;
  readonly hand: string;
  readonly view: string;
  readonly types: readonly ReportPitchType[];
}

export interface ReportModel {
  readonly basis: "trade" | "release";
  readonly windowFt: number | null;
  readonly model: { readonly name: string; readonly hash: string };
  readonly gapFlagMinutes: number;
  readonly seamShape: number;
  readonly pitchers: readonly ReportPitcher[];
}

/** Our marks for pitch types, in the order types appear for a pitcher: a shape and a colour each. */
export const PITCH_MARKS: readonly { readonly shape: "circle" | "square" | "triangle" | "diamond" | "down" | "hexagon" | "cross" | "star"; readonly color: string }[] = [
  { shape: "circle", color: "#1f5f8b" },
  { shape: "square", color: "#c0612b" },
  { shape: "triangle", color: "#4f7d3a" },
  { shape: "diamond", color: "#8a3b8f" },
  { shape: "down", color: "#a07a12" },
  { shape: "hexagon", color: "#2f8f8a" },
  { shape: "cross", color: "#8b3a3a" },
  { shape: "star", color: "#4a5260" },
];

/** The basis in words for labels. */
export function basisWords(m: Pick<ReportModel, "basis" | "windowFt">): string {
  return m.basis === "trade" ? `trade basis: induced vertical and horizontal break over the last ${m.windowFt} ft` : "release basis: at the plate against a spinless flight";
}

/** One line of caution carried on every page. */
export const REPORT_CAUTION =
  "Caution: pitching can injure. Any change of grip or release changes the stress on the arm: raise throwing volume gradually, work with qualified coaches and medical staff, follow league rules on the ball and never alter it. These numbers come from a model, not from measurements of this athlete.";
