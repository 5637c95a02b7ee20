/** The tool's name and version, read once from package.json (found by walking up from this module). */
import { existsSync, readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

function findPackageJson(): { name: string; version: string } {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 8; i++) {
    const candidate = join(dir, "package.json");
    if (existsSync(candidate)) {
      const pkg = JSON.parse(readFileSync(candidate, "utf8")) as { name?: string; version?: string };
      if (pkg.name === "seam-atlas" && pkg.version) return { name: pkg.name, version: pkg.version };
    }
    dir = dirname(dir);
  }
  return { name: "seam-atlas", version: "0.0.0" };
}

const pkg = findPackageJson();
export const TOOL_NAME = pkg.name;
export const TOOL_VERSION = pkg.version;

/** The project's root folder (where package.json, templates/ and out/ live). */
export function projectRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 8; i++) {
    if (existsSync(join(dir, "package.json")) && existsSync(join(dir, "templates"))) return dir;
    dir = dirname(dir);
  }
  return process.cwd();
}
