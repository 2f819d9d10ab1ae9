/**
 * A local stand-in for a hosted service (mail, payments). It starts on a loopback port and
 * returns a stop function; mocks/run-fakes.ts runs every fake listed in mocks/fakes.ts.
 */
export type Fake = {
  name: string;
  start: () => Promise<{ url: string; stop: () => Promise<void> }>;
};
