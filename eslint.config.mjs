import { existsSync, readdirSync } from "node:fs";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

// One-way imports: app -> features -> lib, db. Features never import each other.
// Read from disk so a new feature folder is covered without editing this file.
const featureNames = existsSync("features")
  ? readdirSync("features", { withFileTypes: true })
      .filter((d) => d.isDirectory())
      .map((d) => d.name)
  : [];
const featureZones = featureNames.map((name) => ({
  target: `./features/${name}`,
  from: "./features",
  except: [`./${name}`],
  message: "A feature must not import another feature: compose them in app/.",
}));

const config = [
  {
    ignores: [
      "node_modules/**",
      ".next*/**",
      ".pgdata*/**",
      "var/**",
      "drizzle/**",
      "next-env.d.ts",
      "coverage/**",
    ],
  },
  ...nextVitals,
  ...nextTs,
  {
    rules: {
      "import/no-cycle": "error",
      "import/no-restricted-paths": [
        "error",
        {
          zones: [
            ...featureZones,
            {
              target: "./lib",
              from: ["./app", "./features", "./db"],
              message: "lib/ is pure: no app, feature or db imports.",
            },
            {
              target: "./db",
              from: ["./app", "./features"],
              message: "db/ must not depend on app or features.",
            },
            { target: "./features", from: "./app", message: "features must not import app/." },
          ],
        },
      ],
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_" },
      ],
    },
  },
];

export default config;
