/**
 * What an XLSX package's XML parts hold, read from the inflated bytes as they stream past, before the
 * workbook is loaded: the longest cell text (so that a package with a 100 MB cell is refused before
 * exceljs builds that string and the objects around it), and the number of cells and rows of a
 * worksheet (so that a package that would load millions of cells is refused at low memory).
 *
 * Counted on the bytes without decoding them: characters of text between tags, UTF-8 continuation
 * bytes not counted, an entity (&amp; &#233;) one character. A shared string (<si>) is the sum of its
 * runs (rich text is split into <r><t> pieces); in a worksheet each text node is counted alone (an
 * inline string, a formula, a value). Cells are the <c> elements, rows the <row> elements (a
 * namespace prefix such as <x:c> is allowed). Each count can only be lower than what the loaded
 * workbook gives (a character outside the Basic Multilingual Plane counts one here, two in a cell;
 * every <c> is a distinct cell inside the rectangle the limits count), so a package refused here is
 * over the limit for certain; the exact checks run again on the loaded cells.
 *
 * It also counts the <row> and <c> elements that lack their `r` attribute (the row number, the cell
 * address). The format allows leaving them out (rows and cells then follow in order), and some
 * programs that write XLSX do; Excel always writes them, and exceljs cannot load a sheet without
 * them (it stops with "Invalid row number in model"), so the command line refuses such a sheet with
 * a message that says what is missing (input.ts).
 */

const LT = 0x3c; // <
const GT = 0x3e; // >
const AMP = 0x26; // &
const SEMI = 0x3b; // ;
const SLASH = 0x2f; // /
const COLON = 0x3a; // :

/** Tag names as the bytes of their (up to four) letters. */
const SI = (0x73 << 8) | 0x69;
const C = 0x63;
const ROW = (0x72 << 16) | (0x6f << 8) | 0x77;

/** The byte ends a tag's name: blank, '>' or '/'. */
const endsName = (b: number): boolean => b === GT || b === SLASH || isBlank(b);
const isBlank = (b: number): boolean => b === 0x20 || b === 0x09 || b === 0x0a || b === 0x0d;
const R = 0x72; // r
const EQUALS = 0x3d;
const QUOT = 0x22;
const APOS = 0x27;

/** Scans one XML part given in chunks (any split, even inside a tag or a character). */
export class XmlPartScanner {
  /** The longest text so far (characters, as counted above). */
  longest = 0;
  /** <c> elements so far (worksheets only). */
  cells = 0;
  /** <row> elements so far (worksheets only). */
  rows = 0;
  /** <row> elements without an `r` attribute (worksheets only). */
  rowsWithoutNumber = 0;
  /** <c> elements without an `r` attribute (worksheets only). */
  cellsWithoutAddress = 0;
  /** Reading the attributes of a <row> (2) or <c> (1) start tag, 0 otherwise; whether `r=` was seen. */
  private attrsOf = 0;
  private hasR = false;
  /** Inside an attribute's quoted value: its quote byte, else 0. */
  private quote = 0;
  /** The attribute name read so far is a lone "r" (1), or "r" and blanks (2); 0 otherwise. */
  private rName = 0;
  private afterBlank = false;
  private current = 0;
  private inTag = false;
  private inEntity = false;
  /** Reading the name of the current tag: its letters so far, how many, and whether it closes. */
  private naming = false;
  private name = 0;
  private nameLength = 0;
  private closing = false;

  /** `sharedStrings`: sum the text of each <si> element; otherwise each text node alone. */
  constructor(private readonly sharedStrings: boolean) {}

  write(xml: Uint8Array): void {
    const shared = this.sharedStrings;
    let { longest, current, inTag, inEntity, naming, name, nameLength, closing } = this;
    for (let i = 0; i < xml.length; i++) {
      const b = xml[i]!;
      if (inTag) {
        if (this.attrsOf !== 0 && !naming) {
          if (this.attribute(b)) continue; // inside a quoted value: not the tag's end
        }
        if (naming) {
          if (nameLength === 0 && b === SLASH && !closing) closing = true;
          else if (b === COLON) {
            name = 0; // a namespace prefix: the name follows
            nameLength = 0;
          } else if (!endsName(b)) {
            if (nameLength < 4) name = name * 256 + b;
            nameLength++;
          } else {
            naming = false;
            if (shared) {
              if (nameLength === 2 && name === SI) current = 0;
            } else if (!closing) {
              if (nameLength === 1 && name === C) this.cells++;
              else if (nameLength === 3 && name === ROW) this.rows++;
              this.startAttributes(nameLength === 1 && name === C ? 1 : nameLength === 3 && name === ROW ? 2 : 0, b);
            }
          }
        }
        if (b === GT) {
          inTag = false;
          this.endAttributes();
        }
        continue;
      }
      if (b === LT) {
        inTag = true;
        naming = true;
        name = 0;
        nameLength = 0;
        closing = false;
        if (current > longest) longest = current;
        if (!shared) current = 0;
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
    if (current > longest) longest = current;
    this.longest = longest;
    this.current = current;
    this.inTag = inTag;
    this.inEntity = inEntity;
    this.naming = naming;
    this.name = name;
    this.nameLength = nameLength;
    this.closing = closing;
  }

  /** Starts reading the attributes of a start tag (kind 1: <c>, 2: <row>, 0: another); `b` ended its name. */
  private startAttributes(kind: number, b: number): void {
    this.attrsOf = kind;
    this.hasR = false;
    this.quote = 0;
    this.rName = 0;
    this.afterBlank = isBlank(b);
  }

  /** One byte of a <row> or <c> start tag's attributes; true inside a quoted value (a '>' there does not end the tag). */
  private attribute(b: number): boolean {
    if (this.quote !== 0) {
      if (b === this.quote) this.quote = 0;
      return true;
    }
    if (b === QUOT || b === APOS) {
      this.quote = b;
      this.rName = 0;
      return true;
    }
    if (b === EQUALS) {
      if (this.rName !== 0) this.hasR = true;
      this.rName = 0;
    } else if (isBlank(b)) {
      if (this.rName === 1) this.rName = 2;
    } else this.rName = b === R && this.afterBlank ? 1 : 0;
    this.afterBlank = isBlank(b);
    return false;
  }

  /** A start tag ended: counts a <row> or <c> without its `r`. */
  private endAttributes(): void {
    if (this.attrsOf === 1 && !this.hasR) this.cellsWithoutAddress++;
    else if (this.attrsOf === 2 && !this.hasR) this.rowsWithoutNumber++;
    this.attrsOf = 0;
  }
}


/** The largest text length found in one whole XML part (see XmlPartScanner). */
export function longestText(xml: Buffer, sharedStrings: boolean): number {
  const scanner = new XmlPartScanner(sharedStrings);
  scanner.write(xml);
  return scanner.longest;
}

/**
 * Whether a part of the package holds cells: the shared strings or a worksheet. exceljs takes as a
 * worksheet any part whose name contains "xl/worksheets/sheetN.xml" (its pattern is not anchored:
 * "a/xl/worksheets/sheet1.xml" and "xl/worksheets/sheet1.xml.bak" load as sheets too), so every name
 * containing "xl/worksheets/….xml" is scanned here.
 */
export function textPartKind(name: string): "shared" | "sheet" | null {
  if (/^xl\/sharedStrings\d*\.xml$/i.test(name)) return "shared";
  if (/xl\/worksheets\/[^/]+\.xml/i.test(name) && !/\.rels$/i.test(name)) return "sheet";
  return null;
}
