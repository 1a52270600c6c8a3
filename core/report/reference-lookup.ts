/** Finding the references a result cites: the secondary quotations behind them and the author–year match of each source text. */
import { REFERENCES, type Reference } from "./references";

/**
 * Coefficients taken from secondary quotations (textbooks, reviews and later papers that quote them) or
 * recalled, rather than checked against the original paper. The report's references section and
 * README's methods section state this once, in plain words.
 */
export interface SecondaryQuotation {
  /** Key of the work in REFERENCES the coefficients belong to. */
  readonly reference: string;
  /** The coefficients, in words a reader can find in the methods. */
  readonly what: string;
}

export const SECONDARY_QUOTATIONS: readonly SecondaryQuotation[] = [
  {
    reference: "Roberts, Ferrier & Daviero 1997",
    what: "the 60° coefficients of Roberts, Ferrier & Daviero (1997): rise 2.2·dF, return distance 2.4·dF, impact dilution 1.6·F, end of the near field 9.0·dF and dilution there 2.6·F",
  },
  {
    reference: "Lee & Cheung 1990",
    what: "the entrainment constants of Lee & Cheung (1990): 0.057, 0.554 and 5 (one quotation gives 0.544 for 0.554)",
  },
  {
    reference: "Turner 1986",
    what: "the entrainment law of Turner (1986), E = (0.08 − 0.1·Ri)/(1 + 5·Ri); only its cut-off at Ri = 0.8 was read in Ellison & Turner (1959)",
  },
  {
    reference: "Brooks 1960",
    what: "the lateral-diffusion solution of Brooks (1960) and its 4/3-law coefficient 0.01 cm^(2/3)/s, as reproduced in Fischer et al. (1979)",
  },
  {
    reference: "Fischer et al. 1979",
    what: "the round-jet spreading rate 0.127 and the line-plume coefficient 0.27 of Fischer et al. (1979)",
  },
];

/** The secondary quotations that belong to works among `references` (in SECONDARY_QUOTATIONS order). */
export function secondaryQuotationsFor(references: readonly Reference[]): SecondaryQuotation[] {
  const keys = new Set(references.map((r) => r.key));
  return SECONDARY_QUOTATIONS.filter((q) => keys.has(q.reference));
}

/** Removes accents and folds case so "Alvárez" and "alvarez" compare equal. */
function fold(text: string): string {
  return text
    .normalize("NFD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase();
}

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}

const patternCache = new Map<string, RegExp>();

/**
 * First author followed, within a short stretch of text, by the year; the author must not follow "&",
 * "," or "and" (so "Lai & Lee (2012)" does not cite "Lee 2012").
 */
function authorYearPattern(entry: Reference): RegExp {
  const cacheKey = `${entry.firstAuthor}|${entry.year}`;
  let pattern = patternCache.get(cacheKey);
  if (!pattern) {
    const author = escapeRegExp(fold(entry.firstAuthor));
    pattern = new RegExp(`(?<!(?:&|,|\\band)\\s*)\\b${author}\\b[^0-9;]{0,70}?\\b${entry.year}[a-z]?\\b`);
    patternCache.set(cacheKey, pattern);
  }
  return pattern;
}

/** True when the free-text `source` cites `entry`. */
export function sourceCites(source: string, entry: Reference): boolean {
  const folded = fold(source);
  if (authorYearPattern(entry).test(folded)) return true;
  return (entry.aliases ?? []).some((alias) => alias.test(source));
}

export interface CollectedReferences {
  /** Cited works, in the order of the table above (grouped by topic). */
  readonly references: readonly Reference[];
  /**
   * Source strings kept verbatim because they cite nothing in the table (e.g. "common practice, no
   * source") or mention a year no tabled work accounts for (a work missing from the table).
   */
  readonly uncited: readonly string[];
}

/** Finds every tabled reference cited by any of `sources`; sources citing none are returned as-is. */
export function referencesFromSources(sources: readonly string[]): CollectedReferences {
  const unique = [...new Set(sources.map((s) => s.trim()).filter((s) => s !== ""))];
  const cited = new Set<Reference>();
  const uncited: string[] = [];
  for (const source of unique) {
    const hits = REFERENCES.filter((entry) => sourceCites(source, entry));
    hits.forEach((hit) => cited.add(hit));
    const years = source.match(/\b(?:1[89]|20)\d{2}\b/g) ?? [];
    const unexplained = years.some(
      (y) => !hits.some((h) => h.year === y || (h.aliases ?? []).some((a) => a.test(source) && source.includes(y))),
    );
    if (hits.length === 0 || unexplained) uncited.push(source);
  }
  return { references: REFERENCES.filter((entry) => cited.has(entry)), uncited };
}
