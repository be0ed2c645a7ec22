// The strap-floor solver on a demo specification: the five floor states a
// check solves (standing, rough ground, the stone, and the fundamental
// combination standing and over rough ground), each alone and all five in one
// go (floorModels), and the standing state at a 30 mm strap pitch (target:
// under 5 ms). Times are the process's CPU time (user + system), median of
// RUNS, so a machine shared with other work reads about the same.
// The in-run reference: a plain dense Cholesky factor and solve of the same
// net tangent matrix (the 30 mm net at its solved standing state) beside the
// skyline factor and solve the solver uses; the dense factor is what the
// solve would cost without its sparsity, and does not depend on how the net
// happens to number its nodes.
import type { RulesData } from '../src/core/data/rules-data.ts';
import { floorModel, floorModels, type CaseFactor } from '../src/core/model/cable-net/floor-model.ts';
import { floorNet } from '../src/core/model/cable-net/floor-net.ts';
import { crewLoads, floorSolveSettings, nodalLoads } from '../src/core/model/cable-net/floor-model.ts';
import { solveNet, tangentMatrix } from '../src/core/model/cable-net/solve-net.ts';
import { segmentState, tangentStiffness } from '../src/core/model/cable-net/segment.ts';
import { ModelGraph } from '../src/core/pipeline/model-graph.ts';
import { MODELS } from '../src/core/pipeline/models.ts';
import type { CheckedSpecification } from '../src/core/spec/spec.types.ts';
import { G } from '../src/core/units/units.ts';
import { denseCholesky, denseCholeskySolve } from './dense-cholesky.ts';

export const PITCH_MM = 30;
export const PITCH_TARGET_MS = 5;
const RUNS = 11;
const STATES = ['floorStatic', 'floorBump', 'floorStone', 'floorDesign', 'floorDesignRough'] as const;

/** Median CPU time of `RUNS` calls, ms, and the last call's value. */
function timed<T>(f: () => T): { ms: number; value: T } {
  let value = f();
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = process.cpuUsage();
    value = f();
    const d = process.cpuUsage(t0);
    times.push((d.user + d.system) / 1000);
  }
  times.sort((a, b) => a - b);
  return { ms: times[Math.floor(RUNS / 2)], value };
}

/** The dense and skyline factor-and-solve of the net tangent at the standing state's sags, ms each. */
function factorTimes(spec: CheckedSpecification, data: RulesData): { n: number; envelope: number; dense: number; skyline: number } {
  const floor = floorNet(spec, data);
  const { net } = floor;
  const n = net.nodes.length;
  const loads = nodalLoads(floor, crewLoads(spec, floor, 1));
  const sag = solveNet(net, loads, floorSolveSettings(data, spec.crew.reduce((s, c) => s + c.mass_kg * G, 0))).sag;
  const K = tangentMatrix(net, undefined, sag);
  const dense = new Float64Array(n * n);
  const at = (i: number) => (i < 0 ? 0 : sag[i]);
  for (const seg of net.segments) {
    const k = tangentStiffness(seg, segmentState(seg, at(seg.a), at(seg.b)));
    for (const [i, j, v] of [[seg.a, seg.a, k], [seg.b, seg.b, k], [seg.a, seg.b, -k], [seg.b, seg.a, -k]]) if (i >= 0 && j >= 0) dense[i * n + j] += v;
  }
  const d = timed(() => {
    const a = Float64Array.from(dense);
    if (!denseCholesky(a, n)) throw new Error('the dense reference is not positive definite');
    denseCholeskySolve(a, n, Float64Array.from(loads));
  });
  const s = timed(() => {
    const M = tangentMatrix(net, K, sag);
    if (!M.factor()) throw new Error('the skyline factor is not positive definite');
    return M.solve(loads);
  });
  return { n, envelope: K.size, dense: d.ms, skyline: s.ms };
}

/** Prints the floor's lines for one specification; returns how many targets it missed. */
export function benchFloor(name: string, spec: CheckedSpecification, data: RulesData): number {
  const graph = new ModelGraph(MODELS, { spec, data, ride: false });
  const factors: CaseFactor[] = STATES.map((id) => ({ value: graph.get(id).factor, source: graph.get(id).factorSource }));
  let missed = 0;
  const alone = STATES.map((id, i) => {
    const t = timed(() => floorModel(spec, data, factors[i]));
    if (!t.value.converged) missed++;
    return `${id} ×${t.value.factor.toFixed(2)} ${t.ms.toFixed(1)} ms (${t.value.iterations} steps${t.value.converged ? '' : ', NOT CONVERGED'})`;
  });
  const together = timed(() => floorModels(spec, data, factors));
  const first = together.value[0];
  console.log(`  floor ${name.padEnd(22)} ${first.nodes} nodes, ${first.segments} segments; each state alone: ${alone.join(', ')}`);
  console.log(`  floor ${''.padEnd(22)} the five together (floorModels): ${together.ms.toFixed(1)} ms, ${(together.ms / STATES.length).toFixed(1)} ms a state, steps ${together.value.map((m) => m.iterations).join('/')}`);
  const fine = structuredClone(spec);
  fine.floor_straps.pitch_mm = PITCH_MM;
  const pitch = timed(() => floorModel(fine, data, factors[0]));
  const ok = pitch.ms < PITCH_TARGET_MS && pitch.value.converged;
  if (!ok) missed++;
  const f = factorTimes(fine, data);
  console.log(
    `  floor ${''.padEnd(22)} ${PITCH_MM} mm pitch standing: ${pitch.ms.toFixed(1)} ms, ${pitch.value.nodes} nodes, ${pitch.value.iterations} steps${pitch.value.converged ? '' : ', NOT CONVERGED'}  target < ${PITCH_TARGET_MS} ms  ${ok ? 'met' : 'MISSED'}; ` +
      `net tangent factor+solve ${f.n} × ${f.n}: skyline ${f.skyline.toFixed(3)} ms (envelope ${f.envelope}) vs dense Cholesky ${f.dense.toFixed(2)} ms in this run, ${(f.dense / f.skyline).toFixed(0)}× faster; the state costs ${(pitch.ms / f.dense).toFixed(1)} dense factors`,
  );
  return missed;
}
