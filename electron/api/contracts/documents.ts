/** Contract of the 'documents' area: the three printed documents as PDF bytes. */
import type { Id } from './records.js';

export type DocumentKind = 'report' | 'door-notice' | 'eyewear-sheet';

export interface BinaryFile {
  readonly fileName: string;
  readonly mime: 'application/pdf';
  /** The file's bytes, base64 (travels unchanged over IPC and JSON). */
  readonly base64: string;
}

export interface DocumentRequest {
  readonly kind: DocumentKind;
  readonly assessmentId: Id;
  /** Default: the current revision. */
  readonly revisionId?: Id;
  readonly paper: 'A4' | 'Letter';
  readonly units: 'SI' | 'ANSI';
  /** The officer may raise the door notice's signal word to DANGER (domain 5.1). */
  readonly signalWord?: 'DANGER';
  /** Door notice: the door of the room plan it is for (default the plan's first door). */
  readonly entranceId?: string;
}

export interface SiteDocumentRequest {
  /** Door notices (one page per room) or assessment reports (each room's report with its own page numbering). */
  readonly kind: 'door-notice' | 'report';
  readonly siteId: Id;
  readonly paper: 'A4' | 'Letter';
  readonly units: 'SI' | 'ANSI';
}

export type DocumentHandlers = {
  'document-render': (args: DocumentRequest) => Promise<BinaryFile>;
  /**
   * The door notices (one page per room) or the assessment reports of every room of a site
   * (current revisions) in one PDF, in the register's room order.
   */
  'document-render-site': (args: SiteDocumentRequest) => Promise<BinaryFile>;
};
