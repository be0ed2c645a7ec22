import type ExcelJS from 'exceljs';
import type { Field } from '../spec/spec-fields.ts';

type Plain = string | number | boolean | undefined;

const NUMBER_TEXT = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

/** What a cell shows, as a string, number or boolean; formulas give their result. */
export function plainValue(v: ExcelJS.CellValue): Plain {
  if (v === null || v === undefined) return undefined;
  if (typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean') return v;
  if (v instanceof Date) return v.toISOString().slice(0, 10);
  if ('result' in v) return plainValue(v.result);
  if ('formula' in v || 'sharedFormula' in v) return undefined;
  if ('richText' in v) return v.richText.map((t) => t.text).join('');
  if ('text' in v) return String(v.text);
  if ('error' in v) return String(v.error);
  return undefined;
}

function numberish(v: string | number | boolean): unknown {
  return typeof v === 'string' && NUMBER_TEXT.test(v) ? Number(v) : v;
}

/**
 * A cell's value as the specification takes it, or undefined for an empty
 * cell (an absent key). Digits typed as text become numbers where the key
 * wants a number; anything else passes through for the schema and the unit
 * conversion to accept or name, as they would in YAML.
 */
export function fieldValue(f: Field, cell: ExcelJS.CellValue): unknown {
  const raw = plainValue(cell);
  const v = typeof raw === 'string' ? raw.trim() : raw;
  if (v === undefined || v === '') return undefined;
  if (f.type === 'list') {
    if (typeof v !== 'string') return [v];
    return v.split(';').map((s) => s.trim()).filter(Boolean).map(numberish);
  }
  if (f.type === 'number' || f.type === 'integer') return numberish(v);
  if (f.type === 'boolean') return typeof v === 'string' && /^(true|false)$/i.test(v) ? v.toLowerCase() === 'true' : v;
  if (f.enum?.every((e) => typeof e === 'number')) return numberish(v);
  if (typeof v === 'number') return String(v);
  // Free text is kept as typed; an id or a choice loses stray spaces.
  return f.enum || f.choices ? v : raw;
}
