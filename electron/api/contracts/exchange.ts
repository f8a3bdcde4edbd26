/** Contract of the 'exchange' area: JSON export/import, CSV inventory import, demo data. */
import type { CsvExistingChoice, CsvImportReport, Id, ImportAdmission, ImportSummary, Site } from './records.js';

/** An export file: the JSON document gzip-compressed (`.json.gz`), base64 for the trip over IPC/HTTP. */
export interface ExportFile {
  readonly fileName: string;
  readonly mime: 'application/gzip';
  readonly base64: string;
  /** Size of the plain JSON inside, in bytes (for the officer's information). */
  readonly jsonBytes: number;
}

export type ExchangeHandlers = {
  'export-json': (args: { readonly kind: 'site' | 'room' | 'assessment'; readonly id: Id }) => Promise<ExportFile>;
  /**
   * The whole document is checked first; nothing is written unless all of it is valid. Either the
   * file's bytes (`base64`: gzip-compressed or plain JSON) or plain JSON `text`. `admit`: the
   * exporting site's keys the officer admits after comparing their fingerprints.
   */
  'import-json': (args: { readonly text?: string; readonly base64?: string; readonly admit?: ImportAdmission }) => Promise<ImportSummary>;
  /** Signing keys in the file that this installation does not trust, with fingerprints, for the confirmation before import. */
  'import-json-untrusted-keys': (args: { readonly text?: string; readonly base64?: string }) => Promise<ImportSummary['untrustedKeys']>;
  /** `existing`: what to do with lasers the room already has (default 'ask': nothing imported, the report lists them). */
  'import-laser-csv': (args: { readonly roomId: Id; readonly csvText: string; readonly existing?: CsvExistingChoice }) => Promise<CsvImportReport>;
  /** Loads the invented demo site (no-op when present). */
  'demo-seed': (args: Record<string, never>) => Promise<Site>;
};
