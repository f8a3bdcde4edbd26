// A published value the officer types for a 'differs' check (SAFETY.md "Checks of the limit
// tables") is read with the tables' own grammar (limit specification section 1, convention 5:
// numbers in e-notation, the tables' symbols, + - * / ^ and parentheses; ^ binds tightest and to the
// right, * and / before + and -, each left to right: common practice in written formulas). The value
// reaches the officer as the limit: the lower of the row as written and the document governs.
// 532 nm CW over 0.25 s: the row as written is H = 18 t^0.75 = 6.36 J/m² (EU Directive 2006/25/EC
// Table 2.2, read; the icnirp2013 row H-E-VIS-4 the same, from memory); every document value below is
// lower, so it is the limit shown. Where a misreading of the grammar gives a value above 6.36 J/m², the
// row as written would be shown instead, so the case fails too. Arithmetic derived by hand.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, InputError, type BeamInput, type Trace } from '../../../core/index.js';

const beam: BeamInput['beam'] = { diameter_m: 0.005, divergence_rad: 0.001, definition: '1/e' };
const differs = (documentExpr: string): BeamInput => ({
  wavelength_nm: 532,
  exposureDuration_s: 0.25,
  sourceAngle_rad: 0.003,
  emission: { kind: 'cw', power_W: 1 },
  beam,
  settings: {
    rowChecks: [{ key: 'H-E-VIS-4', verdict: 'differs', documentExpr, checkId: 'c9', reference: 'IEC 60825-1:2014 Table A.1', checkedBy: 'Dr. Imre Calloway-Senn', checkedOn: '2026-11-30' }],
  },
});
const limit = (documentExpr: string): number => Number(evaluateBeam(differs(documentExpr)).mpe.H_Jm2);

describe('the document value read as written (532 nm, 0.25 s, 3 mrad source: as written 18 t^0.75 C_E = 12.7 J/m²)', () => {
  it('the row as written governs without a lower document value', () => {
    const r = evaluateBeam(differs('100'));
    expect(r.mpe.governingRow).toBe('H-E-VIS-4');
    expect(Math.abs(Number(r.mpe.H_Jm2) / (18 * 0.25 ** 0.75 * 2) - 1)).toBeLessThan(1e-12); // C_E = 3/1.5 = 2
  });
  it.each([
    ['5', 5],
    [' 2 + 3  ', 5], // spaces before, between and after the symbols
    ['7-2', 5],
    ['10-2-3', 5], // left to right: (10-2)-3, not 10-(2-3) = 11
    ['20/2/2', 5], // left to right: (20/2)/2, not 20/(2/2) = 20
    ['2.5*2', 5],
    ['1+2*2', 5], // * before +: not (1+2)*2 = 6
    ['(1+1.5)*2', 5],
    ['-1+6', 5], // a leading minus
    ['6+-1', 5], // a minus after an operator
    ['2^2+1', 5], // ^ before +
    ['2^(-1)*10', 5], // a parenthesised negative exponent
    ['1024/2^3^2', 2], // ^ to the right: 2^(3^2) = 512, not (2^3)^2 = 64 (16 J/m²)
    ['2*3^2/9', 2], // ^ before * and /
    ['.5e1', 5],
    ['5.', 5],
    ['0.5E1', 5],
    ['50e-1', 5],
    ['0.05e+2', 5],
    ['20*t', 5], // the exposure duration t = 0.25 s
    ['2.5*CE', 5], // C_E = alpha/alpha_min = 3/1.5 = 2
    ['alpha_min*2', 3], // a symbol with an underscore: alpha_min = 1.5 mrad
    ['0.5*T2', 0.5 * 10 * 10 ** (1.5 / 98.5)], // a symbol with a digit: T2 = 10 * 10^((3 - 1.5)/98.5) s (EU Table 2.5, read)
    ['-(CE*2)+9', 5], // a symbol under a minus
    ['25^0.5', 5], // square root
    ['625^0.25', 5], // two square roots
    ['256^0.125+3', 5], // three square roots
    ['10^0.5', Math.sqrt(10)],
    ['10^0.3', 10 ** 0.3], // a power of ten with a non-dyadic exponent
    ['4^0.3', 4 ** 0.3], // another base with a non-dyadic exponent (1.516, not 10^0.3 = 1.995)
    ['2^3', 8], // an integer power
  ] as const)('%j gives H = %d J/m²', (expr, want) => {
    expect(Math.abs(limit(expr) / want - 1)).toBeLessThan(1e-12);
  });
});

