// The owner's rule (RULES.md, issue 12): every screen and page is read by an officer and an
// auditor, "never an internal key, a JSON path or a developer message". This test runs the core the
// way the screens and the PDF do (evaluateRoom over the invented demo site, evaluateBeam over a
// table of varied beams) and scans every text the officer is shown: trace titles, step labels and
// details, warnings, notes, findings, cautions. None may contain an input key in camelCase
// ('repetitionRate', 'pulseDuration_s') or a colon-separated table key ('aperture:eye:180-400:10-30000',
// 'rule:CP', 'factor:CA'). Invented beams and demo data: these are checks of wording, not of values.
import { describe, expect, it } from 'vitest';
import { evaluateBeam, evaluateRoom, type BeamInput, type RoomInput } from '../../core/index.js';
import demo from '../../assets/demo/demo-scenario.json' with { type: 'json' };

/** Keys of the result objects whose strings reach a screen or a page as prose. */
const SHOWN = new Set(['title', 'label', 'detail', 'warnings', 'notes', 'note', 'finding', 'findings', 'caution', 'caveat', 'decidedBy', 'purchaseAdvice', 'text', 'message', 'summary']);

/** Every shown string in a result, with where it was found (for the failure message only). */
function shownTexts(x: unknown, at = '', shown = false, out: Array<{ at: string; text: string }> = []): Array<{ at: string; text: string }> {
  if (typeof x === 'string') {
    if (shown) out.push({ at, text: x });
  } else if (Array.isArray(x)) {
    x.forEach((v, i) => shownTexts(v, `${at}[${i}]`, shown, out));
  } else if (x !== null && typeof x === 'object') {
    for (const [k, v] of Object.entries(x)) shownTexts(v, `${at}.${k}`, SHOWN.has(k) || (shown && Array.isArray(x)), out);
  }
  return out;
}

/**
 * Key-shaped text: a camelCase identifier (two or more lower-case letters, then a capital:
 * 'repetitionRate', 'pulseEnergy_J'; units such as 'kHz' or 'mW' have one lower-case letter), an
 * identifier with a unit suffix ('power_W'; symbols such as alpha_min are the standards' own), or a colon-separated key ('rule:CP', 'aperture:eye:...').
 */
const KEY_SHAPED: ReadonlyArray<readonly [string, RegExp]> = [
  ['camelCase identifier', /\b[a-z]{2,}[A-Z]\w*/],
  ['identifier with a unit suffix', /\b[A-Za-z]{2,}_(?:W|J|Hz|s|m|nm|mm|rad|m2|Wm2|Jm2)\b/],
  ['colon-separated key', /\b[a-z]+:[A-Za-z0-9][^\s,;)]*/],
];

function keyShaped(texts: ReadonlyArray<{ at: string; text: string }>): string[] {
  const bad: string[] = [];
  for (const { at, text } of texts) for (const [what, re] of KEY_SHAPED) {
    const m = re.exec(text);
    if (m) bad.push(`${what} "${m[0]}" at ${at}: ${text}`);
  }
  return bad;
}

const rooms = (demo as unknown as { rooms: Array<{ code: string; input: RoomInput }> }).rooms;

const green = (extra: Partial<BeamInput>): BeamInput => ({
  wavelength_nm: 532,
  emission: { kind: 'cw', power_W: 1 },
  beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' },
  ...extra,
});

