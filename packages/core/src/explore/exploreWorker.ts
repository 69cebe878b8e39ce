/** Worker-thread entry of what-if runs (runPool.ts): carries out one ExploreTask. */
import { runExploreTask, type ExploreTask } from './exploreTasks.js';

export default function exploreWorker(task: ExploreTask): unknown {
  return runExploreTask(task);
}
