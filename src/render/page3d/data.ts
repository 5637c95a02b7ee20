/**
 * The model the 3-D page embeds as JSON: for each pitch, the screen report exactly
 * as `seam-atlas screen --json` prints it, plus the pitch's field-frame vectors so
 * the page can place the flow frame in the field without redoing the pitch maths.
 */
import type { Vec3 } from "../../../geometry/vec.js";
import type { OrientationReport, ScreenReport } from "../../screening/report.js";

/** Field-frame unit vectors of a pitch (geometry/frames.ts; src/screening/pitch.ts `PitchFrame`). */
export interface FieldFrameVectors {
  readonly spinAxis: Vec3;
  readonly flight: Vec3;
  readonly pushLine: Vec3;
  readonly magnus: Vec3;
  readonly armSide: Vec3;
}

export interface ViewPitch {
  /** The screen report, as `screen --json` prints it for this pitch. */
  readonly report: ScreenReport;
  readonly frame: FieldFrameVectors;
}

export interface ViewData {
  readonly tool: string;
  readonly version: string;
  readonly command: "view";
  readonly team?: string;
  readonly pitches: readonly ViewPitch[];
}

/** One entry of the page's orientation list: a ranked candidate or a reference hold. */
export interface ListedOrientation {
  /** Short label: "#1" or "four-seam hold". */
  readonly label: string;
  readonly orientation: OrientationReport;
}

/** The candidates in rank order, then the reference holds; no candidate when the wanted direction is out of reach. */
export function listOrientations(report: ScreenReport): ListedOrientation[] {
  return [
    ...(report.reach.outOfReach ? [] : report.candidates.map((o) => ({ label: `#${o.rank}`, orientation: o }))),
    ...report.references.map((o) => ({ label: `${o.reference} hold`, orientation: o })),
  ];
}

/** "Pitcher, pitch" as the terminal table heads it (or the pitch alone when no pitcher is named). */
export function pitchLabel(report: ScreenReport): string {
  const p = report.input.pitch;
  return p.pitcher ? `${p.pitcher}, ${p.name}` : p.name;
}
