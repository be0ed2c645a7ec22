// A YAML file's aliases checked before they are expanded: an alias with no
// anchor before it, an alias inside the node it names (a value that never
// ends), too many aliases, or aliases that multiply the file (an anchor of
// ten aliases of an anchor of ten aliases...) are each refused at the alias.
import { isAlias, isCollection, isPair, isScalar, visit, type Alias, type Document, type Node } from 'yaml';
import { issue, type InputIssue } from '../spec/input-issue.ts';
import { INPUT_LIMITS } from './input-limits.ts';

export interface AliasIssue {
  issue: InputIssue;
  /** Where the alias stands in the text. */
  offset: number;
}

/** The first problem with the document's aliases, or none. */
export function aliasIssues(doc: Document): AliasIssue[] {
  const latest = new Map<string, Node>();
  const targets = new Map<Alias, Node>();
  const sizes = new Map<unknown, number>();
  // Values a node stands for once every alias in it is expanded.
  const size = (n: unknown): number => {
    const known = sizes.get(n);
    if (known !== undefined) return known;
    let s = 1;
    if (isAlias(n)) s = size(targets.get(n));
    else if (isPair(n)) s = size(n.key) + size(n.value);
    else if (isCollection(n)) s = 1 + n.items.reduce((sum: number, item) => sum + size(item), 0);
    else if (!isScalar(n)) s = 0;
    sizes.set(n, s);
    return s;
  };
  const found: AliasIssue[] = [];
  let count = 0;
  let expanded = 0;
  visit(doc, {
    Node(_key, node, path) {
      if (!isAlias(node)) {
        if (node.anchor) latest.set(node.anchor, node);
        return undefined;
      }
      const report = (key: Parameters<typeof issue>[1], params: Record<string, string | number> = {}) => {
        found.push({ issue: issue([], key, { name: node.source, ...params }), offset: node.range?.[0] ?? 0 });
        return visit.BREAK;
      };
      const target = latest.get(node.source);
      if (!target) return report('yamlAliasUnresolved');
      if (path.includes(target)) return report('yamlAliasSelf');
      if (++count > INPUT_LIMITS.yamlAliases) return report('yamlAliasCount', { max: INPUT_LIMITS.yamlAliases });
      targets.set(node, target);
      expanded += size(node);
      if (expanded > INPUT_LIMITS.textEntries) return report('yamlAliasExpansion', { max: INPUT_LIMITS.textEntries });
      return undefined;
    },
  });
  return found;
}
