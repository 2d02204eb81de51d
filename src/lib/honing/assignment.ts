/** Bipartite helpers for matchPistons: rows are bores, columns are pistons. */

/** Size of a maximum matching using only allowed[r][c] edges (Kuhn's augmenting paths). */
export function maximumMatching(allowed: boolean[][], columns: number): { size: number; columnOfRow: number[] } {
  const rowOfColumn = new Array<number>(columns).fill(-1);
  const tryRow = (r: number, seen: boolean[]): boolean => {
    const row = allowed[r]!;
    for (let c = 0; c < columns; c++) {
      if (!row[c] || seen[c]) continue;
      seen[c] = true;
      const owner = rowOfColumn[c]!;
      if (owner === -1 || tryRow(owner, seen)) {
        rowOfColumn[c] = r;
        return true;
      }
    }
    return false;
  };
  let size = 0;
  for (let r = 0; r < allowed.length; r++) if (tryRow(r, new Array<boolean>(columns).fill(false))) size++;
  const columnOfRow = new Array<number>(allowed.length).fill(-1);
  rowOfColumn.forEach((r, c) => {
    if (r >= 0) columnOfRow[r] = c;
  });
  return { size, columnOfRow };
}

/**
 * Minimum-cost assignment of every row to a distinct column (rows ≤ columns), Hungarian
 * algorithm with potentials, O(rows² · columns). Returns the column of each row.
 */
export function hungarian(cost: number[][], columns: number): number[] {
  const n = cost.length;
  const INF = Number.POSITIVE_INFINITY;
  const u = new Array<number>(n + 1).fill(0);
  const v = new Array<number>(columns + 1).fill(0);
  const p = new Array<number>(columns + 1).fill(0);
  const way = new Array<number>(columns + 1).fill(0);
  for (let i = 1; i <= n; i++) {
    p[0] = i;
    let j0 = 0;
    const minv = new Array<number>(columns + 1).fill(INF);
    const used = new Array<boolean>(columns + 1).fill(false);
    do {
      used[j0] = true;
      const i0 = p[j0]!;
      let delta = INF;
      let j1 = 0;
      for (let j = 1; j <= columns; j++) {
        if (used[j]) continue;
        const cur = cost[i0 - 1]![j - 1]! - u[i0]! - v[j]!;
        if (cur < minv[j]!) [minv[j], way[j]] = [cur, j0];
        if (minv[j]! < delta) [delta, j1] = [minv[j]!, j];
      }
      for (let j = 0; j <= columns; j++) {
        if (used[j]) {
          u[p[j]!]! += delta;
          v[j]! -= delta;
        } else minv[j]! -= delta;
      }
      j0 = j1;
    } while (p[j0] !== 0);
    do {
      const j1 = way[j0]!;
      p[j0] = p[j1]!;
      j0 = j1;
    } while (j0 !== 0);
  }
  const columnOfRow = new Array<number>(n).fill(-1);
  for (let j = 1; j <= columns; j++) if (p[j]! > 0) columnOfRow[p[j]! - 1] = j - 1;
  return columnOfRow;
}
