/**
 * Child process for write-lock.test.ts: another Beamwarden with the database open for writing.
 * Opens the store, prints "open", and on each line "save <text>" on stdin saves a site named
 * <text> and prints "saved <text>" once the transaction has committed. Ends when stdin closes.
 */
import { createInterface } from 'node:readline';
import { openRecordStore } from '../../../electron/backend/records/index.js';

const [dbPath, keyDir] = process.argv.slice(2);
if (!dbPath || !keyDir) throw new Error('usage: hold-open <db> <keyDir>');
const store = openRecordStore({ path: dbPath, keyDir });
process.stdout.write('open\n');
const lines = createInterface({ input: process.stdin });
lines.on('line', (line) => {
  const m = /^save (.+)$/.exec(line);
  if (!m?.[1]) return;
  store.createSite({ name: m[1] });
  process.stdout.write(`saved ${m[1]}\n`);
});
lines.on('close', () => {
  store.close();
  process.exit(0);
});
