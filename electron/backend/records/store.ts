/**
 * The record store: one object with typed methods over one SQLite file, for the API/IPC handler
 * table, the loopback host and the CLI. Synchronous (better-sqlite3) except `backup`.
 */
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { checkWritableAtStart } from './storage-errors.js';
import { acquireWriteLock } from './write-lock.js';
import type { RoomInput } from '../../../core/model/inputs.js';
import * as A from './assessments.js';
import { backupTo } from './backup.js';
import { makeContext, type StoreContext } from './context.js';
import { CALCULATED_WITH, evaluateRoom, type Evaluate } from './core-link.js';
import { importLaserCsv } from './csv.js';
import { openDatabase } from './database.js';
import { seedDemo } from './demo.js';
import { countersign, listCoSignatures, type CoSignature } from './co-signatures.js';
import * as X from './exchange.js';
import * as K from './personal-keys.js';
import { adoptInstallationKey } from './legacy-signatures.js';
import { missingProtections } from './protections.js';
import { defaultDatabasePath } from './paths.js';
import * as R from './register.js';
import { laserHistory } from './laser-history.js';
import { saveWork } from './save-work.js';
import { backupInto, backupStatus, defaultBackupFolder } from './safekeeping.js';
import type {
  Assessment,
  AssessmentContent,
  AssessmentSummary,
  BackupReport,
  BackupStatus,
  CalendarDate,
  CsvExistingChoice,
  CsvImportReport,
  Eyewear,
  EyewearDraft,
  ExportDocument,
  FieldDifference,
  Id,
  ImportAdmission,
  ImportSummary,
  LaserInstallation,
  LaserInstallationDraft,
  LaserUse,
  OpenOptions,
  Person,
  PersonDraft,
  PersonKey,
  RecordStore,
  Revision,
  RevisionSummary,
  Room,
  RoomDraft,
  SaveBase,
  SignOff,
  Site,
  SiteDraft,
  StoreInfo,
  TrustListInfo,
  VerifyReport,
  WorkSave,
  WorkSaved,
} from './types.js';

class SqliteRecordStore implements RecordStore {
  constructor(
    private readonly ctx: StoreContext,
    readonly info: StoreInfo,
    private readonly nativeBinding: string | undefined,
    private readonly releaseLock: () => void,
  ) {}

  close(): void {
    if (this.ctx.db.open) this.ctx.db.close();
    this.releaseLock();
  }

  listSites(): Site[] { return R.listSites(this.ctx); }
  getSite(id: Id): Site { return R.getSite(this.ctx, id); }
  createSite(draft: SiteDraft): Site { return R.createSite(this.ctx, draft); }
  updateSite(id: Id, patch: Partial<SiteDraft>): Site { return R.updateSite(this.ctx, id, patch); }
  deleteSite(id: Id): void { R.deleteSite(this.ctx, id); }

  listRooms(siteId: Id): Room[] { return R.listRooms(this.ctx, siteId); }
  getRoom(id: Id): Room { return R.getRoom(this.ctx, id); }
  createRoom(draft: RoomDraft): Room { return R.createRoom(this.ctx, draft); }
  updateRoom(id: Id, patch: Partial<Omit<RoomDraft, 'siteId'>>): Room { return R.updateRoom(this.ctx, id, patch); }
  deleteRoom(id: Id): void { R.deleteRoom(this.ctx, id); }

  listInstallations(roomId: Id): LaserInstallation[] { return R.listInstallations(this.ctx, roomId); }
  getInstallation(id: Id): LaserInstallation { return R.getInstallation(this.ctx, id); }
  createInstallation(draft: LaserInstallationDraft): LaserInstallation { return R.createInstallation(this.ctx, draft); }
  updateInstallation(id: Id, patch: Partial<Omit<LaserInstallationDraft, 'roomId'>>): LaserInstallation {
    return R.updateInstallation(this.ctx, id, patch);
  }
  deleteInstallation(id: Id): void { R.deleteInstallation(this.ctx, id); }

  listEyewear(siteId: Id): Eyewear[] { return R.listEyewear(this.ctx, siteId); }
  getEyewear(id: Id): Eyewear { return R.getEyewear(this.ctx, id); }
  createEyewear(draft: EyewearDraft): Eyewear { return R.createEyewear(this.ctx, draft); }
  updateEyewear(id: Id, patch: Partial<Omit<EyewearDraft, 'siteId'>>): Eyewear { return R.updateEyewear(this.ctx, id, patch); }
  deleteEyewear(id: Id): void { R.deleteEyewear(this.ctx, id); }

  listPeople(): Person[] { return R.listPeople(this.ctx); }
  getPerson(id: Id): Person { return R.getPerson(this.ctx, id); }
  createPerson(draft: PersonDraft): Person { return R.createPerson(this.ctx, draft); }
  updatePerson(id: Id, patch: Partial<PersonDraft>): Person { return R.updatePerson(this.ctx, id, patch); }
  deletePerson(id: Id): void { R.deletePerson(this.ctx, id); }
  laserHistory(installationId: Id): LaserUse[] { return laserHistory(this.ctx, installationId); }

  roomInputFromRegister(roomId: Id): RoomInput { return R.roomInputFromRegister(this.ctx, roomId); }
  newAssessmentContent(roomId: Id, installationId: Id | null = null): AssessmentContent {
    return A.newAssessmentContent(this.ctx, roomId, installationId);
  }

