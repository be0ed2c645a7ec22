import type { ModelView } from '../pipeline/define-model.ts';
import type { PlotData } from './plot-data.ts';
import { turnSpeedPlot } from './turn-speed-plot.ts';
import { yokeLoadPlot } from './yoke-load-plot.ts';

/** The report's plots of the balance and the turn; each is left out where its model has nothing to show (no crew, no steady turn). */
export function reportPlots(a: ModelView<'turn' | 'horse'>): PlotData[] {
  return [yokeLoadPlot(a.spec, a.data, a.horse.mass_kg), turnSpeedPlot(a.turn, a.data)].filter((p): p is PlotData => p !== null);
}
