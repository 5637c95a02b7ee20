/**
 * `npm run bench`: speed figures for people, and one JSON object (printed with
 * --json, and always written to out/bench.json). Run on the compiled JavaScript.
 */
import { spawn, spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { planOutputs, writeOutput } from "../io/output.js";
import { join } from "node:path";
import { performance } from "node:perf_hooks";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { DEFAULT_SEAM_POINTS } from "../../geometry/seamSamples.js";
import { DEG } from "../../geometry/units.js";
import { DEFAULT_BAND } from "../sampling/band.js";
import { bandAveragesBrute } from "../sampling/brute.js";
import { bandAveragesExact, emptyAverages } from "../sampling/exact.js";
import { seamFor } from "../sampling/measure.js";
import { computeSphereMap } from "../sampling/sphereMap.js";
import { projectRoot, TOOL_VERSION } from "../version.js";
import { demoStaffPath, pitchesFromFile } from "../jobs/request/pitch.js";
import { parseAtlas, runAtlas } from "../jobs/atlas.js";
import { parseScreen, screenOne } from "../jobs/screen.js";
import { Explainer } from "../physics/explain.js";
import { simulateFlight } from "../physics/flight.js";
import { releasePosition, releaseVelocity } from "../physics/launch.js";
import { airState } from "../physics/air.js";
import { spinVector } from "../physics/pitchFlight.js";
import { seamHookTimeResolved, seamHookTurnAverage } from "../physics/seamModel/hooks.js";
import { seamModel } from "../physics/seamModel/model.js";
import { turnAverage } from "../physics/seamModel/turn.js";
import { calibratableNames, calibrateSeamModel, syntheticLabRows } from "../physics/calibrate/index.js";
import { defaultProfile, resolveProfile } from "../physics/seamModel/parameters.js";
import { workbenchFigures } from "./workbench.js";

const BRUTE_STEPS = 720;

function randomAxes(count: number, seed: number): Float64Array {
  let state = seed >>> 0;
  const rnd = () => (state = (Math.imul(state, 1664525) + 1013904223) >>> 0) / 4294967296;
  const out = new Float64Array(3 * count);
  for (let i = 0; i < count; i++) {
    const z = 2 * rnd() - 1;
    const phi = 2 * Math.PI * rnd();
    const r = Math.sqrt(1 - z * z);
    out[3 * i] = r * Math.cos(phi);
    out[3 * i + 1] = r * Math.sin(phi);
    out[3 * i + 2] = z;
  }
  return out;
}

/** Runs `work` repeatedly for at least `minSeconds` and returns calls per second. */
function rate(work: () => number, minSeconds: number): number {
  let calls = 0;
  const t0 = performance.now();
  let elapsed = 0;
  while (elapsed < minSeconds) {
    calls += work();
    elapsed = (performance.now() - t0) / 1000;
  }
  return calls / elapsed;
}

/**
 * Best rate of each of two workloads over `rounds` alternating rounds. This machine is a
 * shared virtual machine whose speed wanders by up to 2x from second to second; the best
 * of several short alternating runs compares the two at the machine's own speed.
 */
function bestRates(a: () => number, b: () => number, rounds: number, secondsEach: number): [number, number] {
  a();
  b();
  let bestA = 0;
  let bestB = 0;
  for (let r = 0; r < rounds; r++) {
    bestA = Math.max(bestA, rate(a, secondsEach));
    bestB = Math.max(bestB, rate(b, secondsEach));
  }
  return [bestA, bestB];
}

/** Best wall time of `runs` whole processes `node ARGS`, s (cold starts: each is a new process); `before` runs before each, untimed. */
function processSeconds(args: string[], runs: number, before: () => void = () => {}): number {
  let best = Infinity;
  for (let i = 0; i < runs; i++) {
    before();
    const t0 = performance.now();
    const r = spawnSync(process.execPath, args, { stdio: "ignore" });
    const t = (performance.now() - t0) / 1000;
    if (r.status !== 0) throw new Error(`node ${args.join(" ")} exited ${r.status}`);
    best = Math.min(best, t);
  }
  return best;
}

/** Start-up of the command line against Node itself (issue target: --help <= 3x, measure <= 5x). */
function startup() {
  const cli = join(projectRoot(), "out", "build", "cli", "main.js");
  const nodeSeconds = processSeconds(["-e", "0"], 7);
  const helpSeconds = processSeconds([cli, "--help"], 7);
  const measureSeconds = processSeconds([cli, "measure", "--axis", "waist-A"], 7);
  const r = (x: number) => Math.round(x * 1000) / 1000;
  return {
    nodeSeconds: r(nodeSeconds),
    helpSeconds: r(helpSeconds),
    measureSeconds: r(measureSeconds),
    helpOverNode: Math.round((helpSeconds / nodeSeconds) * 10) / 10,
    measureOverNode: Math.round((measureSeconds / nodeSeconds) * 10) / 10,
  };
}

/** A synthetic session CSV of `rows` tracked pitches in our keys (plausible numbers, fixed seed; no physics needed for speed). */
function syntheticSession(path: string, rows: number): void {
  let state = 12345;
  const rnd = () => (state = (Math.imul(state, 1664525) + 1013904223) >>> 0) / 4294967296;
  const types: [string, number, number, number, number, number, number][] = [
    ["four-seam", 94, 2350, 45, 5, 9, 16], ["sinker", 92, 2150, 105, 10, 15, 9], ["slider", 85, 2450, 570, 35, -4, 2], ["changeup", 85, 1750, 95, 15, 14, 6],
  ];
  const lines = ["pitcher,pitch,hand,speed_mph,spin_rpm,tilt,view,gyro_deg,move_arm_in,move_up_in"];
  for (let i = 0; i < rows; i++) {
    const t = types[i % 4];
    const m = Math.round(t[3] + 30 * (rnd() - 0.5) + 720) % 720;
    const tilt = `${Math.floor(m / 60) || 12}:${String(m % 60).padStart(2, "0")}`;
    lines.push(
      `P${i % 25},${t[0]},${i % 5 === 0 ? "left" : "right"},${(t[1] + 2 * (rnd() - 0.5)).toFixed(1)},${Math.round(t[2] + 150 * (rnd() - 0.5))},${tilt},pitcher,` +
        `${(t[4] + 10 * (rnd() - 0.5)).toFixed(1)},${(t[5] + 4 * (rnd() - 0.5)).toFixed(1)},${(t[6] + 4 * (rnd() - 0.5)).toFixed(1)}`,
    );
  }
  writeFileSync(path, lines.join("\n") + "\n");
}

/** One whole `seam-atlas explain --csv-in` process: wall time, s, and peak resident size, MB (VmHWM, polled). */
async function explainProcess(csv: string, out: string, cache: string): Promise<{ seconds: number; peakMB: number }> {
  const cli = join(projectRoot(), "out", "build", "cli", "main.js");
  const t0 = performance.now();
  const child = spawn(process.execPath, [cli, "explain", "--csv-in", csv, "--out", out, "--cache", cache], { stdio: "ignore" });
  let peakKB = 0;
  const poll = setInterval(() => {
    try {
      const m = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${child.pid}/status`, "utf8"));
      if (m) peakKB = Math.max(peakKB, Number(m[1]));
    } catch {
      // the process has ended
    }
  }, 20);
  const code = await new Promise<number | null>((done) => child.on("close", done));
  clearInterval(poll);
  if (code !== 0) throw new Error(`explain --csv-in ${csv} exited ${code}`);
  return { seconds: (performance.now() - t0) / 1000, peakMB: Math.round(peakKB / 102.4) / 10 };
}

/** The analyst's batch through the command line: 1,000 rows (target <= 3 s as a whole process) and 100,000 (target >= 3,000 rows/s); the map cache warmed first. */
async function explainBatches(skipLarge: boolean) {
  const dir = mkdtempSync(join(tmpdir(), "seam-atlas-bench-"));
  const cache = join(dir, "cache");
  try {
    const small = join(dir, "1k.csv");
    syntheticSession(small, 1000);
    await explainProcess(small, join(dir, "warm.csv"), cache); // the coefficient maps into the cache
    let best1k = { seconds: Infinity, peakMB: 0 };
    for (let i = 0; i < 3; i++) {
      const r = await explainProcess(small, join(dir, "1k-out.csv"), cache);
      if (r.seconds < best1k.seconds) best1k = r;
    }
    let large: { seconds: number; peakMB: number; rows: number } | undefined;
    if (!skipLarge) {
      const big = join(dir, "100k.csv");
      syntheticSession(big, 100_000);
      large = { ...(await explainProcess(big, join(dir, "100k-out.csv"), cache)), rows: 100_000 };
    }
    return {
      rows1k: { seconds: Math.round(best1k.seconds * 100) / 100, rowsPerSecond: Math.round(1000 / best1k.seconds), peakMB: best1k.peakMB },
      ...(large ? { rows100k: { seconds: Math.round(large.seconds * 10) / 10, rowsPerSecond: Math.round(large.rows / large.seconds), peakMB: large.peakMB } } : {}),
    };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

async function main(): Promise<void> {
  const json = process.argv.includes("--json");
  // through the one output writer, planned before the figures are taken
  const [benchFile] = planOutputs([{ option: "the benchmark's file", path: join(projectRoot(), "out", "bench.json"), format: "json" }], []);
  const start = startup();
  const seam = seamFor(DEFAULT_SEAM_SHAPE, DEFAULT_SEAM_POINTS);
  const gyro = 10 * DEG;
  const axes = randomAxes(512, 1);
  const r = emptyAverages();
  let sink = 0;
  const [exactPerSecond, brutePerSecond] = bestRates(
    () => {
      for (let i = 0; i < 512; i++) sink += bandAveragesExact(seam, axes[3 * i], axes[3 * i + 1], axes[3 * i + 2], gyro, DEFAULT_BAND, r).seamInBand;
      return 512;
    },
    () => {
      for (let i = 0; i < 4; i++) sink += bandAveragesBrute(seam, axes[3 * i], axes[3 * i + 1], axes[3 * i + 2], gyro, DEFAULT_BAND, BRUTE_STEPS, r).seamInBand;
      return 4;
    },
    6,
    0.5,
  );
  computeSphereMap(seam, gyro, DEFAULT_BAND, 2 * DEG); // warm-up
  let mapSeconds = Infinity;
  let map = computeSphereMap(seam, gyro, DEFAULT_BAND, 1 * DEG);
  for (let rep = 0; rep < 3; rep++) {
    const t0 = performance.now();
    map = computeSphereMap(seam, gyro, DEFAULT_BAND, 1 * DEG);
    mapSeconds = Math.min(mapSeconds, (performance.now() - t0) / 1000);
  }
  // screening: the default screen of one pitch, then the whole demo staff
  const staff = pitchesFromFile(demoStaffPath()).pitches;
  const screenJob = parseScreen({ demo: true, cache: "none" });
  screenOne(screenJob, screenJob.pitches[1]); // warm-up
  let screenSeconds = Infinity;
  for (let rep = 0; rep < 3; rep++) {
    const t0 = performance.now();
    screenOne(screenJob, screenJob.pitches[1]);
    screenSeconds = Math.min(screenSeconds, (performance.now() - t0) / 1000);
  }
  const tStaff = performance.now();
  for (const p of screenJob.pitches) screenOne(screenJob, p);
  const staffSeconds = (performance.now() - tStaff) / 1000;
  // the seam-force model: turn averages per second at the default resolution
  const model = seamModel();
  const [turnAveragesPerSecond] = bestRates(
    () => {
      for (let i = 0; i < 64; i++) sink += turnAverage(model, [axes[3 * i], axes[3 * i + 1], axes[3 * i + 2]], gyro).across;
      return 64;
    },
    () => 1,
    3,
    0.5,
  );
  // flight: one full pitch with drag, Magnus and the seam-force hook
  const sinker = staff[1].pitch;
  const air = airState();
  const launch = { releasePositionM: releasePosition({ hand: sinker.hand }), releaseVelocityMPerS: releaseVelocity(sinker.speedMPerS, -DEG, 0.02), spinRadPerS: spinVector(sinker) };
  const hook = seamHookTurnAverage(model, [0.6, 0.8, 0], sinker.gyroRad);
  const flightsPerSecond = rate(() => {
    for (let i = 0; i < 50; i++) sink += simulateFlight(launch, { air, seamForce: hook }).timeToPlateS;
    return 50;
  }, 2);
  // time-resolved flights: a new release phase (and so a new timeline) every flight, as a phase sweep does
  let phaseIndex = 0;
  const timeResolvedPerSecond = rate(() => {
    for (let i = 0; i < 20; i++) {
      const resolved = seamHookTimeResolved(model, [axes[3 * i], axes[3 * i + 1], axes[3 * i + 2]], sinker.gyroRad, { phaseRad: 0.1 * phaseIndex++, spinRadPerS: sinker.spinRadPerS });
      sink += simulateFlight(launch, { air, seamForce: resolved }).timeToPlateS;
    }
    return 20;
  }, 2);
  // explain: 3,000 tracked pitches with gyro angles spread over -20 to 45 deg (maps included)
  const explainer = new Explainer();
  const rows = 3000;
  const t1 = performance.now();
  for (let i = 0; i < rows; i++) {
    const g = (-20 + (65 * ((i * 0.618034) % 1))) * DEG;
    const e = explainer.explain({ pitch: { ...sinker, gyroRad: g }, observedArmSideM: 0.42, observedUpM: 0.3 });
    sink += e.residual.armSideM;
  }
  const explainRowsPerSecond = rows / ((performance.now() - t1) / 1000);
  // the demo staff's atlas, as `seam-atlas atlas --demo` makes it (default settings, top 4)
  const tAtlas = performance.now();
  const atlas = await runAtlas(parseAtlas({ demo: true, cache: "none" }));
  const atlasSeconds = (performance.now() - tAtlas) / 1000;
  // calibrate: 1,000 lab rows made by the model from a planted profile (a quarter turn-averaged, 0.01 N of noise),
  // every calibratable parameter fitted from the defaults, as `seam-atlas calibrate --lab FILE` does
  const planted = resolveProfile(
    { name: "planted", parameters: { scale: 0.6, wakePressureCoefficient: -0.35, laminarSeparationDeg: 82, turbulentSeparationDeg: 115, tripStartDeg: 13.3, tripEndDeg: 44.6 } },
    "bench",
  );
  const calibrationRows = syntheticLabRows({ profile: planted, count: 1000, seed: 1, noiseN: 0.01, turnAveragedShare: 0.25 }).map((x) => x.observation);
  const tCal = performance.now();
  const calibration = calibrateSeamModel({ start: defaultProfile(), fit: calibratableNames(), lab: calibrationRows, sigmaN: 0.01 });
  const calibrateSeconds = (performance.now() - tCal) / 1000;
  // and as a whole process, as a user runs it (target: <= 2.5 s; best of 3), with an empty map cache
  // each time (cold) and with the maps of an earlier run on disk (warm)
  const atlasDir = mkdtempSync(join(tmpdir(), "seam-atlas-bench-"));
  const atlasCache = join(atlasDir, "cache");
  const atlasArgs = [join(projectRoot(), "out", "build", "cli", "main.js"), "atlas", "--demo", "--out", join(atlasDir, "atlas.pdf"), "--cache", atlasCache];
  const atlasColdSeconds = processSeconds(atlasArgs, 3, () => rmSync(atlasCache, { recursive: true, force: true }));
  const atlasWarmSeconds = processSeconds(atlasArgs, 3);
  rmSync(atlasDir, { recursive: true, force: true });
  // the analyst's batch as whole processes (--quick leaves out the 100,000 rows)
  const batches = await explainBatches(process.argv.includes("--quick"));
  // the workbench page in headless chromium (software WebGL)
  const workbench = await workbenchFigures();
  const mem = process.memoryUsage();
  const result = {
    tool: "seam-atlas",
    version: TOOL_VERSION,
    node: process.version,
    seamPoints: DEFAULT_SEAM_POINTS,
    sampler: {
      exactPolesPerSecond: Math.round(exactPerSecond),
      brutePolesPerSecond: Math.round(brutePerSecond * 10) / 10,
      bruteStepsPerRevolution: BRUTE_STEPS,
      exactOverBrute: Math.round(exactPerSecond / brutePerSecond),
    },
    sphereMap: {
      seconds: Math.round(mapSeconds * 1000) / 1000,
      cells: map.grid.count,
      evaluated: map.evaluated,
      spacingDeg: 1,
    },
    screen: {
      seconds: Math.round(screenSeconds * 1000) / 1000,
      staffSeconds: Math.round(staffSeconds * 1000) / 1000,
      staffPitches: staff.length,
    },
    flight: { pitchesPerSecond: Math.round(flightsPerSecond), timeResolvedPerSecond: Math.round(timeResolvedPerSecond) },
    seamModel: { turnAveragesPerSecond: Math.round(turnAveragesPerSecond), profileHash: model.profile.hash },
    atlas: {
      seconds: Math.round(atlasSeconds * 100) / 100,
      processSeconds: { coldCache: Math.round(atlasColdSeconds * 100) / 100, warmCache: Math.round(atlasWarmSeconds * 100) / 100 },
      pages: atlas.pages,
      bytes: atlas.bytes.length,
    },
    explain: { rowsPerSecond: Math.round(explainRowsPerSecond), rows, batch: batches },
    calibrate: {
      seconds: Math.round(calibrateSeconds * 10) / 10,
      rows: calibrationRows.length,
      turnAveraged: calibration.rows.labTurnAveraged,
      parameters: calibration.parameters.length,
      iterations: calibration.method.iterations,
      modelEvaluations: calibration.method.evaluations,
    },
    workbench,
    startup: start,
    memory: { rssMB: Math.round(mem.rss / 1e5) / 10, heapUsedMB: Math.round(mem.heapUsed / 1e5) / 10 },
  };
  if (!Number.isFinite(sink)) throw new Error("benchmark produced a non-finite sum");
  writeOutput(benchFile, JSON.stringify(result, null, 2) + "\n");
  if (json) {
    process.stdout.write(JSON.stringify(result) + "\n");
    return;
  }
  const s = result.sampler;
  process.stdout.write(
    [
      `seam-atlas ${TOOL_VERSION} benchmark (${process.version}, ${DEFAULT_SEAM_POINTS} seam points)`,
      `  exact sampler        ${s.exactPolesPerSecond.toLocaleString("en-US")} spin axes/s`,
      `  brute force          ${s.brutePolesPerSecond} spin axes/s (${BRUTE_STEPS} steps per revolution)`,
      `  exact / brute        ${s.exactOverBrute}x   (target >= 100x; best of 6 alternating half-second runs each)`,
      `  full-sphere map      ${result.sphereMap.seconds} s (best of 3) for ${result.sphereMap.cells.toLocaleString("en-US")} axes at 1 deg (${result.sphereMap.evaluated.toLocaleString("en-US")} evaluated, the rest by symmetry; target <= 2 s)`,
      `  seam-force model     ${result.seamModel.turnAveragesPerSecond.toLocaleString("en-US")} turn averages/s (default resolution)`,
      `  screen, one pitch    ${result.screen.seconds} s computing (default settings, best of 3; target <= 1 s)`,
      `  screen, demo staff   ${result.screen.staffSeconds} s for ${result.screen.staffPitches} pitches`,
      `  flight               ${result.flight.pitchesPerSecond.toLocaleString("en-US")} pitches/s (RK4, 1 ms steps, drag, Magnus, turn-averaged seam force; target >= 2,000)`,
      `  time-resolved flight ${result.flight.timeResolvedPerSecond.toLocaleString("en-US")} pitches/s (a new 360-phase timeline each; target >= 500)`,
      `  explain              ${result.explain.rowsPerSecond} rows/s over ${rows} rows with varied gyro, one thread (target >= 200)`,
      `  explain, 1k rows     ${batches.rows1k.seconds} s as a whole process, ${batches.rows1k.peakMB} MB peak (warm map cache, best of 3; target <= 3 s)`,
      ...(batches.rows100k
        ? [`  explain, 100k rows   ${batches.rows100k.rowsPerSecond.toLocaleString("en-US")} rows/s, ${batches.rows100k.seconds} s, ${batches.rows100k.peakMB} MB peak (worker threads; target >= 3,000 rows/s)`]
        : []),
      `  atlas, demo staff    ${result.atlas.seconds} s in process (cold map cache), ${result.atlas.pages} pages`,
      `  atlas --demo         as a whole process: ${result.atlas.processSeconds.coldCache} s with an empty map cache, ${result.atlas.processSeconds.warmCache} s with a warm one (best of 3 each; target <= 2.5 s)`,
      `  calibrate            ${result.calibrate.seconds} s for ${result.calibrate.rows.toLocaleString("en-US")} lab rows (${result.calibrate.turnAveraged} turn-averaged), ${result.calibrate.parameters} parameters, ${result.calibrate.modelEvaluations} evaluations (target <= 30 s)`,
      ...("skipped" in workbench
        ? [`  workbench page       skipped: ${workbench.skipped}`]
        : [
            `  workbench page       ${Math.round(workbench.htmlBytes.demo / 1024)} KB with the demo staff, ${Math.round(workbench.htmlBytes.empty / 1024)} KB empty; script ${Math.round(workbench.scriptBytes / 1024)} KB (three.js ${Math.round((workbench.bytesInOutput.three ?? 0) / 1024)} KB tree-shaken, svg.js ${Math.round((workbench.bytesInOutput["@svgdotjs/svg.js"] ?? 0) / 1024)} KB, ours ${Math.round((workbench.bytesInOutput["seam-atlas"] ?? 0) / 1024)} KB)`,
            `  workbench, first     ${workbench.firstRenderMs} ms to the first frame drawn, headless chromium with software WebGL (best of 3; target < 2,000 ms)`,
            `  workbench, screen    in the page's worker: ${workbench.pageScreenMs.first} ms the first pitch (worker start included), ${workbench.pageScreenMs.newPitch} ms a new pitch, ${workbench.pageScreenMs.again} ms the same again; Node: ${workbench.nodeScreenMs.newPitch} ms and ${workbench.nodeScreenMs.again} ms (best of 3; target: about 1 s)`,
          ]),
      `  start, --help        ${start.helpSeconds} s, ${start.helpOverNode}x node -e 0 (${start.nodeSeconds} s; target <= 3x; best of 7 processes)`,
      `  start, measure       ${start.measureSeconds} s for measure --axis waist-A, ${start.measureOverNode}x node -e 0 (target <= 5x)`,
      `  memory               ${result.memory.rssMB} MB resident`,
      `  written to out/bench.json`,
    ].join("\n") + "\n",
  );
}

main().catch((err) => {
  process.stderr.write(`benchmark failed: ${(err as Error).message}\n`);
  process.exit(1);
});
