/**
 * Report benchmark: render time of a four-option comparison report as PDF (target < 1.5 s).
 * The demo row-crop tractor as fitted and three changes a dealer might price go through the
 * engine's comparison (`compareOptions`, as the options feature stores it), then through the same
 * conversion issuing uses for a report built from a stored comparison
 * (`comparisonOptionSources`: every option re-run with per-turn detail, reasons and cautions),
 * frozen with buildReportContent and rendered by the code the PDF route uses. Writes the PDF and
 * its pages as PNGs (pdftoppm) to var/bench/ for a look.
 * Run: npm run bench:reports
 */
import { execFileSync } from "node:child_process";
import { mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import { DEMO_MACHINES } from "@/lib/demo/machines";
import { DEMO_DUTY_CYCLES } from "@/lib/demo/duty-cycles";
import { compareOptions, type TOptionSpec } from "@/lib/scrub";
import { buildReportContent } from "@/lib/reports";
import { comparisonOptionSources } from "@/lib/reports/from-comparison";
import { renderReportPdf } from "@/features/reports/pdf/render-report-pdf";

const machine = DEMO_MACHINES.find((d) => d.id === "row-crop-tractor")!.machine;
const cycle = DEMO_DUTY_CYCLES["row-crop-tractor"]!;
const priced: TOptionSpec[] = [
  {
    name: "Steering arms re-set to 20°",
    changes: [{ kind: "parameter", parameter: "armAngle", value: 20 }],
    oneOffCost: 350,
  },
  {
    name: "Ackermann-corrected linkage",
    changes: [{ kind: "steering", steering: { layout: "ideal", maxLock: 52 } }],
    oneOffCost: 1800,
  },
  {
    name: "Narrower front track (1.8 m)",
    changes: [{ kind: "parameter", parameter: "frontTrack", value: 1.8 }],
    oneOffCost: 600,
  },
];
// Stored as JSON, as option_studies keeps it.
const result = JSON.parse(JSON.stringify(compareOptions(machine, cycle, priced, { hours: 2000 })));
const options = comparisonOptionSources({
  machine,
  dutyCycle: cycle,
  result,
  baselineDescription: `${machine.name} on ${cycle.name}, as fitted today`,
});
const content = buildReportContent({
  kind: "comparison",
  title: "Front tyre scrub: four set-ups compared",
  currency: "GBP",
  dealership: {
    name: "Brackenridge Machinery",
    contactLine: "Unit 4, Fenwick Yard · tyres@example.test",
  },
  customer: { name: "Hollin Vale Farm", contactName: "Morwenna Tisdale" },
  dutyCycle: cycle,
  options,
  recommendations:
    "Re-set the steering arms at the next service; revisit the track width at tyre change.",
  customerNote: "As discussed at the yard visit.",
  issuedAt: new Date("2026-12-02T10:00:00Z"),
  issuedBy: "Tobias Wrenfield",
});

const render = () =>
  renderReportPdf({
    content,
    reportId: "3f9c2a7e-0000-4000-8000-000000000001",
    version: 1,
    supersededAt: null,
    logo: null,
    system: "metric",
  });

const runs = Number(process.env.RUNS ?? 7);
const first = performance.now();
let pdf = await render();
const cold = performance.now() - first;
const times: number[] = [];
const cpu: number[] = [];
for (let i = 0; i < runs; i++) {
  const t0 = performance.now();
  const c0 = process.cpuUsage();
  pdf = await render();
  const c = process.cpuUsage(c0);
  cpu.push((c.user + c.system) / 1000);
  times.push(performance.now() - t0);
}
times.sort((a, b) => a - b);
cpu.sort((a, b) => a - b);
mkdirSync("var/bench", { recursive: true });
writeFileSync("var/bench/report-4-options.pdf", pdf);
let pages = "?";
try {
  pages =
    /Pages:\s+(\d+)/.exec(
      execFileSync("pdfinfo", ["var/bench/report-4-options.pdf"]).toString(),
    )?.[1] ?? "?";
  execFileSync("pdftoppm", [
    "-r",
    "60",
    "-png",
    "var/bench/report-4-options.pdf",
    "var/bench/report-page",
  ]);
} catch {
  // poppler-utils missing: the timing still stands.
}
const ms = (v: number) => `${v.toFixed(0)} ms`;
console.log(
  `machine: ${os.cpus()[0]?.model ?? "?"} × ${os.cpus().length}, load ${os.loadavg()[0]!.toFixed(2)}, node ${process.version}`,
);
console.log(`four-option comparison report, ${pages} pages, ${(pdf.length / 1024).toFixed(0)} KiB`);
console.log(`first render (fonts loaded, cold JIT): ${ms(cold)}`);
console.log(
  `warm renders ×${runs}: median ${ms(times[Math.floor(runs / 2)]!)}, best ${ms(times[0]!)}, worst ${ms(times[runs - 1]!)} (target < 1500 ms)`,
);
// CPU time of this process: what a render costs when the two cores are shared with others.
console.log(
  `CPU time per warm render: median ${ms(cpu[Math.floor(runs / 2)]!)}, best ${ms(cpu[0]!)}`,
);
