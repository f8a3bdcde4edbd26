import { RULE_SET_IDS, RULE_SET_NAME } from '../../../core/index.js';
import type { AppHandlers } from '../contracts/app.js';
import type { ApiContext } from '../context.js';
import type { AreaTable } from '../operation.js';
import { z } from 'zod';
import { EmptySchema } from '../schemas/common.js';

/** Longest a screen's question for changes is held open (well under any browser or proxy timeout). */
const MAX_CHANGE_WAIT_MS = 30_000;

export const appTable: AreaTable<AppHandlers, ApiContext> = {
  'app-info': {
    input: EmptySchema,
    run: async (_args, ctx) => {
      const trust = await ctx.store.trustList();
      return {
      name: 'Beamwarden',
      version: ctx.version,
      shell: ctx.shell,
      databasePath: ctx.databasePath,
      ruleSets: RULE_SET_IDS.map((id) => ({ id, name: RULE_SET_NAME[id] })),
        trustAnchorFingerprint: trust.anchorFingerprint,
        warnings: [...new Set([...ctx.store.info.warnings, ...trust.problems])],
      };
    },
  },
  'register-changes': {
    input: z.strictObject({
      since: z.number().int('must be a whole number').min(0, 'must be 0 or more'),
      waitMs: z.number().int('must be a whole number').min(0, 'must be 0 or more').max(MAX_CHANGE_WAIT_MS, `must be at most ${MAX_CHANGE_WAIT_MS}`).optional(),
    }),
    run: ({ since, waitMs }, ctx) => ctx.store.registerChanges(since, waitMs),
  },
};
