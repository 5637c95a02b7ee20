/**
 * The files a run reads, each with the option that named it, so that no output of
 * the run replaces one of them (io/outputPlan.ts compares paths, real paths and
 * inodes). A new option that reads a file is added to INPUT_OPTIONS.
 */
import { join } from "node:path";
import type { InputRef } from "../../io/outputPlan.js";
import { projectRoot } from "../../version.js";
import { demoStaffPath } from "./pitch.js";
import type { Request } from "./values.js";

/** Options whose value is a file the run reads. */
export const INPUT_OPTIONS = ["pitch", "csv-in", "model"] as const;

/** The files `request` reads: the options' files, and the demo's files with --demo. */
export function inputFiles(request: Request): InputRef[] {
  const files: InputRef[] = [];
  for (const option of INPUT_OPTIONS) {
    const path = request[option];
    if (typeof path === "string" && path !== "") files.push({ option: `--${option}`, path });
  }
  if (request.demo === true) {
    files.push({ option: "--demo", path: demoStaffPath() }, { option: "--demo", path: join(projectRoot(), "templates", "demo.json") });
  }
  return files;
}
