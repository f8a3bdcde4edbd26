/**
 * `npm run demo`: evaluate the invented demo site (assets/demo/demo-scenario.json) with the core and
 * print, per room and beam, the governing limit, the NOHD, every reflection and viewing distance
 * (both diffuse viewing cases), the required OD and the class estimate (electron/cli/demo-lines.ts).
 * A quick headless look at what the app computes; the app itself is `npm run serve`.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { evaluateRoom, RESULT_CAUTION, type RoomInput } from '../../core/index.js';
import { roomLines } from './demo-lines.js';

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
  for (const line of roomLines(room.code, room.name, room.responsible, evaluateRoom(room.input))) console.log(line);
}
