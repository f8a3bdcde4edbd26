/** The officer's display preferences, kept in this browser profile / app window (not in records). */
import type { UnitHabit } from '../../core/index.js';

const KEY = 'beamwarden.settings.v1';

interface Stored {
  units: UnitHabit;
  paper: 'A4' | 'Letter';
}

function load(): Stored {
  try {
    const raw: unknown = JSON.parse(localStorage.getItem(KEY) ?? '{}');
    const o = typeof raw === 'object' && raw !== null ? (raw as Record<string, unknown>) : {};
    return { units: o['units'] === 'ANSI' ? 'ANSI' : 'SI', paper: o['paper'] === 'Letter' ? 'Letter' : 'A4' };
  } catch {
    return { units: 'SI', paper: 'A4' };
  }
}

class Settings {
  units = $state<UnitHabit>('SI');
  paper = $state<'A4' | 'Letter'>('A4');
  constructor() {
    const s = load();
    this.units = s.units;
    this.paper = s.paper;
  }
  save(): void {
    try {
      localStorage.setItem(KEY, JSON.stringify({ units: this.units, paper: this.paper }));
    } catch {
      // storage may be unavailable (private window); the choice still holds for this session
    }
  }
}

export const settings = new Settings();
