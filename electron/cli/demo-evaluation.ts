/**
 * `npm run demo`: evaluate the invented demo site (assets/demo/demo-scenario.json) with the core and
 * print, per room and beam, the governing limit, NOHD, diffuse hazard radius, required OD and class
 * estimate. A quick headless look at what the app computes; the app itself is `npm run serve`.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { evaluateRoom, RESULT_CAUTION, roundSig, type RoomInput } from '../../core/index.js';

/** Distances are shown rounded UP to 3 significant figures (the safe direction). */
const up = (m: string): string => roundSig(m, 3, 'up').toString();

interface DemoRoom {
  readonly code: string;
  readonly name: string;
  readonly responsible: string;
  readonly input: RoomInput;
}

const file = fileURLToPath(new URL('../../assets/demo/demo-scenario.json', import.meta.url));
const demo = JSON.parse(readFileSync(file, 'utf8')) as { site: { name: string }; rooms: DemoRoom[] };

console.log(`Demo site (invented): ${demo.site.name}`);
console.log(RESULT_CAUTION);
for (const room of demo.rooms) {
  const r = evaluateRoom(room.input);
  console.log(`\n${room.code} ${room.name} (responsible: ${room.responsible}); rule set: ${r.ruleSetName}`);
  const rows = r.beams.map((b) => ({
    beam: b.label,
    'limit (eye)': `${b.mpe.H_Jm2_reported} J/m² [${b.mpe.governingRule}, ${b.mpe.governingRow}]`,
    'NOHD m': b.nohd_m_reported,
    'diffuse NHZ m': b.nhzDiffuse_m === null ? '-' : up(b.nhzDiffuse_m),
    'OD': b.odRequired,
    'class est.': b.classEstimate.estimate,
  }));
  console.table(rows);
  console.log(`Largest hazard distance: ${up(r.largestHazardDistance_m)} m (rounded up); eyewear covering every beam: ${r.eyewearCoveringAll.join(', ') || 'none on the shelf'}`);
}
