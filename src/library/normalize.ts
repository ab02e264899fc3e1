/**
 * Names typed in a spreadsheet → lookup keys. Case, whitespace, Unicode subscripts and other
 * compatibility forms, hydrate separators ("·", ".", "*", "•"), hyphens and dashes, underscores,
 * commas and apostrophes do not matter: "Na₂HPO₄ · 7 H₂O", "na2hpo4.7h2o" and "NA2HPO4*7H2O" are
 * the same key, as are "Tris-HCl" and "tris hcl".
 */

const DROP = /[\s\-_,'\u2019\u2032\u00b7\u2022\u2027\u22c5\u2219.*\u2010-\u2015\u2212]/gu;

/** The lookup key of a name. */
export function normalizeName(name: string): string {
  return name.normalize("NFKC").toLowerCase().replace(DROP, "");
}
