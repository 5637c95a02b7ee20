/// <reference lib="dom" />
/**
 * The 3-D page's entry (bundled by build.ts into one inline script).
 *
 * Reads the embedded screen report, draws the chosen orientation with the tool's
 * own geometry (geometry/seamSamples.ts, geometry/stitches.ts), and computes the
 * live in-band shares with the tool's own sampler (liveShare.ts) and the one-turn
 * timeline with `measureOrientation`, exactly as `seam-atlas measure` does.
 */
import { stitchLayout } from "../../../geometry/stitches.js";
import { DEG } from "../../../geometry/units.js";
import { bandFromDegrees, type Band } from "../../sampling/band.js";
import { measureOrientation, seamFor } from "../../sampling/measure.js";
import { BallScene, NoWebGLError } from "./ballScene.js";
import { listOrientations, pitchLabel, type ListedOrientation, type ViewData, type ViewPitch } from "./data.js";
import { oppositeClock } from "../../../geometry/clock.js";
import { movementClock, type ClockView } from "../../../geometry/frames.js";
import { percent as percentText } from "../numbers.js";
import { OrbitControl, type OrbitView } from "./orbit.js";
import { fieldToWorld } from "./sceneMath.js";
import { PAGE_IDS } from "./pageIds.js";
import { markChosen, pitchSummary, renderFigures, renderOrientationList } from "./panel.js";
import { LiveSeamShares, type InstantShares } from "./liveShare.js";
import { drawTimeline, type TimelineSeries } from "./timelinePlot.js";

/** What the page shows, readable from outside (the page tests, a curious user's console). */
export interface ViewState {
  pitchIndex: number;
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
}

declare global {
  interface Window {
    seamAtlasView?: { state(): ViewState };
  }
}

const TWO_PI = 2 * Math.PI;
/** Start view: from behind the clock's viewer, turned this far round and up so the flight arrow and the band are seen side-on. */
const HOME_AZIMUTH_OFFSET_RAD = 50 * DEG;
const HOME_ELEVATION_RAD = 34 * DEG;
const HOME_DISTANCE = 6.6;

function element<T extends HTMLElement>(id: string): T {
  const el = document.getElementById(id);
  if (!el) throw new Error(`the page has no element #${id}`);
  return el as T;
}

function readData(): ViewData {
  return JSON.parse(element(PAGE_IDS.data).textContent ?? "") as ViewData;
}

/**
 * The start view for a pitch: from behind the pitcher (looking along the flight) or
 * from behind the catcher, as the pitch's clock is read, turned to whichever side
 * the top candidate's push arrow points, so the arrow is in front of the ball.
 */
function homeView(pitch: ViewPitch): OrbitView {
  // field +y (toward the pitcher) is world -z, azimuth pi; field -y is world +z, azimuth 0
  const base = pitch.report.input.pitch.view === "catcher" ? 0 : Math.PI;
  const top = pitch.report.candidates[0] ?? pitch.report.references[0];
  const m = top ? top.seamMovement : { horizontalIn: 0, verticalIn: 1 };
  const push = fieldToWorld([m.horizontalIn, 0, m.verticalIn]);
  const facing = (azimuthRad: number) => push.x * Math.sin(azimuthRad) + push.z * Math.cos(azimuthRad);
  const right = base + HOME_AZIMUTH_OFFSET_RAD;
  const left = base - HOME_AZIMUTH_OFFSET_RAD;
  return { azimuthRad: facing(left) > facing(right) + 1e-9 ? left : right, elevationRad: HOME_ELEVATION_RAD, distance: HOME_DISTANCE };
}

