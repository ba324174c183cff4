/**
 * Entry of the fd-3d worker thread of a heat-sink check (bundled to dist/sink-worker.js; sink-lanes.ts starts it).
 * workerData is the case; each message is one task (sink-lane-tasks.ts), run in the order received, answered
 * with its outcome, or with `ok: false` when it failed (the main thread then runs it itself and reports its error).
 */
import { parentPort, workerData } from 'node:worker_threads';
import type { HeatSinkCase } from '../../case/index.js';
import { SinkLaneState } from './sink-lane-tasks.js';
import type { SinkLaneReply, SinkLaneRequest } from './sink-lanes.js';

const port = parentPort;
if (port === null) throw new Error('sink worker: started outside a worker thread');
const state = new SinkLaneState(workerData as HeatSinkCase);

port.on('message', (request: SinkLaneRequest) => {
  let reply: SinkLaneReply;
  try {
    reply = { id: request.id, ok: true, outcome: state.run(request.task) };
  } catch {
    reply = { id: request.id, ok: false };
  }
  port.postMessage(reply);
});
