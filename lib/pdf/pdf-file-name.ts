/**
 * The one file-name pattern of every memo PDF, wherever it is offered
 * (memo page, revision API, customer portal, release mail):
 * `<document number>-rev-<letter>.pdf` for a frozen revision,
 * `<document number>-draft-v<version>.pdf` for a draft. Characters that are
 * unsafe in a file name or a Content-Disposition header become hyphens.
 */
export type PdfFileNameFor =
  { documentNumber: string; revisionLetter: string } | { documentNumber: string; draftVersion: number };

export function pdfFileName(of: PdfFileNameFor): string {
  const base = of.documentNumber.replace(/[^A-Za-z0-9._-]+/g, '-');
  return 'revisionLetter' in of ? `${base}-rev-${of.revisionLetter}.pdf` : `${base}-draft-v${of.draftVersion}.pdf`;
}
