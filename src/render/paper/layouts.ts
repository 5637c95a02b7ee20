/**
 * Page layouts as data (templates/layouts/*.json), checked on load.
 *
 * A layout names a page size in inches, a margin, font sizes (the face is always
 * the embedded Noto Sans, render/fonts.ts) and, per kind, the blocks it places (x, y
 * from the page's top-left corner, width and height, all inches):
 *   card     title, summary, viewPitcher, viewCatcher, howTo, compare, technical,
 *            caution (no two may overlap)
 *   sheet    several cards of layout `card` on one page in a `grid` that fits inside
 *            the margins
 *   atlas    a `card` layout and `grid` for the candidate pages, plus map and mapNotes
 *   handout  figureSymmetric, figureAsymmetric
 * A staff adds a layout by dropping a file in templates/layouts/; every problem is
 * reported as one line naming the file, the field and what is expected.
 */
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { basename, join } from "node:path";
import { InputError } from "../../io/errors.js";
import { parseStrictJson } from "../../io/json.js";

export type LayoutKind = "card" | "sheet" | "atlas" | "handout";

export interface Box {
  readonly xIn: number;
  readonly yIn: number;
  readonly wIn: number;
  readonly hIn: number;
}

export interface Layout {
  readonly name: string;
  readonly kind: LayoutKind;
  readonly description: string;
  readonly page: { readonly widthIn: number; readonly heightIn: number };
  readonly marginIn: number;
  readonly fonts: { readonly body: string; readonly bold: string; readonly sizePt: number; readonly titleSizePt: number };
  readonly blocks: Readonly<Record<string, Box>>;
  /** For sheet and atlas: the card layout, resolved. */
  readonly card?: Layout;
  readonly grid?: { readonly columns: number; readonly rows: number; readonly gapIn: number };
}

/** An error in a layout file. */
export class LayoutError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "LayoutError";
  }
}

/** The face names a layout may give (the embedded Unicode face, regular and bold). */
export const LAYOUT_FONTS = { body: "NotoSans", bold: "NotoSans-Bold" } as const;

const REQUIRED_BLOCKS: Record<LayoutKind, readonly string[]> = {
  card: ["title", "summary", "viewPitcher", "viewCatcher", "howTo", "compare", "technical", "caution"],
  sheet: [],
  atlas: ["map", "mapNotes"],
  handout: ["figureSymmetric", "figureAsymmetric"],
};
const KINDS: readonly LayoutKind[] = ["card", "sheet", "atlas", "handout"];
const TOP_KEYS = ["name", "kind", "description", "page", "marginIn", "fonts", "blocks", "card", "grid"];

function check(cond: boolean, file: string, message: string): asserts cond {
  if (!cond) throw new LayoutError(`layout ${file}: ${message}`);
}

function num(v: unknown, file: string, field: string, lo: number, hi: number, unit: string): number {
  check(typeof v === "number" && Number.isFinite(v), file, `"${field}" must be a number of ${unit}, got ${JSON.stringify(v)}`);
  check(v >= lo && v <= hi, file, `"${field}" is ${v} ${unit}; expected ${lo} to ${hi} ${unit}`);
  return v;
}

/**
 * Checks a parsed layout. `resolve` loads another layout by name (for sheet and atlas).
 * @throws LayoutError naming the file and field
 */
