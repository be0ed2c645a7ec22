// The frame-rail check reads each rail's largest moment in plan and the axial
// force there (frame-model.ts). The moment is the same either side of a node
// (no moment is applied at one), so which element's end the largest was read
// from is a matter of rounding; the axial force is not: it steps where a
// strap's anchor pulls on a curved length of rail. The force reported is the
// more compressive of the rail's two elements at that node (the safe side for
// bending with compression, EN 1995-1-1, 6.2.4), never the other rail's met at
// a corner. Checked on the floors of the two demos and of a documented
// vehicle (specs/validation/wetwang-two-pony.yaml), in their design states.
import { describe, expect, it } from 'vitest';
import { prepared, readDemo, rulesData } from '../support/fixtures.ts';
import { ModelGraph } from '../../src/core/pipeline/model-graph.ts';
import { MODELS } from '../../src/core/pipeline/models.ts';

describe('the axial force at a rail’s largest moment', () => {
  let stepped = 0;
  for (const name of ['demo-two-crew', 'demo-rear-axle', 'validation/wetwang-two-pony']) {
    it(`is the more compressive of the rail's elements at that node (${name})`, () => {
      const spec = prepared(readDemo(name));
      const graph = new ModelGraph(MODELS, { spec, data: rulesData, ride: false });
      const { frame } = graph.get('floorSetup').built!;
      for (const id of ['floorStatic', 'floorDesign', 'floorStone'] as const) {
        const m = graph.get(id);
        const pulls = m.solution!.pulls;
        const forces = frame.elementForces(pulls);
        const { elements, nodes } = frame.loop;
        for (const r of frame.solve(pulls).rails) {
          const node = nodes.findIndex((p) => p.x === r.at.x && p.y === r.at.y);
          expect(node).toBeGreaterThanOrEqual(0);
          const meeting = elements.flatMap((e, k) => (e.rail === r.rail && (e.a === node || e.b === node) ? [{ e, f: forces[k] }] : []));
          expect(meeting.length).toBeGreaterThanOrEqual(1);
          // The largest moment is read at this node, from either element: the same to rounding.
          for (const { e, f } of meeting) expect(Math.abs(e.a === node ? f.M1 : f.M2) / r.M_Nmm).toBeCloseTo(1, 9);
          const here = meeting.map((x) => x.f);
          expect(r.N_N).toBe(Math.min(...here.map((f) => f.N)));
          if (here.length === 2 && Math.abs(here[0].N - here[1].N) > 1e-6 * Math.abs(r.N_N)) stepped++;
        }
      }
    });
  }
  it('meets a node where the force steps, so the choice matters', () => expect(stepped).toBeGreaterThan(0));
});

