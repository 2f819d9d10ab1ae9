/**
 * Local stand-ins for hosted services (mail, payments). Each fake starts on a loopback port
 * and returns a stop function; mocks/run-fakes.ts runs them all under one process.
 */
export type Fake = {
  name: string;
  start: () => Promise<{ url: string; stop: () => Promise<void> }>;
};

export const fakes: Fake[] = [];
