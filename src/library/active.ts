/**
 * The process-wide library in effect, shared by the custom functions and the task pane (they run
 * in one shared runtime). Starts as the built-in library; the pane sets the personal and workbook
 * layers (built-in ← personal ← workbook). A layer that fails validation is never applied: the previous library stays in effect.
 * A layer that could not be loaded (corrupt or newer blob) is recorded as a problem and left empty,
 * so the functions fall back to the layers below it.
 */
import { BUILTIN_LIBRARY } from "./builtin";
import { createLibrary, type Library } from "./layers";
import type { LibraryDoc, ValidationIssue } from "./types";
import { validateLibraryDoc, type ValidationCode } from "./validate";

export type UserLayer = "workbook" | "personal";

/** Why a user layer is empty although something was stored. */
export interface LayerProblem {
  layer: UserLayer;
  code: string;
  message: string;
}

export type SetLayerResult =
  | { ok: true; library: Library }
  | { ok: false; code: ValidationCode; message: string; errors: ValidationIssue[]; lines: string[] };

type Listener = (library: Library) => void;

let active: Library | null = null;
const problems = new Map<UserLayer, LayerProblem>();
const listeners = new Set<Listener>();

/** The library in effect (built-in only until a layer is set). */
export function getActiveLibrary(): Library {
  active ??= createLibrary({ builtin: BUILTIN_LIBRARY });
  return active;
}

function publish(next: Library): void {
  active = next;
  for (const l of [...listeners]) {
    try {
      l(next);
    } catch {
      // A failing listener must not stop the others or the change itself.
    }
  }
}

/**
 * The layers a user layer's references (sources, systems, ions, elements) may point into: the
 * built-in layer only. The workbook library travels with the file and must stand on what every
 * computer has; the personal library is shared by every workbook opened on this computer and must
 * not depend on one of them. A personal entry copied into the workbook takes what it uses with it.
 */
export function referenceContext(_layer: UserLayer): LibraryDoc[] {
  return [getActiveLibrary().layers.builtin];
}

/**
 * Replace a user layer (null empties it). The data is validated first, with references allowed
 * into the other layers; on failure nothing changes. `ignoreReferences` (for stored layers) lets
 * dangling references through: the merged library lists them and marks those entries unusable.
 */
export function setLayer(layer: UserLayer, data: unknown, options: { ignoreReferences?: boolean } = {}): SetLayerResult {
  let doc: LibraryDoc | null = null;
  if (data !== null && data !== undefined) {
    const v = validateLibraryDoc(data, referenceContext(layer), options);
    if (!v.ok) return v;
    doc = v.doc;
  }
  const current = getActiveLibrary();
  const next = createLibrary({
    builtin: current.layers.builtin,
    workbook: layer === "workbook" ? doc : current.layers.workbook,
    personal: layer === "personal" ? doc : current.layers.personal,
  });
  problems.delete(layer);
  publish(next);
  return { ok: true, library: next };
}

/** Empty a layer because its stored data could not be read, and remember why. */
export function reportLayerProblem(problem: LayerProblem): void {
  const current = getActiveLibrary();
  const next = current.layers[problem.layer]
    ? createLibrary({
        builtin: current.layers.builtin,
        workbook: problem.layer === "workbook" ? null : current.layers.workbook,
        personal: problem.layer === "personal" ? null : current.layers.personal,
      })
    : current;
  problems.set(problem.layer, problem);
  publish(next);
}

/** Problems that left a layer empty (for the task pane to show). */
export function getLayerProblems(): LayerProblem[] {
  return [...problems.values()];
}

/** Call `listener` after every change of the active library; returns the unsubscribe function. */
export function onLibraryChange(listener: Listener): () => void {
  listeners.add(listener);
  return () => {
    listeners.delete(listener);
  };
}

/** Back to built-in only, no problems, no listeners (tests, and a full reset from the pane). */
export function resetActiveLibrary(): void {
  active = null;
  problems.clear();
  listeners.clear();
}
