/** AQ.MOLARMASS: g/mol of the form named, hydrate water included (computed from CIAAW atomic weights). */
import { text, type Cell } from "../args";
import { badInput, finite } from "../errors";
import { resolveComponent } from "../substances";

export function molarMass(substance: Cell): number {
  const name = text(substance, "substance");
  const component = resolveComponent(name);
  if (component.molarMass === undefined) throw badInput(`'${name}' has no molar mass in the library (no formula was given for it)`);
  return finite(component.molarMass, "molar mass");
}
