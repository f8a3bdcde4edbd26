/**
 * Zod schemas for the record store's types (electron/backend/records/types.ts): register entries,
 * assessment content, sign-off and the export document. Strict objects: unknown fields are
 * rejected with their path. The API/IPC layer reuses the *Draft and content schemas for payloads.
 */
import { z } from 'zod';
import type {
  AssessmentContent,
  Eyewear,
  EyewearDraft,
  ExportDocument,
  ExportedCoSignature,
  LaserInstallation,
  LaserInstallationDraft,
  Person,
  PersonDraft,
  Revision,
  Room,
  RoomDraft,
  Signature,
  SignOff,
  Site,
  SiteDraft,
} from '../records/types.js';
import { NON_BEAM_HAZARD_KINDS } from '../records/types.js';
import { EyewearSpecSchema, LaserClassSchema, LaserInputSchema, RoomInputSchema } from './inputs.js';
import { RoomResultSchema } from './results.js';
import { assertType, type SameShape } from './type-equality.js';

export const IdSchema = z.string().min(1, 'must not be empty').max(200, 'must be at most 200 characters');
export const TimestampSchema = z.iso.datetime({ offset: true, message: 'must be an ISO 8601 timestamp, e.g. 2026-05-01T09:30:00.000Z' });
export const CalendarDateSchema = z.iso.date({ message: 'must be a calendar date YYYY-MM-DD' });
const text = (max = 2000) => z.string().max(max, `must be at most ${max} characters`);
const requiredText = (max = 200) => z.string().trim().min(1, 'must not be empty').max(max, `must be at most ${max} characters`);

// ---------------------------------------------------------------- register

export const SiteDraftSchema = z.strictObject({
  name: requiredText(),
  building: text(200).optional(),
  address: text(500).optional(),
  notes: text(10_000).optional(),
});
export const SitePatchSchema = SiteDraftSchema.partial();
export const SiteSchema = z.strictObject({
  id: IdSchema,
  name: requiredText(),
  building: text(200),
  address: text(500),
  notes: text(10_000),
  createdAt: TimestampSchema,
  updatedAt: TimestampSchema,
});

export const RoomDraftSchema = z.strictObject({
  siteId: IdSchema,
  code: requiredText(50),
  name: text(200).optional(),
  responsiblePerson: text(200).optional(),
  contact: text(500).optional(),
  notes: text(10_000).optional(),
});
export const RoomPatchSchema = RoomDraftSchema.omit({ siteId: true }).partial();
export const RoomSchema = z.strictObject({
  id: IdSchema,
  siteId: IdSchema,
  code: requiredText(50),
  name: text(200),
  responsiblePerson: text(200),
  contact: text(500),
  notes: text(10_000),
  createdAt: TimestampSchema,
  updatedAt: TimestampSchema,
});

export const InstallationStatusSchema = z.enum(['in-service', 'retired']);
export const LaserInstallationDraftSchema = z.strictObject({
  roomId: IdSchema,
  laser: LaserInputSchema,
  laserType: text(200).optional(),
  maker: text(200).optional(),
  model: text(200).optional(),
  serialNumber: text(200).optional(),
  registrationNumber: text(200).optional(),
  status: InstallationStatusSchema.optional(),
  notes: text(10_000).optional(),
});
export const LaserInstallationPatchSchema = LaserInstallationDraftSchema.omit({ roomId: true }).partial();
export const LaserInstallationSchema = z.strictObject({
  id: IdSchema,
  roomId: IdSchema,
  laserType: text(200),
  maker: text(200),
  model: text(200),
  serialNumber: text(200),
  registrationNumber: text(200),
  laser: LaserInputSchema,
  classAsLabelled: LaserClassSchema.nullable(),
  status: InstallationStatusSchema,
  notes: text(10_000),
  createdAt: TimestampSchema,
  updatedAt: TimestampSchema,
});

const quantity = z.number().int('must be a whole number').min(0, 'must be 0 or more').max(100_000, 'must be at most 100 000');
export const EyewearConditionSchema = z.enum(['not recorded', 'good', 'worn', 'damaged', 'withdrawn'], {
  message: 'must be one of: not recorded, good, worn, damaged, withdrawn',
});
export const EyewearDraftSchema = z.strictObject({
  siteId: IdSchema,
  spec: EyewearSpecSchema,
  location: text(200).optional(),
  quantity: quantity.optional(),
  notes: text(10_000).optional(),
  inspectedOn: CalendarDateSchema.nullable().optional(),
  condition: EyewearConditionSchema.optional(),
  nextInspection: CalendarDateSchema.nullable().optional(),
});
export const EyewearPatchSchema = EyewearDraftSchema.omit({ siteId: true }).partial();
export const EyewearSchema = z.strictObject({
  id: IdSchema,
  siteId: IdSchema,
  spec: EyewearSpecSchema,
  location: text(200),
  quantity,
  notes: text(10_000),
  // exports written before schema version 5 have no upkeep fields: nothing recorded
  inspectedOn: CalendarDateSchema.nullable().default(null),
  condition: EyewearConditionSchema.default('not recorded'),
  nextInspection: CalendarDateSchema.nullable().default(null),
  createdAt: TimestampSchema,
  updatedAt: TimestampSchema,
});

