/**
 * Child process for crash-safety.test.ts: writes assessments in a loop until it is killed.
 * After each call returns (the transaction has committed) it prints one line:
 *   committed <assessmentId> <revisionNo> <status> <counter>
 * The parent kills it with SIGKILL at an arbitrary moment and then checks the file.
 */
import { join } from 'node:path';
import { openRecordStore } from '../../../electron/backend/records/index.js';
import { DemoScenarioSchema } from '../../../electron/backend/records/demo.js';
import demo from '../../../assets/demo/demo-scenario.json' with { type: 'json' };

const [dbPath, keyDir] = process.argv.slice(2);
if (!dbPath || !keyDir) throw new Error('usage: crash-writer <db> <keyDir>');
const store = await openRecordStore({ path: dbPath, keyDir });
const scenario = DemoScenarioSchema.parse(demo);
const r = scenario.rooms.find((x) => x.code === 'A0.07');
if (!r) throw new Error('demo room missing');

let site = (await store.listSites())[0];
site ??= await store.createSite({ name: scenario.site.name });
let room = (await store.listRooms(site.id))[0];
if (!room) {
  room = await store.createRoom({ siteId: site.id, code: r.code, name: r.name });
  for (const laser of r.input.lasers) await store.createInstallation({ roomId: room.id, laser });
}
const base = await store.newAssessmentContent(room.id);
const passphrase = 'crash test passphrase';
let officer = (await store.listPeople()).find((p) => p.name === 'Crash Test Officer');
if (!officer) {
  officer = await store.createPerson({ name: 'Crash Test Officer', role: 'LSO' });
  await store.createPersonKey({ personId: officer.id, passphrase, passphraseAgain: passphrase });
}
const officerId = officer.id;
const say = (line: string) => process.stdout.write(`${line}\n`);
say(`ready ${join(dbPath)}`);

let counter = 0;
for (;;) {
  const a = await store.createAssessment({ roomId: room.id, content: { ...base, notes: `n${++counter}` } });
  say(`committed ${a.id} ${a.current.revisionNo} ${a.current.status} ${counter}`);
  for (let i = 0; i < 8; i++) {
    const cur = (await store.getAssessment(a.id)).current;
    const saved = await store.saveAssessment(a.id, { ...cur.content, notes: `n${++counter}` });
    say(`committed ${a.id} ${saved.current.revisionNo} ${saved.current.status} ${counter}`);
    if (i % 3 === 2) {
      const s = await store.signAssessment(a.id, { personId: officerId, passphrase, statement: 'Signed in a loop.' });
      say(`committed ${a.id} ${s.current.revisionNo} ${s.current.status} ${counter}`);
    }
  }
}
