/** Shared fixtures for the task pane's unit tests: in-memory stores and a controller on them. */
import { resetActiveLibrary } from "../../src/library";
import { PaneController } from "../../src/taskpane/controller";
import type { HostInfo } from "../../src/taskpane/host";
import { createMemoryStorage, type MemoryStorage } from "../../src/library";
import { WHERE, type PaneStores } from "../../src/taskpane/storage";
import { emptyStep, emptySubstance, emptySystem, type SubstanceInput, type SystemInput } from "../../src/taskpane/forms";

export const BROWSER_HOST: HostInfo = { kind: "browser", reason: "not-in-office", detail: "not running inside Office" };

export interface MemoryStores {
  workbook: MemoryStorage;
  personal: MemoryStorage;
}

/** Both layers in memory; `initial` is stored text to start from (to test damaged data). */
export function memoryStores(initial: { workbook?: string; personal?: string } = {}): { memory: MemoryStores; stores: PaneStores } {
  const memory = { workbook: createMemoryStorage(initial.workbook ?? null), personal: createMemoryStorage(initial.personal ?? null) };
  return {
    memory,
    stores: {
      workbook: { where: WHERE.workbookSimulated, storage: memory.workbook },
      personal: { where: WHERE.personal, storage: memory.personal },
    },
  };
}

export async function freshController(initial: { workbook?: string; personal?: string } = {}): Promise<{ ctl: PaneController; memory: MemoryStores }> {
  resetActiveLibrary();
  const { memory, stores } = memoryStores(initial);
  const ctl = new PaneController(BROWSER_HOST, stores);
  await ctl.init();
  return { ctl, memory };
}

/** A fictional amine base of Halvorsen Biologics, entered by its pKb. */
export function baseSystemByPkb(pKb: string): SystemInput {
  const s = emptySystem();
  s.name = "HB-7 amine";
  s.topCharge = "1";
  const step = emptyStep();
  step.enteredAsPkb = true;
  step.pKa.value = pKb;
  step.pKa.status = "unverified";
  step.pKa.note = "Halvorsen Biologics internal datasheet value, not yet checked";
  s.steps = [step];
  return s;
}

export function baseSubstance(systemId: string, name = "HB-7 free base"): SubstanceInput {
  const s = emptySubstance();
  s.name = name;
  s.aliases = "HB7 base";
  s.molarMass = { value: "161.2", conditions: "as weighed", status: "unverified", source: "", locator: "", note: "supplier label, not checked" };
  s.systems = [{ system: systemId, stoich: "1", protons: "0" }];
  return s;
}
