/**
 * Every argument of every AQ function in a formula that holds substance names: a mixture's names
 * and a titrant (ADJUST, CURVE), AQ.PKA's and AQ.MOLARMASS's substance, AQ.RECIPE's acid and base
 * forms, salt and other names. For the view of the entries a workbook's formulas use. Pure.
 */
import { aqFunctionId, argSource, MIXTURE_FUNCTIONS, type ArgSource } from "./aq-call";
import { calls, FormulaSyntaxError, parseFormula, type FormulaNode } from "./parse";

/** Argument positions (from 0) holding names, by function (the parameter lists of src/functions/functions.ts). */
const OTHER_NAME_ARGS: Record<string, number[]> = { PKA: [0], MOLARMASS: [0], RECIPE: [0, 1, 7, 9] };

function nameArgs(id: string): number[] {
  const mixture = MIXTURE_FUNCTIONS.find((m) => m.id === id);
  if (mixture) return mixture.titrant >= 0 ? [0, mixture.titrant] : [0];
  return OTHER_NAME_ARGS[id] ?? [];
}

/** The name-holding arguments of the AQ calls in a formula (none for a value or a formula without AQ). */
export function nameSources(formula: unknown): { sources: ArgSource[]; error?: string } {
  if (typeof formula !== "string" || !formula.startsWith("=") || !/AQ[._]/i.test(formula)) return { sources: [] };
  let tree: FormulaNode;
  try {
    tree = parseFormula(formula);
  } catch (e) {
    if (e instanceof FormulaSyntaxError) return { sources: [], error: `the formula could not be read (${e.message})` };
    throw e;
  }
  const sources: ArgSource[] = [];
  for (const c of calls(tree)) {
    const id = aqFunctionId(c.name);
    if (!id) continue;
    for (const i of nameArgs(id)) {
      const s = argSource(c.args[i], formula);
      if (s.kind !== "missing") sources.push(s);
    }
  }
  return { sources };
}
