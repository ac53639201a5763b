/**
 * Directed-graph algorithms over nodes 0..n-1 in compressed sparse row form. Everything is iterative (a
 * 20,000-check procedure can be a 20,000-deep chain) and runs in near-linear time.
 */
export interface Graph {
  nodeCount: number;
  /** Edges of node v are targets[offsets[v] .. offsets[v + 1]). */
  offsets: Int32Array;
  targets: Int32Array;
}

/** Build from parallel edge arrays (counting sort, O(n + m)). */
export function buildGraph(nodeCount: number, from: ArrayLike<number>, to: ArrayLike<number>): Graph {
  const offsets = new Int32Array(nodeCount + 1);
  for (let e = 0; e < from.length; e++) offsets[from[e] + 1]++;
  for (let v = 0; v < nodeCount; v++) offsets[v + 1] += offsets[v];
  const fill = offsets.slice(0, nodeCount);
  const targets = new Int32Array(from.length);
  for (let e = 0; e < from.length; e++) targets[fill[from[e]]++] = to[e];
  return { nodeCount, offsets, targets };
}

function reverseGraph(g: Graph): Graph {
  const from = new Int32Array(g.targets.length);
  for (let v = 0; v < g.nodeCount; v++) for (let e = g.offsets[v]; e < g.offsets[v + 1]; e++) from[e] = v;
  return buildGraph(g.nodeCount, g.targets, from);
}

/** 1 for every node reachable from `start`. */
export function reachableFrom(g: Graph, start: number): Uint8Array {
  const seen = new Uint8Array(g.nodeCount);
  const stack = new Int32Array(g.nodeCount);
  let top = 0;
  seen[start] = 1;
  stack[top++] = start;
  while (top > 0) {
    const v = stack[--top];
    for (let e = g.offsets[v]; e < g.offsets[v + 1]; e++) {
      const w = g.targets[e];
      if (seen[w] === 0) {
        seen[w] = 1;
        stack[top++] = w;
      }
    }
  }
  return seen;
}

/**
 * Immediate dominators from `root` (Lengauer–Tarjan with path compression, O(m log n)). idom[root] = root;
 * -1 for nodes not reachable from root.
 */
export function immediateDominators(g: Graph, root: number): Int32Array {
  const n = g.nodeCount;
  const preds = reverseGraph(g);
  const dfnum = new Int32Array(n).fill(-1);
  const vertex = new Int32Array(n);
  const parent = new Int32Array(n).fill(-1);
  let count = 0;

  // Depth-first numbering with an explicit stack of (node, next edge).
  const stackNode = new Int32Array(n);
  const stackEdge = new Int32Array(n);
  let top = 0;
  dfnum[root] = count;
  vertex[count++] = root;
  stackNode[top] = root;
  stackEdge[top++] = g.offsets[root];
  while (top > 0) {
    const v = stackNode[top - 1];
    const e = stackEdge[top - 1];
    if (e === g.offsets[v + 1]) {
      top--;
      continue;
    }
    stackEdge[top - 1] = e + 1;
    const w = g.targets[e];
    if (dfnum[w] === -1) {
      dfnum[w] = count;
      vertex[count++] = w;
      parent[w] = v;
      stackNode[top] = w;
      stackEdge[top++] = g.offsets[w];
    }
  }

  const semi = new Int32Array(n); // as a DFS number
  const ancestor = new Int32Array(n).fill(-1);
  const label = new Int32Array(n);
  const idom = new Int32Array(n).fill(-1);
  const bucketHead = new Int32Array(n).fill(-1);
  const bucketNext = new Int32Array(n).fill(-1);
  const path = new Int32Array(n);
  for (let v = 0; v < n; v++) {
    semi[v] = dfnum[v];
    label[v] = v;
  }

  const evaluate = (v: number): number => {
    if (ancestor[v] === -1) return v;
    // Path compression, iteratively: collect the chain, then fold labels from the top down.
    let depth = 0;
    let x = v;
    while (ancestor[ancestor[x]] !== -1) {
      path[depth++] = x;
      x = ancestor[x];
    }
    while (depth > 0) {
      const y = path[--depth];
      const a = ancestor[y];
      if (semi[label[a]] < semi[label[y]]) label[y] = label[a];
      ancestor[y] = ancestor[a];
    }
    return label[v];
  };

  for (let i = count - 1; i >= 1; i--) {
    const w = vertex[i];
    for (let e = preds.offsets[w]; e < preds.offsets[w + 1]; e++) {
      const v = preds.targets[e];
      if (dfnum[v] === -1) continue;
      const u = evaluate(v);
      if (semi[u] < semi[w]) semi[w] = semi[u];
    }
    const s = vertex[semi[w]];
    bucketNext[w] = bucketHead[s];
    bucketHead[s] = w;
    const p = parent[w];
    ancestor[w] = p;
    for (let v = bucketHead[p]; v !== -1; v = bucketNext[v]) {
      const u = evaluate(v);
      idom[v] = semi[u] < semi[v] ? u : p;
    }
    bucketHead[p] = -1;
  }
  for (let i = 1; i < count; i++) {
    const w = vertex[i];
    if (idom[w] !== vertex[semi[w]]) idom[w] = idom[idom[w]];
  }
  idom[root] = root;
  return idom;
}

