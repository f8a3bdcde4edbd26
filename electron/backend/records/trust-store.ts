/**
 * The trust list as one desk believes it: the register's endorsements (table `trust_endorsement`,
 * schema 9, shared by every desk of an institution register) under the anchor configured on THIS
 * desk (trust-anchor-setting.ts, outside the database). One code path for both engines: a desk's
 * own register file and the institution register are read and judged the same way (trust-list.ts).
 * Design: issue 10 (a trust anchor outside the database; keys admitted only by endorsement) and
 * issue 15, item 4 (trust across desks).
 */
import { inTransaction, type StoreContext } from './context.js';
import { readAnchorSetting, writeAnchorSetting, type AnchorSettingRead } from './trust-anchor-setting.js';
import { readTrustListFile, shortKeyFingerprint, type TrustEntry, type TrustList } from './trust-list.js';

interface EndorsementRow {
  key_id: string;
  endorsed_by: string;
  public_key: string;
  person_id: string | null;
  person_name: string;
  admitted_at: string;
  endorsement: string;
  retired_at: string | null;
  retired_reason: string | null;
}

export interface TrustRead {
  /** Where this desk's anchor setting is kept. */
  readonly path: string;
  /** The register's endorsements under this desk's anchor; null while the desk has no anchor. */
  readonly list: TrustList | null;
  /** A damaged anchor setting, in plain words. */
  readonly problem: string | null;
}

/**
 * Lists already built, by their content: the same rows under the same anchor give the same object,
 * so the verdicts trustOf keeps for it are reused (verify --all asks once per assessment). Rows are
 * read every time, so a new endorsement or retirement on another desk is seen at once.
 */
const built = new Map<string, TrustList>();

/** The anchor this desk judges by: one given for this open (an auditor's check), else the desk's setting. */
export function deskAnchor(ctx: StoreContext): AnchorSettingRead {
  if (ctx.trustAnchor !== undefined) return { path: 'the fingerprint given on the command line', anchor: ctx.trustAnchor, setAt: null, problem: null };
  return readAnchorSetting(ctx.keyDir);
}

export async function loadTrust(ctx: StoreContext): Promise<TrustRead> {
  const setting = deskAnchor(ctx);
  if (setting.anchor === null) return { path: setting.path, list: null, problem: setting.problem };
  const rows = await ctx.q.all<EndorsementRow>(
    `SELECT e.key_id, e.endorsed_by, e.public_key, e.person_id, e.person_name, e.admitted_at, e.endorsement, r.retired_at, r.reason AS retired_reason
       FROM trust_endorsement e LEFT JOIN trust_retirement r ON r.key_id = e.key_id
      ORDER BY e.admitted_at, e.key_id, e.endorsed_by, e.endorsement`,
  );
  const key = `${setting.anchor}\n${JSON.stringify(rows)}`;
  let list = built.get(key);
  if (list === undefined) {
    const entries: TrustEntry[] = rows.map((r) => ({
      keyId: r.key_id,
      publicKey: r.public_key,
      personId: r.person_id,
      personName: r.person_name,
      admittedAt: r.admitted_at,
      endorsedBy: r.endorsed_by,
      endorsement: r.endorsement,
      ...(r.retired_at !== null ? { retiredAt: r.retired_at, retiredReason: r.retired_reason ?? '' } : {}),
    }));
    list = { format: 'beamwarden-trust-list', version: 1, anchor: setting.anchor, entries };
    if (built.size > 50) built.clear();
    built.set(key, list);
  }
  return { path: setting.path, list, problem: null };
}

/** The anchors the register was set up with (append-only `trust_anchor_pin`). */
export async function registerAnchors(ctx: StoreContext): Promise<string[]> {
  return (await ctx.q.all<{ anchor: string }>('SELECT anchor FROM trust_anchor_pin ORDER BY pinned_at, anchor')).map((r) => r.anchor);
}

/** Store an endorsement; the same endorsement twice is one row. Call inside the write's transaction. */
export async function addEndorsement(ctx: StoreContext, e: TrustEntry): Promise<void> {
  await ctx.q.run(
    `INSERT INTO trust_endorsement (key_id, endorsed_by, public_key, person_id, person_name, admitted_at, endorsement)
     VALUES (?, ?, ?, ?, ?, ?, ?) ON CONFLICT (key_id, endorsement) DO NOTHING`,
    e.keyId, e.endorsedBy, e.publicKey, e.personId, e.personName, e.admittedAt, e.endorsement,
  );
}

/** Record that a key is retired (the first retirement stands). */
export async function addRetirement(ctx: StoreContext, keyId: string, at: string, reason: string): Promise<void> {
  await ctx.q.run('INSERT INTO trust_retirement (key_id, retired_at, reason) VALUES (?, ?, ?) ON CONFLICT (key_id) DO NOTHING', keyId, at, reason);
}

/**
 * A trust list FILE from before schema 9 (beside the database) is carried into the register at a
 * read-write open: its entries become rows (each keeps its endorsement, so it is judged as before)
 * and its anchor becomes this desk's setting when the desk has none. Only a file whose anchor the
 * register was set up with is carried (a desk's list of ANOTHER register is left alone); the file
 * itself is left as it was. Repeated at every open, so a restored older backup gets its rows back.
 */
export async function adoptTrustListFile(ctx: StoreContext): Promise<string[]> {
  const file = readTrustListFile(ctx.keyDir);
  if (file.list === null) return [];
  const setting = readAnchorSetting(ctx.keyDir);
  if (setting.problem !== null || (setting.anchor !== null && setting.anchor !== file.list.anchor)) return [];
  if (!(await registerAnchors(ctx)).includes(file.list.anchor)) return [];
  const list = file.list;
  const warnings: string[] = [];
  try {
    await inTransaction(ctx, 'Trust list', async (ctx) => {
      for (const e of list.entries) {
        await addEndorsement(ctx, e);
        if (e.retiredAt) await addRetirement(ctx, e.keyId, e.retiredAt, e.retiredReason ?? '');
      }
    });
  } catch (e) {
    // A reader's account may not write the register: the desk keeps working, and says so.
    warnings.push(
      `The endorsements of the trust list file ${file.path} could not be carried into the register (${e instanceof Error ? e.message : String(e)}). ` +
        'Keys endorsed only there are not trusted until an officer with write access opens the register from this desk.',
    );
  }
  if (setting.anchor === null) {
    writeAnchorSetting(ctx.keyDir, list.anchor, ctx.now());
    if (warnings.length === 0) await ctx.audit('trust-anchor-configured', 'signing_key', list.anchor, `from the trust list file ${file.path}; fingerprint ${shortKeyFingerprint(list.anchor)}`);
  }
  return warnings;
}
