/**
 * Control measures suggested by the class and the hazard zone.
 * Source of the class columns: ANSI Z136.1-2000 Table 10 as published by a university safety office
 * (domain reference 4.2, [UPENN], read); the 2014 classes map onto its columns as 1/1M -> 1,
 * 2/2M -> 2, 3R -> 3a (domain reference 4.2, from memory). Laser controlled area items: domain
 * reference 4.3 (sources per line there). Where several controls serve the same purpose the
 * standard does not demand all of them (domain 4.1, [SUP-SIGN2]): the list is a prompt for the
 * officer's decision, not a verdict.
 */
import type { ControlCategory, ControlChoice } from '../../electron/backend/records/types.js';
import type { LaserClass } from '../../core/model/results.js';

/** S shall, s should, MPE shall if the MPE can be exceeded, NHZ shall with an NHZ analysis, LSO decides, E embedded 3B/4, '-' none. */
export type Requirement = 'S' | 's' | 'MPE' | 'NHZ' | 'LSO' | 'E' | 'E,MPE' | '-';

type Column = '1' | '2' | '3a' | '3b' | '4';

export interface CatalogueItem {
  readonly id: string;
  readonly category: ControlCategory;
  readonly measure: string;
  /** Clause and source, printed beside the item. */
  readonly basis: string;
  readonly req: Readonly<Record<Column, Requirement>>;
  readonly help?: string;
}

// Printed basis: the edition family of the rule sets (ANSI Z136.1-2014) and the clause topic; the
// clause numbers were read in the 2000 edition's table and are not repeated for 2014 (not re-read).
const ENG = 'ANSI Z136.1-2014, engineering control measures';
const ADM = 'ANSI Z136.1-2014, administrative and procedural control measures';
const PPE = 'ANSI Z136.1-2014, protective equipment';
const r = (c1: Requirement, c2: Requirement, c3a: Requirement, c3b: Requirement, c4: Requirement): Record<Column, Requirement> => ({
  '1': c1,
  '2': c2,
  '3a': c3a,
  '3b': c3b,
  '4': c4,
});

export const CONTROL_CATALOGUE: readonly CatalogueItem[] = [
  // engineering
  { id: 'housing', category: 'engineering', measure: 'Protective housing', basis: ENG, req: r('S', 'S', 'S', 'S', 'S') },
  { id: 'housing-interlocks', category: 'engineering', measure: 'Interlocks on the protective housing', basis: ENG, req: r('E', 'E', 'E', 'S', 'S') },
  { id: 'service-panel', category: 'engineering', measure: 'Service access panels interlocked or needing a tool', basis: ENG, req: r('E', 'E', 'E', 'S', 'S') },
  { id: 'key-control', category: 'engineering', measure: 'Key switch or master control', basis: ENG, req: r('-', '-', '-', 's', 'S') },
  { id: 'viewing-portals', category: 'engineering', measure: 'Viewing windows and portals filtered below the MPE', basis: ENG, req: r('-', 'MPE', 'MPE', 'MPE', 'MPE') },
  { id: 'collecting-optics', category: 'engineering', measure: 'Filters or interlocks on collecting optics (microscopes, viewers)', basis: ENG, req: r('MPE', 'MPE', 'MPE', 'MPE', 'MPE') },
  { id: 'open-beam', category: 'engineering', measure: 'Open beam path: beam enclosed where practical, NHZ set and controlled', basis: ENG, req: r('-', '-', '-', 'NHZ', 'NHZ') },
  { id: 'remote-interlock', category: 'engineering', measure: 'Remote interlock connector wired to the door or area interlock', basis: ENG, req: r('-', '-', '-', 's', 'S') },
  { id: 'beam-stop', category: 'engineering', measure: 'Beam stop or attenuator on the laser; beams end in suitable beam stops', basis: ENG, req: r('-', '-', '-', 's', 'S') },
  { id: 'activation-warning', category: 'engineering', measure: 'Activation warning (laser-on light or sound) at the entrance', basis: ENG, req: r('-', '-', '-', 's', 'S') },
  { id: 'emission-delay', category: 'engineering', measure: 'Emission delay after switch-on', basis: ENG, req: r('-', '-', '-', '-', 'S') },
  { id: 'lca', category: 'engineering', measure: 'Laser controlled area with controlled entry', basis: ENG, req: r('-', '-', '-', 'NHZ', 'NHZ') },
  {
    id: 'entryway',
    category: 'engineering',
    measure: 'Entryway control: non-defeatable interlock, defeatable interlock, or procedural entry',
    basis: 'ANSI Z136.1-2014, laser controlled area: entryway controls',
    req: r('-', '-', '-', 's', 'S'),
    help: 'Class 4: one of the three options, chosen by the LSO; procedural entry is not suitable where the public can open the door.',
  },
  { id: 'emergency-stop', category: 'engineering', measure: 'Emergency beam-off button, easy to see and reach', basis: 'common practice for Class 4 laser controlled areas', req: r('-', '-', '-', '-', 'S') },
  { id: 'barriers', category: 'engineering', measure: 'Laser barrier or curtain where the NHZ extends beyond the work area (rated for the exposure time)', basis: 'common practice (barriers rated for the exposure time)', req: r('-', '-', '-', 'NHZ', 'NHZ') },
  { id: 'beam-height', category: 'engineering', measure: 'Beam paths kept below or above eye level (about 1.2-1.8 m)', basis: 'common practice', req: r('-', '-', '-', 's', 'S') },
  { id: 'windows', category: 'engineering', measure: 'Windows and openings covered so transmitted beams stay below the MPE', basis: 'ANSI Z136.1-2014, laser controlled area', req: r('-', '-', '-', 'NHZ', 'NHZ') },
  { id: 'fibre-systems', category: 'engineering', measure: 'Optical fibre connections secured; disconnection only by trained staff', basis: ENG, req: r('MPE', 'MPE', 'MPE', 'S', 'S') },
  // administrative
  { id: 'labels', category: 'administrative', measure: 'Class labels and aperture labels on every laser, checked', basis: ADM, req: r('S', 'S', 'S', 'S', 'S') },
  { id: 'area-posting', category: 'administrative', measure: 'Door notice at every entrance (generated from this assessment)', basis: ADM, req: r('-', '-', 's', 'NHZ', 'NHZ') },
  { id: 'sop', category: 'administrative', measure: 'Standard operating procedure, approved by the LSO', basis: ADM, req: r('-', '-', '-', 's', 'S') },
  { id: 'alignment-sop', category: 'administrative', measure: 'Written alignment procedure (most injuries happen during alignment)', basis: ADM, req: r('-', 'S', 'S', 'S', 'S') },
  { id: 'output-limit', category: 'administrative', measure: 'Lowest output that does the job; attenuate for alignment', basis: ADM, req: r('-', '-', 'LSO', 'LSO', 'LSO') },
  { id: 'training', category: 'administrative', measure: 'Laser safety training of every user, recorded', basis: ADM, req: r('-', 's', 's', 'S', 'S') },
  { id: 'authorised', category: 'administrative', measure: 'Only authorised persons operate the laser', basis: ADM, req: r('-', '-', '-', 'S', 'S') },
  { id: 'spectators', category: 'administrative', measure: 'Spectators and visitors kept out or supervised and protected', basis: ADM, req: r('-', '-', '-', 's', 'S') },
  { id: 'service-personnel', category: 'administrative', measure: 'Service staff trained and briefed; temporary controlled area during service', basis: ADM, req: r('E,MPE', 'E,MPE', 'E,MPE', 'S', 'S') },
  { id: 'lso', category: 'administrative', measure: 'Laser safety officer designated for the area', basis: 'ANSI Z136.1-2014, laser safety officer', req: r('-', '-', '-', 'S', 'S') },
  // personal protection
  { id: 'eyewear', category: 'ppe', measure: 'Protective eyewear with the required OD and scale numbers, at the entrance', basis: PPE, req: r('-', '-', '-', 's', 'S') },
  { id: 'alignment-eyewear', category: 'ppe', measure: 'Alignment eyewear (EN 208) for visible beams, where the beam must be seen', basis: 'EN 208:2009 (alignment eyewear); common practice', req: r('-', '-', 'LSO', 'LSO', 'LSO') },
  { id: 'skin', category: 'ppe', measure: 'Skin protection (gloves, sleeves, screens) where the skin limit is exceeded', basis: 'common practice', req: r('-', '-', '-', 'MPE', 'MPE') },
];

