// The tables' expression grammar as the officer meets it (core/limits/expression.ts): a published
// value typed for a 'differs' check (SAFETY.md "Checks of the limit tables") is read with the
// tables' own grammar (limit specification section 1, convention 5: numbers in e-notation, the
// tables' symbols, + - * / ^ and parentheses), and the rows' conditions on the source size decide
// which rows the derivation lists.
import { describe, expect, it } from 'vitest';
import { checkableEntries, documentValueProblem, evaluateBeam, type BeamInput, type Trace } from '../../../core/index.js';

// 532 nm CW over 0.25 s, a 3 mrad source: the row as written is 18 t^0.75 C_E = 12.7 J/m² (EU
// Directive 2006/25/EC Table 2.2, read; icnirp2013 H-E-VIS-4 the same, from memory; C_E = 3/1.5 = 2);
// each document value below is 5 J/m², lower, so it is the limit shown (arithmetic by hand).
const differs = (documentExpr: string): BeamInput => ({
  wavelength_nm: 532,
  exposureDuration_s: 0.25,
  sourceAngle_rad: 0.003,
  emission: { kind: 'cw', power_W: 1 },
  beam: { diameter_m: 0.005, divergence_rad: 0.001, definition: '1/e' },
  settings: {
    rowChecks: [{ key: 'H-E-VIS-4', verdict: 'differs', documentExpr, checkId: 'c9', reference: 'IEC 60825-1:2014 Table A.1', checkedBy: 'Dr. Imre Calloway-Senn', checkedOn: '2026-11-30' }],
  },
});

describe('number forms of a typed document value (e-notation as the tables write it)', () => {
  it.each([
    ['.25e+01*2', 'a leading point with two digits and a signed two-digit exponent: 0.25 x 10^1 x 2'],
    ['.5*10', 'a leading point without an exponent'],
    ['.5E+1', 'a capital E with a sign'],
    ['500e-2', 'a negative two-digit exponent'],
  ])('%j gives H = 5 J/m² (%s)', (expr) => {
    const r = evaluateBeam(differs(expr));
    expect(Math.abs(Number(r.mpe.H_Jm2) / 5 - 1)).toBeLessThan(1e-12);
  });
});

describe('refusal words for a typed value the grammar cannot read (the checks screen)', () => {
  const vis4 = checkableEntries('icnirp2013').find((e) => e.key === 'H-E-VIS-4');
  if (!vis4) throw new Error('H-E-VIS-4 is not an open entry');
  it.each([')', '2*<', '2*)', '+'])('%j: cannot be read (an operator or parenthesis where a number or symbol belongs)', (expr) => {
    expect(documentValueProblem('icnirp2013', vis4, expr)).toMatch(/^cannot be read: /);
  });
  it('a symbol the tables do not define, used twice, is named once', () => {
    expect(documentValueProblem('icnirp2013', vis4, 'XY*t*XY')).toMatch(/^uses XY, which the tables do not define /);
  });
});

// The source size exactly on alpha_min = 1.5 mrad (EU Directive 2006/25/EC Table 2.5, read; ICNIRP
// 2013 the same, from memory): a point source. The point-source row (alpha <= 1.5) applies, and the
// extended-source rows (alpha > 1.5) do not; a strict '>' read as '>=' would list H-E-VIS-6x too
// (t = 100 s > T2 = 10 s). 550 nm over 100 s: the rows that apply are H-E-VIS-5p (10 W/m²) and the
// two photochemical rows (exposure-limits.md 4.2).
describe('conditions on the source size: the rows the derivation lists', () => {
  const eyeRows = (sourceAngle_rad: number): string[] => {
    const r = evaluateBeam({ wavelength_nm: 550, exposureDuration_s: 100, sourceAngle_rad, emission: { kind: 'cw', power_W: 1e-3 }, beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' } });
    const rows: string[] = [];
    const walk = (t: Trace): void => {
      for (const s of t.steps) if (s.kind === 'row' && s.label.startsWith('Row ')) rows.push(s.label);
      t.children.forEach(walk);
    };
    const eye = r.trace.children.find((c) => c.title.startsWith('Limit criteria, eye'));
    if (!eye) throw new Error('no eye limit trace');
    walk(eye);
    return rows;
  };
  it('exactly 1.5 mrad: the point-source row and the photochemical rows, no extended-source row', () => {
    expect(eyeRows(0.0015)).toEqual(['Row H-E-VIS-5p (retinal thermal)', 'Row H-E-PC-1 (retinal photochemical)', 'Row H-E-PC-2 (retinal photochemical)']);
  });
  it('3 mrad: the extended-source row beyond T2 instead (T2 = 10.36 s < 100 s)', () => {
    expect(eyeRows(0.003)).toEqual(['Row H-E-VIS-6x (retinal thermal)', 'Row H-E-PC-1 (retinal photochemical)', 'Row H-E-PC-2 (retinal photochemical)']);
  });
});
