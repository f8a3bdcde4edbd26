/**
 * Configuring the trust anchor on this desk (Settings & about): the officer types or pastes the
 * anchor's fingerprint as given to them on paper. Only the desk's own setting changes (outside the
 * database); nothing in the register is written, so a reader's desk can set it too. Whether the
 * register agrees is reported by trustListInfo in plain words (issue 15, item 4).
 */
import { z } from 'zod';
import { parseOrThrow, type StoreContext } from './context.js';
import { trustListInfo } from './personal-keys.js';
import { clearAnchorSetting, readTypedFingerprint, writeAnchorSetting } from './trust-anchor-setting.js';
import { RecordError, type TrustListInfo } from './types.js';

export const DeskAnchorSchema = z.strictObject({ fingerprint: z.string().max(300, 'is too long for a key fingerprint') });

export async function setDeskAnchor(ctx: StoreContext, raw: z.input<typeof DeskAnchorSchema>): Promise<TrustListInfo> {
  const args = parseOrThrow(DeskAnchorSchema, raw, "This desk's trust anchor");
  const typed = readTypedFingerprint(args.fingerprint);
  if (!typed.ok) {
    throw new RecordError('invalid', `The fingerprint of the trust anchor ${typed.problem}. Nothing was changed.`, [{ path: 'fingerprint', problem: typed.problem }]);
  }
  writeAnchorSetting(ctx.keyDir, typed.anchor, ctx.now());
  return trustListInfo(ctx);
}

export async function clearDeskAnchor(ctx: StoreContext): Promise<TrustListInfo> {
  clearAnchorSetting(ctx.keyDir);
  return trustListInfo(ctx);
}
