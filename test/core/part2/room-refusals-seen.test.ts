// Refusals of a room's own fields as the officer meets them (through evaluateRoom): every unusable
// laser, eyewear entry or place is refused with an InputError naming the field by its position in
// the room, a code, and the valid range in words; the edges of each range are accepted. Ranges: the
// one input-rule table (core/model/input-rules.ts, ours): optical density 0 to 20, visible
// transmission 0 to 1, the scale numbers LB1-LB10 (EN 207:2017, read) and RB1-RB5 (EN 208:2009,
// read), the EN 207 test conditions D, I, R, M (EN 207:2017 Table 1, read), the laser classes of
// IEC 60825-1:2014 (1, 1M, 2, 2M, 3R, 3B, 4). Uniqueness of ids and one place per beam: ours (a beam
// in two places would be counted in two sums; SAFETY.md "Additive rule by place").
import { describe, expect, it } from 'vitest';
import { evaluateRoom, type BeamInput, type RoomInput } from '../../../core/index.js';
import { refusal } from '../refusal.js';


type Loose = Record<string, unknown>;
const cw = (id?: string, extra: Loose = {}): Loose => ({ ...(id === undefined ? {} : { id }), wavelength_nm: 532, emission: { kind: 'cw', power_W: 0.001 }, beam: { diameter_m: 0.001, divergence_rad: 0.001, definition: '1/e' }, ...extra });
const laser = (extra: Loose = {}): Loose => ({ id: 'A', name: 'Laser A', beams: [cw('a1')], ...extra });
const room = (extra: Loose = {}): unknown => ({ lasers: [laser()], ...extra });
const goggles = (extra: Loose = {}): Loose => ({ id: 'E', label: 'Goggles E', ...extra });
const withEyewear = (extra: Loose): unknown => room({ eyewear: [goggles(extra)] });

