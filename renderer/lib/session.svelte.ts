/**
 * Application state shared by the screens: the register overview, the room being assessed, its
 * assessment (as last saved) and the draft being edited, with live core results of the draft.
 */
import type { AppInfo, RegisterChange } from '../../electron/api/contracts/app.js';
import type { RegisterOverview, RoomOverview } from '../../electron/api/contracts/register.js';
import type { Assessment, AssessmentContent, LaserInstallation, Room, Site, WorkSaved } from '../../electron/api/contracts/records.js';
import { ApiError, invoke, messageOf } from './api.js';
import { contentFrom, draftFrom, roomInputFrom, saveBlockers, type Draft } from './draft.js';
import { completeHazards } from './hazards-catalogue.js';
import { addDays, today } from './dates.js';
import { describeChange, diffView, type ChangeRow } from './diff-view.js';
import { settings } from './settings.svelte.js';

export { addDays, today };
import { laserInputFrom } from './beam-form.js';
import { confirmChoice } from './confirm-choice.js';
import { dateTime } from './format.js';
import { unsavedChanges, unsavedIntro } from './unsaved-changes.js';
import type { LaserInput } from '../../core/index.js';

const LAST_KEY = 'beamwarden.last.v1';
/** How long one question for register changes may wait on the back end (its limit is 30 s). */
const CHANGE_WAIT_MS = 25_000;
/** Between two questions that heard nothing (the wait ran out): a breath, not a busy loop. */
const CHANGE_PAUSE_MS = 250;
/** Waiting for this desk's own operation to finish before comparing (at most 30 s). */
const BUSY_WAIT_STEP_MS = 100;
const BUSY_WAIT_STEPS = 300;
/** After a failed question: the host may be restarting. */
const CHANGE_RETRY_MS = 4000;

export interface Notice {
  readonly kind: 'ok' | 'error' | 'info';
  readonly text: string;
}


class Session {
  info = $state<AppInfo | null>(null);
  overview = $state<RegisterOverview | null>(null);
  loadError = $state<string | null>(null);
  notice = $state<Notice | null>(null);
  busy = $state(false);
  /** The message of a save refused because someone else saved first (null when none). */
  stale = $state<string | null>(null);
  /** After such a refusal: what the other save changed, by the form's labels (empty until read, or when it cannot be). */
  staleChanges = $state<ChangeRow[]>([]);
  /**
   * The open assessment was deleted from the institution register by another officer (its draft
   * discarded, or its room deleted) while it was open here: what the banner says (null when not).
   * What is on screen is then stored nowhere, so it is kept on screen until the officer keeps it
   * as an assessment of its own or leaves it.
   */
  deletedElsewhere = $state<string | null>(null);
  /** The message of a register edit refused because someone else changed the entry first (null when none). */
  registerStale = $state<string | null>(null);
  /** Counts reloads of the register after such a refusal: open register forms take the stored values again. */
  registerEpoch = $state(0);

  room = $state<Room | null>(null);
  site = $state<Site | null>(null);
  installations = $state<LaserInstallation[]>([]);
  assessment = $state<Assessment | null>(null);
  draft = $state<Draft | null>(null);
  private savedJson = $state('');

  readonly draftInput = $derived(this.draft ? roomInputFrom(this.draft) : null);
  readonly contentJson = $derived(this.draft ? JSON.stringify(contentFrom(this.draft)) : '');
  readonly dirty = $derived(this.draft !== null && (this.contentJson !== this.savedJson || this.draft.lasers.some((l) => l.isNew)));
  readonly blockers = $derived(this.draft ? saveBlockers(this.draft) : []);

