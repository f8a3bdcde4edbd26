// Test vectors of the project's limit specification (section 9, computed by its self-check from the
// tables; copied to test/fixtures/limit-test-vectors.json). They check that the engine reads the
// tables as the specification intends: set (b) rows are read from EU Directive 2006/25/EC Annex II
// (French transposition), set (a) values inherit the uncertainty of memory-based rows.
import { describe, expect, it } from 'vitest';
import { exposureLimit } from '../../core/index.js';
import { limitVectors as cases, queryOf } from './limit-vectors.js';

describe('limit specification section 9 vectors (4 significant figures)', () => {
  it.each(cases)('$rule_set $mode $organ $lambda_nm nm $t_s s alpha $alpha_mrad mrad', (c) => {
    const r = exposureLimit(queryOf(c));
    expect(Number(r.H_Jm2) / c.expected_H_J_m2).toBeCloseTo(1, 3);
    expect(Number(r.E_Wm2) / c.expected_mean_E_W_m2).toBeCloseTo(1, 3);
    expect(r.governing.rowId).toBe(c.rows[0]);
  });
});
