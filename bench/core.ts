// The check's core in one process, without the decisive-input search: the
// whole check (statics, the ride cases, the floor-damping tuner where it runs,
// the stock plan) and the statics alone (the ride model off, as a sweep of
// statics-only variants runs it), per specification: median of many runs
// after warm-up, against the targets, and as a multiple of the yardstick.
// Each timed check starts with nothing kept from the one before. Targets:
// the demos' whole check under 30 ms, statics under 2 ms. Beside the statics,
// for the demos: the strap floor alone as the statics check computes it (its
// net, frame and pretension, the standing floor and the four loaded states:
// the models floorSetup, floorStatic and floorLoaded of a fresh model graph),
// its share of the statics and how many times the statics target it takes
// on its own.
import { readFileSync, readdirSync } from 'node:fs';
import { parse } from 'yaml';
import type { RulesData } from '../src/core/data/rules-data.ts';
import { ModelGraph } from '../src/core/pipeline/model-graph.ts';
import { MODELS } from '../src/core/pipeline/models.ts';
import { forgetKeptValues } from '../src/core/pipeline/kept-values.ts';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import type { LpSolver } from '../src/core/stock/cutting-types.ts';
import { medianMs, verdict } from './median.ts';

export const CORE_TARGET_MS = 30;
export const STATICS_TARGET_MS = 2;

const SPECS = new URL('../specs/', import.meta.url);

/** Every spec the bench times: the demos first (the targets apply to them), then the validation set. */
export function benchSpecs(): { file: string; demo: boolean; raw: unknown }[] {
  const list = (dir: URL, demo: boolean) =>
    readdirSync(dir)
      .filter((f) => f.endsWith('.yaml'))
      .map((f) => ({ file: `${demo ? '' : 'validation/'}${f}`, demo, raw: parse(readFileSync(new URL(f, dir), 'utf8')) as unknown }));
  return [...list(SPECS, true), ...list(new URL('validation/', SPECS), false)];
}

export function benchCore(data: RulesData, lp: LpSolver, yardstick: number): number {
  console.log(`check core, in-process, no decisive-input search (median; yardstick ${yardstick.toFixed(1)} ms):`);
  let missed = 0;
  for (const { file, demo, raw } of benchSpecs()) {
    const p = prepareSpec(raw, data);
    if (!p.ok) throw new Error(`${file} does not validate`);
    const runs = demo ? 50 : 11;
    // Each timed check starts with nothing kept from the one before (a user's single check has none of it).
    const full = medianMs(() => (forgetKeptValues(), runCheck(p.spec, p.entries, data, { lp })), runs);
    const statics = medianMs(() => (forgetKeptValues(), runCheck(p.spec, p.entries, data, { lp, ride: false })), runs);
    const line = `  ${file.padEnd(38)} whole ${full.toFixed(1).padStart(6)} ms (${(full / yardstick).toFixed(2)} yardsticks)  statics ${statics.toFixed(2).padStart(6)} ms (${(statics / yardstick).toFixed(3)})  of ${runs}`;
    if (!demo) {
      console.log(line);
      continue;
    }
    const okFull = full < CORE_TARGET_MS, okStatics = statics < STATICS_TARGET_MS;
    missed += (okFull ? 0 : 1) + (okStatics ? 0 : 1);
    console.log(`${line}  targets < ${CORE_TARGET_MS} ms ${verdict(okFull)}, < ${STATICS_TARGET_MS} ms ${verdict(okStatics)}`);
    const floor = medianMs(() => new ModelGraph(MODELS, { spec: p.spec, data, lp, ride: false }).get('floorLoaded'), runs);
    console.log(`  ${''.padEnd(38)} of the statics, the strap floor alone (net, frame, pretension, standing and four loaded states) ${floor.toFixed(1)} ms: ${((100 * floor) / statics).toFixed(0)} %, ${(floor / STATICS_TARGET_MS).toFixed(0)} times the statics target`);
  }
  return missed;
}
