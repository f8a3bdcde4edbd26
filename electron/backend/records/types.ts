/**
 * The record store's type surface: the register (sites, rooms, laser installations, eyewear,
 * people), assessments with revisions and sign-off, verification reports and export documents.
 *
 * Plain JSON-compatible data so the same objects cross IPC / HTTP unchanged. Dates are ISO 8601
 * strings (UTC timestamps `2026-05-01T09:30:00.000Z`, calendar dates `2026-05-01`). Ids are
 * random UUIDs made by the store. Nothing here imports Electron: the store runs under plain Node
 * and in the Electron main process.
 */
import type { EyewearSpec, LaserInput, RoomInput } from '../../../core/model/inputs.js';
import type { RoomResult } from '../../../core/model/results.js';
import type { WorkSave, WorkSaved } from './save-work.js';
import type { BackupFile, BackupReport, BackupStatus } from './safekeeping.js';

export type { BackupFile, BackupReport, BackupStatus };

export type { WorkSave, WorkSaved };

export type Id = string;
/** ISO 8601 timestamp in UTC, e.g. 2026-05-01T09:30:00.000Z. */
export type Timestamp = string;
/** ISO 8601 calendar date, e.g. 2026-05-01. */
export type CalendarDate = string;

// ---------------------------------------------------------------- register

export interface Site {
  readonly id: Id;
  /** Institution or building, e.g. "Harwick Vale Photonics Centre". */
  readonly name: string;
  readonly building: string;
  readonly address: string;
  readonly notes: string;
  readonly createdAt: Timestamp;
  readonly updatedAt: Timestamp;
}
export type SiteDraft = Pick<Site, 'name'> & Partial<Pick<Site, 'building' | 'address' | 'notes'>>;

/** A room: one laser controlled area. */
export interface Room {
  readonly id: Id;
  readonly siteId: Id;
  /** Room code as on the door, e.g. "B2.14". */
  readonly code: string;
  readonly name: string;
  /** Person responsible for the area (PI, group leader). */
  readonly responsiblePerson: string;
  /** How to reach the responsible person (phone, e-mail). */
  readonly contact: string;
  readonly notes: string;
  readonly createdAt: Timestamp;
  readonly updatedAt: Timestamp;
}
export type RoomDraft = Pick<Room, 'siteId' | 'code'> &
  Partial<Pick<Room, 'name' | 'responsiblePerson' | 'contact' | 'notes'>>;

/** Maker-neutral description of a laser installed in a room. */
export interface LaserInstallation {
  readonly id: Id;
  readonly roomId: Id;
  /** Laser type / medium, e.g. "Ti:sapphire regenerative amplifier", "DPSS", "fibre". */
  readonly laserType: string;
  /** Free inventory fields an institution keeps (maker, model, serial, registration number). */
  readonly maker: string;
  readonly model: string;
  readonly serialNumber: string;
  readonly registrationNumber: string;
  /** Wavelengths and emission modes, as evaluated by the core. `laser.id` equals `id`. */
  readonly laser: LaserInput;
  /** Class as labelled (copied from `laser.classAsLabelled`; null when not known). */
  readonly classAsLabelled: NonNullable<LaserInput['classAsLabelled']> | null;
  readonly status: 'in-service' | 'retired';
  readonly notes: string;
  readonly createdAt: Timestamp;
  readonly updatedAt: Timestamp;
}
export type LaserInstallationDraft = Pick<LaserInstallation, 'roomId' | 'laser'> &
  Partial<
    Pick<LaserInstallation, 'laserType' | 'maker' | 'model' | 'serialNumber' | 'registrationNumber' | 'status' | 'notes'>
  >;

