import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildGraph, dominanceQuery, immediateDominators, reachableFrom, stronglyConnectedComponents, type Graph } from '@shared/engine/graph';

const randomGraph = fc.integer({ min: 1, max: 12 }).chain((n) =>
  fc.tuple(fc.constant(n), fc.array(fc.tuple(fc.nat(n - 1), fc.nat(n - 1)), { maxLength: n * 3 })),
);

function graphOf(n: number, edges: [number, number][]): Graph {
  return buildGraph(
    n,
    edges.map((e) => e[0]),
    edges.map((e) => e[1]),
  );
}

/** Reachability from `start` with `removed` deleted (brute force). */
function reachableWithout(g: Graph, start: number, removed: number): boolean[] {
  const seen = new Array<boolean>(g.nodeCount).fill(false);
  if (start === removed) return seen;
  const stack = [start];
  seen[start] = true;
  while (stack.length > 0) {
    const v = stack.pop()!;
    for (let e = g.offsets[v]; e < g.offsets[v + 1]; e++) {
      const w = g.targets[e];
      if (w !== removed && !seen[w]) {
        seen[w] = true;
        stack.push(w);
      }
    }
  }
  return seen;
}

describe('graph algorithms', () => {
  it('buildGraph keeps every edge under its source', () => {
    const g = graphOf(3, [[2, 0], [0, 1], [2, 1], [0, 2]]);
    expect([...g.offsets]).toEqual([0, 2, 2, 4]);
    expect([...g.targets.slice(0, 2)].sort()).toEqual([1, 2]);
    expect([...g.targets.slice(2)].sort()).toEqual([0, 1]);
  });

  it('dominators agree with the definition: a dominates b iff removing a cuts b off from the root', () => {
    fc.assert(
      fc.property(randomGraph, ([n, edges]) => {
        const g = graphOf(n, edges);
        const reach = reachableFrom(g, 0);
        const dominates = dominanceQuery(immediateDominators(g, 0), 0);
        for (let a = 0; a < n; a++) {
          const cut = reachableWithout(g, 0, a);
          for (let b = 0; b < n; b++) {
            const expected = reach[a] === 1 && reach[b] === 1 && (a === b || !cut[b]);
            if (dominates(a, b) !== expected) return false;
          }
        }
        return true;
      }),
      { numRuns: 500 },
    );
  });

  it('immediate dominators on a diamond with a loop', () => {
    // 0 → 1, 0 → 2, 1 → 3, 2 → 3, 3 → 1, 3 → 4
    const idom = immediateDominators(graphOf(5, [[0, 1], [0, 2], [1, 3], [2, 3], [3, 1], [3, 4]]), 0);
    expect([...idom]).toEqual([0, 0, 0, 0, 3]);
  });

  it('handles a 100,000-deep chain without recursion', () => {
    const n = 100_000;
    const from = Array.from({ length: n - 1 }, (_, i) => i);
    const g = buildGraph(n, from, from.map((i) => i + 1));
    const idom = immediateDominators(g, 0);
    expect(idom[n - 1]).toBe(n - 2);
    expect(dominanceQuery(idom, 0)(0, n - 1)).toBe(true);
    expect(stronglyConnectedComponents(g).count).toBe(n);
  });

  it('strongly connected components: same component iff each reaches the other', () => {
    fc.assert(
      fc.property(randomGraph, ([n, edges]) => {
        const g = graphOf(n, edges);
        const { component } = stronglyConnectedComponents(g);
        const reaches = Array.from({ length: n }, (_, v) => reachableFrom(g, v));
        for (let a = 0; a < n; a++) {
          for (let b = 0; b < n; b++) {
            if ((component[a] === component[b]) !== (reaches[a][b] === 1 && reaches[b][a] === 1)) return false;
          }
        }
        return true;
      }),
      { numRuns: 500 },
    );
  });
});
