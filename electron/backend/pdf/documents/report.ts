/** The assessment report: the document an officer files and hands to an auditor (domain 6.2). */
import type { Content, TDocumentDefinitions } from 'pdfmake/interfaces';
import type { DocumentInput, RenderOptions } from '../document-input.js';
import { baseDocument, contentWidth, footerFor, headerFor } from '../page.js';
import { roomView } from '../room-view.js';
import { beamSummary, frontPage } from './report-front.js';
import { inputsSection } from './report-inputs.js';
import { derivationsSection, plotsSection } from './report-derivations.js';
import { planSection } from '../plan/report-plan.js';
import { controlsSection, eyewearSection, nonBeamSection, notesSection, signOffSection } from './report-tail.js';

const SIDE = 40;

export function reportDefinition(doc: DocumentInput, opts: RenderOptions): TDocumentDefinitions {
  const view = roomView(doc);
  const width = contentWidth(opts.paper, SIDE);
  const content: Content[] = [
    ...frontPage(doc, view),
    ...beamSummary(doc, view, opts.units),
    ...inputsSection(doc, view, opts.units),
    ...planSection(doc, view, width),
    ...plotsSection(doc, view, opts.units, width),
    ...controlsSection(doc),
    ...eyewearSection(doc, view),
    ...nonBeamSection(doc),
    ...notesSection(doc),
    ...signOffSection(doc),
    ...derivationsSection(doc, view),
  ];
  return {
    ...baseDocument(doc, opts.paper, 'Laser hazard assessment'),
    pageMargins: [SIDE, 42, SIDE, 66],
    header: headerFor(doc, 'Laser hazard assessment', SIDE),
    // A heading never ends a page: it moves to the next page with what it introduces.
    pageBreakBefore: (node, q) => node.headlineLevel !== undefined && q.getFollowingNodesOnPage().length === 0,
    footer: footerFor(doc, SIDE, contentWidth(opts.paper, SIDE)),
    content,
  };
}
