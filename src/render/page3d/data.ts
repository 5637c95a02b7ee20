/**
 * What the workbench page embeds as JSON: for each pitch of the file (if any), the
 * screen report exactly as `seam-atlas screen --json` prints it, plus the pitch's
 * field-frame vectors so the page can place the flow frame in the field without
 * redoing the pitch maths; and what the page needs to screen and print on its own:
 * the settings `view` was given, the seam-force profile, the card layouts and the
 * card face's metrics.
 */
import type { Vec3 } from "../../../geometry/vec.js";
import type { OrientationReport, ScreenReport } from "../../screening/report.js";
import type { Layout } from "../paper/layouts.js";

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

/** One subset file of the card face (Noto Sans), as the page sets and prints text with it. */
export interface PageFontSubset {
  readonly subset: string;
  /** Per weight: code points the file holds, as inclusive ranges [first, last, first, last, ...]. */
  readonly coverage: { readonly normal: readonly number[]; readonly bold: readonly number[] };
  /** Per weight: the WOFF file, base64, for the subsets the page carries (the others fall back to the browser's own face). */
  readonly woff?: { readonly normal: string; readonly bold: string };
}

export interface PageFonts {
  readonly family: string;
  readonly unitsPerEm: number;
  /** Ascent and descent of the first subset per weight, em (descent negative). */
  readonly metrics: { readonly normal: { ascent: number; descent: number }; readonly bold: { ascent: number; descent: number } };
  /** In the order a character is looked up (render/fonts.ts FONT_SUBSETS). */
  readonly subsets: readonly PageFontSubset[];
}

export interface ViewData {
  readonly tool: string;
  readonly version: string;
  readonly command: "view";
  readonly team?: string;
  /** Whether the pitches came from a pitch file or the demo (the page then offers them in a staff picker). */
  readonly fromFile: boolean;
  readonly pitches: readonly ViewPitch[];
  /** The options `view` was given that shape a screen (grid, spread, rank, top, air, ...), as typed: the page's own screens use them. */
  readonly settings: Readonly<Record<string, string>>;
  /** The seam-force profile in use (after --model and the band options): the page's screens build the same model. */
  readonly model: { readonly name: string; readonly parameters: Readonly<Record<string, number>> };
  /** What printing from the page lays out: the card (as `card` prints it) and the sheets of cards. */
  readonly layouts: { readonly card: Layout; readonly sheets: Readonly<Record<"letter" | "a4", Layout>> };
  readonly fonts: PageFonts;
}

/** One entry of the page's orientation list: a ranked candidate or a reference hold. */
export interface ListedOrientation {
  /** Short label, as the cards name it: "grip 1" or "four-seam hold". */
  readonly label: string;
  readonly orientation: OrientationReport;
}

/** The candidates in rank order, then the reference holds; no candidate when the wanted direction is out of reach. */
export function listOrientations(report: ScreenReport): ListedOrientation[] {
  return [
    ...(report.reach.outOfReach ? [] : report.candidates.map((o) => ({ label: `grip ${o.rank}`, orientation: o }))),
    ...report.references.map((o) => ({ label: `${o.reference} hold`, orientation: o })),
  ];
}

/** "Pitcher, pitch" as the terminal table heads it (or the pitch alone when no pitcher is named). */
export function pitchLabel(report: ScreenReport): string {
  const p = report.input.pitch;
  return p.pitcher ? `${p.pitcher}, ${p.name}` : p.name;
}
