/// <reference lib="dom" />
/// <reference lib="webworker" />
/**
 * The workbench page's script (bundled by src/build/bundle.ts into the one inline
 * script of the HTML `seam-atlas view` writes). In the page it runs the workbench; the
 * same script, handed to a web worker as a blob, runs the screen (screenWorker.ts), so
 * the file carries one copy of the library.
 *
 * The page: a pitch form (or a staff picker when `view` was given a pitch file) whose
 * pitch the worker screens by the command line's own code and model profile; the
 * ball turning in the flow (three.js) with the chosen grip's finger pads, preset
 * cameras and labels laid out so that none overlaps another; the grips and classic
 * holds to step through with their seam movement, robustness and the cards' words;
 * and printing of the chosen grip's card and a sheet. `window.seamAtlas.screen(options)`
 * gives scripts the document `screen --json` prints for the same options.
 */
import { Vector3 } from "three";
import { stitchLayout } from "../../geometry/stitches.js";
import { DEG } from "../../geometry/units.js";
import { oppositeClock } from "../../geometry/clock.js";
import { movementClock, type ClockView } from "../../geometry/frames.js";
import { PITCH_FLAGS } from "../jobs/request/pitchSpec.js";
import type { Request } from "../jobs/request/values.js";
import { SCREEN_SETTINGS } from "../jobs/screenJob.js";
import { percent as percentText } from "../render/numbers.js";
import { BallScene, NoWebGLError } from "../render/page3d/ballScene.js";
import { listOrientations, pitchLabel, type ListedOrientation, type ViewData, type ViewPitch } from "../render/page3d/data.js";
import { LiveSeamShares, type InstantShares } from "../render/page3d/liveShare.js";
import type { PadMark } from "../render/page3d/overlays.js";
import { OrbitControl, type OrbitView } from "../render/page3d/orbit.js";
import { FORM_FIELDS, PAGE_IDS } from "../render/page3d/pageIds.js";
import { markChosen, pitchSummary, renderFigures, renderOrientationList } from "../render/page3d/panel.js";
import { fieldToWorld, releasePhase } from "../render/page3d/sceneMath.js";
import { holdLines, orientationTitle, reachWords } from "../render/paper/words.js";
import { bandFromDegrees, type Band } from "../sampling/band.js";
import { measureOrientation, seamFor } from "../sampling/measure.js";
import { PAD_SIZE_IN, type Finger } from "../screening/hand.js";
import type { PitchEcho, ScreenReport } from "../screening/report.js";
import { CAMERA_PRESETS, presetView, type CameraPreset } from "./cameras.js";
import { MovementDial } from "./dial.js";
import { clearFieldErrors, fillForm, formRequest, showFieldError, syncGyroSign } from "./form.js";
import { behindBall, placeLabels, type LabelBox } from "./labels.js";
import { installPageFonts } from "./pageFonts.js";
import { cardSvg, fillPrintArea, sheetSvgs, type Paper } from "./print.js";
import { runScreenWorker, ScreenClient, ScreenInputError } from "./screenWorker.js";
import { TimelinePlot, type TimelineSeries } from "./timeline.js";

/** What the page shows, readable from outside (the page tests, a curious user's console). */
export interface ViewState {
  pitchIndex: number;
  /** "staff" for a pitch of the file, "form" for one the page screened. */
  source: "staff" | "form" | "none";
  orientationIndex: number;
  label: string;
  phaseDeg: number;
  playing: boolean;
  webgl: boolean;
  frames: number;
  live: InstantShares;
  /** The page's own turn averages for the shown orientation (exact sampler, computed here). */
  pageAverages: { seamInBand: number; axisPlus: number; axisMinus: number; alongAxis: number };
  timeline: { plus: number[]; minus: number[] };
  /** The camera: the preset it stands at (or null), and its orbit angles, degrees. */
  camera: { preset: CameraPreset | null; azimuthDeg: number; elevationDeg: number };
  /** The labels on the ball as laid out on the screen at the last frame (px, the canvas's top-left origin). */
  labels: { key: string; text: string; shown: boolean; left: number; top: number; width: number; height: number }[];
  /** The phase at which the ball stands as held at release, degrees. */
  releaseDeg: number;
  /** Screens the page has run, and the last one's time in the worker, ms. */
  screens: number;
  lastScreenMs: number | null;
  busy: boolean;
  /** Whether the screen runs in a worker (false: the browser gave none, so on the page's own thread). */
  screenInWorker: boolean;
  /** The print area holds the chosen grip's card and the sheet. */
  printReady: boolean;
  /** Ms from the start of navigation to the first frame drawn. */
  firstFrameMs: number | null;
}

