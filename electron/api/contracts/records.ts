/**
 * Record types shared by the renderer and the back end: the register (sites, rooms, laser
 * installations, eyewear, people), assessments with revisions and sign-off, verification reports
 * and export documents. The contract both sides see (the store interface and the error class stay
 * in electron/backend/records/types.ts, which re-exports this file).
 *
 * Plain JSON-compatible data so the same objects cross IPC / HTTP unchanged. Dates are ISO 8601
 * strings (UTC timestamps `2026-05-01T09:30:00.000Z`, calendar dates `2026-05-01`). Ids are
 * random UUIDs made by the store.
 */
import type { EyewearSpec, LaserInput, RoomInput, RuleSetId } from '../../../core/model/inputs.js';
import type { RoomResult } from '../../../core/model/results.js';

// Declared beside the store code that makes them (type-only: nothing of the back end runs here).
export type { WorkSave, WorkSaved } from '../../backend/records/save-work.js';
export type { BackupFile, BackupReport, BackupStatus } from '../../backend/records/safekeeping.js';
import type { CoSignatureCheck } from '../../backend/records/co-signature-checks.js';
export type { CoSignature, CoSignatureCheck } from '../../backend/records/co-signature-checks.js';
export type { RowCheckRecord } from '../../backend/records/limit-row-checks.js';

/** Arguments of a check of a limit-table entry (issue 12); the passphrase unlocks the checker's key. */
export interface RecordRowCheckArgs {
  readonly ruleSet: RuleSetId;
  readonly entryKey: string;
  readonly verdict: 'matches' | 'differs';
  readonly documentExpr?: string;
  readonly reference: string;
  readonly note?: string;
  readonly personId: string;
  readonly passphrase: string;
}

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
  /** 2 = signed with a personal key, covering the previous revision's link and the trust anchor; absent = 1 (before personal keys). */
  readonly statementVersion?: 2;
  /** Chain link (SHA-256 of the signed statement) of the previous signed revision; null for the first. */
  readonly previousLink?: string | null;
  /** Key id of the trust anchor the signer's key was trusted under when signing. */
  readonly trustAnchor?: string;
  /**
   * Whether the signing key is on THIS installation's trust list (computed when read, never taken
   * from a file; left out of exports). False = shown as "unverified signature", never as signed.
   */
  readonly keyTrusted?: boolean;
}

/**
 * What the officer submits to sign: who (their person record, whose key signs), their passphrase
 * and the statement. Name, role and time are NOT accepted: they come from the key's owner and the
 * back end's clock.
 */
export interface SignOff {
  readonly personId: Id;
  readonly passphrase: string;
  readonly statement: string;
}

/** A person's signing key as the register shows it (the private key never leaves the back end). */
export interface PersonKey {
  readonly keyId: string;
  /** First 20 hex digits of the key id in groups of four, for reading aloud and writing down. */
  readonly fingerprint: string;
  readonly personId: Id;
  readonly createdAt: Timestamp;
  readonly retiredAt: Timestamp | null;
  readonly retiredReason: string;
  /** On this installation's trust list by an unbroken endorsement chain. */
  readonly trusted: boolean;
  readonly isAnchor: boolean;
  /** The endorsement chain (or why it is broken), one sentence per link. */
  readonly trustChain: readonly string[];
}

/**
 * The trust list as this desk believes it: the register's endorsements under the trust anchor
 * configured on this desk (outside the database), as the app and printed documents show it.
 */
export interface TrustListInfo {
  /** Where this desk keeps its anchor setting. */
  readonly path: string;
  readonly anchor: string | null;
  /** Short form of the anchor key id (what the officer wrote down at set-up). */
  readonly anchorFingerprint: string | null;
  /** All 64 hex digits of the anchor in groups of four, to compare with the paper copy. */
  readonly anchorFull: string | null;
  /** When the anchor was configured on this desk. */
  readonly anchorSetAt: Timestamp | null;
  /** The anchors this register was set up with, all 64 hex digits in groups of four. */
  readonly registerAnchors: readonly string[];
  /** Keys trusted on this desk. */
  readonly keys: number;
  /** No anchor on this desk, a damaged setting, or an anchor the register does not know. */
  readonly problems: readonly string[];
}