function start(): void {
  const data = readData();
  const canvas = element<HTMLCanvasElement>(PAGE_IDS.canvas);
  const playButton = element<HTMLButtonElement>(PAGE_IDS.play);
  const speed = element<HTMLInputElement>(PAGE_IDS.speed);
  const speedOut = element<HTMLOutputElement>(PAGE_IDS.speedOut);
  const phaseInput = element<HTMLInputElement>(PAGE_IDS.phase);
  const phaseOut = element<HTMLOutputElement>(PAGE_IDS.phaseOut);
  const pitchSelect = element<HTMLSelectElement>(PAGE_IDS.pitchSelect);
  const list = element(PAGE_IDS.orientationList);
  const status = element(PAGE_IDS.status);
  const timelineCanvas = element<HTMLCanvasElement>(PAGE_IDS.timeline);

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
    orientationIndex: 0,
    phaseRad: 0,
    playing: !window.matchMedia("(prefers-reduced-motion: reduce)").matches,
    turnsPerMinute: Number(speed.value),
    frames: 0,
    dirty: true,
  };
  let listed: ListedOrientation[] = [];
  let shares: LiveSeamShares | null = null;
  let band: Band | null = null;
  const live: InstantShares = { seamInBand: 0, axisPlus: 0, axisMinus: 0 };
  let series: TimelineSeries = { plus: [], minus: [], averagePlus: 0, averageMinus: 0 };
  let pageAverages = { seamInBand: 0, axisPlus: 0, axisMinus: 0, alongAxis: 0 };
  const orbit = scene ? new OrbitControl(canvas, homeView(data.pitches[0]), () => (state.dirty = true)) : null;

  const pitch = () => data.pitches[state.pitchIndex];
  const gyroRad = () => pitch().report.input.pitch.gyroDeg * DEG;

  data.pitches.forEach((p, i) => {
    const option = document.createElement("option");
    option.value = String(i);
    option.textContent = pitchLabel(p.report);
    pitchSelect.append(option);
  });

  function choosePitch(index: number): void {
    state.pitchIndex = index;
    pitchSelect.value = String(index);
    const report = pitch().report;
    const s = report.input.settings;
    element(PAGE_IDS.pitchSummary).textContent = pitchSummary(report);
    band = bandFromDegrees(s.bandCenterDeg, s.bandWidthDeg);
    const seam = seamFor(s.seamShape, s.seamPoints);
    shares = new LiveSeamShares(seam, band);
    scene?.setGeometry(seam, stitchLayout(s.seamShape), band);
    scene?.setPitch(pitch().frame, gyroRad());
    orbit?.setHome(homeView(pitch()));
    const across = movementClock(pitch().frame.pushLine[0], pitch().frame.pushLine[2], report.input.pitch.view as ClockView);
    element(PAGE_IDS.sidePlusLabel).textContent = `+ side (toward ${across ?? "-"})`;
    element(PAGE_IDS.sideMinusLabel).textContent = `\u2212 side (toward ${oppositeClock(across) ?? "-"})`;
    listed = listOrientations(report);
    renderOrientationList(list, listed, 0, chooseOrientation);
    chooseOrientation(0);
  }

  function chooseOrientation(index: number): void {
    const n = listed.length;
    state.orientationIndex = ((index % n) + n) % n;
    markChosen(list, state.orientationIndex);
    const item = listed[state.orientationIndex];
    const o = item.orientation;
    const report = pitch().report;
    const s = report.input.settings;
    element(PAGE_IDS.orientationTitle).textContent = `${item.label}: ${o.latLon.text}, near ${o.landmark.name}`;
    renderFigures(element(PAGE_IDS.numbers), o);
    element(PAGE_IDS.averagePlus).textContent = percentText(o.occupancy.axisPlus);
    element(PAGE_IDS.averageMinus).textContent = percentText(o.occupancy.axisMinus);
    const pushScale = Math.max(...listed.map((x) => Math.hypot(x.orientation.seamForce.across, x.orientation.seamForce.alongMagnus)));
    scene?.setOrientation(o.axis, gyroRad(), o.seamForce, pushScale);
    shares?.setOrientation(o.axis, gyroRad());
    const m = measureOrientation({ axis: o.axis, gyroRad: gyroRad() }, { band: band ?? undefined, seamShape: s.seamShape, seamPoints: s.seamPoints });
    pageAverages = { seamInBand: m.seamInBand, axisPlus: m.axisPlus, axisMinus: m.axisMinus, alongAxis: m.alongAxis };
    series = {
      plus: m.timeline ? Array.from(m.timeline.axisPlus) : [],
      minus: m.timeline ? Array.from(m.timeline.axisMinus) : [],
      averagePlus: o.occupancy.axisPlus,
      averageMinus: o.occupancy.axisMinus,
    };
    status.textContent = `Showing ${item.label} for ${pitchLabel(report)}.`;
    state.dirty = true;
  }

  function setPlaying(playing: boolean): void {
    state.playing = playing;
    playButton.textContent = playing ? "Pause" : "Play";
    playButton.dataset.playing = String(playing);
    state.dirty = true;
  }

  /** Brings the readouts, the seam colours and the ball to the current phase. */
  function refresh(): void {
    const phaseDeg = (state.phaseRad / DEG) % 360;
    if (shares) shares.update(state.phaseRad, live);
    scene?.setPhase(state.phaseRad);
    if (shares) scene?.setSeamStates(shares.states);
    element(PAGE_IDS.livePlus).textContent = percentText(live.axisPlus);
    element(PAGE_IDS.liveMinus).textContent = percentText(live.axisMinus);
    const shown = Math.round(phaseDeg) % 360;
    if (document.activeElement !== phaseInput) phaseInput.value = String(shown);
    phaseOut.textContent = `${shown}\u00b0`;
    drawTimeline(timelineCanvas, series, phaseDeg);
    if (scene && orbit) {
      orbit.apply(scene.camera);
      scene.render();
    }
    state.frames++;
  }

  function resize(): void {
    if (!scene) return;
    const rect = canvas.getBoundingClientRect();
    scene.resize(Math.max(1, Math.round(rect.width)), Math.max(1, Math.round(rect.height)), Math.min(2, window.devicePixelRatio || 1));
    state.dirty = true;
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
  element(PAGE_IDS.resetView).addEventListener("click", () => orbit?.reset());
  element(PAGE_IDS.previous).addEventListener("click", () => chooseOrientation(state.orientationIndex - 1));
  element(PAGE_IDS.next).addEventListener("click", () => chooseOrientation(state.orientationIndex + 1));
  pitchSelect.addEventListener("change", () => choosePitch(Number(pitchSelect.value)));
  new ResizeObserver(resize).observe(canvas.parentElement ?? canvas);
  window.addEventListener("resize", resize);

  window.seamAtlasView = {
    state: () => ({
      pitchIndex: state.pitchIndex,
      orientationIndex: state.orientationIndex,
      label: listed[state.orientationIndex]?.label ?? "",
      phaseDeg: state.phaseRad / DEG,
      playing: state.playing,
      webgl: scene !== null,
      frames: state.frames,
      live: { ...live },
      pageAverages: { ...pageAverages },
      timeline: { plus: Array.from(series.plus), minus: Array.from(series.minus) },
    }),
  };

  resize();
  choosePitch(0);
  setPlaying(state.playing);
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

start();
