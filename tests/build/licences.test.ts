import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { bundledPackages, licenceNotices } from "../../src/build/licences.js";

describe("licences of bundled packages", () => {
  it("names each package a bundled path comes from once, scoped names included, sorted, with either path separator", () => {
    expect(bundledPackages(["src/x.ts", "node_modules/three/build/three.core.js", "node_modules\\gl-matrix\\esm\\vec3.js", "a/node_modules/@scope/pkg/i.js", "node_modules/three/build/three.module.js"])).toEqual([
      { name: "@scope/pkg", dir: "a/node_modules/@scope/pkg" },
      { name: "gl-matrix", dir: "node_modules/gl-matrix" },
      { name: "three", dir: "node_modules/three" },
    ]);
    expect(bundledPackages(["src/a.ts", "geometry/b.ts"])).toEqual([]);
  });

  it("copies each licence file into one comment that nothing inside can close, and says so when a package has none", () => {
    const root = mkdtempSync(join(tmpdir(), "seam-atlas-licences-"));
    mkdirSync(join(root, "node_modules", "tricky"), { recursive: true });
    writeFileSync(join(root, "node_modules", "tricky", "LICENSE"), "MIT */ </script> <!-- end");
    mkdirSync(join(root, "node_modules", "bare"), { recursive: true });
    const notice = licenceNotices(root, ["node_modules/tricky/index.js", "node_modules/bare/index.js"]);
    expect(notice.startsWith("\n/*! Licences of the bundled packages")).toBe(true);
    expect(notice.match(/\*\//g)).toHaveLength(1);
    expect(notice).not.toMatch(/<\/script|<!--/i);
    expect(notice).toContain("bare:\n(no licence file found");
    expect(licenceNotices(root, ["src/a.ts"])).toBe("");
  });
});