/** One check of a verification, in words an officer can read. */
export interface VerifyCheck {
  readonly check: 'signature' | 'key-trusted' | 'fingerprint' | 'results' | 'chain' | 'protections' | 'co-signature' | 'limit-table-check';
  readonly ok: boolean;
  readonly finding: string;
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
  /**
   * `current` was saved by an older calculation, before some optional inputs existed: the defaults
   * the calculation assumed for them, one sentence each (empty when none).
   */
  readonly assumedDefaults: readonly string[];
}

/** What a save started from: the revision the officer opened and its save counter then. */
export interface SaveBase {
  readonly revisionId: Id;
  readonly version: number;
}

/**
 * What an edit or deletion of a register entry started from: the entry's `updatedAt` when the
 * officer opened it (its version), and the fields as they were shown then, so that a refusal can
 * say what someone else changed meanwhile. The version alone decides; `seen` only words the answer.
 */
export interface RegisterBase<Seen> {
  readonly updatedAt: Timestamp;
  readonly seen?: Seen;
}

/** What the register can delete with a confirmation. */
export type DeletionKind = 'site' | 'room' | 'person';

/** What deleting a register entry would do, for the confirmation shown before it. */
export interface DeletionImpact {
  /** The entry, in the register's words: 'Room B2.14 (Ultrafast laboratory)'. */
  readonly what: string;
  /** What is deleted with it, one line each: '2 lasers: "Ti:sapphire oscillator", "Pump laser"'. */
  readonly alsoDeleted: readonly string[];
  /** Why it cannot be deleted (signed records refer to it), or null when it can. */
  readonly refusal: string | null;
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
  /** The signed revision's key is not on this installation's trust list: show "unverified signature", never "signed". */
  readonly signatureUnverified: boolean;
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
  /** The signing key is trusted on this desk: a chain of valid endorsements (stored in the register) to the trust anchor configured on this desk, outside the database. */
  readonly keyTrusted: boolean;
  /** The endorsement chain from the signing key to the trust anchor (or why it is broken). */
  readonly trustChain: readonly string[];
  /** The revision chain is whole: no revision removed, reordered or re-marked; list columns match the content. */
  readonly chainIntact: boolean;
  /** Who signed (the key's owner as recorded), or null. */
  readonly signer: { readonly name: string; readonly role: string; readonly signedAt: Timestamp; readonly keyFingerprint: string } | null;
  /** Each check with its finding. */
  readonly checks: readonly VerifyCheck[];
  /** Recomputing the stored inputs with this core gives the stored results. */
  readonly resultsMatchCore: boolean;
  /** Core that made the stored results vs the core used now. */
  readonly calculatedWith: string;
  readonly verifiedWith: string;
  /** Stored results vs recomputed results (path/old = stored, new = recomputed). */
  readonly differences: readonly FieldDifference[];
  /** Plain sentences: what failed and what it means. */
  readonly findings: readonly string[];
  /** Each co-signature of the revision (schema 7) with its own checks; empty when none. */
  readonly coSignatures: readonly CoSignatureCheck[];
}

// ---------------------------------------------------------------- export / import

export const EXPORT_FORMAT = 'beamwarden-export' as const;
/** 2: adds the co-signatures (`coSignatures`). Files of version 1 (none) still import. */
export const EXPORT_VERSION = 2 as const;
/** Every export format version this Beamwarden imports. */
export const READABLE_EXPORT_VERSIONS = [1, 2] as const;

/**
 * A co-signature as carried by an export file (format version 2): what the co-signer's key signed
 * (co-signature-checks.ts CoSignedStatement, with the assessment and revision number taken from the
 * revision it names) and the signature; its public key is in the document's signingKeys.
 */
