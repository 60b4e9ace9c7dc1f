import path from "node:path";
import { defineConfig } from "vitest/config";

// Tests against the production build served by scripts/start.ts with the local stand-ins.
export default defineConfig({
  resolve: {
    alias: {
      "@": path.resolve(import.meta.dirname),
      "server-only": path.resolve(import.meta.dirname, "tests/utils/server-only-stub.ts"),
    },
  },
  test: {
    include: ["tests/server/**/*.test.ts", "tests/browser/**/*.test.ts"],
    globalSetup: ["tests/utils/server-setup.ts"],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    fileParallelism: false,
    pool: "forks",
  },
});
