import { z } from 'zod';
import { IdSchema } from '../../backend/schemas/index.js';
import type { ExchangeHandlers } from '../contracts/exchange.js';
import type { ApiContext } from '../context.js';
import type { AreaTable } from '../operation.js';
import { EmptySchema } from '../schemas/common.js';
import { ImportAdmissionSchema } from '../../backend/records/personal-keys.js';
import { exportFileBytes, exportFileText } from '../../backend/records/export-file.js';

/**
 * Plain text (CSV, or JSON sent as text) up to 30 M characters. Export files travel gzip-compressed
 * (a 50-revision, 20-laser room is well under 10 MB), and the JSON inside may be much larger
 * (export-file.ts bounds it).
 */
const MAX_IMPORT_CHARS = 30_000_000;
/** Base64 of an export file: within the loopback host's request limit (32 MiB). */
const MAX_IMPORT_BASE64 = 31_000_000;

function fileSafe(s: string): string {
  return s.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'export';
}

export const exchangeTable: AreaTable<ExchangeHandlers, ApiContext> = {
  'export-json': {
    input: z.strictObject({ kind: z.enum(['site', 'room', 'assessment']), id: IdSchema }),
    run: async ({ kind, id }, { store }) => {
      const doc = await (kind === 'site' ? store.exportSite(id) : kind === 'room' ? store.exportRoom(id) : store.exportAssessment(id));
      const label =
        kind === 'site' ? (await store.getSite(id)).name : kind === 'room' ? (await store.getRoom(id)).code : `assessment-${id.slice(0, 8)}`;
      const { gz, jsonBytes } = await exportFileBytes(doc);
      return {
        fileName: `beamwarden-${kind}-${fileSafe(label)}-${doc.exportedAt.slice(0, 10)}.json.gz`,
        mime: 'application/gzip',
        base64: gz.toString('base64'),
        jsonBytes,
      };
    },
  },
  'import-json': {
    input: z
      .strictObject({
        text: z.string().max(MAX_IMPORT_CHARS, `must be at most ${MAX_IMPORT_CHARS} characters`).optional(),
        base64: z.base64('must be the file as base64').max(MAX_IMPORT_BASE64, 'the file is too large to send at once; export one room instead').optional(),
        admit: ImportAdmissionSchema.optional(),
      })
      .refine((a) => (a.text === undefined) !== (a.base64 === undefined), 'give either the file (base64) or its text, not both'),
    run: ({ text, base64, admit }, { store }) => store.importDocument(text ?? exportFileText(Buffer.from(base64 ?? '', 'base64')), admit),
  },
  'import-json-untrusted-keys': {
    input: z
      .strictObject({
        text: z.string().max(MAX_IMPORT_CHARS, `must be at most ${MAX_IMPORT_CHARS} characters`).optional(),
        base64: z.base64('must be the file as base64').max(MAX_IMPORT_BASE64, 'the file is too large to send at once; export one room instead').optional(),
      })
      .refine((a) => (a.text === undefined) !== (a.base64 === undefined), 'give either the file (base64) or its text, not both'),
    run: ({ text, base64 }, { store }) => store.untrustedKeysIn(text ?? exportFileText(Buffer.from(base64 ?? '', 'base64'))),
  },
  'import-laser-csv': {
    input: z.strictObject({
      roomId: IdSchema,
      csvText: z.string().max(MAX_IMPORT_CHARS, `must be at most ${MAX_IMPORT_CHARS} characters`),
      existing: z.enum(['ask', 'skip', 'add']).optional(),
    }),
    run: ({ roomId, csvText, existing }, { store }) => store.importLaserCsv(roomId, csvText, existing ?? 'ask'),
  },
  'demo-seed': { input: EmptySchema, run: (_a, { store }) => store.seedDemo() },
};
