/**
 * The assessment's calibrated likelihood terms ("likely", "very likely", "unlikely", …; IPCC
 * AR6 WG1, following Mastrandrea et al. 2010, Guidance Note for Lead Authors of the IPCC Fifth
 * Assessment Report on Consistent Treatment of Uncertainties) belong to its authors' assessed
 * ranges. Plumeline may use them only inside a quotation of the assessment — typographic
 * quotation marks “…” — on a line that also cites it (IPCC + year, or AR6). Anything else,
 * such as a percentile band called "likely", is a finding.
 */
const LIKELIHOOD_TERM = /\b(?:\w+ )?(?:un)?likely\b|\bvirtually certain\b|\babout as likely as not\b/gi;
const QUOTATION = /“[^”\n]*”/g;
const CITATION = /IPCC(?: AR6)?[^\n]*\b(?:19|20)\d\d\b|\b(?:19|20)\d\d\b[^\n]*IPCC|\bAR6\b/;

export interface UncitedTerm {
  term: string;
  line: string;
}

/** Every calibrated likelihood term in `text` that is not inside a cited “…” quotation. */
export function uncitedLikelihoodTerms(text: string): UncitedTerm[] {
  const found: UncitedTerm[] = [];
  for (const line of text.split("\n")) {
    const quoted = [...line.matchAll(QUOTATION)].map((m) => [m.index, m.index + m[0].length] as const);
    const cited = CITATION.test(line);
    for (const m of line.matchAll(LIKELIHOOD_TERM)) {
      const inQuote = quoted.some(([from, to]) => m.index > from && m.index < to);
      if (!(inQuote && cited)) found.push({ term: m[0], line: line.trim() });
    }
  }
  return found;
}
