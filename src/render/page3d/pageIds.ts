/**
 * Element ids shared by the HTML template (html.ts, built in Node) and the page
 * script (main.ts, run in the browser), so the two cannot drift apart.
 */
export const PAGE_IDS = {
  data: "seam-atlas-view-data",
  canvas: "ball-canvas",
  webglMessage: "webgl-message",
  play: "play-toggle",
  speed: "spin-speed",
  speedOut: "spin-speed-value",
  phase: "phase",
  phaseOut: "phase-value",
  resetView: "reset-view",
  pitchSelect: "pitch-select",
  pitchSummary: "pitch-summary",
  previous: "previous-orientation",
  next: "next-orientation",
  orientationList: "orientation-list",
  orientationTitle: "orientation-title",
  numbers: "orientation-numbers",
  livePlus: "live-plus",
  liveMinus: "live-minus",
  averagePlus: "average-plus",
  averageMinus: "average-minus",
  sidePlusLabel: "side-plus-label",
  sideMinusLabel: "side-minus-label",
  timeline: "timeline-plot",
  status: "status",
} as const;
