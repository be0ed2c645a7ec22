import { describe, expect, it } from 'vitest';
import { gmres, type LinearMap } from '../../src/core/model/cable-net/gmres.ts';
import { factorDense } from '../../src/core/model/floor-frame/dense-lu.ts';

// GMRES (Saad & Schultz, SIAM J. Sci. Stat. Comput. 7 (1986) 856-869) against
// the direct solve and against the method's own properties from that paper:
// the residual is the least over the Krylov space, so it never rises from
// one step to the next; it is exact within n steps; and for A = I + (rank r)
// within r + 1 steps (the Krylov space of such a matrix has dimension at most
// r + 1). Every answer is also checked by its residual b − A·x, computed here.

/** A nonsymmetric, diagonally weighted test matrix (row-major), entries from a fixed formula. */
function matrix(n: number): Float64Array {
  const A = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) A[i * n + j] = (i === j ? 4 + (i % 3) : 0) + Math.sin(3 * i + 7 * j + 1) * (j > i ? 0.9 : 0.4);
  return A;
}

const product = (A: Float64Array, n: number): LinearMap => (v, out) => {
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) out[i] += A[i * n + j] * v[j];
};

function residualNorm(A: Float64Array, n: number, x: ArrayLike<number>, b: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < n; i++) {
    let r = b[i];
    for (let j = 0; j < n; j++) r -= A[i * n + j] * x[j];
    s += r * r;
  }
  return Math.sqrt(s);
}

const norm = (v: ArrayLike<number>) => Math.sqrt(Array.from(v).reduce((s, x) => s + x * x, 0));

describe('GMRES', () => {
  const n = 30;
  const A = matrix(n);
  const b = Float64Array.from({ length: n }, (_, i) => Math.cos(0.7 * i) + 0.1 * i);

  it('agrees with the LU solve, and its residual is what it reports', () => {
    const g = gmres(n, product(A, n), b, { relativeTolerance: 1e-12, maxIterations: n });
    expect(g.converged).toBe(true);
    expect(g.iterations).toBeLessThanOrEqual(n);
    const x = factorDense(A, n)!.solve(b);
    g.x.forEach((v, i) => expect(v).toBeCloseTo(x[i], 9));
    expect(residualNorm(A, n, g.x, b) / norm(b)).toBeLessThan(1e-11);
    expect(residualNorm(A, n, g.x, b) / norm(b)).toBeCloseTo(g.relativeResidual, 11);
  });

  it('the residual never rises with more steps, and the step limit is reported as not converged', () => {
    let last = Infinity;
    for (let k = 1; k <= 8; k++) {
      const g = gmres(n, product(A, n), b, { relativeTolerance: 1e-14, maxIterations: k });
      expect(g.iterations).toBe(k);
      expect(g.converged).toBe(false);
      const r = residualNorm(A, n, g.x, b) / norm(b);
      expect(r).toBeCloseTo(g.relativeResidual, 12);
      expect(r).toBeLessThanOrEqual(last * (1 + 1e-12));
      last = r;
    }
  });

  it('I + a rank-2 matrix: exact within 3 steps', () => {
    const B = new Float64Array(n * n);
    for (let i = 0; i < n; i++) {
      B[i * n + i] = 1;
      for (let j = 0; j < n; j++) B[i * n + j] += Math.sin(i + 1) * Math.cos(2 * j) + 0.5 * (i % 4) * Math.sin(j * j);
    }
    const g = gmres(n, product(B, n), b, { relativeTolerance: 1e-12, maxIterations: n });
    expect(g.converged).toBe(true);
    expect(g.iterations).toBeLessThanOrEqual(3);
    expect(residualNorm(B, n, g.x, b) / norm(b)).toBeLessThan(1e-11);
  });

  it('preconditioned on the right with A itself: one step; with a nearby matrix: few', () => {
    const exact = factorDense(A, n)!;
    const g = gmres(n, product(A, n), b, { relativeTolerance: 1e-12, maxIterations: n }, (v, out) => out.set(exact.solve(v)));
    expect(g.iterations).toBe(1);
    expect(residualNorm(A, n, g.x, b) / norm(b)).toBeLessThan(1e-11);
    // M = A with its off-diagonal part scaled by 0.9: the preconditioned matrix is I plus a small part.
    const near = A.map((v, k) => (k % (n + 1) === 0 ? v : 0.9 * v));
    const M = factorDense(near, n)!;
    const plain = gmres(n, product(A, n), b, { relativeTolerance: 1e-10, maxIterations: n });
    const pre = gmres(n, product(A, n), b, { relativeTolerance: 1e-10, maxIterations: n }, (v, out) => out.set(M.solve(v)));
    expect(pre.converged).toBe(true);
    expect(pre.iterations).toBeLessThan(plain.iterations);
    expect(residualNorm(A, n, pre.x, b) / norm(b)).toBeLessThan(1e-9);
  });

  it('b = 0: x = 0 at once', () => {
    const g = gmres(n, product(A, n), new Float64Array(n), { relativeTolerance: 1e-10, maxIterations: n });
    expect(g).toMatchObject({ converged: true, iterations: 0, relativeResidual: 0 });
    expect(norm(g.x)).toBe(0);
  });
});

describe('dense LU: factor once, solve many', () => {
  it('each right-hand side solved, rows swapped where a pivot is zero; a singular matrix refused', () => {
    // A zero first pivot forces a row swap.
    const A = Float64Array.from([0, 2, 1, 3, 1, -1, 1, 4, 2]);
    const lu = factorDense(A, 3)!;
    for (const b of [[1, 2, 3], [0, -1, 5], [7, 0, 0]]) expect(residualNorm(A, 3, lu.solve(b), b)).toBeLessThan(1e-13);
    // Hand solution of A x = (3, 3, 7): x = (1, 1, 1).
    lu.solve([3, 3, 7]).forEach((v) => expect(v).toBeCloseTo(1, 13));
    expect(factorDense([1, 2, 2, 4], 2)).toBeNull();
  });
});
