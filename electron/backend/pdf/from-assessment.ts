/** Maps a stored assessment revision (record store) to the documents' input. */
import { RecordError, type Person, type RecordStore, type Revision } from '../records/types.js';
import type { DocumentInput } from './document-input.js';
import { emergencyContactFor } from '../records/emergency-contact.js';

/** The officer named on the documents: the signer when signed, else the site's LSO in the register. */
async function officerFor(store: RecordStore, revision: Revision): Promise<Pick<Person, 'name' | 'role' | 'email' | 'phone'>> {
  const people = await store.listPeople();
  const signerId = revision.signature?.personId ?? null;
  const signer = signerId === null ? undefined : people.find((p) => p.id === signerId);
  if (signer) return signer;
  const lso = people.find((p) => /laser safety officer/i.test(p.role) && !/deputy/i.test(p.role)) ?? people.find((p) => /\bLSO\b/.test(p.role));
  if (lso) return lso;
  if (revision.signature) return { name: revision.signature.name, role: revision.signature.role, email: '', phone: '' };
  return { name: 'not named in the register', role: 'Laser safety officer', email: '', phone: '' };
}

export interface FromAssessmentOptions {
  /** A specific revision; default the assessment's current one. */
  readonly revisionId?: string;
}

export async function documentInputFromAssessment(store: RecordStore, assessmentId: string, options: FromAssessmentOptions = {}): Promise<DocumentInput> {
  const assessment = await store.getAssessment(assessmentId);
  const revision = options.revisionId === undefined ? assessment.current : await store.getRevision(options.revisionId);
  if (revision.assessmentId !== assessment.id) {
    throw new RecordError('invalid', `revision ${options.revisionId ?? ''} belongs to another assessment`, [{ path: 'revisionId', problem: 'belongs to another assessment' }]);
  }
  const room = await store.getRoom(assessment.roomId);
  const site = await store.getSite(room.siteId);
  const eyewear = await store.listEyewear(site.id);
  const installations = await store.listInstallations(room.id);
  const officer = await officerFor(store, revision);
  const trustAnchor = revision.signature ? (await store.trustList()).anchorFingerprint : null;
  const sig = revision.signature;
  const coSigners = sig ? await store.listCoSignatures(revision.id) : [];
  return {
    site: { name: site.name, building: site.building, address: site.address },
    room: { code: room.code, name: room.name, responsiblePerson: room.responsiblePerson, contact: room.contact },
    officer,
    emergencyContact: emergencyContactFor(room.notes, site.notes),
    installations: installations.map((i) => ({
      id: i.id,
      laserType: i.laserType,
      maker: i.maker,
      model: i.model,
      serialNumber: i.serialNumber,
      registrationNumber: i.registrationNumber,
      classAsLabelled: i.classAsLabelled,
    })),
    eyewearLocations: Object.fromEntries(eyewear.filter((e) => e.location.trim() !== '').map((e) => [e.spec.id, e.location])),
    assessment: {
      id: assessment.id,
      revisionNo: revision.revisionNo,
      status: revision.status,
      createdAt: revision.createdAt,
      updatedAt: revision.updatedAt,
      calculatedWith: revision.calculatedWith,
    },
    content: revision.content,
    results: revision.results,
    signature:
      sig === null
        ? null
        : {
            name: sig.name,
            role: sig.role,
            signedAt: sig.signedAt,
            statement: sig.statement,
            fingerprint: sig.fingerprint,
            keyId: sig.keyId,
            keyTrusted: sig.keyTrusted !== false,
            trustAnchor,
            coSigners: coSigners.map((c) => ({ name: c.name, role: c.role, signedAt: c.signedAt, statement: c.statement, keyFingerprint: c.keyFingerprint, keyTrusted: c.keyTrusted })),
          },
  };
}
