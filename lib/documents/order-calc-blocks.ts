import { getOrThrow } from '../collections/get-or-throw';
import { blockName, isRef, type CalcBlockAttrs } from './calc-nodes';

export interface BlockOrder {
  /** Block ids in an order where every block comes after the blocks it reads from. */
  order: string[];
  /** Blocks that take part in a reference cycle (or depend on one), with a message naming the cycle. */
  cyclic: Map<string, string>;
  /** References to blocks that do not exist: blockId → message. */
  missing: Map<string, string>;
  /** The blocks each block reads from (existing blocks only): blockId → their ids. */
  dependsOn: Map<string, ReadonlySet<string>>;
}

/**
 * Dependency order of a memo's calc blocks (Kahn's topological sort; Kahn,
 * "Topological sorting of large networks", CACM 5(11), 1962). Ties keep
 * document order. A cycle is refused: every block on it, and every block
 * downstream of it, gets a message naming the blocks of the cycle.
 */
export function orderCalcBlocks(blocks: readonly CalcBlockAttrs[]): BlockOrder {
  const byId = new Map(blocks.map((b) => [b.blockId, b]));
  const deps = new Map<string, Set<string>>();
  const missing = new Map<string, string>();
  for (const b of blocks) {
    const set = new Set<string>();
    for (const [field, entry] of Object.entries(b.inputs)) {
      if (!isRef(entry)) continue;
      if (!byId.has(entry.ref.blockId)) {
        missing.set(b.blockId, `input ${field} refers to a block that is no longer in the memo (${entry.ref.blockId})`);
        continue;
      }
      set.add(entry.ref.blockId);
    }
    deps.set(b.blockId, set);
  }

  const indegree = new Map(blocks.map((b) => [b.blockId, getOrThrow(deps, b.blockId, 'dependencies of block').size]));
  const dependents = new Map<string, string[]>(blocks.map((b) => [b.blockId, []]));
  for (const [id, set] of deps) for (const d of set) getOrThrow(dependents, d, 'dependents of block').push(id);

  const order: string[] = [];
  const ready = blocks.filter((b) => indegree.get(b.blockId) === 0).map((b) => b.blockId);
  const position = new Map(blocks.map((b, i) => [b.blockId, i]));
  while (ready.length > 0) {
    ready.sort((a, b) => getOrThrow(position, a, 'position of block') - getOrThrow(position, b, 'position of block'));
    const id = ready.shift();
    if (id === undefined) break;
    order.push(id);
    for (const next of getOrThrow(dependents, id, 'dependents of block')) {
      const n = getOrThrow(indegree, next, 'indegree of block') - 1;
      indegree.set(next, n);
      if (n === 0) ready.push(next);
    }
  }

  const cyclic = new Map<string, string>();
  const left = blocks.filter((b) => !order.includes(b.blockId));
  if (left.length > 0) {
    for (const cycle of findCycles(
      left.map((b) => b.blockId),
      deps,
    )) {
      const names = cycle.map((id) => blockName(getOrThrow(byId, id, 'block')));
      const message = `reference cycle: ${[...names, names[0]].join(' → ')}; break one of these references`;
      for (const id of cycle) cyclic.set(id, message);
    }
    // Blocks downstream of a cycle cannot be computed either.
    for (const b of left) {
      if (!cyclic.has(b.blockId)) {
        const upstream = [...getOrThrow(deps, b.blockId, 'dependencies of block')].find(
          (d) => cyclic.has(d) || !order.includes(d),
        );
        cyclic.set(
          b.blockId,
          `waits on ${upstream ? blockName(getOrThrow(byId, upstream, 'block')) : 'a block'}, which is part of a reference cycle`,
        );
      }
    }
  }
  return { order, cyclic, missing, dependsOn: deps };
}

/**
 * Groups of blocks that reference each other in a cycle: the strongly
 * connected components with more than one block, or a block that reads
 * itself (Tarjan, "Depth-first search and linear graph algorithms",
 * SIAM J. Comput. 1(2), 1972).
 */
function findCycles(nodes: string[], deps: Map<string, Set<string>>): string[][] {
  const inSet = new Set(nodes);
  let counter = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const groups: string[][] = [];
  const strongConnect = (v: string) => {
    index.set(v, counter);
    low.set(v, counter);
    counter++;
    stack.push(v);
    onStack.add(v);
    for (const w of deps.get(v) ?? []) {
      if (!inSet.has(w)) continue;
      if (!index.has(w)) {
        strongConnect(w);
        low.set(v, Math.min(getOrThrow(low, v, 'lowlink of block'), getOrThrow(low, w, 'lowlink of block')));
      } else if (onStack.has(w)) {
        low.set(v, Math.min(getOrThrow(low, v, 'lowlink of block'), getOrThrow(index, w, 'index of block')));
      }
    }
    if (low.get(v) === index.get(v)) {
      const group: string[] = [];
      for (;;) {
        const w = stack.pop();
        if (w === undefined) break;
        onStack.delete(w);
        group.push(w);
        if (w === v) break;
      }
      if (group.length > 1 || deps.get(v)?.has(v)) groups.push(group.reverse());
    }
  };
  for (const n of nodes) if (!index.has(n)) strongConnect(n);
  const order = new Map(nodes.map((n, i) => [n, i]));
  return groups.map((g) =>
    g.sort((a, b) => getOrThrow(order, a, 'position of block') - getOrThrow(order, b, 'position of block')),
  );
}
