import type { ReactNode } from "react";
import { Button } from "@/lib/ui/button";

/** Previous and Next around what the list says about where the reader is. */
export function PageButtons({
  page,
  pageCount,
  onPage,
  children,
}: {
  page: number;
  pageCount: number;
  onPage: (page: number) => void;
  children?: ReactNode;
}) {
  return (
    <>
      <Button size="sm" variant="secondary" disabled={page <= 1} onClick={() => onPage(page - 1)}>
        Previous
      </Button>
      {children}
      <Button
        size="sm"
        variant="secondary"
        disabled={page >= pageCount}
        onClick={() => onPage(page + 1)}
      >
        Next
      </Button>
    </>
  );
}
