/**
 * The worker thread's entry for explain's batch (explainBatch.ts): one task is one
 * packed block of rows; the Explainer and its coefficient maps stay loaded between
 * tasks. Bundled to out/build/cli/explainWorker.js (src/build/bundle.ts).
 */
import { explainBlockPacked, type ExplainSettings, type PackedBlockResult } from "./explainBatch.js";

export default function explainTask(task: { settings: ExplainSettings; rows: Float64Array; wantSums: boolean }): PackedBlockResult {
  // numbers only: the main thread copies one typed array, not an object graph
  return explainBlockPacked(task.settings, task.rows, task.wantSums);
}
