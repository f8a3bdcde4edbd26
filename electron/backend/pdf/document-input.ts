/**
 * What the three printed documents are made from: one revision of an assessment with its results,
 * the register entries it names, and the signature (null = draft). Built from the record store by
 * `documentInputFromAssessment`, or directly by callers that hold the same data.
 */
import { z } from 'zod';
import type { RoomResult } from '../../../core/model/results.js';
import type { UnitHabit } from '../../../core/units/quantities.js';
import type {
  AssessmentContent,
  LaserInstallation,
  Person,
  RevisionStatus,
  Room,
  Signature,
  Site,
} from '../records/types.js';

export type InstallationInfo = Pick<
  LaserInstallation,
  'id' | 'laserType' | 'maker' | 'model' | 'serialNumber' | 'registrationNumber' | 'classAsLabelled'
>;

export type SignatureInfo = Pick<Signature, 'name' | 'role' | 'signedAt' | 'statement' | 'fingerprint' | 'keyId'> & {
  /** False: the signing key is not on this installation's trust list; the paper says UNVERIFIED SIGNATURE. */
  readonly keyTrusted: boolean;
  /** Short fingerprint of the trust list's anchor key, printed so a replaced trust list shows on paper. */
  readonly trustAnchor: string | null;
  /** Co-signatures of the revision (schema 7), oldest first; an untrusted one prints as UNVERIFIED CO-SIGNATURE. */
  readonly coSigners?: ReadonlyArray<{ readonly name: string; readonly role: string; readonly signedAt: string; readonly statement: string; readonly keyFingerprint: string; readonly keyTrusted: boolean }>;
};

export interface DocumentInput {
  readonly site: Pick<Site, 'name' | 'building' | 'address'>;
  readonly room: Pick<Room, 'code' | 'name' | 'responsiblePerson' | 'contact'>;
  /** The laser safety officer named on the notice (name and how to reach them). */
  readonly officer: Pick<Person, 'name' | 'role' | 'email' | 'phone'>;
  /** Register entries of the lasers, matched to `content.input.lasers[].id`; missing ones print the laser name. */
  readonly installations: readonly InstallationInfo[];
  /** Where each eyewear tag is kept (tag -> place), for the eyewear sheet. */
  readonly eyewearLocations: Readonly<Record<string, string>>;
  readonly assessment: {
    readonly id: string;
    readonly revisionNo: number;
    readonly status: RevisionStatus;
    readonly createdAt: string;
    readonly updatedAt: string;
    readonly calculatedWith: string;
  };
  readonly content: AssessmentContent;
  readonly results: RoomResult;
  /** Whom to call in an emergency (room, else site; register notes line "Emergency contact: ..."); null = not recorded. */
  readonly emergencyContact?: string | null;
  /** null = not signed: every page carries the DRAFT mark and there is no fingerprint. */
  readonly signature: SignatureInfo | null;
}

export type Paper = 'A4' | 'Letter';

export interface RenderOptions {
  readonly paper: Paper;
  /** W/m², J/m² (SI) or W/cm², J/cm² (ANSI habit); distances are in metres either way. */
  readonly units: UnitHabit;
  /** The door notice's signal word is chosen by class; an officer may raise it to DANGER (domain 5.1). */
  readonly signalWord?: 'DANGER';
  /** Door of the room plan the notice is for (its small plan marks it); default the plan's first door. */
  readonly entranceId?: string;
}

/** Options arriving from the UI or the command line are checked before use. */
export const renderOptionsSchema = z
  .object({
    paper: z.enum(['A4', 'Letter']).default('A4'),
    units: z.enum(['SI', 'ANSI']).default('SI'),
    signalWord: z.literal('DANGER').optional(),
    entranceId: z.string().min(1, 'must name a door of the room plan').optional(),
  })
  .strict();

export const DEFAULT_RENDER_OPTIONS: RenderOptions = { paper: 'A4', units: 'SI' };
