/**
 * Test helpers for SVG text: a strict well-formedness check for the XML subset our
 * renderers write (elements, double-quoted attributes, text, the five predefined
 * entities and numeric references), and readers for elements and path data.
 */

/** Problems that make `text` other than one well-formed <svg> element; empty when none. */
export function xmlProblems(text: string): string[] {
  const problems: string[] = [];
  const stack: string[] = [];
  const tag = /<(\/?)([A-Za-z][\w:.-]*)((?:\s+[\w:.-]+="[^"<]*")*)\s*(\/?)>/y;
  let roots = 0;
  let i = 0;
  while (i < text.length) {
    const lt = text.indexOf("<", i);
    const chunk = text.slice(i, lt < 0 ? text.length : lt);
    if (/&(?!(?:amp|lt|gt|quot|apos|#\d+|#x[0-9a-fA-F]+);)/.test(chunk)) problems.push(`bare & in text near offset ${i}`);
    if (stack.length === 0 && chunk.trim()) problems.push(`text outside the root near offset ${i}`);
    if (lt < 0) break;
    tag.lastIndex = lt;
    const m = tag.exec(text);
    if (!m) {
      problems.push(`malformed tag at offset ${lt}: ${text.slice(lt, lt + 40)}`);
      break;
    }
    const [, close, name, , selfClose] = m;
    if (close) {
      const open = stack.pop();
      if (open !== name) problems.push(`</${name}> closes <${open}> at offset ${lt}`);
    } else {
      if (stack.length === 0) {
        roots++;
        if (name !== "svg") problems.push(`root element is <${name}>, not <svg>`);
      }
      if (!selfClose) stack.push(name);
    }
    i = tag.lastIndex;
  }
  if (stack.length) problems.push(`unclosed elements: ${stack.join(", ")}`);
  if (roots !== 1) problems.push(`${roots} root elements`);
  return problems;
}

/** Attribute maps of every <name ...> element, in document order. */
export function elements(svg: string, name: string): Record<string, string>[] {
  const out: Record<string, string>[] = [];
  for (const m of svg.matchAll(new RegExp(`<${name}\\b([^>]*)>`, "g"))) {
    const attrs: Record<string, string> = {};
    for (const a of m[1].matchAll(/([\w:-]+)="([^"]*)"/g)) attrs[a[1]] = a[2];
    out.push(attrs);
  }
  return out;
}

/** Text contents of every <text> element, entities decoded; a label's halo (class sa-halo, the same words drawn under it) is left out. */
export function texts(svg: string): string[] {
  return [...svg.matchAll(/<text\b([^>]*)>([^<]*)<\/text>/g)].filter((m) => !/class="sa-halo"/.test(m[1])).map((m) => m[2]).map((m) =>
    m.replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&quot;/g, '"').replace(/&amp;/g, "&"),
  );
}

/** Subpaths of absolute or relative M/L/l/Z path data as flat absolute [x0, y0, x1, y1, ...]. */
export function subpaths(d: string): number[][] {
  const out: number[][] = [];
  let cur: number[] = [];
  for (const m of d.matchAll(/([MLlZ])([^MLlZ]*)/g)) {
    const nums = m[2].trim() ? m[2].trim().split(/[\s,]+/).map(Number) : [];
    if (m[1] === "M") {
      cur = [];
      out.push(cur);
    }
    for (let k = 0; k + 1 < nums.length; k += 2) {
      if (m[1] === "l") cur.push(cur[cur.length - 2] + nums[k], cur[cur.length - 1] + nums[k + 1]);
      else cur.push(nums[k], nums[k + 1]);
    }
  }
  return out;
}

/** Signed shoelace area of a closed polygon given as flat [x, y, ...]. */
export function shoelaceArea(xy: readonly number[]): number {
  let a = 0;
  const n = xy.length / 2;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    a += xy[2 * i] * xy[2 * j + 1] - xy[2 * j] * xy[2 * i + 1];
  }
  return a / 2;
}
