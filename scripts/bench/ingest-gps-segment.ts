// Segmenter alone on a GPS-only log (no yaw rate, steer or compass column), so every detected
// turn runs the arc fit to the positions: node --import tsx scripts/bench/ingest-gps-segment.ts
// Invented log: 10 Hz, headland U-turns and quarter turns between 60 m passes at 2.5 m/s,
// 5 cm receiver noise (lib/duty-cycles/synthetic-path.ts).
import { createTurnSegmenter } from "@/lib/scrub/segment-turns";
import { samplePath, type TPathLeg } from "@/lib/duty-cycles/synthetic-path";

const legs: TPathLeg[] = [];
for (let i = 0; legs.length < 2_000; i++) {
  legs.push({ kind: "straight", distance: 60, speed: 2.5 });
  legs.push({ kind: "arc", radius: 6 + (i % 5), headingChange: i % 3 ? 180 : -90, speed: 2 });
}
const path = samplePath({ legs, hz: 10, noise: { position: 0.05, speed: 0.03 }, seed: 42 });
const n = path.length;
for (let r = 0; r < 3; r++) {
  const seg = createTurnSegmenter();
  const s = { t: 0, speed: 0, lat: 0, lon: 0 };
  const t0 = performance.now();
  const c0 = process.cpuUsage();
  let turns = 0;
  for (let i = 0; i < n; i++) {
    const p = path[i]!;
    s.t = p.t;
    s.speed = p.speed;
    s.lat = p.lat;
    s.lon = p.lon;
    turns += seg.push(s).length;
  }
  turns += seg.finish().length;
  const ms = performance.now() - t0;
  const c = process.cpuUsage(c0);
  const cpu = (c.user + c.system) / 1000;
  console.log(
    `segment ${n.toLocaleString("en")} GPS samples, ${turns} turns: ` +
      `${ms.toFixed(0)} ms wall / ${cpu.toFixed(0)} ms CPU ` +
      `(${((cpu / n) * 1e6).toFixed(0)} ms CPU per million samples)`,
  );
}
