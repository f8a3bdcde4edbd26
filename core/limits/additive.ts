/**
 * Several wavelengths on the same tissue: exposures whose effects add are assessed together, the sum
 * of each exposure's fraction of its own limit must not exceed 1 (limit specification section 3,
 * "Multiple wavelengths"; EU Directive 2006/25/EC and IEC 60825-1 state the same principle).
 *
 * WHICH effects add is given by the additivity table of IEC 60825-1 (and BGI 832 Tabelle 1), whose
 * exact cells are not reproduced in our specification (section 3 and open point 10.9). Until that
 * table is taken from the original, the grouping here is OURS and deliberately broad (grouping
 * more exposures together can only raise a sum, the safe direction):
 *   - eye, retina, thermal       (retinal thermal rows, 400-1400 nm);
 *   - eye, retina, photochemical (blue-light rows, 400-600 nm);
 *   - eye, cornea and lens       (every other eye row: UV photochemical and thermal, IR-B/C thermal,
 *                                 and the corneal dual limit from the skin table);
 *   - skin                       (every skin row, all bands).
 * An exposure counts in every group that any of its applicable rows belongs to, each time against
 * the lowest row of that group (dual limits act separately; the lower one is only the governing
 * limit of one wavelength). A pulsed exposure is compared with its governing per-pulse limit in
 * every group it touches, which is never less strict than a group's own row.
 */
import { Dec, recordString } from '../numeric/decimal.js';
import { ratioReported } from '../numeric/safe-rounding.js';
import { InputError } from '../errors.js';
import type { Tissue } from '../model/inputs.js';
import { addStep, newTrace, type Trace } from '../trace/trace.js';
import type { ExposureLimitResult, LimitCandidate } from './exposure-limit.js';
import type { PulsedLimitResult } from './pulse-rules.js';

export type HazardGroup = 'eye:retina-thermal' | 'eye:retina-photochemical' | 'eye:cornea-lens' | 'skin';

export const HAZARD_GROUP_LABEL: Readonly<Record<HazardGroup, string>> = {
  'eye:retina-thermal': 'eye, retina, thermal',
  'eye:retina-photochemical': 'eye, retina, photochemical',
  'eye:cornea-lens': 'eye, cornea and lens',
  skin: 'skin',
};

const GROUPING_SOURCE = 'ours, pending the additivity table of IEC 60825-1 (limit specification sections 3 and 10)';

export type AdditiveItem = (
  | {
      readonly label: string;
      /** Radiant exposure at the tissue over the limit's duration, averaged over its limiting aperture, J/m². */
      readonly H_Jm2: number | string;
      readonly limit: ExposureLimitResult;
    }
  | {
      readonly label: string;
      /** Radiant exposure per pulse at the tissue, averaged over the limiting aperture, J/m². */
      readonly H_Jm2: number | string;
      readonly pulsed: PulsedLimitResult;
    }
) & {
  /**
   * Optional: the same exposure averaged over another aperture (diameter in m). Given, each row is
   * compared with the exposure over its own aperture and the row with the largest fraction stands
   * for its group (at an exact band edge the rows of one group can have different apertures).
   */
  readonly exposureOver?: (aperture_m: string) => Dec;
};

export interface AdditiveTerm {
  readonly label: string;
  readonly wavelength_nm: number;
  readonly H_Jm2: string;
  /** Limit the exposure is compared with in this group, J/m² (per pulse for pulsed items). */
  readonly limit_H_Jm2: string;
  readonly rowId: string;
  readonly effect: string;
  /** H / limit, full precision. */
  readonly fraction: string;
}

export interface AdditiveGroupResult {
  readonly group: HazardGroup;
  readonly tissue: Tissue;
  readonly label: string;
  readonly terms: readonly AdditiveTerm[];
  /** Sum of fractions, full precision. */
  readonly sum: string;
  /** Rounded UP to 3 significant figures (a fraction of a limit is an exposure: up is safe). */
  readonly sum_reported: string;
  readonly exceeds: boolean;
}

export interface AdditiveResult {
  readonly groups: readonly AdditiveGroupResult[];
  /** The group with the largest sum. */
  readonly governing: AdditiveGroupResult;
  readonly maxSum: string;
  readonly maxSum_reported: string;
  /** True when every group's sum is at most 1. */
  readonly withinLimits: boolean;
  readonly trace: Trace;
}

/** The hazard group of one applicable row (see the header for why the groups are this broad). */
export function hazardGroupOf(tissue: Tissue, c: LimitCandidate): HazardGroup {
  if (tissue === 'skin') return 'skin';
  if (c.tissueTable === 'eye' && c.effectClass === 'retina-thermal') return 'eye:retina-thermal';
  if (c.tissueTable === 'eye' && c.effectClass === 'retina-photochemical') return 'eye:retina-photochemical';
  return 'eye:cornea-lens';
}

function fmt(d: Dec): string {
  return d.toSignificantDigits(6).toString();
}

function readExposure(i: number, x: unknown): Dec {
  const field = `items[${i}].H_Jm2`;
  if (typeof x !== 'number' && typeof x !== 'string') throw new InputError('missing', field, x, 'a radiant exposure >= 0 J/m²');
  let d: Dec;
  try {
    d = new Dec(x);
  } catch {
    throw new InputError('unparseable', field, x, 'a radiant exposure >= 0 J/m²');
  }
  if (!d.isFinite()) throw new InputError('not_finite', field, x, 'a radiant exposure >= 0 J/m²');
  if (d.isNeg()) throw new InputError('out_of_range', field, x, 'a radiant exposure >= 0 J/m²');
  return d;
}

