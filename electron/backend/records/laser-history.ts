/**
 * A laser's history: every revision of every assessment of its room that evaluated this laser, with
 * the values it used (from the revision's stored content, never recomputed), newest first. Lets the
 * officer see which assessment used which power, divergence or class as labelled.
 */
import type { LaserInput } from '../../../core/model/inputs.js';
import type { StoreContext } from './context.js';
import { getInstallation } from './register.js';
import type { Id, LaserUse, RevisionStatus } from './types.js';

interface Row {
  assessment_id: string;
  revision_id: string;
  revision_no: number;
  status: RevisionStatus;
  title: string;
  content_json: string;
  updated_at: string;
  signed_at: string | null;
}

export async function laserHistory(ctx: StoreContext, installationId: Id): Promise<LaserUse[]> {
  const inst = await getInstallation(ctx, installationId);
  const rows = await ctx.q.all(`SELECT r.assessment_id, r.id AS revision_id, r.revision_no, r.status, r.title, r.content_json, r.updated_at, s.signed_at
         FROM revision r JOIN assessment a ON a.id = r.assessment_id
         LEFT JOIN signature s ON s.revision_id = r.id
        WHERE a.room_id = ?
        ORDER BY r.updated_at DESC, r.revision_no DESC`, inst.roomId) as Row[];
  const out: LaserUse[] = [];
  for (const r of rows) {
    let lasers: unknown;
    try {
      lasers = (JSON.parse(r.content_json) as { input?: { lasers?: unknown } }).input?.lasers;
    } catch {
      continue; // a damaged revision is reported by verify, not here
    }
    if (!Array.isArray(lasers)) continue;
    const laser = (lasers as LaserInput[]).find((l) => l.id === installationId);
    if (!laser) continue;
    out.push({
      assessmentId: r.assessment_id,
      revisionId: r.revision_id,
      title: r.title,
      revisionNo: r.revision_no,
      status: r.status,
      signedAt: r.signed_at,
      updatedAt: r.updated_at,
      laser,
    });
  }
  return out;
}
