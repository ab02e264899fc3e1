/**
 * The longest cell text an XLSX package holds, read from its XML parts before the workbook is
 * loaded, so that a package with a 100 MB cell is refused before exceljs builds that string (and
 * the objects around it). Counted on the inflated bytes without decoding them: characters of text
 * between tags, UTF-8 continuation bytes not counted, an entity (&amp; &#233;) one character. A
 * shared string (<si>) is the sum of its runs (rich text is split into <r><t> pieces); in a
 * worksheet each text node is counted alone (an inline string, a formula, a value). Where a count
 * can only be lower than the text's length in the cell (a character outside the Basic Multilingual
 * Plane counts one here, two in a cell), so a package refused here is over the limit for certain;
 * the exact check runs again on the loaded cells.
 */

const LT = 0x3c; // <
const GT = 0x3e; // >
const AMP = 0x26; // &
const SEMI = 0x3b; // ;
const SLASH = 0x2f; // /

/** True when the tag starting after '<' at `i` is named `si` (opening or closing). */
function isSharedStringTag(xml: Buffer, i: number): boolean {
  let j = i + 1;
  if (xml[j] === SLASH) j++;
  if (xml[j] !== 0x73 || xml[j + 1] !== 0x69) return false; // "si"
  const after = xml[j + 2];
  return after === GT || after === SLASH || after === 0x20 || after === 0x09 || after === 0x0a || after === 0x0d;
}

/**
 * The largest text length found in one XML part (characters, as counted above). `sharedStrings`:
 * sum the text of each <si> element; otherwise each text node alone.
 */
export function longestText(xml: Buffer, sharedStrings: boolean): number {
  let longest = 0;
  let current = 0;
  let inTag = false;
  let inEntity = false;
  for (let i = 0; i < xml.length; i++) {
    const b = xml[i]!;
    if (inTag) {
      if (b === GT) inTag = false;
      continue;
    }
    if (b === LT) {
      inTag = true;
      if (current > longest) longest = current;
      if (!sharedStrings || isSharedStringTag(xml, i)) current = 0;
      continue;
    }
    if (inEntity) {
      if (b === SEMI) inEntity = false;
      continue;
    }
    if (b === AMP) {
      inEntity = true;
      current++;
      continue;
    }
    if ((b & 0xc0) !== 0x80) current++; // not a UTF-8 continuation byte
  }
  return Math.max(longest, current);
}

/** Whether a part of the package holds cell text: the shared strings or a worksheet. */
export function textPartKind(name: string): "shared" | "sheet" | null {
  if (/^xl\/sharedStrings\d*\.xml$/i.test(name)) return "shared";
  if (/^xl\/worksheets\/[^/]+\.xml$/i.test(name)) return "sheet";
  return null;
}
