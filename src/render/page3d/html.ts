/**
 * The workbench page as one HTML string: pure (data, script and style in, text out),
 * deterministic, with nothing fetched from anywhere. The Content-Security-Policy
 * allows only the one inline script and the one inline style by their hashes, the
 * page's own worker (made from that script, as a blob), and no network, so the file
 * behaves the same from a laptop's disk or a USB stick.
 */
import type { ViewData } from "./data.js";
import { FORM_FIELDS as F, PAGE_IDS } from "./pageIds.js";

/** The page's own name (its title and heading). */
export const PAGE_TITLE = "seam-atlas workbench";

/** The safety line every page carries (README "Safety first", in the page's words). */
export const CAUTION_TEXT =
  "Pitching can injure. A change of grip or arm action changes the stress on the arm: keep to an arm-care programme, " +
  "ramp up throwing gradually, stop at any pain, and get qualified coaching and medical advice (a licensed athletic trainer or physician). Follow your league's rules " +
  "on the ball and never alter it. These figures model the air flow; they are not advice for any one athlete, and local " +
  "rules and licensed practice come first.";

export interface ViewHtmlParts {
  readonly data: ViewData;
  /** The page script (an IIFE bundle). */
  readonly script: string;
  readonly css: string;
  /** CSP source expressions for them, e.g. "'sha256-...'". */
  readonly scriptHash: string;
  readonly styleHash: string;
}

/** Escapes text for HTML element content and attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");
}

/**
 * JSON that can sit inside <script type="application/json">: "<", ">" and "&" as
 * \u escapes, so no "</script>" or "<!--" in a pitcher's name can end the block.
 * JSON.parse reads it back unchanged.
 */
export function jsonForScriptBlock(value: unknown): string {
  return JSON.stringify(value)
    .replace(/</g, "\\u003c")
    .replace(/>/g, "\\u003e")
    .replace(/&/g, "\\u0026")
    .replace(/\u2028/g, "\\u2028")
    .replace(/\u2029/g, "\\u2029");
}

/** Throws unless `script` can be inlined as it is (no "</script" or "<!--" that would end or change the element). */
export function assertInlineSafe(script: string): void {
  if (/<\/script/i.test(script) || script.includes("<!--")) {
    throw new Error(`the page script contains "</script" or "<!--" and cannot be inlined as it is`);
  }
}

const ids = PAGE_IDS;

/** A labelled field with its message line (filled by the page when the value is refused). */
function field(id: string, label: string, control: string, hint = ""): string {
  const err = `${id}-error`;
  return `<div class="field"><label for="${id}">${label}</label>${control.replace(/^<(input|select)\b/, `<$1 id="${id}" aria-describedby="${err}"`)}${hint ? `<p class="field-hint">${hint}</p>` : ""}<p class="field-error" id="${err}"></p></div>`;
}

function options(pairs: readonly [string, string][]): string {
  return pairs.map(([v, t]) => `<option value="${v}">${t}</option>`).join("");
}

function pitchForm(): string {
  return `<form id="${ids.form}" class="pitch-form" novalidate>
${field(F.name.id, F.name.label, `<input type="text" autocomplete="off" spellcheck="false">`, "Its name sets the finger pattern: sinker, changeup, slider, curveball ...")}
${field(F.hand.id, F.hand.label, `<select>${options([["right", "right"], ["left", "left"]])}</select>`)}
<div class="pair">
${field(F.speed.id, `${F.speed.label}, mph`, `<input type="text" inputmode="decimal" autocomplete="off">`)}
${field(F.spin.id, `${F.spin.label}, rpm`, `<input type="text" inputmode="decimal" autocomplete="off">`)}
</div>
<div class="pair">
${field(F.tiltAs.id, F.tiltAs.label, `<select>${options([["clock", "clock, H:MM"], ["degrees", "\u00b0 from 12:00"]])}</select>`)}
${field(F.tilt.id, F.tilt.label, `<input type="text" autocomplete="off">`)}
</div>
${field(F.view.id, F.view.label, `<select>${options([["pitcher", "pitcher (as the pitcher sees it)"], ["catcher", "catcher (as the catcher sees it)"]])}</select>`)}
<div class="pair">
${field(F.gyroAs.id, F.gyroAs.label, `<select>${options([["gyro", "angle, \u00b0"], ["efficiency", "efficiency, %"]])}</select>`)}
${field(F.gyro.id, F.gyro.label, `<input type="text" inputmode="decimal" autocomplete="off">`)}
</div>
<fieldset class="field sign" id="${F.gyroSign.id}" aria-describedby="${F.gyroSign.id}-error">
<legend>${F.gyroSign.label}, with spin efficiency below 100 % (it cannot be read from the efficiency)</legend>
<label><input type="radio" name="gyro-sign" value="pos" id="${F.gyroSign.id}-pos"> positive: the axis's positive end leans toward the plate</label>
<label><input type="radio" name="gyro-sign" value="neg" id="${F.gyroSign.id}-neg"> negative</label>
<p class="field-error" id="${F.gyroSign.id}-error"></p>
</fieldset>
${field(F.want.id, F.want.label, `<select>${options([["arm", "toward the arm side"], ["glove", "toward the glove side"], ["up", "up"], ["down", "down"], ["any", "any direction (the largest)"]])}</select>`)}
<div class="pair">
${field(F.elevation.id, F.elevation.label, `<input type="text" inputmode="decimal" autocomplete="off" placeholder="sea level">`)}
${field(F.elevationUnit.id, F.elevationUnit.label, `<select>${options([["ft", "feet"], ["m", "metres"]])}</select>`)}
</div>
<div class="pair">
${field(F.temperature.id, F.temperature.label, `<input type="text" inputmode="decimal" autocomplete="off" placeholder="standard air">`)}
${field(F.temperatureUnit.id, F.temperatureUnit.label, `<select>${options([["f", "\u00b0F"], ["c", "\u00b0C"]])}</select>`)}
</div>
<div class="run"><button type="submit" id="${ids.screenButton}" class="primary">Screen this pitch</button>
<progress id="${ids.progress}" max="1" value="0" aria-label="Screening progress" hidden></progress></div>
<p id="${ids.screenStatus}" class="screen-status" role="status" aria-live="polite"></p>
</form>`;
}

