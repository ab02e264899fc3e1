/**
 * AQ.PHRANGE: the lowest and highest pH over the stated tolerances, as a table with a header row:
 *   low pH | high pH | method
 * then the worst-case row, then the statistical band's row.
 * The method column says how the band was found, for a reviewer: an exhaustive worst case over all
 * 2^k corners (with refinement), or — beyond 12 varied quantities — a bounded local search that is
 * not exhaustive (the true band may be wider).
 * Below the worst case, the statistical band pH₀ ± k·u (GUM linear propagation, chem/workflows/
 * ph-range.ts), its method, pH₀, u and k stated in its method cell (kept short: the table must read
 * in a terminal).
 * The temperature is one value, two cells (2 and 8 °C) or text with a tolerance ("5 ± 3 °C",
 * chem/units.ts): a range searched as part of the worst case.
 * amount_tolerance is one relative tolerance for every amount (0.02 or "2 %") or a range of the same
 * shape as names (blank names are skipped, as in names/amounts).
 */
import { phRange as phRangeOf, phRangeOverTemperature, PHRANGE_MAX_EXHAUSTIVE, type PHRangeValue } from "../../chem/workflows";
import { parseTemperatureTolerance } from "../../chem";
import { cellsOf, isBlank, plainNumber, position, shapeOf, type Cell } from "../args";
import { badInput, finite, orThrow } from "../errors";
import { readMixtureArgs } from "../mixture";
import { chemOptions } from "./options";

export const PHRANGE_HEADER = ["low pH", "high pH", "method"];

/** A relative tolerance: 0.02, "0.02" or "2 %". */
function relative(value: Cell, what: string): number {
  if (typeof value === "string" && value.trim().endsWith("%")) {
    return plainNumber(value.trim().slice(0, -1).trim(), what) / 100;
  }
  return plainNumber(value, what);
}

/** One tolerance per mixture entry, aligned with readMixture's entries (blank names skipped). */
function tolerances(names: Cell, amountTolerance: Cell): number | number[] {
  const tShape = shapeOf(amountTolerance);
  if (tShape[0] === 1 && tShape[1] === 1) return relative(cellsOf(amountTolerance)[0].value, "amount_tolerance");
  const nShape = shapeOf(names);
  if (nShape[0] !== tShape[0] || nShape[1] !== tShape[1]) {
    throw badInput(`amount_tolerance is ${tShape[0]}×${tShape[1]} cells but names is ${nShape[0]}×${nShape[1]}: give one tolerance, or one per name`);
  }
  const tCells = cellsOf(amountTolerance);
  const out: number[] = [];
  cellsOf(names).forEach((cell, i) => {
    if (isBlank(cell.value)) return;
    out.push(relative(tCells[i].value, `amount_tolerance${position(cell.row, cell.col, nShape)}`));
  });
  return out;
}

function methodText(r: PHRangeValue): string {
  const k = r.quantities.length;
  if (r.method === "none") return "no tolerance given: the nominal pH";
  if (r.method === "corners") return `worst case over all ${2 ** k} corners of ${k} varied quantit${k === 1 ? "y" : "ies"}, refined`;
  return `bounded local search, not exhaustive (${k} varied quantities > ${PHRANGE_MAX_EXHAUSTIVE}): the true band may be wider`;
}

/** The statistical band's row: low, high, and its method with pH₀, k and u stated. */
function statisticalRow(r: PHRangeValue, overTemperature: boolean): unknown[] {
  const s = r.statistical;
  const u = s.u === 0 ? "0" : s.u.toPrecision(2);
  const method = `GUM linear propagation${overTemperature ? " (T included)" : ""}: ${r.nominal.toFixed(3)} ± ${s.k} × ${u}, k = ${s.k}`;
  return [finite(s.low, "statistical low"), finite(s.high, "statistical high"), method];
}

/**
 * Two temperature cells (a storage range such as 2 and 8 °C), or one text with a tolerance ("5 ± 3
 * °C"), or null for one temperature.
 */
function temperatureRange(temperature: Cell): [number, number] | null {
  const one = Array.isArray(temperature) ? cellsOf(temperature).filter((c) => !isBlank(c.value)) : [{ value: temperature }];
  if (one.length === 1 && typeof one[0].value === "string") {
    const t = parseTemperatureTolerance(one[0].value);
    if (t !== null) {
      if (!t.ok) throw badInput(`temperature '${one[0].value}': ${t.message}`);
      return [chemOptions(t.range[0]).temperatureC, chemOptions(t.range[1]).temperatureC];
    }
  }
  if (!Array.isArray(temperature)) return null;
  const cells = cellsOf(temperature).filter((c) => !isBlank(c.value));
  if (cells.length <= 1) return null;
  if (cells.length > 2) throw badInput(`temperature is ${cells.length} cells: give one temperature, or two for a range (such as 2 and 8 °C)`);
  return [chemOptions(cells[0].value).temperatureC, chemOptions(cells[1].value).temperatureC];
}

export function phRange(names: Cell, amounts: Cell, amountTolerance: Cell, pKaUncertainty: Cell, temperature: Cell, activity: Cell): unknown[][] {
  const { mixture } = readMixtureArgs(names, amounts);
  const tol = tolerances(names, amountTolerance);
  const u = plainNumber(pKaUncertainty, "pKa_uncertainty", 0);
  const range = temperatureRange(temperature);
  if (range !== null) {
    const r = orThrow(phRangeOverTemperature(mixture, tol, range, { pKaUncertainty: u, activity: chemOptions(null, activity).activity }));
    const over = `${methodText(r)}, at each of ${r.temperatures.length} temperatures from ${r.temperatureRange[0]} to ${r.temperatureRange[1]} °C`;
    return [PHRANGE_HEADER, [finite(r.low, "low pH"), finite(r.high, "high pH"), over], statisticalRow(r, true)];
  }
  const single = Array.isArray(temperature) ? cellsOf(temperature).find((c) => !isBlank(c.value))?.value ?? null : temperature;
  const r = orThrow(phRangeOf(mixture, tol, { ...chemOptions(single, activity), pKaUncertainty: u }));
  return [PHRANGE_HEADER, [finite(r.low, "low pH"), finite(r.high, "high pH"), methodText(r)], statisticalRow(r, false)];
}
