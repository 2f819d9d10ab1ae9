const slug = (s: string) =>
  s
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 40);

/** "hollin-vale-farm-row-crop-tractor-v2.pdf": safe on every OS, says whose and which version. */
export function reportFileName(opts: {
  customer: string;
  machine: string;
  version: number;
  ext: "pdf" | "csv";
  suffix?: string;
}): string {
  const parts = [slug(opts.customer), slug(opts.machine)].filter(Boolean);
  const base = parts.length ? parts.join("-") : "report";
  return `${base}-v${opts.version}${opts.suffix ? `-${opts.suffix}` : ""}.${opts.ext}`;
}
