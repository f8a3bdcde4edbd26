/**
 * pdfmake 0.3 in Node, offline. `pdfmake` is a ready instance (not a class) shared by the process;
 * fonts and the two access policies are set before every render so that another user of the same
 * instance cannot leave it in a state that fetches from the network or reads arbitrary files.
 */
import { createRequire } from 'node:module';
import path from 'node:path';
import pdfmake from 'pdfmake';
import type { TDocumentDefinitions, TFontDictionary } from 'pdfmake/interfaces';
import { shareParsedFonts } from './shared-fonts.js';
import { readableDefinition } from './readable.js';
import { drawJoinedRuns } from './merged-runs.js';

const require = createRequire(import.meta.url);

/** Roboto as shipped inside the pdfmake package (Apache 2.0), so nothing is fetched. */
export const FONT_DIR = path.join(path.dirname(require.resolve('pdfmake/package.json')), 'fonts', 'Roboto');

export const FONTS: TFontDictionary = {
  Roboto: {
    normal: path.join(FONT_DIR, 'Roboto-Regular.ttf'),
    bold: path.join(FONT_DIR, 'Roboto-Medium.ttf'),
    italics: path.join(FONT_DIR, 'Roboto-Italic.ttf'),
    bolditalics: path.join(FONT_DIR, 'Roboto-MediumItalic.ttf'),
  },
};

/** pdfmake also asks the local policy about standard font names (toolchain notes, section 3). */
const STANDARD_FONT = /^(Courier|Helvetica|Times|Symbol|ZapfDingbats)(-[A-Za-z]+)?$/;

function configure(): void {
  shareParsedFonts(FONTS); // once per process: every document then reuses the parsed Roboto files
  drawJoinedRuns(); // once per process: a line's touching words of one style are drawn as one text run
  pdfmake.setFonts(FONTS);
  pdfmake.setUrlAccessPolicy(() => false); // documents never load anything from the network
  pdfmake.setLocalAccessPolicy((p: string) => p.startsWith(FONT_DIR + path.sep) || STANDARD_FONT.test(p));
}

/** Lay out and render a document definition to PDF bytes. */
export async function renderPdf(dd: TDocumentDefinitions): Promise<Buffer> {
  configure();
  const doc = pdfmake.createPdf(readableDefinition(dd));
  const out: unknown = await doc.getBuffer();
  if (!Buffer.isBuffer(out)) throw new Error('pdfmake did not return a Buffer');
  return out;
}
