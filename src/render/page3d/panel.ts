/// <reference lib="dom" />
/**
 * The side panel's words and numbers, written into the page's elements. Every
 * figure is taken from the screen report and printed with the terminal's rules
 * (numbers.ts), so the page and `seam-atlas screen` show the same digits; the grip is
 * told in the cards' words (render/paper/words.ts).
 */
import type { OrientationReport, ScreenReport } from "../../screening/report.js";
import type { ListedOrientation } from "./data.js";
import { fixed as fixedDigits, formatMovementIn as inches, percent as percentText } from "../numbers.js";
import { reachWords } from "../paper/words.js";

const WANT_WORDS: Record<string, string> = { arm: "toward the arm side", glove: "toward the glove side", up: "up", down: "down", any: "any direction" };

/** The pitch in one sentence, in the terminal table's words. */
export function pitchSummary(report: ScreenReport): string {
  const p = report.input.pitch;
  const s = report.input.settings;
  return (
    `${p.hand === "right" ? "RHP" : "LHP"}: ${fixedDigits(p.speedMph, 1)} mph, ${fixedDigits(p.spinRpm, 0)} rpm, tilt ${p.tilt} from behind the ${p.view}, ` +
    `gyro ${fixedDigits(p.gyroDeg, 1)} deg (spin efficiency ${fixedDigits(p.efficiencyPct, 1)} %); wanted push: ${WANT_WORDS[p.want] ?? p.want}. ` +
    `Seam-force model ${report.input.model.name} (${report.input.model.hash}). Band ${fixedDigits(s.bandCenterDeg - s.bandWidthDeg / 2, 1)} to ` +
    `${fixedDigits(s.bandCenterDeg + s.bandWidthDeg / 2, 1)} deg from the stagnation point; grid ${s.gridSpacingDeg} deg, ranked by ${s.rank}.` +
    (report.reach.outOfReach ? ` ${reachWords(report)}` : "")
  );
}

/** The displayed figures of one orientation, keyed as the page's data-field attributes. */
export function orientationFigures(o: OrientationReport): [field: string, label: string, value: string][] {
  return [
    ["score", "Seam movement toward the wanted direction, in", inches(o.score)],
    ["arm-side", "Seam movement toward the arm side, in", inches(o.seamMovement.armSideIn)],
    ["up", "Seam movement up, in", inches(o.seamMovement.verticalIn)],
    ["push-clock", "It points toward (clock, the pitch's view)", o.seamMovement.clock ?? "-"],
    ["robust-mean", "Robustness, axis 5\u00b0 off: mean, in", inches(o.robustness.meanIn)],
    ["robust-p10", "Robustness: 10th percentile, in", inches(o.robustness.p10In)],
    ["crossings", "Seams past the front per turn", String(o.crossingsPerRevolution)],
    ["axis", "Axis on the ball", o.latLon.text],
    ["landmark", "Nearest landmark", `${o.landmark.name} ${fixedDigits(o.landmark.angleDeg, 0)} deg`],
    ["seam-in-band", "Seam in band, turn average (occupancy)", percentText(o.occupancy.seamInBand)],
  ];
}

/** Fills the <dl> with the orientation's figures. */
export function renderFigures(dl: HTMLElement, o: OrientationReport): void {
  const doc = dl.ownerDocument;
  dl.replaceChildren();
  for (const [field, label, value] of orientationFigures(o)) {
    const dt = doc.createElement("dt");
    dt.textContent = label;
    const dd = doc.createElement("dd");
    dd.dataset.field = field;
    dd.textContent = value;
    dl.append(dt, dd);
  }
}

/** The list of orientations as pressable buttons, each with its "on the sheet" box; the chosen one is aria-pressed. */
export function renderOrientationList(
  ul: HTMLElement,
  listed: readonly ListedOrientation[],
  chosen: number,
  onChoose: (index: number) => void,
  ticked: ReadonlySet<number> = new Set(),
  onTick: (index: number, on: boolean) => void = () => {},
): void {
  const doc = ul.ownerDocument;
  ul.replaceChildren();
  listed.forEach((item, index) => {
    const li = doc.createElement("li");
    const button = doc.createElement("button");
    button.type = "button";
    button.dataset.index = String(index);
    button.setAttribute("aria-pressed", String(index === chosen));
    const name = doc.createElement("span");
    name.textContent = item.label;
    const what = doc.createElement("span");
    what.className = "what";
    what.textContent = `${inches(item.orientation.score)} in`;
    button.append(name, what);
    button.setAttribute("aria-label", `${item.label}: ${inches(item.orientation.score)} in of seam movement toward the wanted direction`);
    button.addEventListener("click", () => onChoose(index));
    const tick = doc.createElement("label");
    tick.className = "check";
    const box = doc.createElement("input");
    box.type = "checkbox";
    box.className = "sheet-pick";
    box.dataset.index = String(index);
    box.checked = ticked.has(index);
    box.setAttribute("aria-label", `${item.label} on the printed sheet`);
    box.addEventListener("change", () => onTick(index, box.checked));
    tick.append(box, doc.createTextNode("sheet"));
    li.append(button, tick);
    ul.append(li);
  });
}

/** Moves the pressed state to `chosen` without rebuilding the list (keeps keyboard focus where it is). */
export function markChosen(ul: HTMLElement, chosen: number): void {
  for (const button of ul.querySelectorAll("button")) button.setAttribute("aria-pressed", String(button.dataset.index === String(chosen)));
}
