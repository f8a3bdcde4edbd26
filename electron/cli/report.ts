/**
 * Headless printing: the assessment report, door notice and eyewear sheet as PDF, without the UI.
 *
 *   npm run report -- --demo --out <folder> [--paper A4|Letter] [--units SI|ANSI]
 *   npm run report -- --db <file> --assessment <id> --out <folder> [--revision <id>] [--paper ..] [--units ..]
 *   npm run report -- --db <file> --site <id> --out <folder> [--paper ..] [--units ..]
 *
 * --site writes the current report of every room of the site, one file per room, and all of them
 * in one PDF (each room's report keeps its own page numbering).
 *
 * --demo loads the invented demo site into a temporary database with a signing key made for the
 * demo, signs each room's assessment as the demo officer, renders the three documents per room
 * and deletes the temporary database. --db opens a stored database read-only.
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { z } from 'zod';
import { isServerAddress, openRecordStore, type RecordStore } from '../backend/records/index.js';
import { DEMO_PASSPHRASE } from '../backend/records/demo.js';
import { parseCommandArgs } from './command-args.js';
import {
  DOCUMENT_FILE_NAME,
  documentInputFromAssessment,
  renderDocument,
  renderOptionsSchema,
  renderSiteReports,
  type DocumentKind,
  type RenderOptions,
} from '../backend/pdf/index.js';

const USAGE = `Usage:
  npm run report -- --demo --out <folder> [--paper A4|Letter] [--units SI|ANSI]
  npm run report -- --db <file> --assessment <id> --out <folder> [--revision <id>] [--paper A4|Letter] [--units SI|ANSI]
  npm run report -- --db <file> --site <id> --out <folder> [--paper A4|Letter] [--units SI|ANSI]`;

const ArgsSchema = z
  .object({
    demo: z.boolean().default(false),
    db: z.string().min(1).optional(),
    assessment: z.string().min(1).optional(),
    site: z.string().min(1).optional(),
    revision: z.string().min(1).optional(),
    out: z.string({ error: '--out <folder> is required' }).min(1, '--out <folder> is required'),
    paper: renderOptionsSchema.shape.paper,
    units: renderOptionsSchema.shape.units,
  })
  .strict()
  .refine((a) => a.demo !== (a.db !== undefined), { message: 'give either --demo or --db <file>', path: ['db'] })
  .refine((a) => a.db === undefined || (a.assessment !== undefined) !== (a.site !== undefined), { message: '--db needs either --assessment <id> or --site <id>', path: ['assessment'] })
  .refine((a) => a.site === undefined || a.revision === undefined, { message: '--site prints each room\'s current revision; --revision goes with --assessment', path: ['revision'] });

export type ReportArgs = z.infer<typeof ArgsSchema>;

/** "--paper Letter --demo" -> { paper: 'Letter', demo: true } (electron/cli/command-args.ts). */
export function parseArgs(argv: readonly string[]): ReportArgs {
  return parseCommandArgs(ArgsSchema, argv, USAGE, ['demo']);
}

const KINDS: readonly DocumentKind[] = ['report', 'door-notice', 'eyewear-sheet'];

function safeName(s: string): string {
  return s.replace(/[^A-Za-z0-9._-]+/g, '_');
}

/** Render the three documents of one assessment into `outDir`; returns the files written. */
export async function writeDocuments(store: RecordStore, assessmentId: string, outDir: string, opts: RenderOptions, revisionId?: string): Promise<string[]> {
  const doc = await documentInputFromAssessment(store, assessmentId, revisionId === undefined ? {} : { revisionId });
  mkdirSync(outDir, { recursive: true });
  const files: string[] = [];
  for (const kind of KINDS) {
    const file = join(outDir, `${safeName(doc.room.code)}-${DOCUMENT_FILE_NAME[kind]}.pdf`);
    writeFileSync(file, await renderDocument(kind, doc, opts));
    files.push(file);
  }
  return files;
}

/**
 * The current report of every room of a site: one file per room (room code and revision in its
 * name, DRAFT where unsigned) and all of them in one PDF, in the register's room order.
 */
export async function writeSiteReports(store: RecordStore, siteId: string, outDir: string, opts: RenderOptions): Promise<string[]> {
  const site = await store.getSite(siteId);
  const reports = await renderSiteReports(store, site.id, opts);
  mkdirSync(outDir, { recursive: true });
  const files: string[] = [];
  for (const r of reports.rooms) {
    const file = join(outDir, `${safeName(r.code)}-${DOCUMENT_FILE_NAME.report}-rev${r.revisionNo}-${r.draft ? 'DRAFT' : 'signed'}.pdf`);
    writeFileSync(file, r.pdf);
    files.push(file);
  }
  const all = join(outDir, `${safeName(site.name)}-${DOCUMENT_FILE_NAME.report}s-every-room.pdf`);
  writeFileSync(all, reports.pdf);
  files.push(all);
  return files;
}

/** The demo site in a temporary database, every room's assessment signed by the demo officer. */
export async function writeDemoDocuments(outDir: string, opts: RenderOptions): Promise<string[]> {
  const tmp = mkdtempSync(join(tmpdir(), 'beamwarden-demo-'));
  const store = await openRecordStore({ path: join(tmp, 'demo.sqlite'), keyDir: join(tmp, 'key') });
  try {
    const site = await store.seedDemo();
    const officer = (await store.listPeople()).find((p) => p.role === 'Laser safety officer');
    const files: string[] = [];
    // The temporary database is fresh: the demo seed gave the demo officer the installation's first
    // key (its trust anchor), sealed with the published demo passphrase.
    const passphrase = DEMO_PASSPHRASE;
    for (const room of await store.listRooms(site.id)) {
      for (const a of await store.listAssessments(room.id)) {
        if (a.status === 'draft' && officer) {
          await store.signAssessment(a.id, {
            personId: officer.id,
            passphrase,
            statement: 'I have evaluated the laser hazards of this area with the inputs and assumptions recorded here and approve the controls listed. (Demo data: invented site.)',
          });
        }
        files.push(...(await writeDocuments(store, a.id, outDir, opts)));
      }
    }
    return files;
  } finally {
    await store.close();
    rmSync(tmp, { recursive: true, force: true });
  }
}

export async function main(argv: readonly string[]): Promise<number> {
  let args: ReportArgs;
  try {
    args = parseArgs(argv);
  } catch (err) {
    console.error(err instanceof Error ? err.message : String(err));
    return 2;
  }
  const opts: RenderOptions = { paper: args.paper, units: args.units };
  const out = resolve(args.out);
  let files: string[];
  if (args.demo) {
    files = await writeDemoDocuments(out, opts);
  } else {
    const store = await openRecordStore({ path: isServerAddress(args.db as string) ? (args.db as string) : resolve(args.db as string), readonly: true });
    try {
      files = args.site !== undefined ? await writeSiteReports(store, args.site, out, opts) : await writeDocuments(store, args.assessment as string, out, opts, args.revision);
    } finally {
      await store.close();
    }
  }
  for (const f of files) console.log(f);
  return 0;
}

if (process.argv[1] !== undefined && resolve(process.argv[1]) === resolve(new URL(import.meta.url).pathname)) {
  main(process.argv.slice(2)).then(
    (code) => process.exit(code),
    (err: unknown) => {
      console.error(err instanceof Error ? err.message : String(err));
      process.exit(1);
    },
  );
}
