/** A zod number checked against its rule in the one table of input rules (core/model/input-rules.ts), refusals in officer words. */
import { z } from 'zod';
import { rangeWords, type NumberRule } from '../../../core/model/input-rules.js';

export const numberByRule = (rule: NumberRule) => {
  const u = rule.unit ? ` ${rule.unit}` : '';
  let n = z.number({ error: `must be a number${u ? ` (${rule.unit})` : ''}` });
  const range = `must be ${rangeWords(rule)}${rule.why ? ` (${rule.why})` : ''}`;
  n = rule.minInclusive ? n.min(rule.min, range) : n.gt(rule.min, range);
  if (rule.max !== undefined) n = n.max(rule.max, range);
  return n;
};
