"use client";

import Link from "next/link";
import { listState } from "@/lib/query/list-state";
import { formatDate } from "@/lib/format/format";
import { useStudies } from "@/features/options/api/studies";
import type { TStudyKind } from "@/features/options/schemas/study";

const PATH: Record<TStudyKind, string> = { comparison: "comparisons", sweep: "sweeps" };

/**
 * Every stored version of one study, newest first, so a rerun's reader can step back to what an
 * earlier version said (a report may quote one). Nothing shows while there is only one.
 */
export function StudyVersions({
  kind,
  seriesId,
  currentId,
}: {
  kind: TStudyKind;
  seriesId: string;
  currentId: string;
}) {
  const versions = useStudies(
    kind,
    listState({ sort: "createdAt", dir: "desc", pageSize: 100, filters: { seriesId } }),
  );
  const rows = versions.data?.items ?? [];
  if (rows.length < 2) return null;
  return (
    <nav aria-label="Versions" className="flex flex-wrap items-baseline gap-x-3 gap-y-1 text-sm">
      <span className="font-medium text-ink-800">Versions:</span>
      {rows.map((v) =>
        v.id === currentId ? (
          <span key={v.id} aria-current="page" className="font-semibold text-ink-900">
            {v.version} (this one, {formatDate(v.createdAt)})
          </span>
        ) : (
          <Link
            key={v.id}
            href={`/${PATH[kind]}/${v.id}`}
            className="text-furrow-700 hover:underline"
          >
            {v.version} ({formatDate(v.createdAt)})
          </Link>
        ),
      )}
    </nav>
  );
}