export const PersonDraftSchema = z.strictObject({
  name: requiredText(),
  role: text(200).optional(),
  email: text(200).optional(),
  phone: text(100).optional(),
});
export const PersonPatchSchema = PersonDraftSchema.partial();
export const PersonSchema = z.strictObject({
  id: IdSchema,
  name: requiredText(),
  role: text(200),
  email: text(200),
  phone: text(100),
  createdAt: TimestampSchema,
  updatedAt: TimestampSchema,
});

// ---------------------------------------------------------------- assessment content

export const OperatingStateSchema = z.enum(['normal', 'alignment', 'maintenance', 'service', 'set-up']);
export const ControlCategorySchema = z.enum(['engineering', 'administrative', 'ppe']);
export const ControlDecisionSchema = z.enum(['accepted', 'rejected', 'not-applicable']);

export const ControlChoiceSchema = z
  .strictObject({
    category: ControlCategorySchema,
    measure: requiredText(500),
    decision: ControlDecisionSchema,
    reason: text(2000).optional(),
    implementation: z.enum(['in-place', 'to-do']).optional(),
    owner: text(200).optional(),
    due: CalendarDateSchema.optional(),
  })
  // A control left out must say why (risk-based approach; domain reference 6.2 item 8).
  .refine((c) => c.decision === 'accepted' || (c.reason ?? '').trim().length > 0, {
    message: 'a rejected or not-applicable control needs a reason',
    path: ['reason'],
  });

export const NonBeamHazardKindSchema = z.enum(NON_BEAM_HAZARD_KINDS);
export const NonBeamHazardSchema = z.strictObject({
  kind: NonBeamHazardKindSchema,
  present: z.boolean(),
  note: text(2000),
  controls: z.array(text(500)),
});

export const ExposureDurationChoiceSchema = z.strictObject({
  beamId: IdSchema,
  duration_s: z.number().positive('must be greater than 0 s'),
  why: text(1000),
});

export const AssumptionsSchema = z.strictObject({
  exposureDurations: z.array(ExposureDurationChoiceSchema),
  personsPresent: text(1000),
  opticalAidsPossible: z.boolean(),
  other: z.array(text(1000)),
});

export const EyewearChoiceSchema = z.strictObject({
  eyewearTag: IdSchema,
  beamIds: z.array(IdSchema),
  note: text(1000),
});

export const AssessmentContentSchema = z.strictObject({
  title: requiredText(300),
  input: RoomInputSchema,
  operatingStates: z.array(OperatingStateSchema),
  assumptions: AssumptionsSchema,
  controls: z.array(ControlChoiceSchema),
  nonBeamHazards: z.array(NonBeamHazardSchema),
  eyewearChosen: z.array(EyewearChoiceSchema),
  notes: text(50_000),
  reviewBy: CalendarDateSchema.nullable(),
});

// ---------------------------------------------------------------- sign-off, revisions

// Name, role and signing time are deliberately absent: the signer is the owner of the key that the
// passphrase opens, and the time is the back end's clock. A client sending them is refused (strict).
export const SignOffSchema = z.strictObject({
  personId: IdSchema,
  passphrase: z.string().min(1, 'must not be empty').max(1000, 'must be at most 1000 characters'),
  statement: requiredText(5000),
});

const hex64 = z.string().regex(/^[0-9a-f]{64}$/, 'must be 64 lower-case hex digits (SHA-256)');
export const SignatureSchema = z.strictObject({
  revisionId: IdSchema,
  personId: IdSchema.nullable(),
  name: requiredText(),
  role: requiredText(),
  signedAt: TimestampSchema,
  statement: requiredText(5000),
  fingerprint: hex64,
  algorithm: z.literal('Ed25519'),
  signature: z.string().regex(/^[A-Za-z0-9+/]{86}==$/, 'must be a base64 Ed25519 signature (64 bytes)'),
  keyId: hex64,
  publicKey: z.string().regex(/^-----BEGIN PUBLIC KEY-----\n[A-Za-z0-9+/=\n]+-----END PUBLIC KEY-----\n?$/, 'must be a PEM public key'),
  statementVersion: z.literal(2).optional(),
  previousLink: hex64.nullable().optional(),
  trustAnchor: hex64.optional(),
  keyTrusted: z.boolean().optional(),
});