  createAssessment(args: { roomId: Id; installationId?: Id | null; content: AssessmentContent }): Assessment {
    return A.createAssessment(this.ctx, args);
  }
  getAssessment(id: Id): Assessment { return A.getAssessment(this.ctx, id); }
  listAssessments(roomId: Id): AssessmentSummary[] { return A.listAssessments(this.ctx, roomId); }
  listDueForReview(date: CalendarDate): AssessmentSummary[] { return A.listDueForReview(this.ctx, date); }
  listAllAssessments(): AssessmentSummary[] { return A.listAllAssessments(this.ctx); }
  saveAssessment(id: Id, content: AssessmentContent, expected?: SaveBase): Assessment {
    return A.saveAssessment(this.ctx, id, content, expected);
  }
  saveWork(save: WorkSave): WorkSaved { return saveWork(this.ctx, save); }
  discardDraft(id: Id): void { A.discardDraft(this.ctx, id); }
  listRevisions(assessmentId: Id): RevisionSummary[] { return A.listRevisions(this.ctx, assessmentId); }
  getRevision(revisionId: Id): Revision { return A.getRevision(this.ctx, revisionId); }
  compareRevisions(fromRevisionId: Id, toRevisionId: Id): FieldDifference[] {
    return A.compareRevisions(this.ctx, fromRevisionId, toRevisionId);
  }
  signAssessment(id: Id, signOff: SignOff): Assessment { return A.signAssessment(this.ctx, id, signOff); }
  verify(assessmentId: Id, revisionId?: Id): VerifyReport { return A.verifyAssessment(this.ctx, assessmentId, revisionId); }

  listPersonKeys(): PersonKey[] { return K.listPersonKeys(this.ctx); }
  createPersonKey(args: Parameters<RecordStore['createPersonKey']>[0]): PersonKey { return K.createPersonalKey(this.ctx, args); }
  changeKeyPassphrase(args: Parameters<RecordStore['changeKeyPassphrase']>[0]): PersonKey { return K.changePassphrase(this.ctx, args); }
  retirePersonKey(args: Parameters<RecordStore['retirePersonKey']>[0]): PersonKey { return K.retireKey(this.ctx, args); }
  endorseKey(args: Parameters<RecordStore['endorseKey']>[0]): PersonKey | null { return K.endorseKey(this.ctx, args); }
  trustList(): TrustListInfo { return K.trustListInfo(this.ctx); }

  exportSite(siteId: Id): ExportDocument { return X.exportSite(this.ctx, siteId); }
  exportRoom(roomId: Id): ExportDocument { return X.exportRoom(this.ctx, roomId); }
  exportAssessment(assessmentId: Id): ExportDocument { return X.exportAssessment(this.ctx, assessmentId); }
  importDocument(doc: unknown, admit?: ImportAdmission): ImportSummary { return X.importDocument(this.ctx, doc, admit); }
  untrustedKeysIn(doc: unknown): ImportSummary['untrustedKeys'] { return X.untrustedKeysOf(this.ctx, doc); }
  importLaserCsv(roomId: Id, csvText: string, existing?: CsvExistingChoice): CsvImportReport {
    return importLaserCsv(this.ctx, roomId, csvText, existing);
  }

  backup(path: string): Promise<void> { return backupTo(this.ctx.db, path, this.nativeBinding); }
  backupInto(folder?: string): Promise<BackupReport> {
    return backupInto(this.ctx.db, folder ?? defaultBackupFolder(this.info.path), this.nativeBinding);
  }
  backupStatus(): BackupStatus { return backupStatus(this.ctx.db, defaultBackupFolder(this.info.path)); }
  seedDemo(): Site { return seedDemo(this.ctx); }
  countersign(args: Parameters<RecordStore['countersign']>[0]): CoSignature { return countersign(this.ctx, args); }
  listCoSignatures(revisionId: Id): CoSignature[] { return listCoSignatures(this.ctx, revisionId); }
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
export function openRecordStore(options: InternalOpenOptions = {}): RecordStore {
  const path = resolve(options.path ?? defaultDatabasePath());
  const keyDir = resolve(options.keyDir ?? dirname(path));
  const readonly = options.readonly === true;
  // The default folder is made with its parents (first start); a folder the officer named must exist.
  if (!readonly && options.path === undefined) mkdirSync(dirname(path), { recursive: true });
  if (!readonly) checkWritableAtStart(path);
  const releaseLock = readonly ? () => {} : acquireWriteLock(path);
  let opened: ReturnType<typeof openDatabase>;
  try {
    opened = openDatabase(path, {
      ...(options.nativeBinding !== undefined ? { nativeBinding: options.nativeBinding } : {}),
      readonly,
    });
  } catch (e) {
    releaseLock();
    throw e;
  }
  const calculatedWith = options.calculatedWith ?? CALCULATED_WITH;
  const ctx = makeContext(opened.db, keyDir, options.evaluate ?? evaluateRoom, calculatedWith, options.now);
  const warnings: string[] = [];
  try {
    const missing = missingProtections(opened.db);
    if (missing.length) {
      warnings.push(`The database's protections against changing signed records were removed (${missing.join(', ')}): it was changed with another tool. Run verify on every assessment.`);
    }
    if (!readonly) warnings.push(...adoptInstallationKey(ctx));
    warnings.push(...K.trustListInfo(ctx).problems);
  } catch (e) {
    opened.db.close();
    releaseLock();
    throw e;
  }
  const info: StoreInfo = { path, keyDir, schemaVersion: opened.schemaVersion, migrationBackups: opened.migrationBackups, calculatedWith, warnings };
  return new SqliteRecordStore(ctx, info, options.nativeBinding, releaseLock);
}
