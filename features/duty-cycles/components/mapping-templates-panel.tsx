"use client";

import { useState } from "react";
import { Button } from "@/lib/ui/button";
import { Card } from "@/lib/ui/card";
import { Dialog } from "@/lib/ui/dialog";
import { toast } from "@/lib/ui/toast";
import {
  useDeleteMappingTemplate,
  useMappingTemplates,
} from "@/features/duty-cycles/api/mapping-templates";
import type { TMappingTemplate } from "@/features/duty-cycles/schemas/mapping-template";

/** The dealership's saved column mappings, with delete (duty cycles keep their own copy). */
export function MappingTemplatesPanel() {
  const telematics = useMappingTemplates("telematics");
  const schedules = useMappingTemplates("schedule");
  const remove = useDeleteMappingTemplate();
  const [doomed, setDoomed] = useState<TMappingTemplate | null>(null);
  const all = [...(telematics.data ?? []), ...(schedules.data ?? [])];
  if (all.length === 0) return null;
  return (
    <Card title="Saved column mappings">
      <ul className="divide-y divide-ink-100">
        {all.map((t) => (
          <li key={t.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
            <span>
              <span className="font-medium text-ink-900">{t.name}</span>{" "}
              <span className="text-sm text-ink-600">
                ({t.kind === "telematics" ? "telematics log" : "turn schedule"})
              </span>
            </span>
            <Button size="sm" variant="ghost" onClick={() => setDoomed(t)}>
              Delete
            </Button>
          </li>
        ))}
      </ul>
      <Dialog
        open={doomed !== null}
        onOpenChange={(open) => !open && setDoomed(null)}
        title={`Delete the mapping "${doomed?.name ?? ""}"?`}
        description="Duty cycles already imported with it keep their own copy and are not affected."
        footer={
          <>
            <Button variant="secondary" onClick={() => setDoomed(null)}>
              Keep it
            </Button>
            <Button
              variant="danger"
              busy={remove.isPending}
              onClick={() =>
                doomed &&
                remove.mutate(doomed.id, {
                  onSuccess: () => {
                    toast.success("Mapping deleted.");
                    setDoomed(null);
                  },
                  onError: (e) => toast.error(e.message),
                })
              }
            >
              Delete
            </Button>
          </>
        }
      />
    </Card>
  );
}
