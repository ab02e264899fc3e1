/**
 * Linear-time edges for HyperFormula's dependency graph when one cell feeds thousands of formulas.
 *
 * HyperFormula 3.5 stores the dependents of each vertex in an array and checks it with
 * `Array.prototype.includes` before adding an edge. A what-if table whose every row refers to the
 * same cells (the substance names in `$E$1:$F$1`, a shared temperature in `$H$1`) therefore builds
 * in quadratic time: measured with a function that returns a constant, 5 000 → 40 000 rows went
 * from 0.21 s to 2.7 s (scripts/bench.ts, part b, shows the sheets). This module keeps, beside each
 * array longer than INDEX_FROM entries, a Set of the same ids, and answers the "is this edge already
 * there?" question from it. The arrays themselves are untouched and stay the graph's only data: the
 * Set is an index, kept exact by wrapping the three methods that change an array in place
 * (addEdge, removeEdge, removeEdgeIfExists). An array replaced by a new one (HyperFormula's clean-up
 * of removed vertices) simply has no index until it grows long again.
 *
 * The patch applies only when the graph class has exactly the shape described here (the methods
 * and the `edgesSparseArray` field); otherwise nothing is changed and HyperFormula runs as shipped,
 * correct but quadratic. `edgeIndexInstalled()` says which. test/cli/edge-index.test.ts checks that
 * sheets evaluate to the same values with and without it, and that the index matches the arrays
 * after random additions and removals.
 */
import { HyperFormula } from "hyperformula";

/** Arrays at most this long are searched directly (as fast as a Set for short arrays). */
export const INDEX_FROM = 16;

type NodeRef = number | { idInGraph?: number };

interface GraphLike {
  edgesSparseArray: (number | undefined)[][];
  getNodeIdIfNotNumber(node: NodeRef): number | undefined;
  missingNodeError(node: NodeRef): Error;
  addEdge(from: NodeRef, to: NodeRef): void;
  removeEdge(from: NodeRef, to: NodeRef): void;
  removeEdgeIfExists(from: NodeRef, to: NodeRef): void;
}

type GraphMethods = Pick<GraphLike, "addEdge" | "removeEdge" | "removeEdgeIfExists">;

let index = new WeakMap<(number | undefined)[], Set<number>>();

/** The index of one adjacency array, built when the array first grows past INDEX_FROM. */
function indexOf(edges: (number | undefined)[]): Set<number> | undefined {
  let set = index.get(edges);
  if (set === undefined && edges.length > INDEX_FROM) {
    set = new Set<number>();
    for (const id of edges) if (id !== undefined) set.add(id);
    index.set(edges, set);
  }
  return set;
}

let installed: boolean | null = null;
/** Set by uninstallEdgeIndex: buildEngine's installEdgeIndex() then leaves HyperFormula as shipped. */
let disabled = false;
let original: GraphMethods | null = null;
let prototype: GraphLike | null = null;

/** The prototype of HyperFormula's Graph class, found through an empty engine, or null. */
function graphPrototype(): GraphLike | null {
  const probe = HyperFormula.buildEmpty({ licenseKey: "gpl-v3" });
  try {
    const graph = (probe as unknown as { dependencyGraph?: { graph?: unknown } }).dependencyGraph?.graph as Partial<GraphLike> | undefined;
    if (!graph || !Array.isArray(graph.edgesSparseArray)) return null;
    const proto = Object.getPrototypeOf(graph) as Partial<GraphLike>;
    const methods = ["addEdge", "removeEdge", "removeEdgeIfExists", "getNodeIdIfNotNumber", "missingNodeError"] as const;
    return methods.every((m) => typeof proto[m] === "function") ? (proto as GraphLike) : null;
  } finally {
    probe.destroy();
  }
}

/**
 * Installs the edge index once per process; returns whether it is in place. After
 * uninstallEdgeIndex() it stays out until called with `{ reenable: true }`.
 */
export function installEdgeIndex(opts?: { reenable?: boolean }): boolean {
  if (opts?.reenable) disabled = false;
  if (disabled) return false;
  if (installed !== null) return installed;
  const proto = graphPrototype();
  if (proto === null) {
    installed = false;
    return false;
  }
  prototype = proto;
  original = { addEdge: proto.addEdge, removeEdge: proto.removeEdge, removeEdgeIfExists: proto.removeEdgeIfExists };
  const removeWith = (remove: GraphLike["removeEdge"]) =>
    function (this: GraphLike, from: NodeRef, to: NodeRef): void {
      remove.call(this, from, to); // throws as before when the edge or a vertex is missing
      const fromId = this.getNodeIdIfNotNumber(from);
      const toId = this.getNodeIdIfNotNumber(to);
      if (fromId === undefined || toId === undefined) return;
      const edges = this.edgesSparseArray[fromId];
      // addEdge never stores an id twice, so after the removal toId is no longer in the array.
      if (edges !== undefined) index.get(edges)?.delete(toId);
    };
  proto.addEdge = function (this: GraphLike, from: NodeRef, to: NodeRef): void {
    const fromId = this.getNodeIdIfNotNumber(from);
    const toId = this.getNodeIdIfNotNumber(to);
    if (fromId === undefined) throw this.missingNodeError(from);
    if (toId === undefined) throw this.missingNodeError(to);
    const edges = this.edgesSparseArray[fromId];
    const set = indexOf(edges);
    if (set !== undefined ? set.has(toId) : edges.includes(toId)) return;
    edges.push(toId);
    set?.add(toId);
  };
  proto.removeEdge = removeWith(original.removeEdge);
  proto.removeEdgeIfExists = removeWith(original.removeEdgeIfExists);
  installed = true;
  return true;
}

/** Whether the edge index is in place (null: not tried yet, or taken out). */
export function edgeIndexInstalled(): boolean | null {
  return installed;
}

/**
 * Puts HyperFormula's own methods back, forgets every index and keeps the index out until
 * installEdgeIndex({ reenable: true }) (the tests and the benchmark compare the two; nothing else
 * needs this). Engines built before should not be used afterwards.
 */
export function uninstallEdgeIndex(): void {
  if (prototype !== null && original !== null) Object.assign(prototype, original);
  index = new WeakMap();
  disabled = true;
  installed = null;
  original = null;
  prototype = null;
}

/** The index of an adjacency array, for tests: undefined when the array is short or unindexed. */
export function edgeIndexOf(edges: (number | undefined)[]): ReadonlySet<number> | undefined {
  return index.get(edges);
}
