// OPEN-POINTS.md is the tables' own list of entries not read in a published source (SAFETY.md points
// to it): it must equal what the tables say now (regenerate with `npm run open-points`).
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { openPoints, openPointsMarkdown } from '../../core/limits/open-points.js';
import { ruleSetTable } from '../../core/limits/rule-sets.js';

describe('open-points list', () => {
  it('OPEN-POINTS.md equals the list generated from the tables', () => {
    expect(readFileSync(new URL('../../OPEN-POINTS.md', import.meta.url), 'utf8')).toBe(openPointsMarkdown());
  });
  it.each(['icnirp2013', 'eu2006'] as const)('%s: every eye row marked from memory is listed, no row marked read is', (id) => {
    const listed = openPoints(id).map((p) => p.what).join('\n');
    for (const r of ruleSetTable(id).eye) {
      expect(listed.includes(`limit row ${r.id} `), r.id).toBe(r.confidence.startsWith('from memory') || r.confidence === 'ours');
    }
  });
});
