/** Command-line options of `npm run backup` and `npm run restore` (read by electron/cli/command-args.ts). */
import { z } from 'zod';

const path = (what: string) => z.string().min(1, `${what} must not be empty`).max(4096);

export const BackupArgsSchema = z.strictObject({ db: path('--db').optional(), out: path('--out').optional() });
export const RestoreArgsSchema = z.strictObject({ db: path('--db').optional(), from: path('--from').optional() });
