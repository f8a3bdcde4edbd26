/**
 * Wording that must never reach a document or a screen: the internal source keys of the limit
 * tables and the control catalogue, references to the project's working notes and file names, and
 * "from memory" phrasing (SAFETY.md: printed provenance is a readable citation and a plain status).
 */
export const INTERNAL_WORDING: readonly RegExp[] = [
  /\bEU-(FR|NO|CONS|2\.3-MEM)\b/,
  /\bBGI832\b/,
  /\bBGVB2\b/,
  /\b(ICNIRP20\d\d|IEC2014|ANSI2014|CORNEA2024|ILSC20\d\d)\b/,
  /\bOURS\b/,
  /\brule:CP\b|\bfactor:[A-Za-z]/,
  /\[[A-Z][A-Z0-9]*-[A-Z0-9-]+\]/, // [MTU-CL4], [WIKI-EN207] ...
  /\b(MTU|PITT|STAN-OLD|UPENN|CEMAR|WIKI|APINEX|SCITEC)\b/,
  /domain (notes|reference)|\bdomain \d/i,
  /limit specification|pain points?/i,
  /from memory|typed from|\bremembered\b|\bmemory\b/i,
  /lasersafe\.de|wikipedia|supplier explainer|yumpu|umwelt-online/i,
  /\.(ts|json|md|svelte)\b/,
];
