// Where the slack-spoke search starts (slack-spokes.ts, wheel-ring-scan.ts):
// the scan starts each contact position's search from the bearing spokes of
// the position a step before, and the felloe's second scan (nodes at the ends
// of each joint's weakened length) from the first scan's at the same
// position. Spokes that only push make the ring's energy convex with one
// minimum, so the set that settles, and every number solved with it, cannot
// depend on the start; only the rounds may. Checked against the plain search
// (every spoke bearing at the start) at every position, on the demo's wheel,
// on a documented wheel whose dowelled felloe joints are hinges
// (specs/validation/sintashta-steppe.yaml) and on one with a tyre's
// pre-compression (specs/validation/nova-replica-two-crew.yaml). The
// half-length of 0.05 rad either side of a joint is a test input of our own.
import { describe, expect, it } from "vitest";
import { Analysis } from "../support/analysis.ts";
import { prepared, readDemo, rulesData } from "../support/fixtures.ts";
import {
  wheelRingSpec,
  type WheelRingSpec,
} from "../../src/core/model/wheel/wheel-ring-spec.ts";
import {
  scanWheelRing,
  type LoadPosition,
} from "../../src/core/model/wheel/wheel-ring-scan.ts";
import {
  solveWheelRing,
  type WheelRingResult,
} from "../../src/core/model/wheel/wheel-ring.ts";
import { forgetKeptValues } from "../../src/core/pipeline/kept-values.ts";

function wheelOf(name: string): { ws: WheelRingSpec; P: number } {
  const a = new Analysis(prepared(readDemo(name)), rulesData, undefined, {
    ride: false,
  });
  return {
    ws: wheelRingSpec(a.spec, rulesData, a.mass.layout),
    P: a.staticCase.axle_load_N / 2,
  };
}

const withoutRounds = ({ rounds: _, ...rest }: WheelRingResult) => rest;
const totalRounds = (scan: readonly LoadPosition[]) =>
  scan.reduce((n, p) => n + p.result.rounds, 0);

describe("the slack-spoke search started from a neighbour", () => {
  for (const name of ["demo-two-crew", "validation/sintashta-steppe"]) {
    it(`settles where the plain search settles, at every position, in fewer rounds in all (${name})`, () => {
      const { ws, P } = wheelOf(name);
      forgetKeptValues();
      const [scan] = scanWheelRing(ws, [P]);
      let plain = 0;
      for (const p of scan) {
        // The scan solves a unit load and scales it: the plain search at the unit load, scaled alike, is the reference.
        const fresh = solveWheelRing(ws.ring, { ...p.result.load, P: 1 });
        plain += fresh.rounds;
        expect(p.result.spokes.map((s) => s.active)).toEqual(
          fresh.spokes.map((s) => s.active),
        );
        expect(p.result.moment).toEqual(fresh.moment.map((m) => m * P));
        expect(p.result.unsettled).toBeUndefined();
      }
      expect(totalRounds(scan)).toBeLessThan(plain);
    });
  }

  for (const name of [
    "validation/sintashta-steppe",
    "validation/nova-replica-two-crew",
  ])
    it(`starts the felloe scan from the first scan: the same answers as without it, one round a position (${name})`, () => {
      const { ws, P } = wheelOf(name);
      forgetKeptValues();
      const first = scanWheelRing(ws, [P, 2 * P]);
      const around = [-0.05, 0.05];
      const guided = scanWheelRing(ws, [P, 2 * P], around, first);
      forgetKeptValues();
      const alone = scanWheelRing(ws, [P, 2 * P], around);
      guided.forEach((scan, l) =>
        scan.forEach((p, i) => {
          expect(withoutRounds(p.result)).toEqual(
            withoutRounds(alone[l][i].result),
          );
          expect(p.result.rounds).toBe(1);
        }),
      );
      expect(totalRounds(alone[1])).toBeGreaterThan(alone[1].length);
    });

  it("drops a guess that leaves the ring unheld or starts far off, and still settles where the plain search does", () => {
    const { ws, P } = wheelOf("validation/nova-replica-two-crew");
    const load = {
      P,
      spokeOffset: Math.PI / ws.ring.spokes,
      hinges: [],
      nodesAt: [],
    };
    const fresh = solveWheelRing(ws.ring, load);
    const near = (active: (i: number) => boolean): WheelRingResult => ({
      ...fresh,
      spokes: fresh.spokes.map((s, i) => ({ ...s, active: active(i) })),
    });
    // Every spoke slack: the ring is a mechanism at the start; the search begins again from every spoke bearing.
    expect(
      withoutRounds(
        solveWheelRing(
          ws.ring,
          load,
          undefined,
          near(() => false),
        ),
      ),
    ).toEqual(withoutRounds(fresh));
    // The settled set turned inside out: every bearing spoke slack and every slack one bearing.
    const inverted = solveWheelRing(
      ws.ring,
      load,
      undefined,
      near((i) => !fresh.spokes[i].active),
    );
    expect(withoutRounds(inverted)).toEqual(withoutRounds(fresh));
    // The settled set itself: one round.
    expect(solveWheelRing(ws.ring, load, undefined, fresh).rounds).toBe(1);
  });
});