export interface ExportedCoSignature {
  readonly revisionId: Id;
  readonly personId: Id;
  readonly name: string;
  readonly role: string;
  readonly signedAt: Timestamp;
  readonly statement: string;
  /** Link (SHA-256 of the canonical main signed statement) of the signature countersigned. */
  readonly signedLink: string;
  /** Record fingerprint of the revision countersigned. */
  readonly fingerprint: string;
  readonly keyId: string;
  readonly trustAnchor: string;
  readonly signature: string;
}

export interface ExportedAssessment {
  readonly id: Id;
  readonly roomId: Id;
  readonly installationId: Id | null;
  readonly createdAt: Timestamp;
  readonly revisions: readonly Revision[];
}

export interface ExportDocument {
  readonly format: typeof EXPORT_FORMAT;
  readonly version: (typeof READABLE_EXPORT_VERSIONS)[number];
  readonly exportedAt: Timestamp;
  /** What was exported: a whole site, one room, or one assessment. */
  readonly scope: { readonly kind: 'site' | 'room' | 'assessment'; readonly id: Id };
  readonly sites: readonly Site[];
  readonly rooms: readonly Room[];
  readonly installations: readonly LaserInstallation[];
  readonly eyewear: readonly Eyewear[];
  readonly people: readonly Person[];
  readonly assessments: readonly ExportedAssessment[];
  /** Public keys of every signature and co-signature in the document. */
  readonly signingKeys: ReadonlyArray<{ readonly keyId: string; readonly publicKey: string }>;
  /** Co-signatures of the signed revisions in the document (format version 2; absent in version 1). */
  readonly coSignatures?: readonly ExportedCoSignature[];
  /** The register's signed checks of the limit tables (issue 12); absent in files written before them. */
  readonly limitRowChecks?: readonly ExportedRowCheck[];
}

/**
 * What the checker's key signs for a check of a limit-table entry (canonical JSON of this object):
 * made by the back end (electron/backend/records/limit-row-checks.ts), carried by the export.
 */
export interface RowCheckStatement {
  readonly format: 'beamwarden-limit-row-check';
  readonly version: 1;
  readonly id: Id;
  readonly ruleSet: RuleSetId;
  readonly entryKey: string;
  /** The entry as written in the table when it was checked. */
  readonly entryExpr: string;
  readonly verdict: 'matches' | 'differs';
  readonly documentExpr: string | null;
  readonly reference: string;
  readonly note: string;
  readonly personId: Id;
  readonly name: string;
  readonly role: string;
  readonly signedAt: Timestamp;
  readonly keyId: string;
  readonly trustAnchor: string;
}

/** One signed check of a limit-table entry as exported: the signed statement's fields and the signature. */
export interface ExportedRowCheck extends Omit<RowCheckStatement, 'format' | 'version'> {
  readonly signature: string;
}

/** The officer's explicit admission of exporting sites' keys, after seeing their fingerprints. */
export interface ImportAdmission {
  readonly keyIds: readonly string[];
  readonly endorserPersonId: Id;
  readonly endorserPassphrase: string;
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
  /** Signed revisions whose key is not on this installation's trust list: imported, shown as unverified. */
  readonly unverified: number;
  /** Co-signatures added (each checked: signature valid and covering its revision's sign-off). */
  readonly coSignatures: number;
  /** Of those, co-signatures whose key is not on this installation's trust list: shown as unverified. */
  readonly unverifiedCoSignatures: number;
  /** Keys in the file that this installation does not trust (fingerprint and claimed owner). */
  readonly untrustedKeys: ReadonlyArray<{ readonly keyId: string; readonly fingerprint: string; readonly claimedSigner: string }>;
  /** Drafts kept beside the imported version because the two differed (nothing is discarded). */
  readonly keptDrafts: readonly KeptDraft[];
  /** The file was written by an older Beamwarden: the defaults assumed for what it lacks, one sentence each. */
  readonly assumedDefaults: readonly string[];
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
