// Reads the editable rules data (materials, grounds, limits) from YAML files
// under rules/, checks it against the schema and hands the core one object.
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { LineCounter, isMap, isScalar, isSeq, parseDocument, type Document } from 'yaml';
import type { RulesData } from '../core/data/rules-data.ts';
import { RulesDataError, type RulesDataProblem } from '../core/data/rules-data-error.ts';
import { schemaProblems } from '../core/data/validate-rules-data.ts';

/** The repository's own rules/ directory. */
export function defaultRulesDir(): string {
  return fileURLToPath(new URL('../../rules', import.meta.url));
}

interface YamlFile {
  file: string;
  doc: Document;
  lines: LineCounter;
}

/** Files that hold one top-level table each, by the RulesData key they fill. */
const TABLE_FILES = {
  species: ['materials', 'species.yaml'],
  leathers: ['materials', 'leathers.yaml'],
  grounds: ['grounds.yaml'],
} as const;
type TableKey = keyof typeof TABLE_FILES;

export function loadRulesData(dir: string): RulesData {
  const problems: RulesDataProblem[] = [];
  const tables = {} as Record<TableKey, YamlFile | null>;
  for (const key of Object.keys(TABLE_FILES) as TableKey[]) {
    tables[key] = readYaml(join(dir, ...TABLE_FILES[key]), problems);
  }
  const limitFiles = listLimitFiles(join(dir, 'limits')).map((f) => readYaml(f, problems));
  if (problems.length > 0) throw new RulesDataError(problems);

  // Which limits file each rule id came from, so a fault can be traced back.
  const limitOrigin = new Map<string, YamlFile>();
  const limits: Record<string, unknown> = {};
  for (const lf of limitFiles) {
    if (lf === null) continue;
    const contents = lf.doc.contents;
    if (contents === null) continue; // a file of comments only adds nothing
    if (!isMap(contents)) {
      problems.push(at(lf, [], 'must be a mapping of rule id to limits'));
      continue;
    }
    for (const [ruleId, ruleLimits] of Object.entries(lf.doc.toJS() as Record<string, unknown>)) {
      const earlier = limitOrigin.get(ruleId);
      if (earlier !== undefined) {
        problems.push(at(lf, [ruleId], `rule id is already given in ${earlier.file}: give each rule's limits in one file`));
        continue;
      }
      limitOrigin.set(ruleId, lf);
      limits[ruleId] = ruleLimits;
    }
  }
  if (problems.length > 0) throw new RulesDataError(problems);

  const data = {
    species: tables.species?.doc.toJS() ?? null,
    leathers: tables.leathers?.doc.toJS() ?? null,
    grounds: tables.grounds?.doc.toJS() ?? null,
    limits,
  };
  for (const sp of schemaProblems(data)) {
    const [top, ...inner] = sp.path;
    const origin = top === 'limits' ? limitOrigin.get(inner[0] ?? '') : tables[top as TableKey];
    if (origin === undefined || origin === null) {
      problems.push({ file: dir, line: null, keyPath: sp.path.join('.'), message: sp.message });
    } else {
      problems.push(at(origin, inner, sp.message));
    }
  }
  if (problems.length > 0) throw new RulesDataError(inFileOrder(problems));
  return data as RulesData;
}

/** Problems grouped by file, in the order a reader meets them. */
function inFileOrder(problems: RulesDataProblem[]): RulesDataProblem[] {
  const fileRank = new Map<string, number>();
  for (const p of problems) if (!fileRank.has(p.file)) fileRank.set(p.file, fileRank.size);
  return [...problems].sort(
    (a, b) => fileRank.get(a.file)! - fileRank.get(b.file)! || (a.line ?? 0) - (b.line ?? 0),
  );
}

function listLimitFiles(limitsDir: string): string[] {
  if (!existsSync(limitsDir) || !statSync(limitsDir).isDirectory()) return [];
  return readdirSync(limitsDir)
    .filter((name) => name.endsWith('.yaml'))
    .sort()
    .map((name) => join(limitsDir, name));
}

/** Parses one file; records any read or syntax fault and returns null for it. */
function readYaml(file: string, problems: RulesDataProblem[]): YamlFile | null {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (err) {
    const why = (err as NodeJS.ErrnoException).code === 'ENOENT' ? 'file not found' : String(err);
    problems.push({ file, line: null, keyPath: '', message: `${why}: the rules data needs this file` });
    return null;
  }
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines, prettyErrors: true, uniqueKeys: true });
  if (doc.errors.length > 0) {
    for (const e of doc.errors) {
      problems.push({
        file,
        line: e.linePos?.[0].line ?? null,
        keyPath: '',
        // the line is given apart, so drop the position the parser appends
        message: `not valid YAML: ${e.message.split('\n')[0].replace(/ at line \d+, column \d+:$/, '')}`,
      });
    }
    return null;
  }
  return { file, doc, lines };
}

/** A problem at a key path in a file, with the line of the deepest key on the path that exists. */
function at(yf: YamlFile, path: string[], message: string): RulesDataProblem {
  let node: unknown = yf.doc.contents;
  let start = rangeStart(node);
  for (const seg of path) {
    let key: unknown;
    if (isMap(node)) {
      const pair = node.items.find((p) => String(isScalar(p.key) ? p.key.value : p.key) === seg);
      key = pair?.key;
      node = pair?.value;
    } else if (isSeq(node)) {
      node = key = node.items[Number(seg)];
    } else {
      break;
    }
    // Point at the key rather than its value: a block value starts on the next line.
    const here = rangeStart(key) ?? rangeStart(node);
    if (here === null) break;
    start = here;
  }
  const line = start === null ? null : yf.lines.linePos(start).line;
  return { file: yf.file, line, keyPath: path.join('.'), message };
}

function rangeStart(node: unknown): number | null {
  return (node as { range?: [number, number, number] } | null | undefined)?.range?.[0] ?? null;
}
