// The limit specification's section 9 test vectors (test/fixtures/limit-test-vectors.json, computed
// by its self-check from the tables) and the exposureLimit query each one stands for; shared by the
// tests that check a function against them.
import type { ExposureLimitQuery } from '../../core/index.js';
import vectors from '../fixtures/limit-test-vectors.json' with { type: 'json' };

export interface LimitVector {
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

export const limitVectors: readonly LimitVector[] = (vectors as { cases: LimitVector[] }).cases;

/** The query of a vector: set (b) is the EU directive; 'as_remembered' is set (a) without its conservative choices. */
export function queryOf(c: LimitVector): ExposureLimitQuery {
  return {
    ruleSet: c.rule_set.startsWith('EU') ? 'eu2006' : 'icnirp2013',
    tissue: c.organ,
    wavelength_nm: c.lambda_nm,
    duration_s: c.t_s,
    sourceAngle_rad: c.alpha_mrad / 1000,
    settings: { conservative: c.mode !== 'as_remembered' },
  };
}
