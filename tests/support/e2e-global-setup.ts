import { spawn, execFileSync, type ChildProcess } from "node:child_process";

/**
 * Serves the production build made by `npm test` (NEXT_DIST_DIR=.next-test) against the test
 * database, with the local fakes and the background worker beside it, as `npm start` does.
 * Stops all three when the e2e run ends, or when the app fails to come up.
 */
const port = process.env.E2E_PORT ?? "3100";

async function waitForHttp(url: string, timeoutMs: number) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      const res = await fetch(url);
      if (res.status < 500) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms`);
}

export default async function setup() {
  if (!process.env.DATABASE_URL)
    throw new Error("DATABASE_URL is not set: run e2e tests through `npm test`.");
  execFileSync("node_modules/.bin/tsx", ["scripts/migrate.ts"], { stdio: "inherit" });
  execFileSync("node", ["--conditions=react-server", "--import", "tsx", "scripts/seed.ts"], {
    stdio: "inherit",
  });
  const env = {
    ...process.env,
    APP_URL: `http://localhost:${port}`,
    AUTH_URL: `http://localhost:${port}`,
    MAILBOX_ENABLED: "true",
  };
  const children: ChildProcess[] = [
    spawn("node_modules/.bin/tsx", ["mocks/run-fakes.ts"], { env, stdio: "inherit" }),
    spawn("node", ["--conditions=react-server", "--import", "tsx", "scripts/worker.ts"], {
      env,
      stdio: "inherit",
    }),
    spawn("node", ["node_modules/next/dist/bin/next", "start", "-H", "127.0.0.1", "-p", port], {
      env,
      stdio: "inherit",
    }),
  ];
  const stopAll = async () => {
    for (const child of children) child.kill("SIGTERM");
  };
  try {
    await waitForHttp(`http://localhost:${port}/api/health`, 60_000);
  } catch (error) {
    await stopAll();
    throw error;
  }
  return stopAll;
}
