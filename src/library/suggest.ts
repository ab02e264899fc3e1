/**
 * Closest known names for an unknown one: optimal-string-alignment edit distance (insertions,
 * deletions, substitutions, adjacent transpositions) over normalized lookup keys, with a typed
 * prefix of at least four characters counting as distance 1 ("histidine HCl" → the monohydrate).
 */

export interface Suggestion {
  /** Substance id. */
  id: string;
  /** Substance display name. */
  name: string;
  /** The alias (as written in the library) that matched best. */
  alias: string;
  distance: number;
}

export interface SuggestKey {
  key: string;
  id: string;
  name: string;
  alias: string;
}

/** Edit distance with adjacent transpositions, stopping early once it exceeds `limit`. */
export function editDistance(a: string, b: string, limit = Infinity): number {
  if (Math.abs(a.length - b.length) > limit) return limit + 1;
  let prev2: number[] = [];
  let prev: number[] = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    let rowMin = i;
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let d = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) d = Math.min(d, prev2[j - 2] + 1);
      cur.push(d);
      rowMin = Math.min(rowMin, d);
    }
    if (rowMin > limit) return limit + 1;
    prev2 = prev;
    prev = cur;
  }
  return prev[b.length];
}

/** Largest distance still worth suggesting for a typed key of this length. */
export function suggestionLimit(length: number): number {
  return Math.max(2, Math.floor(length * 0.4));
}

/** Up to `max` distinct substances whose names are closest to `typedKey`. */
export function closest(typedKey: string, keys: readonly SuggestKey[], max = 3): Suggestion[] {
  if (typedKey === "" || max <= 0) return [];
  const limit = suggestionLimit(typedKey.length);
  const best = new Map<string, Suggestion>();
  for (const k of keys) {
    let d = editDistance(typedKey, k.key, limit);
    if (typedKey.length >= 4 && k.key.startsWith(typedKey) && k.key !== typedKey) d = Math.min(d, 1);
    if (d > limit) continue;
    const seen = best.get(k.id);
    if (!seen || d < seen.distance || (d === seen.distance && k.alias.length < seen.alias.length)) {
      best.set(k.id, { id: k.id, name: k.name, alias: k.alias, distance: d });
    }
  }
  return [...best.values()]
    .sort((x, y) => x.distance - y.distance || x.name.length - y.name.length || (x.name < y.name ? -1 : x.name > y.name ? 1 : 0))
    .slice(0, max);
}
