/**
 * The one formatter for formula text: turns the notation the core and the limit tables write
 * ("90*t^0.75*CC*CE", "10^(0.02*(lambda-450))", "w0 = 5.2 um", "alpha <= alpha_min") into the
 * notation the standards print (90 × t^0.75 with the exponent raised, C with subscript C, λ, α_min
 * with "min" lowered, µm). Used by every place an officer or an auditor reads a derivation or a
 * limit-table expression: the printed documents (their last pass before layout), the derivation
 * window on screen and the plain-text trace.
 *
 * Notation: ISO 80000-2:2019 (× for multiplication, superscript exponents, √, ≤ and ≥),
 * ISO 80000-1:2009 clause 7 (a number and its unit separated by a space that does not break the
 * line), ICNIRP 2013 / IEC 60825-1:2014 (symbols C_A, T_2, α_min, γ_p printed with subscripts;
 * λ for the wavelength). Presentation only: the stored traces are not changed, so results saved
 * by earlier versions read the same way.
 *
 * Two forms:
 *  - `formulaRuns`: pieces of text, each plain, raised (exponent) or lowered (subscript), for
 *    the PDF (pdfmake `sup` / `sub`) and the screen (`<sup>` / `<sub>`);
 *  - `formulaText`: one plain string; a raised or lowered piece is written with the Unicode
 *    superscript / subscript characters where every character of it has one (t⁰·⁷⁵, T₂), and
 *    otherwise in the linear form of ISO 80000-2 (C_A, 10^(…)), as only a plain text can.
 */

export interface FormulaRun {
  readonly text: string;
  readonly script?: 'sup' | 'sub';
}

/** Characters worth a closer look; most printed strings (names, plain numbers) have none. */
const MAY_HOLD_FORMULA = /[*^_]|<=|>=|->|sqrt|lambda|alpha|gamma|phi|Phi|log10|1\/e2|d63|\d x [A-Z(\d]|\dx[,;)\s]|\bpi\b|tau|\d[ \u00A0]?u[mJWs]\b|\d[ \u00A0]?deg\b|\/m2\b|\/cm2\b|CO2|\d{5}[ \u00A0]nm|\de\d+[ \u00A0]nm|\b[wD]0\b|\d[eE][-+]?\d|\bC[ABCEP]\b|\bT[12]\b/;

/** Words the core writes for Greek letters (ISO 80000-2 writes the letters). */
const GREEK: Readonly<Record<string, string>> = { lambda: 'λ', alpha: 'α', gamma: 'γ', phi: 'φ', Phi: 'Φ', pi: 'π', tau: 'τ', theta: 'θ' };

const SUPERSCRIPT: Readonly<Record<string, string>> = {
  '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹',
  '-': '⁻', '−': '⁻', '+': '⁺', '(': '⁽', ')': '⁾', '.': '·', '=': '⁼',
};
const SUBSCRIPT: Readonly<Record<string, string>> = {
  '0': '₀', '1': '₁', '2': '₂', '3': '₃', '4': '₄', '5': '₅', '6': '₆', '7': '₇', '8': '₈', '9': '₉', '(': '₍', ')': '₎',
};

/** Units the officer reads, from the ASCII the core or a typed note may hold (ISO 80000-1, SI brochure). */
const ASCII_UNITS: ReadonlyArray<readonly [RegExp, string]> = [
  [/(\d)[ \u00A0]?u(m|J|W|s|rad)\b/g, '$1 µ$2'],
  [/(\d)[ \u00A0]?deg\b/g, '$1°'],
  [/\b(m|cm|mm)\^2\b/g, '$1²'],
  [/\/(m|cm|mm)2\b/g, '/$1²'],
  [/\bCO2\b/g, 'CO₂'],
];

/** A wavelength of 10 µm or more in micrometres, as the trade writes the far infrared ("10.6 µm", not "10600 nm"). */
const LONG_WAVELENGTH = /(?<![\w.])(?:(\d+(?:\.\d+)?)(–|-| to ))?(\d{5,}(?:\.\d+)?|\d+(?:\.\d+)?[eE]\+?\d+)[ \u00A0]nm\b/g;

