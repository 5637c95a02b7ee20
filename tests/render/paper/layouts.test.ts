import { mkdtempSync, writeFileSync, copyFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { listLayouts, loadLayout, LayoutError } from "../../../src/render/paper/layouts.js";
import { ROOT } from "../../support/cli.js";

const shipped = join(ROOT, "templates", "layouts");

describe("page layouts", () => {
  it("loads every shipped layout", () => {
    const names = listLayouts(shipped);
    expect(names).toEqual(
      expect.arrayContaining(["index-card-4x6", "index-card-3x5", "letter-2-cards-4x6", "a4-2-cards-4x6", "letter-4-cards-3x5", "a4-4-cards-3x5", "atlas-letter", "atlas-a4", "handout-letter", "handout-a4"]),
    );
    for (const n of names) expect(loadLayout(shipped, n).name).toBe(n);
  });

  // ISO 216 A4 is 210 x 297 mm; US letter (ANSI A) is 8.5 x 11 in; 25.4 mm to the inch
  const PAPER: Record<string, [number, number]> = { letter: [8.5, 11], a4: [210 / 25.4, 297 / 25.4] };
  it("puts every letter and a4 layout on its paper: 8.5 x 11 in (US letter) or 210 x 297 mm (ISO 216 A4), to 0.001 in", () => {
    for (const n of listLayouts(shipped)) {
      const paper = Object.keys(PAPER).find((p) => n.startsWith(`${p}-`) || n.endsWith(`-${p}`));
      if (!paper) continue;
      const l = loadLayout(shipped, n);
      expect(Math.abs(l.page.widthIn - PAPER[paper][0]), n).toBeLessThan(1e-3);
      expect(Math.abs(l.page.heightIn - PAPER[paper][1]), n).toBeLessThan(1e-3);
    }
  });

  it("names what each sheet holds: N cards of W x H in, and fits them inside the margins of its paper", () => {
    for (const n of listLayouts(shipped)) {
      const l = loadLayout(shipped, n);
      if (l.kind !== "sheet") continue;
      const m = /^(letter|a4)-(\d+)-cards-(\d+)x(\d+)$/.exec(n)!;
      expect(m, n).not.toBeNull();
      const [count, a, b] = [Number(m[2]), Number(m[3]), Number(m[4])];
      expect(l.grid!.columns * l.grid!.rows, n).toBe(count);
      expect([l.card!.page.widthIn, l.card!.page.heightIn].sort((x, y) => x - y), n).toEqual([a, b].sort((x, y) => x - y));
      const g = l.grid!;
      expect(g.columns * l.card!.page.widthIn + (g.columns - 1) * g.gapIn).toBeLessThanOrEqual(l.page.widthIn - 2 * l.marginIn + 1e-9);
      expect(g.rows * l.card!.page.heightIn + (g.rows - 1) * g.gapIn).toBeLessThanOrEqual(l.page.heightIn - 2 * l.marginIn + 1e-9);
    }
  });

  it("names each card by the index card it fills: index-card-WxH is W x H in (either way up)", () => {
    for (const n of listLayouts(shipped)) {
      const m = /^index-card-(\d+)x(\d+)$/.exec(n);
      if (!m) continue;
      const l = loadLayout(shipped, n);
      expect([l.page.widthIn, l.page.heightIn].sort((x, y) => x - y)).toEqual([Number(m[1]), Number(m[2])].sort((x, y) => x - y));
    }
  });

  const dir = mkdtempSync(join(tmpdir(), "seam-atlas-layouts-"));
  copyFileSync(join(shipped, "index-card-4x6.json"), join(dir, "index-card-4x6.json"));
  const base = JSON.parse(JSON.stringify(loadLayout(shipped, "index-card-4x6")));
  const broken: [string, (o: Record<string, any>) => unknown, RegExp][] = [
    ["an unknown field", (o) => ({ ...o, colour: "red" }), /unknown field "colour"/],
    ["a block off the page", (o) => ({ ...o, blocks: { ...o.blocks, title: { xIn: 5, yIn: 0.1, wIn: 2, hIn: 0.3 } } }), /block "title" runs off the 6 x 4 in page/],
    ["an unknown font", (o) => ({ ...o, fonts: { ...o.fonts, body: "Comic" } }), /"fonts.body" is "Comic"; expected NotoSans \(the embedded Unicode face\)/],
    ["two blocks that overlap", (o) => ({ ...o, blocks: { ...o.blocks, title: { ...o.blocks.title, hIn: 0.6 } } }), /blocks "title" and "summary" overlap/],
    ["a missing block", (o) => ({ ...o, blocks: { ...o.blocks, caution: undefined } }), /needs block "caution"/],
    ["a negative size", (o) => ({ ...o, page: { widthIn: -6, heightIn: 4 } }), /"page.widthIn" is -6 in; expected 1 to 20 in/],
    ["a sheet whose cards do not fit", () => ({ name: "tight", kind: "sheet", page: { widthIn: 8.5, heightIn: 11 }, marginIn: 0.25, card: "index-card-4x6", grid: { columns: 2, rows: 3, gapIn: 0.2 }, fonts: base.fonts }), /need 12.20 x 12.40 in, more than the page holds/],
  ];
  for (const [what, mutate, message] of broken) {
    it(`rejects a layout with ${what}, naming the file and field`, () => {
      const raw = mutate({ ...base, blocks: base.blocks, card: undefined, grid: undefined });
      const name = (raw as { name: string }).name === "index-card-4x6" ? "broken" : (raw as { name: string }).name;
      writeFileSync(join(dir, `${name}.json`), JSON.stringify({ ...(raw as object), name }));
      expect(() => loadLayout(dir, name)).toThrow(LayoutError);
      expect(() => loadLayout(dir, name)).toThrow(message);
    });
  }

  it("rejects a file that is not JSON, and a key given twice (RFC 8259 sec. 4 leaves duplicates open; we refuse them), naming the line", () => {
    writeFileSync(join(dir, "bad-json.json"), "{ name: ");
    expect(() => loadLayout(dir, "bad-json")).toThrow(/^layout .*bad-json.json line 1: .* where a key should be/);
    writeFileSync(join(dir, "twice.json"), '{\n  "name": "twice",\n  "name": "twice"\n}');
    expect(() => loadLayout(dir, "twice")).toThrow(/^layout .*twice.json line 3: the key "name" appears again \(first on line 2\)/);
  });
});
