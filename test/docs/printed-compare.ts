/**
 * Comparing what a page prints for an example with what the function gives now.
 *
 * Cells are compared line by line and tab by tab. Two numbers agree within the printed precision:
 * half a unit in the last printed digit (3.776 → ±0.0005; 1.70e-7 → ±5e-10), but never tighter
 * than 1e-12 relative, because results printed with all 17 significant digits can differ in the last
 * digits between platforms' floating-point libraries. Anything else (text, error values and their
 * messages) must match exactly. Trailing blank cells are ignored (an editor may strip the trailing
 * tabs of a line; they are invisible either way).
 */
const NUMBER = /^[+-]?(\d+)(?:\.(\d+))?(?:[eE]([+-]?\d+))?$/;

export function printedTolerance(text: string): number | null {
  const m = text.trim().match(NUMBER);
  if (!m) return null;
  const decimals = m[2]?.length ?? 0;
  const exponent = m[3] ? Number(m[3]) : 0;
  const value = Number(text);
  return Math.max(0.5 * Math.pow(10, exponent - decimals), 1e-12 * Math.abs(value));
}

/** null when they agree, else a description of the first difference. */
export function comparePrinted(printed: readonly string[], actual: readonly string[]): string | null {
  if (printed.length !== actual.length) {
    return `printed ${printed.length} line(s), the function now gives ${actual.length}:\n  printed: ${printed.join(" / ")}\n  actual:  ${actual.join(" / ")}`;
  }
  for (let i = 0; i < printed.length; i++) {
    const p = printed[i].replace(/[\t ]+$/, "").split("\t");
    const a = actual[i].replace(/[\t ]+$/, "").split("\t");
    if (p.length !== a.length) return `line ${i + 1}: printed ${p.length} cell(s), actual ${a.length}\n  printed: ${printed[i]}\n  actual:  ${actual[i]}`;
    for (let j = 0; j < p.length; j++) {
      const tol = printedTolerance(p[j]);
      if (tol !== null && printedTolerance(a[j]) !== null) {
        const diff = Math.abs(Number(p[j]) - Number(a[j]));
        if (!(diff <= tol)) return `line ${i + 1}, cell ${j + 1}: printed ${p[j]}, actual ${a[j]}, difference ${diff} > tolerance ${tol}`;
      } else if (p[j] !== a[j]) {
        return `line ${i + 1}, cell ${j + 1}: printed "${p[j]}", actual "${a[j]}"`;
      }
    }
  }
  return null;
}
