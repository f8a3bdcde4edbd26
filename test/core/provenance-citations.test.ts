/**
 * Provenance in professional words (SAFETY.md, "Sources and their status"): every source key used by
 * a limit-table row, factor, aperture or pulse rule of both rule sets, and every source a core
 * formula writes into a derivation, has a readable citation; the status follows the confidence
 * mark; and the sentence cleaner leaves no internal key or "from memory" wording.
 *
 * Cases: derived: the citation table is the project's own presentation of its source keys; the
 * edition rule (a table number that was not read is replaced by the clause topic) is common practice
 * in audit citations.
 */
import { describe, expect, it } from 'vitest';
import { allSteps, evaluateRoom, RULE_SETS, RULE_SET_IDS, type BeamInput, type Emission } from '../../core/index.js';
import { citationOf, readableText, SOURCE_CITATIONS, STATUS_TEXT, statusOf } from '../../core/provenance/citations.js';
import { INTERNAL_WORDING } from '../support/internal-wording.js';

/** Every `source` string anywhere in a rule-set table (rows, factor pieces, apertures, pulse rules). */
function tableSources(node: unknown, out: Set<string>): Set<string> {
  if (Array.isArray(node)) for (const x of node) tableSources(x, out);
  else if (node !== null && typeof node === 'object')
    for (const [k, v] of Object.entries(node)) {
      if (k === 'source' && typeof v === 'string') out.add(v);
      else tableSources(v, out);
    }
  return out;
}

/** Sources written into the derivations of a spread of beams (every geometry, CW and pulsed, UV to far IR). */
function traceSources(): Map<string, string> {
  const found = new Map<string, string>();
  const emissions: Emission[] = [
    { kind: 'cw', power_W: 0.5 },
    { kind: 'pulsed', pulseEnergy_J: 1e-3, pulseDuration_s: 1e-8, repetitionRate_Hz: 10 },
    { kind: 'pulsed', pulseEnergy_J: 1e-6, pulseDuration_s: 1e-12, repetitionRate_Hz: 1e6 },
    { kind: 'pulsed', pulseEnergy_J: 0.1, pulseDuration_s: 1e-3 },
  ];
  for (const ruleSet of RULE_SET_IDS) {
    const beams: BeamInput[] = [];
    for (const wavelength_nm of [250, 350, 450, 532, 633, 905, 1064, 1300, 1550, 2000, 10600])
      for (const emission of emissions)
        beams.push({
          wavelength_nm,
          emission,
          beam: { diameter_m: 0.002, divergence_rad: 1e-3, definition: '1/e2' },
          viewing: {
            diffuse: { reflectance: 0.5 },
            specular: { reflectance: 0.04 },
            lens: { focalLength_m: 0.1 },
            fiber: { kind: 'multimode', numericalAperture: 0.2 },
            aided: { magnification: 7, objectiveDiameter_m: 0.05 },
          },
        });
    beams.push({ wavelength_nm: 1550, emission: { kind: 'cw', power_W: 0.01 }, beam: { diameter_m: 1e-5, divergence_rad: 0.1, definition: '1/e2' }, viewing: { fiber: { kind: 'singlemode', numericalAperture: 0.14, modeFieldDiameter_m: 1e-5 } } });
    const room = evaluateRoom({ ruleSet, lasers: [{ id: 'sweep', name: 'Sweep', beams }] });
    for (const t of [room.trace, ...room.beams.map((b) => b.trace)])
      for (const s of allSteps(t)) if (s.source !== undefined && s.source !== '') found.set(s.source, `${ruleSet}: ${s.label}`);
  }
  return found;
}

describe('every source key has a readable citation', () => {
  for (const id of RULE_SET_IDS) {
    it(`rule set ${id}: rows, factors, apertures and pulse rules (derived: table walk)`, () => {
      const missing = [...tableSources(RULE_SETS[id], new Set())].filter((s) => SOURCE_CITATIONS[s] === undefined);
      expect(missing).toEqual([]);
    });
  }
  it('sources written by the core formulas into derivations (derived: spread of beams)', () => {
    const missing = [...traceSources()].filter(([s]) => SOURCE_CITATIONS[s] === undefined);
    expect(missing).toEqual([]);
  });
  it('no citation carries an internal key or working-note wording', () => {
    for (const [key, cite] of Object.entries(SOURCE_CITATIONS)) {
      for (const re of INTERNAL_WORDING) expect(cite, key).not.toMatch(re);
    }
  });
  it('a table number of ICNIRP, IEC 60825-1 or ANSI Z136.1 that was not read is replaced by the clause topic', () => {
    for (const [key, cite] of Object.entries(SOURCE_CITATIONS)) {
      if (!/from memory/.test(key)) continue;
      // only the Directive's tables were read; a number after IEC or ANSI would be a recalled one
      const notDirective = cite.split(';').filter((part) => !part.includes('2006/25/EC') && !part.includes('BGV B2') && !part.includes('EN 208'));
      for (const part of notDirective) expect(part, key).not.toMatch(/\b(Table|Tab\.|clause) ?\d/);
    }
  });
});

describe('status in plain words', () => {
  const cases: ReadonlyArray<readonly [string | undefined, boolean, string]> = [
    ['read', false, 'checked against the published text'],
    ['from memory', false, 'not yet checked against the published text'],
    ['from memory, uncertain', true, 'not yet checked against the published text — the stricter value is used'],
    ['secondary', false, 'not yet checked against the published text'],
    ['derived', false, 'derived from the cited method'],
    ['common practice', false, 'common practice'],
    ['ours', false, 'Beamwarden’s own choice, on the safe side'],
  ];
  for (const [confidence, stricter, text] of cases)
    it(`${confidence ?? '(none)'}${stricter ? ', stricter value used' : ''} -> "${text}"`, () => {
      expect(STATUS_TEXT[statusOf(confidence, stricter)]).toBe(text);
    });
  it('a Directive row: "Directive 2006/25/EC, Annex II, Table 2.2", checked', () => {
    expect(citationOf('EU-FR Tableau 2.2', 'read')).toEqual({ text: 'Directive 2006/25/EC, Annex II, Table 2.2', status: 'checked' });
  });
});

describe('sentences of the core made readable', () => {
  const cases: ReadonlyArray<readonly [string, string]> = [
    ['replaced by the stricter value: H-E-NIR1-1, rule:CP', 'replaced by the stricter value: H-E-NIR1-1, the pulse correction factor C_P'],
    ['replaced by the stricter value: aperture:eye:180-400:10-30000', 'replaced by the stricter value: the limiting aperture for the eye, 180-400 nm, 10 s-30 000 s'],
    ['replaced: factor:CC', 'replaced: correction factor C_C'],
    ['time base 100 s above 400 nm (IEC 60825-1:2014 4.3, from memory)', 'time base 100 s above 400 nm (IEC 60825-1:2014 4.3; not yet checked against the published text)'],
    ['retinal thermal limits (400-1400 nm, eye); ILSC2019 (read)', 'retinal thermal limits (400-1400 nm, eye) (ILSC 2019, paper P106)'],
    ['10 s (common practice, ours)', '10 s (common practice, Beamwarden’s choice)'],
  ];
  for (const [raw, readable] of cases) it(raw, () => expect(readableText(raw)).toBe(readable));
  for (const id of RULE_SET_IDS)
    it(`the working note of rule set ${id} is replaced by its printed provenance`, () => {
      const out = readableText(`Rule set: ${RULE_SETS[id].status}`);
      for (const re of INTERNAL_WORDING) expect(out).not.toMatch(re);
    });
});
