/**
 * The record store: one object with typed, asynchronous methods over one database, for the API/IPC
 * handler table, the loopback host and the CLI. The logic speaks SQL through the engine's port
 * (sql-port.ts); the engine (sqlite-engine.ts for the embedded file) opens, migrates and backs up.
 * The store is an object literal typed by RecordStore, so every method's parameters come from that
 * one interface (types.ts) instead of a second list of types here.
 */
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { checkWritableAtStart } from './storage-errors.js';
import * as A from './assessments.js';
import { makeContext, type StoreContext } from './context.js';
import { CALCULATED_WITH, evaluateRoom, type Evaluate } from './core-link.js';
import { importLaserCsv } from './csv.js';
import { seedDemo } from './demo.js';
import { countersign, listCoSignatures } from './co-signatures.js';
import { listRowChecks, recordRowCheck } from './limit-row-checks.js';
import type { RecordEngine } from './engine.js';
import * as X from './exchange.js';
import * as K from './personal-keys.js';
import { adoptInstallationKey } from './legacy-signatures.js';
import { clearDeskAnchor, setDeskAnchor } from './desk-anchor.js';
import { adoptTrustListFile } from './trust-store.js';
import { defaultDatabasePath } from './paths.js';
import * as R from './register.js';
import * as C from './register-checked.js';
import { deletionImpact } from './register-deletion.js';
import { laserHistory } from './laser-history.js';
import { saveWork } from './save-work.js';
import { defaultBackupFolder } from './safekeeping.js';
import { openSqliteEngine } from './sqlite-engine.js';
import { describeAddress, isServerAddress } from './address.js';
import { openPgEngine } from './pg-engine.js';
import type { OpenOptions, RecordStore, RegisterChange, RegisterChanges, StoreInfo } from './types.js';

/** The changes heard from the register (institution register), kept for open screens to ask after. */
function changeFeed(engine: RecordEngine): { since(seq: number, waitMs?: number): Promise<RegisterChanges>; close(): Promise<void> } {
  const kept: RegisterChange[] = [];
  let seq = 0;
  let stop: Promise<() => Promise<void>> | null = null;
  let closed = false;
  const KEEP = 200;
  // A save commits several rows at once; their announcements arrive together, and a short pause
  // after the first one hands them to the screen as one answer (one refresh, not five).
  const GATHER_MS = 100;
  /** Screens waiting for the next change (long poll): woken by a change or by closing. */
  const waiting = new Set<() => void>();
  const answer = (after: number): RegisterChanges => ({ live: true, seq, changes: kept.filter((c) => c.seq > after) });
  return {
    async since(after, waitMs = 0) {
      const watch = engine.watch;
      if (watch === undefined) return { live: false, seq: 0, changes: [] };
      stop ??= watch((c) => {
        seq += 1;
        const operation = c.operation === 'INSERT' || c.operation === 'DELETE' ? c.operation : 'UPDATE';
        kept.push({ seq, table: c.table, id: c.id, operation, by: c.by });
        if (kept.length > KEEP) kept.splice(0, kept.length - KEEP);
        for (const wake of [...waiting]) wake();
      });
      await stop;
      if (seq > after || waitMs <= 0 || closed) return answer(after);
      await new Promise<void>((resolve) => {
        const done = (): void => {
          clearTimeout(timer);
          waiting.delete(done);
          resolve();
        };
        const timer = setTimeout(done, waitMs);
        waiting.add(done);
      });
      if (seq > after && !closed) await new Promise((r) => setTimeout(r, GATHER_MS));
      return answer(after);
    },
    async close() {
      closed = true;
      for (const wake of [...waiting]) wake();
      if (stop) await (await stop)();
    },
  };
}

