/** Contract of the 'assessments' area: drafts, revisions, comparison, sign-off and verification. */
import type { RoomInput } from '../../../core/model/inputs.js';
import type {
  Assessment,
  AssessmentContent,
  AssessmentSummary,
  CoSignature,
  FieldDifference,
  Id,
  Revision,
  RevisionSummary,
  SaveBase,
  SignOff,
  VerifyReport,
  WorkSave,
  WorkSaved,
} from './records.js';

export type AssessmentHandlers = {
  'room-input-from-register': (args: { readonly roomId: Id }) => Promise<RoomInput>;
  'assessment-new-content': (args: { readonly roomId: Id; readonly installationId?: Id | null }) => Promise<AssessmentContent>;
  'assessment-create': (args: { readonly roomId: Id; readonly installationId?: Id | null; readonly content: AssessmentContent }) => Promise<Assessment>;
  'assessment-get': (args: { readonly id: Id }) => Promise<Assessment>;
  'assessments-list': (args: { readonly roomId: Id }) => Promise<AssessmentSummary[]>;
  /** Saves into the open draft, or opens a new draft revision when the newest one is signed. */
  'assessment-save': (args: { readonly id: Id; readonly content: AssessmentContent; readonly expected: SaveBase }) => Promise<Assessment>;
  /** The workspace's save: new/edited register lasers and the assessment in one transaction. */
  'work-save': (args: WorkSave) => Promise<WorkSaved>;
  'assessment-discard-draft': (args: { readonly id: Id }) => Promise<void>;
  'revisions-list': (args: { readonly assessmentId: Id }) => Promise<RevisionSummary[]>;
  'revision-get': (args: { readonly revisionId: Id }) => Promise<Revision>;
  'revisions-compare': (args: { readonly fromRevisionId: Id; readonly toRevisionId: Id }) => Promise<FieldDifference[]>;
  /** After a stale refusal: what the stored assessment changed since the content this desk opened. */
  'assessment-changes-since': (args: { readonly id: Id; readonly seen: AssessmentContent }) => Promise<FieldDifference[]>;
  /** `reviewed`: the revision and save counter shown in the confirm step; a draft that moved on is refused (code 'stale'). */
  'assessment-sign': (args: { readonly id: Id; readonly signOff: SignOff; readonly reviewed: SaveBase }) => Promise<Assessment>;
  'assessment-verify': (args: { readonly assessmentId: Id; readonly revisionId?: Id }) => Promise<VerifyReport>;
  /** A second person countersigns a signed revision with their own key (schema 7). */
  'revision-countersign': (args: { readonly revisionId: Id; readonly personId: Id; readonly passphrase: string; readonly statement: string }) => Promise<CoSignature>;
  'revision-co-signatures': (args: { readonly revisionId: Id }) => Promise<CoSignature[]>;
};
