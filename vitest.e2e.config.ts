import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

// The browser tests run a test build: the product plus the pages only tests visit (next.config.ts), in .next-test.
process.env.TOWMARGIN_TEST_ROUTES ??= "1";

// Browser tests: one production server for the whole run, files one after another (2-core machine).
export default defineConfig({
  resolve: { alias: { "@": fileURLToPath(new URL("./", import.meta.url)) } },
  test: {
    include: ["tests/e2e/**/*.e2e.ts"],
    globalSetup: ["tests/e2e/support/global-setup.ts"],
    environment: "node",
    pool: "forks",
    fileParallelism: false,
    testTimeout: 90_000,
    hookTimeout: 180_000,
  },
});
