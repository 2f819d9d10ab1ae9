"use client";

import { useRouter } from "next/navigation";
import { Button } from "@/lib/ui/button";
import { useCreateReport } from "@/features/reports/api/reports";

/** Starts a draft quote report from an estimate or a stored comparison and opens it. */
export function CreateReportButton(props: { estimateId: string } | { comparisonId: string }) {
  const source =
    "comparisonId" in props
      ? { comparisonId: props.comparisonId }
      : { estimateId: props.estimateId };
  const create = useCreateReport();
  const router = useRouter();
  return (
    <div className="flex flex-col items-start gap-1">
      <Button
        size="sm"
        busy={create.isPending}
        onClick={() => create.mutate(source, { onSuccess: (r) => router.push(`/reports/${r.id}`) })}
      >
        Prepare a quote report
      </Button>
      {create.error ? (
        <p role="alert" className="text-sm text-danger-700">
          {create.error.message}
        </p>
      ) : null}
    </div>
  );
}
