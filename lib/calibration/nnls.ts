import { Matrix, solve } from "ml-matrix";

/**
 * Non-negative least squares, min ‖Ax − b‖ subject to x ≥ 0, by the active-set method of
 * Lawson & Hanson ("Solving Least Squares Problems", 1974, ch. 23). The unconstrained
 * sub-problems are solved by ml-matrix's least-squares `solve`.
 */
export function nnls(a: Matrix, b: number[], maxIterations = 3 * a.columns + 10): number[] {
  const n = a.columns;
  const bv = Matrix.columnVector(b);
  const x = new Array<number>(n).fill(0);
  const passive = new Array<boolean>(n).fill(false);
  const tolerance = 1e-12 * Math.max(1, a.norm("frobenius") * bv.norm("frobenius"));

  const gradient = () => {
    const r = bv.clone().sub(a.mmul(Matrix.columnVector(x)));
    return a.transpose().mmul(r).to1DArray();
  };
  const solvePassive = (): number[] => {
    const cols = passive.flatMap((p, j) => (p ? [j] : []));
    const z = new Array<number>(n).fill(0);
    if (cols.length === 0) return z;
    const sub = a.subMatrixColumn(cols);
    const s = solve(sub, bv, sub.rows < sub.columns).to1DArray();
    cols.forEach((j, k) => (z[j] = s[k] ?? 0));
    return z;
  };

  for (let iter = 0; iter < maxIterations; iter++) {
    const w = gradient();
    let best = -1;
    for (let j = 0; j < n; j++) {
      if (!passive[j] && w[j]! > tolerance && (best < 0 || w[j]! > w[best]!)) best = j;
    }
    if (best < 0) break;
    passive[best] = true;
    for (;;) {
      const z = solvePassive();
      if (passive.every((p, j) => !p || z[j]! > 0)) {
        z.forEach((v, j) => (x[j] = v));
        break;
      }
      // Step back along x→z until the first passive variable reaches zero, then drop it.
      let alpha = Infinity;
      for (let j = 0; j < n; j++) {
        if (passive[j] && z[j]! <= 0) alpha = Math.min(alpha, x[j]! / (x[j]! - z[j]!));
      }
      for (let j = 0; j < n; j++) {
        x[j] = x[j]! + alpha * (z[j]! - x[j]!);
        if (passive[j] && Math.abs(x[j]!) <= 1e-15) passive[j] = false;
      }
    }
  }
  return x.map((v) => Math.max(0, v));
}
