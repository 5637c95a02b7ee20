/** The licences of packages bundled into a script, as one comment to append to it. */
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

/** The packages that bundled input paths (relative to the project root) come from: name and folder, sorted by name. */
export function bundledPackages(inputs: readonly string[]): { name: string; dir: string }[] {
  const found = new Map<string, string>();
  for (const input of inputs) {
    const m = /^(.*?node_modules\/((?:@[^/]+\/)?[^/]+))\//.exec(input.replace(/\\/g, "/"));
    if (m && !found.has(m[2])) found.set(m[2], m[1]);
  }
  return [...found].sort((a, b) => (a[0] < b[0] ? -1 : 1)).map(([name, dir]) => ({ name, dir }));
}

/** One comment with each bundled package's licence file, ready to append to a script. */
export function licenceNotices(root: string, inputs: readonly string[]): string {
  const blocks = bundledPackages(inputs).map(({ name, dir }) => {
    const folder = join(root, dir);
    const file = existsSync(folder) ? readdirSync(folder).sort().find((f) => /^licen[cs]e(\.md|\.txt)?$/i.test(f)) : undefined;
    const text = file ? readFileSync(join(folder, file), "utf8").trim() : "(no licence file found in the package; see its package.json)";
    // nothing in a licence may close the comment or the script element
    return `${name}:\n${text.replace(/\*\//g, "* /").replace(/<\/script/gi, "< /script").replace(/<!--/g, "< !--")}`;
  });
  return blocks.length ? `\n/*! Licences of the bundled packages\n\n${blocks.join("\n\n")}\n*/\n` : "";
}

