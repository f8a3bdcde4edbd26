/**
 * The pulse-train factor C_P as each rule set's table states it (tables/*.ts, repetitivePulses):
 * - icnirp2013: remembered alpha-dependent piecewise form with caps (IEC 60825-1:2014 4.3 f) C5,
 *   from memory, uncertain) and its conservative alternative N^(-0.25) (limit specification 4.6);
 * - eu2006: N^(-0.25) for every N (EU Directive 2006/25/EC Annex II Table 2.6 rule 3, read).
 * The tables keep this block loosely typed (Record<string, unknown>); it is read and checked here once.
 */
import type { RuleSetId } from '../model/inputs.js';
import { ruleSetTable } from './rule-sets.js';

export interface CpRule {
  /** Expression used when no piecewise form is given (or in conservative mode). */
  readonly expr: string;
  readonly pieces?: ReadonlyArray<{ readonly when: string; readonly expr: string }>;
  readonly conservative_alt?: string;
  readonly source: string;
  readonly confidence: string;
}

function str(x: unknown, what: string): string {
  if (typeof x !== 'string') throw new Error(`limit table: repetitivePulses ${what} is not a string`);
  return x;
}

function record(x: unknown, what: string): Record<string, unknown> {
  if (typeof x !== 'object' || x === null || Array.isArray(x)) throw new Error(`limit table: repetitivePulses ${what} missing`);
  return x as Record<string, unknown>;
}

function read(ruleSet: RuleSetId): CpRule {
  const rp = ruleSetTable(ruleSet).repetitivePulses;
  const cp = rp['CP'];
  if (cp !== undefined) {
    const c = record(cp, 'CP');
    const piecesRaw = c['pieces'];
    const pieces = Array.isArray(piecesRaw)
      ? piecesRaw.map((p: unknown, i) => {
          const r = record(p, `CP.pieces[${i}]`);
          return { when: str(r['when'], `CP.pieces[${i}].when`), expr: str(r['expr'], `CP.pieces[${i}].expr`) };
        })
      : undefined;
    const alt = c['conservative_alt'] === undefined ? undefined : str(c['conservative_alt'], 'CP.conservative_alt');
    return {
      expr: alt ?? str(c['expr'], 'CP.expr'),
      ...(pieces ? { pieces } : {}),
      ...(alt !== undefined ? { conservative_alt: alt } : {}),
      source: str(c['source'], 'CP.source'),
      confidence: str(c['confidence'], 'CP.confidence'),
    };
  }
  const rules = rp['rules'];
  if (!Array.isArray(rules)) throw new Error('limit table: repetitivePulses.rules missing');
  const rule3 = rules.map((r: unknown, i) => record(r, `rules[${i}]`)).find((r) => r['n'] === 3);
  if (!rule3) throw new Error('limit table: repetitivePulses rule 3 missing');
  return { expr: str(rule3['expr'], 'rules[3].expr'), source: str(rule3['source'], 'rules[3].source'), confidence: str(rule3['confidence'], 'rules[3].confidence') };
}

const cache = new Map<RuleSetId, CpRule>();

export function readCpRule(ruleSet: RuleSetId): CpRule {
  let r = cache.get(ruleSet);
  if (!r) {
    r = read(ruleSet);
    cache.set(ruleSet, r);
  }
  return r;
}
