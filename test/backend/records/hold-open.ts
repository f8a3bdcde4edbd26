/**
 * Child process for write-lock.test.ts: another Beamwarden with the database open for writing.
 * Opens the store, prints "open", and on each line "save <text>" on stdin saves a site named
 * <text> and prints "saved <text>" once the transaction has committed. Ends when stdin closes.
 */
import { createInterface } from 'node:readline';
import { openRecordStore } from '../../../electron/backend/records/index.js';

const [dbPath, keyDir] = process.argv.slice(2);
if (!dbPath || !keyDir) throw new Error('usage: hold-open <db> <keyDir>');
const store = await openRecordStore({ path: dbPath, keyDir });
process.stdout.write('open\n');
const lines = createInterface({ input: process.stdin });
// One line at a time, in order: each save is awaited before the next line is read.
for await (const line of lines) {
  const m = /^save (.+)$/.exec(line);
  if (!m?.[1]) continue;
  await store.createSite({ name: m[1] });
  process.stdout.write(`saved ${m[1]}\n`);
}
await store.close();
process.exit(0);
