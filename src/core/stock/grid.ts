// The solvers work on whole numbers: lengths are scaled to a grid of 1, 0.1,
// 0.01 or 0.001 mm, the finest that keeps the longest stock within a size the
// knapsack and the arc-flow graph can afford.

/** Largest stock length, in grid steps, that the solvers are given. */
export const GRID_MAX = 100_000;

export interface Grid {
  /** Grid steps per mm. */
  scale: number;
  /** True when every length and the kerf fall exactly on the grid. */
  exact: boolean;
}

export function chooseGrid(lengths_mm: number[], kerf_mm: number): Grid {
  const all = [...lengths_mm, kerf_mm];
  const longest = Math.max(...lengths_mm) + kerf_mm;
  let best: Grid = { scale: 1, exact: all.every((v) => onGrid(v, 1)) };
  for (const scale of [1, 10, 100, 1000]) {
    if (longest * scale > GRID_MAX && scale > 1) break;
    best = { scale, exact: all.every((v) => onGrid(v, scale)) };
    if (best.exact) break;
  }
  return best;
}

function onGrid(v: number, scale: number): boolean {
  const x = v * scale;
  return Math.abs(x - Math.round(x)) < 1e-6;
}

// Rounding off the grid always errs safe: pieces round up, stock rounds
// down, so whatever fits on the grid fits in the wood.
export const pieceSteps = (length_mm: number, kerf_mm: number, g: Grid): number => Math.ceil((length_mm + kerf_mm) * g.scale - 1e-6);
export const stockSteps = (length_mm: number, kerf_mm: number, g: Grid): number => Math.floor((length_mm + kerf_mm) * g.scale + 1e-6);
