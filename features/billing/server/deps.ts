import type { Db } from "@/db/client";
import type { TBillingProvider } from "@/features/billing/server/stripe";

/** The app's mail transport, handed in by the composer (app/, scripts/worker.ts). */
export type TMailSender = {
  send: (mail: { to: string; subject: string; text: string; html?: string }) => Promise<void>;
};

/** What billing's background work needs: the database, the provider and a mail transport. */
export type TBillingDeps = { db: Db; provider: TBillingProvider; mailer: TMailSender };
