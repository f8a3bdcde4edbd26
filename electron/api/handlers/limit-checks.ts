import { ListRowChecksSchema, RecordRowCheckSchema } from '../../backend/records/limit-row-checks.js';
import type { LimitCheckHandlers } from '../contracts/limit-checks.js';
import type { ApiContext } from '../context.js';
import type { AreaTable } from '../operation.js';

export const limitCheckTable: AreaTable<LimitCheckHandlers, ApiContext> = {
  'limit-checks-list': { input: ListRowChecksSchema, run: (a, { store }) => store.listRowChecks(a.ruleSet) },
  'limit-check-record': { input: RecordRowCheckSchema, run: (a, { store }) => store.recordRowCheck(a) },
};
