/** The page's style sheet (inlined into the HTML; no web fonts, system fonts only). */
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
header.top { padding: 14px 22px 10px; border-bottom: 1px solid var(--panel-edge); }
h1 { margin: 0; font-size: 1.35rem; font-weight: 650; letter-spacing: 0.01em; }
h1 .sub { font-size: 0.85rem; font-weight: 400; color: var(--muted); margin-left: 0.6em; }
h2 { font-size: 1rem; margin: 0 0 8px; font-weight: 650; }
.team { margin: 2px 0 6px; color: var(--muted); }
.caution { margin: 6px 0 0; padding: 6px 10px; border-left: 4px solid var(--caution); background: rgba(255, 210, 122, 0.08); font-size: 0.88rem; }
.caution strong { color: var(--caution); }
.layout { display: grid; grid-template-columns: minmax(0, 1fr) 390px; gap: 18px; padding: 16px 22px; }
@media (max-width: 980px) { .layout { grid-template-columns: minmax(0, 1fr); } }
.canvas-wrap { position: relative; width: 100%; height: min(68vh, 640px); min-height: 320px; border: 1px solid var(--panel-edge); border-radius: 8px; overflow: hidden; }
#ball-canvas { display: block; width: 100%; height: 100%; cursor: grab; touch-action: none; }
#ball-canvas:active { cursor: grabbing; }
#ball-canvas:focus-visible, button:focus-visible, input:focus-visible, select:focus-visible { outline: 3px solid var(--flight); outline-offset: 2px; }
.webgl-message { position: absolute; inset: 0; display: flex; align-items: center; justify-content: center; padding: 24px; text-align: center; background: var(--panel); color: var(--text); }
.webgl-message[hidden] { display: none; }
.controls { display: flex; flex-wrap: wrap; align-items: center; gap: 10px 18px; margin-top: 12px; }
.slider { display: flex; align-items: center; gap: 8px; }
.slider input { width: 170px; accent-color: var(--flight); }
.slider output { min-width: 6.5em; font-variant-numeric: tabular-nums; color: var(--muted); }
button, select { font: inherit; color: var(--text); background: var(--panel); border: 1px solid var(--panel-edge); border-radius: 6px; padding: 5px 12px; }
button { cursor: pointer; }
button:hover, select:hover { border-color: var(--muted); }
#play-toggle { min-width: 5.5em; font-weight: 600; }
.hint { margin: 8px 0 0; color: var(--muted); font-size: 0.85rem; }
.legend { list-style: none; display: flex; flex-wrap: wrap; gap: 4px 16px; padding: 0; margin: 10px 0 0; font-size: 0.85rem; color: var(--muted); }
.legend li { display: flex; align-items: center; gap: 6px; }
.swatch { display: inline-block; width: 14px; height: 14px; border-radius: 3px; border: 1px solid rgba(255, 255, 255, 0.25); }
.sw-cover { background: var(--cover); } .sw-seam { background: var(--seam); } .sw-stitch { background: var(--stitch); }
.sw-plus { background: var(--side-plus); } .sw-minus { background: var(--side-minus); } .sw-flight { background: var(--flight); }
.sw-spin { background: var(--spin-axis); } .sw-push { background: var(--push); } .sw-ring { background: var(--split-line); }
.panel { display: flex; flex-direction: column; gap: 14px; }
.panel section, .panel .pitch { background: var(--panel); border: 1px solid var(--panel-edge); border-radius: 8px; padding: 12px 14px; }
.pitch label { display: block; font-weight: 650; margin-bottom: 4px; }
.pitch select { width: 100%; }
#pitch-summary { margin: 8px 0 0; color: var(--muted); font-size: 0.88rem; }
.stepper { display: flex; gap: 8px; margin-bottom: 8px; }
.orientation-list { list-style: none; margin: 0; padding: 0; display: grid; gap: 4px; }
.orientation-list button { width: 100%; text-align: left; display: flex; justify-content: space-between; gap: 8px; font-variant-numeric: tabular-nums; }
.orientation-list button[aria-pressed="true"] { border-color: var(--flight); background: #26405a; }
.orientation-list .what { color: var(--muted); font-size: 0.85rem; }
dl.numbers { display: grid; grid-template-columns: auto 1fr; gap: 3px 12px; margin: 0; }
dl.numbers dt { color: var(--muted); }
dl.numbers dd { margin: 0; font-variant-numeric: tabular-nums; text-align: right; }
dl.numbers dt.wide { grid-column: 1 / -1; }
dl.numbers dd.wide { grid-column: 1 / -1; text-align: left; font-size: 0.88rem; margin-bottom: 2px; }
.units { margin: 8px 0 0; font-size: 0.8rem; color: var(--muted); }
table.live { width: 100%; border-collapse: collapse; font-variant-numeric: tabular-nums; }
table.live th, table.live td { padding: 3px 4px; text-align: right; }
table.live th[scope="row"] { text-align: left; font-weight: 500; }
table.live thead th { color: var(--muted); font-weight: 500; font-size: 0.85rem; }
.side-plus { color: var(--side-plus); } .side-minus { color: var(--side-minus); }
#timeline-plot { display: block; width: 100%; height: 130px; margin-top: 8px; }
footer { padding: 6px 22px 18px; color: var(--muted); font-size: 0.8rem; }
.visually-hidden { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); white-space: nowrap; }
`;
