// The differences between the two rule sets are data in the limit tables (core/limits/tables,
// `repetitivePulses` and each row's `effectClass`), not branches in the engine. Each case below pins
// one data field through the number the officer sees (evaluateBeam: the governing per-pulse limit,
// every pulse rule shown in the report, the class estimate); a wrong field changes that number.
// Expected values are computed here from the published formulas, never read back from the core.
// Sources:
//  - EU Directive 2006/25/EC Annex II (read): Table 2.2 (eye limits), Table 2.5 (C_A), Table 2.6
//    (rules 1-3, C_P = N^-0.25 for limits protecting against thermal injury, T_min);
//  - BGI 832 (read; practice after IEC 60825-1:2001): N counted up to T2 (400-1400 nm) or 10 s above
//    1400 nm, C_P only for pulses shorter than 0.25 s;
//  - ILSC2019 (read): ICNIRP 2013 / IEC 60825-1:2014 apply C_P to retinal thermal limits only;
//  - ICNIRP 2013 / IEC 60825-1:2014 4.3 f) (from memory): T_i = 13 µs at 1050-1400 nm;
//  - IEC 60825-1:2014 Class 3B AEL for pulses, 0.03 C4 J at 700-1050 nm (from memory, domain notes
//    3.2), C4 = C_A of EU Table 2.5 (read).
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { evaluateBeam, RULE_SET_IDS, ruleSetTable, type BeamInput, type PulseRule, type RuleSetId } from '../../core/index.js';

