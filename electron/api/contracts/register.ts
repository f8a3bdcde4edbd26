/** Contract of the 'register' area: sites, rooms, laser installations, eyewear and people. */
import type {
  AssessmentSummary,
  DeletionImpact,
  DeletionKind,
  Eyewear,
  EyewearDraft,
  Id,
  LaserInstallation,
  LaserInstallationDraft,
  LaserUse,
  Person,
  PersonDraft,
  RegisterBase,
  Room,
  RoomDraft,
  Site,
  SiteDraft,
} from './records.js';

/** An edit names the version the officer opened; a stale one is refused with code 'stale'. */
type Patch<T> = { readonly id: Id; readonly patch: T; readonly expected: RegisterBase<T> };
type Removal<T> = { readonly id: Id; readonly expected: RegisterBase<T> };

/** One room with what the register screen shows beside it. */
export interface RoomOverview {
  readonly room: Room;
  readonly installations: readonly LaserInstallation[];
  readonly assessments: readonly AssessmentSummary[];
}

export interface SiteOverview {
  readonly site: Site;
  readonly rooms: readonly RoomOverview[];
  readonly eyewear: readonly Eyewear[];
}

/** Everything the register screen lists, in one round trip (hundreds of lasers at most). */
export interface RegisterOverview {
  readonly sites: readonly SiteOverview[];
  readonly people: readonly Person[];
  /** Current revisions due for review on or before `dueBy`. */
  readonly dueForReview: readonly AssessmentSummary[];
  readonly dueBy: string;
}

export type RegisterHandlers = {
  'register-overview': (args: { readonly dueBy: string }) => Promise<RegisterOverview>;

  'site-create': (args: SiteDraft) => Promise<Site>;
  'site-update': (args: Patch<Partial<SiteDraft>>) => Promise<Site>;
  'site-delete': (args: Removal<Partial<SiteDraft>>) => Promise<void>;

  'room-get': (args: { readonly id: Id }) => Promise<Room>;
  'room-create': (args: RoomDraft) => Promise<Room>;
  'room-update': (args: Patch<Partial<Omit<RoomDraft, 'siteId'>>>) => Promise<Room>;
  'room-delete': (args: Removal<Partial<Omit<RoomDraft, 'siteId'>>>) => Promise<void>;

  'installations-list': (args: { readonly roomId: Id }) => Promise<LaserInstallation[]>;
  'installation-create': (args: LaserInstallationDraft) => Promise<LaserInstallation>;
  'installation-update': (args: Patch<Partial<Omit<LaserInstallationDraft, 'roomId'>>>) => Promise<LaserInstallation>;
  'installation-delete': (args: Removal<Partial<Omit<LaserInstallationDraft, 'roomId'>>>) => Promise<void>;
  'installation-history': (args: { readonly id: Id }) => Promise<LaserUse[]>;

  'eyewear-list': (args: { readonly siteId: Id }) => Promise<Eyewear[]>;
  'eyewear-create': (args: EyewearDraft) => Promise<Eyewear>;
  'eyewear-update': (args: Patch<Partial<Omit<EyewearDraft, 'siteId'>>>) => Promise<Eyewear>;
  'eyewear-delete': (args: Removal<Partial<Omit<EyewearDraft, 'siteId'>>>) => Promise<void>;

  'person-create': (args: PersonDraft) => Promise<Person>;
  'person-update': (args: Patch<Partial<PersonDraft>>) => Promise<Person>;
  'person-delete': (args: Removal<Partial<PersonDraft>>) => Promise<void>;

  /** Before a delete: what goes with the entry, or why it cannot be deleted (signed records are kept). */
  'register-delete-impact': (args: { readonly kind: DeletionKind; readonly id: Id }) => Promise<DeletionImpact>;
};
