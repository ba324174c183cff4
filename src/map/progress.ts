/**
 * A one-line progress bar for long maps, written to stderr and only when stderr is a terminal (so logs, pipes and
 * JSON consumers never see it): "map [#######.......] 45 %  760/1681 points  3 s left". Redrawn at most ten
 * times a second with a carriage return; `finish` clears the line. The time left appears once it can be
 * estimated fairly (eta.ts).
 */
import { EtaEstimator } from './eta.js';

export interface Progress {
  update(done: number): void;
  finish(): void;
}

const noProgress: Progress = { update: () => undefined, finish: () => undefined };

export function progressBar(write: (text: string) => void, isTTY: boolean, total: number, label = 'map'): Progress {
  if (!isTTY || total <= 0) return noProgress;
  const width = 28;
  const started = performance.now();
  const estimator = new EtaEstimator(total);
  let lastDraw = 0;
  const draw = (done: number): void => {
    const fraction = Math.min(1, done / total);
    const filled = Math.round(fraction * width);
    const left = estimator.observe(done, (performance.now() - started) / 1000);
    const eta = left !== null && done < total ? `  ${Math.ceil(left)} s left` : '';
    write(`\r${label} [${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${Math.floor(100 * fraction)} %  ${done}/${total} points${eta}\u001b[K`);
  };
  return {
    update(done: number): void {
      const now = performance.now();
      if (done < total && now - lastDraw < 100) return;
      lastDraw = now;
      draw(done);
    },
    finish(): void {
      write('\r\u001b[2K');
    },
  };
}
