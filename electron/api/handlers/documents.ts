import { z } from 'zod';
import { IdSchema } from '../../backend/schemas/index.js';
import { DOCUMENT_FILE_NAME, documentInputFromAssessment, renderDocument, renderSiteDoorNotices, renderSiteReports } from '../../backend/pdf/index.js';
import type { DocumentHandlers } from '../contracts/documents.js';
import type { ApiContext } from '../context.js';
import type { AreaTable } from '../operation.js';
import { ApiFailure } from '../reply.js';

export const DocumentRequestSchema = z.strictObject({
  kind: z.enum(['report', 'door-notice', 'eyewear-sheet']),
  assessmentId: IdSchema,
  revisionId: IdSchema.optional(),
  paper: z.enum(['A4', 'Letter']),
  units: z.enum(['SI', 'ANSI']),
  signalWord: z.literal('DANGER').optional(),
  /** Door of the room plan the door notice is for (its small plan says "You are here" there). */
  entranceId: z.string().min(1, 'must name a door of the room plan').max(200, 'must name a door of the room plan').optional(),
});

export const SiteDocumentRequestSchema = z.strictObject({
  kind: z.enum(['door-notice', 'report']),
  siteId: IdSchema,
  paper: z.enum(['A4', 'Letter']),
  units: z.enum(['SI', 'ANSI']),
});

function fileSafe(s: string): string {
  return s.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 40) || 'room';
}

export const documentTable: AreaTable<DocumentHandlers, ApiContext> = {
  'document-render': {
    input: DocumentRequestSchema,
    run: async (req, { store }) => {
      const doc = await documentInputFromAssessment(store, req.assessmentId, req.revisionId !== undefined ? { revisionId: req.revisionId } : {});
      const entrance = req.kind === 'door-notice' && req.entranceId !== undefined ? req.entranceId : undefined;
      if (entrance !== undefined && !(doc.content.input.plan?.doors ?? []).some((d) => d.id === entrance)) {
        throw new ApiFailure('not_found', 'The entrance chosen for the door notice is not a door on the room plan of this revision. Choose one of its doors.', 'entranceId');
      }
      const pdf = await renderDocument(req.kind, doc, {
        paper: req.paper,
        units: req.units,
        ...(req.signalWord !== undefined ? { signalWord: req.signalWord } : {}),
        ...(entrance !== undefined ? { entranceId: entrance } : {}),
      });
      const state = doc.signature ? 'signed' : 'DRAFT';
      const fileName = `${DOCUMENT_FILE_NAME[req.kind]}-${fileSafe(doc.room.code)}-rev${doc.assessment.revisionNo}-${state}.pdf`;
      return { fileName, mime: 'application/pdf', base64: pdf.toString('base64') };
    },
  },
  'document-render-site': {
    input: SiteDocumentRequestSchema,
    run: async (req, { store }) => {
      const site = await store.getSite(req.siteId);
      const opts = { paper: req.paper, units: req.units };
      if (req.kind === 'report') {
        const reports = await renderSiteReports(store, site.id, opts);
        return { fileName: `assessment-reports-${fileSafe(site.name)}-${reports.rooms.length}-rooms.pdf`, mime: 'application/pdf', base64: reports.pdf.toString('base64') };
      }
      const batch = await renderSiteDoorNotices(store, site.id, opts);
      return { fileName: `door-notices-${fileSafe(site.name)}-${batch.rooms.length}-rooms.pdf`, mime: 'application/pdf', base64: batch.pdf.toString('base64') };
    },
  },
};