const COLUMN: Readonly<Record<LaserClass, Column>> = { '1': '1', '1M': '1', '2': '2', '2M': '2', '3R': '3a', '3B': '3b', '4': '4' };

export interface Suggestion {
  readonly item: CatalogueItem;
  readonly requirement: Requirement;
  /** Plain words for the requirement in this room. */
  readonly level: string;
  /** Suggested by the table for this room (shown first; others only on request). */
  readonly suggested: boolean;
}

export interface ZoneFacts {
  /** The exposure limit can be exceeded where people can be (a non-zero hazard distance). */
  readonly mpeExceeded: boolean;
  /** Skin limit exceeded at reachable positions. */
  readonly skinExceeded: boolean;
  /** An embedded Class 3B/4 laser is serviced (enclosure opened). */
  readonly embedded: boolean;
}

export function suggestControls(cls: LaserClass, zone: ZoneFacts): Suggestion[] {
  const col = COLUMN[cls];
  return CONTROL_CATALOGUE.map((item) => {
    const req = item.req[col];
    const exceeded = item.id === 'skin' ? zone.skinExceeded : zone.mpeExceeded;
    let level: string;
    let suggested: boolean;
    switch (req) {
      case 'S':
        level = 'shall';
        suggested = true;
        break;
      case 's':
        level = 'should';
        suggested = true;
        break;
      case 'MPE':
        level = exceeded ? 'shall (limit exceeded)' : 'only if the limit can be exceeded';
        suggested = exceeded;
        break;
      case 'NHZ':
        level = exceeded ? 'shall, within the hazard zone' : 'shall if there is a hazard zone';
        suggested = exceeded;
        break;
      case 'LSO':
        level = 'the LSO decides';
        suggested = true;
        break;
      case 'E':
        level = zone.embedded ? 'shall (embedded 3B/4 laser)' : 'only for an embedded 3B/4 laser';
        suggested = zone.embedded;
        break;
      case 'E,MPE':
        level = zone.embedded || exceeded ? 'shall (embedded laser or limit exceeded)' : 'only for an embedded laser or if the limit can be exceeded';
        suggested = zone.embedded || exceeded;
        break;
      case '-':
        level = 'not required for this class';
        suggested = false;
        break;
    }
    return { item, requirement: req, level, suggested };
  });
}

/** A new checklist entry for a catalogue item (not yet decided: accepted until the officer says otherwise). */
export function choiceFor(item: CatalogueItem): ControlChoice {
  return { category: item.category, measure: item.measure, decision: 'accepted', implementation: 'in-place' };
}

export const CATEGORY_NAME: Readonly<Record<ControlCategory, string>> = {
  engineering: 'Engineering',
  administrative: 'Administrative and procedural',
  ppe: 'Personal protection',
};
