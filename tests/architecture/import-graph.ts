// The project's import graph, read from the source with TypeScript's own
// pre-processor (every import, export-from and dynamic import, type-only
// ones included), for the layer and circle tests.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import ts from 'typescript';

export const REPO = resolve(import.meta.dirname, '../..');

export interface SourceFile {
  /** Path from the repository root, with forward slashes. */
  path: string;
  text: string;
  /** Files of the project this one imports (repository paths). */
  imports: string[];
  /** Bare specifiers: packages and node built-ins. */
  packages: string[];
}

function walk(dir: string, out: string[]): string[] {
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, out);
    else if (/\.(ts|mts)$/.test(name) && !name.endsWith('.d.ts')) out.push(p);
  }
  return out;
}

export function readGraph(roots: readonly string[]): Map<string, SourceFile> {
  const files = roots.flatMap((r) => walk(join(REPO, r), []));
  const graph = new Map<string, SourceFile>();
  for (const abs of files) {
    const text = readFileSync(abs, 'utf8');
    const info = ts.preProcessFile(text, true, true);
    const imports: string[] = [];
    const packages: string[] = [];
    for (const ref of info.importedFiles) {
      if (ref.fileName.startsWith('.')) imports.push(relative(REPO, resolve(dirname(abs), ref.fileName)).split('\\').join('/'));
      else packages.push(ref.fileName);
    }
    graph.set(relative(REPO, abs).split('\\').join('/'), { path: relative(REPO, abs), text, imports, packages });
  }
  return graph;
}

/** Every strongly connected set of two or more files, and files importing themselves (Tarjan). */
export function circles(graph: Map<string, SourceFile>): string[][] {
  let index = 0;
  const idx = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const on = new Set<string>();
  const found: string[][] = [];
  const visit = (v: string): void => {
    idx.set(v, index);
    low.set(v, index++);
    stack.push(v);
    on.add(v);
    for (const w of graph.get(v)?.imports ?? []) {
      if (!graph.has(w)) continue;
      if (!idx.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (on.has(w)) low.set(v, Math.min(low.get(v)!, idx.get(w)!));
    }
    if (low.get(v) === idx.get(v)) {
      const set: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        on.delete(w);
        set.push(w);
      } while (w !== v);
      if (set.length > 1 || graph.get(v)!.imports.includes(v)) found.push(set.sort());
    }
  };
  for (const v of graph.keys()) if (!idx.has(v)) visit(v);
  return found;
}
