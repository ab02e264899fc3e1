/**
 * A library in effect: built-in (read-only) ← personal ← workbook (LAYER_ORDER). A higher layer's entry
 * overrides a lower one with the same id; the merged view says where each entry comes from and
 * what it hides. Everything derived (engine objects, the alias index, the fingerprint) is built
 * once per library, so `resolve` is a normalization and a map lookup.
 */
import type { AcidBaseSystem, Component, StrongIon } from "../chem/types";
import { toComponent, toIon, toSystem } from "./components";
import { computeFingerprint } from "./fingerprint";
import { buildAliasIndex } from "./lookup";
import { mergeLayers, type MergedEntry } from "./merge";
import { normalizeName } from "./normalize";
import { closest, type Suggestion } from "./suggest";
import type { EntryKind, LayerName, LibraryDoc, SubstanceRecord, ValidationIssue } from "./types";
import { LAYER_ORDER } from "./types";
import { checkSubstance, checkSystem, worldOf } from "./validate/semantics";
import { childPath } from "./validate/paths";

export type { MergedEntry } from "./merge";

/** A problem of the merged library, located in the layer that causes it. */
export interface LayerIssue extends ValidationIssue {
  layer: LayerName;
  severity: "error" | "warning";
}

export type ResolveResult =
  | { ok: true; component: Component; entry: MergedEntry<SubstanceRecord>; matched: string }
  | { ok: false; code: "empty" | "not-found" | "unusable"; message: string; suggestions: Suggestion[] };

export interface LibraryLayers {
  builtin: LibraryDoc;
  workbook?: LibraryDoc | null;
  personal?: LibraryDoc | null;
}

export interface LayerDocs {
  builtin: LibraryDoc;
  workbook: LibraryDoc | null;
  personal: LibraryDoc | null;
}

export interface Library {
  /** Version of the built-in layer, as in the fingerprint. */
  readonly version: string;
  /** The layer files in effect (frozen copies); null where a layer is empty. */
  readonly layers: Readonly<LayerDocs>;
  /** Broken references and hidden names, by layer. */
  readonly problems: readonly LayerIssue[];
  /** Any alias (case-insensitive, see normalize.ts) → the engine's Component. */
  resolve(name: string): ResolveResult;
  /** The substance entry in effect that a name means (usable or not), or undefined. */
  ownerOf(name: string): MergedEntry<SubstanceRecord> | undefined;
  /** Closest known substances for a name (top `max`, default 3). */
  suggest(name: string, max?: number): Suggestion[];
  /** Entries in effect, of one kind or all, in layer then file order. */
  list(kind?: EntryKind): MergedEntry[];
  /** The entry in effect with this id (default kind: substance). */
  get(id: string, kind?: EntryKind): MergedEntry | undefined;
  /** An acid–base system by id, or by id or name written loosely ("Bis Tris", "PHOSPHATE"). */
  system(idOrName: string): AcidBaseSystem | undefined;
  ion(id: string): StrongIon | undefined;
  /** "PL-1.0.0-3fa9c21b07": the constants in effect. */
  fingerprint(): string;
}

function frozenCopy<T>(doc: T): T {
  const copy = JSON.parse(JSON.stringify(doc)) as T;
  const freeze = (v: unknown): void => {
    if (typeof v === "object" && v !== null) {
      Object.values(v).forEach(freeze);
      Object.freeze(v);
    }
  };
  freeze(copy);
  return copy;
}

function quoteName(name: string): string {
  return name.length > 60 ? `${name.slice(0, 57)}…` : name;
}

