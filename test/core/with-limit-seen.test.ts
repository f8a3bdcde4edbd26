// Hazard distances for a given limit (core/hazard/with-limit.ts): the hand-check entry points the
// published-example tables use (test/core/part2/worked-examples-hazard.test.ts). What they report
// besides the distance (the rule named, the limit in the trace with its unit) and what they refuse,
// each refusal naming the field and the valid range in the unit of the quantity. Cases written for the
// survivors of a mutation run (test/mutation/RESULTS.md). Sources: range equation
// r = (sqrt(4S/(pi L)) - a)/phi (ANSI Z136.1 App. B; IEC TR 60825-14; from memory, domain notes 1.2.1);
// a limit in W/m² goes with a power in W (CW), a limit in J/m² with an energy per pulse in J (common
// practice); a diffuse viewing angle is measured from the surface normal, 0 to 90° (domain notes 1.4).
import { describe, expect, it } from 'vitest';
import { diffuseWithLimit, InputError, nohdWithLimit, type GivenLimit } from '../../core/index.js';

const beam = { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' } as const;
const refusal = (f: () => unknown): InputError => {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return e as InputError;
  }
  throw new Error('not refused');
};

describe('the rule named and the limit in the trace', () => {
  it.each([
    ['1 W against 25 W/m²', { source: 1, limit: 25, quantity: 'E' }, 'cw', 'given limit 25 W/m²', (Math.sqrt(4 / (Math.PI * 25)) - 0.001) / 0.001],
    ['1 mJ against 2e-3 J/m²', { source: 1e-3, limit: 2e-3, quantity: 'H' }, 'single-pulse', 'given limit 0.002 J/m²', (Math.sqrt(4e-3 / (Math.PI * 2e-3)) - 0.001) / 0.001],
  ] as const)('%s: r = (sqrt(4S/(pi L)) - a)/phi, rule %s, "%s"', (_n, g, rule, label, r) => {
    const d = nohdWithLimit(g as GivenLimit, beam);
    expect(Math.abs(Number(d.distance_m) / r - 1)).toBeLessThan(1e-9);
    expect(d.governingRule).toBe(rule);
    expect(d.trace.steps.find((s) => s.kind === 'result')?.detail).toContain(`(${label})`);
  });
});

describe('refusals name the field and the range in the unit of the quantity', () => {
  it.each([
    ['a power of 0 W', { source: 0, limit: 25, quantity: 'E' }, 'source', 'a number > 0 W'],
    ['an energy of 0 J', { source: 0, limit: 2e-3, quantity: 'H' }, 'source', 'a number > 0 J'],
    ['an irradiance limit of 0', { source: 1, limit: 0, quantity: 'E' }, 'limit', 'a number > 0 W/m²'],
    ['a radiant-exposure limit of 0', { source: 1e-3, limit: 0, quantity: 'H' }, 'limit', 'a number > 0 J/m²'],
    ['a quantity other than E or H', { source: 1, limit: 25, quantity: 'X' }, 'quantity', "'E' | 'H'"],
  ] as const)('%s', (_n, g, field, range) => {
    const e = refusal(() => nohdWithLimit(g as unknown as GivenLimit, beam));
    expect(e.field).toBe(field);
    expect(e.validRange).toBe(range);
  });
  it('a diffuse viewing angle above 90° (2 rad) is refused; 90° itself is accepted', () => {
    const g: GivenLimit = { source: 10, limit: 50, quantity: 'E' };
    const e = refusal(() => diffuseWithLimit(g, 1, 2));
    expect(e.field).toBe('viewingAngle_rad');
    expect(e.code).toBe('out_of_range');
    expect(() => diffuseWithLimit(g, 1, Math.PI / 2)).not.toThrow();
  });
});
