import { describe, expect, it } from 'vitest';
import { resolveWorkerFile, runPool } from './runPool.js';
import squareWorker from './__fixtures__/squareWorker.js';

const workerFile = resolveWorkerFile(new URL('./__fixtures__/', import.meta.url).href, 'squareWorker');

describe('runPool(tasks, options)', () => {
  it('runs a TypeScript worker on two threads and keeps results in task order', async () => {
    const tasks = Array.from({ length: 16 }, (_, i) => ({ x: i, busy_ms: 15 }));
    const run = await runPool<{ x: number }, { square: number; thread: number }>(tasks, { threads: 2, workerFile });
    expect(run.interrupted).toBe(false);
    expect(run.completed).toBe(16);
    expect(run.outcomes.map((o) => (o?.ok ? o.value.square : NaN))).toEqual(tasks.map((t) => t.x * t.x));
    const threads = new Set(run.outcomes.map((o) => (o?.ok ? o.value.thread : -1)));
    expect(threads.size).toBe(2);
    expect(threads.has(0)).toBe(false); // not the main thread
  });

  it('loads the TypeScript worker through tsx in each thread when not bundled', async () => {
    const tasks = [{ x: 3, busy_ms: 0 }, { x: 4, busy_ms: 0 }];
    const run = await runPool<unknown, { square: number }>(tasks, { threads: 1, workerFile, bundle: false });
    expect(run.outcomes.map((o) => (o?.ok ? o.value.square : NaN))).toEqual([9, 16]);
  });

  it('gives the same results in this thread (threads = 0) as on workers', async () => {
    const tasks = Array.from({ length: 6 }, (_, i) => ({ x: i - 0.5, busy_ms: 0 }));
    const pooled = await runPool(tasks, { threads: 1, workerFile });
    const local = await runPool(tasks, { threads: 0, inThread: (t) => squareWorker(t as { x: number; busy_ms: number }) });
    const squares = (r: typeof pooled) => r.outcomes.map((o) => (o?.ok ? (o.value as { square: number }).square : o?.error));
    expect(squares(local)).toEqual(squares(pooled));
  });

  it('records a failing task as an error and runs the others', async () => {
    const tasks = [{ x: 2, busy_ms: 0 }, { x: -1, busy_ms: 0 }, { x: 3, busy_ms: 0 }];
    const run = await runPool<unknown, { square: number }>(tasks, { threads: 1, workerFile });
    expect(run.outcomes[0]).toMatchObject({ ok: true, value: { square: 4 } });
    expect(run.outcomes[1]).toMatchObject({ ok: false });
    expect(run.outcomes[1]!.ok ? '' : run.outcomes[1]!.error).toMatch(/negative input -1/);
    expect(run.outcomes[2]).toMatchObject({ ok: true, value: { square: 9 } });
  });

  it('stops starting tasks when the signal aborts and keeps those done', async () => {
    const tasks = Array.from({ length: 40 }, (_, i) => ({ x: i, busy_ms: 20 }));
    const controller = new AbortController();
    const run = await runPool(tasks, {
      threads: 2,
      workerFile,
      signal: controller.signal,
      onProgress: (done) => {
        if (done === 4) controller.abort();
      },
    });
    expect(run.interrupted).toBe(true);
    expect(run.completed).toBeGreaterThanOrEqual(4);
    expect(run.completed).toBeLessThanOrEqual(4 + 4); // at most the in-flight window (2·threads) more
    const done = run.outcomes.filter((o) => o !== undefined);
    expect(done.length).toBe(run.completed);
    expect(done.every((o) => o!.ok)).toBe(true);
  });

  it('reports a worker module that cannot be loaded as task errors, without hanging', async () => {
    const missing = new URL('./__fixtures__/noSuchWorker.ts', import.meta.url);
    const run = await runPool([1, 2], { threads: 1, workerFile: missing });
    expect(run.completed).toBe(2);
    expect(run.outcomes.every((o) => o && !o.ok)).toBe(true);
  });

  it('stops in this thread too', async () => {
    const controller = new AbortController();
    const run = await runPool(Array.from({ length: 100 }, (_, i) => i), {
      threads: 0,
      inThread: (i) => i,
      signal: controller.signal,
      onProgress: (done) => done === 10 && controller.abort(),
    });
    expect(run).toMatchObject({ completed: 10, interrupted: true });
  });
});