const CASES: ReadonlyArray<readonly [string, string, string, unknown]> = [
  ['no room input at all', '(room input)', 'missing', null],
  ['a list instead of a room', '(room input)', 'missing', [laser()]],
  ['an unknown rule set', 'ruleSet', 'invalid_choice', room({ ruleSet: 'ansi1986' })],
  ['a rule set that is not a word', 'ruleSet', 'invalid_choice', room({ ruleSet: 2006 })],
  ['settings not an object', 'settings', 'missing', room({ settings: 7 })],
  ['no lasers', 'lasers', 'missing', { eyewear: [] }],
  ['an empty list of lasers', 'lasers', 'missing', { lasers: [] }],
  ['lasers not a list', 'lasers', 'missing', { lasers: laser() }],
  ['a laser that is not an object', 'lasers[0]', 'missing', { lasers: [null] }],
  ['a laser given as a list', 'lasers[0]', 'missing', { lasers: [[laser()]] }],
  ['a laser without id', 'lasers[0].id', 'missing', { lasers: [laser({ id: undefined })] }],
  ['two lasers with one id', 'lasers[1].id', 'invalid_choice', { lasers: [laser(), laser({ beams: [cw('b1')] })] }],
  ['a laser without name', 'lasers[0].name', 'missing', { lasers: [laser({ name: '' })] }],
  ['an unknown labelled class', 'lasers[0].classAsLabelled', 'invalid_choice', { lasers: [laser({ classAsLabelled: '3A' })] }],
  ['a laser without beams', 'lasers[0].beams', 'missing', { lasers: [laser({ beams: undefined })] }],
  ['a laser with an empty list of beams', 'lasers[0].beams', 'missing', { lasers: [laser({ beams: [] })] }],
  ['a beam that is not an object', 'lasers[0].beams[0]', 'missing', { lasers: [laser({ beams: [7] })] }],
  ['a beam with an empty id', 'lasers[0].beams[0].id', 'missing', { lasers: [laser({ beams: [cw('')] })] }],
  ['two beams of two lasers with one id', 'lasers[1].beams[0].id', 'invalid_choice', { lasers: [laser(), laser({ id: 'B', beams: [cw('a1')] })] }],
  ["a beam named as another beam's default name", 'lasers[0].beams[1].id', 'invalid_choice', { lasers: [laser({ beams: [cw(), cw('A-b0')] })] }],
  ['the second beam of a room without a rule set differs from the first', 'lasers[0].beams[1].ruleSet', 'invalid_choice', { lasers: [laser({ beams: [cw('a1', { ruleSet: 'eu2006' }), cw('a2', { ruleSet: 'icnirp2013' })] })] }],
  ['eyewear not a list', 'eyewear', 'missing', room({ eyewear: goggles() })],
  ['eyewear that is not an object', 'eyewear[0]', 'missing', room({ eyewear: ['EW-1'] })],
  ['eyewear without tag', 'eyewear[0].id', 'missing', withEyewear({ id: undefined })],
  ['eyewear without description', 'eyewear[0].label', 'missing', withEyewear({ label: '' })],
  ['two eyewear with one tag', 'eyewear[1].id', 'invalid_choice', room({ eyewear: [goggles(), goggles({ label: 'Other goggles' })] })],
  ['OD bands not a list', 'eyewear[0].od', 'missing', withEyewear({ od: { from_nm: 500, to_nm: 600, od: 4 } })],
  ['an OD band that is not an object', 'eyewear[0].od[0]', 'missing', withEyewear({ od: [4] })],
  ['an OD band from 100 nm', 'eyewear[0].od[0].from_nm', 'out_of_range', withEyewear({ od: [{ from_nm: 100, to_nm: 600, od: 4 }] })],
  ['an OD band without its end', 'eyewear[0].od[0].to_nm', 'missing', withEyewear({ od: [{ from_nm: 500, od: 4 }] })],
  ['an OD band ending before it starts', 'eyewear[0].od[0].to_nm', 'out_of_range', withEyewear({ od: [{ from_nm: 600, to_nm: 599, od: 4 }] })],
  ['OD 21', 'eyewear[0].od[0].od', 'out_of_range', withEyewear({ od: [{ from_nm: 500, to_nm: 600, od: 21 }] })],
  ['EN 207 markings not a list', 'eyewear[0].en207', 'missing', withEyewear({ en207: 'D LB5' })],
  ['an EN 207 marking that is not an object', 'eyewear[0].en207[0]', 'missing', withEyewear({ en207: [null] })],
  ['an EN 207 marking ending before it starts', 'eyewear[0].en207[0].to_nm', 'out_of_range', withEyewear({ en207: [{ from_nm: 1064, to_nm: 1000, modes: 'D', scale: 5 }] })],
  ['EN 207 test conditions not letters', 'eyewear[0].en207[0].modes', 'invalid_choice', withEyewear({ en207: [{ from_nm: 1064, to_nm: 1064, modes: 4, scale: 5 }] })],
  ['EN 207 test condition X', 'eyewear[0].en207[0].modes', 'invalid_choice', withEyewear({ en207: [{ from_nm: 1064, to_nm: 1064, modes: 'DX', scale: 5 }] })],
  ['no EN 207 test condition', 'eyewear[0].en207[0].modes', 'invalid_choice', withEyewear({ en207: [{ from_nm: 1064, to_nm: 1064, modes: '', scale: 5 }] })],
  ['LB0', 'eyewear[0].en207[0].scale', 'out_of_range', withEyewear({ en207: [{ from_nm: 1064, to_nm: 1064, modes: 'D', scale: 0 }] })],
  ['LB11', 'eyewear[0].en207[0].scale', 'out_of_range', withEyewear({ en207: [{ from_nm: 1064, to_nm: 1064, modes: 'D', scale: 11 }] })],
  ['LB 5.5', 'eyewear[0].en207[0].scale', 'out_of_range', withEyewear({ en207: [{ from_nm: 1064, to_nm: 1064, modes: 'D', scale: 5.5 }] })],
  ['LB given as text', 'eyewear[0].en207[0].scale', 'out_of_range', withEyewear({ en207: [{ from_nm: 1064, to_nm: 1064, modes: 'D', scale: '5' }] })],
  ['EN 208 markings not a list', 'eyewear[0].en208', 'missing', withEyewear({ en208: 3 })],
  ['an EN 208 marking that is not an object', 'eyewear[0].en208[0]', 'missing', withEyewear({ en208: ['RB3'] })],
  ['an EN 208 marking from 2000 mm', 'eyewear[0].en208[0].from_nm', 'out_of_range', withEyewear({ en208: [{ from_nm: 2e9, to_nm: 2e9, scale: 3 }] })],
  ['RB0', 'eyewear[0].en208[0].scale', 'out_of_range', withEyewear({ en208: [{ from_nm: 532, to_nm: 532, scale: 0 }] })],
  ['RB6', 'eyewear[0].en208[0].scale', 'out_of_range', withEyewear({ en208: [{ from_nm: 532, to_nm: 532, scale: 6 }] })],
  ['visible transmission 120 %', 'eyewear[0].visibleTransmission', 'out_of_range', withEyewear({ visibleTransmission: 1.2 })],
  ['places not a list', 'exposurePlaces', 'missing', room({ exposurePlaces: { place: 'bench', beamIds: ['a1'] } })],
  ['a place that is not an object', 'exposurePlaces[0]', 'missing', room({ exposurePlaces: ['bench'] })],
  ['a place without name', 'exposurePlaces[0].place', 'missing', room({ exposurePlaces: [{ beamIds: ['a1'] }] })],
  ['a place without its beams', 'exposurePlaces[0].beamIds', 'missing', room({ exposurePlaces: [{ place: 'bench' }] })],
  ['a place naming a beam by number', 'exposurePlaces[0].beamIds[0]', 'missing', room({ exposurePlaces: [{ place: 'bench', beamIds: [1] }] })],
  ['a place naming no beam of the room', 'exposurePlaces[0].beamIds[0]', 'invalid_choice', room({ exposurePlaces: [{ place: 'bench', beamIds: ['b9'] }] })],
  ['a beam in two places', 'exposurePlaces[1].beamIds[0]', 'invalid_choice', room({ exposurePlaces: [{ place: 'bench', beamIds: ['a1'] }, { place: 'door', beamIds: ['a1'] }] })],
];

