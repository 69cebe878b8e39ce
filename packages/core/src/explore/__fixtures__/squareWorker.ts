/** Test fixture for runPool: a worker module (default export) written in TypeScript. */
import { threadId } from 'node:worker_threads';
import { squareKernel } from './squareKernel.js';

export default function squareWorker(task: { x: number; busy_ms: number }): { square: number; thread: number } {
  return { square: squareKernel(task.x, task.busy_ms), thread: threadId };
}
