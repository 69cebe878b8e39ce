import { describe, expect, it } from 'vitest';
import { gridPoints } from './gridPoints.js';

describe('gridPoints(axes)', () => {
  it('lists every combination once, first axis slowest', () => {
    const pts = gridPoints([{ values: [1, 2] }, { values: [10, 20, 30] }]);
    expect(pts.map((p) => p.values)).toEqual([
      [1, 10], [1, 20], [1, 30],
      [2, 10], [2, 20], [2, 30],
    ]);
    expect(pts.map((p) => p.index)).toEqual([0, 1, 2, 3, 4, 5]);
  });

  it('handles one and three axes', () => {
    expect(gridPoints([{ values: [5, 6] }]).map((p) => p.values)).toEqual([[5], [6]]);
    const three = gridPoints([{ values: [1, 2] }, { values: [3, 4] }, { values: [5, 6, 7] }]);
    expect(three).toHaveLength(12);
    expect(new Set(three.map((p) => p.values.join(','))).size).toBe(12);
    expect(three[7]!.values).toEqual([2, 3, 6]); // 7 = 1·6 + 0·3 + 1
  });
});
