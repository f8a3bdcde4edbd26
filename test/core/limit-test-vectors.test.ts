// Test vectors of the project's limit specification (section 9, computed by its self-check from the
// tables; copied to test/fixtures/limit-test-vectors.json). They check that the engine reads the
// tables as the specification intends: set (b) rows are read from EU Directive 2006/25/EC Annex II
// (French transposition), set (a) values inherit the uncertainty of memory-based rows.
import { describe, expect, it } from 'vitest';
import { exposureLimit } from '../../core/index.js';
import vectors from '../fixtures/limit-test-vectors.json' with { type: 'json' };

interface Vector {
  rule_set: string;
  mode: 'as_published' | 'as_remembered' | 'conservative';
  organ: 'eye' | 'skin';
  lambda_nm: number;
  t_s: number;
  alpha_mrad: number;
  expected_H_J_m2: number;
  expected_mean_E_W_m2: number;
  rows: string[];
  note: string;
}

const cases = (vectors as { cases: Vector[] }).cases;

describe('limit specification section 9 vectors (4 significant figures)', () => {
  it.each(cases)('$rule_set $mode $organ $lambda_nm nm $t_s s alpha $alpha_mrad mrad', (c) => {
    const r = exposureLimit({
      ruleSet: c.rule_set.startsWith('EU') ? 'eu2006' : 'icnirp2013',
      tissue: c.organ,
      wavelength_nm: c.lambda_nm,
      duration_s: c.t_s,
      sourceAngle_rad: c.alpha_mrad / 1000,
      settings: { conservative: c.mode !== 'as_remembered' },
    });
    expect(Number(r.H_Jm2) / c.expected_H_J_m2).toBeCloseTo(1, 3);
    expect(Number(r.E_Wm2) / c.expected_mean_E_W_m2).toBeCloseTo(1, 3);
    expect(r.governing.rowId).toBe(c.rows[0]);
  });
});
