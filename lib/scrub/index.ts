/**
 * The scrub and wear engine's one public entry. Pure computation: no I/O, no React, no database.
 * Conventions and formulas: docs/engine.md.
 */
export { ENGINE_VERSION } from "./version";
export * from "./schemas";
export { estimate } from "./estimate";
export * from "./segment-turns";
