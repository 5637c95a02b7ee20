/**
 * Element ids shared by the HTML template (html.ts, built in Node) and the page
 * script (src/page/, run in the browser), so the two cannot drift apart.
 */
export const PAGE_IDS = {
  data: "seam-atlas-view-data",
  canvas: "ball-canvas",
  labels: "ball-labels",
  webglMessage: "webgl-message",
  play: "play-toggle",
  speed: "spin-speed",
  speedOut: "spin-speed-value",
  phase: "phase",
  phaseOut: "phase-value",
  release: "release-phase",
  showFingers: "show-fingers",
  resetView: "reset-view",
  cameraPitcher: "camera-pitcher",
  cameraSide: "camera-side",
  cameraCatcher: "camera-catcher",
  pitchSelect: "pitch-select",
  staff: "staff-picker",
  pitchSummary: "pitch-summary",
  form: "pitch-form",
  screenButton: "screen-button",
  progress: "screen-progress",
  screenStatus: "screen-status",
  reach: "reach-message",
  previous: "previous-orientation",
  next: "next-orientation",
  orientationList: "orientation-list",
  orientationTitle: "orientation-title",
  gripWords: "grip-words",
  numbers: "orientation-numbers",
  dial: "movement-dial",
  livePlus: "live-plus",
  liveMinus: "live-minus",
  averagePlus: "average-plus",
  averageMinus: "average-minus",
  sidePlusLabel: "side-plus-label",
  sideMinusLabel: "side-minus-label",
  timeline: "timeline-plot",
  paper: "paper-select",
  print: "print-button",
  printArea: "print-area",
  status: "status",
} as const;

/**
 * The form's fields: id, the `screen` option it gives (as the command line names it),
 * and its label. A message from the library that names the option ("--speed") is
 * shown beside the field that gives it.
 */
export const FORM_FIELDS = {
  name: { id: "f-name", label: "Pitch name" },
  hand: { id: "f-hand", label: "Throwing hand" },
  speed: { id: "f-speed", label: "Speed" },
  spin: { id: "f-spin", label: "Spin rate" },
  tiltAs: { id: "f-tilt-as", label: "Tilt given as" },
  tilt: { id: "f-tilt", label: "Tilt" },
  view: { id: "f-view", label: "Tilt read from behind the" },
  gyroAs: { id: "f-gyro-as", label: "Gyro given as" },
  gyro: { id: "f-gyro", label: "Gyro" },
  gyroSign: { id: "f-gyro-sign", label: "Gyro sign" },
  want: { id: "f-want", label: "Wanted seam movement" },
  elevation: { id: "f-elevation", label: "Field elevation" },
  elevationUnit: { id: "f-elevation-unit", label: "Elevation unit" },
  temperature: { id: "f-temperature", label: "Air temperature" },
  temperatureUnit: { id: "f-temperature-unit", label: "Temperature unit" },
} as const;

export type FormField = keyof typeof FORM_FIELDS;
