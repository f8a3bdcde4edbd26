/**
 * Export files that always import back. A room reviewed many times carries every revision's
 * results with their derivation traces; as one JSON string that grew past the import limit
 * (35.6 M characters for 30 reviews). The file is therefore the same JSON document, gzip-compressed
 * (RFC 1952; `.json.gz`, any gunzip tool gives the plain JSON), and written piece by piece: each
 * revision is serialised on its own and streamed into the compressor, so no string larger than one
 * revision is ever built. Import takes the compressed file (or plain JSON text) back.
 */
import { createGzip, gunzipSync, constants as zlibConstants } from 'node:zlib';
import type { ExportDocument } from './types.js';
import { RecordError } from './types.js';

/** The plain JSON of a whole-site export must stay below V8's longest string (2^29 - 24 characters). */
export const MAX_EXPORT_JSON_BYTES = 400 * 1024 * 1024;

/** `JSON.stringify(doc)` as a sequence of pieces, one per revision at most. */
function* jsonPieces(doc: ExportDocument): Generator<string> {
  const keys = Object.keys(doc) as Array<keyof ExportDocument>;
  yield '{';
  for (const [i, key] of keys.entries()) {
    const value = doc[key];
    if (value === undefined) continue;
    yield `${i > 0 ? ',' : ''}${JSON.stringify(key)}:`;
    if (key !== 'assessments') {
      yield JSON.stringify(value);
      continue;
    }
    yield '[';
    for (const [ai, a] of doc.assessments.entries()) {
      const { revisions, ...head } = a;
      const headJson = JSON.stringify({ ...head, revisions: [] });
      yield `${ai > 0 ? ',' : ''}${headJson.slice(0, -3)}[`;
      for (const [ri, r] of revisions.entries()) yield `${ri > 0 ? ',' : ''}${JSON.stringify(r)}`;
      yield ']}';
    }
    yield ']';
  }
  yield '}';
}

/** The export document as gzip-compressed JSON bytes, serialised and compressed piece by piece. */
export async function exportFileBytes(doc: ExportDocument): Promise<{ readonly gz: Buffer; readonly jsonBytes: number }> {
  const gzip = createGzip({ level: 9 });
  const chunks: Buffer[] = [];
  gzip.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<void>((resolve, reject) => {
    gzip.once('end', resolve);
    gzip.once('error', reject);
  });
  let jsonBytes = 0;
  for (const piece of jsonPieces(doc)) {
    jsonBytes += Buffer.byteLength(piece, 'utf8');
    if (!gzip.write(piece, 'utf8')) await new Promise<void>((r) => gzip.once('drain', () => r()));
  }
  gzip.end();
  await done;
  return { gz: Buffer.concat(chunks), jsonBytes };
}

const isGzip = (b: Uint8Array) => b.length >= 2 && b[0] === 0x1f && b[1] === 0x8b;

/** The JSON text of an export file: gzip-compressed (as written by exportFileBytes) or plain. */
export function exportFileText(bytes: Buffer): string {
  if (!isGzip(bytes)) return bytes.toString('utf8');
  try {
    return gunzipSync(bytes, { maxOutputLength: MAX_EXPORT_JSON_BYTES }).toString('utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const problem =
      code === 'ERR_BUFFER_TOO_LARGE' || code === zlibConstants.Z_BUF_ERROR.toString()
        ? `unpacks to more than ${MAX_EXPORT_JSON_BYTES / 1024 / 1024} MB; export a single room or assessment instead`
        : 'is not a complete gzip file (cut short while copying?)';
    throw new RecordError('invalid', `The file cannot be imported, nothing was changed: it ${problem}`, [{ path: '(document)', problem: `the file ${problem}` }]);
  }
}
