import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { ROOT, runCli } from "../support/cli.js";

describe("the command line as a whole", () => {
  it("rejects an unknown command with exit 2 and one line", () => {
    const r = runCli(["fly-me"]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
  });

  it("answers --version with the package's version and exit 0", () => {
    const r = runCli(["--version"]);
    expect(r.code).toBe(0);
    expect(r.stdout.trim()).toBe(JSON.parse(readFileSync(join(ROOT, "package.json"), "utf8")).version);
  });
});
