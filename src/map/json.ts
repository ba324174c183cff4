/**
 * The JSON document of `fincheck map` in JSON (outputs.md): case, reference, tolerance, the two axes with their
 * key, unit and values, and one entry per point, x fastest (index = j * NX + i). A point where the case became
 * invalid carries `error` instead of results. Added to the contract's keys: each axis's `log`, the shortcuts
 * mapped, the case's own point, the summary counts and (per point) `mL`, the reference's model, efficiency and
 * discretisation error, each shortcut's heat rate and efficiency. `reference` is the case's own point's reference;
 * `summary.references` counts the points per reference model (auto keeps fd-1d where 2-D does not cover the case).
 * `files` (in map.json and the JSON printed alike) lists the files the map wrote into its folder (manifest.ts).
 */
import { CAUTIONS } from '../compare/index.js';
import type { MapRun } from './run-map.js';
import { isPointError, type MapAxis, type MapPoint } from './types.js';

function axisJson(axis: MapAxis) {
  return { key: axis.key, unit: axis.displayUnit, log: axis.log, values: Array.from(axis.values), caseValue: axis.caseValue };
}

function pointJson(p: MapPoint) {
  if (isPointError(p)) return { x: p.x, y: p.y, error: p.error };
  return { x: p.x, y: p.y, biot: p.biot, mL: p.mL, reference: p.reference, models: p.models };
}

const finiteOrNull = (v: number): number | null => (Number.isFinite(v) ? v : null);

/** `files`: the names this map writes into its folder (map.json lists them so that a re-run can tell its own). */
export function mapJson(run: MapRun, files?: readonly string[]) {
  const { summary } = run;
  const { index: _index, ...casePoint } = run.casePoint;
  return {
    case: run.caseName,
    reference: run.casePoint.reference.model,
    tolerance: run.job.check.tolerance,
    x: axisJson(run.x),
    y: axisJson(run.y),
    models: run.job.check.models,
    shortcutGuess: run.job.check.guess,
    casePoint: { ...casePoint, x: finiteOrNull(casePoint.x), y: finiteOrNull(casePoint.y) },
    summary: {
      points: summary.points,
      solved: summary.solved,
      errors: summary.errors,
      errorGroups: summary.errorGroups,
      references: summary.references,
      models: summary.models.map((m) => ({ ...m, minDrift: finiteOrNull(m.minDrift), maxDrift: finiteOrNull(m.maxDrift) })),
    },
    cautions: [...CAUTIONS],
    warnings: run.warnings,
    points: run.points.map(pointJson),
    ...(files ? { files: [...files] } : {}),
  };
}

export function mapJsonText(run: MapRun, files?: readonly string[]): string {
  return `${JSON.stringify(mapJson(run, files), null, 2)}\n`;
}
