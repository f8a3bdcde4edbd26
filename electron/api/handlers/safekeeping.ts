import { z } from 'zod';
import { restoreBackup } from '../../backend/records/index.js';
import type { SafekeepingHandlers } from '../contracts/safekeeping.js';
import type { ApiContext } from '../context.js';
import type { AreaTable } from '../operation.js';
import { ApiFailure } from '../reply.js';
import { EmptySchema } from '../schemas/common.js';

const PathSchema = z.string().trim().min(1, 'must not be empty').max(4096, 'must be at most 4096 characters');

export const safekeepingTable: AreaTable<SafekeepingHandlers, ApiContext> = {
  'backup-status': { input: EmptySchema, run: (_a, { store }) => store.backupStatus() },
  'backup-now': {
    input: z.strictObject({ folder: PathSchema.optional() }),
    run: ({ folder }, { store }) => store.backupInto(folder),
  },
  'restore-backup': {
    input: z.strictObject({ path: PathSchema }),
    run: async ({ path }, ctx) => {
      const reopen = ctx.openStore;
      if (!reopen) throw new ApiFailure('conflict', 'This window cannot restore a backup itself: close Beamwarden and run "npm run restore".');
      // Close first: restore never replaces a database that this app is still writing.
      await ctx.store.close();
      try {
        return await restoreBackup({ from: path, to: ctx.databasePath, ...(ctx.nativeBinding !== undefined ? { nativeBinding: ctx.nativeBinding } : {}) });
      } finally {
        ctx.store = await reopen();
      }
    },
  },
};
