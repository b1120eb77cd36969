import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

const alias = {
  "@shared": fileURLToPath(new URL("./shared", import.meta.url)),
  "@": fileURLToPath(new URL("./src", import.meta.url)),
};

// Two projects: `unit` (unit, api, reference checks; `npm test`) and `e2e` (real Chromium; `npm run test:e2e`).
export default defineConfig({
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: "unit",
          include: ["tests/unit/**/*.test.ts", "tests/api/**/*.test.ts", "tests/reference/**/*.test.ts"],
          environment: "node",
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          environment: "node",
          testTimeout: 120_000,
          hookTimeout: 240_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
