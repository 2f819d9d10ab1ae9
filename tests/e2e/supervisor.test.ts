// `npm start`'s supervisor: a worker or fakes process killed with SIGKILL (as the out-of-memory
// killer does) is restarted, logged, and the app keeps answering; Ctrl-C stops everything.
// Runs the real scripts/start.sh against the test database and the build the e2e tier serves.
import { spawn, type ChildProcess } from "node:child_process";
import { afterAll, describe, expect, it } from "vitest";

const offset = 50; // beside the e2e tier's own app and fakes
const appPort = Number(process.env.E2E_PORT ?? 3100) + offset;
const smtpPort = Number(process.env.SMTP_PORT ?? 2526) + offset;
const stripePort = Number(process.env.STRIPE_FAKE_PORT ?? 12112) + offset;
const health = `http://localhost:${appPort}/api/health`;

let proc: ChildProcess | undefined;
let output = "";

async function until(check: () => boolean | Promise<boolean>, what: string, ms = 90_000) {
  const deadline = Date.now() + ms;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}\n${output}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

const startedPids = (name: string) =>
  [...output.matchAll(new RegExp(`${name} started \\(pid (\\d+)\\)`, "g"))].map((m) =>
    Number(m[1]),
  );

async function answers(): Promise<boolean> {
  try {
    return (await fetch(health)).status === 200;
  } catch {
    return false;
  }
}

afterAll(async () => {
  if (proc?.pid && proc.exitCode === null) process.kill(-proc.pid, "SIGKILL");
});

describe("npm start supervisor", () => {
  it("restarts a killed worker and fakes process while the app keeps serving; Ctrl-C stops all", async () => {
    proc = spawn("bash", ["scripts/start.sh"], {
      detached: true, // its own process group, as a terminal gives it
      stdio: ["ignore", "pipe", "pipe"],
      env: {
        ...process.env,
        PORT: String(appPort),
        SMTP_PORT: String(smtpPort),
        STRIPE_FAKE_PORT: String(stripePort),
        TREADCAST_DATABASE_URL: process.env.DATABASE_URL,
        NEXT_DIST_DIR: process.env.NEXT_DIST_DIR ?? ".next-test",
      },
    });
    proc.stdout!.on("data", (d: Buffer) => (output += d.toString()));
    proc.stderr!.on("data", (d: Buffer) => (output += d.toString()));

    await until(() => output.includes("Treadcast is running"), "start-up", 150_000);
    await until(answers, "the app to answer");
    const [worker] = startedPids("worker");
    const [fakes] = startedPids("fakes");
    expect(worker).toBeGreaterThan(0);
    expect(fakes).toBeGreaterThan(0);

    // Killed once it is ready, so the second "waiting" line below can only be the new worker's.
    await until(
      () => output.includes("waiting for duty-cycle imports"),
      "the first worker to be ready",
      60_000,
    );
    process.kill(worker!, "SIGKILL");
    process.kill(fakes!, "SIGKILL");
    // While they are down and coming back, the app keeps answering.
    for (let i = 0; i < 5; i++) {
      expect(await answers()).toBe(true);
      await new Promise((r) => setTimeout(r, 200));
    }
    await until(() => startedPids("worker").length === 2, "the worker to restart", 30_000);
    await until(() => startedPids("fakes").length === 2, "the fakes to restart", 30_000);
    expect(output).toMatch(/worker stopped \(killed by signal 9\); restarting in 1 s/);
    expect(output).toMatch(/fakes stopped \(killed by signal 9\); restarting in 1 s/);
    const [, newWorker] = startedPids("worker");
    expect(newWorker).not.toBe(worker);
    await until(
      () => (output.match(/waiting for duty-cycle imports/g) ?? []).length >= 2,
      "the new worker to be ready",
      30_000,
    );
    expect(() => process.kill(newWorker!, 0)).not.toThrow();
    expect(await answers()).toBe(true);

    // Ctrl-C: the terminal signals the whole process group.
    const exited = new Promise((r) => proc!.once("exit", r));
    process.kill(-proc.pid!, "SIGINT");
    await exited;
    expect(output).toMatch(/\[treadcast\]\S* stopped/);
    expect(await answers()).toBe(false);
    expect(() => process.kill(newWorker!, 0)).toThrow();
  }, 240_000);
});
