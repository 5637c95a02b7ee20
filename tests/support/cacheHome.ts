/**
 * Each test file's own cache home (vitest.config.ts setupFiles): XDG_CACHE_HOME points at
 * a fresh temporary folder before any test runs, and is removed after the file's tests.
 * The command lines the tests start inherit it (support/cli.ts passes process.env on),
 * so no test ever reads or writes the user's cache folder (io/cacheFiles.ts).
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll } from "vitest";

const home = mkdtempSync(join(tmpdir(), "seam-atlas-test-cache-"));
process.env.XDG_CACHE_HOME = home;

afterAll(() => rmSync(home, { recursive: true, force: true }));

export const TEST_CACHE_HOME = home;
