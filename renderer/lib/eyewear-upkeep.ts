/**
 * Eyewear upkeep reminders: an item is due when its next inspection falls within the reminder window
 * (30 days, as for assessment reviews) and overdue once the date has passed. Damaged or withdrawn
 * items are listed for replacement instead (never offered as protection).
 */
import type { RegisterOverview } from '../../electron/api/contracts/register.js';
import type { Eyewear } from '../../electron/api/contracts/records.js';
import { addDays } from './dates.js';

export type InspectionState = 'overdue' | 'due' | 'ok' | 'no date' | 'out of use';

export function inspectionState(e: Eyewear, today: string, windowDays = 30): { state: InspectionState } {
  if (e.condition === 'damaged' || e.condition === 'withdrawn') return { state: 'out of use' };
  if (e.nextInspection === null) return { state: 'no date' };
  if (e.nextInspection < today) return { state: 'overdue' };
  if (e.nextInspection <= addDays(today, windowDays)) return { state: 'due' };
  return { state: 'ok' };
}

export interface UpkeepReminder {
  readonly eyewear: Eyewear;
  readonly siteName: string;
  readonly state: InspectionState;
}

/** Eyewear needing attention on every site: inspection overdue or due soon, or out of use. */
export function upkeepReminders(o: RegisterOverview, today: string): UpkeepReminder[] {
  const out: UpkeepReminder[] = [];
  for (const s of o.sites) {
    for (const e of s.eyewear) {
      const { state } = inspectionState(e, today);
      if (state === 'overdue' || state === 'due' || state === 'out of use') out.push({ eyewear: e, siteName: s.site.name, state });
    }
  }
  const rank: Record<InspectionState, number> = { 'out of use': 0, overdue: 1, due: 2, 'no date': 3, ok: 4 };
  return out.sort((a, b) => rank[a.state] - rank[b.state] || (a.eyewear.nextInspection ?? '').localeCompare(b.eyewear.nextInspection ?? ''));
}