export function validateLayout(raw: unknown, file: string, resolve: (name: string) => Layout): Layout {
  check(typeof raw === "object" && raw !== null && !Array.isArray(raw), file, "must be a JSON object");
  const o = raw as Record<string, unknown>;
  for (const k of Object.keys(o)) check(TOP_KEYS.includes(k), file, `unknown field "${k}"; expected ${TOP_KEYS.join(", ")}`);
  check(typeof o.name === "string" && /^[a-z0-9-]+$/.test(o.name), file, `"name" must be lower-case letters, digits and dashes`);
  check(KINDS.includes(o.kind as LayoutKind), file, `"kind" is ${JSON.stringify(o.kind)}; expected one of ${KINDS.join(", ")}`);
  const kind = o.kind as LayoutKind;
  check(typeof o.page === "object" && o.page !== null, file, `"page" must be an object with widthIn and heightIn`);
  const page = o.page as Record<string, unknown>;
  const widthIn = num(page.widthIn, file, "page.widthIn", 1, 20, "in");
  const heightIn = num(page.heightIn, file, "page.heightIn", 1, 20, "in");
  const marginIn = num(o.marginIn, file, "marginIn", 0, Math.min(widthIn, heightIn) / 4, "in");
  check(typeof o.fonts === "object" && o.fonts !== null && !Array.isArray(o.fonts), file, `"fonts" must be an object with sizePt and titleSizePt`);
  const f = o.fonts as Record<string, unknown>;
  for (const k of Object.keys(f)) check(["body", "bold", "sizePt", "titleSizePt"].includes(k), file, `unknown field "fonts.${k}"; expected body, bold, sizePt, titleSizePt`);
  for (const k of ["body", "bold"] as const) {
    check(f[k] === undefined || f[k] === LAYOUT_FONTS[k], file, `"fonts.${k}" is ${JSON.stringify(f[k])}; expected ${LAYOUT_FONTS[k]} (the embedded Unicode face) or nothing`);
  }
  const fonts = {
    body: LAYOUT_FONTS.body as string,
    bold: LAYOUT_FONTS.bold as string,
    sizePt: num(f.sizePt, file, "fonts.sizePt", 4, 40, "pt"),
    titleSizePt: num(f.titleSizePt, file, "fonts.titleSizePt", 4, 72, "pt"),
  };
  const blocks: Record<string, Box> = {};
  const rawBlocks = (o.blocks ?? {}) as Record<string, unknown>;
  check(typeof rawBlocks === "object" && !Array.isArray(rawBlocks), file, `"blocks" must be an object`);
  for (const name of REQUIRED_BLOCKS[kind]) check(name in rawBlocks, file, `a ${kind} layout needs block "${name}"`);
  for (const [name, b] of Object.entries(rawBlocks)) {
    check(typeof b === "object" && b !== null, file, `block "${name}" must be an object with xIn, yIn, wIn, hIn`);
    const bb = b as Record<string, unknown>;
    const box: Box = {
      xIn: num(bb.xIn, file, `blocks.${name}.xIn`, 0, widthIn, "in"),
      yIn: num(bb.yIn, file, `blocks.${name}.yIn`, 0, heightIn, "in"),
      wIn: num(bb.wIn, file, `blocks.${name}.wIn`, 0.1, widthIn, "in"),
      hIn: num(bb.hIn, file, `blocks.${name}.hIn`, 0.1, heightIn, "in"),
    };
    check(box.xIn + box.wIn <= widthIn + 1e-9 && box.yIn + box.hIn <= heightIn + 1e-9, file, `block "${name}" runs off the ${widthIn} x ${heightIn} in page`);
    blocks[name] = box;
  }
  if (kind === "card") {
    const names = Object.keys(blocks);
    for (let i = 0; i < names.length; i++) {
      for (let j = i + 1; j < names.length; j++) {
        const a = blocks[names[i]], c = blocks[names[j]];
        const overlap = a.xIn < c.xIn + c.wIn - 1e-9 && c.xIn < a.xIn + a.wIn - 1e-9 && a.yIn < c.yIn + c.hIn - 1e-9 && c.yIn < a.yIn + a.hIn - 1e-9;
        check(!overlap, file, `blocks "${names[i]}" and "${names[j]}" overlap; expected each block in its own place on the card`);
      }
    }
  }
  let card: Layout | undefined;
  let grid: Layout["grid"];
  if (kind === "sheet" || kind === "atlas") {
    check(typeof o.card === "string", file, `a ${kind} layout needs "card": the name of a card layout`);
    card = resolve(o.card as string);
    check(card.kind === "card", file, `"card" names ${card.name}, which is a ${card.kind} layout, not a card`);
    check(typeof o.grid === "object" && o.grid !== null, file, `a ${kind} layout needs "grid" with columns, rows, gapIn`);
    const g = o.grid as Record<string, unknown>;
    grid = {
      columns: num(g.columns, file, "grid.columns", 1, 6, "columns"),
      rows: num(g.rows, file, "grid.rows", 1, 6, "rows"),
      gapIn: num(g.gapIn, file, "grid.gapIn", 0, 2, "in"),
    };
    check(Number.isInteger(grid.columns) && Number.isInteger(grid.rows), file, `"grid.columns" and "grid.rows" must be whole numbers`);
    const needW = grid.columns * card.page.widthIn + (grid.columns - 1) * grid.gapIn;
    const needH = grid.rows * card.page.heightIn + (grid.rows - 1) * grid.gapIn;
    check(
      needW <= widthIn - 2 * marginIn + 1e-9 && needH <= heightIn - 2 * marginIn + 1e-9,
      file,
      `${grid.columns} x ${grid.rows} cards of ${card.page.widthIn} x ${card.page.heightIn} in need ${needW.toFixed(2)} x ${needH.toFixed(2)} in, more than the page holds inside its margins`,
    );
  }
  return {
    name: o.name as string,
    kind,
    description: typeof o.description === "string" ? o.description : "",
    page: { widthIn, heightIn },
    marginIn,
    fonts,
    blocks,
    ...(card ? { card } : {}),
    ...(grid ? { grid } : {}),
  };
}

