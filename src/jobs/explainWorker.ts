/**
 * The worker thread's entry for explain's batch (explainBatch.ts): one task is one
 * packed block of rows; the Explainer and its coefficient maps stay loaded between
 * tasks. Bundled to out/build/cli/explainWorker.js (src/build/bundle.ts).
 */
import { explainBlock, type BlockResult, type ExplainSettings } from "./explainBatch.js";

export default function explainTask(task: { settings: ExplainSettings; rows: Float64Array; wantSums: boolean }): BlockResult {
  return explainBlock(task.settings, task.rows, task.wantSums);
}
