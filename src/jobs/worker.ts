/**
 * The worker threads' one entry (jobs/pool.ts): a task is a screen of some pitches of a
 * job (screenPool.ts) or a packed block of explain's rows (explainBatch.ts). Each kind's
 * code is loaded by its first task, and what it builds (the screen job, the Explainer
 * and its coefficient maps) stays loaded between tasks. Bundled to
 * out/build/cli/worker.js (src/build/bundle.ts).
 */
import type { ExplainTask, PackedBlockResult } from "./explainBatch.js";
import type { PoolResult, ScreenTask } from "./screenPool.js";

export type WorkerTask = ExplainTask | ScreenTask;

export default async function runTask(task: WorkerTask): Promise<PackedBlockResult | PoolResult[]> {
  switch (task.kind) {
    case "explain":
      // numbers only: the main thread copies one typed array, not an object graph
      return (await import("./explainBatch.js")).explainBlockPacked(task.settings, task.rows, task.wantSums);
    case "screen":
      return (await import("./screenPool.js")).screenPitches(task);
  }
}
