// Runs N `next start` processes behind one port with node:cluster (the primary accepts and hands
// connections to workers in turn). `next start` itself is one process: this is how the benchmark
// measures a box using more than one core. Usage: node scripts/bench/next-cluster.mjs N -- <next start args>
import cluster from "node:cluster";

const processes = Math.max(1, Number(process.argv[2] ?? 2));
const nextArgs = process.argv.slice(process.argv.indexOf("--") + 1);

cluster.setupPrimary({ exec: "node_modules/next/dist/bin/next", args: nextArgs });
for (let i = 0; i < processes; i++) cluster.fork();
cluster.on("exit", (worker, code) => {
  console.error(`[next-cluster] worker ${worker.process.pid} exited with ${code}`);
});
const stop = () => {
  for (const w of Object.values(cluster.workers ?? {})) w?.kill("SIGTERM");
  process.exit(0);
};
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