// [case, beam]: tolerances on every input, conservative mode on, pulsed trains, UV, near IR.
const BEAMS: ReadonlyArray<readonly [string, BeamInput]> = [
  ['CW green with power, divergence and diameter tolerances', green({ tolerances: { power: 0.1, divergence: 0.1, diameter: 0.2 } })],
  ['CW green with a tolerance that does not apply (energy)', green({ tolerances: { energy: 0.1 } })],
  ['1064 nm train, 10 ns at 1 kHz, tolerances on energy, pulse duration and repetition rate, conservative mode on', {
    wavelength_nm: 1064,
    emission: { kind: 'pulsed', pulseEnergy_J: 0.001, pulseDuration_s: 1e-8, repetitionRate_Hz: 1000 },
    beam: { diameter_m: 0.002, divergence_rad: 0.0005, definition: '1/e' },
    tolerances: { energy: 0.1, pulseDuration: 0.2, repetitionRate: 0.1 },
    settings: { conservative: true },
  }],
  ['1550 nm train, 1 ns at 10 kHz, conservative mode on', {
    wavelength_nm: 1550,
    emission: { kind: 'pulsed', pulseEnergy_J: 1e-4, pulseDuration_s: 1e-9, repetitionRate_Hz: 1e4 },
    beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' },
    tolerances: { repetitionRate: 0.1 },
    settings: { conservative: true },
  }],
  ['800 nm ultrafast train, 100 fs at 80 MHz, conservative mode on', {
    wavelength_nm: 800,
    emission: { kind: 'pulsed', pulseEnergy_J: 1e-8, pulseDuration_s: 1e-13, repetitionRate_Hz: 8e7 },
    beam: { diameter_m: 0.002, divergence_rad: 0.001, definition: '1/e' },
    settings: { conservative: true },
  }],
  ['308 nm UV, 100 s exposure, conservative mode on', {
    wavelength_nm: 308,
    emission: { kind: 'cw', power_W: 0.01 },
    beam: { diameter_m: 0.003, divergence_rad: 0.001, definition: '1/e' },
    exposureDuration_s: 100,
    tolerances: { power: 0.1 },
    settings: { conservative: true },
  }],
  ['266 nm UV pulses, 5 ns at 10 Hz, 1000 s exposure, conservative mode on', {
    wavelength_nm: 266,
    emission: { kind: 'pulsed', pulseEnergy_J: 0.001, pulseDuration_s: 5e-9, repetitionRate_Hz: 10 },
    beam: { diameter_m: 0.003, divergence_rad: 0.001, definition: '1/e' },
    exposureDuration_s: 1000,
    tolerances: { pulseDuration: 0.1, repetitionRate: 0.1 },
    settings: { conservative: true },
  }],
  ['10.6 µm CW, conservative mode on', {
    wavelength_nm: 10600,
    emission: { kind: 'cw', power_W: 10 },
    beam: { diameter_m: 0.005, divergence_rad: 0.002, definition: '1/e' },
    tolerances: { power: 0.05, divergence: 0.1 },
    settings: { conservative: true },
  }],
];

describe('no internal key in what the officer is shown', () => {
  it.each(rooms.map((r) => [r.code, r.input] as const))('demo room %s', (_code, input) => {
    const texts = shownTexts(evaluateRoom(input));
    expect(texts.length).toBeGreaterThan(10);
    expect(keyShaped(texts)).toEqual([]);
  });
  it.each(BEAMS)('%s', (_name, beam) => {
    const texts = shownTexts(evaluateBeam(beam));
    expect(texts.length).toBeGreaterThan(10);
    expect(keyShaped(texts)).toEqual([]);
  });
  // The words that replace the keys, as the warning and the trace show them. The entries are the
  // ones the tables mark unchecked: the UV eye aperture at t >= 10 s (3.5 mm in IEC 60825-1:2014 from
  // memory; the stricter 1 mm of older editions is kept, core/limits/tables/icnirp2013.ts) and the
  // remembered piecewise C_P (spec 4.6, core/limits/pulse-rules.ts).
  it.each([
    ['308 nm UV, 100 s exposure, conservative mode on', 'replaced by stricter values (the limiting aperture for the eye, 180-400 nm, 10 s-30 000 s)'],
    ['1064 nm train, 10 ns at 1 kHz, tolerances on energy, pulse duration and repetition rate, conservative mode on', 'the pulse correction factor C_P'],
  ])('the warning names the entry in words: %s', (name, words) => {
    const beam = BEAMS.find(([n]) => n === name)?.[1];
    expect(beam).toBeDefined();
    expect(evaluateBeam(beam as BeamInput).warnings.join('\n')).toContain(words);
  });
  it('the tolerance trace names the inputs by the form\'s labels', () => {
    const beam = BEAMS.find(([n]) => n.startsWith('1064 nm train'))?.[1] as BeamInput;
    const steps = evaluateBeam(beam).trace.children.find((t) => t.title.startsWith('Input tolerances'))?.steps ?? [];
    expect(steps.map((x) => x.label)).toEqual(expect.arrayContaining(['Energy per pulse tolerance', 'Pulse duration tolerance', 'Repetition rate tolerance']));
  });
  it('the scan finds the keys it looks for (a check of the check)', () => {
    const planted = [{ at: 'x', text: 'the repetitionRate tolerance' }, { at: 'y', text: 'replaced: aperture:eye:180-400:10-30000, rule:CP' }, { at: 'z', text: 'pulseEnergy_J' }];
    expect(keyShaped(planted)).toHaveLength(4);
  });
});
