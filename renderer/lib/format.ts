/** Display helpers. Values from the core are already rounded in the safe direction; re-rounding here keeps that direction. */
import { formatDensity, odText, quantityText, type UnitHabit } from '../../core/index.js';
import type { LimitSummary, ScaleNumberRequirement } from '../../core/model/results.js';

/** A distance in metres (decimal string), rounded UP to 3 significant figures, mm below 10 cm. */
export function distance(m: string | null | undefined): string {
  if (m === null || m === undefined) return '—';
  return quantityText(m, 'm', { round: 'up' });
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

/** A duration: prefixes below 1 s ("250 ms"), plain seconds above ("30 000 s"). */
export function seconds(s: number | string): string {
  return quantityText(String(s), 's', { round: 'nearest' });
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

/** A moment in the machine's local time to the minute, "2026-11-28 09:14", as lists of files show it. */
export function localMinute(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())} ${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

export function shortFingerprint(fp: string): string {
  return fp.length > 16 ? `${fp.slice(0, 8)} ${fp.slice(8, 16)}…` : fp;
}

/** An optical density rounded UP to one decimal place and never below 0 (safe direction). */
export function odUp(x: string): string {
  return odText(x);
}