/** Eyewear on a site's shelf. `spec.id` is the tag written on the frame (e.g. "EW-A"). */
export interface Eyewear {
  readonly id: Id;
  readonly siteId: Id;
  readonly spec: EyewearSpec;
  /** Where it is kept, e.g. "B2.14 door rack". */
  readonly location: string;
  readonly quantity: number;
  readonly notes: string;
  /** Upkeep (schema version 5): last inspection, what it found, when the next one is due. */
  readonly inspectedOn: CalendarDate | null;
  readonly condition: EyewearCondition;
  readonly nextInspection: CalendarDate | null;
  readonly createdAt: Timestamp;
  readonly updatedAt: Timestamp;
}
/** What the last inspection found; 'withdrawn' = taken out of use (kept on record, not offered). */
export type EyewearCondition = 'not recorded' | 'good' | 'worn' | 'damaged' | 'withdrawn';
export const EYEWEAR_CONDITIONS: readonly EyewearCondition[] = ['not recorded', 'good', 'worn', 'damaged', 'withdrawn'];
export type EyewearDraft = Pick<Eyewear, 'siteId' | 'spec'> &
  Partial<Pick<Eyewear, 'location' | 'quantity' | 'notes' | 'inspectedOn' | 'condition' | 'nextInspection'>>;

/** A person who signs off assessments (officer, deputy, assessor). */
export interface Person {
  readonly id: Id;
  readonly name: string;
  /** e.g. "Laser safety officer", "Deputy LSO", "Assessor". */
  readonly role: string;
  readonly email: string;
  readonly phone: string;
  readonly createdAt: Timestamp;
  readonly updatedAt: Timestamp;
}
export type PersonDraft = Pick<Person, 'name'> & Partial<Pick<Person, 'role' | 'email' | 'phone'>>;

// ---------------------------------------------------------------- assessment content

/** Operating states an assessment covers (Z136.1 4.4.1.1; DE OStrV §3 adds set-up and repair). */
export type OperatingState = 'normal' | 'alignment' | 'maintenance' | 'service' | 'set-up';

export type ControlCategory = 'engineering' | 'administrative' | 'ppe';
/** accepted = the control applies; rejected = considered and not used (reason required); not-applicable (reason required). */
export type ControlDecision = 'accepted' | 'rejected' | 'not-applicable';

export interface ControlChoice {
  readonly category: ControlCategory;
  /** What the control is, e.g. "Interlocked entry door", "Beam stops at table edge". */
  readonly measure: string;
  readonly decision: ControlDecision;
  /** Required for rejected and not-applicable. */
  readonly reason?: string;
  /** For accepted controls: already in place, or still to be done by `owner` before `due`. */
  readonly implementation?: 'in-place' | 'to-do';
  readonly owner?: string;
  readonly due?: CalendarDate;
}

/**
 * Non-beam hazards (domain reference section 7), in the order a new assessment lists them. The one
 * list behind the type, the zod schema and the skeleton of a new assessment.
 */
export const NON_BEAM_HAZARD_KINDS = [
  'electrical',
  'x-rays',
  'collateral-optical',
  'air-contaminants',
  'biological',
  'dyes-solvents',
  'gases',
  'cryogens',
  'fire-explosion',
  'photosensitisation',
  'glare',
  'other',
] as const;
export type NonBeamHazardKind = (typeof NON_BEAM_HAZARD_KINDS)[number];

export interface NonBeamHazard {
  readonly kind: NonBeamHazardKind;
  readonly present: boolean;
  /** What is there and where, e.g. "capacitor bank in pump-laser supply". */
  readonly note: string;
  /** Controls for this hazard (free text, one per entry). */
  readonly controls: readonly string[];
}

/** An exposure duration the officer chose for a beam, with the reason (recorded assumption). */
export interface ExposureDurationChoice {
  readonly beamId: string;
  readonly duration_s: number;
  readonly why: string;
}

export interface Assumptions {
  readonly exposureDurations: readonly ExposureDurationChoice[];
  /** Who can be present: users, visitors, public. */
  readonly personsPresent: string;
  /** Whether optical aids (binoculars, loupes) may be used in the area. */
  readonly opticalAidsPossible: boolean;
  /** Further assumptions, one sentence each (beam heights, reflectances ...). */
  readonly other: readonly string[];
}