/** Loads and checks the layout `name` from `dir` (templates/layouts). */
export function loadLayout(dir: string, name: string, seen: readonly string[] = []): Layout {
  if (!/^[a-z0-9-]+$/.test(name)) throw new LayoutError(`layout name "${name}" must be lower-case letters, digits and dashes`);
  const file = join(dir, `${name}.json`);
  if (!existsSync(file)) throw new LayoutError(`layout "${name}" not found in ${dir}; expected one of ${listLayouts(dir).join(", ")}`);
  if (seen.includes(name)) throw new LayoutError(`layout ${file}: refers back to itself through ${seen.join(" -> ")}`);
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(file);
  } catch (err) {
    throw new LayoutError(`layout ${file}: cannot read the file (${(err as NodeJS.ErrnoException).code ?? (err as Error).message})`);
  }
  let raw: unknown;
  try {
    raw = parseStrictJson(bytes, `layout ${file}`).value;
  } catch (err) {
    // strict JSON's message names the file and the line
    if (err instanceof InputError) throw new LayoutError(err.message);
    throw err;
  }
  const layout = validateLayout(raw, basename(file), (other) => loadLayout(dir, other, [...seen, name]));
  if (layout.name !== name) throw new LayoutError(`layout ${file}: "name" is "${layout.name}" but the file is ${name}.json`);
  return layout;
}

/** Loads and checks a layout from a file path; a sheet's or atlas's card layout is named from `dir`. */
export function loadLayoutFile(path: string, dir: string): Layout {
  if (!existsSync(path)) throw new LayoutError(`layout file "${path}" not found; expected a layout name (${listLayouts(dir).join(", ")}) or a path to a .json layout`);
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(path);
  } catch (err) {
    throw new LayoutError(`layout ${path}: cannot read the file (${(err as NodeJS.ErrnoException).code ?? (err as Error).message})`);
  }
  let raw: unknown;
  try {
    raw = parseStrictJson(bytes, `layout ${path}`).value;
  } catch (err) {
    if (err instanceof InputError) throw new LayoutError(err.message);
    throw err;
  }
  return validateLayout(raw, basename(path), (other) => loadLayout(dir, other));
}

export function listLayouts(dir: string): string[] {
  return existsSync(dir) ? readdirSync(dir).filter((f) => f.endsWith(".json")).map((f) => f.slice(0, -5)).sort() : [];
}