describe('room refusals: the field, by its position in the room, and the code', () => {
  it.each(CASES)('%s: %s (%s)', (_name, field, code, input) => {
    const e = refusal(() => evaluateRoom(input as RoomInput));
    expect([e.field, e.code]).toEqual([field, code]);
  });
});

describe('the valid range in words', () => {
  it.each([
    ['rule set', room({ ruleSet: 'ansi1986' }), "'icnirp2013' | 'eu2006'"],
    ['no lasers', { lasers: [] }, 'a list with at least one entry'],
    ['eyewear not a list', room({ eyewear: 'none' }), 'a list'],
    ['labelled class', { lasers: [laser({ classAsLabelled: '3A' })] }, "'1' | '1M' | '2' | '2M' | '3R' | '3B' | '4'"],
    ['band end', withEyewear({ od: [{ from_nm: 600, to_nm: 599, od: 4 }] }), 'at least 600 nm (the band goes from the shorter to the longer wavelength)'],
    ['LB', withEyewear({ en207: [{ from_nm: 1064, to_nm: 1064, modes: 'D', scale: 0 }] }), 'a whole number from 1 to 10'],
    ['RB', withEyewear({ en208: [{ from_nm: 532, to_nm: 532, scale: 6 }] }), 'a whole number from 1 to 5'],
  ] as const)('%s', (_n, input, words) => {
    expect(refusal(() => evaluateRoom(input as RoomInput)).validRange).toBe(words);
  });
});

describe('accepted at the edges of each range', () => {
  const b = (id: string, extra: Partial<BeamInput> = {}): BeamInput => cw(id, extra) as unknown as BeamInput;
  it('every optional field at an edge: the room is evaluated', () => {
    const input: RoomInput = {
      lasers: [
        { id: 'A', name: 'Laser A', classAsLabelled: '3B', beams: [b('a1'), b('a2')] },
        { id: 'B', name: 'Laser B', beams: [cw() as unknown as BeamInput] },
      ],
      eyewear: [
        { id: 'E1', label: 'Goggles E1', od: [{ from_nm: 532, to_nm: 532, od: 0 }, { from_nm: 180, to_nm: 1e6, od: 20 }], visibleTransmission: 0 },
        { id: 'E2', label: 'Goggles E2', en207: [{ from_nm: 532, to_nm: 532, modes: 'DIRM', scale: 1 }, { from_nm: 1064, to_nm: 1064, modes: 'M', scale: 10 }], en208: [{ from_nm: 532, to_nm: 532, scale: 1 }, { from_nm: 633, to_nm: 633, scale: 5 }], visibleTransmission: 1 },
      ],
      exposurePlaces: [{ place: 'bench', beamIds: ['a1', 'B-b0'] }, { place: 'nowhere yet', beamIds: [] }],
    };
    const r = evaluateRoom(input);
    expect(r.beams.map((x) => x.beamId)).toEqual(['a1', 'a2', 'B-b0']);
    expect(r.coverage).toHaveLength(6);
    expect(r.additive.map((g) => [g.place, g.beamIds])).toEqual([
      ['bench', ['a1', 'B-b0']],
      ['bench', ['a1', 'B-b0']],
    ]);
  });
  it('a room without a rule set takes its first beam\'s (EU Directive 2006/25/EC here), else ICNIRP 2013', () => {
    expect(evaluateRoom({ lasers: [{ id: 'A', name: 'Laser A', beams: [b('a1'), b('a2', { ruleSet: 'eu2006' })] }] }).ruleSet).toBe('eu2006');
    expect(evaluateRoom({ lasers: [{ id: 'A', name: 'Laser A', beams: [b('a1')] }] }).ruleSet).toBe('icnirp2013');
    expect(evaluateRoom({ ruleSet: 'eu2006', lasers: [{ id: 'A', name: 'Laser A', beams: [b('a1')] }] }).ruleSet).toBe('eu2006');
  });
  it('eyewear with empty lists of OD bands and markings is accepted: it protects at no wavelength', () => {
    const r = evaluateRoom({ lasers: [{ id: 'A', name: 'Laser A', beams: [b('a1')] }], eyewear: [{ id: 'E', label: 'Goggles E', od: [], en207: [], en208: [] }] });
    expect(r.coverage.map((v) => [v.eyewearId, v.odMargin])).toEqual([['E', null]]);
  });
  it('no eyewear and no places listed: an empty shelf, the default places', () => {
    const r = evaluateRoom({ lasers: [{ id: 'A', name: 'Laser A', beams: [b('a1'), b('a2')] }], eyewear: [], exposurePlaces: [] });
    expect(r.coverage).toEqual([]);
    expect(r.additive.map((g) => g.place)).toEqual(['the path of Laser A', 'the path of Laser A']);
  });
});
