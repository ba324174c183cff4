/** Messages between the map's main thread and its workers (structured-clone safe plain data). */
import type { MapPoint } from './types.js';

export interface PointTask {
  index: number;
  x: number;
  y: number;
}

/** Main -> worker: solve these points, in this order. */
export interface BatchMessage {
  type: 'batch';
  tasks: PointTask[];
}

/** Worker -> main: one point done; then `batch-done` after the last point of a batch. */
export type WorkerMessage = { type: 'point'; point: MapPoint } | { type: 'batch-done' };
