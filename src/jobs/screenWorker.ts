/**
 * A worker thread that screens some pitches of a job (screenPool.ts): it reads the
 * same request as the main thread, so it builds the same job (the same files, model
 * and settings), screens the pitches it is given with the same code, and posts back
 * each pitch's report and sphere-map values. The numbers are the main thread's to
 * the last bit: one code path, the same inputs.
 */
import { parentPort, workerData } from "node:worker_threads";
import { M_PER_IN } from "../../geometry/units.js";
import { parseScreen } from "./screen.js";
import { screenOne } from "./screen.js";
import type { PoolTask, PoolResult } from "./screenPool.js";

const task = workerData as PoolTask;
const job = parseScreen(task.request, task.top);
for (const i of task.indices) {
  const s = screenOne(job, job.pitches[i]);
  const values = s.result.scores.map((x) => x / M_PER_IN);
  const message: PoolResult = { index: i, report: s.report, mapValuesIn: values, gridSpacingRad: s.result.settings.gridSpacingRad };
  parentPort!.postMessage(message, [values.buffer]);
}
