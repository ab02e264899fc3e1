/**
 * Loading and saving a user layer of the active library through a storage adapter. A layer that
 * cannot be read leaves the library on the layers below it and is reported (getLayerProblems); the
 * returned problem carries the raw text so it can be exported before the storage is reset.
 */
import { referenceContext, reportLayerProblem, setLayer, type SetLayerResult, type UserLayer } from "../active";
import type { Library } from "../layers";
import type { LibraryDoc } from "../types";
import { validateLibraryDoc } from "../validate";
import { makeBlob } from "./blob";
import type { LibraryStorage, LoadResult, SaveResult } from "./types";

/** Load `layer` from storage into the active library. */
export async function loadLayer(layer: UserLayer, storage: LibraryStorage): Promise<LoadResult> {
  const loaded = await storage.load();
  if (!loaded.ok) {
    reportLayerProblem({ layer, code: loaded.code, message: loaded.message });
    return loaded;
  }
  const applied = setLayer(layer, loaded.blob?.library ?? null, { ignoreReferences: true });
  if (!applied.ok) {
    const problem: LoadResult = { ok: false, code: "corrupt", message: applied.message, raw: JSON.stringify(loaded.blob) };
    reportLayerProblem({ layer, code: problem.code, message: problem.message });
    return problem;
  }
  return loaded;
}

type Failed<T> = Exclude<T, { ok: true }>;

export type SaveLayerResult =
  | { ok: true; bytes: number; warnings: string[]; library: Library }
  | Failed<SaveResult>
  | Failed<SetLayerResult>;

/**
 * Validate `doc` against the other layers, save it, then make it the active `layer`. Nothing
 * changes (neither storage nor the active library) when validation or saving fails.
 */
export async function saveLayer(layer: UserLayer, doc: LibraryDoc, storage: LibraryStorage, now?: Date): Promise<SaveLayerResult> {
  const checked = validateLibraryDoc(doc, referenceContext(layer));
  if (!checked.ok) return checked;
  const saved = await storage.save(makeBlob(checked.doc, now));
  if (!saved.ok) return saved;
  const applied = setLayer(layer, checked.doc);
  if (!applied.ok) return applied;
  return { ok: true, bytes: saved.bytes, warnings: saved.warnings, library: applied.library };
}
