import { DeskAnchorSchema } from '../../backend/records/desk-anchor.js';
import { ChangePassphraseSchema, CreateKeySchema, EndorseKeySchema, RetireKeySchema } from '../../backend/records/personal-keys.js';
import type { KeyHandlers } from '../contracts/keys.js';
import type { ApiContext } from '../context.js';
import type { AreaTable } from '../operation.js';
import { EmptySchema } from '../schemas/common.js';

export const keyTable: AreaTable<KeyHandlers, ApiContext> = {
  'person-keys-list': { input: EmptySchema, run: (_a, { store }) => store.listPersonKeys() },
  'person-key-create': { input: CreateKeySchema, run: (a, { store }) => store.createPersonKey(a) },
  'person-key-change-passphrase': { input: ChangePassphraseSchema, run: (a, { store }) => store.changeKeyPassphrase(a) },
  'person-key-retire': { input: RetireKeySchema, run: (a, { store }) => store.retirePersonKey(a) },
  'person-key-endorse': { input: EndorseKeySchema, run: (a, { store }) => store.endorseKey(a) },
  'trust-list-info': { input: EmptySchema, run: (_a, { store }) => store.trustList() },
  'trust-anchor-set': { input: DeskAnchorSchema, run: (a, { store }) => store.setTrustAnchor(a) },
  'trust-anchor-clear': { input: EmptySchema, run: (_a, { store }) => store.clearTrustAnchor() },
};
