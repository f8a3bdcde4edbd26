/** Display helpers. Values from the core are already rounded in the safe direction; re-rounding here keeps that direction. */
import { dec, formatDensity, formatSI, plain, roundPlaces, roundSig, type UnitHabit } from '../../core/index.js';
import type { LimitSummary, ScaleNumberRequirement } from '../../core/model/results.js';

/** A distance in metres (decimal string), rounded UP to 3 significant figures, mm below 10 cm. */
export function distance(m: string | null | undefined): string {
  if (m === null || m === undefined) return '—';
  const v = dec(m);
  if (v.isZero()) return '0 m';
  if (v.lt('0.1')) return formatSI(m, 'm', 3, 'up');
  if (v.gte(10000)) return `${plain(roundSig(v.div(1000), 3, 'up'))} km`;
  return `${plain(roundSig(v, 3, 'up'))} m`;
}

/** The governing eye limit in the officer's unit habit, rounded DOWN. */
export function limitText(l: LimitSummary, habit: UnitHabit, pulsed: boolean): string {
  if (pulsed) return `${formatDensity(l.H_Jm2_reported, 'radiantExposure', habit, 'down').text} per pulse`;
  return formatDensity(l.E_Wm2_reported, 'irradiance', habit, 'down').text;
}

export function limitBoth(l: LimitSummary, habit: UnitHabit): { H: string; E: string } {
  return {
    H: formatDensity(l.H_Jm2_reported, 'radiantExposure', habit, 'down').text,
    E: formatDensity(l.E_Wm2_reported, 'irradiance', habit, 'down').text,
  };
}

export function seconds(s: number): string {
  return formatSI(String(s), 's', 4, 'up');
}

export const RULE_NAME: Readonly<Record<string, string>> = {
  cw: 'continuous exposure',
  'single-pulse': 'single pulse',
  'average-power': 'average power',
  'pulse-train': 'pulse train (C_P)',
};

/** "LB5 D" style list of the scale numbers that apply (zero = none needed). */
export function scaleText(list: readonly ScaleNumberRequirement[]): string {
  const parts = list.filter((s) => s.applies && s.scale > 0).map((s) => (s.mode === 'RB' ? `RB${s.scale}` : `${s.mode} LB${s.scale}`));
  return parts.length > 0 ? parts.join(', ') : 'none needed';
}

export function dateTime(ts: string | null | undefined): string {
  if (!ts) return '—';
  const d = new Date(ts);
  if (Number.isNaN(d.getTime())) return ts;
  return `${d.toISOString().slice(0, 10)} ${d.toISOString().slice(11, 16)} UTC`;
}

export function shortFingerprint(fp: string): string {
  return fp.length > 16 ? `${fp.slice(0, 8)} ${fp.slice(8, 16)}…` : fp;
}

/** An optical density rounded UP to one decimal place and never below 0 (safe direction). */
export function odUp(x: string): string {
  const v = roundPlaces(dec(x), 1, 'up');
  return v.isNegative() ? '0' : v.toFixed(1).replace(/\.0$/, '');
}
