import type { ReactNode } from "react";

/**
 * A chart's caption and drawing: the svg scales to its column up to `maxWidth` px and is named by
 * the caption for screen readers; what follows the drawing (legend, figures) comes as `after`.
 */
export function ChartFigure({
  title,
  width,
  height,
  maxWidth,
  children,
  after,
}: {
  title: string;
  width: number;
  height: number;
  maxWidth: 460 | 520 | 720;
  children: ReactNode;
  after?: ReactNode;
}) {
  // Whole class names, so Tailwind finds them in the source.
  const widthClass = { 460: "max-w-[460px]", 520: "max-w-[520px]", 720: "max-w-[720px]" }[maxWidth];
  return (
    <figure className="flex flex-col gap-2">
      <figcaption className="text-sm font-medium text-ink-900">{title}</figcaption>
      <svg
        viewBox={`0 0 ${width} ${height}`}
        role="img"
        aria-label={title}
        className={`w-full ${widthClass}`}
      >
        {children}
      </svg>
      {after}
    </figure>
  );
}

/** Colour keys under a chart: a filled square and the series' name. */
export function ChartLegend({ items }: { items: { label: string; className: string }[] }) {
  return (
    <div className="flex flex-wrap gap-4 text-xs text-ink-700">
      {items.map((s) => (
        <span key={s.label} className="flex items-center gap-1">
          <svg width="12" height="12" aria-hidden>
            <rect width="12" height="12" className={s.className} />
          </svg>
          {s.label}
        </span>
      ))}
    </div>
  );
}

/** The figures behind a chart, for screen readers (a table ignores sr-only's width itself). */
export function ChartDataTable({
  title,
  corner = "—",
  columns,
  rows,
}: {
  title: string;
  /** Heading of the row-label column. */
  corner?: string;
  columns: string[];
  rows: { label: string; cells: string[] }[];
}) {
  return (
    <div className="sr-only">
      <table>
        <caption>{title}</caption>
        <thead>
          <tr>
            <th scope="col">{corner}</th>
            {columns.map((c) => (
              <th key={c} scope="col">
                {c}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.label}>
              <th scope="row">{r.label}</th>
              {r.cells.map((c, i) => (
                <td key={i}>{c}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
