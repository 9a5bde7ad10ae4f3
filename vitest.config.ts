import { defineConfig } from "vitest/config";

export default defineConfig({
  test: {
    include: ["test/**/*.test.ts"],
    // Programmatic builds in tests run Eleventy, whose config imports .ts files.
    execArgv: ["--import", "tsx"],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    pool: "forks",
  },
});
