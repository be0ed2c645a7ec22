import { describe, expect, it } from 'vitest';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { startPlotThread } from '../src/node/plot-thread.ts';
import { drawHere, drawReportPlots } from '../src/render/report-plots.ts';
import { readDemo, rulesData } from './support/fixtures.ts';

// The plots drawn on the second thread are the plots drawn here, byte for
// byte (the same library on the same charts): the thread only moves the work.

describe('the plot thread', () => {
  const p = prepareSpec(readDemo('demo-two-crew'), rulesData);
  if (!p.ok) throw new Error('demo does not prepare');
  const result = runCheck(p.spec, p.entries, rulesData);

  it('draws every plot of the report exactly as this thread does', async () => {
    const thread = startPlotThread();
    try {
      const there = await drawReportPlots(result, thread.draw);
      const here = await drawReportPlots(result, drawHere);
      expect([...there.keys()]).toEqual([...here.keys()]);
      expect(there.size).toBeGreaterThan(10);
      for (const [file, svg] of here) expect(there.get(file), file).toBe(svg);
    } finally {
      await thread.close();
    }
  });

  it('falls back to drawing here when the thread has gone', async () => {
    const thread = startPlotThread();
    await thread.close();
    const plots = await drawReportPlots(result, thread.draw);
    expect(plots.size).toBeGreaterThan(10);
    expect([...plots.values()].every((svg) => svg.startsWith('<svg'))).toBe(true);
  });
});
