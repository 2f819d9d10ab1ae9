import { EmptyState } from "@/lib/ui/empty-state";

/** Shown on a page the signed-in role may not use. */
export function NotAllowed({ what }: { what: string }) {
  return (
    <EmptyState title="Not available for your role">
      {what} is for dealer admins. Ask one of your dealership&apos;s admins if you need access.
    </EmptyState>
  );
}
