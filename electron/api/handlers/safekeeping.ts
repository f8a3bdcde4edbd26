import { z } from 'zod';
import { isServerAddress, restoreBackup } from '../../backend/records/index.js';
import { NO_SERVER_BACKUP } from '../../backend/records/pg-engine.js';
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
      // The institution register's backups are the server's; its address is never a file to replace.
      if (isServerAddress(ctx.databasePath)) throw new ApiFailure('conflict', NO_SERVER_BACKUP);
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
