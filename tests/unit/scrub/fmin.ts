/**
 * Loads the general-purpose `fmin` optimiser (npm, BSD-3). Its 0.0.4 package declares
 * "type": "module" but ships a UMD bundle as `main`, so neither `import` nor `require` exposes
 * its functions; evaluating the bundle with CommonJS-style `exports` does. Its Nelder–Mead
 * shrink step also assigns an undeclared `i` under "use strict" (ReferenceError); declaring
 * `i` in the enclosing scope lets that step run unchanged.
 */
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";

interface Fmin {
  bisect(
    f: (x: number) => number,
    a: number,
    b: number,
    parameters?: { maxIterations?: number; tolerance?: number },
  ): number;
  nelderMead(
    f: (x: number[]) => number,
    x0: number[],
    parameters?: { maxIterations?: number; minErrorDelta?: number; zeroDelta?: number },
  ): { x: number[]; fx: number };
}

const bundle = readFileSync(createRequire(import.meta.url).resolve("fmin"), "utf8");
const exportsObject: Record<string, unknown> = {};
new Function("exports", "module", `let i;\n${bundle}`)(exportsObject, { exports: exportsObject });

export const fmin = exportsObject as unknown as Fmin;
