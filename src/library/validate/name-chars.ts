/**
 * Characters a lookup name may not hold, because a reader cannot see them for what they are:
 * invisible characters (zero-width spaces and joiners, the word joiner, the byte-order mark, soft
 * hyphen), bidirectional controls (which reorder what is displayed), and letters of another script
 * that look like Latin ones ("Trіs" with a Cyrillic і) written among Latin letters. Such a name
 * would look like a built-in one on screen and in a review, yet name something else.
 *
 * Greek letters on their own are chemistry (α-alanine, β-alanine): only the Greek capitals and
 * the small omicron that look like Latin letters are refused, and only beside Latin letters.
 * The code points are from the Unicode Standard's charts (Cyrillic, Greek, General Punctuation).
 */

const INVISIBLE: Readonly<Record<number, string>> = {
  0x00ad: "soft hyphen",
  0x034f: "combining grapheme joiner",
  0x180e: "Mongolian vowel separator",
  0x200b: "zero-width space",
  0x200c: "zero-width non-joiner",
  0x200d: "zero-width joiner",
  0x2060: "word joiner",
  0x2061: "invisible function application",
  0x2062: "invisible times",
  0x2063: "invisible separator",
  0x2064: "invisible plus",
  0xfeff: "zero-width no-break space",
};

/** Bidirectional formatting characters: marks, embeddings, overrides and isolates. */
const BIDI = /[\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/u;

/** Cyrillic and Greek letters that look like Latin ones (Unicode charts; common practice in confusable checks). */
const LOOKALIKE = /[\u0405\u0406\u0408\u0410\u0412\u0415\u041a\u041c\u041d\u041e\u0420\u0421\u0422\u0423\u0425\u0430\u0435\u043e\u0440\u0441\u0443\u0445\u0455\u0456\u0458\u04bb\u04c0\u0501\u051b\u051d\u0391\u0392\u0395\u0396\u0397\u0399\u039a\u039c\u039d\u039f\u03a1\u03a4\u03a5\u03a7\u03bf]/u;

const hex = (c: number): string => `U+${c.toString(16).toUpperCase().padStart(4, "0")}`;

/** Why `text` cannot be a name, or null when it can. */
export function nameCharacterProblem(text: string): string | null {
  for (const ch of text) {
    const c = ch.codePointAt(0) as number;
    if (INVISIBLE[c]) return `holds an invisible character (${INVISIBLE[c]}, ${hex(c)}); type the name again without it`;
    if (BIDI.test(ch)) return `holds a bidirectional control character (${hex(c)}), which changes how the name is displayed; type the name again without it`;
  }
  if (/[A-Za-z]/.test(text)) {
    const m = LOOKALIKE.exec(text);
    if (m) {
      const c = m[0].codePointAt(0) as number;
      const script = c >= 0x0400 && c < 0x0530 ? "Cyrillic" : "Greek";
      return `mixes Latin letters with the ${script} letter '${m[0]}' (${hex(c)}), which looks like a Latin one; type it with Latin letters`;
    }
  }
  return null;
}
