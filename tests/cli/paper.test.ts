import { existsSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { formatMovementIn as inches } from "../../src/render/numbers.js";
import { loadLayout } from "../../src/render/paper/layouts.js";
import { figureWords, handoutFigures } from "../../src/render/paper/handout.js";
import { seamModel } from "../../src/physics/seamModel/model.js";
import { sampleSeam } from "../../geometry/seamSamples.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { runCli, ROOT } from "../support/cli.js";
import { pdfRawText, visualWordOrder } from "../support/bidi.js";
import { inkSpread, itWithPoppler, pdfPages, pdfPageSizePt, pdfText, renderGray, run } from "../support/poppler.js";
import { xmlProblems } from "../support/svgCheck.js";

const tmp = mkdtempSync(join(tmpdir(), "seam-atlas-paper-"));
const SINKER = ["--hand", "right", "--speed", "92", "--spin", "2150", "--tilt", "1:45", "--gyro", "10", "--want", "arm", "--name", "sinker", "--grid", "4"];
const layouts = join(ROOT, "templates", "layouts");
/** Page sizes, points: US letter 8.5 x 11 in; ISO 216 A4 210 x 297 mm (72 pt to the inch, 25.4 mm to the inch). */
const LETTER_PT: [number, number] = [612, 792];
const A4_PT: [number, number] = [(210 / 25.4) * 72, (297 / 25.4) * 72];
const flat = (s: string) => s.replace(/\s+/g, " ");
type Orientation = { rank?: number; reference?: string; score: number; seamMovement: { armSideIn: number; verticalIn: number }; robustness: { meanIn: number; p10In: number }; crossingsPerRevolution: number };

/** The comparison-table row the paper prints for a grip, in screen --json's terminal format. */
const row = (label: string, o: Orientation) =>
  `${label} ${inches(o.seamMovement.armSideIn)} ${inches(o.seamMovement.verticalIn)} ${inches(o.score)} ${inches(o.robustness.meanIn)} / ${inches(o.robustness.p10In)} ${o.crossingsPerRevolution}`;

function expectOneLineRefusal(r: { code: number; stderr: string; stdout: string }, message: RegExp): void {
  expect(r.code).toBe(2);
  expect(r.stderr).toMatch(message);
  expect(r.stderr.trim().split("\n")).toHaveLength(1);
  expect(r.stderr).not.toMatch(/\n\s+at /);
}

describe("grip card", () => {
  const pdf = join(tmp, "card.pdf");
  const made = runCli(["card", ...SINKER, "--out", pdf]);
  const screen = JSON.parse(runCli(["screen", ...SINKER, "--json"]).stdout);

  it("writes a PDF", () => {
    expect(made.code, made.stderr).toBe(0);
    expect(readFileSync(pdf).subarray(0, 5).toString()).toBe("%PDF-");
  });

  itWithPoppler("is one 6 x 4 in page (432 x 288 pt) that a real reader opens (pdfinfo)", () => {
    expect(pdfPages(pdf)).toBe(1);
    const [w, h] = pdfPageSizePt(pdf);
    expect(w).toBeCloseTo(432, 1);
    expect(h).toBeCloseTo(288, 1);
  });

  itWithPoppler("prints the grip beside the four-seam and two-seam holds with the numbers screen --json gives (pdftotext)", () => {
    const text = flat(pdfText(pdf));
    const c = screen.candidates[0];
    expect(text).toContain(row("grip 1", c));
    for (const h of screen.references) expect(text).toContain(row(`${h.reference} hold`, h));
    expect(text).toContain(c.latLon.text);
  });

  itWithPoppler("tells the grip in a player's words: the finger pattern, the turn from the nearer classic hold, each finger's place", () => {
    const text = flat(pdfText(pdf));
    expect(text).toContain("Fastball grip, two fingers: index and middle side by side on top, thumb beneath");
    const turn = screen.candidates[0].fromHold;
    expect(turn.hold).toMatch(/^(four|two)-seam$/);
    if (turn.angleDeg >= 3) expect(text).toContain(`Start from the ${turn.hold} hold and turn the ball ${turn.angleDeg.toFixed(0)}°`);
    else expect(text).toContain(`This is the ${turn.hold} hold`);
    expect(text).toMatch(/Index: (on|in|inside|just)/);
    expect(text).toMatch(/your view, from behind the ball/);
    // the key names the fingers this grip uses: a fastball's index, middle and thumb, no ring finger
    expect(text).toContain("I M T: fingers and thumb");
    expect(text).toContain("the catcher's view");
  });

  itWithPoppler("carries the caution line", () => {
    const text = flat(pdfText(pdf));
    expect(text).toContain("pitching can injure");
    expect(text).toContain("never alter it");
  });

  itWithPoppler("has ink where the two balls are drawn and little in an empty margin (pdftoppm at 40 dpi)", () => {
    const card = loadLayout(layouts, "index-card-4x6");
    const img = renderGray(pdf, 1, 40, join(tmp, "card-page"));
    expect(inkSpread(img, 40, card.blocks.viewPitcher)).toBeGreaterThan(30);
    expect(inkSpread(img, 40, card.blocks.viewCatcher)).toBeGreaterThan(30);
    expect(inkSpread(img, 40, { xIn: 5.86, yIn: 0.6, wIn: 0.1, hIn: 1.8 })).toBeLessThan(5);
  });

  itWithPoppler("embeds its Unicode face (Noto Sans, subset) rather than relying on the reader's fonts (pdffonts)", () => {
    const fonts = run("pdffonts", [pdf]);
    expect(fonts).toMatch(/NotoSans/);
    for (const line of fonts.split("\n").slice(2).filter(Boolean)) expect(line).toMatch(/\byes\s+yes\b/);
  });

  it("as SVG is deterministic, well formed and carries the same numbers", () => {
    const a = join(tmp, "a.svg");
    const b = join(tmp, "b.svg");
    expect(runCli(["card", ...SINKER, "--svg", "--out", a]).code).toBe(0);
    expect(runCli(["card", ...SINKER, "--svg", "--out", b]).code).toBe(0);
    const sa = readFileSync(a, "utf8");
    expect(sa).toBe(readFileSync(b, "utf8"));
    expect(xmlProblems(sa.trim())).toEqual([]);
    expect(sa).toContain(inches(screen.candidates[0].score));
    expect(sa).not.toMatch(/Svgjs|paint-order/);
  });

  it("as PNG is a 1600 px wide picture (PNG signature and IHDR, ISO/IEC 15948)", () => {
    const out = join(tmp, "card.png");
    const r = runCli(["card", ...SINKER, "--png", "--out", out]);
    expect(r.code, r.stderr).toBe(0);
    const png = readFileSync(out);
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(png.subarray(12, 16).toString("latin1")).toBe("IHDR");
    expect(png.readUInt32BE(16)).toBe(1600);
    // 6 x 4 in: the height in proportion, to a pixel
    expect(Math.abs(png.readUInt32BE(20) - 1600 * (4 / 6))).toBeLessThanOrEqual(1);
  });

  it("escapes a hostile name in SVG: markup in the name stays text", () => {
    const out = join(tmp, "hostile.svg");
    const r = runCli(["card", ...SINKER.filter((a) => a !== "sinker" && a !== "--name"), "--name", '<script>alert("x")</script> & co', "--svg", "--out", out]);
    expect(r.code, r.stderr).toBe(0);
    const svg = readFileSync(out, "utf8");
    expect(svg).not.toContain("<script>");
    expect(svg).toContain("&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; co");
    expect(xmlProblems(svg.trim())).toEqual([]);
  });

  itWithPoppler("prints a name in any script: accents, Cyrillic, Arabic and Hebrew (right to left, UAX #9), Chinese, Japanese and Korean as themselves, Thai and emoji as U+FFFD placeholders that leave the next word whole (pdftotext -raw)", () => {
    const out = join(tmp, "names.pdf");
    const typed = "Zoë Ярослава محمد علي דוד לוי 李小龙 山田 太郎 김민준 สม 👍🏽 sinker";
    const r = runCli(["card", ...SINKER.filter((a) => a !== "sinker" && a !== "--name"), "--name", typed, "--out", out]);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toBe("");
    const text = flat(pdfRawText(out));
    // UAX #9: the four right-to-left words form one stretch, drawn last word first
    expect(visualWordOrder(typed)).toBe("Zoë Ярослава לוי דוד علي محمد 李小龙 山田 太郎 김민준 สม 👍🏽 sinker");
    expect(text).toContain("Zoë Ярослава לוי דוד علي محمد 李小龙 山田 太郎 김민준 \ufffd\ufffd \ufffd sinker: grip 1");
  });

  it("as PNG draws the letters of an Arabic name: the picture differs from the same card named with U+FFFD marks", () => {
    const png = (name: string, file: string) => {
      const out = join(tmp, file);
      const r = runCli(["card", ...SINKER.filter((a) => a !== "sinker" && a !== "--name"), "--name", name, "--png", "--out", out]);
      expect(r.code, r.stderr).toBe(0);
      return readFileSync(out);
    };
    const marks = png("\ufffd\ufffd\ufffd\ufffd", "marks.png");
    expect(png("محمد", "arabic.png").equals(marks)).toBe(false);
    // the same name twice gives the same picture, so the difference is the letters
    expect(png("\ufffd\ufffd\ufffd\ufffd", "marks2.png").equals(marks)).toBe(true);
  });

  it.each([
    ["an unknown layout", ["--layout", "postcard"], /layout "postcard" not found .*expected one of/],
    ["a handout layout for a card", ["--layout", "handout-letter"], /is a handout layout; this command takes a card or sheet layout/],
    ["SVG of a sheet", ["--layout", "letter-2-cards-4x6", "--svg"], /--svg draws one card/],
    ["PNG of a sheet", ["--layout", "letter-4-cards-3x5", "--png"], /--png draws one card/],
    ["both --svg and --png", ["--svg", "--png"], /give --svg or --png, not both/],
    ["a name with a NUL byte", ["--name", "sin\u0001ker"], /the pitch's name "sin\?ker" holds the control character U\+0001; expected printable text/],
  ])("refuses %s: one line, exit 2, no file", (what, args, message) => {
    const out = join(tmp, `bad-${String(what).replace(/\W+/g, "-")}.pdf`);
    const base = args.includes("--name") ? SINKER.filter((a) => a !== "sinker" && a !== "--name") : SINKER;
    expectOneLineRefusal(runCli(["card", ...base, ...args, "--out", out]), message);
    expect(existsSync(out)).toBe(false);
  });

  it("refuses a staff with a one-card layout, naming the sheet layouts as the way", () => {
    const out = join(tmp, "staff-card.pdf");
    expectOneLineRefusal(runCli(["card", "--demo", "--out", out]), /card takes one pitch; the file has 6 \(a card layout prints one: .*sheet layout/);
    expect(existsSync(out)).toBe(false);
  });

  it("refuses a pitch file whose pitch name holds a NUL byte (JSON's \\u0000), one line, exit 2, no file", () => {
    const file = join(tmp, "nul.json");
    writeFileSync(file, JSON.stringify({ name: "sink\u0000er", hand: "right", speedMph: 92, spinRpm: 2150, tilt: "1:45", gyroDeg: 10, want: "arm" }));
    const out = join(tmp, "nul.pdf");
    expectOneLineRefusal(runCli(["card", "--pitch", file, "--grid", "4", "--out", out]), /line 1: a NUL character \(\\u0000\) inside a string; expected text without NUL/);
    expect(existsSync(out)).toBe(false);
  });
});

describe("layouts given as files", () => {
  const broken: [string, object, RegExp][] = [
    ["a block that runs off the card", { name: "x", kind: "card", page: { widthIn: 6, heightIn: 4 }, marginIn: 0.2, fonts: { sizePt: 7, titleSizePt: 11 }, blocks: { title: { xIn: 5, yIn: 0, wIn: 2, hIn: 0.3 } } }, /block "title" runs off the 6 x 4 in page|needs block/],
    ["a sheet whose cards do not fit", { name: "x", kind: "sheet", page: { widthIn: 8.5, heightIn: 11 }, marginIn: 0.25, card: "index-card-4x6", grid: { columns: 2, rows: 3, gapIn: 0.2 }, fonts: { sizePt: 7, titleSizePt: 11 } }, /need 12\.20 x 12\.40 in, more than the page holds/],
    ["a font that is not embedded", { name: "x", kind: "sheet", page: { widthIn: 8.5, heightIn: 11 }, marginIn: 0.25, card: "index-card-4x6", grid: { columns: 1, rows: 2, gapIn: 0.2 }, fonts: { body: "Helvetica", sizePt: 7, titleSizePt: 11 } }, /"fonts.body" is "Helvetica"; expected NotoSans/],
  ];
  it.each(broken)("refuses %s: one line naming the file and field, exit 2, no file", (what, layout, message) => {
    const file = join(tmp, `layout-${what.replace(/\W+/g, "-")}.json`);
    writeFileSync(file, JSON.stringify(layout));
    const out = join(tmp, `layout-${what.replace(/\W+/g, "-")}.pdf`);
    expectOneLineRefusal(runCli(["card", ...SINKER, "--layout", file, "--out", out]), message);
    expect(existsSync(out)).toBe(false);
  });

  itWithPoppler("prints with a good layout file (a copy of a shipped sheet)", () => {
    const file = join(tmp, "my-sheet.json");
    writeFileSync(file, readFileSync(join(layouts, "letter-2-cards-4x6.json")));
    const out = join(tmp, "my-sheet.pdf");
    expect(runCli(["card", ...SINKER, "--layout", file, "--out", out]).code).toBe(0);
    expect(pdfPageSizePt(out)).toEqual(LETTER_PT);
  });
});

describe("sheets", () => {
  const single: [string, [number, number], number][] = [
    ["letter-2-cards-4x6", LETTER_PT, 2],
    ["a4-2-cards-4x6", A4_PT, 2],
    ["letter-4-cards-3x5", LETTER_PT, 4],
    ["a4-4-cards-3x5", A4_PT, 4],
  ];
  for (const [name, size, perPage] of single) {
    itWithPoppler(`${name}: one pitch's grips then the two classic holds, ${perPage} to a page, on its paper`, () => {
      const out = join(tmp, `${name}.pdf`);
      const r = runCli(["card", ...SINKER, "--layout", name, "--out", out]);
      expect(r.code, r.stderr).toBe(0);
      // a sheet lists the screen's default top (5), or a page's worth when that is more
      const screen = JSON.parse(runCli(["screen", ...SINKER, "--top", String(Math.max(5, perPage)), "--json"]).stdout);
      const cards = screen.candidates.length + 2;
      expect(pdfPages(out)).toBe(Math.ceil(cards / perPage));
      const [w, h] = pdfPageSizePt(out);
      expect(w).toBeCloseTo(size[0], 1);
      expect(h).toBeCloseTo(size[1], 1);
      const text = flat(pdfText(out));
      for (const c of screen.candidates) expect(text).toContain(`grip ${c.rank}`);
      expect(text).toContain("four-seam hold, for comparison");
      expect(text).toContain("two-seam hold, for comparison");
    });
  }

  itWithPoppler("a staff sheet: one card per pitch of the demo staff, each its best grip with the classic holds' numbers beside it", () => {
    const out = join(tmp, "staff.pdf");
    const r = runCli(["card", "--demo", "--grid", "4", "--layout", "letter-4-cards-3x5", "--out", out]);
    expect(r.code, r.stderr).toBe(0);
    expect(pdfPages(out)).toBe(2);
    const screen = JSON.parse(runCli(["screen", "--demo", "--grid", "4", "--top", "4", "--json"]).stdout);
    const text = flat(pdfText(out));
    for (const p of screen.pitches) {
      expect(text).toContain(`${p.input.pitch.pitcher} – ${p.input.pitch.name}: grip 1`);
      expect(text).toContain(row("grip 1", p.candidates[0]));
    }
  });
});

describe("atlas", () => {
  const pdf = join(tmp, "atlas.pdf");
  const made = runCli(["atlas", "--demo", "--top", "2", "--grid", "4", "--out", pdf]);
  const screen = JSON.parse(runCli(["screen", "--demo", "--top", "2", "--grid", "4", "--json"]).stdout);

  it("writes the demo staff's atlas", () => {
    expect(made.code, made.stderr).toBe(0);
    expect(made.stdout).toMatch(/wrote .* pages, 6 pitch/);
  });

  itWithPoppler("has the front pages, per pitch a map page and its cards two to a page (grips then the two holds), and the cautions (pdfinfo, pdftotext)", () => {
    const pages = pdfPages(pdf);
    const texts = Array.from({ length: pages }, (_, i) => flat(pdfText(pdf, i + 1)));
    const firstMap = texts.findIndex((t) => t.includes(": where the spin axis could go"));
    const cautions = texts.findIndex((t) => t.includes("Cautions Pitching can injure"));
    expect(texts[0]).toContain("Grip atlas");
    expect(texts.slice(0, firstMap).some((t) => t.includes("How to read this atlas"))).toBe(true);
    const perPitch = screen.pitches.map((p: { candidates: unknown[]; references: unknown[] }) => 1 + Math.ceil((p.candidates.length + p.references.length) / 2));
    expect(cautions - firstMap).toBe(perPitch.reduce((a: number, b: number) => a + b, 0));
    expect(texts.filter((t) => t.includes(": where the spin axis could go"))).toHaveLength(6);
  });

  itWithPoppler("prints every grip's and classic hold's numbers as screen --json gives them (pdftotext)", () => {
    const text = flat(pdfText(pdf));
    for (const p of screen.pitches) {
      for (const o of p.candidates) expect(text).toContain(row(`grip ${o.rank}`, o));
      for (const o of p.references) expect(text).toContain(row(`${o.reference} hold`, o));
    }
  });

  itWithPoppler("ends with the cautions", () => {
    const last = flat(pdfText(pdf, pdfPages(pdf)));
    expect(last).toContain("Never scuff, cut, mark or otherwise alter the ball");
    expect(last).toContain("licensed professional practice");
  });

  itWithPoppler("draws the sphere map with a scale in inches: ink across the map block, round numbers under the colour bar", () => {
    const atlas = loadLayout(layouts, "atlas-letter");
    const texts = Array.from({ length: pdfPages(pdf) }, (_, i) => flat(pdfText(pdf, i + 1)));
    const page = texts.findIndex((t) => t.includes(": where the spin axis could go")) + 1;
    const img = renderGray(pdf, page, 30, join(tmp, "atlas-map"));
    expect(inkSpread(img, 30, atlas.blocks.map)).toBeGreaterThan(30);
    expect(texts[page - 1]).toMatch(/seam movement at the plate, inches/);
    expect(texts[page - 1]).toMatch(/\b1 2 3\b/);
  });

  itWithPoppler("on A4 (atlas-a4) every page is 210 x 297 mm (ISO 216)", () => {
    const out = join(tmp, "atlas-a4.pdf");
    expect(runCli(["atlas", "--demo", "--pitch-name", "Ode Mbeki/slider", "--top", "1", "--grid", "4", "--layout", "atlas-a4", "--out", out]).code).toBe(0);
    const info = run("pdfinfo", ["-f", "1", "-l", String(pdfPages(out)), out]);
    const sizes = [...info.matchAll(/Page\s+\d+ size:\s+([\d.]+) x ([\d.]+) pts/g)];
    expect(sizes.length).toBe(pdfPages(out));
    for (const m of sizes) {
      expect(Number(m[1])).toBeCloseTo(A4_PT[0], 0);
      expect(Number(m[2])).toBeCloseTo(A4_PT[1], 0);
    }
  });
});

describe("handout", () => {
  const pdf = join(tmp, "handout.pdf");
  const made = runCli(["handout", "--clinic", "Harbor Youth Pitching Clinic", "--date", "14 March 2027", "--contact", "Coach R. Ortega, clinic@example.org", "--out", pdf]);

  itWithPoppler("is two pages with the clinic's header on each, the safety advice and two figures from the model", () => {
    expect(made.code, made.stderr).toBe(0);
    expect(pdfPages(pdf)).toBe(2);
    for (const p of [1, 2]) {
      const t = flat(pdfText(pdf, p));
      expect(t).toContain("Harbor Youth Pitching Clinic · 14 March 2027");
      expect(t).toContain("Coach R. Ortega, clinic@example.org");
    }
    const text = flat(pdfText(pdf));
    for (const s of ["Spin bends the path (Magnus)", "Seams move the air too", "four-seam hold", "two-seam hold", "Trying a new grip safely", "Never scratch, cut, mark"]) expect(text).toContain(s);
    const h = loadLayout(layouts, "handout-letter");
    const img = renderGray(pdf, 1, 30, join(tmp, "handout-1"));
    expect(inkSpread(img, 30, { ...h.blocks.figureSymmetric, yIn: 7, hIn: 2 })).toBeGreaterThan(20);
    expect(inkSpread(img, 30, { ...h.blocks.figureAsymmetric, yIn: 7, hIn: 2 })).toBeGreaterThan(20);
  });

  itWithPoppler("draws the two classic holds in the hand on page 2, with the fingers' letters and the sides (pdftotext; ink where the drawings go)", () => {
    const t = flat(pdfText(pdf, 2));
    for (const s of ["The two classic holds in your hand", "the four-seam hold, from behind the ball", "the two-seam hold, from behind the ball", "glove side", "arm side"]) expect(t).toContain(s);
    const img = renderGray(pdf, 2, 30, join(tmp, "handout-2"));
    // the lower third of the page, left and right halves: each a ball drawing
    expect(inkSpread(img, 30, { xIn: 0.75, yIn: 7.5, wIn: 3.25, hIn: 2.5 })).toBeGreaterThan(20);
    expect(inkSpread(img, 30, { xIn: 4.5, yIn: 7.5, wIn: 3.25, hIn: 2.5 })).toBeGreaterThan(20);
  });

  itWithPoppler("says what the figures show in words built from the model's own numbers (forceTimeline), and never that the push can only be sideways", () => {
    const text = flat(pdfText(pdf));
    const words = figureWords(handoutFigures(seamModel(), sampleSeam(DEFAULT_SEAM_SHAPE, 2048)));
    expect(text).toContain(flat(words).slice(0, 120));
    expect(text).toMatch(/sideways, up or down/);
    expect(text).not.toMatch(/only (be )?sideways|never up or down/);
  });

  it.each([
    ["a clinic name with a NUL byte", ["--clinic", "Harbor\u0007Clinic"], /--clinic "Harbor\?Clinic" holds the control character U\+0007/],
    ["a contact line over 200 characters", ["--contact", "x".repeat(201)], /--contact is 201 characters long; expected at most 200/],
  ])("refuses %s: one line, exit 2, no file", (what, args, message) => {
    const out = join(tmp, `handout-bad-${what.replace(/\W+/g, "-")}.pdf`);
    expectOneLineRefusal(runCli(["handout", ...args, "--out", out]), message);
    expect(existsSync(out)).toBe(false);
  });
});

describe("the handout's figures as pictures", () => {
  it("handout --figures-png writes the two charts as 1600 px wide PNGs beside the PDF", () => {
    const folder = join(tmp, "figures");
    const r = runCli(["handout", "--out", join(tmp, "h2.pdf"), "--figures-png", folder]);
    expect(r.code, r.stderr).toBe(0);
    for (const f of ["four-seam-push.png", "two-seam-push.png"]) {
      const png = readFileSync(join(folder, f));
      expect(png.subarray(1, 4).toString("latin1")).toBe("PNG");
      expect(png.readUInt32BE(16)).toBe(1600);
    }
  });
});

describe("the sphere map as a picture", () => {
  it("screen --map-png writes a 1600 px wide PNG of the map", () => {
    const out = join(tmp, "map.png");
    const r = runCli(["screen", ...SINKER, "--map-png", out]);
    expect(r.code, r.stderr).toBe(0);
    const png = readFileSync(out);
    expect(png.subarray(1, 4).toString("latin1")).toBe("PNG");
    expect(png.readUInt32BE(16)).toBe(1600);
  });
});
