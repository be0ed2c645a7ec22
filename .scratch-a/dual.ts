import { loadLpSolver } from '../io/load-lp-solver.ts';
import { readOrLibrary } from '../bench/stock-planner.ts';
const lp = await loadLpSolver();
for (const name of process.argv.slice(2)) {
  const b = readOrLibrary(name.startsWith('u120') ? 'orlib-binpack1.txt' : 'orlib-binpack2.txt').find((x) => x.name === name)!;
  const sizes = [...new Set(b.sizes)].sort((x, y) => y - x);
  const d = sizes.map((s) => b.sizes.filter((x) => x === s).length);
  const C = b.capacity;
  // Plain Gilmore-Gomory LP, unbounded knapsack pricing, written as LP text each round (independent of the planner code).
  let pats: number[][] = sizes.map((s, i) => sizes.map((_, j) => (j === i ? Math.floor(C / s) : 0)));
  let pi: number[] = [], z = 0;
  for (let it = 0; it < 5000; it++) {
    const text = `Minimize\n obj: ${pats.map((_, j) => `x${j}`).join(' + ')}\nSubject To\n${sizes.map((_, i) => ` d${i}: ${pats.map((p, j) => (p[i] ? `${p[i]} x${j}` : '')).filter(Boolean).join(' + ')} >= ${d[i]}`).join('\n')}\nEnd`;
    const r = lp.solve(text, { output_flag: false } as any) as any;
    z = r.ObjectiveValue; pi = sizes.map((_, i) => r.Rows[i].Dual);
    // unbounded knapsack
    const best = new Float64Array(C + 1), arg = new Int32Array(C + 1).fill(-1);
    for (let c = 1; c <= C; c++) { best[c] = best[c - 1]; arg[c] = -1; sizes.forEach((s, i) => { if (s <= c && best[c - s] + pi[i] > best[c] + 1e-12) { best[c] = best[c - s] + pi[i]; arg[c] = i; } }); }
    if (best[C] <= 1 + 1e-9) { 
      // certificate: sum pi d / max pattern value
      const cert = pi.reduce((s, p, i) => s + p * d[i], 0) / Math.max(1, best[C]);
      console.log(name, 'sum/C', (b.sizes.reduce((a, x) => a + x, 0) / C).toFixed(4), 'LP (unbounded knapsack)', z.toFixed(6), 'dual certificate', cert.toFixed(6), 'iterations', it);
      break;
    }
    const p = sizes.map(() => 0); let c = C; while (c > 0) { if (arg[c] < 0) { c--; continue; } p[arg[c]]++; c -= sizes[arg[c]]; }
    pats.push(p);
  }
}