/**
 * Answers "does a dominate b" in O(1) from pre/post numbers of the dominator tree.
 * Nodes with idom -1 (unreachable) dominate nothing and are dominated by nothing.
 */
export function dominanceQuery(idom: Int32Array, root: number): (a: number, b: number) => boolean {
  const n = idom.length;
  const childFrom = new Int32Array(n);
  const childTo = new Int32Array(n);
  let children = 0;
  for (let v = 0; v < n; v++) {
    if (v !== root && idom[v] !== -1) {
      childFrom[children] = idom[v];
      childTo[children++] = v;
    }
  }
  const tree = buildGraph(n, childFrom.subarray(0, children), childTo.subarray(0, children));
  const enter = new Int32Array(n).fill(-1);
  const exit = new Int32Array(n).fill(-1);
  const stackNode = new Int32Array(n);
  const stackEdge = new Int32Array(n);
  let clock = 0;
  let top = 0;
  enter[root] = clock++;
  stackNode[top] = root;
  stackEdge[top++] = tree.offsets[root];
  while (top > 0) {
    const v = stackNode[top - 1];
    const e = stackEdge[top - 1];
    if (e === tree.offsets[v + 1]) {
      exit[v] = clock++;
      top--;
      continue;
    }
    stackEdge[top - 1] = e + 1;
    const w = tree.targets[e];
    enter[w] = clock++;
    stackNode[top] = w;
    stackEdge[top++] = tree.offsets[w];
  }
  return (a, b) => enter[a] !== -1 && enter[b] !== -1 && enter[a] <= enter[b] && exit[b] <= exit[a];
}

/**
 * Strongly connected components (Tarjan, iterative). Returns each node's component id; ids are assigned in
 * reverse topological order of the condensation.
 */
export function stronglyConnectedComponents(g: Graph): { component: Int32Array; count: number } {
  const n = g.nodeCount;
  const index = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const onStack = new Uint8Array(n);
  const component = new Int32Array(n).fill(-1);
  const sccStack = new Int32Array(n);
  const callNode = new Int32Array(n);
  const callEdge = new Int32Array(n);
  let sccTop = 0;
  let counter = 0;
  let count = 0;
  for (let s = 0; s < n; s++) {
    if (index[s] !== -1) continue;
    let top = 0;
    index[s] = low[s] = counter++;
    sccStack[sccTop++] = s;
    onStack[s] = 1;
    callNode[top] = s;
    callEdge[top++] = g.offsets[s];
    while (top > 0) {
      const v = callNode[top - 1];
      const e = callEdge[top - 1];
      if (e < g.offsets[v + 1]) {
        callEdge[top - 1] = e + 1;
        const w = g.targets[e];
        if (index[w] === -1) {
          index[w] = low[w] = counter++;
          sccStack[sccTop++] = w;
          onStack[w] = 1;
          callNode[top] = w;
          callEdge[top++] = g.offsets[w];
        } else if (onStack[w] === 1 && index[w] < low[v]) {
          low[v] = index[w];
        }
        continue;
      }
      top--;
      if (top > 0) {
        const parent = callNode[top - 1];
        if (low[v] < low[parent]) low[parent] = low[v];
      }
      if (low[v] === index[v]) {
        let w: number;
        do {
          w = sccStack[--sccTop];
          onStack[w] = 0;
          component[w] = count;
        } while (w !== v);
        count++;
      }
    }
  }
  return { component, count };
}