function storeOver(ctx: StoreContext, engine: RecordEngine, info: StoreInfo): RecordStore {
  const backupFolder = defaultBackupFolder(info.path);
  const changes = changeFeed(engine);
  return {
    info,
    close: async () => {
      await changes.close();
      await engine.close();
    },
    registerChanges: (since, waitMs) => changes.since(since, waitMs),

    listSites: () => R.listSites(ctx),
    getSite: (id) => R.getSite(ctx, id),
    createSite: (draft) => R.createSite(ctx, draft),
    updateSite: (id, patch, expected) => C.updateSite(ctx, id, patch, expected),
    deleteSite: (id, expected) => C.deleteSite(ctx, id, expected),

    listRooms: (siteId) => R.listRooms(ctx, siteId),
    getRoom: (id) => R.getRoom(ctx, id),
    createRoom: (draft) => R.createRoom(ctx, draft),
    updateRoom: (id, patch, expected) => C.updateRoom(ctx, id, patch, expected),
    deleteRoom: (id, expected) => C.deleteRoom(ctx, id, expected),

    listInstallations: (roomId) => R.listInstallations(ctx, roomId),
    getInstallation: (id) => R.getInstallation(ctx, id),
    createInstallation: (draft) => R.createInstallation(ctx, draft),
    updateInstallation: (id, patch, expected) => C.updateInstallation(ctx, id, patch, expected),
    deleteInstallation: (id, expected) => C.deleteInstallation(ctx, id, expected),

    listEyewear: (siteId) => R.listEyewear(ctx, siteId),
    getEyewear: (id) => R.getEyewear(ctx, id),
    createEyewear: (draft) => R.createEyewear(ctx, draft),
    updateEyewear: (id, patch, expected) => C.updateEyewear(ctx, id, patch, expected),
    deleteEyewear: (id, expected) => C.deleteEyewear(ctx, id, expected),

    listPeople: () => R.listPeople(ctx),
    getPerson: (id) => R.getPerson(ctx, id),
    createPerson: (draft) => R.createPerson(ctx, draft),
    updatePerson: (id, patch, expected) => C.updatePerson(ctx, id, patch, expected),
    deletePerson: (id, expected) => C.deletePerson(ctx, id, expected),
    deletionImpact: (kind, id) => deletionImpact(ctx, kind, id),
    laserHistory: (installationId) => laserHistory(ctx, installationId),

    roomInputFromRegister: (roomId) => R.roomInputFromRegister(ctx, roomId),
    newAssessmentContent: (roomId, installationId = null) => A.newAssessmentContent(ctx, roomId, installationId),

    createAssessment: (args) => A.createAssessment(ctx, args),
    getAssessment: (id) => A.getAssessment(ctx, id),
    listAssessments: (roomId) => A.listAssessments(ctx, roomId),
    listDueForReview: (date) => A.listDueForReview(ctx, date),
    listAllAssessments: () => A.listAllAssessments(ctx),
    saveAssessment: (id, content, expected) => A.saveAssessment(ctx, id, content, expected),
    saveWork: (save) => saveWork(ctx, save),
    discardDraft: (id) => A.discardDraft(ctx, id),
    listRevisions: (assessmentId) => A.listRevisions(ctx, assessmentId),
    getRevision: (revisionId) => A.getRevision(ctx, revisionId),
    compareRevisions: (fromRevisionId, toRevisionId) => A.compareRevisions(ctx, fromRevisionId, toRevisionId),
    changesSince: (id, seen) => A.changesSince(ctx, id, seen),
    signAssessment: (id, signOff, reviewed) => A.signAssessment(ctx, id, signOff, reviewed),
    verify: (assessmentId, revisionId) => A.verifyAssessment(ctx, assessmentId, revisionId),
    verifySignedRevisions: (assessmentId, run) => A.verifySignedRevisions(ctx, assessmentId, run),

    listPersonKeys: () => K.listPersonKeys(ctx),
    createPersonKey: (args) => K.createPersonalKey(ctx, args),
    changeKeyPassphrase: (args) => K.changePassphrase(ctx, args),
    retirePersonKey: (args) => K.retireKey(ctx, args),
    endorseKey: (args) => K.endorseKey(ctx, args),
    trustList: () => K.trustListInfo(ctx),
    setTrustAnchor: (args) => setDeskAnchor(ctx, args),
    clearTrustAnchor: () => clearDeskAnchor(ctx),

    exportSite: (siteId) => X.exportSite(ctx, siteId),
    exportRoom: (roomId) => X.exportRoom(ctx, roomId),
    exportAssessment: (assessmentId) => X.exportAssessment(ctx, assessmentId),
    importDocument: (doc, admit) => X.importDocument(ctx, doc, admit),
    untrustedKeysIn: async (doc) => X.untrustedKeysOf(ctx, doc),
    importLaserCsv: (roomId, csvText, existing) => importLaserCsv(ctx, roomId, csvText, existing),

    backup: (path) => engine.backup(path),
    backupInto: (folder) => engine.backupInto(folder ?? backupFolder),
    backupStatus: () => engine.backupStatus(backupFolder),
    seedDemo: () => seedDemo(ctx),
    countersign: (args) => countersign(ctx, args),
    listCoSignatures: (revisionId) => listCoSignatures(ctx, revisionId),
    recordRowCheck: (args) => recordRowCheck(ctx, args),
    listRowChecks: (ruleSet) => listRowChecks(ctx, ruleSet),
  };
}