export interface EyewearChoice {
  /** `EyewearSpec.id` (tag) of the chosen eyewear, present in `input.eyewear`. */
  readonly eyewearTag: string;
  /** Beams or tasks it is chosen for; empty = the whole room. */
  readonly beamIds: readonly string[];
  readonly note: string;
}

/** Everything the officer enters for one revision. `input` is the full snapshot the core evaluates. */
export interface AssessmentContent {
  readonly title: string;
  readonly input: RoomInput;
  readonly operatingStates: readonly OperatingState[];
  readonly assumptions: Assumptions;
  readonly controls: readonly ControlChoice[];
  readonly nonBeamHazards: readonly NonBeamHazard[];
  readonly eyewearChosen: readonly EyewearChoice[];
  readonly notes: string;
  /** Review by this date (institutional practice: annual, and on any change). */
  readonly reviewBy: CalendarDate | null;
}

// ---------------------------------------------------------------- assessments, revisions, sign-off

export type RevisionStatus = 'draft' | 'signed' | 'superseded';

export interface Signature {
  readonly revisionId: Id;
  readonly personId: Id | null;
  readonly name: string;
  readonly role: string;
  /** When it was signed (UTC timestamp). */
  readonly signedAt: Timestamp;
  /** The statement the signer accepted, e.g. "I have assessed ... and approve ...". */
  readonly statement: string;
  /** SHA-256 (hex) of the canonical serialisation of { content, results, calculatedWith }. */
  readonly fingerprint: string;
  readonly algorithm: 'Ed25519';
  /** Base64 Ed25519 signature over the canonical serialisation of the signed statement (see signing.ts). */
  readonly signature: string;
  /** SHA-256 (hex) of the signer's raw public key. */
  readonly keyId: string;
  /** SPKI PEM of the public key. */
  readonly publicKey: string;
}

export interface SignOff {
  readonly personId?: Id;
  readonly name: string;
  readonly role: string;
  readonly statement: string;
  /** Defaults to now. */
  readonly signedAt?: Timestamp;
}

export interface Revision {
  readonly id: Id;
  readonly assessmentId: Id;
  /** 1, 2, 3 ... in order of creation. */
  readonly revisionNo: number;
  readonly status: RevisionStatus;
  readonly content: AssessmentContent;
  /** Results computed by the core from `content.input` when the revision was last saved. */
  readonly results: RoomResult;
  /** Which calculation produced `results` (core version), e.g. "beamwarden-core 0.1.0". */
  readonly calculatedWith: string;
  /** The revision this one was made from (null for revision 1). */
  readonly basedOn: Id | null;
  readonly createdAt: Timestamp;
  readonly updatedAt: Timestamp;
  readonly signature: Signature | null;
}

/** A revision without its content and results, for history lists. */
export type RevisionSummary = Omit<Revision, 'content' | 'results'> & {
  readonly title: string;
  readonly reviewBy: CalendarDate | null;
};

export interface Assessment {
  readonly id: Id;
  readonly roomId: Id;
  /** Set when the assessment covers one installation only; null = the whole room. */
  readonly installationId: Id | null;
  readonly createdAt: Timestamp;
  /** The newest revision (draft, or signed when no draft is open). */
  readonly current: Revision;
  /** Save counter of `current`: a save names it (SaveBase) and is refused once it is out of date. */
  readonly version: number;
}

/** What a save started from: the revision the officer opened and its save counter then. */
export interface SaveBase {
  readonly revisionId: Id;
  readonly version: number;
}

/** One line of an assessment list. */
export interface AssessmentSummary {
  readonly id: Id;
  readonly roomId: Id;
  readonly installationId: Id | null;
  readonly title: string;
  readonly revisionNo: number;
  readonly status: RevisionStatus;
  readonly reviewBy: CalendarDate | null;
  readonly signedAt: Timestamp | null;
  readonly updatedAt: Timestamp;
  /** The signed revision in force (null when none has been signed); the newest revision may be a draft after it. */
  readonly inForce: { readonly revisionNo: number; readonly signedAt: Timestamp; readonly reviewBy: CalendarDate | null } | null;
}

