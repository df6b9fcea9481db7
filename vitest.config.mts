import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

// Two projects: pure unit tests beside the code, and integration tests
// against the real PostgreSQL and Redis that scripts/test.sh starts.
export default defineConfig({
  resolve: { alias: { "@": fileURLToPath(new URL(".", import.meta.url)) } },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: ["lib/**/*.test.ts", "components/**/*.test.ts"],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 60_000,
          globalSetup: ["tests/integration/global-setup.ts"],
        },
      },
    ],
  },
});
