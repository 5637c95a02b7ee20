/**
 * Two JSON documents compared number for number: the same keys, the same strings and
 * booleans, the same array lengths, and every pair of numbers equal to within a
 * relative tolerance. The page's screen runs in Chromium's JavaScript engine and the
 * command line's in Node's; the two engines' Math.sin, Math.exp, Math.pow, ... differ
 * in the last bit for a few percent of arguments (measured on this machine: Node 20's
 * V8 11.3 against Chromium 156), so bitwise equality cannot be asked of them.
 */
export interface NumberDifferences {
  /** Places where the documents differ in kind, key, string or length, or beyond the tolerance. */
  readonly mismatches: string[];
  /** The largest relative difference met between two numbers. */
  readonly maxRelative: number;
  /** How many numbers were compared. */
  readonly numbers: number;
}

export function compareNumbers(a: unknown, b: unknown, relTol: number, absTol = 1e-12): NumberDifferences {
  const mismatches: string[] = [];
  let maxRelative = 0;
  let numbers = 0;
  const walk = (x: unknown, y: unknown, path: string) => {
    if (typeof x === "number" && typeof y === "number") {
      numbers++;
      const d = Math.abs(x - y);
      const rel = d / Math.max(Math.abs(x), Math.abs(y), Number.MIN_VALUE);
      if (d > absTol) maxRelative = Math.max(maxRelative, rel);
      if (d > absTol && rel > relTol) mismatches.push(`${path}: ${x} against ${y}`);
      return;
    }
    if (Array.isArray(x) && Array.isArray(y)) {
      if (x.length !== y.length) mismatches.push(`${path}: ${x.length} items against ${y.length}`);
      else x.forEach((v, i) => walk(v, y[i], `${path}[${i}]`));
      return;
    }
    if (x && y && typeof x === "object" && typeof y === "object") {
      const kx = Object.keys(x).join(",");
      const ky = Object.keys(y).join(",");
      if (kx !== ky) mismatches.push(`${path}: keys ${kx} against ${ky}`);
      else for (const k of Object.keys(x)) walk((x as Record<string, unknown>)[k], (y as Record<string, unknown>)[k], `${path}.${k}`);
      return;
    }
    if (!Object.is(x, y)) mismatches.push(`${path}: ${JSON.stringify(x)} against ${JSON.stringify(y)}`);
  };
  walk(a, b, "");
  return { mismatches, maxRelative, numbers };
}

const NUMBER = /-?\d+(?:\.\d+)?(?:e[-+]?\d+)?/gi;

/**
 * Two texts that print numbers (SVG, say) compared the same way: every piece between
 * the numbers identical, and each number within `absTol` of its twin (a number the
 * engines' last-bit differences push across a rounding boundary differs by one unit of
 * its last printed digit). Returns the places that differ.
 */
export function compareNumberedText(a: string, b: string, absTol: number): string[] {
  const words = (t: string) => t.split(NUMBER);
  const numbers = (t: string) => (t.match(NUMBER) ?? []).map(Number);
  const [wa, wb, na, nb] = [words(a), words(b), numbers(a), numbers(b)];
  const out: string[] = [];
  if (wa.length !== wb.length || na.length !== nb.length) return [`${na.length} numbers against ${nb.length}`];
  wa.forEach((w, i) => w !== wb[i] && out.push(`text ${JSON.stringify(w.slice(0, 60))} against ${JSON.stringify(wb[i].slice(0, 60))}`));
  na.forEach((x, i) => Math.abs(x - nb[i]) > absTol && out.push(`number ${i}: ${x} against ${nb[i]}`));
  return out;
}