/** One changed value between two revisions; `path` like "input.lasers[0].beams[1].wavelength_nm". */
export interface FieldDifference {
  readonly path: string;
  /** undefined = absent on that side. */
  readonly old: unknown;
  readonly new: unknown;
}

export interface VerifyReport {
  /** True only when every check passed. */
  readonly ok: boolean;
  readonly assessmentId: Id;
  readonly revisionId: Id;
  readonly revisionNo: number;
  readonly status: RevisionStatus;
  /** False for a draft: there is no signature to check. */
  readonly signed: boolean;
  /** Stored content+results hash to the fingerprint recorded at sign-off. */
  readonly fingerprintMatches: boolean;
  /** The Ed25519 signature is valid for the recorded public key and statement. */
  readonly signatureValid: boolean;
  /** The signing key is one this database knows (its own, or one brought in by an import). */
  readonly keyKnown: boolean;
  /** Recomputing the stored inputs with this core gives the stored results. */
  readonly resultsMatchCore: boolean;
  /** Core that made the stored results vs the core used now. */
  readonly calculatedWith: string;
  readonly verifiedWith: string;
  /** Stored results vs recomputed results (path/old = stored, new = recomputed). */
  readonly differences: readonly FieldDifference[];
  /** Plain sentences: what failed and what it means. */
  readonly findings: readonly string[];
}

// ---------------------------------------------------------------- export / import

export const EXPORT_FORMAT = 'beamwarden-export' as const;
export const EXPORT_VERSION = 1 as const;

export interface ExportedAssessment {
  readonly id: Id;
  readonly roomId: Id;
  readonly installationId: Id | null;
  readonly createdAt: Timestamp;
  readonly revisions: readonly Revision[];
}

export interface ExportDocument {
  readonly format: typeof EXPORT_FORMAT;
  readonly version: typeof EXPORT_VERSION;
  readonly exportedAt: Timestamp;
  /** What was exported: a whole site, one room, or one assessment. */
  readonly scope: { readonly kind: 'site' | 'room' | 'assessment'; readonly id: Id };
  readonly sites: readonly Site[];
  readonly rooms: readonly Room[];
  readonly installations: readonly LaserInstallation[];
  readonly eyewear: readonly Eyewear[];
  readonly people: readonly Person[];
  readonly assessments: readonly ExportedAssessment[];
  /** Public keys of every signature in the document. */
  readonly signingKeys: ReadonlyArray<{ readonly keyId: string; readonly publicKey: string }>;
}

export interface ImportSummary {
  readonly sites: number;
  readonly rooms: number;
  readonly installations: number;
  readonly eyewear: number;
  readonly people: number;
  readonly assessments: number;
  readonly revisions: number;
  /** Records already present with identical content (skipped). */
  readonly unchanged: number;
  /** Drafts kept beside the imported version because the two differed (nothing is discarded). */
  readonly keptDrafts: readonly KeptDraft[];
}

/** A draft kept as an assessment of its own because an import brought a different version of it. */
export interface KeptDraft {
  /** The assessment whose draft conflicted. */
  readonly assessmentId: Id;
  /** The new assessment holding the version that did not stay (same room). */
  readonly keptAs: Id;
  readonly title: string;
  /** Whose version was kept aside: this database's draft, or the one in the file. */
  readonly whose: 'yours' | 'imported';
  readonly reason: string;
}

/** One problem in an imported file: `path` is a JSON path ("rooms[2].code") or "row 7, column wavelength_nm". */
export interface ImportIssue {
  readonly path: string;
  readonly problem: string;
}

