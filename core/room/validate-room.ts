/**
 * Validation of a RoomInput's own fields (the beams are validated by the beam evaluation with
 * their path prefix, e.g. 'lasers[2].beams[0].wavelength_nm'). Every problem is an InputError
 * naming the field.
 */
import { InputError } from '../errors.js';
import type { EyewearSpec, RuleSetId } from '../model/inputs.js';
import { DEFAULT_RULE_SET, RULE_SET_IDS } from '../limits/rule-sets.js';
import { EN207_MODES, INPUT_RULES, LASER_CLASS_LABELS as CLASSES, SCALE_NUMBERS, TEXT_RULES, type TextRule } from '../model/input-rules.js';
import { requireRule, requireText } from '../beam/validate-beam.js';
import { validateSettings } from '../model/validate-settings.js';

function isObject(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

function requireString(field: string, x: unknown, rule: TextRule): string {
  return requireText(field, x, rule);
}

function requireArray(field: string, x: unknown, nonEmpty: boolean): unknown[] {
  if (!Array.isArray(x)) throw new InputError('missing', field, x, nonEmpty ? 'a list with at least one entry' : 'a list');
  if (nonEmpty && x.length === 0) throw new InputError('missing', field, x, 'a list with at least one entry');
  return x;
}

function band(field: string, o: Record<string, unknown>): void {
  const from = requireRule(`${field}.from_nm`, o['from_nm'], INPUT_RULES.wavelength_nm);
  const to = requireRule(`${field}.to_nm`, o['to_nm'], INPUT_RULES.wavelength_nm);
  if (from > to) throw new InputError('out_of_range', `${field}.to_nm`, to, `at least ${from} nm (the band goes from the shorter to the longer wavelength)`);
}

function integerIn(field: string, x: unknown, lo: number, hi: number): void {
  if (typeof x !== 'number' || !Number.isInteger(x) || x < lo || x > hi) throw new InputError('out_of_range', field, x, `a whole number from ${lo} to ${hi}`);
}

export function validateEyewear(x: unknown, field: string): EyewearSpec {
  if (!isObject(x)) throw new InputError('missing', field, x, 'an eyewear specification');
  requireString(`${field}.id`, x['id'], TEXT_RULES.eyewearTag);
  requireString(`${field}.label`, x['label'], TEXT_RULES.eyewearLabel);
  if (x['od'] !== undefined) {
    requireArray(`${field}.od`, x['od'], false).forEach((b, i) => {
      const f = `${field}.od[${i}]`;
      if (!isObject(b)) throw new InputError('missing', f, b, 'an object {from_nm, to_nm, od}');
      band(f, b);
      requireRule(`${f}.od`, b['od'], INPUT_RULES.opticalDensity);
    });
  }
  if (x['en207'] !== undefined) {
    requireArray(`${field}.en207`, x['en207'], false).forEach((b, i) => {
      const f = `${field}.en207[${i}]`;
      if (!isObject(b)) throw new InputError('missing', f, b, 'an object {from_nm, to_nm, modes, scale}');
      band(f, b);
      const modes = b['modes'];
      if (typeof modes !== 'string' || !EN207_MODES.test(modes)) throw new InputError('invalid_choice', `${f}.modes`, modes, "letters of 'DIRM', e.g. 'DIR'");
      integerIn(`${f}.scale`, b['scale'], SCALE_NUMBERS.en207.min, SCALE_NUMBERS.en207.max);
    });
  }
  if (x['en208'] !== undefined) {
    requireArray(`${field}.en208`, x['en208'], false).forEach((b, i) => {
      const f = `${field}.en208[${i}]`;
      if (!isObject(b)) throw new InputError('missing', f, b, 'an object {from_nm, to_nm, scale}');
      band(f, b);
      integerIn(`${f}.scale`, b['scale'], SCALE_NUMBERS.en208.min, SCALE_NUMBERS.en208.max);
    });
  }
  if (x['visibleTransmission'] !== undefined) requireRule(`${field}.visibleTransmission`, x['visibleTransmission'], INPUT_RULES.visibleTransmission);
  return x as unknown as EyewearSpec;
}

/** Check the room's own fields; returns the room's rule set (stated, or the first beam's, or the default). */
export function validateRoomShape(input: unknown): RuleSetId {
  if (!isObject(input)) throw new InputError('missing', '(room input)', input, 'an object {lasers, eyewear?, ruleSet?}');
  let ruleSet: RuleSetId | undefined;
  if (input['ruleSet'] !== undefined) {
    if (typeof input['ruleSet'] !== 'string' || !RULE_SET_IDS.includes(input['ruleSet'] as RuleSetId)) {
      throw new InputError('invalid_choice', 'ruleSet', input['ruleSet'], RULE_SET_IDS.map((r) => `'${r}'`).join(' | '));
    }
    ruleSet = input['ruleSet'] as RuleSetId;
  }
  validateSettings('settings', input['settings']);
  const lasers = requireArray('lasers', input['lasers'], true);
  const laserIds = new Set<string>();
  const beamIds = new Set<string>();
  lasers.forEach((l, i) => {
    const f = `lasers[${i}]`;
    if (!isObject(l)) throw new InputError('missing', f, l, 'a laser {id, name, beams}');
    const id = requireString(`${f}.id`, l['id'], TEXT_RULES.laserId);
    if (laserIds.has(id)) throw new InputError('invalid_choice', `${f}.id`, id, 'an id not used by another laser of the room');
    laserIds.add(id);
    requireString(`${f}.name`, l['name'], TEXT_RULES.laserName);
    if (l['classAsLabelled'] !== undefined && !CLASSES.includes(l['classAsLabelled'] as (typeof CLASSES)[number])) {
      throw new InputError('invalid_choice', `${f}.classAsLabelled`, l['classAsLabelled'], CLASSES.map((c) => `'${c}'`).join(' | '));
    }
    requireArray(`${f}.beams`, l['beams'], true).forEach((b, j) => {
      if (!isObject(b)) throw new InputError('missing', `${f}.beams[${j}]`, b, 'a beam');
      const bid = b['id'] === undefined ? `${id}-b${j}` : requireString(`${f}.beams[${j}].id`, b['id'], TEXT_RULES.beamId);
      if (beamIds.has(bid)) throw new InputError('invalid_choice', `${f}.beams[${j}].id`, bid, 'an id not used by another beam of the room');
      beamIds.add(bid);
      if (ruleSet === undefined && typeof b['ruleSet'] === 'string' && RULE_SET_IDS.includes(b['ruleSet'] as RuleSetId)) ruleSet = b['ruleSet'] as RuleSetId;
    });
  });
  if (input['eyewear'] !== undefined) {
    const ids = new Set<string>();
    requireArray('eyewear', input['eyewear'], false).forEach((e, k) => {
      const ew = validateEyewear(e, `eyewear[${k}]`);
      if (ids.has(ew.id)) throw new InputError('invalid_choice', `eyewear[${k}].id`, ew.id, 'an id not used by other eyewear of the room');
      ids.add(ew.id);
    });
  }
  if (input['exposurePlaces'] !== undefined) {
    const placed = new Set<string>();
    requireArray('exposurePlaces', input['exposurePlaces'], false).forEach((p, k) => {
      const f = `exposurePlaces[${k}]`;
      if (!isObject(p)) throw new InputError('missing', f, p, 'a place {place, beamIds}');
      requireString(`${f}.place`, p['place'], TEXT_RULES.placeName);
      requireArray(`${f}.beamIds`, p['beamIds'], false).forEach((id, n) => {
        const bid = requireString(`${f}.beamIds[${n}]`, id, TEXT_RULES.beamId);
        if (!beamIds.has(bid)) throw new InputError('invalid_choice', `${f}.beamIds[${n}]`, bid, 'the id of a beam of this room');
        // a beam reaching two places would be counted in two sums; it belongs to one place
        if (placed.has(bid)) throw new InputError('invalid_choice', `${f}.beamIds[${n}]`, bid, 'a beam named in one place only');
        placed.add(bid);
      });
    });
  }
  return ruleSet ?? DEFAULT_RULE_SET;
}
