/** Report: controls, eyewear, non-beam hazards, notes and the sign-off block (domain 6.2 items 7-13). */
import type { Content, TableCell } from 'pdfmake/interfaces';
import type { NonBeamHazardKind } from '../../records/types.js';
import type { DocumentInput } from '../document-input.js';
import { bullets, factTable, gridTable, heading, paragraph } from '../blocks.js';
import * as fmt from '../format.js';
import { COLOR, DRAFT_HEADER } from '../page.js';
import type { RoomView } from '../room-view.js';
import { coverageMatrix, eyewearMarkings, eyewearUseLists, requiredEyewearTable } from './eyewear-tables.js';

const CATEGORY = { engineering: 'Engineering', administrative: 'Administrative', ppe: 'Personal protective' } as const;
const DECISION = { accepted: 'accepted', rejected: 'rejected', 'not-applicable': 'not applicable' } as const;

export const HAZARD_NAME: Readonly<Record<NonBeamHazardKind, string>> = {
  electrical: 'Electrical (high voltage, capacitors, water cooling)',
  'x-rays': 'X-rays from high-voltage supplies',
  'collateral-optical': 'Collateral UV / visible / RF radiation',
  'air-contaminants': 'Laser-generated air contaminants (plume)',
  biological: 'Biological material in plume',
  'dyes-solvents': 'Dyes and solvents',
  gases: 'Compressed and laser gases',
  cryogens: 'Cryogens',
  'fire-explosion': 'Fire and explosion',
  photosensitisation: 'Photosensitisation',
  glare: 'Temporary blinding, glare',
  other: 'Other physical hazards',
};

export function controlsSection(doc: DocumentInput): Content[] {
  const cs = doc.content.controls;
  if (cs.length === 0) return [heading('Controls chosen'), paragraph([{ text: 'No controls were recorded.', bold: true, color: COLOR.bad }])];
  const rows: TableCell[][] = cs.map((c) => {
    const status =
      c.decision === 'accepted'
        ? c.implementation === 'to-do'
          ? `to do${c.owner ? ' by ' + c.owner : ''}${c.due ? ' before ' + fmt.calendarDate(c.due) : ''}`
          : 'in place'
        : '–';
    return [
      CATEGORY[c.category],
      { text: c.measure, bold: c.decision === 'accepted' },
      { text: DECISION[c.decision], color: c.decision === 'accepted' ? COLOR.good : COLOR.muted },
      { text: status, ...(c.implementation === 'to-do' ? { color: COLOR.bad, bold: true } : {}) },
      c.reason ?? '',
    ];
  });
  return [heading('Controls chosen'), gridTable(['Category', 'Measure', 'Decision', 'Implementation', 'Reason'], rows, [70, 150, 55, 90, '*'], 8)];
}

export function eyewearSection(doc: DocumentInput, view: RoomView): Content[] {
  const r = doc.results;
  const chosen = doc.content.eyewearChosen.map((c) => {
    const forWhat = c.beamIds.length === 0 ? 'the whole room' : `beams ${c.beamIds.map((id) => beamNo(view, id)).join(', ')}`;
    return `${c.eyewearTag} for ${forWhat}${c.note ? ' — ' + c.note : ''}`;
  });
  return [
    heading('Protective eyewear'),
    heading('What the room needs', 2),
    requiredEyewearTable(doc, 8.5),
    heading('Eyewear on the shelf', 2),
    bullets((doc.content.input.eyewear ?? []).map((e) => `${e.label}: ${eyewearMarkings(e)}`), 8.5),
    heading('Coverage matrix (which eyewear protects against which beam)', 2),
    coverageMatrix(doc, view, 7.5),
    ...eyewearUseLists(doc, view)
      .filter((u) => u.mustNot.length > 0)
      .map((u) => ({ text: [{ text: `${u.eyewear.id} must not be used for: `, bold: true, color: COLOR.bad }, u.mustNot.join('; ')], fontSize: 8, margin: [0, 0, 0, 2] }) as Content),
    paragraph([
      { text: 'Eyewear covering every beam: ', bold: true },
      r.eyewearCoveringAll.length > 0 ? r.eyewearCoveringAll.join(', ') : { text: 'none', bold: true, color: COLOR.bad },
    ]),
    ...(r.purchaseAdvice.length > 0 ? [heading('Advice', 3), bullets(r.purchaseAdvice, 8.5)] : []),
    ...(chosen.length > 0 ? [heading('Eyewear chosen by the officer', 3), bullets(chosen, 9)] : []),
  ];
}

function beamNo(view: RoomView, beamId: string): string {
  const i = view.beams.findIndex((b) => b.result.beamId === beamId);
  return i < 0 ? beamId : String(i + 1);
}