/** Internal options on top of OpenOptions (tests of a different core version). */
export interface InternalOpenOptions extends OpenOptions {
  readonly evaluate?: Evaluate;
  readonly calculatedWith?: string;
  /** The store's clock (tests that compare two exports byte for byte). */
  readonly now?: () => string;
}

/**
 * Open (creating on first start) the record store. Default location: the platform user-data
 * folder (paths.ts); the trust list and signing log live beside the database unless `keyDir` is given.
 */
export async function openRecordStore(options: InternalOpenOptions = {}): Promise<RecordStore> {
  const readonly = options.readonly === true;
  const server = options.path !== undefined && isServerAddress(options.path);
  let path: string;
  let keyDir: string;
  let engine: RecordEngine;
  if (server) {
    // The institution register: personal keys, trust list and signing log stay on this desk.
    path = describeAddress(options.path ?? '');
    keyDir = resolve(options.keyDir ?? dirname(defaultDatabasePath()));
    if (!readonly && options.keyDir === undefined) mkdirSync(keyDir, { recursive: true });
    engine = await openPgEngine(options.path ?? '', { readonly });
  } else {
    path = resolve(options.path ?? defaultDatabasePath());
    keyDir = resolve(options.keyDir ?? dirname(path));
    // The default folder is made with its parents (first start); a folder the officer named must exist.
    if (!readonly && options.path === undefined) mkdirSync(dirname(path), { recursive: true });
    if (!readonly) checkWritableAtStart(path);
    engine = openSqliteEngine(path, { ...(options.nativeBinding !== undefined ? { nativeBinding: options.nativeBinding } : {}), readonly });
  }
  const calculatedWith = options.calculatedWith ?? CALCULATED_WITH;
  const ctx = makeContext({
    q: engine.port,
    engine: engine.seam,
    keyDir,
    ...(options.trustAnchor !== undefined ? { trustAnchor: options.trustAnchor } : {}),
    evaluate: options.evaluate ?? evaluateRoom,
    calculatedWith,
    ...(options.now ? { now: options.now } : {}),
  });
  const warnings: string[] = [];
  try {
    const missing = await engine.seam.missingProtections();
    if (missing.length) {
      warnings.push(`The database's protections against changing signed records were removed (${missing.join(', ')}): it was changed with another tool. Run verify on every assessment.`);
    }
    if (!readonly) warnings.push(...(await adoptTrustListFile(ctx)), ...(await adoptInstallationKey(ctx)));
    warnings.push(...(await K.trustListInfo(ctx)).problems);
  } catch (e) {
    await engine.close();
    throw e;
  }
  const info: StoreInfo = { path, keyDir, schemaVersion: engine.schemaVersion, migrationBackups: engine.migrationBackups, calculatedWith, warnings };
  return storeOver(ctx, engine, info);
}
