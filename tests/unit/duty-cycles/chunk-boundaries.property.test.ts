// Property: the streamed file may be cut anywhere (network packets, read buffers); no turn is
// lost or counted twice because of where the cuts fall. Checked with fast-check against the
// same file read in one piece, and against the turns the generated path is known to have.
import { Readable } from "node:stream";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { readCsvRows } from "@/features/duty-cycles/server/read-csv-rows";
import { createTelematicsImporter } from "@/lib/duty-cycles/telematics-import";
import { createTurnSegmenter, segmentTurns, type TTurnSample } from "@/lib/scrub/segment-turns";
import { samplePath, type TPathLeg } from "@/lib/duty-cycles/synthetic-path";
import type { TColumnMapping } from "@/lib/duty-cycles/column-mapping";

const legs: TPathLeg[] = [];
for (let i = 0; i < 6; i++) {
  legs.push({ kind: "straight", distance: 40, speed: 3 });
  legs.push({ kind: "arc", radius: 5 + i, headingChange: i % 2 ? -180 : 180, speed: 2 });
}
legs.push({ kind: "straight", distance: 40, speed: 3 });
const path = samplePath({ legs, noise: { yawRate: 0.3 }, seed: 4 });
const csv =
  "t;v;yaw\n" +
  path
    .map(
      (s) =>
        `${s.t.toFixed(1)};${s.speed.toFixed(3).replace(".", ",")};${s.yawRate.toFixed(3).replace(".", ",")}`,
    )
    .join("\n") +
  "\n";
const mapping: TColumnMapping = {
  kind: "telematics",
  delimiter: ";",
  decimal: ",",
  hasHeader: true,
  encoding: "utf-8",
  columns: {
    time: { index: 0, unit: "s" },
    speed: { index: 1, unit: "m/s" },
    yawRate: { index: 2, unit: "deg/s" },
  },
  defaults: { surface: "firm-soil", loadState: "unladen", shiftHours: 8, maxSpeed: 25 },
};

async function importPieces(pieces: string[]) {
  const importer = createTelematicsImporter(mapping);
  await readCsvRows({
    input: Readable.from(pieces),
    delimiter: ";",
    hasHeader: true,
    onRecord: importer.pushRow,
  });
  return importer.finish();
}

function cutAt(text: string, cuts: number[]): string[] {
  const points = [...new Set(cuts.map((c) => c % text.length))].sort((a, b) => a - b);
  const pieces: string[] = [];
  let last = 0;
  for (const p of points) {
    pieces.push(text.slice(last, p));
    last = p;
  }
  pieces.push(text.slice(last));
  return pieces.filter((p) => p.length > 0);
}

describe("chunk boundaries", () => {
  it("the whole file gives the six known turns", async () => {
    const whole = await importPieces([csv]);
    expect(whole.turns).toHaveLength(6);
    expect(whole.rowsUsed).toBe(path.length);
  });

  it("any cuts of the file give the same turns as the whole file", async () => {
    const whole = await importPieces([csv]);
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.nat({ max: csv.length * 4 }), { minLength: 1, maxLength: 60 }),
        async (cuts) => {
          const cut = await importPieces(cutAt(csv, cuts));
          expect(cut.turns).toEqual(whole.turns);
          expect(cut.rowsUsed).toBe(whole.rowsUsed);
        },
      ),
      { numRuns: 60 },
    );
  });

  it("feeding the segmenter in any batches gives the same turns as one pass", () => {
    const samples: TTurnSample[] = path.map((s) => ({
      t: s.t,
      speed: s.speed,
      yawRate: s.yawRate,
    }));
    const once = segmentTurns(samples);
    expect(once).toHaveLength(6);
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 1, max: 400 }), { minLength: 1, maxLength: 40 }),
        (sizes) => {
          const seg = createTurnSegmenter();
          const found = [];
          let i = 0;
          let k = 0;
          while (i < samples.length) {
            const n = sizes[k++ % sizes.length]!;
            for (const s of samples.slice(i, i + n)) found.push(...seg.push(s));
            i += n;
          }
          found.push(...seg.finish());
          expect(found).toEqual(once);
        },
      ),
      { numRuns: 50 },
    );
  });
});
