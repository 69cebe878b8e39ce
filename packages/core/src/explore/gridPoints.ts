/**
 * The points of a sweep grid: every combination of the axes' values, in row-major order
 * (the first axis varies slowest, the last fastest). Point i has coordinates
 * values_k[(i / Π_{j>k} n_j) mod n_k].
 */
export interface GridPoint {
  index: number;
  values: number[];
}

export function gridPoints(axes: readonly { values: readonly number[] }[]): GridPoint[] {
  const sizes = axes.map((a) => a.values.length);
  const total = sizes.reduce((p, n) => p * n, 1);
  const out: GridPoint[] = [];
  for (let index = 0; index < total; index++) {
    const values: number[] = new Array(axes.length);
    let rest = index;
    for (let k = axes.length - 1; k >= 0; k--) {
      values[k] = axes[k]!.values[rest % sizes[k]!]!;
      rest = Math.floor(rest / sizes[k]!);
    }
    out.push({ index, values });
  }
  return out;
}
