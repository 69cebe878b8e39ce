import { describe, expect, it } from 'vitest';
import { StepLog } from './step-log.js';

describe('StepLog', () => {
  it('keeps every pushed step (growing past its initial capacity) and returns its start state', () => {
    const log = new StepLog(3, 2);
    for (let k = 0; k < 10; k++) log.push(k, k + 1, k % 3, Float64Array.from([k, 2 * k, 3 * k]));
    expect(log.count).toBe(10);
    expect(log.t0[7]).toBe(7);
    expect(log.t1[7]).toBe(8);
    expect(log.phase[8]).toBe(2);
    expect(Array.from(log.startState(9))).toEqual([9, 18, 27]);
    expect(log.startValue(4, 2)).toBe(12);
  });
});
