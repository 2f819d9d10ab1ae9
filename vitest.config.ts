import { defineConfig } from "vitest/config";

const unitFiles = [
  "tests/unit/**/*.test.{ts,tsx}",
  "lib/**/*.test.{ts,tsx}",
  "features/**/*.test.{ts,tsx}",
];

export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    alias: {
      "server-only": new URL("./tests/support/server-only-stub.ts", import.meta.url).pathname,
    },
  },
  test: {
    // next-auth imports "next/server" without an extension, which Node's ESM loader rejects;
    // inlining lets Vite resolve it.
    server: { deps: { inline: ["next-auth"] } },
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: unitFiles,
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.{ts,tsx}"],
          environment: "node",
          globalSetup: ["tests/support/integration-global-setup.ts"],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/support/e2e-global-setup.ts"],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
