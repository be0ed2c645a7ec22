import { builtinModules } from 'node:module';
import { describe, expect, it } from 'vitest';
import { circles, readGraph } from './import-graph.ts';

// The layers and what each may import (its own and those listed).
// core: spec, units, models, rules, findings, the pipeline (pure);
// render: the report model and its renderers (pure, strings or bytes out);
// node: files, solvers, workers; cli: arguments and exit codes;
// web: the workbench page and its worker (the browser's side of node).
const LAYERS = ['src/core/', 'src/render/', 'src/node/', 'cli/', 'src/web/'] as const;
const MAY_IMPORT: Record<(typeof LAYERS)[number], readonly string[]> = {
  'src/core/': ['src/core/'],
  'src/render/': ['src/core/', 'src/render/'],
  'src/node/': ['src/core/', 'src/render/', 'src/node/'],
  'cli/': ['src/core/', 'src/render/', 'src/node/', 'cli/'],
  'src/web/': ['src/core/', 'src/render/', 'src/web/'],
};
const PURE = new Set(['src/core/', 'src/render/']);
const BUILTINS = new Set([...builtinModules, ...builtinModules.map((m) => `node:${m}`)]);
// What a pure layer must not touch even without an import: the process, the clock, chance, Node's Buffer (the browser has none).
const IMPURE = [/\bprocess\./, /\bDate\.now\b/, /\bnew Date\(\s*\)/, /\bMath\.random\b/, /\bperformance\.now\b/, /\brequire\(/, /\bBuffer\./];

const graph = readGraph(['src', 'cli']);
const layerOf = (p: string) => LAYERS.findIndex((l) => p.startsWith(l));

describe('layers', () => {
  it('every source file sits in a layer', () => {
    expect([...graph.keys()].filter((p) => layerOf(p) < 0)).toEqual([]);
  });

  it('no file imports a layer it may not (a higher one, or node from the web page)', () => {
    const upward: string[] = [];
    for (const [p, f] of graph) {
      for (const i of f.imports) if (layerOf(i) >= 0 && !MAY_IMPORT[LAYERS[layerOf(p)]].includes(LAYERS[layerOf(i)])) upward.push(`${p} -> ${i}`);
    }
    expect(upward).toEqual([]);
  });

  it('the web page imports no node built-ins (it runs in a browser)', () => {
    const bad = [...graph].filter(([p]) => p.startsWith('src/web/')).flatMap(([p, f]) => f.packages.filter((pkg) => BUILTINS.has(pkg)).map((pkg) => `${p} imports ${pkg}`));
    expect(bad).toEqual([]);
  });

  it('core and render import no node built-ins and touch no process, clock or randomness', () => {
    const bad: string[] = [];
    for (const [p, f] of graph) {
      if (!PURE.has(LAYERS[layerOf(p)])) continue;
      for (const pkg of f.packages) if (BUILTINS.has(pkg)) bad.push(`${p} imports ${pkg}`);
      const code = f.text.replace(/\/\/.*$/gm, '').replace(/\/\*[\s\S]*?\*\//g, '');
      for (const re of IMPURE) if (re.test(code)) bad.push(`${p} uses ${re.source}`);
    }
    expect(bad).toEqual([]);
  });

  it('there is no import circle, type-only imports included', () => {
    expect(circles(readGraph(['src', 'cli', 'scripts', 'bench']))).toEqual([]);
  });

  it('the circle finder finds a circle (a test of the test)', () => {
    const g = new Map([
      ['a.ts', { path: 'a.ts', text: '', imports: ['b.ts'], packages: [] }],
      ['b.ts', { path: 'b.ts', text: '', imports: ['c.ts'], packages: [] }],
      ['c.ts', { path: 'c.ts', text: '', imports: ['a.ts'], packages: [] }],
      ['d.ts', { path: 'd.ts', text: '', imports: ['a.ts'], packages: [] }],
    ]);
    expect(circles(g)).toEqual([['a.ts', 'b.ts', 'c.ts']]);
  });
});
