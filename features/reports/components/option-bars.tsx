/** Horizontal bars (SVG) comparing one figure across the report's options. */
export function OptionBars({
  bars,
  format,
}: {
  bars: { key: string; label: string; value: number; highlight?: boolean }[];
  format: (v: number) => string;
}) {
  const max = Math.max(...bars.map((b) => (Number.isFinite(b.value) ? b.value : 0)), 1e-9);
  const rowH = 28;
  return (
    <svg
      role="img"
      aria-label={bars.map((b) => `${b.label}: ${format(b.value)}`).join("; ")}
      viewBox={`0 0 600 ${bars.length * rowH}`}
      className="w-full"
      style={{ maxHeight: bars.length * rowH * 1.2 }}
    >
      {bars.map((b, i) => {
        const w = (Number.isFinite(b.value) ? b.value : 0) / max;
        return (
          <g key={b.key} transform={`translate(0 ${i * rowH})`}>
            <text x={0} y={18} className="fill-ink-800 text-[13px]">
              {b.label}
            </text>
            <rect
              x={180}
              y={6}
              width={Math.max(1, w * 300)}
              height={rowH - 12}
              className={b.highlight ? "fill-furrow-600" : "fill-furrow-200"}
            />
            <text x={490} y={18} className="fill-ink-800 text-[13px]">
              {format(b.value)}
            </text>
          </g>
        );
      })}
    </svg>
  );
}
