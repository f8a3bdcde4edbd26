/** Pages of a PDF written by pdfkit (its page objects are plain text in the file). */
export function pdfPageCount(pdf: Buffer): number {
  return pdf.toString('latin1').match(/\/Type \/Page\b(?!s)/g)?.length ?? 0;
}
