import { z } from 'zod';
import { IdSchema } from '../../backend/schemas/index.js';
import type { ExchangeHandlers } from '../contracts/exchange.js';
import type { ApiContext } from '../context.js';
import type { AreaTable } from '../operation.js';
import { EmptySchema } from '../schemas/common.js';
import { ImportAdmissionSchema } from '../../backend/records/personal-keys.js';

/** A whole-site export of hundreds of lasers is a few MB; 30 MB leaves room and bounds memory. */
const MAX_IMPORT_CHARS = 30_000_000;

function fileSafe(s: string): string {
  return s.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'export';
}

export const exchangeTable: AreaTable<ExchangeHandlers, ApiContext> = {
  'export-json': {
    input: z.strictObject({ kind: z.enum(['site', 'room', 'assessment']), id: IdSchema }),
    run: ({ kind, id }, { store }) => {
      const doc = kind === 'site' ? store.exportSite(id) : kind === 'room' ? store.exportRoom(id) : store.exportAssessment(id);
      const label =
        kind === 'site' ? store.getSite(id).name : kind === 'room' ? store.getRoom(id).code : `assessment-${id.slice(0, 8)}`;
      return {
        fileName: `beamwarden-${kind}-${fileSafe(label)}-${doc.exportedAt.slice(0, 10)}.json`,
        mime: 'application/json',
        text: JSON.stringify(doc, null, 2),
      };
    },
  },
  'import-json': {
    input: z.strictObject({ text: z.string().max(MAX_IMPORT_CHARS, `must be at most ${MAX_IMPORT_CHARS} characters`), admit: ImportAdmissionSchema.optional() }),
    run: ({ text, admit }, { store }) => store.importDocument(text, admit),
  },
  'import-json-untrusted-keys': {
    input: z.strictObject({ text: z.string().max(MAX_IMPORT_CHARS, `must be at most ${MAX_IMPORT_CHARS} characters`) }),
    run: ({ text }, { store }) => store.untrustedKeysIn(text),
  },
  'import-laser-csv': {
    input: z.strictObject({ roomId: IdSchema, csvText: z.string().max(MAX_IMPORT_CHARS, `must be at most ${MAX_IMPORT_CHARS} characters`) }),
    run: ({ roomId, csvText }, { store }) => store.importLaserCsv(roomId, csvText),
  },
  'demo-seed': { input: EmptySchema, run: (_a, { store }) => store.seedDemo() },
};
