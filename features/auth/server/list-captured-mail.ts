import "server-only";
import { desc } from "drizzle-orm";
import type { Db } from "@/db/client";
import { capturedMails } from "@/db/schema";

/** The newest messages caught by the local SMTP fake. */
export async function listCapturedMail(db: Db, limit = 50) {
  return db.select().from(capturedMails).orderBy(desc(capturedMails.receivedAt)).limit(limit);
}
