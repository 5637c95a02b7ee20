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
    expect(names).toEqual(expect.arrayContaining(["index-card-4x6", "letter-sheet-6-cards", "a4-sheet-cards", "atlas-letter", "handout-letter"]));
    for (const n of names) expect(loadLayout(shipped, n).name).toBe(n);
  });

  const dir = mkdtempSync(join(tmpdir(), "seam-atlas-layouts-"));
  copyFileSync(join(shipped, "index-card-4x6.json"), join(dir, "index-card-4x6.json"));
  const base = JSON.parse(JSON.stringify(loadLayout(shipped, "index-card-4x6")));
  const broken: [string, (o: Record<string, any>) => unknown, RegExp][] = [
    ["an unknown field", (o) => ({ ...o, colour: "red" }), /unknown field "colour"/],
    ["a block off the page", (o) => ({ ...o, blocks: { ...o.blocks, title: { xIn: 5, yIn: 0.1, wIn: 2, hIn: 0.3 } } }), /block "title" runs off the 6 x 4 in page/],
    ["an unknown font", (o) => ({ ...o, fonts: { ...o.fonts, body: "Comic" } }), /"fonts.body" is "Comic"; expected one of Helvetica/],
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