  /** An institution register on a server: its backups are the server's, never this desk's. */
  readonly onServer = $derived(/^postgres(?:ql)?:\/\//i.test(this.info?.databasePath ?? ''));

  get firstStart(): boolean {
    return this.overview !== null && this.overview.sites.length === 0;
  }

  private noticeTimer: ReturnType<typeof setTimeout> | undefined;

  /** Show a message; confirmations fade after a few seconds, errors stay until dismissed. */
  say(kind: Notice['kind'], text: string): void {
    this.notice = { kind, text };
    clearTimeout(this.noticeTimer);
    if (kind !== 'error') this.noticeTimer = setTimeout(() => (this.notice = null), 6000);
  }

  async init(): Promise<void> {
    try {
      this.info = await invoke('app-info', {});
      await this.refreshOverview();
      const last = readLast();
      if (last && this.roomOverview(last.roomId)) await this.openRoom(last.roomId, last.assessmentId ?? undefined);
      void this.followChanges();
    } catch (e) {
      this.loadError = messageOf(e);
    }
  }

  /** The newest register change heard of (institution register: writes by any officer). */
  private changesSeen = 0;
  private following = false;

  /**
   * On an institution register, the open screens hear of the changes other officers commit as they
   * happen (the question waits on the back end until the next change: a long poll) and read the
   * register again: the overview always, the open assessment when it has no unsaved edits and was
   * saved or signed elsewhere. With unsaved edits the officer is told instead; their save is then
   * checked against the other change as always. A register file has no changes to hear (only this
   * program writes it), so the asking stops at once.
   */
  private async followChanges(): Promise<void> {
    let heard;
    try {
      // The first question only starts the listening, and is answered at once.
      heard = await invoke('register-changes', { since: this.changesSeen, ...(this.following ? { waitMs: CHANGE_WAIT_MS } : {}) });
    } catch {
      // The host is gone, or the connection broke while waiting: ask again a little later.
      if (this.following) setTimeout(() => void this.followChanges(), CHANGE_RETRY_MS);
      return;
    }
    if (!heard.live) return;
    // The first answer only starts the listening: what this desk has on screen is current.
    const first = !this.following;
    this.following = true;
    this.changesSeen = heard.seq;
    if (!first && heard.changes.length > 0) {
      try {
        // This desk's own save or sign-off is announced too, often before its answer is back:
        // compare only once it has landed, or the officer is told of their own change.
        for (let i = 0; this.busy && i < BUSY_WAIT_STEPS; i++) await new Promise((r) => setTimeout(r, BUSY_WAIT_STEP_MS));
        await this.refreshOverview();
        const open = this.assessment;
        if (!open && this.draft && this.room && this.deletedElsewhere === null && this.roomOverview(this.room.id) === null) {
          this.tellDeleted(await this.whoDeletedHeard(heard.changes));
        }
        if (open && heard.changes.some((c) => ['assessment', 'revision', 'signature', 'co_signature'].includes(c.table))) {
          const now = await invoke('assessment-get', { id: open.id }).catch((e: unknown) => {
            if (!(e instanceof ApiError && e.code === 'not_found')) throw e;
            return null;
          });
          if (now === null) {
            if (this.assessment === open) this.tellDeleted(await this.whoDeletedHeard(heard.changes));
            this.askAgain(heard.changes.length);
            return;
          }
          const changed = now.current.id !== open.current.id || now.version !== open.version;
          if (changed && (this.dirty || this.busy)) {
            const who = [...new Set(heard.changes.map((c) => c.by))].join(', ');
            this.say('info', `This assessment was changed in the institution register (by ${who}). Your unsaved edits stay on screen; saving will show you what changed.`);
          } else if (changed) {
            // The other officer's save may have changed the room's register lasers too: take them
            // with the assessment, or this desk's next save would name the lasers as they were
            // before and be refused as if someone had changed them after it.
            this.installations = await invoke('installations-list', { roomId: now.roomId });
            this.setAssessment(now);
          }
        }
      } catch {
        // A failed refresh is tried again with the next change.
      }
    }
    this.askAgain(heard.changes.length);
  }

  /** Asked again at once: the back end holds the question until something changes. */
  private askAgain(heard: number): void {
    setTimeout(() => void this.followChanges(), heard > 0 ? 0 : CHANGE_PAUSE_MS);
  }

  /** The ids whose deletion elsewhere takes the open work with it: the assessment, its room, its site. */
  private deletedIds(): Set<string> {
    return new Set([this.assessment?.id, this.room?.id, this.site?.id].filter((x): x is string => x !== undefined));
  }

  /**
   * Words for the banner when the open work was deleted elsewhere (the overview is already read
   * again): the site with the room, the room, or only the assessment's draft; by whom on a server
   * (null: not known, on a register file another window of the same host).
   */
  private tellDeleted(who: string | null): void {
    const a = this.assessment;
    const title = (a?.current.content.title ?? this.draft?.title ?? '').trim() || 'Laser hazard assessment';
    const code = this.room?.code ?? '';
    const register = this.onServer ? 'the institution register' : 'the register';
    // Not known: on a server, a desk that has not heard the deletion; on a file, another window of this host.
    const by = who !== null && who !== '' ? `by ${who}` : this.onServer ? 'by another officer' : 'in another window';
    const withIt = a ? `“${title}”` : 'its assessments';
    const siteGone = this.site !== null && !(this.overview?.sites ?? []).some((s) => s.site.id === this.site?.id);
    const roomGone = this.room !== null && this.roomOverview(this.room.id) === null;
    const what = siteGone
      ? `Site ${this.site?.name ?? ''} was deleted from ${register} ${by}, with room ${code} and ${withIt}.`
      : roomGone
        ? `Room ${code} was deleted from ${register} ${by}, with ${withIt}.`
        : `“${title}” of room ${code} was deleted from ${register} ${by} (its draft was discarded).`;
    const mine = this.dirty ? 'Your unsaved edits stay on screen, but what is on screen is stored nowhere now.' : 'What is on screen is stored nowhere now.';
    this.deletedElsewhere = `${what} ${mine}`;
  }

  /**
   * Who deleted the open work, from the changes just heard; on a server, where those changes may
   * not hold the deletion itself (it can arrive in an earlier or later batch than the change that
   * revealed it), from every change the register keeps. Null when not known.
   */
  private async whoDeletedHeard(changes: readonly RegisterChange[]): Promise<string | null> {
    const who = whoDeleted(changes, this.deletedIds());
    if (who !== null || !this.onServer) return who;
    try {
      const all = await invoke('register-changes', { since: 0 });
      return all.live ? whoDeleted(all.changes, this.deletedIds()) : null;
    } catch {
      // Who it was is a courtesy; the banner stands without it.
      return null;
    }
  }

  /**
   * After a save refused as "not found": whether the open room or assessment went (deleted in
   * another window or on another desk); if so the banner says so, with who on a server.
   */
  private async noticeDeleted(): Promise<boolean> {
    const a = this.assessment;
    const room = this.room;
    if (!room) return false;
    await this.refreshOverview();
    const roomGone = this.roomOverview(room.id) === null;
    const assessmentGone = a !== null && !roomGone && !(this.roomOverview(room.id)?.assessments ?? []).some((x) => x.id === a.id);
    if (!roomGone && !assessmentGone) return false;
    let who: string | null = null;
    try {
      const heard = await invoke('register-changes', { since: 0 });
      if (heard.live) who = whoDeleted(heard.changes, this.deletedIds());
    } catch {
      // Who it was is a courtesy; the banner stands without it.
    }
    this.tellDeleted(who);
    return true;
  }

  /** Whether the room of a deleted assessment is gone too (keeping a copy then registers the room again). */
  get deletedWithRoom(): boolean {
    return this.deletedElsewhere !== null && this.room !== null && this.roomOverview(this.room.id) === null;
  }

  /** Whether the site of the open room is gone too (keeping a copy then registers the site again). */
  get deletedWithSite(): boolean {
    return this.deletedWithRoom && this.site !== null && !(this.overview?.sites ?? []).some((s) => s.site.id === this.site?.id);
  }

  /**
   * After the open assessment was deleted elsewhere: keep what is on screen as an assessment of its
   * own, in its room; when the room was deleted too, the room is registered again in its site (same
   * code, name and contacts) and the lasers on screen go into the register with it. Nothing typed
   * is lost; the officer then decides with the other officer what stays.
   */
  async keepDeletedAsCopy(): Promise<void> {
    const d = this.draft;
    const room = this.room;
    if (!d || !room || this.deletedElsewhere === null) return;
    await this.run(async () => {
      await this.refreshOverview();
      let roomId = room.id;
      let again = false;
      let siteAgain = false;
      if (this.roomOverview(room.id) === null) {
        let site = this.site;
        if (!site) throw new Error(`Room ${room.code} cannot be registered again: its site is not known here. What is on screen stays; register the room again in the Register first.`);
        if (!(this.overview?.sites ?? []).some((s) => s.site.id === site?.id)) {
          // The site went too: register it again as it was, with the eyewear the assessment names,
          // so the copy has a room to live in (an officer without the right to add sites is refused here, in words).
          const eyewear = d.eyewear;
          site = await invoke('site-create', { name: site.name, building: site.building, address: site.address, notes: site.notes });
          for (const spec of eyewear) await invoke('eyewear-create', { siteId: site.id, spec: JSON.parse(JSON.stringify(spec)) as typeof spec });
          this.site = site;
          siteAgain = true;
        }
        const made = await invoke('room-create', { siteId: site.id, code: room.code, name: room.name, responsiblePerson: room.responsiblePerson, contact: room.contact, notes: room.notes });
        roomId = made.id;
        this.room = made;
        again = true;
      }
      // Lasers whose register entries went with the deletion go into the register again with the copy.
      const registered = await invoke('installations-list', { roomId });
      this.installations = registered;
      for (const lf of d.lasers) if (!lf.isNew && !registered.some((i) => i.id === lf.id)) lf.isNew = true;
      const { newLasers } = this.registerChanges(d);
      const content = contentFrom(d);
      const suffix = ' — your version, kept after it was deleted elsewhere';
      const kept = await invoke('work-save', {
        roomId,
        assessmentId: null,
        expected: null,
        content: { ...content, title: content.title.slice(0, 300 - suffix.length) + suffix },
        newLasers,
        changedLasers: [],
      });
      this.installations = [...kept.installations];
      this.setAssessment(kept.assessment);
      writeLast({ roomId, assessmentId: kept.assessment.id });
      await this.refreshOverview();
      this.say('ok', `Your version is kept as "${kept.assessment.current.content.title}" in room ${room.code}${siteAgain ? `, registered again with site ${this.site?.name ?? ''} and its eyewear` : again ? ', registered again' : ''}.`);
    });
  }

  async refreshOverview(): Promise<void> {
    this.overview = await invoke('register-overview', { dueBy: addDays(today(), 30) });
  }

  roomOverview(roomId: string): RoomOverview | null {
    for (const s of this.overview?.sites ?? []) for (const r of s.rooms) if (r.room.id === roomId) return r;
    return null;
  }

  siteOfRoom(roomId: string): Site | null {
    for (const s of this.overview?.sites ?? []) if (s.rooms.some((r) => r.room.id === roomId)) return s.site;
    return null;
  }

  /**
   * Open a room in the workspace: its newest assessment, or a new draft from the register. False
   * when the officer chose to keep editing the open draft instead (or the room could not be read).
   */
  async openRoom(roomId: string, assessmentId?: string): Promise<boolean> {
    if (!(await this.confirmDiscard())) return false;
    return this.run(async () => {
      const [room, installations, list] = await Promise.all([
        invoke('room-get', { id: roomId }),
        invoke('installations-list', { roomId }),
        invoke('assessments-list', { roomId }),
      ]);
      this.room = room;
      this.site = this.siteOfRoom(roomId);
      this.installations = installations;
      const chosen = list.find((a) => a.id === assessmentId) ?? [...list].sort((a, b) => b.updatedAt.localeCompare(a.updatedAt))[0];
      if (chosen) {
        this.setAssessment(await invoke('assessment-get', { id: chosen.id }));
      } else {
        const content = await invoke('assessment-new-content', { roomId });
        this.assessment = null;
        this.loadDraft(content, '');
      }
      writeLast({ roomId, assessmentId: this.assessment?.id ?? null });
    });
  }

  /** Start a fresh assessment for the open room (a second one, e.g. for one installation). */
  async newAssessment(): Promise<void> {
    const room = this.room;
    if (!room || !(await this.confirmDiscard())) return;
    await this.run(async () => {
      const content = await invoke('assessment-new-content', { roomId: room.id });
      this.assessment = null;
      this.loadDraft(content, '');
      writeLast({ roomId: room.id, assessmentId: null });
    });
  }

  /** Leaving a draft with unsaved changes asks first, naming what would be lost (nothing is lost silently). */
  private async confirmDiscard(ask: { title: string; confirmLabel: string } = { title: 'Discard the unsaved changes?', confirmLabel: 'Discard changes' }): Promise<boolean> {
    if (!this.dirty) return true;
    const lost = this.unsavedChanges();
    return confirmChoice({
      title: ask.title,
      body: `The open assessment “${this.draft?.title.trim() || 'Laser hazard assessment'}” of room ${this.room?.code ?? ''} has changes that are not saved.`,
      consequencesIntro: unsavedIntro(lost.length),
      consequences: lost,
      kept: `${this.storedVersionWords()} To keep your changes, choose Keep editing and save first.`,
      confirmLabel: ask.confirmLabel,
      cancelLabel: 'Keep editing',
      danger: true,
    });
  }

  /** Closing the window with unsaved changes asks the same question (true: close and discard). */
  confirmClose(): Promise<boolean> {
    return this.confirmDiscard({ title: 'Close Beamwarden and discard the unsaved changes?', confirmLabel: 'Discard changes and close' });
  }

  /** The unsaved changes of the open draft, one line each in the workspace's words (empty when none). */
  unsavedChanges(): string[] {
    const d = this.draft;
    if (!d || !this.dirty) return [];
    const saved = this.savedJson === '' ? null : (JSON.parse(this.savedJson) as AssessmentContent);
    return unsavedChanges(saved, contentFrom(d), d.lasers);
  }

  /** What stays when the draft is discarded: the stored revision, or the room and its register. */
  storedVersionWords(): string {
    const cur = this.assessment?.current;
    if (!cur) return 'The room and the lasers in its register stay as they are.';
    const status = cur.status === 'signed' ? 'signed' : 'draft';
    return `The stored revision ${cur.revisionNo} (${status}, saved ${dateTime(cur.updatedAt)}) and the register stay as they are.`;
  }

  private setAssessment(a: Assessment): void {
    this.assessment = a;
    const content = a.current.content;
    this.loadDraft(content, JSON.stringify(content));
  }

  private loadDraft(content: AssessmentContent, savedJson: string): void {
    this.deletedElsewhere = null;
    const ids = new Set(this.installations.map((i) => i.id));
    const d = draftFrom(content, ids);
    d.nonBeamHazards = completeHazards(d.nonBeamHazards);
    this.draft = d;
    // Compare against the draft's own normalised content, so opening a record is not a change.
    this.savedJson = savedJson === '' ? '' : JSON.stringify(contentFrom(d));
  }

  /** Save: new lasers go into the register, changed ones are updated, then the assessment is saved. */
  async save(): Promise<boolean> {
    const d = this.draft;
    const room = this.room;
    if (!d || !room) return false;
    if (this.blockers.length > 0) {
      this.say('error', `Not saved. Fix first: ${this.blockers.join(' | ')}`);
      return false;
    }
    if (this.deletedElsewhere !== null) {
      this.say('error', `Not saved: ${this.deletedElsewhere} Keep your version with the button in the message above.`);
      return false;
    }
    return this.run(async () => {
      // One call, one transaction: new and edited register lasers together with the assessment,
      // each part naming the state it was opened at, so a stale save is refused whole.
      const { newLasers, changedLasers } = this.registerChanges(d);
      const a = this.assessment;
      let saved: WorkSaved;
      try {
        saved = await invoke('work-save', {
          roomId: room.id,
          assessmentId: a?.id ?? null,
          expected: a ? { revisionId: a.current.id, version: a.version } : null,
          content: contentFrom(d),
          newLasers,
          changedLasers,
        });
      } catch (e) {
        // Someone else saved first: keep the officer's edits on screen and offer the two ways on.
        if (e instanceof ApiError && e.code === 'stale') {
          this.stale = e.message;
          if (a) await this.readStaleChanges(a);
        }
        // The room or the assessment went while it was open here: the banner says so and offers the copy.
        if (e instanceof ApiError && e.code === 'not_found') await this.noticeDeleted();
        throw e;
      }
      this.stale = null;
      this.staleChanges = [];
      for (const lf of d.lasers) {
        const id = saved.laserIds[lf.id];
        if (lf.isNew && id !== undefined) {
          lf.id = id;
          lf.isNew = false;
        }
      }
      this.installations = [...saved.installations];
      this.setAssessment(saved.assessment);
      writeLast({ roomId: room.id, assessmentId: saved.assessment.id });
      await this.refreshOverview();
      this.say('ok', `Saved: revision ${saved.assessment.current.revisionNo} (${saved.assessment.current.status}).`);
    });
  }

  /**
   * What the other officer's save changed since this desk opened `opened`, for the refusal banner
   * (who and when are in the refusal itself). A failure to read it leaves the list empty: the
   * refusal and the two ways on stay.
   */
  private async readStaleChanges(opened: Assessment): Promise<void> {
    try {
      const [diff, now] = await Promise.all([invoke('assessment-changes-since', { id: opened.id, seen: opened.current.content }), invoke('assessment-get', { id: opened.id })]);
      this.staleChanges = diffView(diff).content.map((d) => describeChange(d, now.current.content, undefined, settings.units));
    } catch {
      this.staleChanges = [];
    }
  }

  /** New and edited register lasers of the draft, each edited one with the state it was opened at. */
  private registerChanges(d: Draft): {
    newLasers: Array<{ draftId: string; laser: LaserInput; laserType: string }>;
    changedLasers: Array<{ id: string; laser: LaserInput; expectedUpdatedAt: string; seenLaser: LaserInput }>;
  } {
    const newLasers: Array<{ draftId: string; laser: LaserInput; laserType: string }> = [];
    const changedLasers: Array<{ id: string; laser: LaserInput; expectedUpdatedAt: string; seenLaser: LaserInput }> = [];
    for (const lf of d.lasers) {
      const { laser: full } = laserInputFrom(lf);
      if (!full) continue;
      // The register keeps what the laser is; the exposure duration is an assumption of the assessment.
      const laser = { ...full, beams: full.beams.map(({ exposureDuration_s: _t, ...b }) => b) };
      if (lf.isNew) {
        newLasers.push({ draftId: lf.id, laser, laserType: laser.name });
      } else {
        const reg = this.installations.find((i) => i.id === lf.id);
        if (reg && JSON.stringify(reg.laser) !== JSON.stringify(laser)) changedLasers.push({ id: lf.id, laser, expectedUpdatedAt: reg.updatedAt, seenLaser: reg.laser });
      }
    }
    return { newLasers, changedLasers };
  }

  /**
   * After a refused (stale) save: keep the officer's version as an assessment of its own in the
   * room (new lasers go into the register with it), then open the stored version, so the two can
   * be compared side by side and nothing typed is lost.
   */
  async keepMineAndReload(): Promise<void> {
    const d = this.draft;
    const room = this.room;
    const a = this.assessment;
    if (!d || !room || !a) return;
    await this.run(async () => {
      const { newLasers } = this.registerChanges(d);
      const content = contentFrom(d);
      const suffix = ' — your version, kept when your save was refused';
      const kept = await invoke('work-save', {
        roomId: room.id,
        assessmentId: null,
        expected: null,
        content: { ...content, title: content.title.slice(0, 300 - suffix.length) + suffix },
        newLasers,
        changedLasers: [],
      });
      this.stale = null;
      this.staleChanges = [];
      this.installations = [...kept.installations];
      this.setAssessment(await invoke('assessment-get', { id: a.id }));
      await this.refreshOverview();
      this.say('ok', `Your version is kept as "${kept.assessment.current.content.title}"; the stored version is open. Compare the two in the room's list.`);
    });
  }

  /** After a refused save: open the stored version, discarding the edits on screen (asked first). */
  async reloadDiscardingMine(): Promise<void> {
    const lost = this.unsavedChanges();
    const ok = await confirmChoice({
      title: 'Discard your changes and open the stored version?',
      body: 'Someone else saved this assessment after you opened it. Opening their stored version replaces what is on your screen.',
      consequencesIntro: unsavedIntro(lost.length),
      consequences: lost,
      kept: 'Their stored version and the register stay as they are. To keep your changes as well, choose Cancel and then “Keep my version as a copy, open the stored one”.',
      confirmLabel: 'Discard my changes and open the stored version',
      danger: true,
    });
    if (!ok) return;
    this.stale = null;
    this.staleChanges = [];
    const a = this.assessment;
    if (!a) return;
    await this.run(async () => {
      this.setAssessment(await invoke('assessment-get', { id: a.id }));
    });
  }

  /**
   * Discard the open draft revision (asked first, in the app's dialog): the draft leaves the
   * register; signed revisions are never touched. A draft on top of a signed revision gives that
   * revision back; a first draft (nothing signed) takes its assessment with it, and the room's
   * next assessment (or a fresh draft) opens. False when the officer kept it, or it was refused.
   */
  async discardDraft(): Promise<boolean> {
    const a = this.assessment;
    const room = this.room;
    if (!a || !room || a.current.status !== 'draft' || this.deletedElsewhere !== null) return false;
    const ok = await confirmChoice(discardDraftQuestion(a, room.code, this.unsavedChanges()));
    if (!ok || this.assessment !== a) return false;
    return this.run(async () => {
      await invoke('assessment-discard-draft', { id: a.id });
      this.stale = null;
      this.staleChanges = [];
      const rev = a.current.revisionNo;
      const title = a.current.content.title.trim() || 'Laser hazard assessment';
      if (rev > 1) {
        this.setAssessment(await invoke('assessment-get', { id: a.id }));
        await this.refreshOverview();
        this.say('ok', `Draft revision ${rev} of “${title}” discarded; signed revision ${rev - 1} is open again.`);
        return;
      }
      // The assessment went with its only revision: open the room as if chosen in the register.
      this.assessment = null;
      this.draft = null;
      await this.refreshOverview();
      const [installations, list] = await Promise.all([invoke('installations-list', { roomId: room.id }), invoke('assessments-list', { roomId: room.id })]);
      this.installations = installations;
      const next = [...list].sort((x, y) => y.updatedAt.localeCompare(x.updatedAt))[0];
      if (next) this.setAssessment(await invoke('assessment-get', { id: next.id }));
      else this.loadDraft(await invoke('assessment-new-content', { roomId: room.id }), '');
      writeLast({ roomId: room.id, assessmentId: next ? next.id : null });
      this.say('ok', `Draft “${title}” discarded; it had no signed revision, so it is no longer in the register of room ${room.code}.`);
    });
  }

  async reloadAssessment(): Promise<void> {
    const a = this.assessment;
    if (!a) return;
    await this.run(async () => {
      this.setAssessment(await invoke('assessment-get', { id: a.id }));
    });
  }

  /** Replace the open assessment after an operation returned a newer copy (sign-off). */
  adopt(a: Assessment): void {
    this.setAssessment(a);
  }

  /**
   * A register edit or deletion: like `run`, but a refusal because someone else changed the entry
   * first is shown as its own warning with a way to reload (the form keeps what was typed until then).
   */
  async runRegisterEdit(fn: () => Promise<void>): Promise<boolean> {
    this.busy = true;
    try {
      await fn();
      this.registerStale = null;
      return true;
    } catch (e) {
      if (e instanceof ApiError && e.code === 'stale') this.registerStale = e.message;
      else this.say('error', messageOf(e));
      return false;
    } finally {
      this.busy = false;
    }
  }

  /** After a refused register edit: read the register again; open forms show the stored values. */
  async reloadRegister(): Promise<void> {
    await this.run(async () => {
      await this.refreshOverview();
      this.registerStale = null;
      this.registerEpoch++;
    });
  }

  /** Run an operation with the busy flag; errors become a notice (a refused stale save has its own banner instead). */
  async run(fn: () => Promise<void>): Promise<boolean> {
    this.busy = true;
    try {
      await fn();
      return true;
    } catch (e) {
      if (e instanceof ApiError && e.code === 'stale' && this.stale !== null) return false;
      if (e instanceof ApiError && e.code === 'not_found' && this.deletedElsewhere !== null) return false;
      this.say('error', messageOf(e));
      return false;
    } finally {
      this.busy = false;
    }
  }
}


/**
 * The question before a draft revision is discarded: what leaves the register (the draft as last
 * saved, the edits not saved yet, and for a first draft the assessment itself) and what stays
 * (every signed revision, the room and its register).
 */
export function discardDraftQuestion(a: Assessment, roomCode: string, unsaved: readonly string[]): Parameters<typeof confirmChoice>[0] {
  const cur = a.current;
  const n = cur.revisionNo;
  const title = cur.content.title.trim() || 'Laser hazard assessment';
  const lost = [`Draft revision ${n} as last saved (${dateTime(cur.updatedAt)}): its inputs, assumptions, eyewear and control choices and its results`];
  if (n === 1) lost.push("The assessment itself: it has no signed revision, so it leaves the room's list");
  if (unsaved.length > 0) lost.push(...unsaved.map((u) => `Not saved yet: ${u}`));
  const register = `Room ${roomCode}, its lasers (also those added with this draft) and the eyewear shelf stay in the register.`;
  return {
    title: n === 1 ? `Discard the draft “${title}”?` : `Discard draft revision ${n} of “${title}”?`,
    body:
      n === 1
        ? `This assessment of room ${roomCode} has only this draft and was never signed. Discarding deletes it from the register; this cannot be undone.`
        : `Revision ${n} of this assessment of room ${roomCode} is a draft made from signed revision ${n - 1}. Discarding deletes the draft from the register; this cannot be undone.`,
    consequencesIntro: 'Deleted with it:',
    consequences: lost,
    kept:
      n === 1
        ? `Nothing signed is affected. ${register}`
        : `${n === 2 ? 'Signed revision 1 stays' : `Signed revisions 1 to ${n - 1} stay`} exactly as signed, and revision ${n - 1} opens again. ${register}`,
    confirmLabel: n === 1 ? 'Discard the draft' : `Discard draft revision ${n}`,
    cancelLabel: 'Keep the draft',
    danger: true,
  };
}

/** The accounts that deleted any of `ids` among the changes heard (else any deletion heard; null when none). */
function whoDeleted(changes: readonly RegisterChange[], ids: ReadonlySet<string>): string | null {
  const deletes = changes.filter((c) => c.operation === 'DELETE');
  const these = deletes.filter((c) => ids.has(c.id));
  const names = [...new Set((these.length > 0 ? these : deletes).map((c) => c.by))];
  return names.length > 0 ? names.join(', ') : null;
}

function readLast(): { roomId: string; assessmentId: string | null } | null {
  try {
    const raw: unknown = JSON.parse(localStorage.getItem(LAST_KEY) ?? 'null');
    if (typeof raw === 'object' && raw !== null && 'roomId' in raw && typeof raw.roomId === 'string') {
      const aid = 'assessmentId' in raw && typeof raw.assessmentId === 'string' ? raw.assessmentId : null;
      return { roomId: raw.roomId, assessmentId: aid };
    }
  } catch {
    // ignore a damaged preference
  }
  return null;
}

function writeLast(v: { roomId: string; assessmentId: string | null }): void {
  try {
    localStorage.setItem(LAST_KEY, JSON.stringify(v));
  } catch {
    // not essential
  }
}

export const session = new Session();
