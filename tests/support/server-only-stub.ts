// vitest stand-in for the "server-only" marker package, which throws outside a React server bundle.
export {};
