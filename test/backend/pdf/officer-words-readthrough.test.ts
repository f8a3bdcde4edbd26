// @vitest-environment node
/**
 * Every printed document (assessment report, door notice, eyewear sheet) of the invented demo site
 * and of generated rooms, read back with poppler's pdftotext as an officer and an auditor read it:
 * the notation of the standards, never the programmer's; units in SI symbols; no internal key or
 * JSON path; a number never parted from its unit by a line break; every character in the embedded
 * font. Real pdfmake, real record store; no mocks. The rooms are invented: wording checks, not
 * checks of values.
 *
 * Sources: ISO 80000-2:2019 (× for multiplication, exponents as superscripts, Greek letters for
 * quantities such as λ, ≤ and ≥); ISO 80000-1:2009 clause 7 (a number and its unit separated by a
 * space and not split); SI brochure (BIPM, 9th edition 2019) section 5.2 (unit symbols: µm, m², not
 * "um", "m^2"); ICNIRP 2013 / IEC 60825-1:2014 (C_A, T_2, α_min printed with subscripts);
 * EN 207:2017 clause 7 (marking on the frame: test condition, wavelength in nm, scale number,
 * "D 1064 LB7"). Printing a point once and naming the beams it concerns is common practice in
 * report writing.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TDocumentDefinitions } from 'pdfmake/interfaces';
import { beforeAll, describe, expect, it } from 'vitest';
import { renderDoorNotice, renderEyewearSheet, renderReport, type DocumentInput, type RenderOptions } from '../../../electron/backend/pdf/index.js';
import { reportDefinition } from '../../../electron/backend/pdf/documents/report.js';
import { doorNoticeDefinition } from '../../../electron/backend/pdf/documents/door-notice.js';
import { eyewearSheetDefinition } from '../../../electron/backend/pdf/documents/eyewear-sheet.js';
import { readableDefinition } from '../../../electron/backend/pdf/readable.js';
import { FONTS } from '../../../electron/backend/pdf/runtime.js';
import { requireTool } from '../../support/required-tool.js';
import { useDemoRegister } from './demo-register.js';
import { generatedDocument } from './generated-rooms.js';

const A4_SI: RenderOptions = { paper: 'A4', units: 'SI' };
const demo = useDemoRegister('bw-pdf-words-');

interface Printed {
  readonly name: string;
  /** pdftotext in reading order, lines as printed (not collapsed: a line break is evidence). */
  readonly text: string;
  /** Every string handed to pdfmake after the last pass (what the font must draw). */
  readonly strings: readonly string[];
}

