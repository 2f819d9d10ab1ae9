// Runs every local fake in one process until SIGINT/SIGTERM.
import { fakes } from "@/mocks/fakes";

const running = await Promise.all(
  fakes.map(async (fake) => {
    const handle = await fake.start();
    console.log(`[fakes] ${fake.name} listening on ${handle.url}`);
    return handle;
  }),
);

async function stopAll() {
  await Promise.allSettled(running.map((h) => h.stop()));
  process.exit(0);
}
process.on("SIGINT", stopAll);
process.on("SIGTERM", stopAll);
// Keep the process alive even when no fake holds a socket open.
setInterval(() => undefined, 1 << 30);
