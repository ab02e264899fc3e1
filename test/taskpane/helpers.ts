/** Shared fixtures for the task pane's unit tests: in-memory stores and a controller on them. */
import { resetActiveLibrary } from "../../src/library";
import { PaneController } from "../../src/taskpane/controller";
import type { HostInfo } from "../../src/taskpane/host";
import { KeyValueLayerStore, MemoryStorage, STORAGE_KEYS, WHERE } from "../../src/taskpane/storage";
import { emptyStep, emptySubstance, emptySystem, type SubstanceInput, type SystemInput } from "../../src/taskpane/forms";

export const BROWSER_HOST: HostInfo = { kind: "browser", reason: "not-in-office", detail: "not running inside Office" };

export function memoryStores(storage = new MemoryStorage()) {
  return {
    storage,
    stores: {
      workbook: new KeyValueLayerStore("workbook", WHERE.workbookSimulated, storage, STORAGE_KEYS.workbookSimulated),
      personal: new KeyValueLayerStore("personal", WHERE.personal, storage, STORAGE_KEYS.personal),
    },
  };
}

export async function freshController(storage = new MemoryStorage()): Promise<{ ctl: PaneController; storage: MemoryStorage }> {
  resetActiveLibrary();
  const { stores } = memoryStores(storage);
  const ctl = new PaneController(BROWSER_HOST, stores);
  await ctl.init();
  return { ctl, storage };
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