export interface CsvImportReport {
  readonly imported: number;
  /** Every bad row; when non-empty nothing was imported. */
  readonly errors: ReadonlyArray<{ readonly row: number; readonly column: string; readonly problem: string }>;
  readonly installationIds: readonly Id[];
  /**
   * How each quantity cell that could be read was read ("= 450 mJ per pulse"), with a question
   * where the value is allowed but unusual (e.g. more than 10 J per pulse).
   */
  readonly readings?: ReadonlyArray<{ readonly row: number; readonly column: string; readonly text: string; readonly readAs: string; readonly question: string | null }>;
  /**
   * Lasers of the file that the room already has (same name, maker and serial number). With the
   * choice 'ask' (the default) and any such laser, nothing is imported and the officer is asked
   * whether to skip them or add them again.
   */
  readonly alreadyInRoom?: ReadonlyArray<{ readonly row: number; readonly name: string; readonly maker: string; readonly serialNumber: string }>;
  /** True when nothing was imported because the officer must choose for `alreadyInRoom`. */
  readonly decisionNeeded?: boolean;
  /** Lasers left out because the room already has them (choice 'skip'). */
  readonly skipped?: number;
}

/** What to do with CSV lasers the room already has (same name, maker, serial number). */
export type CsvExistingChoice = 'ask' | 'skip' | 'add';

// ---------------------------------------------------------------- the store

export interface OpenOptions {
  /** Database file; default `<user data folder>/beamwarden.sqlite` (see paths.ts). */
  readonly path?: string;
  /** Folder holding the signing key pair; default the database's folder. */
  readonly keyDir?: string;
  /** Path to a better_sqlite3.node built for the running runtime (Electron keeps its own build). */
  readonly nativeBinding?: string;
  /** Open read-only (no migrations, no writes). */
  readonly readonly?: boolean;
}

export interface StoreInfo {
  readonly path: string;
  readonly keyDir: string;
  readonly schemaVersion: number;
  /** Backup copies written before migrations during this open. */
  readonly migrationBackups: readonly string[];
  readonly calculatedWith: string;
}

/** One revision that evaluated a laser, with the values it used (a laser's history on the Register). */
export interface LaserUse {
  readonly assessmentId: Id;
  readonly revisionId: Id;
  readonly title: string;
  readonly revisionNo: number;
  readonly status: RevisionStatus;
  readonly signedAt: Timestamp | null;
  readonly updatedAt: Timestamp;
  readonly laser: LaserInput;
}

export interface RecordStore {
  readonly info: StoreInfo;
  close(): void;

  // register
  listSites(): Site[];
  getSite(id: Id): Site;
  createSite(draft: SiteDraft): Site;
  updateSite(id: Id, patch: Partial<SiteDraft>): Site;
  deleteSite(id: Id): void;

  listRooms(siteId: Id): Room[];
  getRoom(id: Id): Room;
  createRoom(draft: RoomDraft): Room;
  updateRoom(id: Id, patch: Partial<Omit<RoomDraft, 'siteId'>>): Room;
  deleteRoom(id: Id): void;

  listInstallations(roomId: Id): LaserInstallation[];
  getInstallation(id: Id): LaserInstallation;
  createInstallation(draft: LaserInstallationDraft): LaserInstallation;
  updateInstallation(id: Id, patch: Partial<Omit<LaserInstallationDraft, 'roomId'>>): LaserInstallation;
  deleteInstallation(id: Id): void;

  listEyewear(siteId: Id): Eyewear[];
  getEyewear(id: Id): Eyewear;
  createEyewear(draft: EyewearDraft): Eyewear;
  updateEyewear(id: Id, patch: Partial<Omit<EyewearDraft, 'siteId'>>): Eyewear;
  deleteEyewear(id: Id): void;

  listPeople(): Person[];
  getPerson(id: Id): Person;
  createPerson(draft: PersonDraft): Person;
  updatePerson(id: Id, patch: Partial<PersonDraft>): Person;
  deletePerson(id: Id): void;
  /** Every revision in the laser's room that evaluated it, newest first. */
  laserHistory(installationId: Id): LaserUse[];

  /** Snapshot of the room's register as core input (in-service lasers, the site's eyewear). */
  roomInputFromRegister(roomId: Id): RoomInput;
  /** A fresh content skeleton for a room: register snapshot, default durations, empty choices. */
  newAssessmentContent(roomId: Id, installationId?: Id | null): AssessmentContent;

