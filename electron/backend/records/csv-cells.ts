/**
 * Reading one quantity cell of the laser inventory CSV, in officer words: what the cell was read as
 * ("= 450 mJ per pulse"), why it could not be read ("'mW' is not an energy unit"), and a
 * plausibility question for an allowed but unusual value. The column's rule comes from the core's
 * one table (core/model/input-rules.ts), so the CSV refuses exactly what the register refuses.
 *
 * Commas: in a comma-separated file a comma inside a quantity ("1,500 mW" in quotes) is a thousands
 * separator that would otherwise be read as a decimal mark (1.5 mW, a 1000-fold under-estimate);
 * it is refused with the two ways to write it. Decimal commas are read only in semicolon files.
 */
import {
  DIMENSION_WORDS,
  INPUT_RULES,
  InputError,
  inRange,
  parseQuantity,
  plausibilityQuestion,
  rangeWords,
  readBack,
  type Dimension,
  type NumberRule,
  type ReadBackStyle,
} from '../../../core/index.js';

export interface QuantityColumn {
  readonly dim: Dimension;
  /** Unit a bare number is read in (stated in the README's column table). */
  readonly unit: string;
  readonly rule: NumberRule;
  /** The stored value is the SI value times this (wavelengths are stored in nm). */
  readonly storedPerSI: number;
  readonly style: ReadBackStyle;
  /** Words after the read-back value ("per pulse"). */
  readonly phrase: string;
  readonly example: string;
}

const R = INPUT_RULES;
/** Quantity columns and the unit a bare number is read in (what data sheets usually print). */
export const QUANTITY_COLUMNS: Readonly<Record<string, QuantityColumn>> = {
  wavelength: { dim: 'wavelength', unit: 'nm', rule: R.wavelength_nm, storedPerSI: 1e9, style: 'nm', phrase: '', example: '1064 nm' },
  power: { dim: 'power', unit: 'W', rule: R.power_W, storedPerSI: 1, style: 'prefix', phrase: 'output power', example: '5 mW' },
  pulse_energy: { dim: 'energy', unit: 'J', rule: R.pulseEnergy_J, storedPerSI: 1, style: 'prefix', phrase: 'per pulse', example: '4 mJ' },
  pulse_duration: { dim: 'time', unit: 's', rule: R.pulseDuration_s, storedPerSI: 1, style: 'prefix', phrase: 'per pulse', example: '10 ns' },
  repetition_rate: { dim: 'frequency', unit: 'Hz', rule: R.repetitionRate_Hz, storedPerSI: 1, style: 'prefix', phrase: 'pulses per second', example: '1 kHz' },
  beam_diameter: { dim: 'length', unit: 'mm', rule: R.diameter_m, storedPerSI: 1, style: 'mm', phrase: 'at the exit', example: '2 mm' },
  divergence: { dim: 'angle', unit: 'mrad', rule: R.divergence_rad, storedPerSI: 1, style: 'mrad', phrase: 'full angle', example: '0.5 mrad' },
  exposure_duration: { dim: 'time', unit: 's', rule: R.exposureDuration_s, storedPerSI: 1, style: 'prefix', phrase: 'exposure', example: '0.25 s' },
};

export type CellReading =
  | { readonly ok: true; readonly stored: number; readonly readAs: string; readonly question: string | null }
  | { readonly ok: false; readonly problem: string };

/** Read one quantity cell; never throws. */
export function readQuantityCell(column: string, text: string, delimiter: ',' | ';'): CellReading {
  const spec = QUANTITY_COLUMNS[column];
  if (!spec) return { ok: false, problem: 'not a quantity column' };
  const what = DIMENSION_WORDS[spec.dim];
  let si: number;
  try {
    si = parseQuantity(column, text, spec.dim, spec.unit, delimiter === ',' ? 'refuse' : 'decimal').value.toNumber();
  } catch (e) {
    if (e instanceof InputError) {
      if (e.code === 'unknown_unit') {
        const unit = /'([^']*)'/.exec(e.message)?.[1] ?? '';
        return { ok: false, problem: `"${text}": '${unit}' is not ${what} unit (write e.g. "${spec.example}"; a bare number is read in ${spec.unit})` };
      }
      if (e.code === 'unparseable' && text.includes(',')) {
        return { ok: false, problem: `"${text}": ${e.message.slice(e.message.indexOf(': ') + 2).replace(/ \(got .*$/, '')}` };
      }
    }
    return { ok: false, problem: `"${text}" is not ${what} (write e.g. "${spec.example}"; a bare number is read in ${spec.unit})` };
  }
  const stored = Number((si * spec.storedPerSI).toPrecision(15));
  const readAs = `${readBack(si, spec.dim, spec.style)}${spec.phrase ? ` ${spec.phrase}` : ''}`;
  if (!inRange(spec.rule, stored)) {
    return { ok: false, problem: `"${text}" was read as ${readAs}; ${spec.rule.label.toLowerCase()} must be ${rangeWords(spec.rule)}${spec.rule.why ? ` (${spec.rule.why})` : ''}` };
  }
  return { ok: true, stored, readAs, question: plausibilityQuestion(spec.rule, stored) };
}
