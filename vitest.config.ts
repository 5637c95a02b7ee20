import { defineConfig } from "vitest/config";

export default defineConfig({
  test: {
    // every test file gets its own empty cache home, so no test reads or fills the user's cache folder
    setupFiles: ["tests/support/cacheHome.ts"],
  },
});
