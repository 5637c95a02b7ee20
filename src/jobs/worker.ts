/**
 * The worker threads' one entry (jobs/pool.ts): a task is a screen of some pitches of a
 * job (screenPool.ts) or a packed block of explain's rows (explainBatch.ts). What each
 * kind builds (the screen job, the Explainer and its coefficient maps) stays loaded
 * between tasks. Bundled to out/build/cli/worker.js (src/build/bundle.ts).
 */
import { explainBlockPacked, type ExplainTask, type PackedBlockResult } from "./explainBatch.js";
import { screenPitches, type PoolResult, type ScreenTask } from "./screenPool.js";

export type WorkerTask = ExplainTask | ScreenTask;

export default function runTask(task: WorkerTask): PackedBlockResult | PoolResult[] {
  switch (task.kind) {
    case "explain":
      // numbers only: the main thread copies one typed array, not an object graph
      return explainBlockPacked(task.settings, task.rows, task.wantSums);
    case "screen":
      return screenPitches(task);
  }
}