const rel = (got: string | number | undefined, want: number): number => Math.abs(Number(got) / want - 1);
const beam: BeamInput['beam'] = { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' };
const pulses = (pulseEnergy_J: number, pulseDuration_s: number, repetitionRate_Hz?: number): BeamInput['emission'] => ({
  kind: 'pulsed',
  pulseEnergy_J,
  pulseDuration_s,
  ...(repetitionRate_Hz !== undefined ? { repetitionRate_Hz } : {}),
});

/** EU Table 2.2, 2600 nm - 1 mm, 1e-7 s to 10 s: 5600 t^0.25 J/m² (read; the ICNIRP row has the same value, from memory). */
const farIr = (t: number): number => 5600 * t ** 0.25;
/** EU Table 2.2, 1050-1400 nm: 5e-2 C_C J/m² for 1e-9 to 5e-5 s, 90 C_C t^0.75 J/m² for 5e-5 to 10 s; C_C = 1 below 1150 nm (read). */
const nir2 = (t: number): number => (t < 5e-5 ? 5e-2 : 90 * t ** 0.75);

interface Case {
  readonly field: string;
  readonly why: string;
  readonly source: string;
  readonly ruleSet: RuleSetId;
  readonly wavelength_nm: number;
  readonly exposureDuration_s: number;
  readonly emission: BeamInput['emission'];
  readonly governing: PulseRule;
  /** Governing per-pulse eye limit, J/m². */
  readonly H: number;
  /** Does the pulse-train rule (rule 3, C_P) apply? */
  readonly trainApplies: boolean;
}

const CASES: Case[] = [
  {
    field: 'cp.appliesTo (eu2006 includes cornea-lens-thermal)',
    why: '10.6 µm, 1 µs pulses at 10 Hz over 1 s: the corneal thermal limit is reduced by C_P = 10^-0.25 and governs',
    source: 'EU 2006/25/EC Annex II Table 2.6 rule 3 (read): C_P for every limit protecting against thermal injury; Table 2.2 5600 t^0.25',
    ruleSet: 'eu2006',
    wavelength_nm: 10600,
    exposureDuration_s: 1,
    emission: pulses(1e-3, 1e-6, 10),
    governing: 'pulse-train',
    H: farIr(1e-6) * 10 ** -0.25,
    trainApplies: true,
  },
  {
    field: 'cp.appliesTo (icnirp2013 retina-thermal only)',
    why: 'the same beam under ICNIRP 2013: C_P does not reduce a corneal limit, the single-pulse limit governs',
    source: 'ILSC2019 (read): C_P applies only to retinal thermal limits; ICNIRP 2013 5600 t^0.25 (from memory, = EU Table 2.2, read)',
    ruleSet: 'icnirp2013',
    wavelength_nm: 10600,
    exposureDuration_s: 1,
    emission: pulses(1e-3, 1e-6, 10),
    governing: 'single-pulse',
    H: farIr(1e-6),
    trainApplies: false,
  },
  {
    field: 'countingWindows, 1400 nm - 1 mm: cap 10 s',
    why: 'the same beam over 100 s: N is counted within 10 s (100 pulses, not 1000); rule 2 gives 1000 W/m² x 100 s / 1000 = 100 J/m²',
    source: 'BGI 832 (read): N counted up to 10 s above 1400 nm; EU Table 2.6 rule 3 (read); EU Table 2.2 1000 W/m² for t > 10 s (read)',
    ruleSet: 'eu2006',
    wavelength_nm: 10600,
    exposureDuration_s: 100,
    emission: pulses(1e-3, 1e-6, 10),
    governing: 'pulse-train',
    H: farIr(1e-6) * 100 ** -0.25,
    trainApplies: true,
  },
  {
    field: 'countingWindows: the top of the last window (1 mm) belongs to it',
    why: 'the same train at 1 mm, the end of the tables: N still counted within 10 s',
    source: 'BGI 832 (read); EU Table 2.2 2600 nm - 1 mm rows (read); the tables run to 1 mm inclusive (limit specification section 0)',
    ruleSet: 'eu2006',
    wavelength_nm: 1e6,
    exposureDuration_s: 100,
    emission: pulses(1e-3, 1e-6, 10),
    governing: 'pulse-train',
    H: farIr(1e-6) * 100 ** -0.25,
    trainApplies: true,
  },
  {
    field: 'cp.appliesTo (eu2006 excludes cornea-lens-photochemical)',
    why: '250 nm pulses: the photochemical limit 30 J/m² is not reduced by C_P; the dose over 100 s (1000 pulses) governs',
    source: 'EU Table 2.6 rule 3 (read): thermal limits only; EU Table 2.2 180-302.5 nm 30 J/m² (read)',
    ruleSet: 'eu2006',
    wavelength_nm: 250,
    exposureDuration_s: 100,
    emission: pulses(1e-6, 1e-8, 10),
    governing: 'average-power',
    H: 30 / 1000,
    trainApplies: false,
  },
  {
    field: 'grouping.factor (eu2006 T_min = 50 µs at 1050-1400 nm)',
    why: '1064 nm, 10 ns at 40 kHz (period 25 µs) over 0.25 s: two pulses inside T_min are one 50 µs pulse (0.05/2 per pulse; at exactly 50 µs the lower of the two rows) and 5000 groups count for C_P',
    source: 'EU Table 2.6 T_min 1050-1400 nm = 50 µs, pulses inside T_min counted as one (read); EU Table 2.2 5e-2 C_C and note a, the lower value on a boundary (read)',
    ruleSet: 'eu2006',
    wavelength_nm: 1064,
    exposureDuration_s: 0.25,
    emission: pulses(1e-6, 1e-8, 4e4),
    governing: 'pulse-train',
    H: (Math.min(nir2(4.99e-5), nir2(5e-5)) / 2) * 5000 ** -0.25,
    trainApplies: true,
  },
  {
    field: 'grouping.factor (icnirp2013 T_i = 13 µs at 1050-1400 nm)',
    why: 'the same beam under ICNIRP 2013: the 25 µs period is longer than T_i, every pulse counts (N = 10 000); 2e-2 J/m² x 10^-1',
    source: 'ICNIRP 2013 / IEC 60825-1:2014 4.3 f) T_i = 13 µs and 2e-2 J/m² for 1050-1400 nm (from memory); C_P = N^-0.25 (conservative, limit specification 4.6)',
    ruleSet: 'icnirp2013',
    wavelength_nm: 1064,
    exposureDuration_s: 0.25,
    emission: pulses(1e-6, 1e-8, 4e4),
    governing: 'pulse-train',
    H: 2e-2 * 1e4 ** -0.25,
    trainApplies: true,
  },
  {
    field: "grouping.edgeSide (eu2006 'lower': at 1050 nm the 400-1050 nm T_min of 18 µs)",
    why: '1050 nm, 10 ns at 40 kHz: the 25 µs period is longer than 18 µs, no grouping; N = 10 000 on the lower edge row 5e-3 C_A = 0.025 J/m²',
    source: 'EU Table 2.6 writes T_min bands lo < lambda <= hi (read; limit specification errata); EU Table 2.2 5e-3 C_A, Table 2.5 C_A = 5 (read)',
    ruleSet: 'eu2006',
    wavelength_nm: 1050,
    exposureDuration_s: 0.25,
    emission: pulses(1e-6, 1e-8, 4e4),
    governing: 'pulse-train',
    H: 5e-3 * 5 * 1e4 ** -0.25,
    trainApplies: true,
  },
  {
    field: 'cp.pulsesShorterThan_s = 0.25 (pulses of 0.3 s)',
    why: '1064 nm, 0.3 s pulses at 1 Hz over 10 s: C_P does not apply; the single-pulse limit 90 x 0.3^0.75 governs',
    source: 'BGI 832 (read): C_P only for pulses shorter than 0.25 s; EU Table 2.2 90 C_C t^0.75 (read)',
    ruleSet: 'eu2006',
    wavelength_nm: 1064,
    exposureDuration_s: 10,
    emission: pulses(1e-3, 0.3, 1),
    governing: 'single-pulse',
    H: nir2(0.3),
    trainApplies: false,
  },
  {
    field: 'cp.pulsesShorterThan_s = 0.25 (pulses of 0.2 s) and countingWindows 400-1400 nm: cap T2 = 10 s',
    why: '1064 nm, 0.2 s pulses at 1 Hz over 100 s: C_P = 10^-0.25 (N = 10 within T2 = 10 s, point source, not 100 over T)',
    source: 'BGI 832 (read); EU Table 2.5 T2 = 10 s for alpha < 1.5 mrad (read); EU Table 2.6 rule 3 (read)',
    ruleSet: 'eu2006',
    wavelength_nm: 1064,
    exposureDuration_s: 100,
    emission: pulses(1e-3, 0.2, 1),
    governing: 'pulse-train',
    H: nir2(0.2) * 10 ** -0.25,
    trainApplies: true,
  },
];

describe('each rule-set data field changes the per-pulse eye limit the officer sees (evaluateBeam)', () => {
  it.each(CASES.map((c) => [`${c.field}: ${c.why} [${c.source}]`, c] as const))('%s', (_name, c) => {
    const m = evaluateBeam({ ruleSet: c.ruleSet, wavelength_nm: c.wavelength_nm, exposureDuration_s: c.exposureDuration_s, emission: c.emission, beam }).mpe;
    expect(m.governingRule).toBe(c.governing);
    expect(rel(m.H_Jm2, c.H)).toBeLessThan(1e-9);
    expect(m.rules.find((r) => r.rule === 'pulse-train')?.applies).toBe(c.trainApplies);
  });
});

describe('fields read for the skin and below the T_min table (evaluateBeam)', () => {
  it('skin: T2 is taken for a point (alpha = 0 for skin), so N is counted within 10 s even for a 100 mrad source: EU skin 1064 nm, 0.2 s pulses at 1 Hz over 100 s', () => {
    // EU Table 2.4 skin 1.1e4 C_A t^0.25 (read), C_A = 5; Table 2.6 rule 3 (read); BGI 832: N within T2 (read); T2 = 10 s at alpha < 1.5 mrad (Table 2.5, read)
    const r = evaluateBeam({ ruleSet: 'eu2006', wavelength_nm: 1064, sourceAngle_rad: 0.1, exposureDuration_s: 100, emission: pulses(1e-3, 0.2, 1), beam });
    const train = r.skinMpe.rules.find((x) => x.rule === 'pulse-train');
    expect(train?.applies).toBe(true);
    expect(rel(train?.H_Jm2, 1.1e4 * 5 * 0.2 ** 0.25 * 10 ** -0.25)).toBeLessThan(1e-9);
  });
  it('EU below 315 nm: 0.1 ns pulses at 2 GHz are grouped inside 1 ns (the 315-400 nm T_min, the table gives none below), said in rule 1', () => {
    // EU Table 2.2 note d sums UV pulses inside T_min (read); limit specification 5.6 (ours: the 1 ns value below 315 nm)
    const r = evaluateBeam({ ruleSet: 'eu2006', wavelength_nm: 250, exposureDuration_s: 1, emission: pulses(1e-12, 1e-10, 2e9), beam });
    expect(r.mpe.rules.find((x) => x.rule === 'single-pulse')?.detail).toMatch(/pulse groups inside T_min counted as one pulse/);
  });
});

describe('C4 of the class 3B pulse AEL is the table C_A (IEC 60825-1:2014, from memory; C_A read in EU Table 2.5)', () => {
  // 0.03 C4 J per pulse at 700-1050 nm, C4 = 10^(0.002 (lambda - 700)): a single 10 ns pulse 1 % below
  // the AEL is class 3B, 1 % above is class 4.
  const cases: Array<[number, number]> = [
    [800, 0.03 * 10 ** (0.002 * 100)],
    [1000, 0.03 * 10 ** (0.002 * 300)],
  ];
  it.each(cases)('%s nm: AEL %s J; 0.99 AEL -> 3B, 1.01 AEL -> 4', (wavelength_nm, ael) => {
    const at = (E: number): string => evaluateBeam({ wavelength_nm, emission: pulses(E, 1e-8), beam }).classEstimate.estimate;
    expect(at(ael * 0.99)).toBe('3B');
    expect(at(ael * 1.01)).toBe('4');
  });
});

describe('the tables themselves', () => {
  // Every row's typed effect class agrees with the effect it names (limit specification; the classes
  // are what the C_P scope, the photochemical field of view and the additive groups read).
  const CLASS_OF_EFFECT: Record<string, string> = {
    'retinal thermal': 'retina-thermal',
    'retinal photochemical': 'retina-photochemical',
    'cornea thermal': 'cornea-lens-thermal',
    'cornea thermal (dual)': 'cornea-lens-thermal',
    'UV thermal cornea': 'cornea-lens-thermal',
    'UV photochemical cornea': 'cornea-lens-photochemical',
    'UV-A lens (photochemical)': 'cornea-lens-photochemical',
    'UV thermal/photochemical cornea': 'cornea-lens-thermal-photochemical',
    'UV cornea/lens': 'cornea-lens-unstated',
    'UV-A cornea/lens': 'cornea-lens-unstated',
    'skin thermal': 'skin-thermal',
    'skin UV': 'skin-unstated',
    'skin UV-A': 'skin-unstated',
  };
  it.each(RULE_SET_IDS.map((id) => [id]))('%s: every row has the effect class of its effect', (id) => {
    const t = ruleSetTable(id);
    for (const row of [...t.eye, ...t.skin]) expect(`${row.id}: ${row.effectClass}`).toBe(`${row.id}: ${CLASS_OF_EFFECT[row.effect] ?? '(unknown effect)'}`);
  });

  it.each(RULE_SET_IDS.map((id) => [id]))('%s: the counting windows cover 180 nm - 1 mm without gap or overlap', (id) => {
    const w = ruleSetTable(id).repetitivePulses.countingWindows;
    expect(w[0]?.band_nm[0]).toBe(180);
    expect(w[w.length - 1]?.band_nm[1]).toBe(1e6);
    for (let i = 1; i < w.length; i++) expect(w[i]?.band_nm[0]).toBe(w[i - 1]?.band_nm[1]);
  });

  it('the engine names no rule set: every difference is read from the tables (derived: issue "the tables are the data")', () => {
    // Allowed: the list of ids and the default (rule-sets.ts), and the AEL basis (IEC 60825-1:2014
    // builds its AELs on the ICNIRP 2013 limits).
    const allowed = new Set(['limits/rule-sets.ts', 'classes/aels.ts', 'model/inputs.ts']);
    const found: string[] = [];
    const walk = (dir: string, rel: string): void => {
      for (const e of readdirSync(dir, { withFileTypes: true })) {
        const p = join(dir, e.name);
        const r = rel ? `${rel}/${e.name}` : e.name;
        if (e.isDirectory()) {
          if (r !== 'limits/tables') walk(p, r);
        } else if (e.name.endsWith('.ts') && !allowed.has(r) && /'(icnirp2013|eu2006)'/.test(readFileSync(p, 'utf8'))) found.push(r);
      }
    };
    walk(join(import.meta.dirname, '../../core'), '');
    expect(found).toEqual([]);
  });
});
