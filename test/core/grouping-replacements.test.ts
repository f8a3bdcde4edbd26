// Why the replaced-entry list of a pulse group's limit (core/limits/pulse-rules.ts, the group
// limit's conservativeReplacements added to the result) can add nothing today, and the data that
// would change it. A group of pulses inside the grouping time T_g (T_i / T_min) is compared with the
// limit for min(T_g, T). When T <= T_g that is the average-power limit's own duration, so its
// replaced entries are already listed; when T > T_g it is the limit at T_g itself. An entry only the
// group limit could add therefore needs a stricter alternative (conservative_alt, a relaxed reading
// not yet verified, a cap used in conservative mode only) on a row, aperture or factor piece whose
// band meets a grouping band and whose duration range holds that band's T_g. None does: every
// stricter alternative of the tables sits below 1 ns, in the UV (where icnirp2013 groups nothing),
// at 10 s and longer in 700-1400 nm (T_i there is 5 us / 13 us), or on C_C, which depends on the
// wavelength only and so is replaced in the single-pulse limit too. If this test fails, the
// surviving mutant listed in test/mutation/EQUIVALENT.md (pulse-rules.ts, group limit's replaced
// entries) is no longer equivalent: add a case through evaluateBeam that names the entry.
// Sources: the tables themselves (core/limits/tables); T_i (ICNIRP 2013 / IEC 60825-1:2014, from
// memory) and T_min (EU Directive 2006/25/EC Annex II Table 2.6, read) as they hold them.
import { describe, expect, it } from 'vitest';
import { RULE_SET_IDS, ruleSetTable } from '../../core/index.js';

type Iv = readonly [number, number];
const meets = (a: Iv, b: Iv): boolean => a[0] <= b[1] && b[0] <= a[1];
const holds = (iv: Iv, x: number): boolean => iv[0] <= x && x <= iv[1];

describe('no stricter alternative applies at a grouping time (keeps the group limit\'s replaced-entry list equivalent)', () => {
  it.each(RULE_SET_IDS)('%s', (id) => {
    const table = ruleSetTable(id);
    const rule = table.repetitivePulses.grouping;
    const groups: Array<{ band: Iv; T_g: number }> = (table.factors[rule.factor]?.pieces ?? []).map((p) => ({ band: p.band_nm as Iv, T_g: Number(p.expr) }));
    if (rule.belowTable) groups.push({ band: [0, rule.belowTable.below_nm], T_g: Number(rule.belowTable.value_s) });
    expect(groups.length).toBeGreaterThan(0);
    for (const g of groups) expect(Number.isFinite(g.T_g) && g.band !== undefined).toBe(true);

    const hits: string[] = [];
    for (const [tissue, rows] of [['eye', table.eye], ['skin', table.skin]] as const) {
      for (const r of rows) {
        const stricter = r.conservative_alt !== undefined || r.relaxed_alt !== undefined || r.max_E?.conservativeOnly === true;
        for (const g of groups) if (stricter && meets(r.band_nm, g.band) && holds(r.t_s, g.T_g)) hits.push(`${tissue} row ${r.id} at ${g.T_g} s`);
      }
      for (const a of table.apertures[tissue]) {
        for (const g of groups) if (a.conservative_alt !== undefined && meets(a.band_nm, g.band) && holds(a.t_s, g.T_g)) hits.push(`${tissue} aperture ${a.band_nm.join('-')} nm at ${g.T_g} s`);
      }
    }
    for (const [name, def] of Object.entries(table.factors)) {
      for (const p of def.pieces ?? []) {
        // A piece without a duration range depends on the wavelength only: replaced for the single pulse too.
        if (p.conservative_alt === undefined || p.t_s === undefined) continue;
        for (const g of groups) if ((p.band_nm === undefined || meets(p.band_nm, g.band)) && holds(p.t_s, g.T_g)) hits.push(`factor ${name} at ${g.T_g} s`);
      }
    }
    expect(hits).toEqual([]);
  });
});
