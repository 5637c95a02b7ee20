/** Plain-text formatting for people: tables and compact text plots. */

const BARS = " ▁▂▃▄▅▆▇█";

/** One row of bar characters for values in [0, max], averaged over `columns` equal bins. */
export function sparkline(values: ArrayLike<number>, max: number, columns: number): string {
  const n = values.length;
  let out = "";
  for (let c = 0; c < columns; c++) {
    const i0 = Math.floor((c * n) / columns);
    const i1 = Math.max(i0 + 1, Math.floor(((c + 1) * n) / columns));
    let sum = 0;
    for (let i = i0; i < i1; i++) sum += values[i];
    const mean = sum / (i1 - i0);
    const level = max > 0 ? Math.round((mean / max) * (BARS.length - 1)) : 0;
    out += BARS[Math.max(0, Math.min(BARS.length - 1, level))];
  }
  return out;
}

/** Left-aligned two-column table with a fixed label width. */
export function table(rows: readonly (readonly [string, string])[], indent = "  "): string {
  const width = Math.max(...rows.map((r) => r[0].length));
  return rows.map(([k, v]) => `${indent}${k.padEnd(width)}  ${v}`).join("\n");
}




export { fixed, percent, signed } from "../render/numbers.js";
