/**
 * Noto Sans SC and KR are optional packages (development dependencies, 73 and 54 MB):
 * a user's plain install leaves them out. The built command line, run from a copy of
 * the project whose node_modules lacks them, must still print, Chinese, Japanese and
 * Korean as U+FFFD, and say once on standard error which package to install for each.
 */
import { cpSync, mkdirSync, mkdtempSync, readdirSync, symlinkSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { spawnSync } from "node:child_process";
import { describe, expect } from "vitest";
import { MISSING_GLYPH } from "../../src/render/fonts.js";
import { pdfRawText } from "../support/bidi.js";
import { ROOT } from "../support/cli.js";
import { itWithPoppler } from "../support/poppler.js";

/** A copy of the built project whose node_modules holds every package but @fontsource/noto-sans-sc and -kr. */
function projectWithoutCjk(): string {
  const dir = mkdtempSync(join(tmpdir(), "seam-atlas-no-sc-"));
  cpSync(join(ROOT, "package.json"), join(dir, "package.json"));
  symlinkSync(join(ROOT, "templates"), join(dir, "templates"));
  cpSync(join(ROOT, "out", "build", "cli"), join(dir, "out", "build", "cli"), { recursive: true });
  mkdirSync(join(dir, "node_modules", "@fontsource"), { recursive: true });
  for (const entry of readdirSync(join(ROOT, "node_modules"))) {
    if (entry !== "@fontsource") symlinkSync(join(ROOT, "node_modules", entry), join(dir, "node_modules", entry));
  }
  for (const pkg of readdirSync(join(ROOT, "node_modules", "@fontsource"))) {
    if (pkg !== "noto-sans-sc" && pkg !== "noto-sans-kr") symlinkSync(join(ROOT, "node_modules", "@fontsource", pkg), join(dir, "node_modules", "@fontsource", pkg));
  }
  return dir;
}

describe("without the optional CJK font packages", () => {
  itWithPoppler("prints a card, Chinese, Japanese and Korean as one U+FFFD each and Arabic as typed, and says once on stderr to install @fontsource/noto-sans-sc and once @fontsource/noto-sans-kr", () => {
    const dir = projectWithoutCjk();
    const out = join(dir, "card.pdf");
    const args = ["card", "--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--gyro", "10", "--want", "arm", "--grid", "4"];
    const r = spawnSync(process.execPath, [join(dir, "out", "build", "cli", "main.js"), ...args, "--name", "李小龙 山田 김민 محمد sinker", "--out", out], { cwd: dir, encoding: "utf8", timeout: 120_000 });
    expect(r.status, r.stderr).toBe(0);
    // the title and the card's other texts ask for the same characters more than once: still one line each
    for (const pkg of ["@fontsource/noto-sans-sc@5.3.0", "@fontsource/noto-sans-kr@5.3.0"]) expect(r.stderr.split("\n").filter((l) => l.includes(pkg)).length, pkg).toBe(1);
    expect(pdfRawText(out)).toContain(`${MISSING_GLYPH.repeat(3)} ${MISSING_GLYPH.repeat(2)} ${MISSING_GLYPH.repeat(2)} محمد sinker: grip 1`);
  });
});
