/** The physics worker: runs the screens' heavy computations off the main thread (see tasks.ts). */
import { runRequest, type TaskRequest } from './tasks';

self.addEventListener('message', (event: MessageEvent<TaskRequest>) => {
  self.postMessage(runRequest(event.data));
});