describe('a document value the grammar cannot read is refused, naming the field (no limit is computed)', () => {
  it.each(['2 % 3', '(2', '2)', '2 3', 'foo', '-foo', '2*foo', 'foo*2', '2+', '*2', '()', '2 < 3'])('%j', (expr) => {
    let err: unknown;
    try {
      evaluateBeam(differs(expr));
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(InputError);
    expect((err as InputError).message).toContain('settings.rowChecks[0].documentExpr');
  });
});

// A document value with a symbol that has no value at the point evaluated (C2 and T1 are defined for
// 302.5-315 nm only, C_C from 700 nm: the tables' factor bands, ICNIRP 2013 / IEC 60825-1:2014 from
// memory, EU Table 2.5 read) cannot give a limit there. It is refused with the check's field named, as
// an unreadable value is; before this session it stopped the evaluation with an internal message.
describe('a document value using a symbol with no value here is refused, naming the field and the symbol', () => {
  const refusal = (x: BeamInput): InputError => {
    try {
      evaluateBeam(x);
    } catch (e) {
      if (e instanceof InputError) return e;
      throw e;
    }
    throw new Error('the beam was evaluated; a refusal was expected');
  };
  it.each([
    ['C2 in a row of 532 nm', 'C2', 'C2 has no value at 532 nm'],
    ['T1 in a row of 532 nm', '2*T1', 'T1 has no value at 532 nm'],
    ['C_C in a row of 532 nm', 'CC*5', 'CC has no value at 532 nm'],
    ['C2 under a minus', '-C2+10', 'C2 has no value at 532 nm'],
  ])('%s', (_n, expr, words) => {
    const e = refusal(differs(expr));
    expect(e.field).toBe('settings.rowChecks[0].documentExpr');
    expect(e.validRange).toContain(words);
  });
  it('C2 in the document value of the factor C_C (1200-1400 nm) at 1250 nm', () => {
    const e = refusal({
      wavelength_nm: 1250,
      exposureDuration_s: 10,
      emission: { kind: 'cw', power_W: 1 },
      beam,
      settings: {
        rowChecks: [
          { key: 'H-E-VIS-4', verdict: 'matches', checkId: 'c8', reference: 'IEC 60825-1:2014 Table A.1', checkedBy: 'Dr. Imre Calloway-Senn', checkedOn: '2026-11-30' },
          { key: 'factor:CC[1200-1400 nm]', verdict: 'differs', documentExpr: '8*C2', checkId: 'c9', reference: 'IEC 60825-1:2014 Table A.1', checkedBy: 'Dr. Imre Calloway-Senn', checkedOn: '2026-11-30' },
        ],
      },
    });
    expect(e.field).toBe('settings.rowChecks[1].documentExpr');
    expect(e.validRange).toContain('C2 has no value at 1250 nm, 10 s');
  });
});

// The derivation the officer reads shows the document value with the values put in (the trace line of
// the row), so the officer can check the arithmetic against the published text.
it('the derivation shows the document value with its symbols replaced by their values', () => {
  const r = evaluateBeam(differs('2.5*CE'));
  const lines = (t: Trace): string[] => [...t.steps.map((x) => `${x.label}: ${x.detail ?? ''}`), ...t.children.flatMap(lines)];
  expect(lines(r.trace)).toContain('Row H-E-VIS-4 (retinal thermal): H = 2.5*CE = 2.5*(2)');
});
