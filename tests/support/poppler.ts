/**
 * External readers for the paper tests (poppler's pdfinfo, pdftotext, pdftoppm).
 * Outside CI a missing tool skips the test with a note; under CI=true it fails,
 * since .ci/run installs poppler-utils.
 */
import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { it } from "vitest";

export function hasTool(name: string): boolean {
  return spawnSync("sh", ["-c", `command -v ${name}`]).status === 0;
}

const POPPLER = hasTool("pdftotext") && hasTool("pdfinfo") && hasTool("pdftoppm");
if (!POPPLER && process.env.CI !== "true") console.warn("poppler-utils not installed: PDF reader tests are skipped (apt-get install poppler-utils)");

/** `it` when poppler is here or CI is set (then a missing tool fails the test), else `it.skip`. */
export const itWithPoppler = POPPLER || process.env.CI === "true" ? it : it.skip;

export function run(cmd: string, args: string[]): string {
  const r = spawnSync(cmd, args, { encoding: "utf8" });
  if (r.error) throw new Error(`${cmd} could not run: ${r.error.message} (install poppler-utils)`);
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(" ")} failed: ${r.stderr}`);
  return r.stdout;
}

export function pdfPages(file: string): number {
  return Number(/Pages:\s+(\d+)/.exec(run("pdfinfo", [file]))![1]);
}

export function pdfPageSizePt(file: string): [number, number] {
  const m = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(run("pdfinfo", [file]))!;
  return [Number(m[1]), Number(m[2])];
}

export function pdfText(file: string, page?: number): string {
  const args = page ? ["-f", String(page), "-l", String(page), "-layout", file, "-"] : ["-layout", file, "-"];
  return run("pdftotext", args);
}

/** One page rendered to greyscale at `dpi`: width, height and the pixels (0 black .. 255 white). */
export function renderGray(file: string, page: number, dpi: number, outStem: string): { w: number; h: number; px: Uint8Array } {
  run("pdftoppm", ["-gray", "-r", String(dpi), "-f", String(page), "-l", String(page), "-singlefile", file, outStem]);
  const buf = readFileSync(`${outStem}.pgm`);
  // binary PGM: P5 <w> <h> <max>\n<pixels>
  const header = /^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(buf.subarray(0, 64).toString("latin1"))!;
  const w = Number(header[1]);
  const h = Number(header[2]);
  return { w, h, px: new Uint8Array(buf.subarray(header[0].length, header[0].length + w * h)) };
}

/** Standard deviation of the pixels in a box given in inches from the top-left. */
export function inkSpread(img: { w: number; h: number; px: Uint8Array }, dpi: number, box: { xIn: number; yIn: number; wIn: number; hIn: number }): number {
  let sum = 0;
  let sum2 = 0;
  let n = 0;
  for (let y = Math.floor(box.yIn * dpi); y < Math.min(img.h, (box.yIn + box.hIn) * dpi); y++) {
    for (let x = Math.floor(box.xIn * dpi); x < Math.min(img.w, (box.xIn + box.wIn) * dpi); x++) {
      const v = img.px[y * img.w + x];
      sum += v;
      sum2 += v * v;
      n++;
    }
  }
  const mean = sum / n;
  return Math.sqrt(Math.max(0, sum2 / n - mean * mean));
}
