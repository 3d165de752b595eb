import { defineConfig } from "vitest/config";

export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    include: ["lib/**/*.test.ts", "tests/unit/**/*.test.ts", "tests/integration/**/*.test.ts"],
    environment: "node",
    // Integration tests share one throwaway cluster; files run one at a time so their resets do not collide.
    fileParallelism: false,
    testTimeout: 20000,
  },
});
