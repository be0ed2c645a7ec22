import { describe, expect, it } from 'vitest';
import { capstanHold, frictionForHold, turnsToHold } from '../src/core/model/capstan.ts';

describe('capstan equation (Euler-Eytelwein)', () => {
  it('reproduces the textbook worked example', () => {
    // Beer & Johnston, Vector Mechanics for Engineers: Statics, 10th ed., problem 8.104:
    // two full turns round a bollard, 80 lb holds 5000 lb, so mu = 0.329 ...
    const mu = frictionForHold(5000, 80, 2);
    expect(mu).toBeCloseTo(0.329, 3);
    expect(capstanHold(80, mu, 2)).toBeCloseTo(5000, 9);
    // ... and to hold 20,000 lb with the same 80 lb needs 2.67 turns.
    expect(turnsToHold(20000, 80, mu)).toBeCloseTo(2.67, 2);
    expect(turnsToHold(20000, 80, 0.329)).toBeCloseTo(2.67, 2);
  });

  it('one full turn multiplies the tail pull by e^(2 pi mu)', () => {
    // hand calculation: mu = 0.5, one turn: e^pi = 23.1407
    expect(capstanHold(10, 0.5, 1)).toBeCloseTo(231.407, 3);
    expect(turnsToHold(231.407, 10, 0.5)).toBeCloseTo(1, 5);
  });

  it('needs no turns where the tail pull alone holds the load', () => {
    expect(turnsToHold(8, 10, 0.5)).toBe(0);
    expect(turnsToHold(10, 10, 0.5)).toBe(0);
  });
});