export function renderViewHtml(parts: ViewHtmlParts): string {
  assertInlineSafe(parts.script);
  const { data } = parts;
  const team = data.team ? escapeHtml(data.team) : "";
  const csp = [
    "default-src 'none'",
    `script-src ${parts.scriptHash}`,
    `style-src ${parts.styleHash}`,
    // the screen runs in a worker made from the page's own script (child-src for browsers before worker-src)
    "worker-src blob:",
    "child-src blob:",
    "img-src data: blob:",
    "base-uri 'none'",
    "form-action 'none'",
  ].join("; ");
  const tool = `${escapeHtml(data.tool)} ${escapeHtml(data.version)}`;
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta http-equiv="Content-Security-Policy" content="${csp}">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="generator" content="${tool}">
<title>${PAGE_TITLE}${team ? ` - ${team}` : ""}</title>
<link rel="icon" href="data:,">
<style>${parts.css}</style>
</head>
<body>
<div class="screen-only">
<header class="top">
<h1>${PAGE_TITLE} <span class="sub">${tool}</span></h1>
${team ? `<p class="team">${team}</p>\n` : ""}<p class="caution" role="note"><strong>Caution.</strong> ${escapeHtml(CAUTION_TEXT)}</p>
</header>
<main class="layout">
<section class="stage" aria-labelledby="stage-title">
<h2 id="stage-title" class="visually-hidden">The ball turning in the air flow</h2>
<div class="canvas-wrap">
<canvas id="${ids.canvas}" tabindex="0" role="img" aria-label="The ball with its seam, stitches and the finger pads of the chosen grip, turning about the spin axis inside the separation band, which stays fixed to the air flow. Drag, or use the arrow keys, to look round; plus and minus zoom; Home resets the view."></canvas>
<div id="${ids.labels}" class="ball-labels" aria-hidden="true"></div>
<div id="${ids.webglMessage}" class="webgl-message" role="alert" hidden></div>
</div>
<div class="controls" role="group" aria-label="Camera">
<span class="group-label">Look from</span>
<button type="button" id="${ids.cameraPitcher}" aria-pressed="false">Behind the pitcher</button>
<button type="button" id="${ids.cameraSide}" aria-pressed="false">The side</button>
<button type="button" id="${ids.cameraCatcher}" aria-pressed="false">The catcher</button>
<button type="button" id="${ids.resetView}">Reset view</button>
</div>
<div class="controls" role="group" aria-label="Turn controls">
<button type="button" id="${ids.play}" data-playing="false">Play</button>
<div class="slider"><label for="${ids.speed}">Spin on screen</label><input type="range" id="${ids.speed}" min="0" max="60" step="1" value="10"><output id="${ids.speedOut}" for="${ids.speed}">10 turns/min</output></div>
<div class="slider"><label for="${ids.phase}">Phase of the turn</label><input type="range" id="${ids.phase}" min="0" max="359" step="1" value="0"><output id="${ids.phaseOut}" for="${ids.phase}">0\u00b0</output></div>
<button type="button" id="${ids.release}">Ball at release</button>
<label class="check"><input type="checkbox" id="${ids.showFingers}" checked> Finger pads</label>
</div>
<p class="hint">The band, the flight arrow, the spin axis and the push stay fixed to the air; the ball turns inside them, slowed down to a few turns a minute, carrying the finger pads of the grip where they sit at release. "Ball at release" stops the turn where the hand lets go; seen from behind the pitcher it is the ball in your hand at release. The push arrow's length is the push's size against the largest in the list.</p>
<ul class="legend" aria-label="Key">
<li><span class="swatch sw-cover"></span>cover</li>
<li><span class="swatch sw-seam"></span>seam outside the band</li>
<li><span class="swatch sw-stitch"></span>stitches</li>
<li><span class="swatch sw-plus"></span>band and seam in it, + side of the split</li>
<li><span class="swatch sw-minus"></span>band and seam in it, \u2212 side</li>
<li><span class="swatch sw-ring"></span>band limits and the split</li>
<li><span class="swatch sw-flight"></span>flight direction</li>
<li><span class="swatch sw-spin"></span>spin axis</li>
<li><span class="swatch sw-push"></span>predicted seam push</li>
<li><span class="swatch sw-finger"></span>finger pads (I index, M middle, R ring, T thumb)</li>
</ul>
<div class="figures">
<figure class="dial-figure">
<div id="${ids.dial}" class="dial" role="img" aria-label="Seam movement at the plate of every grip in the list, as the pitcher sees it: arm side and glove side across, up and down; the chosen grip drawn bold, the wanted direction marked."></div>
<figcaption>Seam movement at the plate, inches, from behind the pitcher: each grip's arrow, the chosen one bold; the shaded shape is how far the seams can push each way.</figcaption>
</figure>
<figure class="live-figure">
<table class="live">
<caption>Seam in the separation band through the turn</caption>
<thead><tr><th scope="col">side of the split</th><th scope="col">now</th><th scope="col">turn average</th></tr></thead>
<tbody>
<tr class="side-plus"><th scope="row" id="${ids.sidePlusLabel}">+ side</th><td id="${ids.livePlus}">-</td><td id="${ids.averagePlus}">-</td></tr>
<tr class="side-minus"><th scope="row" id="${ids.sideMinusLabel}">\u2212 side</th><td id="${ids.liveMinus}">-</td><td id="${ids.averageMinus}">-</td></tr>
</tbody>
</table>
<div id="${ids.timeline}" class="timeline" role="img" aria-label="Share of the seam in the band on each side of the split at every phase of one turn, with each side's turn average dashed and the current phase marked."></div>
</figure>
</div>
</section>
<aside class="panel">
<section class="pitch" aria-labelledby="pitch-title">
<h2 id="pitch-title">The pitch</h2>
<div class="field" id="${ids.staff}"${data.fromFile && data.pitches.length ? "" : " hidden"}>
<label for="${ids.pitchSelect}">Pitch from the staff file</label>
<select id="${ids.pitchSelect}"></select>
</div>
${pitchForm()}
</section>
<section aria-labelledby="orientations-title">
<h2 id="orientations-title">Grips for this pitch</h2>
<p id="${ids.pitchSummary}" class="summary"></p>
<p id="${ids.reach}" class="reach" role="status" aria-live="polite"></p>
<div class="stepper"><button type="button" id="${ids.previous}">Previous</button><button type="button" id="${ids.next}">Next</button></div>
<ul id="${ids.orientationList}" class="orientation-list" aria-label="Grips and classic holds"></ul>
</section>
<section aria-labelledby="${ids.orientationTitle}">
<h2 id="${ids.orientationTitle}"></h2>
<h3>How to hold it</h3>
<ul id="${ids.gripWords}" class="grip-words"></ul>
<dl id="${ids.numbers}" class="numbers"></dl>
<p class="units">Seam movement: inches at the plate as the trade reads movement, the same numbers <code>seam-atlas screen</code> prints. Robustness: the same with the spin axis about 5\u00b0 off (mean and 10th percentile).</p>
</section>
<section aria-labelledby="print-title">
<h2 id="print-title">Print</h2>
<p class="units">The chosen grip prints as the 6 \u00d7 4 in card <code>seam-atlas card</code> prints, then a sheet of the grips ticked \u201con the sheet\u201d, four 5 \u00d7 3 in cards to a page.</p>
<div class="field"><label for="${ids.paper}">Paper for the sheet</label><select id="${ids.paper}">${options([["letter", "Letter, 8.5 \u00d7 11 in"], ["a4", "A4"]])}</select></div>
<button type="button" id="${ids.print}">Print the card and the sheet</button>
</section>
</aside>
</main>
<footer>
<p>Written by ${tool}. Everything on this page, the screen included, runs in this file: it needs no network. Includes three.js, gl-matrix and svg.js (MIT licence) and the Noto Sans face (SIL Open Font Licence 1.1); their notices are at the end of the script.</p>
</footer>
<div id="${ids.status}" class="visually-hidden" role="status" aria-live="polite"></div>
</div>
<div id="${ids.printArea}" class="print-area" aria-hidden="true"></div>
<script type="application/json" id="${ids.data}">${jsonForScriptBlock(data)}</script>
<script>${parts.script}</script>
</body>
</html>
`;
}
