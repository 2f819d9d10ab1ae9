"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/lib/ui/button";
import { Select } from "@/lib/ui/input";
import { toast } from "@/lib/ui/toast";
import { useCopyMachine } from "@/features/machines/api/machines";
import { ChoiceOptions } from "@/lib/ui/choice-options";

/** Copies a template to a chosen customer and opens the copy. */
export function CopyToCustomer({
  machineId,
  machineName,
  customers,
}: {
  machineId: string;
  machineName: string;
  customers: { id: string; name: string }[];
}) {
  const router = useRouter();
  const copy = useCopyMachine();
  const [customerId, setCustomerId] = useState(customers[0]?.id ?? "");
  return (
    <div className="flex flex-wrap items-end gap-2">
      <label className="flex flex-col gap-1 text-sm font-medium text-ink-800">
        Copy {machineName} to
        <Select
          value={customerId}
          onChange={(e) => setCustomerId(e.target.value)}
          className="h-9 w-56"
        >
          <ChoiceOptions choices={customers} />
        </Select>
      </label>
      <Button
        size="sm"
        variant="secondary"
        busy={copy.isPending}
        disabled={!customerId}
        onClick={async () => {
          try {
            const created = await copy.mutateAsync({ id: machineId, customerId });
            toast.success("Copied to the customer");
            router.push(`/machines/${created.id}`);
          } catch (e) {
            toast.error(e instanceof Error ? e.message : "Could not copy.");
          }
        }}
      >
        Copy
      </Button>
    </div>
  );
}
