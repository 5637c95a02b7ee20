/**
 * `seam-atlas view` through the compiled CLI (out/build/cli/main.js; npm test builds it).
 * Needs `registerView` (src/cli/view.ts) registered in src/cli/main.ts: until it is,
 * the first test says so and the rest fail with the command missing.
 */
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { describe, expect, it } from "vitest";
import { formatMovementIn as inches } from "../../src/render/numbers.js";
import type { ViewData } from "../../src/render/page3d/data.js";
import { runCli } from "../support/cli.js";
import { canvasPixels, openPage, pauseAt, RUN_BROWSER_TESTS, sharedBrowser, shownFigures, viewState } from "../support/browser.js";

const TIMEOUT_MS = 120_000;
const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-view-cli-"));
const page = join(tmp, "view.html");

function embedded(file: string): ViewData {
  const block = /<script type="application\/json" id="seam-atlas-view-data">([\s\S]*?)<\/script>/.exec(readFileSync(file, "utf8"))?.[1];
  if (!block) throw new Error(`${file} has no embedded data block`);
  return JSON.parse(block) as ViewData;
}

describe("seam-atlas view (compiled CLI)", () => {
  it("is a registered command (registerView from src/cli/view.ts in src/cli/main.ts)", () => {
    const r = runCli(["view", "--help"]);
    expect(r.code).toBe(0);
    expect(r.stdout, "`seam-atlas view --help` does not show the view command: register it in src/cli/main.ts").toContain("self-contained page");
    expect(r.stdout).toContain("--out");
    expect(r.stdout).toContain("--pitch-name");
    expect(r.stdout).toContain("--seam-points");
  });

  it("writes one page for the demo staff whose embedded reports equal `screen --json`'s, number for number", () => {
    const r = runCli(["view", "--demo", "--grid", "6", "--out", page]);
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    expect(r.stdout.trim().split("\n")).toHaveLength(1);
    expect(r.stdout).toMatch(/^wrote .*view\.html \(6 pitches, \d+ KB/);
    const screen = JSON.parse(runCli(["screen", "--demo", "--grid", "6", "--json"]).stdout);
    const data = embedded(page);
    expect(data.command).toBe("view");
    expect(data.team).toBe(screen.team);
    expect(data.pitches.map((p) => p.report)).toEqual(screen.pitches);
  }, TIMEOUT_MS);

  it("writes the workbench with no pitch at all (the page starts from its form): no report embedded, the model profile and the settings given", () => {
    const out = join(tmp, "empty.html");
    const r = runCli(["view", "--grid", "4", "--elevation-ft", "5280", "--out", out]);
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^wrote .*empty\.html \(no pitch screened yet: type one into its form, \d+ KB/);
    const data = embedded(out);
    expect(data.pitches).toEqual([]);
    expect(data.fromFile).toBe(false);
    expect(data.settings).toMatchObject({ grid: "4", "elevation-ft": "5280" });
    // the built-in profile's name and parameters (src/physics/seamModel/parameters.ts defaults; README's table: laminar 80, turbulent 120)
    expect(data.model.name).toBe(JSON.parse(runCli(["screen", "--hand", "R", "--speed", "90", "--spin", "2000", "--tilt", "12:00", "--grid", "10", "--top", "1", "--json"]).stdout).input.model.name);
    expect(data.model.parameters.laminarSeparationDeg).toBe(80);
    expect(data.model.parameters.turbulentSeparationDeg).toBe(120);
  }, TIMEOUT_MS);

  it("embeds a --model profile the page's own screens then use (its name and every parameter)", () => {
    const profile = join(tmp, "lab.json");
    writeFileSync(profile, JSON.stringify({ name: "lab-fit", parameters: { scale: 1.4, laminarSeparationDeg: 82 } }));
    const out = join(tmp, "model.html");
    expect(runCli(["view", "--model", profile, "--out", out]).code).toBe(0);
    const data = embedded(out);
    expect(data.model.name).toBe("lab-fit");
    expect(data.model.parameters.scale).toBe(1.4);
    expect(data.model.parameters.laminarSeparationDeg).toBe(82);
  }, TIMEOUT_MS);

  it("writes to out/view.html under the working folder when --out is not given", () => {
    const r = runCli(["view", "--hand", "left", "--speed", "88", "--spin", "2200", "--tilt", "10:30", "--want", "arm", "--grid", "8", "--top", "2"], { cwd: tmp });
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^wrote out\/view\.html \(1 pitch,/);
    const data = embedded(join(tmp, "out", "view.html"));
    expect(data.pitches).toHaveLength(1);
    expect(data.pitches[0].report.input.pitch.hand).toBe("left");
  }, TIMEOUT_MS);

  const bad: [string, string[], RegExp][] = [
    ["--top 0", ["--demo", "--top", "0"], /--top 0 is out of range; expected 1 to 50/],
    ["--top 2.5", ["--demo", "--top", "2.5"], /--top 2\.5 is not a whole number/],
    ["an --out that is not .html", ["--demo", "--out", join(tmp, "page.txt")], /--out ".*page\.txt" does not end in \.html/],
    ["an --out that is a folder", ["--demo", "--out", join(tmp, "folder.html")], /--out ".*folder\.html" is a folder/],
    ["--grid 0.1", ["--demo", "--grid", "0.1"], /--grid 0\.1 deg is out of range; expected 0\.5 to 10 deg/],
    ["--demo with --hand", ["--demo", "--hand", "right"], /--hand cannot be combined with --demo/],
    ["a pitch name not in the file", ["--demo", "--pitch-name", "Nobody/knuckler"], /Nobody\/knuckler/],
    ["an unknown option", ["--demo", "--colour", "red"], /colour/i],
    ["a seam shape outside (0, 0.5)", ["--demo", "--seam-shape", "0.7"], /--seam-shape: seam shape b = 0\.7 is outside \(0, 0\.5\)/],
    ["a missing pitch file", ["--pitch", join(tmp, "no-such-staff.json")], /no-such-staff\.json/],
  ];
  // a folder whose name ends in .html, for the "is a folder" case
  mkdirSync(join(tmp, "folder.html"), { recursive: true });
  for (const [what, args, message] of bad) {
    it(`rejects ${what}: one line naming it, exit 2, no file written`, () => {
      const given = args.indexOf("--out");
      const out = given >= 0 ? args[given + 1] : join(tmp, `bad-${what.replace(/\W+/g, "-")}.html`);
      const r = runCli(["view", ...(given >= 0 ? args : [...args, "--out", out])]);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(r.stderr.trim().split("\n")).toHaveLength(1);
      expect(r.stderr).not.toMatch(/\bat .*\.js:\d+/);
      expect(r.stdout).toBe("");
      if (what.includes("folder")) expect(readdirSync(out)).toEqual([]);
      else expect(existsSync(out)).toBe(false);
    });
  }
});

describe.runIf(RUN_BROWSER_TESTS)("the page `seam-atlas view` writes, in chromium", () => {
  const browser = sharedBrowser(TIMEOUT_MS);

  it("opens from file:// with no console errors and no http(s) request, draws the ball, and shows screen --json's numbers", async () => {
    if (!existsSync(page)) expect(runCli(["view", "--demo", "--grid", "6", "--out", page]).code).toBe(0);
    const screen = JSON.parse(runCli(["screen", "--demo", "--grid", "6", "--json"]).stdout);
    const opened = await openPage(browser(), pathToFileURL(page).href);
    const p = opened.page;
    expect((await viewState(p)).webgl).toBe(true);
    await pauseAt(p, 0);
    const px = await canvasPixels(p);
    expect(px.standardDeviation).toBeGreaterThan(10);
    await p.selectOption("#pitch-select", "3");
    await p.locator("#orientation-list button").nth(1).click();
    const o = screen.pitches[3].candidates[1];
    const shown = await shownFigures(p);
    expect(shown.score).toBe(inches(o.score));
    expect(shown["arm-side"]).toBe(inches(o.seamMovement.armSideIn));
    expect(shown.up).toBe(inches(o.seamMovement.verticalIn));
    expect(shown["push-clock"]).toBe(o.seamMovement.clock ?? "-");
    expect(shown.crossings).toBe(String(o.crossingsPerRevolution));
    expect(shown["robust-p10"]).toBe(inches(o.robustness.p10In));
    expect(opened.errors).toEqual([]);
    expect(opened.requests.filter((u) => /^https?:/i.test(u))).toEqual([]);
  }, TIMEOUT_MS);
});
