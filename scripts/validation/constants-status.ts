/**
 * How the built-in constants stand: how many pKa, ΔrH°, ΔrCp° and atomic-weight values are
 * "published" (seen in the named source), "common-practice" or "unverified", and which steps have
 * no ΔrH° or no ΔrCp° at all. Used by the validation report; also a command:
 *   npx tsx scripts/validation/constants-status.ts
 */
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import type { LibraryDoc, ValueRecord } from "../../src/library/types";

export type Quantity = "pKa" | "dH" | "dCp" | "atomic weight";
/** "entered" (by a user) never occurs in the built-in data (test/library/revise.test.ts); counted so nothing is lost. */
export type StatusCounts = Record<Quantity, { published: number; "common-practice": number; unverified: number; entered: number }>;

export interface ConstantsStatus {
  counts: StatusCounts;
  /** "system step n" for steps without ΔrH° / without ΔrCp°. */
  withoutDH: string[];
  withoutDCp: string[];
}

export function constantsStatus(doc: LibraryDoc = BUILTIN_LIBRARY): ConstantsStatus {
  const zero = () => ({ published: 0, "common-practice": 0, unverified: 0, entered: 0 });
  const counts: StatusCounts = { pKa: zero(), dH: zero(), dCp: zero(), "atomic weight": zero() };
  const add = (q: Quantity, r: ValueRecord) => (counts[q][r.status] += 1);
  const withoutDH: string[] = [];
  const withoutDCp: string[] = [];
  for (const s of doc.systems ?? []) {
    s.steps.forEach((step, i) => {
      const where = `${s.id} step ${i + 1}`;
      add("pKa", step.pKa);
      if (step.dH) add("dH", step.dH);
      else withoutDH.push(where);
      if (step.dCp) add("dCp", step.dCp);
      else withoutDCp.push(where);
    });
  }
  for (const r of Object.values(doc.atomicWeights ?? {})) add("atomic weight", r);
  return { counts, withoutDH, withoutDCp };
}

/** Markdown lines for the validation report. */
export function constantsStatusMarkdown(st: ConstantsStatus = constantsStatus()): string[] {
  const pct = (n: number, d: number) => (d === 0 ? "—" : `${((100 * n) / d).toFixed(0)} %`);
  const lines = [
    "| quantity | published (seen in the named source) | common practice | unverified (from memory) | published share |",
    "| --- | --- | --- | --- | --- |",
  ];
  for (const [q, c] of Object.entries(st.counts)) {
    const total = c.published + c["common-practice"] + c.unverified;
    lines.push(`| ${q} | ${c.published} | ${c["common-practice"]} | ${c.unverified} | ${pct(c.published, total)} of ${total} |`);
  }
  lines.push(
    "",
    `Steps without ΔrH° (their pKa is held at its 25 °C value, and AQ.CHECK warns away from 25 °C): ${st.withoutDH.length === 0 ? "none" : st.withoutDH.join(", ")}.`,
    "",
    `Steps without ΔrCp° (ΔrH° is taken as constant): ${st.withoutDCp.length === 0 ? "none" : st.withoutDCp.join(", ")}.`,
  );
  return lines;
}

if (require.main === module) {
  process.stdout.write(constantsStatusMarkdown().join("\n") + "\n");
}
