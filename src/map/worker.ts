/**
 * Entry of a map worker thread (bundled to dist/map-worker.js). workerData is the MapJob; each `batch` message
 * lists points to solve in order; each result is posted as soon as it is known (the progress bar counts them),
 * then `batch-done`. A bug (an error that is not a point's own message) is thrown and reaches the main thread as
 * the worker's `error` event.
 */
import { parentPort, workerData } from 'node:worker_threads';
import type { BatchMessage, WorkerMessage } from './messages.js';
import { evaluatePoint, pointContext } from './point.js';
import type { MapJob } from './types.js';

const port = parentPort;
if (port === null) throw new Error('map worker: started outside a worker thread');
const context = pointContext(workerData as MapJob);

port.on('message', (message: BatchMessage) => {
  void (async () => {
    for (const task of message.tasks) {
      const point = await evaluatePoint(context, task.index, task.x, task.y);
      port.postMessage({ type: 'point', point } satisfies WorkerMessage);
    }
    port.postMessage({ type: 'batch-done' } satisfies WorkerMessage);
  })().catch((err: unknown) => {
    // Rethrown outside the promise so that it becomes the worker's uncaught exception (the `error` event).
    setImmediate(() => {
      throw err;
    });
  });
});
