"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/lib/ui/button";
import { Dialog } from "@/lib/ui/dialog";
import { toast } from "@/lib/ui/toast";

/** Delete with a confirmation that says what else goes; navigates away afterwards. */
export function DeleteButton({
  what,
  consequences,
  onDelete,
  redirectTo,
}: {
  what: string;
  consequences: string;
  onDelete: () => Promise<unknown>;
  redirectTo: string;
}) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  return (
    <>
      <Button variant="secondary" size="sm" onClick={() => setOpen(true)}>
        Delete
      </Button>
      <Dialog
        open={open}
        onOpenChange={setOpen}
        title={`Delete ${what}?`}
        description={consequences}
        footer={
          <>
            <Button variant="secondary" onClick={() => setOpen(false)}>
              Keep it
            </Button>
            <Button
              variant="danger"
              busy={busy}
              onClick={async () => {
                setBusy(true);
                try {
                  await onDelete();
                  toast.success(`Deleted ${what}`);
                  router.push(redirectTo);
                } catch (e) {
                  toast.error(e instanceof Error ? e.message : "Could not delete.");
                } finally {
                  setBusy(false);
                  setOpen(false);
                }
              }}
            >
              Delete
            </Button>
          </>
        }
      />
    </>
  );
}
