import { existsSync, readdirSync, readFileSync } from "node:fs";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

/**
 * The declared order of features, lowest first (features/order.json). A feature may import a
 * lower one only through its public entries (`index.ts` for server code, `client.ts` for browser
 * code), and never a higher one. Two entries, because a browser bundle must never reach a module
 * marked "server-only". DEVELOPERS.md explains it.
 */
const FEATURE_ORDER = JSON.parse(readFileSync("features/order.json", "utf8"));

const featuresOnDisk = existsSync("features")
  ? readdirSync("features", { withFileTypes: true })
      .filter((d) => d.isDirectory())
      .map((d) => d.name)
  : [];
const undeclared = featuresOnDisk.filter((name) => !FEATURE_ORDER.includes(name));
if (undeclared.length > 0)
  throw new Error(`features/${undeclared[0]} is not in features/order.json`);

// For each feature: higher features are off limits, and lower ones only through their entries.
const featureZones = FEATURE_ORDER.flatMap((name, rank) => [
  ...FEATURE_ORDER.slice(rank + 1).map((higher) => ({
    target: `./features/${name}`,
    from: `./features/${higher}`,
    message: `features/${name} sits below features/${higher} in FEATURE_ORDER: it may not import it. Compose them in app/ or move the shared piece down.`,
  })),
  ...FEATURE_ORDER.slice(0, rank).map((lower) => ({
    target: `./features/${name}`,
    from: `./features/${lower}`,
    except: ["./index.ts", "./client.ts"],
    message: `Import features/${lower} only through its public entries (index.ts on the server, client.ts in the browser).`,
  })),
]);

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