function micrometres(nm: string): string {
  return String(Number((Number(nm) / 1000).toPrecision(6)));
}

function longWavelength(whole: string, from: string | undefined, dash: string | undefined, to: string): string {
  if (Number(to) < 1e4) return whole;
  return `${from !== undefined && dash !== undefined ? `${micrometres(from)}${dash === '-' ? '–' : dash}` : ''}${micrometres(to)} µm`;
}

/** A number and a unit after it: the space between them must not break a line (ISO 80000-1 clause 7). */
const NUMBER_UNIT = /(\d) (?=(?:[kMGTmµnpf]?(?:W|J|m|s|Hz|rad|sr|nm|°C)|%|cd|lx)(?:\/[a-zA-Z²µ]+|²|³)?(?![\w]))/g;

/** "1.5e-4" -> mantissa and power of ten; a hex group of a fingerprint ("3e45 …") is not a number. */
const E_NUMBER = /(?<![\w.\-])(?<![0-9a-f]{4} )(\d+(?:\.\d+)?)[eE]([-+]?\d+)(?![\w.])(?! [0-9a-f]{4}(?:\s|$))/g;

function powerOfTen(mantissa: string, exponent: string): string {
  const e = exponent.replace(/^\+/, '').replace(/^(-?)0+(?=\d)/, '$1');
  return mantissa === '1' ? `10^${e}` : `${mantissa}*10^${e}`;
}

/**
 * The linear text with the word forms replaced; exponents and subscripts still marked with ^ and _.
 * `joined`: the multiplication sign held to its factors by no-break spaces, for text that is cut at
 * its spaces before layout (the report's derivation lines are handed to pdfmake in pieces).
 */
