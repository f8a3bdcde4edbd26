// Property behind the officer's 'differs' checks of a correction factor (SAFETY.md "Checks of the
// limit tables"): the limit used is the LOWER of the limit as the table writes it and the limit the
// published document gives. So, for every factor piece of both rule sets, at points across its band,
// durations and source sizes, the limit with a 'differs' check of that piece must be
//   (a) no higher than the limit the table gives as written (a check never widens a limit), and
//   (b) no higher than the limit obtained when the table itself carries the document's value
//       (the oracle: the same look-up with that piece's formula replaced, conservative mode off).
// (b) catches a check that is silently ignored wherever a factor acts without appearing in a row's
// formula (gamma_p through the field of view, alpha_max through C_E, T2 through a row's condition):
// the defect fixed in core/limits/exposure-limit.ts, found on 2 December 2026. The document values
// are the table's own formula times 2 and times 1/2 (invented, to move the factor both ways).
// The look-up is the core's exposureLimit (every MPE the officer sees comes from it); the hand-derived
// cases through evaluateBeam are in factor-checks-seen.test.ts.
import { afterEach, describe, expect, it } from 'vitest';
import { clearCoreCaches, exposureLimit, type RuleSetId } from '../../../core/index.js';
import { factorPieceKey } from '../../../core/limits/factors.js';
import { RULE_SET_IDS, ruleSetTable } from '../../../core/limits/rule-sets.js';
import type { FactorDef, FactorPiece, Interval } from '../../../core/limits/table-types.js';

type Mutable<T> = { -readonly [K in keyof T]: T[K] };
interface Entry {
  readonly ruleSet: RuleSetId;
  readonly key: string;
  readonly holder: Mutable<FactorDef> | Mutable<FactorPiece>;
  readonly expr: string;
  readonly band?: Interval;
  readonly t_s?: Interval;
}

/** Every factor piece (or single-formula factor) of a rule set, with the object that carries its formula. */
function entries(ruleSet: RuleSetId): Entry[] {
  const out: Entry[] = [];
  for (const [name, def] of Object.entries(ruleSetTable(ruleSet).factors)) {
    if (def.pieces) {
      for (const p of def.pieces) out.push({ ruleSet, key: factorPieceKey(name, p), holder: p as Mutable<FactorPiece>, expr: p.expr, ...(p.band_nm ? { band: p.band_nm } : def.band_nm ? { band: def.band_nm } : {}), ...(p.t_s ? { t_s: p.t_s } : {}) });
    } else {
      const expr = def.expr ?? (def.value !== undefined ? String(def.value) : undefined);
      if (expr !== undefined) out.push({ ruleSet, key: factorPieceKey(name), holder: def as Mutable<FactorDef>, expr, ...(def.band_nm ? { band: def.band_nm } : {}) });
    }
  }
  return out;
}

const within = (x: number, lo: number, hi: number): number => Math.min(Math.max(x, lo), hi);
const geo = (a: number, b: number): number => Math.sqrt(Math.max(a, 1e-13) * b);
function wavelengths(e: Entry): number[] {
  if (!e.band) return [315, 450, 550, 800, 1100, 1300, 1500, 3000];
  const [lo, hi] = [within(e.band[0], 180, 1e6), within(e.band[1], 180, 1e6)];
  return [...new Set([lo * (1 + 1e-6), (lo + hi) / 2, hi * (1 - 1e-6)])];
}
function durations(e: Entry): number[] {
  if (!e.t_s) return [1e-9, 1e-3, 1, 100, 1e4];
  const [lo, hi] = [within(e.t_s[0], 1e-13, 3e4), within(e.t_s[1], 1e-13, 3e4)];
  return [...new Set([lo * (1 + 1e-6), geo(lo, hi), hi * (1 - 1e-6)])];
}
const SOURCE_ANGLES_RAD = [undefined, 0.003, 0.05, 0.2];

/** The limit with the entry's formula replaced in the table itself, restored afterwards. */
function withTableFormula<T>(e: Entry, expr: string, f: () => T): T {
  const saved = { ...e.holder };
  const h = e.holder as Record<string, unknown>;
  delete h['value'];
  delete h['conservative_alt'];
  h['expr'] = expr;
  clearCoreCaches();
  try {
    return f();
  } finally {
    for (const k of Object.keys(h)) delete h[k];
    Object.assign(h, saved);
    clearCoreCaches();
  }
}

afterEach(() => clearCoreCaches());

describe.each(RULE_SET_IDS.map((r) => [r]))("'differs' checks of every factor piece (%s): the limit is never above the document's", (ruleSet) => {
  it.each(entries(ruleSet).map((e) => [e.key, e]))('%s', (_key, e) => {
    let compared = 0;
    for (const factor of [2, 0.5]) {
      const documentExpr = `${factor}*(${e.expr})`;
      const check = { key: e.key, verdict: 'differs' as const, documentExpr, checkId: 'p1', reference: 'IEC 60825-1:2014 (property case)', checkedBy: 'Dr. Imre Calloway-Senn', checkedOn: '2026-12-02' };
      for (const wavelength_nm of wavelengths(e)) {
        for (const duration_s of durations(e)) {
          for (const tissue of ['eye', 'skin'] as const) {
            for (const sourceAngle_rad of tissue === 'eye' ? SOURCE_ANGLES_RAD : [undefined]) {
              const q = { ruleSet, tissue, wavelength_nm, duration_s, ...(sourceAngle_rad !== undefined ? { sourceAngle_rad } : {}) };
              const asWritten = Number(exposureLimit({ ...q, settings: { conservative: false } }).H_Jm2);
              const checked = Number(exposureLimit({ ...q, settings: { conservative: false, rowChecks: [check] } }).H_Jm2);
              const oracle = Number(withTableFormula(e, documentExpr, () => exposureLimit({ ...q, settings: { conservative: false } }).H_Jm2));
              const at = `${wavelength_nm} nm, ${duration_s} s, ${tissue}, source ${String(sourceAngle_rad ?? 'point')}, document ${documentExpr}`;
              expect(checked, `never above the table as written at ${at}`).toBeLessThanOrEqual(asWritten * (1 + 1e-12));
              expect(checked, `never above the document's limit at ${at}`).toBeLessThanOrEqual(oracle * (1 + 1e-12));
              compared += 1;
            }
          }
        }
      }
    }
    expect(compared).toBeGreaterThan(0);
  });
});
