/**
 * The 3-D page as one HTML string: pure (data, script and style in, text out),
 * deterministic, with nothing fetched from anywhere. The Content-Security-Policy
 * allows only the one inline script and the one inline style by their hashes, and
 * no network, so the file behaves the same from a laptop's disk or a USB stick.
 */
import type { ViewData } from "./data.js";
import { PAGE_IDS } from "./pageIds.js";

/** The safety line every page carries (README "Safety first", in the page's words). */
export const CAUTION_TEXT =
  "Pitching can injure. A change of grip or arm action changes the stress on the arm: ramp up throwing gradually, " +
  "and get qualified coaching and medical advice (a licensed athletic trainer or physician). Follow your league's rules " +
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

export function renderViewHtml(parts: ViewHtmlParts): string {
  assertInlineSafe(parts.script);
  const { data } = parts;
  const team = data.team ? escapeHtml(data.team) : "";
  const csp = [
    "default-src 'none'",
    `script-src ${parts.scriptHash}`,
    `style-src ${parts.styleHash}`,
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
<title>Seam view${team ? ` - ${team}` : ""}</title>
<link rel="icon" href="data:,">
<style>${parts.css}</style>
</head>
<body>
<header class="top">
<h1>Seam view <span class="sub">${tool}</span></h1>
${team ? `<p class="team">${team}</p>\n` : ""}<p class="caution" role="note"><strong>Caution.</strong> ${escapeHtml(CAUTION_TEXT)}</p>
</header>
<main class="layout">
<section class="stage" aria-labelledby="stage-title">
<h2 id="stage-title" class="visually-hidden">The ball turning in the air flow</h2>
<div class="canvas-wrap">
<canvas id="${ids.canvas}" tabindex="0" role="img" aria-label="The ball with its seam and stitches turning about the spin axis, inside the separation band, which stays fixed to the air flow. Drag, or use the arrow keys, to look round; plus and minus zoom; Home resets the view."></canvas>
<div id="${ids.webglMessage}" class="webgl-message" role="alert" hidden></div>
</div>
<div class="controls" role="group" aria-label="Turn controls">
<button type="button" id="${ids.play}" data-playing="false">Play</button>
<div class="slider"><label for="${ids.speed}">Spin on screen</label><input type="range" id="${ids.speed}" min="0" max="60" step="1" value="10"><output id="${ids.speedOut}" for="${ids.speed}">10 turns/min</output></div>
<div class="slider"><label for="${ids.phase}">Phase of the turn</label><input type="range" id="${ids.phase}" min="0" max="359" step="1" value="0"><output id="${ids.phaseOut}" for="${ids.phase}">0\u00b0</output></div>
<button type="button" id="${ids.resetView}">Reset view</button>
</div>
<p class="hint">The band, the flight arrow, the spin axis and the push stay fixed to the air; the ball turns inside them, slowed down to a few turns a minute. The push arrow's length is the push's size against the largest in the list. Phase 0 puts the front stagnation point where its path on the ball comes nearest the waist-A pole. Dragging the phase slider pauses the turn.</p>
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
</ul>
</section>
<aside class="panel">
<div class="pitch">
<label for="${ids.pitchSelect}">Pitch</label>
<select id="${ids.pitchSelect}"></select>
<p id="${ids.pitchSummary}"></p>
</div>
<section aria-labelledby="orientations-title">
<h2 id="orientations-title">Spin-axis positions</h2>
<div class="stepper"><button type="button" id="${ids.previous}">Previous</button><button type="button" id="${ids.next}">Next</button></div>
<ul id="${ids.orientationList}" class="orientation-list"></ul>
</section>
<section aria-labelledby="${ids.orientationTitle}">
<h2 id="${ids.orientationTitle}"></h2>
<dl id="${ids.numbers}" class="numbers"></dl>
<p class="units">Score, push and robustness in thousandths of the seam-asymmetry unit, as <code>seam-atlas screen</code> prints them.</p>
</section>
<section aria-labelledby="live-title">
<h2 id="live-title">Seam in the band through the turn</h2>
<table class="live">
<thead><tr><th scope="col">side of the split</th><th scope="col">now</th><th scope="col">turn average</th></tr></thead>
<tbody>
<tr class="side-plus"><th scope="row" id="${ids.sidePlusLabel}">+ side</th><td id="${ids.livePlus}">-</td><td id="${ids.averagePlus}">-</td></tr>
<tr class="side-minus"><th scope="row" id="${ids.sideMinusLabel}">\u2212 side</th><td id="${ids.liveMinus}">-</td><td id="${ids.averageMinus}">-</td></tr>
</tbody>
</table>
<canvas id="${ids.timeline}" role="img" aria-label="Share of the seam in the band on each side of the split at every phase of one turn, with each side's turn average dashed and the current phase marked."></canvas>
</section>
</aside>
</main>
<footer>
<p>Written by ${tool} from the screen report embedded in this file; it needs no network. Includes three.js and gl-matrix (MIT licence; their notices are at the end of the script).</p>
</footer>
<div id="${ids.status}" class="visually-hidden" role="status" aria-live="polite"></div>
<script type="application/json" id="${ids.data}">${jsonForScriptBlock(data)}</script>
<script>${parts.script}</script>
</body>
</html>
`;
}