function pdfText(pdf: Buffer): string {
  const tool = requireTool('pdftotext', 'poppler-utils', 'to read the printed documents back as text');
  const dir = mkdtempSync(join(tmpdir(), 'bw-words-'));
  try {
    const file = join(dir, 'doc.pdf');
    writeFileSync(file, pdf);
    return execFileSync(tool, ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Strings of a definition as pdfmake draws them (plots' SVG text included; QR payloads and images are not text). */
function stringsOf(dd: TDocumentDefinitions): string[] {
  const out: string[] = [];
  const walk = (node: unknown, key: string): void => {
    if (typeof node === 'string') {
      if (key === 'text' || key === '') out.push(node);
      else if (key === 'svg') for (const m of node.matchAll(/<text[^>]*>([^<]*)<\/text>/g)) out.push((m[1] ?? '').replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>'));
      return;
    }
    if (Array.isArray(node)) for (const n of node) walk(n, key === 'text' ? 'text' : '');
    else if (node !== null && typeof node === 'object') for (const [k, v] of Object.entries(node)) if (k !== 'qr' && k !== 'image') walk(v, k);
  };
  const r = readableDefinition(dd);
  walk(r.content, '');
  for (const part of [r.header, r.footer]) walk(typeof part === 'function' ? part(1, 2, { width: 595, height: 842, orientation: 'portrait' }) : part, '');
  return out;
}

async function printAll(name: string, doc: DocumentInput): Promise<Printed[]> {
  return [
    { name: `${name} report`, text: pdfText(await renderReport(doc, A4_SI)), strings: stringsOf(reportDefinition(doc, A4_SI)) },
    { name: `${name} door notice`, text: pdfText(await renderDoorNotice(doc, A4_SI)), strings: stringsOf(doorNoticeDefinition(doc, A4_SI, 0)) },
    { name: `${name} eyewear sheet`, text: pdfText(await renderEyewearSheet(doc, A4_SI)), strings: stringsOf(eyewearSheetDefinition(doc, A4_SI, 0)) },
  ];
}

/** Each pattern: what an auditor would reject, and why (the source beside it). */
const MUST_NOT_APPEAR: ReadonlyArray<{ readonly what: string; readonly pattern: RegExp; readonly why: string }> = [
  { what: 'an asterisk for multiplication', pattern: /\*/, why: 'ISO 80000-2:2019: × or a half-high dot, never *' },
  { what: 'a caret for a power', pattern: /\^/, why: 'ISO 80000-2:2019: the exponent is raised' },
  { what: 'an underscore between letters (C_A, alpha_min)', pattern: /[A-Za-zα-ω]_[A-Za-z0-9]/, why: 'ICNIRP 2013 / IEC 60825-1:2014 print the subscript lowered' },
  { what: 'a Greek letter spelled out', pattern: /\b(?:lambda|alpha|gamma|phi|tau|pi)\b/, why: 'ISO 80000-2:2019 and the limit tables write λ, α, γ, φ, τ, π' },
  { what: 'programmer comparisons and arrows', pattern: /<=|>=|->/, why: 'ISO 80000-2:2019: ≤, ≥' },
  { what: 'a square root written sqrt(', pattern: /\bsqrt\(/, why: 'ISO 80000-2:2019: √' },
  // A group of a record fingerprint ("0f0f 6e46") is hex, not a number: a group next to another
  // group, on the same line or across a line break, is not read as e-notation.
  { what: 'a number in computer e-notation (1e-13, 2.7e5)', pattern: /(?<![0-9a-f])(?<![0-9a-f]{4}\s+)\d+(?:\.\d+)?e[-+]?\d+\b(?!\s+[0-9a-f]{4}\b)/, why: 'the owner\'s rule: engineering notation with units; ISO 80000-1 clause 6.5.5 (× 10ⁿ)' },
  { what: 'a micro prefix written "u" (um, uJ, uW, us)', pattern: /\d\s?u(?:m|J|W|s|rad)\b/, why: 'SI brochure (2019) Table 7: the prefix symbol is µ' },
  { what: 'a square written m^2, m2 or cm2', pattern: /\bc?m\^?2\b|\/c?m2\b/, why: 'SI brochure (2019) section 5.4.3: m²' },
  { what: 'degrees written "deg"', pattern: /\d\s?deg\b/, why: 'SI brochure (2019) Table 8: °' },
  { what: 'carbon dioxide written CO2', pattern: /\bCO2\b/, why: 'IUPAC nomenclature: CO₂' },
  { what: 'a far-infrared wavelength in nm (10600 nm)', pattern: /\b\d{5,}(?:\.\d+)? nm\b/, why: 'engineering notation: 10.6 µm, as the trade writes it' },
  { what: 'a JSON path (lasers[1].beams[0])', pattern: /\w\[\d+\]\.?\w/, why: 'the owner\'s rule: no JSON path on paper' },
  { what: 'an internal key (rule:CP, factor:CA, aperture:eye:…)', pattern: /\b(?:rule|factor|aperture):[A-Za-z]/, why: 'the owner\'s rule: no internal key on paper' },
  { what: 'a developer message (undefined, NaN, [object Object], null)', pattern: /\bundefined\b|\bNaN\b|\[object Object\]|\bnull\b/, why: 'the owner\'s rule: no developer message on paper' },
  { what: 'a field name in camel case (classAsLabelled)', pattern: /(?<=\.)[a-z]+(?:[A-Z][a-z0-9]+)+\b|\b(?!(?:k|M|G)?Hz\b)[a-z]+(?:[A-Z][a-z0-9]+)+(?=\s?[:=[.]\S)/, why: 'the owner\'s rule: no internal key on paper' },
  { what: 'a number and its unit on two lines', pattern: /\d\n\s*(?:[kMGTmµnpf]?(?:W|J|m|s|Hz|rad|nm)(?:\/[a-zA-Zµ]+²?|²)?|%)(?=[\s,.;:)]|$)/, why: 'ISO 80000-1:2009 clause 7: a number and its unit are not split' },
  { what: 'an EN 207 marking not in the frame\'s form ("D LB5 at 740–1100 nm")', pattern: /\b[DIRM]+ LB\d+ at \d/, why: 'EN 207:2017 clause 7: "D 740–1100 LB5"' },
];

const documents: Printed[] = [];

describe('every printed document of the demo site and of generated rooms, read back with pdftotext', () => {
  beforeAll(async () => {
    for (const code of ['A0.07', 'B2.14', 'B2.16', 'C1.03']) documents.push(...(await printAll(`demo room ${code}`, await demo.documentOf(code))));
    documents.push(...(await printAll('generated room, 12 lasers, every control, long names', generatedDocument({ lasers: 12, allControls: true, longNames: true }))));
    documents.push(...(await printAll('generated room, 4 lasers, Directive 2006/25/EC', generatedDocument({ lasers: 4, ruleSet: 'eu2006' }))));
    // 21 lasers reach the far infrared of the generated wavelengths (10.6 µm, CO₂)
    documents.push(...(await printAll('generated room, 21 lasers', generatedDocument({ lasers: 21 }))));
  }, 600_000);

  it.each(MUST_NOT_APPEAR)('no $what ($why)', ({ pattern }) => {
    const found = documents.flatMap((d) => {
      const m = pattern.exec(d.text);
      return m === null ? [] : [`${d.name}: "${d.text.slice(Math.max(0, m.index - 50), m.index + m[0].length + 50).replace(/\n/g, '⏎')}"`];
    });
    expect(documents.length).toBe(21);
    expect(found, found.join('\n')).toEqual([]);
  });

  it('every character handed to the PDF is in the embedded font (Roboto, as shared-fonts.ts loads it): none drawn as a blank or a box', () => {
    const require = createRequire(import.meta.url);
    const fontkit = require('fontkit') as { create(b: Buffer): { hasGlyphForCodePoint(c: number): boolean } };
    const roboto = FONTS['Roboto'] as Record<string, string>;
    const fonts = Object.entries(roboto).map(([style, file]) => ({ style, font: fontkit.create(readFileSync(file)) }));
    const missing = new Set<string>();
    for (const d of documents)
      for (const s of d.strings)
        for (const ch of s) {
          const c = ch.codePointAt(0) ?? 0;
          if (c < 0x20) continue; // line breaks and tabs are layout, not glyphs
          for (const f of fonts) if (!f.font.hasGlyphForCodePoint(c)) missing.add(`U+${c.toString(16).toUpperCase().padStart(4, '0')} "${ch}" (${f.style}) in ${d.name}: "${s.slice(0, 80)}"`);
        }
    expect(documents.every((d) => d.strings.length > 0)).toBe(true);
    expect([...missing], [...missing].slice(0, 20).join('\n')).toEqual([]);
  });

  it('the point to check shared by two beams is printed once, naming both (common practice)', () => {
    const report = documents.find((d) => d.name === 'demo room B2.16 report')?.text.replace(/\s+/g, ' ') ?? '';
    const line = 'Conservative mode: unverified limit-table entries were replaced by stricter values (the pulse correction factor CP)';
    expect(report.split(line).length - 1, 'printed once').toBe(1);
    expect(report).toContain(`Beams 3, 4 (Nd:YAG 1064 nm; Nd:YAG second harmonic 532 nm): ${line}`);
  });

  it('the markings on the eyewear sheet and the report read as on the frame (EN 207:2017 clause 7)', () => {
    const sheet = documents.find((d) => d.name === 'demo room B2.14 eyewear sheet')?.text.replace(/\s+/g, ' ') ?? '';
    expect(sheet).toContain('D 740–1100 LB5');
    expect(sheet).toContain('IR 740–1100 LB7');
  });

  it('a formula of the limit tables reads in the standards\' notation: 90 × t^0.75 × C_C × C_E with the exponent raised (ICNIRP 2013, IEC 60825-1:2014 Table A.1)', () => {
    const report = documents.find((d) => d.name === 'demo room A0.07 report')?.text.replace(/\s+/g, ' ') ?? '';
    // pdftotext reads raised and lowered text inline: "t0.75", "CC"
    expect(report).toContain('H = 90 × t0.75 × CC × CE J/m²');
    expect(report).toContain('α = 0 mrad ≤ αmin = 1.5 mrad');
  });
});
