// Who may see the development mailbox. Loopback ranges: RFC 1122 §3.2.1.3 (127.0.0.0/8),
// RFC 4291 §2.5.3 (::1) and §2.5.5.2 (IPv4-mapped ::ffff:127.0.0.1).
import { describe, expect, it } from "vitest";
import { mailboxAllowed } from "@/lib/platform/mailbox-access";

const local = {
  enabled: true,
  appUrl: "http://localhost:3000",
  host: "localhost:3000",
  forwardedFor: "127.0.0.1",
};

describe("mailboxAllowed", () => {
  it("allows a local request to a local app with the mailbox on", () => {
    expect(mailboxAllowed(local)).toBe(true);
    expect(mailboxAllowed({ ...local, forwardedFor: "::1" })).toBe(true);
    expect(mailboxAllowed({ ...local, forwardedFor: "::ffff:127.0.0.1" })).toBe(true);
    expect(mailboxAllowed({ ...local, host: "127.0.0.1:3000", forwardedFor: "127.10.0.3" })).toBe(
      true,
    );
    expect(mailboxAllowed({ ...local, host: "[::1]:3000" })).toBe(true);
  });

  it("refuses when MAILBOX_ENABLED is off", () => {
    expect(mailboxAllowed({ ...local, enabled: false })).toBe(false);
  });

  it("refuses on a deployed app even when the mailbox is switched on", () => {
    expect(mailboxAllowed({ ...local, appUrl: "https://quotes.treadcast.test" })).toBe(false);
  });

  it.each([
    ["from another machine", { forwardedFor: "192.168.1.20" }],
    ["through a proxy for another machine", { forwardedFor: "203.0.113.7, 127.0.0.1" }],
    ["with no peer address", { forwardedFor: null }],
    ["addressed to a public host name", { host: "treadcast.example.test" }],
    ["with no Host header", { host: null }],
    ["from an address that only starts like loopback", { forwardedFor: "127.0.0.1.evil.test" }],
  ])("refuses a request %s", (_what, change) => {
    expect(mailboxAllowed({ ...local, ...change })).toBe(false);
  });
});
