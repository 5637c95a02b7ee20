/** The page's style sheet (inlined into the HTML; no web fonts but the card face the page carries, system fonts on screen). */
import { PALETTE } from "./palette.js";

const vars = Object.entries(PALETTE)
  .map(([name, hex]) => `  --${name.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}: ${hex};`)
  .join("\n");

export const PAGE_CSS = `:root {
${vars}
  color-scheme: dark;
  font-family: system-ui, "Segoe UI", "DejaVu Sans", "Helvetica Neue", Arial, sans-serif;
  font-size: 15px;
  line-height: 1.45;
}
* { box-sizing: border-box; }
body { margin: 0; background: var(--background); color: var(--text); }
header.top { padding: 12px 20px 10px; border-bottom: 1px solid var(--panel-edge); }
h1 { margin: 0; font-size: 1.35rem; font-weight: 650; letter-spacing: 0.01em; }
h1 .sub { font-size: 0.85rem; font-weight: 400; color: var(--muted); margin-left: 0.6em; }
h2 { font-size: 1.05rem; margin: 0 0 8px; font-weight: 650; }
h3 { font-size: 0.95rem; margin: 10px 0 4px; font-weight: 650; }
.team { margin: 2px 0 6px; color: var(--muted); }
.caution { margin: 6px 0 0; padding: 6px 10px; border-left: 4px solid var(--caution); background: #1d2630; font-size: 0.86rem; }
.caution strong { color: var(--caution); }
.layout { display: grid; grid-template-columns: minmax(0, 1fr) minmax(330px, 400px); gap: 16px; padding: 14px 20px; align-items: start; }
@media (max-width: 900px) { .layout { grid-template-columns: minmax(0, 1fr); padding: 10px 12px; } header.top { padding: 10px 12px; } }
.canvas-wrap { position: relative; width: 100%; height: min(70vh, 620px); min-height: 300px; border: 1px solid var(--panel-edge); border-radius: 8px; overflow: hidden; }
@media (max-height: 500px) { .canvas-wrap { height: 82vh; min-height: 260px; } h1 { font-size: 1.1rem; } .caution { font-size: 0.8rem; padding: 4px 8px; } }
#ball-canvas { display: block; width: 100%; height: 100%; cursor: grab; touch-action: none; }
#ball-canvas:active { cursor: grabbing; }
:focus-visible { outline: 3px solid var(--flight); outline-offset: 2px; }
.ball-labels { position: absolute; inset: 0; pointer-events: none; overflow: hidden; }
.ball-label { position: absolute; left: 0; top: 0; padding: 1px 6px; border-radius: 4px; background: var(--background); font-size: 13px; font-weight: 650; line-height: 18px; white-space: nowrap; }
.ball-label.pad { background: var(--finger-label); color: #ffffff; }
.ball-label[hidden] { display: none; }
.webgl-message { position: absolute; inset: 0; display: flex; align-items: center; justify-content: center; padding: 24px; text-align: center; background: var(--panel); color: var(--text); }
.webgl-message[hidden] { display: none; }
.controls { display: flex; flex-wrap: wrap; align-items: center; gap: 8px 14px; margin-top: 10px; }
.group-label { color: var(--muted); }
.slider { display: flex; align-items: center; gap: 8px; }
.slider input { width: 150px; accent-color: var(--flight); }
.slider output { min-width: 6.5em; font-variant-numeric: tabular-nums; color: var(--muted); }
button, select, input[type="text"] { font: inherit; color: var(--text); background: var(--panel); border: 1px solid var(--panel-edge); border-radius: 6px; padding: 5px 10px; min-height: 34px; }
input[type="text"] { width: 100%; background: var(--background); }
select { max-width: 100%; }
button { cursor: pointer; }
button:hover, select:hover, input[type="text"]:hover { border-color: var(--muted); }
button[aria-pressed="true"] { border-color: var(--flight); background: var(--chosen); }
button.primary { background: #1f4f80; border-color: var(--flight); font-weight: 650; }
button:disabled { opacity: 0.6; cursor: progress; }
.check { display: inline-flex; align-items: center; gap: 6px; }
.check input { width: 18px; height: 18px; accent-color: var(--flight); }
#play-toggle { min-width: 5.5em; font-weight: 600; }
.hint { margin: 8px 0 0; color: var(--muted); font-size: 0.85rem; }
.legend { list-style: none; display: flex; flex-wrap: wrap; gap: 4px 16px; padding: 0; margin: 10px 0 0; font-size: 0.85rem; color: var(--muted); }
.legend li { display: flex; align-items: center; gap: 6px; }
.swatch { display: inline-block; width: 14px; height: 14px; border-radius: 3px; border: 1px solid #5a6775; }
.sw-cover { background: var(--cover); } .sw-seam { background: var(--seam); } .sw-stitch { background: var(--stitch); }
.sw-plus { background: var(--side-plus); } .sw-minus { background: var(--side-minus); } .sw-flight { background: var(--flight); }
.sw-spin { background: var(--spin-axis); } .sw-push { background: var(--push); } .sw-ring { background: var(--split-line); } .sw-finger { background: var(--finger); }
.figures { display: grid; grid-template-columns: repeat(auto-fit, minmax(270px, 1fr)); gap: 14px; margin-top: 12px; }
figure { margin: 0; background: var(--panel); border: 1px solid var(--panel-edge); border-radius: 8px; padding: 10px 12px; }
figcaption { color: var(--muted); font-size: 0.82rem; margin-top: 4px; }
.dial svg, .timeline svg { display: block; width: 100%; height: auto; }
.dial svg { max-width: 340px; margin: 0 auto; }
.panel { display: flex; flex-direction: column; gap: 12px; min-width: 0; }
/* on a screen wide and tall enough the panel scrolls by itself, so the ball stays in view beside the form and the grips */
@media (min-width: 901px) and (min-height: 560px) { .panel { position: sticky; top: 8px; max-height: calc(100vh - 16px); overflow-y: auto; padding-right: 4px; } }
.panel > section { background: var(--panel); border: 1px solid var(--panel-edge); border-radius: 8px; padding: 12px 14px; }
.field { margin: 0 0 8px; min-width: 0; }
.field > label, .field legend { display: block; font-weight: 600; font-size: 0.9rem; margin-bottom: 3px; }
.field select { width: 100%; }
.pair { display: grid; grid-template-columns: 1fr 1fr; gap: 0 10px; }
fieldset.sign { border: 1px solid var(--panel-edge); border-radius: 6px; padding: 6px 10px; }
fieldset.sign legend { font-weight: 600; font-size: 0.85rem; padding: 0 4px; }
fieldset.sign label { display: flex; align-items: flex-start; gap: 6px; font-size: 0.88rem; margin: 3px 0; }
fieldset.sign input { width: 18px; height: 18px; margin: 2px 0 0; accent-color: var(--flight); flex: none; }
fieldset.sign:disabled { opacity: 0.75; }
.field-hint { margin: 2px 0 0; color: var(--muted); font-size: 0.8rem; }
.field-error { margin: 2px 0 0; color: var(--error); font-size: 0.86rem; font-weight: 600; }
.field-error:empty { display: none; }
[aria-invalid="true"] { border-color: var(--error) !important; }
.run { display: flex; align-items: center; gap: 10px; margin-top: 4px; }
.run progress { flex: 1; height: 10px; accent-color: var(--flight); }
.screen-status { margin: 6px 0 0; color: var(--muted); font-size: 0.86rem; }
.screen-status:empty { display: none; }
.summary { margin: 0 0 6px; color: var(--muted); font-size: 0.86rem; }
.reach { margin: 0 0 8px; padding: 6px 10px; border-left: 4px solid var(--flight); background: var(--background); font-size: 0.88rem; }
.reach.out { border-left-color: var(--caution); }
.reach:empty { display: none; }
.stepper { display: flex; gap: 8px; margin-bottom: 8px; }
.orientation-list { list-style: none; margin: 0; padding: 0; display: grid; gap: 4px; }
.orientation-list li { display: flex; gap: 6px; align-items: stretch; }
.orientation-list li > button { flex: 1; text-align: left; display: flex; justify-content: space-between; gap: 8px; font-variant-numeric: tabular-nums; min-width: 0; }
.orientation-list .what { color: var(--muted); font-size: 0.85rem; white-space: nowrap; }
.orientation-list .check { font-size: 0.8rem; color: var(--muted); white-space: nowrap; }
.grip-words { margin: 0 0 8px; padding-left: 18px; font-size: 0.9rem; }
.grip-words li { margin: 2px 0; }
dl.numbers { display: grid; grid-template-columns: auto 1fr; gap: 3px 12px; margin: 0; }
dl.numbers dt { color: var(--muted); }
dl.numbers dd { margin: 0; font-variant-numeric: tabular-nums; text-align: right; }
dl.numbers dt.wide { grid-column: 1 / -1; }
dl.numbers dd.wide { grid-column: 1 / -1; text-align: left; font-size: 0.86rem; margin-bottom: 2px; }
.units { margin: 8px 0; font-size: 0.82rem; color: var(--muted); }
table.live { width: 100%; border-collapse: collapse; font-variant-numeric: tabular-nums; }
table.live caption { text-align: left; font-weight: 650; margin-bottom: 4px; }
table.live th, table.live td { padding: 2px 4px; text-align: right; }
table.live td { white-space: nowrap; }
table.live th[scope="row"] { text-align: left; font-weight: 500; }
table.live thead th { color: var(--muted); font-weight: 500; font-size: 0.85rem; }
.side-plus { color: var(--side-plus); } .side-minus { color: var(--side-minus); }
.timeline { margin-top: 6px; }
footer { padding: 6px 20px 18px; color: var(--muted); font-size: 0.8rem; }
code { font-size: 0.92em; }
.visually-hidden { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); white-space: nowrap; }
.print-area { display: none; }
.print-page { break-after: page; }
.print-page:last-child { break-after: auto; }
.print-card { page: card; }
.print-sheet-letter { page: sheet-letter; }
.print-sheet-a4 { page: sheet-a4; }
.print-page svg { display: block; }
@page card { size: 6in 4in; margin: 0; }
@page sheet-letter { size: 8.5in 11in; margin: 0; }
@page sheet-a4 { size: 210mm 297mm; margin: 0; }
@media print {
  :root { color-scheme: light; }
  body { background: #ffffff; color: #000000; }
  .screen-only { display: none !important; }
  .print-area { display: block; }
}
`;
