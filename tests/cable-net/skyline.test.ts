import { describe, expect, it } from 'vitest';
import { SkylineCholesky } from '../../src/core/model/cable-net/skyline.ts';

// The skyline Cholesky against a plain dense Gaussian elimination with partial
// pivoting (written here, independent of the code under test).

function denseSolve(A: number[][], b: number[]): number[] {
  const n = b.length;
  const M = A.map((row, i) => [...row, b[i]]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(M[r][c]) > Math.abs(M[p][c])) p = r;
    [M[c], M[p]] = [M[p], M[c]];
    for (let r = c + 1; r < n; r++) {
      const f = M[r][c] / M[c][c];
      for (let k = c; k <= n; k++) M[r][k] -= f * M[c][k];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = M[r][n];
    for (let k = r + 1; k < n; k++) s -= M[r][k] * x[k];
    x[r] = s / M[r][r];
  }
  return x;
}

/** A deterministic pseudo-random stream (a linear congruential generator). */
function stream(seed: number): () => number {
  let s = seed;
  return () => ((s = (s * 1664525 + 1013904223) % 2 ** 32) / 2 ** 32);
}

/** A sparse symmetric positive-definite matrix: a weighted graph Laplacian plus a positive diagonal. */
function sparseSpd(n: number, edges: number, rnd: () => number): { A: number[][]; pairs: [number, number][] } {
  const A = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  const pairs: [number, number][] = [];
  for (let e = 0; e < edges; e++) {
    const i = Math.floor(rnd() * n);
    const j = Math.floor(rnd() * n);
    if (i === j) continue;
    const w = 0.1 + 10 * rnd();
    A[i][i] += w;
    A[j][j] += w;
    A[i][j] -= w;
    A[j][i] -= w;
    pairs.push([i, j]);
  }
  for (let i = 0; i < n; i++) A[i][i] += 0.01 + rnd();
  return { A, pairs };
}

function skylineOf(A: number[][], pairs: [number, number][], order?: Int32Array): SkylineCholesky {
  const K = new SkylineCholesky(A.length, pairs, order);
  for (let i = 0; i < A.length; i++) K.add(i, i, A[i][i]);
  const seen = new Set<string>();
  for (const [i, j] of pairs) {
    const key = `${Math.min(i, j)},${Math.max(i, j)}`;
    if (seen.has(key)) continue;
    seen.add(key);
    K.add(i, j, A[i][j]);
  }
  return K;
}

describe('skyline Cholesky', () => {
  it('solves sparse SPD systems as a dense elimination does, in any numbering', () => {
    const rnd = stream(12345);
    for (const n of [1, 2, 7, 40, 120]) {
      const { A, pairs } = sparseSpd(n, 3 * n, rnd);
      const b = Array.from({ length: n }, () => rnd() * 2 - 1);
      const expected = denseSolve(A, b);
      const shuffled = Int32Array.from({ length: n }, (_, i) => i);
      for (let i = n - 1; i > 0; i--) {
        const j = Math.floor(rnd() * (i + 1));
        [shuffled[i], shuffled[j]] = [shuffled[j], shuffled[i]];
      }
      for (const order of [undefined, shuffled]) {
        const K = skylineOf(A, pairs, order);
        expect(K.factor()).toBe(true);
        const x = K.solve(b);
        const scale = Math.max(...expected.map(Math.abs));
        for (let i = 0; i < n; i++) expect(Math.abs(x[i] - expected[i])).toBeLessThan(1e-10 * scale);
      }
    }
  });

  it('stores only the envelope of a banded matrix', () => {
    // Tridiagonal: each row holds its diagonal and one entry to the left.
    const n = 50;
    const pairs = Array.from({ length: n - 1 }, (_, i) => [i, i + 1] as [number, number]);
    expect(new SkylineCholesky(n, pairs).size).toBe(2 * n - 1);
  });

  it('reports a matrix that is not positive definite', () => {
    const K = new SkylineCholesky(2, [[0, 1]]);
    K.add(0, 0, 1);
    K.add(1, 1, 1);
    K.add(0, 1, 2); // [[1, 2], [2, 1]] has eigenvalues 3 and -1
    expect(K.factor()).toBe(false);
  });

  it('refuses an entry outside the declared pattern', () => {
    const K = new SkylineCholesky(3, [[0, 1]]);
    expect(() => K.add(0, 2, 1)).toThrow(/outside the declared pattern/);
  });
});