export interface SeamAtlasApi {
  /** The document `seam-atlas screen --json` prints for these options (the command's names, without dashes; the page's settings fill the rest). */
  screen(options: Readonly<Record<string, string | number>>): Promise<unknown>;
  state(): ViewState;
  /** What the page prints, as SVG: the chosen grip's card (as `card --svg` writes it) and the sheet's pages; null until built. */
  printed(): { card: string; sheets: string[] } | null;
}

declare global {
  interface Window {
    seamAtlas?: SeamAtlasApi;
    seamAtlasView?: { state(): ViewState };
  }
}

const TWO_PI = 2 * Math.PI;
/** Start view: from behind the clock's viewer, turned this far round and up so the flight arrow and the band are seen side-on. */
const HOME_AZIMUTH_OFFSET_RAD = 50 * DEG;
const HOME_ELEVATION_RAD = 34 * DEG;
const HOME_DISTANCE = 6.6;
/** The example the page opens with when `view` was given no pitch: the four-seamer of the demo staff (an invented club). */
const EXAMPLE: PitchEcho = { name: "four-seam", pitcher: "", hand: "right", speedMph: 94, spinRpm: 2350, tilt: "12:45", view: "pitcher", gyroDeg: 5, efficiencyPct: 100 * Math.cos(5 * DEG), want: "any" };
/** A pad's label shows while the cosine between the pad's outward normal and the line of sight exceeds this (about 78 deg off face-on). */
const PAD_FACING_MIN = 0.2;
/** Labels of the finger pads (as the cards mark them). */
const PAD_LABELS: Record<string, string> = { index: "I", middle: "M", ring: "R", thumb: "T" };
/** Options a script may give `seamAtlas.screen` (the `screen` command's, less files and outputs). */
const SCRIPT_OPTIONS = new Set<string>([...PITCH_FLAGS, ...SCREEN_SETTINGS, "band-center", "band-width"]);
const AIR_OPTIONS = ["elevation-ft", "elevation-m", "temperature-f", "temperature-c"];

function element<T extends HTMLElement>(id: string): T {
  const el = document.getElementById(id);
  if (!el) throw new Error(`the page has no element #${id}`);
  return el as T;
}

function readData(): ViewData {
  return JSON.parse(element(PAGE_IDS.data).textContent ?? "") as ViewData;
}

/** The report part of a `screen --json` document (its head, tool, version and command, left off). */
function reportOf(doc: Record<string, unknown>): ScreenReport {
  const { tool: _t, version: _v, command: _c, ...report } = doc;
  return report as unknown as ScreenReport;
}

/**
 * The start view for a pitch: from behind the pitcher (looking along the flight) or
 * from behind the catcher, as the pitch's clock is read, turned to whichever side
 * the top candidate's push arrow points, so the arrow is in front of the ball.
 */
function homeView(report: ScreenReport): OrbitView {
  // field +y (toward the pitcher) is world -z, azimuth pi; field -y is world +z, azimuth 0
  const base = report.input.pitch.view === "catcher" ? 0 : Math.PI;
  const top = report.candidates[0] ?? report.references[0];
  const m = top ? top.seamMovement : { horizontalIn: 0, verticalIn: 1 };
  const push = fieldToWorld([m.horizontalIn, 0, m.verticalIn]);
  const facing = (azimuthRad: number) => push.x * Math.sin(azimuthRad) + push.z * Math.cos(azimuthRad);
  const right = base + HOME_AZIMUTH_OFFSET_RAD;
  const left = base - HOME_AZIMUTH_OFFSET_RAD;
  return { azimuthRad: facing(left) > facing(right) + 1e-9 ? left : right, elevationRad: HOME_ELEVATION_RAD, distance: HOME_DISTANCE };
}

