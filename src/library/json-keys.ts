/**
 * JSON.parse keeps the last of two equal keys in an object ("last one wins"), so a file with
 * `"pKa": 4.76, … "pKa": 9.1` would be read silently as 9.1. `duplicateKey` scans the text of a
 * file JSON.parse has already accepted and names the first key written twice in one object.
 */

export interface DuplicateKey {
  key: string;
  /** Where the second one is: 1-based line. */
  line: number;
}

/** The first duplicate key of `text` (valid JSON), or null. */
export function duplicateKey(text: string): DuplicateKey | null {
  // One frame per open object or array: the keys met so far (null for an array).
  const stack: (Set<string> | null)[] = [];
  let expectKey = false;
  let line = 1;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (c === "\n") line++;
    else if (c === "{") {
      stack.push(new Set());
      expectKey = true;
    } else if (c === "[") {
      stack.push(null);
      expectKey = false;
    } else if (c === "}" || c === "]") {
      stack.pop();
      expectKey = false;
    } else if (c === ",") {
      expectKey = stack[stack.length - 1] !== null && stack.length > 0;
    } else if (c === '"') {
      let j = i + 1;
      while (text[j] !== '"') j += text[j] === "\\" ? 2 : 1;
      if (expectKey) {
        const key = JSON.parse(text.slice(i, j + 1)) as string;
        const keys = stack[stack.length - 1] as Set<string>;
        if (keys.has(key)) return { key, line };
        keys.add(key);
        expectKey = false;
      }
      i = j;
    }
  }
  return null;
}
