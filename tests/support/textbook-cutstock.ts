// The textbook cutting-stock example: Gilmore & Gomory, Operations Research 9
// (1961), as the standard example in the GAMS model library (CUTSTOCK), named
// in ../shared/design/reference-figures.md "Cutting stock": roll width 100;
// pieces 45, 36, 31, 14 with demands 97, 610, 395, 211; LP bound 452.25
// rolls, integer optimum 453.
import type { CuttingInstance } from '../../src/core/stock/cutting-types.ts';

export const CUTSTOCK: CuttingInstance = {
  kerf_mm: 0,
  stock: [{ length_mm: 100 }],
  pieces: [
    { length_mm: 45, quantity: 97 },
    { length_mm: 36, quantity: 610 },
    { length_mm: 31, quantity: 395 },
    { length_mm: 14, quantity: 211 },
  ],
};
export const LP_BOUND = 452.25; // GAMS CUTSTOCK (Gilmore & Gomory 1961)
export const OPTIMUM = 453; // GAMS CUTSTOCK (Gilmore & Gomory 1961)
