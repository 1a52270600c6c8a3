/** One entry of the reference list (references.ts) and its constructor. */
export interface Reference {
  /** Short name as methods cite it, e.g. "Lai & Lee 2012". */
  readonly key: string;
  /** First author's surname as it appears first in a source string. */
  readonly firstAuthor: string;
  readonly year: string;
  /** Full citation, plain text. */
  readonly citation: string;
  /** True when volume and pages were checked against a published listing; false when recalled. */
  readonly detailsChecked: boolean;
  /** Extra patterns that identify the work without an author–year pair. */
  readonly aliases?: readonly RegExp[];
}

export const ref = (
  key: string,
  firstAuthor: string,
  year: string,
  citation: string,
  detailsChecked: boolean,
  aliases?: readonly RegExp[],
): Reference => ({ key, firstAuthor, year, citation, detailsChecked, aliases });
