import type ExcelJS from 'exceljs';
import type { Field } from '../../core/spec/spec-fields.ts';

/** The range a field allows, in words: `more than 0 and at most 3000 mm`. */
export function rangeText(f: Field): string {
  const unit = f.unit ? ` ${f.unit}` : '';
  const parts = [
    f.exclusiveMinimum !== undefined ? `more than ${f.exclusiveMinimum}` : f.minimum !== undefined ? `at least ${f.minimum}` : '',
    f.maximum !== undefined ? `at most ${f.maximum}` : '',
  ].filter(Boolean);
  return parts.length ? `${parts.join(' and ')}${unit}` : '';
}

/** What to type, for the cell's input message (spreadsheets cap it at 255 characters). */
export function promptText(f: Field): string {
  const what =
    f.type === 'list' ? `values separated by semicolons (2400; 3000)${f.unit ? `, in ${f.unit} or with a unit` : ''}`
    : f.enum ? `one of: ${f.enum.join(', ')}`
    : f.choices ? `an id from the list (rules/${f.choices === 'grounds' ? '' : 'materials/'}${f.choices}.yaml)`
    : f.type === 'boolean' ? 'TRUE or FALSE'
    : f.type === 'integer' ? `a whole number${rangeText(f) ? `, ${rangeText(f)}` : ''}`
    : f.type === 'number' ? `a number${rangeText(f) ? `, ${rangeText(f)}` : ''}${f.unitStrings ? `, or a value with its unit ("65 in")` : ''}`
    : 'text';
  return `${what}.${f.required ? ' Required.' : ' Leave empty for the default.'}`.slice(0, 255);
}

/**
 * Drop-downs for enums, choices and booleans; range checks for numbers. A
 * number that may carry a unit only warns, so that "65 in" can be typed;
 * the check converts and validates it whatever the spreadsheet allowed.
 */
export function validationFor(f: Field, listRange: (table: NonNullable<Field['choices']>) => string): ExcelJS.DataValidation | undefined {
  const common = { allowBlank: true, showInputMessage: true, prompt: promptText(f), promptTitle: f.label.slice(0, 32), showErrorMessage: true };
  if (f.enum) return { ...common, type: 'list', formulae: [`"${f.enum.join(',')}"`], errorStyle: 'stop', error: promptText(f) };
  // A species added to rules/ after the workbook was made must still be accepted: warn only.
  if (f.choices) return { ...common, type: 'list', formulae: [listRange(f.choices)], errorStyle: 'warning', error: `Not in the list of ${f.choices}; the check will refuse an unknown id.` };
  if (f.type === 'boolean') return { ...common, type: 'list', formulae: ['"TRUE,FALSE"'], errorStyle: 'stop', error: 'TRUE or FALSE.' };
  if (f.type !== 'number' && f.type !== 'integer') return f.type === 'list' ? promptOnly(common) : undefined;
  const low = f.exclusiveMinimum ?? f.minimum;
  const high = f.maximum;
  const type = f.type === 'integer' ? 'whole' : 'decimal';
  const errorStyle = f.unitStrings ? 'warning' : 'stop';
  const error = `${promptText(f)}`;
  if (low !== undefined && high !== undefined) return { ...common, type, operator: 'between', formulae: [low, high], errorStyle, error };
  if (low !== undefined) return { ...common, type, operator: f.exclusiveMinimum !== undefined ? 'greaterThan' : 'greaterThanOrEqual', formulae: [low], errorStyle, error };
  if (high !== undefined) return { ...common, type, operator: 'lessThanOrEqual', formulae: [high], errorStyle, error };
  return promptOnly(common);
}

// The file format has no prompt without a rule: a rule that anything meets.
function promptOnly(common: Omit<ExcelJS.DataValidation, 'type' | 'formulae'>): ExcelJS.DataValidation {
  return { ...common, type: 'textLength', operator: 'lessThanOrEqual', formulae: [32767], showErrorMessage: false };
}
