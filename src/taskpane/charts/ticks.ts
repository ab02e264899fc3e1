/** Axis ticks at round numbers (1, 2, 2.5, 5 × 10^k) and their labels. Pure. */

const STEPS = [1, 2, 2.5, 5, 10];

/** The round step (1, 2, 2.5 or 5 × 10^k) giving about `count` intervals over span. */
export function niceStep(span: number, count: number): number {
  if (!(span > 0) || !Number.isFinite(span)) return 1;
  const raw = span / Math.max(1, count);
  const mag = Math.pow(10, Math.floor(Math.log10(raw)));
  const m = STEPS.find((s) => s * mag >= raw * (1 - 1e-9)) ?? 10;
  return m * mag;
}

/** The smallest round number (1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8 × 10^k) ≥ x, for an axis end. */
export function niceCeil(x: number): number {
  if (!(x > 0) || !Number.isFinite(x)) return 1;
  const mag = Math.pow(10, Math.floor(Math.log10(x)));
  const m = [1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10].find((s) => s * mag >= x * (1 - 1e-12)) ?? 10;
  return m * mag;
}

/** Ticks from lo to hi (inclusive, lo and hi multiples of the step or not) at a round step. */
export function ticks(lo: number, hi: number, count = 5): number[] {
  const step = niceStep(hi - lo, count);
  const first = Math.ceil(lo / step - 1e-9) * step;
  const out: number[] = [];
  for (let v = first; v <= hi + step * 1e-9; v += step) out.push(Math.abs(v) < step * 1e-9 ? 0 : Number(v.toPrecision(12)));
  return out;
}

/** Labels with just enough decimals to tell the ticks apart (2.5 → "2.5", 10 → "10"). */
export function tickLabels(values: readonly number[]): string[] {
  for (let d = 0; d <= 6; d++) {
    const labels = values.map((v) => v.toFixed(d));
    if (values.every((v, i) => Math.abs(Number(labels[i]) - v) < 1e-9 * Math.max(1, Math.abs(v)))) return labels;
  }
  return values.map((v) => String(v));
}
