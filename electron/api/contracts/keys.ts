/** Contract of the 'keys' area: personal signing keys, the trust list and this desk's trust anchor. */
import type { Id, PersonKey, TrustListInfo } from '../../backend/records/types.js';

export type KeyHandlers = {
  'person-keys-list': (args: Record<string, never>) => Promise<PersonKey[]>;
  /** The installation's first key becomes the trust anchor; later keys are admitted by a trusted signer's passphrase. */
  'person-key-create': (args: {
    readonly personId: Id;
    readonly passphrase: string;
    readonly passphraseAgain: string;
    readonly endorserPersonId?: Id;
    readonly endorserPassphrase?: string;
  }) => Promise<PersonKey>;
  'person-key-change-passphrase': (args: { readonly personId: Id; readonly passphrase: string; readonly newPassphrase: string; readonly newPassphraseAgain: string }) => Promise<PersonKey>;
  'person-key-retire': (args: { readonly personId: Id; readonly reason: string }) => Promise<PersonKey>;
  'person-key-endorse': (args: { readonly keyId: string; readonly endorserPersonId: Id; readonly endorserPassphrase: string }) => Promise<PersonKey | null>;
  'trust-list-info': (args: Record<string, never>) => Promise<TrustListInfo>;
  /** This desk's trust anchor (outside the database), typed or pasted from paper: 64 hex digits. */
  'trust-anchor-set': (args: { readonly fingerprint: string }) => Promise<TrustListInfo>;
  'trust-anchor-clear': (args: Record<string, never>) => Promise<TrustListInfo>;
};