function start(script: string): void {
  const data = readData();
  const canvas = element<HTMLCanvasElement>(PAGE_IDS.canvas);
  const labelLayer = element(PAGE_IDS.labels);
  const playButton = element<HTMLButtonElement>(PAGE_IDS.play);
  const speed = element<HTMLInputElement>(PAGE_IDS.speed);
  const speedOut = element<HTMLOutputElement>(PAGE_IDS.speedOut);
  const phaseInput = element<HTMLInputElement>(PAGE_IDS.phase);
  const phaseOut = element<HTMLOutputElement>(PAGE_IDS.phaseOut);
  const pitchSelect = element<HTMLSelectElement>(PAGE_IDS.pitchSelect);
  const list = element(PAGE_IDS.orientationList);
  const status = element(PAGE_IDS.status);
  const form = element<HTMLFormElement>(PAGE_IDS.form);
  const screenButton = element<HTMLButtonElement>(PAGE_IDS.screenButton);
  const progress = element<HTMLProgressElement>(PAGE_IDS.progress);
  const screenStatus = element(PAGE_IDS.screenStatus);
  const paperSelect = element<HTMLSelectElement>(PAGE_IDS.paper);
  const printArea = element(PAGE_IDS.printArea);
  const showFingers = element<HTMLInputElement>(PAGE_IDS.showFingers);
  const dial = new MovementDial(element(PAGE_IDS.dial));
  const timeline = new TimelinePlot(element(PAGE_IDS.timeline));
  const client = new ScreenClient(script, { head: { tool: data.tool, version: data.version }, model: data.model });
  const fontsReady = installPageFonts(data.fonts);

  let scene: BallScene | null = null;
  try {
    scene = new BallScene(canvas);
  } catch (err) {
    if (!(err instanceof NoWebGLError)) throw err;
    const message = element(PAGE_IDS.webglMessage);
    message.textContent =
      "This browser gives the page no WebGL 2, so the 3-D ball cannot be drawn. Everything else on the page still works. " +
      "To see the ball, turn on hardware acceleration (or WebGL) in the browser's settings, or open the file in another browser.";
    message.hidden = false;
    canvas.hidden = true;
  }

  const state = {
    pitchIndex: 0,
    source: "none" as ViewState["source"],
    orientationIndex: 0,
    phaseRad: 0,
    playing: !window.matchMedia("(prefers-reduced-motion: reduce)").matches,
    turnsPerMinute: Number(speed.value),
    frames: 0,
    dirty: true,
    screens: 0,
    lastScreenMs: null as number | null,
    busy: false,
    printReady: false,
    firstFrameMs: null as number | null,
    releaseRad: 0,
  };
  let shown: ViewPitch | null = null;
  let listed: ListedOrientation[] = [];
  let ticked = new Set<number>();
  let shares: LiveSeamShares | null = null;
  let band: Band | null = null;
  const live: InstantShares = { seamInBand: 0, axisPlus: 0, axisMinus: 0 };
  let series: TimelineSeries = { plus: [], minus: [], averagePlus: 0, averageMinus: 0 };
  let pageAverages = { seamInBand: 0, axisPlus: 0, axisMinus: 0, alongAxis: 0 };
  let laidOut: ViewState["labels"] = [];
  const orbit = scene ? new OrbitControl(canvas, { azimuthRad: Math.PI, elevationRad: HOME_ELEVATION_RAD, distance: HOME_DISTANCE }, () => (state.dirty = true)) : null;
  const labelNodes = new Map<string, HTMLDivElement>();

  const report = () => shown?.report ?? null;
  const gyroRad = () => (report()?.input.pitch.gyroDeg ?? 0) * DEG;

  data.pitches.forEach((p, i) => {
    const option = document.createElement("option");
    option.value = String(i);
    option.textContent = pitchLabel(p.report);
    pitchSelect.append(option);
  });
  const formOption = document.createElement("option");
  formOption.value = "form";
  formOption.textContent = "the pitch typed in the form";

  // ---- printing: the chosen grip's card and the sheet, built a moment after a change (and at once before printing) ----
  let printTimer = 0;
  let printed: { card: string; sheets: string[] } | null = null;
  function buildPrint(): void {
    window.clearTimeout(printTimer);
    const r = report();
    const item = listed[state.orientationIndex];
    if (!r || !item) return;
    const paper = paperSelect.value as Paper;
    printed = { card: cardSvg(data, r, item), sheets: sheetSvgs(data, r, listed.filter((_, i) => ticked.has(i)), paper) };
    fillPrintArea(printArea, printed.card, printed.sheets, paper);
    state.printReady = true;
  }
  function printSoon(): void {
    state.printReady = false;
    window.clearTimeout(printTimer);
    printTimer = window.setTimeout(() => void fontsReady.then(buildPrint), 250);
  }

  // ---- the pitch shown ----
  function showPitch(pitch: ViewPitch, source: "staff" | "form", index = -1): void {
    shown = pitch;
    state.source = source;
    state.pitchIndex = index;
    if (source === "form" && !formOption.isConnected) pitchSelect.append(formOption);
    pitchSelect.value = source === "form" ? "form" : String(index);
    const r = pitch.report;
    const s = r.input.settings;
    element(PAGE_IDS.pitchSummary).textContent = pitchSummary(r);
    const reach = element(PAGE_IDS.reach);
    reach.textContent = reachWords(r).replace(/screen for it with --want (\w+)/, (_all, key: string) => `choose \u201c${key}\u201d as the wanted seam movement and screen again`);
    reach.classList.toggle("out", r.reach.outOfReach);
    band = bandFromDegrees(s.bandCenterDeg, s.bandWidthDeg);
    const seam = seamFor(s.seamShape, s.seamPoints);
    shares = new LiveSeamShares(seam, band);
    scene?.setGeometry(seam, stitchLayout(s.seamShape), band);
    scene?.setPitch(pitch.frame, gyroRad());
    orbit?.setHome(homeView(r));
    const across = movementClock(pitch.frame.pushLine[0], pitch.frame.pushLine[2], r.input.pitch.view as ClockView);
    element(PAGE_IDS.sidePlusLabel).textContent = `+ side (toward ${across ?? "-"})`;
    element(PAGE_IDS.sideMinusLabel).textContent = `\u2212 side (toward ${oppositeClock(across) ?? "-"})`;
    listed = listOrientations(r);
    ticked = new Set(listed.map((_, i) => i));
    renderOrientationList(list, listed, 0, chooseOrientation, ticked, (i, on) => {
      if (on) ticked.add(i);
      else ticked.delete(i);
      printSoon();
    });
    chooseOrientation(0);
  }

  function chooseOrientation(index: number): void {
    const r = report();
    const n = listed.length;
    if (!r || !n) return;
    state.orientationIndex = ((index % n) + n) % n;
    markChosen(list, state.orientationIndex);
    const item = listed[state.orientationIndex];
    const o = item.orientation;
    const s = r.input.settings;
    element(PAGE_IDS.orientationTitle).textContent = orientationTitle(r, o);
    const words = element(PAGE_IDS.gripWords);
    words.replaceChildren(...holdLines(r, o).map((line) => Object.assign(document.createElement("li"), { textContent: line })));
    renderFigures(element(PAGE_IDS.numbers), o);
    element(PAGE_IDS.averagePlus).textContent = percentText(o.occupancy.axisPlus);
    element(PAGE_IDS.averageMinus).textContent = percentText(o.occupancy.axisMinus);
    const pushScale = Math.max(...listed.map((x) => Math.hypot(x.orientation.seamForce.across, x.orientation.seamForce.alongMagnus)));
    scene?.setOrientation(o.axis, gyroRad(), o.seamForce, pushScale);
    const pads: PadMark[] = o.fingers.map((f) => {
      const size = PAD_SIZE_IN[f.finger as Finger] ?? PAD_SIZE_IN.index;
      return { direction: f.direction, pointing: f.pointing, widthIn: size.widthIn, lengthIn: size.lengthIn, label: PAD_LABELS[f.finger] ?? f.finger, working: f.working };
    });
    scene?.setPads(pads);
    state.releaseRad = shown ? releasePhase(shown.frame, o.axis, gyroRad(), o.release.ballToField) : 0;
    shares?.setOrientation(o.axis, gyroRad());
    const m = measureOrientation({ axis: o.axis, gyroRad: gyroRad() }, { band: band ?? undefined, seamShape: s.seamShape, seamPoints: s.seamPoints });
    pageAverages = { seamInBand: m.seamInBand, axisPlus: m.axisPlus, axisMinus: m.axisMinus, alongAxis: m.alongAxis };
    series = {
      plus: m.timeline ? Array.from(m.timeline.axisPlus) : [],
      minus: m.timeline ? Array.from(m.timeline.axisMinus) : [],
      averagePlus: o.occupancy.axisPlus,
      averageMinus: o.occupancy.axisMinus,
    };
    timeline.draw(series);
    dial.draw(r, listed, state.orientationIndex);
    status.textContent = `Showing ${item.label} for ${pitchLabel(r)}.`;
    state.dirty = true;
    printSoon();
  }

  // ---- screening the form's pitch in the worker ----
  async function screenRequest(request: Request, fromForm: boolean): Promise<{ doc: Record<string, unknown>; view: ViewPitch }> {
    state.busy = true;
    screenButton.disabled = true;
    progress.hidden = false;
    progress.value = 0;
    screenStatus.textContent = "Screening every spin-axis position on the ball\u2026";
    try {
      const answer = await client.screen(request, (done, total) => {
        progress.value = done / total;
        screenStatus.textContent = done === 1 ? "Swept the ball; flying the best grips and the classic holds\u2026" : `Flying grip ${done - 1} of ${total - 1}\u2026`;
      });
      state.screens++;
      state.lastScreenMs = answer.ms;
      const doc = JSON.parse(answer.json) as Record<string, unknown>;
      const view = { report: reportOf(doc), frame: answer.frame };
      if (fromForm) {
        screenStatus.textContent = `Screened in ${(answer.ms / 1000).toFixed(1)} s: the grips are listed under \u201cGrips for this pitch\u201d.`;
        showPitch(view, "form");
        showGrips();
      } else screenStatus.textContent = "";
      return { doc, view };
    } finally {
      state.busy = false;
      screenButton.disabled = false;
      progress.hidden = true;
    }
  }

  /** Brings the list of grips to the top of the panel (which scrolls by itself on a wide screen) or of the window. */
  function showGrips(): void {
    const section = element("orientations-title").parentElement!;
    const panel = section.closest<HTMLElement>(".panel");
    if (panel && panel.scrollHeight > panel.clientHeight + 1 && getComputedStyle(panel).overflowY === "auto") panel.scrollTop = section.offsetTop - 8;
    else section.scrollIntoView({ block: "start" });
  }

  /** The page's settings with the form's (or a script's) options over them; the air given here replaces the page's. */
  function withSettings(options: Request): Request {
    const settings: Record<string, string> = { ...data.settings };
    if (AIR_OPTIONS.some((k) => options[k] !== undefined)) for (const k of AIR_OPTIONS) delete settings[k];
    return { ...settings, ...options };
  }

  form.addEventListener("submit", (e) => {
    e.preventDefault();
    clearFieldErrors();
    screenRequest(withSettings(formRequest()), true).catch((err: Error) => {
      const field = err instanceof ScreenInputError ? showFieldError(err.message) : null;
      if (field) {
        screenStatus.textContent = "Not screened: see the message beside the field.";
        element(field).focus();
      } else screenStatus.textContent = `Not screened: ${err.message}`;
    });
  });
  for (const id of [FORM_FIELDS.gyroAs.id, FORM_FIELDS.tiltAs.id]) element(id).addEventListener("change", syncGyroSign);

  // ---- the turn, the camera, the labels ----
  function setPlaying(playing: boolean): void {
    state.playing = playing;
    playButton.textContent = playing ? "Pause" : "Play";
    playButton.dataset.playing = String(playing);
    state.dirty = true;
  }

  function currentPreset(): CameraPreset | null {
    if (!orbit) return null;
    const hand = (report()?.input.pitch.hand ?? "right") as "right" | "left";
    const v = orbit.view;
    const same = (a: OrbitView) => Math.abs(Math.cos(a.azimuthRad - v.azimuthRad) - 1) < 1e-9 && Math.abs(a.elevationRad - v.elevationRad) < 1e-9;
    return CAMERA_PRESETS.find((p) => same(presetView(p, hand))) ?? null;
  }

  function layOutLabels(): void {
    if (!scene || !orbit) return;
    const rect = canvas.getBoundingClientRect();
    const w = rect.width;
    const h = rect.height;
    const anchors = scene.labelAnchors();
    const cam = scene.camera.position;
    const eye: [number, number, number] = [cam.x, cam.y, cam.z];
    const boxes: LabelBox[] = [];
    const hidden: boolean[] = [];
    const seen = new Set<string>();
    for (const a of anchors) {
      seen.add(a.key);
      let node = labelNodes.get(a.key);
      if (!node) {
        node = document.createElement("div");
        node.className = "ball-label";
        labelLayer.append(node);
        labelNodes.set(a.key, node);
      }
      if (node.textContent !== a.text) node.textContent = a.text;
      // a pad's letter is white on a dark blue pill; the others are in their arrow's colour on the page's ground
      const pad = a.key.startsWith("pad-");
      node.classList.toggle("pad", pad);
      node.style.color = pad ? "" : a.color;
      // measured while shown: a hidden label has no size
      node.hidden = false;
      const p = new Vector3().copy(a.world).project(scene.camera);
      const x = ((p.x + 1) / 2) * w;
      const y = ((1 - p.y) / 2) * h;
      // a pad's label only while the pad faces the camera (not just round the ball's edge)
      const facing = pad ? a.world.clone().normalize().dot(new Vector3().subVectors(cam, a.world).normalize()) : 1;
      hidden.push(p.z > 1 || behindBall(eye, [a.world.x, a.world.y, a.world.z]) || facing < PAD_FACING_MIN);
      boxes.push({ x, y, width: node.offsetWidth, height: node.offsetHeight });
    }
    for (const [key, node] of labelNodes) if (!seen.has(key)) node.hidden = true;
    const placed = placeLabels(boxes, w, h, hidden);
    laidOut = anchors.map((a, i) => {
      const node = labelNodes.get(a.key)!;
      node.hidden = !placed[i].shown;
      node.style.transform = `translate(${placed[i].left.toFixed(1)}px, ${placed[i].top.toFixed(1)}px)`;
      return { key: a.key, text: a.text, shown: placed[i].shown, left: placed[i].left, top: placed[i].top, width: boxes[i].width, height: boxes[i].height };
    });
  }

  /** Brings the readouts, the seam colours, the ball and its labels to the current phase. */
  function refresh(): void {
    const phaseDeg = (state.phaseRad / DEG) % 360;
    if (shares) shares.update(state.phaseRad, live);
    scene?.setPhase(state.phaseRad);
    if (shares) scene?.setSeamStates(shares.states);
    element(PAGE_IDS.livePlus).textContent = shown ? percentText(live.axisPlus) : "-";
    element(PAGE_IDS.liveMinus).textContent = shown ? percentText(live.axisMinus) : "-";
    const shownDeg = Math.round(phaseDeg) % 360;
    if (document.activeElement !== phaseInput) phaseInput.value = String(shownDeg);
    phaseOut.textContent = `${shownDeg}\u00b0`;
    timeline.setPhase(phaseDeg);
    if (scene && orbit) {
      orbit.apply(scene.camera);
      scene.camera.updateMatrixWorld();
      scene.render();
      layOutLabels();
      const preset = currentPreset();
      for (const p of CAMERA_PRESETS) element(cameraButton[p]).setAttribute("aria-pressed", String(p === preset));
    }
    state.frames++;
    if (state.firstFrameMs === null && shown) state.firstFrameMs = performance.now();
  }

  function resize(): void {
    if (!scene) return;
    const rect = canvas.getBoundingClientRect();
    scene.resize(Math.max(1, Math.round(rect.width)), Math.max(1, Math.round(rect.height)), Math.min(2, window.devicePixelRatio || 1));
    state.dirty = true;
  }

  const cameraButton: Record<CameraPreset, string> = { pitcher: PAGE_IDS.cameraPitcher, side: PAGE_IDS.cameraSide, catcher: PAGE_IDS.cameraCatcher };
  for (const p of CAMERA_PRESETS) {
    element(cameraButton[p]).addEventListener("click", () => orbit?.setView(presetView(p, (report()?.input.pitch.hand ?? "right") as "right" | "left")));
  }
  playButton.addEventListener("click", () => setPlaying(!state.playing));
  speed.addEventListener("input", () => {
    state.turnsPerMinute = Number(speed.value);
    speedOut.textContent = `${speed.value} turns/min`;
  });
  phaseInput.addEventListener("input", () => {
    setPlaying(false);
    state.phaseRad = Number(phaseInput.value) * DEG;
    state.dirty = true;
  });
  element(PAGE_IDS.release).addEventListener("click", () => {
    setPlaying(false);
    state.phaseRad = state.releaseRad;
    orbit?.setView(presetView("pitcher", (report()?.input.pitch.hand ?? "right") as "right" | "left"));
    state.dirty = true;
  });
  showFingers.addEventListener("change", () => {
    scene?.showPads(showFingers.checked);
    state.dirty = true;
  });
  element(PAGE_IDS.resetView).addEventListener("click", () => orbit?.reset());
  element(PAGE_IDS.previous).addEventListener("click", () => chooseOrientation(state.orientationIndex - 1));
  element(PAGE_IDS.next).addEventListener("click", () => chooseOrientation(state.orientationIndex + 1));
  pitchSelect.addEventListener("change", () => {
    if (pitchSelect.value === "form") return;
    const i = Number(pitchSelect.value);
    fillForm(data.pitches[i].report.input.pitch, data.settings);
    clearFieldErrors();
    showPitch(data.pitches[i], "staff", i);
  });
  paperSelect.addEventListener("change", printSoon);
  element(PAGE_IDS.print).addEventListener("click", () => {
    void fontsReady.then(() => {
      buildPrint();
      window.print();
    });
  });
  window.addEventListener("beforeprint", () => {
    if (!state.printReady) buildPrint();
  });
  new ResizeObserver(resize).observe(canvas.parentElement ?? canvas);
  window.addEventListener("resize", resize);

  const viewState = (): ViewState => ({
    pitchIndex: state.pitchIndex,
    source: state.source,
    orientationIndex: state.orientationIndex,
    label: listed[state.orientationIndex]?.label ?? "",
    phaseDeg: state.phaseRad / DEG,
    playing: state.playing,
    webgl: scene !== null,
    frames: state.frames,
    live: { ...live },
    pageAverages: { ...pageAverages },
    timeline: { plus: Array.from(series.plus), minus: Array.from(series.minus) },
    camera: { preset: currentPreset(), azimuthDeg: (orbit?.view.azimuthRad ?? 0) / DEG, elevationDeg: (orbit?.view.elevationRad ?? 0) / DEG },
    labels: laidOut.map((l) => ({ ...l })),
    releaseDeg: state.releaseRad / DEG,
    screens: state.screens,
    lastScreenMs: state.lastScreenMs,
    busy: state.busy,
    screenInWorker: client.worker !== null,
    printReady: state.printReady,
    firstFrameMs: state.firstFrameMs,
  });
  window.seamAtlasView = { state: viewState };
  window.seamAtlas = {
    state: viewState,
    printed: () => (printed ? { card: printed.card, sheets: [...printed.sheets] } : null),
    async screen(options) {
      const request: Record<string, string> = {};
      for (const [k, v] of Object.entries(options ?? {})) {
        if (!SCRIPT_OPTIONS.has(k)) throw new Error(`seamAtlas.screen: option "${k}" is not one the page takes; expected ${[...SCRIPT_OPTIONS].join(", ")}`);
        request[k] = String(v);
      }
      return (await screenRequest(withSettings(request), false)).doc;
    },
  };

  resize();
  syncGyroSign();
  setPlaying(state.playing);
  if (data.pitches.length) {
    fillForm(data.pitches[0].report.input.pitch, data.settings);
    showPitch(data.pitches[0], data.fromFile ? "staff" : "form", data.fromFile ? 0 : -1);
  } else {
    // nothing screened yet: an example in the form, screened here
    fillForm(EXAMPLE, data.settings);
    form.requestSubmit();
  }
  let last: number | null = null;
  const frame = (now: number) => {
    if (state.playing && last !== null) {
      const dtS = Math.min(0.1, (now - last) / 1000);
      state.phaseRad = (state.phaseRad + (TWO_PI * state.turnsPerMinute * dtS) / 60) % TWO_PI;
      state.dirty = true;
    }
    last = now;
    if (state.dirty) {
      state.dirty = false;
      refresh();
    }
    requestAnimationFrame(frame);
  };
  requestAnimationFrame(frame);
}

if (typeof document === "undefined") runScreenWorker(self as unknown as DedicatedWorkerGlobalScope);
else start(document.currentScript?.textContent ?? "");