  // assessments
  /** New assessment with revision 1 as a draft; results computed by the core. */
  createAssessment(args: { roomId: Id; installationId?: Id | null; content: AssessmentContent }): Assessment;
  getAssessment(id: Id): Assessment;
  listAssessments(roomId: Id): AssessmentSummary[];
  /** Assessments whose current revision is due for review on or before `date`. */
  listDueForReview(date: CalendarDate): AssessmentSummary[];
  /**
   * Save content: into the open draft, or — when the newest revision is signed — into a new draft
   * revision based on it (the signed one stays unchanged). Results are recomputed.
   */
  saveAssessment(id: Id, content: AssessmentContent, expected?: SaveBase): Assessment;
  /**
   * The workspace's save: new and edited register lasers plus the assessment, in one transaction;
   * refused whole (code 'stale') when any part changed since it was opened.
   */
  saveWork(save: WorkSave): WorkSaved;
  /** Delete an assessment that has no signed revision, or discard its open draft revision. */
  discardDraft(id: Id): void;
  listRevisions(assessmentId: Id): RevisionSummary[];
  getRevision(revisionId: Id): Revision;
  /** Field-by-field differences between two revisions (content and results). */
  compareRevisions(fromRevisionId: Id, toRevisionId: Id): FieldDifference[];
  /** Sign the current draft: it becomes signed, the previous signed revision superseded. */
  signAssessment(id: Id, signOff: SignOff): Assessment;
  /** Check the newest signed revision (or `revisionId`). */
  verify(assessmentId: Id, revisionId?: Id): VerifyReport;

  // exchange
  exportSite(siteId: Id): ExportDocument;
  exportRoom(roomId: Id): ExportDocument;
  exportAssessment(assessmentId: Id): ExportDocument;
  /** Validate and import a document (parsed object or JSON text): all or nothing. */
  importDocument(doc: unknown): ImportSummary;
  /** CSV laser inventory for one room (columns in README); nothing imported if any row is bad. */
  importLaserCsv(roomId: Id, csvText: string, existing?: CsvExistingChoice): CsvImportReport;

  // safekeeping
  /** Online backup to `path` (a consistent copy while the store stays open). */
  backup(path: string): Promise<void>;
  /** "Back up now": a dated, checked copy in `folder` (default: `backups` beside the database), recorded. */
  backupInto(folder?: string): Promise<BackupReport>;
  /** The last recorded backup and the backups in the default folder. */
  backupStatus(): BackupStatus;
  /** Loads the invented demo site (no-op if it is already there); returns its site. */
  seedDemo(): Site;
}

/** Error with a machine-readable code and the path/field concerned (for IPC answers). */
export class RecordError extends Error {
  constructor(
    readonly code:
      | 'not-found'
      | 'invalid'
      | 'immutable'
      | 'conflict'
      /** A save that started from an older state than the stored one (optimistic concurrency). */
      | 'stale'
      /** The database is open for writing in another Beamwarden process, or restore found it in use. */
      | 'in-use'
      /** The file system refused: read-only, immutable file, full disk, missing folder. */
      | 'storage'
      | 'newer-database'
      | 'corrupt-database'
      | 'migration-failed'
      | 'signing-key',
    message: string,
    readonly issues: readonly ImportIssue[] = [],
  ) {
    super(message);
    this.name = 'RecordError';
  }
}

/**
 * Module-level entry points (electron/backend/records/index.ts):
 * - `openRecordStore(options?: OpenOptions): RecordStore` — creates the folder and database on first start;
 * - `restoreBackup(args: { from: string; to: string; nativeBinding?: string }): Promise<RestoreReport>` — replaces
 *   the database (store must be closed) with a checked backup, keeping the replaced file beside it;
 * - `defaultDataDir()` / `defaultDatabasePath()` — the platform user-data folder.
 */
export interface RestoreReport {
  readonly restoredFrom: string;
  readonly path: string;
  /** Where the replaced database was moved (null when there was none). */
  readonly previousCopy: string | null;
  readonly schemaVersion: number;
}