/**
 * Per group: the most restrictive applicable row of that group for one limit result: the lowest
 * limit, or, with the exposure per aperture, the largest exposure/limit fraction.
 */
function lowestPerGroup(limit: ExposureLimitResult, exposureOver?: (aperture_m: string) => Dec): Map<HazardGroup, LimitCandidate> {
  const out = new Map<HazardGroup, { c: LimitCandidate; key: Dec }>();
  for (const c of limit.candidates) {
    const g = hazardGroupOf(limit.tissue, c);
    const prev = out.get(g);
    // key: the fraction per unit exposure (1/H) or the fraction itself; larger is more restrictive
    const key = exposureOver ? exposureOver(c.aperture.diameter_m).div(c.H_Jm2) : new Dec(1).div(c.H_Jm2);
    if (!prev || key.gt(prev.key)) out.set(g, { c, key });
  }
  return new Map([...out].map(([g, v]) => [g, v.c]));
}

/**
 * Sum of exposure / limit fractions per tissue and hazard group. Throws InputError (field
 * 'items' or 'items[i].H_Jm2') for bad input.
 */
export function additiveFractions(items: readonly AdditiveItem[]): AdditiveResult {
  if (!Array.isArray(items) || items.length === 0) throw new InputError('missing', 'items', items, 'at least one exposure');
  const terms = new Map<HazardGroup, AdditiveTerm[]>();
  const trace = newTrace(`Several wavelengths: sum of fractions of the limit (${items.length} exposures)`);
  addStep(trace, {
    kind: 'assumption',
    label: 'Grouping',
    detail: 'exposures add within: eye retina thermal; eye retina photochemical; eye cornea and lens; skin. An exposure counts in every group one of its applicable rows belongs to.',
    source: GROUPING_SOURCE,
    confidence: 'ours',
  });
  const durations = new Map<Tissue, Set<number>>();
  items.forEach((item, i) => {
    const H = readExposure(i, item.H_Jm2);
    const single = 'limit' in item ? item.limit : item.pulsed.singlePulse.limit;
    const d = durations.get(single.tissue) ?? new Set<number>();
    d.add('limit' in item ? single.duration_s : (item.pulsed.averagePower?.limit.duration_s ?? single.duration_s));
    durations.set(single.tissue, d);
    const perGroup = lowestPerGroup(single, item.exposureOver);
    if ('pulsed' in item && item.pulsed.averagePower) {
      // rule 2 rows may belong to a group the single pulse does not reach (e.g. photochemical at T)
      for (const [g, c] of lowestPerGroup(item.pulsed.averagePower.limit, item.exposureOver)) if (!perGroup.has(g)) perGroup.set(g, c);
    }
    for (const [g, c] of perGroup) {
      const limitH = 'limit' in item ? new Dec(c.H_Jm2) : new Dec(item.pulsed.perPulse_H_Jm2);
      // never below the exposure given for the item (the governing aperture's): safe side
      const Hrow = item.exposureOver ? Dec.max(H, item.exposureOver(c.aperture.diameter_m)) : H;
      const fraction = Hrow.div(limitH);
      const term: AdditiveTerm = {
        label: item.label,
        wavelength_nm: single.wavelength_nm,
        H_Jm2: recordString(Hrow),
        limit_H_Jm2: recordString(limitH),
        rowId: 'limit' in item ? c.rowId : `${c.rowId} (governing per-pulse limit, ${item.pulsed.governingRule})`,
        effect: c.effect,
        fraction: recordString(fraction),
      };
      const list = terms.get(g) ?? [];
      list.push(term);
      terms.set(g, list);
    }
  });
  for (const [tissue, set] of durations) {
    if (set.size > 1) {
      addStep(trace, {
        kind: 'warning',
        label: 'Durations differ',
        detail: `${tissue}: the limits were evaluated for different exposure durations (${[...set].join(', ')} s); each fraction is taken over its own duration`,
      });
    }
  }
  const groups: AdditiveGroupResult[] = [];
  for (const [g, list] of terms) {
    const sum = list.reduce((s, t) => s.plus(t.fraction), new Dec(0));
    const group: AdditiveGroupResult = {
      group: g,
      tissue: g === 'skin' ? 'skin' : 'eye',
      label: HAZARD_GROUP_LABEL[g],
      terms: list,
      sum: recordString(sum),
      sum_reported: ratioReported(sum),
      exceeds: sum.gt(1),
    };
    groups.push(group);
    addStep(trace, {
      kind: 'formula',
      label: `Sum, ${group.label}`,
      detail: list.map((t) => `${t.label} (${t.wavelength_nm} nm, row ${t.rowId}): ${fmt(new Dec(t.H_Jm2))} / ${fmt(new Dec(t.limit_H_Jm2))}`).join(' + '),
      value: fmt(sum),
      source: GROUPING_SOURCE,
      confidence: 'ours',
    });
  }
  let governing = groups[0] as AdditiveGroupResult;
  for (const g of groups) if (new Dec(g.sum).gt(governing.sum)) governing = g;
  const max = new Dec(governing.sum);
  const withinLimits = groups.every((g) => !g.exceeds);
  addStep(trace, {
    kind: 'result',
    label: 'Largest sum',
    detail: `${governing.label}: ${withinLimits ? 'at most 1, within the limits' : 'above 1, the combined exposure exceeds the limit'} (rounded up: ${ratioReported(max)})`,
    value: fmt(max),
  });
  return {
    groups,
    governing,
    maxSum: recordString(max),
    maxSum_reported: ratioReported(max),
    withinLimits,
    trace,
  };
}
