/**
 * Joint numbering that keeps the stiffness matrix narrowly banded: reverse Cuthill–McKee
 * (Cuthill & McKee 1969) over the joint graph, started from a peripheral joint.
 */

/**
 * Order joints for a narrow band.
 * @returns order[p] = joint placed at position p
 */
export function bandOrder(nJoints: number, from: Int32Array, to: Int32Array): Int32Array {
  const adj: number[][] = Array.from({ length: nJoints }, () => []);
  for (let e = 0; e < from.length; e++) {
    adj[from[e]].push(to[e]);
    adj[to[e]].push(from[e]);
  }
  const degree = adj.map((a) => a.length);
  const seen = new Uint8Array(nJoints);
  const order: number[] = [];
  const bfs = (start: number): number[] => {
    const level: number[] = [start];
    const mark = new Uint8Array(nJoints);
    mark[start] = 1;
    for (let h = 0; h < level.length; h++) {
      for (const nb of adj[level[h]]) if (!mark[nb] && !seen[nb]) {
        mark[nb] = 1;
        level.push(nb);
      }
    }
    return level;
  };
  while (order.length < nJoints) {
    // Start each component at a low-degree joint far from its first unvisited joint (pseudo-peripheral).
    let start = -1;
    for (let i = 0; i < nJoints; i++) if (!seen[i] && (start < 0 || degree[i] < degree[start] || (degree[i] === degree[start] && i < start))) start = i;
    const reach = bfs(start);
    const far = reach[reach.length - 1];
    start = degree[far] <= degree[start] ? far : start;
    const queue: number[] = [start];
    seen[start] = 1;
    for (let h = 0; h < queue.length; h++) {
      const nbs = adj[queue[h]].filter((nb) => !seen[nb]).sort((a, b) => degree[a] - degree[b] || a - b);
      for (const nb of nbs) if (!seen[nb]) {
        seen[nb] = 1;
        queue.push(nb);
      }
    }
    order.push(...queue);
  }
  order.reverse();
  return Int32Array.from(order);
}
