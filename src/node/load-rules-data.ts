// Reads the editable rules data (sources, materials, grounds, rule limits,
// model parameters) from YAML files under rules/, checks it against the
// schema and the source catalogue, and hands the core one object.
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import { dirname, join, relative, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { LineCounter, isMap, isScalar, isSeq, parseDocument, type Document } from 'yaml';
import type { RulesData, RulesDataFiles } from '../core/data/rules-data.ts';
import { RulesDataError, type RulesDataProblem } from '../core/data/rules-data-error.ts';
import { schemaProblems } from '../core/data/validate-rules-data.ts';
import { citedSources, normaliseSources } from '../core/data/normalise-sources.ts';
import { declaredDataProblems } from '../core/pipeline/declared-data.ts';
import { MODELS } from '../core/pipeline/models.ts';
import { RULES } from '../core/rules/index.ts';

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
  sources: ['sources.yaml'],
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
  const limits = readGroups(join(dir, 'limits'), 'rule id', problems);
  const params = readGroups(join(dir, 'parameters'), 'parameter group', problems);
  if (problems.length > 0) throw new RulesDataError(problems);

  const data = {
    sources: (tables.sources?.doc.toJS() as unknown) ?? null,
    species: (tables.species?.doc.toJS() as unknown) ?? null,
    leathers: (tables.leathers?.doc.toJS() as unknown) ?? null,
    grounds: (tables.grounds?.doc.toJS() as unknown) ?? null,
    limits: limits.values,
    params: params.values,
  };
  const originOf = (path: string[]): [YamlFile | null | undefined, string[]] => {
    const [top, ...inner] = path;
    if (top === 'limits') return [limits.origin.get(inner[0] ?? ''), inner];
    if (top === 'params') return [params.origin.get(inner[0] ?? ''), inner];
    return [tables[top as TableKey], inner];
  };
  const report = (path: string[], message: string) => {
    const [origin, inner] = originOf(path);
    if (origin === undefined || origin === null) problems.push({ file: dir, line: null, keyPath: path.join('.'), message });
    else problems.push(at(origin, inner, message));
  };
  for (const sp of schemaProblems(data)) report(sp.path, sp.message);
  if (problems.length === 0) {
    // Every cited source must be in the catalogue.
    const catalogue = data.sources as Record<string, unknown>;
    for (const top of ['species', 'leathers', 'grounds', 'limits', 'params'] as const) {
      for (const c of citedSources(data[top], [top])) {
        if (!Object.hasOwn(catalogue, c.id)) report(c.path, `unknown source id "${c.id}": add it to rules/sources.yaml or cite one that is there`);
      }
    }
  }
  if (problems.length > 0) throw new RulesDataError(inFileOrder(problems));
  for (const top of ['species', 'leathers', 'grounds', 'limits', 'params'] as const) normaliseSources(data[top], data.sources as RulesData['sources']);
  // What the models and rules declare they read must be there.
  for (const p of declaredDataProblems(data as RulesData, MODELS, RULES)) {
    const [origin] = originOf([p.table, p.group]);
    if (origin) problems.push(at(origin, [p.group], `${p.name}: ${p.message}`));
    else problems.push({ file: join(dir, p.table === 'params' ? 'parameters' : 'limits'), line: null, keyPath: `${p.group}.${p.name}`, message: p.message });
  }
  if (problems.length > 0) throw new RulesDataError(problems);
  // Where each table and group came from, so an output can name the file a value lives in.
  const rel = (file: string) => relative(dirname(dir), file).split(sep).join('/');
  const files: RulesDataFiles = {
    tables: Object.fromEntries((['species', 'leathers', 'grounds'] as const).map((k) => [k, rel(join(dir, ...TABLE_FILES[k]))])),
    limits: Object.fromEntries([...limits.origin].map(([g, f]) => [g, rel(f.file)])),
    params: Object.fromEntries([...params.origin].map(([g, f]) => [g, rel(f.file)])),
  };
  return { ...(data as RulesData), files };
}

/**
 * The files of one folder, each a mapping of group id (a rule id, or a
 * parameter group) to its entries, merged; which file each group came from,
 * so a fault can be traced back.
 */
function readGroups(folder: string, what: string, problems: RulesDataProblem[]): { values: Record<string, unknown>; origin: Map<string, YamlFile> } {
  const origin = new Map<string, YamlFile>();
  const values: Record<string, unknown> = {};
  for (const lf of listYamlFiles(folder).map((f) => readYaml(f, problems))) {
    if (lf === null) continue;
    const contents = lf.doc.contents;
    if (contents === null) continue; // a file of comments only adds nothing
    if (!isMap(contents)) {
      problems.push(at(lf, [], `must be a mapping of ${what} to entries`));
      continue;
    }
    for (const [id, entries] of Object.entries(lf.doc.toJS() as Record<string, unknown>)) {
      const earlier = origin.get(id);
      if (earlier !== undefined) {
        problems.push(at(lf, [id], `${what} is already given in ${earlier.file}: give each in one file`));
        continue;
      }
      origin.set(id, lf);
      values[id] = entries;
    }
  }
  return { values, origin };
}

/** Problems grouped by file, in the order a reader meets them. */
function inFileOrder(problems: RulesDataProblem[]): RulesDataProblem[] {
  const fileRank = new Map<string, number>();
  for (const p of problems) if (!fileRank.has(p.file)) fileRank.set(p.file, fileRank.size);
  return [...problems].sort(
    (a, b) => fileRank.get(a.file)! - fileRank.get(b.file)! || (a.line ?? 0) - (b.line ?? 0),
  );
}

function listYamlFiles(folder: string): string[] {
  if (!existsSync(folder) || !statSync(folder).isDirectory()) return [];
  return readdirSync(folder)
    .filter((name) => name.endsWith('.yaml'))
    .sort()
    .map((name) => join(folder, name));
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
