/**
 * A fix for the formula engine's dependency graph when one cell feeds many formulas.
 *
 * HyperFormula 3.5.0 keeps the edges out of a cell as a plain array and looks an edge up
 * with `includes` / `indexOf` (adding, finding and removing an edge) and counts the live
 * edges by filtering the whole array (`adjacentNodesCount`). A cell that 40,000 formulas
 * read (a common input such as `$E$1`) makes pasting those formulas, and removing them
 * again (undo), cost time growing with the square of their number: 22 s to undo such a
 * paste, where the same paste without the common input undoes in 0.6 s.
 *
 * The graph's methods are patched once, on its prototype, to keep beside each long edge
 * array an index from target to position, so these lookups are constant time. The arrays
 * themselves are unchanged (the engine's topological sort reads them as before); short
 * arrays keep the engine's own code. `adjacentNodesCount` is only ever compared with 0 by
 * the engine (DependencyGraph.ts, the two callers), so for long arrays it answers whether a
 * live edge exists (1 or 0) instead of counting them all.
 *
 * The engine is pinned (package.json); test/preview/graph-index.test.ts checks results with
 * a shared input against the unpatched arithmetic and that the patch is in place.
 */
import type { HyperFormula } from 'hyperformula';

type NodeId = number;
interface GraphInternals {
  edgesSparseArray: (NodeId | undefined)[][];
  nodesSparseArray: unknown[];
  getNodeIdIfNotNumber(node: unknown): NodeId | undefined;
  missingNodeError(node: unknown): Error;
  fixEdgesArrayForNode(id: NodeId): NodeId[];
  addEdge(from: unknown, to: unknown): void;
  removeEdge(from: unknown, to: unknown): void;
  removeEdgeIfExists(from: unknown, to: unknown): void;
  existsEdge(from: { idInGraph?: NodeId }, to: { idInGraph?: NodeId }): boolean;
  adjacentNodesCount(node: { idInGraph?: NodeId }): number;
}

/** Arrays shorter than this keep the engine's own linear lookups. */
const SHORT = 24;

/** Edge array → (target node id → its position in the array). */
const positions = new WeakMap<(NodeId | undefined)[], Map<NodeId, number>>();
const patched = new WeakSet<object>();

function indexFor(edges: (NodeId | undefined)[], build: boolean): Map<NodeId, number> | undefined {
  let index = positions.get(edges);
  if (index || !build) return index;
  index = new Map();
  for (let i = 0; i < edges.length; i++) {
    const id = edges[i];
    if (id !== undefined) index.set(id, i);
  }
  positions.set(edges, index);
  return index;
}

/** True once the engine's graph has the index (for tests). */
export function graphIsIndexed(hf: HyperFormula): boolean {
  const graph = (hf as unknown as { dependencyGraph?: { graph?: object } }).dependencyGraph?.graph;
  return graph !== undefined && patched.has(Object.getPrototypeOf(graph) as object);
}

/** Patches the graph class behind `hf` (once for all engines). Leaves it alone if it is not the expected shape. */
export function indexDependencyGraph(hf: HyperFormula): void {
  const graph = (hf as unknown as { dependencyGraph?: { graph?: GraphInternals } }).dependencyGraph?.graph;
  if (!graph) return;
  const proto = Object.getPrototypeOf(graph) as GraphInternals;
  if (patched.has(proto)) return;
  const expected = ['addEdge', 'removeEdge', 'removeEdgeIfExists', 'existsEdge', 'adjacentNodesCount', 'fixEdgesArrayForNode', 'getNodeIdIfNotNumber', 'missingNodeError'] as const;
  if (!expected.every((m) => typeof proto[m] === 'function') || !Array.isArray(graph.edgesSparseArray)) return;
  const original = {
    addEdge: proto.addEdge,
    removeEdge: proto.removeEdge,
    removeEdgeIfExists: proto.removeEdgeIfExists,
    existsEdge: proto.existsEdge,
    adjacentNodesCount: proto.adjacentNodesCount,
  };

  proto.addEdge = function (this: GraphInternals, fromNode, toNode) {
    const fromId = this.getNodeIdIfNotNumber(fromNode);
    const toId = this.getNodeIdIfNotNumber(toNode);
    if (fromId === undefined || toId === undefined) return original.addEdge.call(this, fromNode, toNode);
    const edges = this.edgesSparseArray[fromId];
    const index = indexFor(edges, edges.length >= SHORT);
    if (!index) return original.addEdge.call(this, fromNode, toNode);
    if (index.has(toId)) return;
    edges.push(toId);
    index.set(toId, edges.length - 1);
  };

  const remove = (strict: boolean) =>
    function (this: GraphInternals, fromNode: unknown, toNode: unknown) {
      const fromId = this.getNodeIdIfNotNumber(fromNode);
      const toId = this.getNodeIdIfNotNumber(toNode);
      const fallback = strict ? original.removeEdge : original.removeEdgeIfExists;
      if (fromId === undefined || toId === undefined) return fallback.call(this, fromNode, toNode);
      const edges = this.edgesSparseArray[fromId];
      const index = indexFor(edges, edges.length >= SHORT);
      if (!index) return fallback.call(this, fromNode, toNode);
      const at = index.get(toId);
      if (at === undefined) {
        if (strict) throw new Error('Edge does not exist');
        return;
      }
      delete edges[at];
      index.delete(toId);
    };
  proto.removeEdge = remove(true);
  proto.removeEdgeIfExists = remove(false);

  proto.existsEdge = function (this: GraphInternals, fromNode, toNode) {
    const fromId = fromNode.idInGraph;
    const toId = toNode.idInGraph;
    if (fromId === undefined || toId === undefined) return false;
    const index = indexFor(this.edgesSparseArray[fromId], false);
    return index ? index.has(toId) : original.existsEdge.call(this, fromNode, toNode);
  };

  proto.adjacentNodesCount = function (this: GraphInternals, node) {
    const id = node.idInGraph;
    if (id === undefined) return original.adjacentNodesCount.call(this, node);
    const edges = this.edgesSparseArray[id];
    const index = indexFor(edges, false);
    if (!index) return original.adjacentNodesCount.call(this, node);
    for (const target of index.keys()) if (this.nodesSparseArray[target]) return 1;
    return 0;
  };
  patched.add(proto);
}
