import { floorModel } from './src/core/model/cable-net/floor-model.ts';
import { prepared, readDemo, rulesData } from './tests/support/fixtures.ts';
import { Analysis } from './tests/support/analysis.ts';
for (const demo of ['demo-two-crew', 'demo-rear-axle']) {
  const spec = prepared(readDemo(demo));
  const a = new Analysis(spec, rulesData);
  const bumpF = a.floorBump.factor;
  for (const [name, f] of [['standing', 1], ['bump', bumpF]] as const) {
    const row: string[] = [];
    for (const anchors of ['fixed', 'coupled'] as const) {
      const m = floorModel(spec, rulesData, { value: f, source: 'x' }, { anchors });
      const rails = m.frame!.rails.map((r) => `${r.rail} ${(r.M_Nmm / 1e3).toFixed(0)}`).join(', ');
      const pulls = m.rails.map((r) => Math.max(...r.pulls.map((p) => p.force_N)));
      row.push(`${anchors}: M [N·m] ${rails}; Tmax ${m.maxTension_N.toFixed(0)} N; max strap pull ${Math.max(...pulls).toFixed(0)} N; sag ${m.crew.map((c) => c.sag_mm.toFixed(1)).join('/')} mm; clear ${m.clearances.map((c) => `${c.part} ${(c.clearance_mm - c.sag_mm).toFixed(1)}`).join(', ')}; its ${m.iterations}`);
    }
    console.log(`${demo} ${name} (x${f.toFixed(3)})\n  ${row.join('\n  ')}`);
  }
  const pre = a.floorStatic.frame!.pretension;
  console.log(`  pretension alone (coupled): pulls ${pre.minPull_N.toFixed(1)}-${pre.maxPull_N.toFixed(1)} N, M ${pre.rails.map((r) => `${r.rail} ${(r.M_Nmm / 1e3).toFixed(0)}`).join(', ')}; struts ${JSON.stringify(a.floorBump.frame!.struts.map((s) => [s.part, s.stiffness_N_per_mm.toFixed(0), s.force_N.toFixed(0)]))}`);
}
