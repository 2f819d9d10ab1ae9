// Segmenter alone on generated samples (no parsing), for profiling: node --cpu-prof --import tsx scripts/bench/ingest-segment-profile.ts
import { createTurnSegmenter } from "@/lib/scrub/segment-turns";
const n = 1_000_000;
const t = new Float64Array(n);
const yaw = new Float64Array(n);
for (let i = 0; i < n; i++) {
  t[i] = i / 10;
  yaw[i] = Math.floor(i / 300) % 2 ? 20 : 0.1;
}
for (let r = 0; r < 3; r++) {
  const seg = createTurnSegmenter();
  const s = { t: 0, speed: 2, yawRate: 0 };
  const t0 = performance.now();
  let turns = 0;
  for (let i = 0; i < n; i++) {
    s.t = t[i]!;
    s.yawRate = yaw[i]!;
    turns += seg.push(s).length;
  }
  turns += seg.finish().length;
  console.log(`segment 1M samples: ${(performance.now() - t0).toFixed(0)} ms, ${turns} turns`);
}
