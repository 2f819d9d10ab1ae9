// Used by the worker process as well as the app, so no "server-only" marker (it throws outside Next).
import path from "node:path";
import { getEnv } from "@/lib/env";

/** Absolute path of a stored upload; refuses paths that would leave UPLOAD_DIR. */
export function uploadPath(storagePath: string): string {
  const root = path.resolve(getEnv().UPLOAD_DIR);
  const full = path.resolve(root, storagePath);
  if (!full.startsWith(root + path.sep)) throw new Error("Upload path outside the upload folder.");
  return full;
}
