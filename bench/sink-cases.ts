/**
 * The heat sinks of the 3-D benchmarks (invented): a 100 x 80 x 6 mm aluminium plate with 20 rectangular plate
 * fins (1.6 mm thick, 35 mm high, pitch 5 mm), h = 45 W/(m^2 K) on the fins and 30 on the exposed plate, two
 * sources (60 W and 40 W) on the underside.
 */
import type { HeatSinkCase } from '../src/case/index.js';
import { plateFin, sinkCase } from '../tests/sink/support/sink-case.js';

export function twentyFinSink(): HeatSinkCase {
  return sinkCase({
    plate: [0.1, 0.08, 0.006],
    kPlate: 200,
    fin: plateFin(0.035, 0.0016, 0.08),
    array: { kind: 'plates', count: 20, pitch: 0.005 },
    hPlate: 30,
    h: { kind: 'uniform', h: 45 },
    sources: [
      { centre: [0.03, 0.04], size: [0.025, 0.03], power: 60, name: 'module A' },
      { centre: [0.07, 0.04], size: [0.025, 0.03], power: 40, name: 'module B' },
    ],
  });
}
