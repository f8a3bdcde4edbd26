/** Contract of the 'limit-checks' area: the officer's signed checks of the limit tables (issue 12). */
import type { RecordRowCheckArgs, RowCheckRecord } from '../../backend/records/types.js';

export type LimitCheckHandlers = {
  /** Every signed check (of one rule set, or all), oldest first, each with this installation's verdict on it. */
  'limit-checks-list': (args: { readonly ruleSet?: 'icnirp2013' | 'eu2006' }) => Promise<RowCheckRecord[]>;
  /** Check one open entry against the published document, signed with the checker's key (passphrase). */
  'limit-check-record': (args: RecordRowCheckArgs) => Promise<RowCheckRecord>;
};