function linear(text: string, joined = false): string {
  let out = text;
  for (const [re, by] of ASCII_UNITS) out = out.replace(re, by);
  out = out.replace(LONG_WAVELENGTH, longWavelength);
  out = out
    .replace(/<=/g, '≤')
    .replace(/>=/g, '≥')
    // "→" is not in the documents' font (Roboto): the step reads as a sentence
    .replace(/\s*->\s*/g, ', so ')
    .replace(/\bsqrt\(/g, '√(')
    .replace(/(?<![A-Za-z])(lambda|alpha|gamma|phi|Phi|pi|tau|theta)(?![A-Za-z])/g, (w) => GREEK[w] ?? w)
    .replace(/\blog10\(/g, 'log₁₀(')
    // "1/e2" (the beam-diameter convention) is 1/e²; d63 the diameter holding 63 % of the power (IEC 60825-1 writes d₆₃)
    .replace(/\b1\/e2\b/g, '1/e²')
    .replace(/\bd63\b/g, 'd₆₃')
    // "25.9 x AEL", "(10x, 20 mm objective)": the letter x written for the multiplication sign
    .replace(/(?<=\d) x (?=[A-Z(\d])/g, ' × ')
    .replace(/(?<=\b\d+)x(?=[,;)\s])/g, '×')
    // the tables' factor names in an expression ("10*CA*CC", "T2^(-0.25)", "T2 = 10 s") carry their subscript
    .replace(/(?<![\w.])(C)([ABCEP])(?=[*)^/]|\s*[=×])/g, '$1_$2')
    .replace(/(?<=[*(/]\s*)(C)([ABCEP])\b/g, '$1_$2')
    .replace(/(?<![\w.])(T)([12])(?=[*)^/]|\s*[=(])/g, '$1_$2')
    .replace(/\b([wD])0\b/g, '$1_0')
    .replace(E_NUMBER, (_m, mant: string, exp: string) => powerOfTen(mant, exp));
  // a minus between the terms of a formula is the minus sign, not a hyphen (ISO 80000-2)
  if (/[*=^]/.test(out)) out = out.replace(/(?<=[\w)]) - (?=[\w(])/g, ' − ');
  // multiplication sign with a space each side; "(5)*(8)" reads "(5) × (8)"
  out = out.replace(/\s*\*\s*/g, joined ? '\u00A0×\u00A0' : ' × ');
  return out;
}

/**
 * The words of a formula replaced (×, λ, µm, 10^-3 …) with the exponents and subscripts still marked
 * by ^ and _ (each a token without spaces, so the text may then be cut at its spaces and each piece
 * given to `formulaRuns`), and each number held to its unit. For the report's derivation lines.
 */
export function formulaLinear(text: string): string {
  return noBreakUnits(MAY_HOLD_FORMULA.test(text) ? linear(text, true) : text);
}

/** The exponent after "^": a signed number, or a bracketed group (brackets balanced). */
function exponentAt(text: string, start: number): { text: string; end: number } | null {
  const simple = /^[-−+]?\d+(?:\.\d+)?/.exec(text.slice(start));
  if (simple) return { text: simple[0], end: start + simple[0].length };
  if (text[start] !== '(') return null;
  let depth = 0;
  for (let i = start; i < text.length; i++) {
    if (text[i] === '(') depth++;
    else if (text[i] === ')') {
      depth--;
      if (depth === 0) {
        const inner = text.slice(start + 1, i);
        // "(-0.25)" is raised without its brackets; a sum keeps them only when it is not alone
        return { text: /^[-−+]?\d+(?:\.\d+)?$/.test(inner) ? inner : inner, end: i + 1 };
      }
    }
  }
  return null;
}

const SUBSCRIPT_AFTER = /^[A-Za-z0-9]+/;

/** Text in runs: plain, raised or lowered (see the file comment). */
export function formulaRuns(text: string): FormulaRun[] {
  if (!MAY_HOLD_FORMULA.test(text)) return [{ text }];
  const s = linear(text);
  const runs: FormulaRun[] = [];
  let plain = '';
  const push = (run: FormulaRun): void => {
    if (plain !== '') runs.push({ text: plain });
    plain = '';
    runs.push(run);
  };
  for (let i = 0; i < s.length; i++) {
    const c = s[i] as string;
    const prev = s[i - 1] ?? '';
    if (c === '^' && /[\w)²α-ω]/.test(prev)) {
      const exp = exponentAt(s, i + 1);
      if (exp) {
        push({ text: exp.text.replace(/-/g, '−').replace(/\s*\*\s*/g, ' × '), script: 'sup' });
        i = exp.end - 1;
        continue;
      }
    }
    if (c === '_' && /[A-Za-zα-ω]/.test(prev)) {
      const sub = SUBSCRIPT_AFTER.exec(s.slice(i + 1));
      if (sub) {
        push({ text: sub[0], script: 'sub' });
        i += sub[0].length;
        continue;
      }
    }
    plain += c;
  }
  if (plain !== '') runs.push({ text: plain });
  return runs;
}

/** A raised or lowered piece in Unicode characters, or null when one of its characters has none. */
function scripted(run: FormulaRun): string | null {
  const map = run.script === 'sup' ? SUPERSCRIPT : SUBSCRIPT;
  let out = '';
  for (const ch of run.text.replace(/ × /g, '')) {
    const m = map[ch];
    if (m === undefined) return null;
    out += m;
  }
  return out;
}

/** One plain string (see the file comment): Unicode super- and subscripts where they exist. */
export function formulaText(text: string): string {
  return formulaRuns(text)
    .map((r) => {
      if (r.script === undefined) return r.text;
      const u = scripted(r);
      if (u !== null) return u;
      return r.script === 'sup' ? `^(${r.text})` : `_${r.text}`;
    })
    .join('');
}

/** A no-break space between each number and its unit, for laid-out text (PDF, screen). */
export function noBreakUnits(text: string): string {
  return text.replace(NUMBER_UNIT, '$1\u00A0');
}

/** `formulaRuns` with a no-break space between each number and its unit (see `noBreakUnits`). */
export function formulaRunsNoBreak(text: string): FormulaRun[] {
  return formulaRuns(text).map((r) => (r.script === undefined ? { text: noBreakUnits(r.text) } : r));
}
