/** Contract of the 'exchange' area: JSON export/import, CSV inventory import, demo data. */
import type { CsvImportReport, Id, ImportAdmission, ImportSummary, Site } from '../../backend/records/types.js';

export interface TextFile {
  /** Suggested file name, e.g. "beamwarden-room-B2.14-2026-12-01.json". */
  readonly fileName: string;
  readonly mime: string;
  readonly text: string;
}

export type ExchangeHandlers = {
  'export-json': (args: { readonly kind: 'site' | 'room' | 'assessment'; readonly id: Id }) => Promise<TextFile>;
  /** The whole document is checked first; nothing is written unless all of it is valid. */
  'import-json': (args: { readonly text: string; readonly admit?: ImportAdmission }) => Promise<ImportSummary>;
  /** Signing keys in the file that this installation does not trust, with fingerprints, for the confirmation before import. */
  'import-json-untrusted-keys': (args: { readonly text: string }) => Promise<ImportSummary['untrustedKeys']>;
  'import-laser-csv': (args: { readonly roomId: Id; readonly csvText: string }) => Promise<CsvImportReport>;
  /** Loads the invented demo site (no-op when present). */
  'demo-seed': (args: Record<string, never>) => Promise<Site>;
};