export function nonBeamSection(doc: DocumentInput): Content[] {
  const hs = doc.content.nonBeamHazards;
  if (hs.length === 0) return [heading('Non-beam hazards'), paragraph([{ text: 'No non-beam hazards were recorded.', bold: true, color: COLOR.bad }])];
  const rows: TableCell[][] = hs.map((h) => [
    { text: HAZARD_NAME[h.kind], bold: h.present },
    { text: h.present ? 'present' : 'not present', color: h.present ? COLOR.bad : COLOR.muted, bold: h.present },
    h.note,
    h.controls.length > 0 ? { ul: [...h.controls] } : '–',
  ]);
  return [heading('Non-beam hazards'), gridTable(['Hazard', 'Present', 'What and where', 'Controls'], rows, [120, 50, 150, '*'], 8)];
}

/** A co-signature's rows in the sign-off table (schema 7): who, when, what they confirm, their key. */
function coSignerRows(c: NonNullable<NonNullable<DocumentInput['signature']>['coSigners']>[number]) {
  return [
    ['Co-signed by', { text: `${c.name}, ${c.role}`, bold: true }],
    ['Co-signed on', fmt.calendarDate(c.signedAt)],
    ['Co-signer confirms', { text: c.statement, italics: true }],
    [
      'Co-signer key',
      c.keyTrusted
        ? { text: c.keyFingerprint, fontSize: 8.5 }
        : { text: `${c.keyFingerprint} — UNVERIFIED CO-SIGNATURE: this key is not on this installation's trust list.`, bold: true, color: COLOR.draft, fontSize: 8.5 },
    ],
  ] as const;
}

export function signOffSection(doc: DocumentInput): Content[] {
  const s = doc.signature;
  if (s === null) {
    return [
      heading('Sign-off'),
      {
        table: {
          widths: ['*'],
          body: [
            [
              {
                stack: [
                  { text: DRAFT_HEADER, bold: true, fontSize: 16, color: COLOR.draft },
                  { text: 'This revision has not been signed. It has no record fingerprint and must not be filed, posted or relied on as the assessment of record.', fontSize: 10 },
                  { text: `Review by (proposed): ${fmt.calendarDate(doc.content.reviewBy)}`, fontSize: 10, margin: [0, 4, 0, 0] },
                ],
                margin: [8, 6, 8, 6],
              },
            ],
          ],
        },
        layout: { hLineColor: () => COLOR.draft, vLineColor: () => COLOR.draft, hLineWidth: () => 1.5, vLineWidth: () => 1.5 },
      },
    ];
  }
  return [
    {
      unbreakable: true,
      stack: [
        heading('Sign-off'),
        factTable([
          ['Name', { text: s.name, bold: true }],
          ['Role', s.role],
          ['Signed on', fmt.calendarDate(s.signedAt)],
          ['Statement', { text: s.statement, italics: true }],
          ['Review by', { text: fmt.calendarDate(doc.content.reviewBy), bold: true }],
          ['Record fingerprint', { text: fmt.shortFingerprint(s.fingerprint), bold: true, fontSize: 12 }],
          ['Full fingerprint (SHA-256)', { text: s.fingerprint, fontSize: 7.5 }],
          ['Signing key', { text: (s.keyId.slice(0, 20).match(/.{4}/g) ?? []).join(' '), fontSize: 8.5 }],
          [
            'Trust anchor',
            {
              text: `${s.trustAnchor ?? 'none'} — the installation's trust list fingerprint; compare it with the one written down when the first signing key was made.`,
              fontSize: 8.5,
            },
          ],
          ...(s.keyTrusted
            ? []
            : ([['Status', { text: "UNVERIFIED SIGNATURE: the signing key is not on this installation's trust list. Do not rely on this as a signed assessment.", bold: true, color: COLOR.draft }]] as const)),
          ...(s.coSigners ?? []).flatMap((c) => coSignerRows(c)),
        ]),
        {
          margin: [0, 8, 0, 0],
          columns: [
            { qr: s.fingerprint, fit: 120, eccLevel: 'M', width: 'auto' },
            {
              width: '*',
              margin: [10, 4, 0, 0],
              text: 'The QR code holds the full record fingerprint. Compare it with the fingerprint the record store reports for this assessment (verify) to confirm that this paper matches the signed record.',
              fontSize: 8.5,
              color: COLOR.muted,
            },
          ],
        },
      ],
    },
  ];
}

export function notesSection(doc: DocumentInput): Content[] {
  const n = doc.content.notes.trim();
  return n === '' ? [] : [heading('Notes'), paragraph(n)];
}

