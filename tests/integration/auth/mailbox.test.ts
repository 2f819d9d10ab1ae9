import { afterAll, describe, expect, it } from "vitest";
import { getPool } from "@/db/client";
import MailboxPage from "@/app/dev/mailbox/page";

afterAll(async () => {
  await getPool().end();
});

describe("development mailbox page", () => {
  it("is a 404 unless MAILBOX_ENABLED is true", async () => {
    // The integration tier runs without MAILBOX_ENABLED; npm start and the e2e tier set it.
    expect(process.env.MAILBOX_ENABLED ?? "false").toBe("false");
    const error = await MailboxPage().then(
      () => null,
      (e: unknown) => e as { digest?: string },
    );
    expect(error?.digest).toMatch(/404/);
  });
});
