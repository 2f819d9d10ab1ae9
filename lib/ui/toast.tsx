"use client";

import { Toaster as SonnerToaster, toast } from "sonner";

/** Mounted once in the root layout; call `toast(...)` anywhere on the client. */
export function Toaster() {
  return <SonnerToaster position="bottom-center" richColors closeButton />;
}

export { toast };
