// Writes a seeded, invented telematics log of ROWS samples at 10 Hz (a long day of field work,
// headland turns, yard loading with reversing and road moves), for the ingest benchmark.
// Usage: tsx scripts/bench/ingest-generate.ts <file> [rows]
import { createWriteStream } from "node:fs";
import { once } from "node:events";
import { samplePath, seededRandom, type TPathLeg } from "@/lib/duty-cycles/synthetic-path";

const file = process.argv[2];
const rows = Number(process.argv[3] ?? 1_000_000);
if (!file) throw new Error("usage: ingest-generate.ts <file> [rows]");

const HZ = 10;
const random = seededRandom(20_261_202);
const legs: TPathLeg[] = [];
let seconds = 0;
const add = (leg: TPathLeg, duration: number) => {
  legs.push(leg);
  seconds += duration;
};
while (seconds < rows / HZ + 60) {
  const block = random();
  if (block < 0.7) {
    // Field: 20 passes with headland U-turns alternating left and right.
    for (let i = 0; i < 20; i++) {
      const run = 250 + random() * 150;
      add({ kind: "straight", distance: run, speed: 3.3 }, run / 3.3);
      const r = 5 + random() * 3;
      add(
        { kind: "arc", radius: r, headingChange: i % 2 ? -180 : 180, speed: 1.8 },
        (Math.PI * r) / 1.8,
      );
    }
  } else if (block < 0.9) {
    // Yard loading: forward, stop, reverse out turning, swing in.
    for (let i = 0; i < 15; i++) {
      add({ kind: "straight", distance: 8, speed: 2 }, 4);
      add({ kind: "stop", duration: 3 }, 3);
      add({ kind: "arc", radius: 4.5, headingChange: 90, speed: 1.5, reverse: true }, 4.7);
      add({ kind: "arc", radius: 5, headingChange: 90, speed: 2 }, 3.9);
      add({ kind: "stop", duration: 5 }, 5);
    }
  } else {
    // Road move with a few bends.
    for (let i = 0; i < 6; i++) {
      add({ kind: "straight", distance: 600, speed: 11 }, 600 / 11);
      const angle = (random() < 0.5 ? -1 : 1) * (40 + random() * 50);
      add(
        { kind: "arc", radius: 60, headingChange: angle, speed: 9 },
        (60 * Math.abs(angle) * Math.PI) / 180 / 9,
      );
    }
    add({ kind: "stop", duration: 120 }, 120);
  }
}

const samples = samplePath({
  legs,
  hz: HZ,
  noise: { yawRate: 0.4, speed: 0.03, position: 0.05 },
  seed: 7,
});
const out = createWriteStream(file);
const start = Date.UTC(2026, 4, 4, 5, 0, 0) / 1000;
let buffer = "time,speed_kmh,yaw_rate_dps,lat,lon,surface,gear\n";
for (let i = 0; i < rows && i < samples.length; i++) {
  const s = samples[i]!;
  const surface = s.speed > 8 ? "asphalt" : "soil";
  buffer += `${(start + s.t).toFixed(1)},${(Math.abs(s.speed) * 3.6).toFixed(2)},${s.yawRate.toFixed(2)},${s.lat.toFixed(7)},${s.lon.toFixed(7)},${surface},${s.speed < 0 ? "R" : "F"}\n`;
  if (buffer.length > 1 << 16) {
    if (!out.write(buffer)) await once(out, "drain");
    buffer = "";
  }
}
out.end(buffer);
await once(out, "finish");
console.log(`wrote ${Math.min(rows, samples.length)} rows to ${file}`);
