import { issue, pathText, type InputIssue } from '../spec/input-issue.ts';
import { schemaIssues } from '../spec/validate-schema.ts';
import type { CuttingInstance, StockLength } from './cutting-types.ts';
import schema from './instance.schema.json' with { type: 'json' };
// The schema compiled to code by `npm run gen` (scripts/validator-source.ts holds ajv's options).
import { validate } from './generated/instance-validator.js';

export type CheckedInstance = { ok: true; instance: CuttingInstance } | { ok: false; issues: InputIssue[] };

/** A plain cutting instance checked against its schema, then for what the schema cannot say. */
export function checkCuttingInstance(raw: unknown): CheckedInstance {
  if (!validate(raw)) return { ok: false, issues: schemaIssues(validate.errors ?? [], schema) };
  const instance = raw as CuttingInstance;
  const issues = [...stockIssues(instance.stock), ...pieceIssues(instance), ...countIssues(instance)];
  if (issues.length === 0) issues.push(...shortage(instance));
  return issues.length ? { ok: false, issues } : { ok: true, instance };
}

function stockIssues(stock: StockLength[]): InputIssue[] {
  const out: InputIssue[] = [];
  stock.forEach((s, j) => {
    const first = stock.findIndex((t) => t.length_mm === s.length_mm);
    if (first < j) out.push(issue(['stock', j, 'length_mm'], 'stockLengthTwice', { value: s.length_mm, other: pathText(['stock', first]) }));
  });
  const priced = stock.findIndex((s) => s.cost !== undefined);
  if (priced >= 0) stock.forEach((s, j) => s.cost === undefined && out.push(issue(['stock', j, 'cost'], 'stockCostMissing', { other: pathText(['stock', priced, 'cost']) })));
  return out;
}

/** Most pieces in one plan: first-fit decreasing, which every plan starts from, takes seconds at this count and grows with its square. */
export const MAX_PIECES = 100_000;

function countIssues(inst: CuttingInstance): InputIssue[] {
  const count = inst.pieces.reduce((n, p) => n + p.quantity, 0);
  return count > MAX_PIECES ? [issue(['pieces'], 'stockTooManyPieces', { count, max: MAX_PIECES })] : [];
}

// A single piece needs no kerf (its one cut may be the stock's end), so it
// fits any stock at least as long as itself.
function pieceIssues(inst: CuttingInstance): InputIssue[] {
  const longest = Math.max(...inst.stock.map((s) => s.length_mm));
  return inst.pieces.flatMap((p, i) => {
    const holds = inst.stock.filter((s) => s.length_mm >= p.length_mm);
    if (holds.length === 0) return [issue(['pieces', i, 'length_mm'], 'pieceTooLong', { value: p.length_mm, max: longest })];
    if (holds.every((s) => s.available === 0)) return [issue(['pieces', i, 'length_mm'], 'pieceNoStockLeft', { value: p.length_mm, lengths: holds.map((s) => s.length_mm).join(', ') })];
    return [];
  });
}

/**
 * Necessary conditions for enough stock, one per piece length L: the pieces
 * of L or longer can only come from stock of L or longer, so (a) their
 * lengths with kerfs must fit in its total length with one kerf to spare
 * per stock piece, and (b) their count must not exceed what that stock
 * yields, at most floor((W + kerf) / (L + kerf)) from a piece of length W.
 * Reports the first failing length, longest first.
 */
function shortage(inst: CuttingInstance): InputIssue[] {
  const k = inst.kerf_mm;
  const lengths = [...new Set(inst.pieces.map((p) => p.length_mm))].sort((a, b) => b - a);
  for (const L of lengths) {
    const stock = inst.stock.filter((s) => s.length_mm >= L);
    if (stock.some((s) => s.available === undefined)) continue;
    const pieces = inst.pieces.filter((p) => p.length_mm >= L);
    const count = pieces.reduce((n, p) => n + p.quantity, 0);
    const need = pieces.reduce((n, p) => n + (p.length_mm + k) * p.quantity, 0);
    const have = stock.reduce((n, s) => n + (s.length_mm + k) * s.available!, 0);
    const yieldMax = stock.reduce((n, s) => n + Math.floor((s.length_mm + k) / (L + k) + 1e-9) * s.available!, 0);
    if (need > have + 1e-6) return [issue(['stock'], 'stockShortLength', { count, value: L, need: round(need), have: round(have) })];
    if (count > yieldMax) return [issue(['stock'], 'stockShortCount', { count, value: L, have: yieldMax })];
  }
  return [];
}

const round = (x: number) => Math.round(x * 1000) / 1000;