export const RevisionStatusSchema = z.enum(['draft', 'signed', 'superseded']);
export const RevisionSchema = z
  .strictObject({
    id: IdSchema,
    assessmentId: IdSchema,
    revisionNo: z.number().int().min(1, 'must be 1 or more'),
    status: RevisionStatusSchema,
    content: AssessmentContentSchema,
    results: RoomResultSchema,
    calculatedWith: requiredText(),
    basedOn: IdSchema.nullable(),
    createdAt: TimestampSchema,
    updatedAt: TimestampSchema,
    signature: SignatureSchema.nullable(),
  })
  .refine((r) => (r.status === 'draft') === (r.signature === null), {
    message: 'a signed or superseded revision needs its signature, and a draft has none',
    path: ['signature'],
  })
  .refine((r) => r.signature === null || r.signature.revisionId === r.id, {
    message: 'signature.revisionId must equal the revision id',
    path: ['signature', 'revisionId'],
  });

export const ExportedAssessmentSchema = z.strictObject({
  id: IdSchema,
  roomId: IdSchema,
  installationId: IdSchema.nullable(),
  createdAt: TimestampSchema,
  revisions: z.array(RevisionSchema).min(1, 'an assessment needs at least one revision'),
});

/** A co-signature in an export file (format version 2); its public key is in signingKeys. */
export const ExportedCoSignatureSchema = z.strictObject({
  revisionId: IdSchema,
  personId: IdSchema,
  name: requiredText(),
  role: requiredText(),
  signedAt: TimestampSchema,
  statement: requiredText(2000),
  signedLink: hex64,
  fingerprint: hex64,
  keyId: hex64,
  trustAnchor: hex64,
  signature: SignatureSchema.shape.signature,
});

export const ExportedRowCheckSchema = z.strictObject({
  id: IdSchema,
  ruleSet: z.enum(['icnirp2013', 'eu2006']),
  entryKey: z.string().min(1).max(200),
  entryExpr: z.string().min(1).max(200),
  verdict: z.enum(['matches', 'differs']),
  documentExpr: z.string().min(1).max(200).nullable(),
  reference: z.string().min(1).max(300),
  note: z.string().max(1000),
  personId: IdSchema,
  name: z.string().min(1).max(300),
  role: z.string().max(300),
  signedAt: TimestampSchema,
  keyId: hex64,
  trustAnchor: z.string().max(200),
  signature: z.string().min(1).max(200),
});

export const ExportDocumentSchema = z.strictObject({
  format: z.literal('beamwarden-export', { error: 'must be "beamwarden-export"' }),
  version: z.union([z.literal(1), z.literal(2)], { error: 'must be 1 or 2 (the export format versions this Beamwarden reads)' }),
  exportedAt: TimestampSchema,
  scope: z.strictObject({ kind: z.enum(['site', 'room', 'assessment']), id: IdSchema }),
  sites: z.array(SiteSchema),
  rooms: z.array(RoomSchema),
  installations: z.array(LaserInstallationSchema),
  eyewear: z.array(EyewearSchema),
  people: z.array(PersonSchema),
  assessments: z.array(ExportedAssessmentSchema),
  signingKeys: z.array(z.strictObject({ keyId: hex64, publicKey: SignatureSchema.shape.publicKey })),
  coSignatures: z.array(ExportedCoSignatureSchema).optional(),
  limitRowChecks: z.array(ExportedRowCheckSchema).max(10_000).optional(),
});

// ---- compile-time proof that the schemas are the record types (fails to compile on drift)
assertType<SameShape<z.infer<typeof SiteSchema>, Site>>(true);
assertType<SameShape<z.infer<typeof SiteDraftSchema>, SiteDraft>>(true);
assertType<SameShape<z.infer<typeof RoomSchema>, Room>>(true);
assertType<SameShape<z.infer<typeof RoomDraftSchema>, RoomDraft>>(true);
assertType<SameShape<z.infer<typeof LaserInstallationSchema>, LaserInstallation>>(true);
assertType<SameShape<z.infer<typeof LaserInstallationDraftSchema>, LaserInstallationDraft>>(true);
assertType<SameShape<z.infer<typeof EyewearSchema>, Eyewear>>(true);
assertType<SameShape<z.infer<typeof EyewearDraftSchema>, EyewearDraft>>(true);
assertType<SameShape<z.infer<typeof PersonSchema>, Person>>(true);
assertType<SameShape<z.infer<typeof PersonDraftSchema>, PersonDraft>>(true);
assertType<SameShape<z.infer<typeof AssessmentContentSchema>, AssessmentContent>>(true);
assertType<SameShape<z.infer<typeof SignOffSchema>, SignOff>>(true);
assertType<SameShape<z.infer<typeof SignatureSchema>, Signature>>(true);
assertType<SameShape<z.infer<typeof RevisionSchema>, Revision>>(true);
assertType<SameShape<z.infer<typeof ExportedCoSignatureSchema>, ExportedCoSignature>>(true);
assertType<SameShape<z.infer<typeof ExportDocumentSchema>, ExportDocument>>(true);