export function createLibrary(input: LibraryLayers): Library {
  const layers: LayerDocs = {
    builtin: frozenCopy(input.builtin),
    workbook: input.workbook ? frozenCopy(input.workbook) : null,
    personal: input.personal ? frozenCopy(input.personal) : null,
  };
  Object.freeze(layers);
  const view = mergeLayers(layers);
  const world = worldOf(LAYER_ORDER.map((l) => layers[l]).filter((d): d is LibraryDoc => d !== null));
  const problems: LayerIssue[] = [];

  const systems = new Map<string, AcidBaseSystem>();
  for (const e of view.systems.values()) {
    const issues: ValidationIssue[] = [];
    checkSystem(e.record, childPath("systems", e.index), world, issues);
    issues.forEach((i) => problems.push({ layer: e.layer, severity: "error", path: i.path, message: i.message }));
    systems.set(e.id, toSystem(e.record));
  }
  const systemsByKey = new Map<string, AcidBaseSystem>();
  for (const sys of systems.values()) if (!systemsByKey.has(normalizeName(sys.name))) systemsByKey.set(normalizeName(sys.name), sys);
  for (const sys of systems.values()) systemsByKey.set(normalizeName(sys.id), sys);
  const ions = new Map<string, StrongIon>();
  for (const e of view.ions.values()) ions.set(e.id, toIon(e.record));
  const atomicWeights = new Map([...view.atomicWeights].map(([el, e]) => [el, e.record.value]));

  const components = new Map<string, Component>();
  const unusable = new Map<string, string>();
  for (const e of view.substances.values()) {
    const issues: ValidationIssue[] = [];
    checkSubstance(e.record, childPath("substances", e.index), world, issues);
    issues.forEach((i) => problems.push({ layer: e.layer, severity: "error", path: i.path, message: i.message }));
    const built = toComponent(e.record, systems, ions, atomicWeights);
    if (built.ok && issues.length === 0) components.set(e.id, built.component);
    else unusable.set(e.id, issues.length > 0 ? issues.map((i) => i.message).join("; ") : built.ok ? "" : built.message);
  }

  const index = buildAliasIndex([...view.substances.values()].map((e) => ({ record: e.record, layer: e.layer, index: e.index })));
  problems.push(...index.issues);

  let fingerprintCache: string | undefined;
  const version = layers.builtin.version ?? "0.0.0";
  const kinds: Record<EntryKind, Map<string, MergedEntry>> = {
    source: view.sources,
    atomicWeight: view.atomicWeights,
    system: view.systems,
    ion: view.ions,
    substance: view.substances,
  };

  const suggest = (name: string, max = 3): Suggestion[] => closest(normalizeName(name), index.keys, max);

  const library: Library = {
    version,
    layers,
    problems: Object.freeze(problems),
    resolve(name: string): ResolveResult {
      const key = typeof name === "string" ? normalizeName(name) : "";
      if (key === "") return { ok: false, code: "empty", message: "no substance name given", suggestions: [] };
      const id = index.byKey.get(key);
      if (id === undefined) {
        const suggestions = suggest(name);
        const hint = suggestions.length ? ` Did you mean ${suggestions.map((s) => `'${s.name}'`).join(", ")}?` : "";
        return { ok: false, code: "not-found", message: `Unknown substance '${quoteName(name)}'.${hint}`, suggestions };
      }
      const entry = view.substances.get(id) as MergedEntry<SubstanceRecord>;
      const component = components.get(id);
      if (!component) {
        return { ok: false, code: "unusable", message: `'${quoteName(name)}' (${entry.layer} library) cannot be used: ${unusable.get(id)}`, suggestions: [] };
      }
      return { ok: true, component, entry, matched: key };
    },
    ownerOf(name: string): MergedEntry<SubstanceRecord> | undefined {
      const id = typeof name === "string" ? index.byKey.get(normalizeName(name)) : undefined;
      return id === undefined ? undefined : (view.substances.get(id) as MergedEntry<SubstanceRecord>);
    },
    suggest,
    list(kind?: EntryKind): MergedEntry[] {
      const all = kind ? [kinds[kind]] : Object.values(kinds);
      return all.flatMap((m) => [...m.values()]);
    },
    get(id: string, kind: EntryKind = "substance"): MergedEntry | undefined {
      return kinds[kind].get(id);
    },
    system: (idOrName) => systems.get(idOrName) ?? (typeof idOrName === "string" ? systemsByKey.get(normalizeName(idOrName)) : undefined),
    ion: (id) => ions.get(id),
    fingerprint(): string {
      fingerprintCache ??= computeFingerprint({
        version,
        systems: systems.values(),
        ions: ions.values(),
        components: [...components.values()].map((component) => ({ component, keys: index.keysOf.get(component.id) ?? [] })),
        unusable: unusable.keys(),
      });
      return fingerprintCache;
    },
  };
  return Object.freeze(library);
}
