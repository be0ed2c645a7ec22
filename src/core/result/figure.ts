export interface Figure {
  value: number;
  unit: string;
}

/** A figure that does not apply to this build or run, with the reason why (in words). */
export interface NotApplicable {
  not_applicable: string;
}

/** What a figure's producer gives: the figure, or why there is none. */
export type FigureEntry = Figure | NotApplicable;

export const isNotApplicable = (e: FigureEntry): e is NotApplicable => 'not_applicable' in e;

/**
 * The figure where its value is a finite number, else the reason it does not
 * apply: no figure is ever NaN, Infinity or null. The reason is given even
 * where the value is there, so a producer states once why a figure may be missing.
 */
export function figureOrReason(value: number | null | undefined, unit: string, reason: string): FigureEntry {
  return typeof value === 'number' && Number.isFinite(value) ? { value, unit } : { not_applicable: reason };
}

/** The same reason for each of several figures (a model that did not run). */
export function notApplicable(names: readonly string[], reason: string): Record<string, NotApplicable> {
  return Object.fromEntries(names.map((n) => [n, { not_applicable: reason }]));
}

/** Figures and the reasons for those that do not apply, apart, as the result carries them. */
export function splitFigures(entries: Record<string, FigureEntry>): { figures: Record<string, Figure>; figures_not_applicable: Record<string, string> } {
  const figures: Record<string, Figure> = {};
  const figures_not_applicable: Record<string, string> = {};
  for (const [name, e] of Object.entries(entries)) {
    if (isNotApplicable(e)) figures_not_applicable[name] = e.not_applicable;
    else if (Number.isFinite(e.value)) figures[name] = e;
    else figures_not_applicable[name] = 'the model gave no finite value';
  }
  return { figures, figures_not_applicable };
}
