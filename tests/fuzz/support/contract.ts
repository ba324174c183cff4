/**
 * The output contract the fuzz properties check (README.md "Usage", "Definitions", "Flags"; outputs.md).
 * Each function returns a list of violations (empty when the run keeps the contract), so one failure
 * message can name every problem of a counterexample at once.
 *
 * - Exit codes: 0 done; 1 only with --strict; 2 bad input or usage; 3 solver failure. 70 (internal error)
 *   is always a bug.
 * - Exit 2: the message starts "fincheck:" and names the key path (or the option) it refuses.
 * - Exit 3: the message starts "fincheck:" and says what to change; an option it advises exists on the
 *   command (issue 9, item 1: advice must name an option the command has).
 * - JSON: every documented number is a finite number; JSON turns NaN and Infinity into null, so a null is
 *   allowed only where the README documents one (listed in `allowedNull` with the reason).
 * - Efficiency in (0, 1]: the definition (README "Definitions") divides Q by the heat rate of the same fin
 *   with every cooled surface at the base temperature; the face flux is increasing in the local excess
 *   temperature for every law the case format allows (power law with exponent > -1, grey radiation), so no
 *   surface loses more than it would at the base temperature when the base is the hottest (or coldest)
 *   place. A tip held at a set temperature beyond that breaks the argument (the README lets it exceed 1).
 * - Verdicts from the documented set, consistent with |drift| and the tolerance.
 */
import type { CaseFacts } from './cases.js';
import type { Run } from './drive.js';

export const verdicts = ['ok', 'marginal', 'unsafe', 'unresolved'] as const;
export const modelIds = ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form', 'fd-1d', 'fd-2d'] as const;

/** Exit code and message rules for any run. `strict`: --strict was given. `options`: the command's options. */
export function exitProblems(run: Run, strict: boolean, options: readonly string[]): string[] {
  const problems: string[] = [];
  const allowed = strict ? [0, 1, 2, 3] : [0, 2, 3];
  if (run.code === 70) problems.push('exit 70: internal error');
  else if (!allowed.includes(run.code)) problems.push(`exit ${run.code}: not one of ${allowed.join(', ')}`);
  if (run.code === 2) problems.push(...refusalProblems(run.stderr));
  if (run.code === 3) problems.push(...solverFailureProblems(run.stderr, options));
  if (run.code !== 0 && run.code !== 1 && run.stdout !== '') problems.push(`exit ${run.code} but stdout is not empty`);
  return problems;
}

/** A key path of the case (fin.thickness, convection.h.points[1][0]), a file problem, or an option. */
const namesAKey =
  /(^|[\s:(])((name|fin|material|convection|base|units)(\.[A-Za-z]+|\[\d+\])*|\(top level\)|\(file\)|\(syntax\)|--[a-z][a-z-]*)(?![A-Za-z])/;

/** Exit 2: "fincheck:" first, and a key path (`keyPath` when the test knows which key is wrong). */
export function refusalProblems(stderr: string, keyPath?: string): string[] {
  const problems: string[] = [];
  if (!stderr.startsWith('fincheck:')) problems.push(`exit 2 message does not start with "fincheck:": ${JSON.stringify(stderr.slice(0, 120))}`);
  if (keyPath !== undefined) {
    if (!stderr.includes(keyPath)) problems.push(`exit 2 message does not name the key ${keyPath}`);
  } else if (!namesAKey.test(stderr)) {
    problems.push('exit 2 message names no key path or option');
  }
  if (/\n\s+at .+:\d+:\d+\)?\n/.test(stderr)) problems.push('exit 2 message carries a stack trace');
  return problems;
}

/** Words of advice: a solver failure says what to change. */
const advice = /\b(try|use|increase|decrease|reduce|lower|raise|give|set|change|refine|coarsen|shorten|choose|pass|add|remove|run)\b/i;

export function solverFailureProblems(stderr: string, options: readonly string[]): string[] {
  const problems: string[] = [];
  if (!stderr.startsWith('fincheck:')) problems.push(`exit 3 message does not start with "fincheck:": ${JSON.stringify(stderr.slice(0, 120))}`);
  if (!advice.test(stderr)) problems.push('exit 3 message does not say what to change');
  if (/\bNaN\b/.test(stderr)) problems.push('exit 3 message reports NaN (a numerical breakdown, not a convergence failure)');
  for (const m of stderr.matchAll(/--[a-z][a-z-]*/g)) {
    if (!options.includes(m[0])) problems.push(`exit 3 message advises ${m[0]}, which this command does not have`);
  }
  if (/\n\s+at .+:\d+:\d+\)?\n/.test(stderr)) problems.push('exit 3 message carries a stack trace');
  return problems;
}

/** Text output: no number that failed to be one. */
export function textProblems(stdout: string): string[] {
  const problems: string[] = [];
  for (const word of ['NaN', 'undefined', 'Infinity', '[object Object]']) {
    if (stdout.includes(word)) problems.push(`text output contains "${word}"`);
  }
  return problems;
}

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

function isObject(v: Json | undefined): v is { [key: string]: Json } {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Where a null is documented, by path pattern (array indices written [i]), with the reason. */
export interface NullRule {
  path: RegExp;
  /** Further condition on the object holding the key. */
  when?: (holder: { [key: string]: Json }) => boolean;
  reason: string;
}

/** Free-text notes (`note`, `efficiencyNote`, ...) are null when there is nothing to say: not numbers. */
const noteKey = /(^|\.)([A-Za-z]*Note|note)$/;

/** Every null in `json` must match a rule (or be a note); returns the paths of those that do not. */
export function strayNulls(json: Json, rules: readonly NullRule[]): string[] {
  const problems: string[] = [];
  const walk = (node: Json, path: string, holder: { [key: string]: Json } | undefined): void => {
    if (node === null) {
      const pattern = path.replace(/\[\d+\]/g, '[i]');
      if (noteKey.test(pattern)) return;
      const ok = rules.some((r) => r.path.test(pattern) && (r.when === undefined || (holder !== undefined && r.when(holder))));
      if (!ok) problems.push(`${path} is null (NaN, Infinity or a missing number)`);
      return;
    }
    if (Array.isArray(node)) node.forEach((v, i) => walk(v, `${path}[${i}]`, undefined));
    else if (isObject(node)) for (const [k, v] of Object.entries(node)) walk(v, path === '' ? k : `${path}.${k}`, node);
  };
  walk(json, '', undefined);
  return problems;
}

const isNumericModel = (holder: { [key: string]: Json }) => typeof holder['model'] === 'string' && holder['model'].startsWith('fd-');

/** Nulls the README and outputs.md document in `check --json`. */
export function checkNullRules(facts: CaseFacts): NullRule[] {
  const rules: NullRule[] = [
    {
      path: /^models\[i\]\.(formulaEfficiency|m_per_m|length_m)$/,
      when: isNumericModel,
      reason:
        'a numerical model has no formula efficiency, fin parameter or formula length (README: formulaEfficiency is the shortcut\u2019s own formula value)',
    },
  ];
  rules.push(
    { path: /^uncertainty\.sample$/, reason: 'README "JSON output": uncertainty.sample is null when no Latin-hypercube sample was drawn (issue 12)' },
    {
      path: /^models\[i\]\.driftOverUncertainty$/,
      reason: 'README "JSON output": driftOverUncertainty is null when the uncertainty band is 0 (issue 12)',
    },
    {
      path: /^sensitivities\[i\]\.value$/,
      when: (s) => s['key'] === 'convection.h' || s['key'] === 'material.k',
      reason: 'README "JSON output": an h or k given as a table has no single nominal value (issue 12)',
    },
  );
  rules.push({
    path: /^reference\.observedOrder$/,
    when: (ref) => typeof ref['discretizationError'] === 'number',
    reason: 'README "JSON output": null when the grids show no order (round-off differences or a sign change); the GCI is still given',
  });
  if (facts.tip === 'temperature') {
    rules.push({
      path: /^models\[i\]\.formulaEfficiency$/,
      reason: 'README "check": a prescribed tip temperature has a textbook heat rate but no formula efficiency (Incropera et al. 2007, Table 3.4, case C)',
    });
  }
  if (facts.tip === 'infinite') {
    rules.push({
      path: /^(reference|models\[i\])\.(efficiency|formulaEfficiency)$/,
      reason: 'an infinite fin has no finite area, so its efficiency is n/a (issue 9, item 6)',
    });
  }
  return rules;
}

/**
 * Nulls the README documents with a reason printed beside them (README "JSON output"), allowed only for the
 * cases that can have them: `effectivenessNote` where h can be 0 at the base (a linear or tabulated h),
 * `efficiencyNote` "no efficiency" and `dimensionlessNote` where radiation can outweigh convection. The notes
 * sit in `reference` (check) or at the top (solve).
 */
export function notedNullRules(json: Json, facts: CaseFacts, at: 'check' | 'solve'): NullRule[] {
  const rules: NullRule[] = [];
  if (!isObject(json)) return rules;
  const holder = at === 'check' ? json['reference'] : json;
  if (!isObject(holder)) return rules;
  const numbers = (key: string): RegExp => (at === 'check' ? new RegExp(String.raw`^(reference|models\[i\])\.${key}$`) : new RegExp(`^${key}$`));
  if (
    (facts.h === 'linear' || facts.h === 'points') &&
    typeof holder['effectivenessNote'] === 'string' &&
    /h is 0 at the base/.test(holder['effectivenessNote'])
  ) {
    rules.push({
      path: numbers('effectiveness'),
      reason: 'README "JSON output": effectiveness is null where h is 0 at the base (Q_bare = 0), effectivenessNote says so',
    });
  }
  if (
    facts.radiates &&
    typeof holder['efficiencyNote'] === 'string' &&
    /^no efficiency: at the base temperature part of the surface/.test(holder['efficiencyNote'])
  ) {
    rules.push({
      path: numbers('efficiency'),
      reason:
        'README "JSON output": no efficiency where the surface at the base temperature both loses and gains heat (hot surroundings), efficiencyNote says so',
    });
  }
  if (at === 'check' && facts.radiates && typeof json['dimensionlessNote'] === 'string') {
    rules.push({
      path: /^(biot|mL)$/,
      reason: 'README "JSON output": no Bi or mL where the single h is negative (hot surroundings), dimensionlessNote says so',
    });
  }
  return rules;
}

/** Nulls documented in `solve --json`. `single`: --nodes or --grid (one grid, no error estimate). */
export function solveNullRules(facts: CaseFacts, single: boolean): NullRule[] {
  const rules: NullRule[] = [];
  if (single) {
    rules.push({
      path: /^(discretizationError|observedOrder|finestGridDiscretizationError)$/,
      reason: 'one grid: no refinement study (outputs.md: --nodes/--grid give discretizationError null; README: finestGridDiscretizationError too)',
    });
  }
  rules.push({
    path: /^observedOrder$/,
    when: (root) => typeof root['discretizationError'] === 'number',
    reason: 'README "JSON output": null when the grids show no order; the GCI is still given',
  });
  if (!facts.nonlinear) rules.push({ path: /^newton$/, reason: 'a linear fin takes no Newton steps' });
  if (facts.tip === 'infinite') rules.push({ path: /^efficiency$/, reason: 'an infinite fin has no finite area (issue 9, item 6)' });
  return rules;
}

/** A documented number: present, a finite number. */
function finite(holder: { [key: string]: Json } | undefined, key: string, where: string, problems: string[], nullable = false): number | undefined {
  const v = holder?.[key];
  if (v === null && nullable) return undefined;
  if (typeof v !== 'number' || !Number.isFinite(v)) {
    problems.push(`${where}.${key} is ${JSON.stringify(v)}, not a finite number`);
    return undefined;
  }
  return v;
}

/**
 * Efficiency within (0, 1] unless the case is a documented exception. `slack` allows round-off and the
 * reference's own discretisation error (a shortcut that matches an ideal fin to 1e-6 may print 1 + 1e-7).
 */
function efficiencyProblems(eta: number | undefined, where: string, facts: CaseFacts, slack: number): string[] {
  if (eta === undefined) return [];
  if (facts.tip === 'temperature') return []; // a tip held above the fin's own temperature adds heat: eta may exceed 1 (README)
  if (!(eta > 0 && eta <= 1 + slack)) return [`${where}.efficiency = ${eta}: outside (0, 1]`];
  return [];
}

/** The temperatures any solution must stay between (maximum principle; radiation pulls toward the surroundings). */
/**
 * `slack`, as a fraction of the range: 1e-6 for the 1-D scheme (three-point, positive coefficients: an
 * M-matrix, so the discrete maximum principle holds to round-off); 1e-2 for a single coarse 2-D grid, whose
 * 9-point stencil on skewed boundary-fitted cells is not an M-matrix and may overshoot slightly (measured:
 * 0.1 % on a 41x9 grid of a profile whose thickness jumps tenfold within 1 mm; none on the study's grids).
 */
function temperatureBounds(facts: CaseFacts, slack = 1e-6): [number, number] {
  const ts = [facts.baseC, facts.ambientC];
  if (facts.tipC !== undefined) ts.push(facts.tipC);
  if (facts.radiates) ts.push(facts.surroundingsC);
  const lo = Math.min(...ts);
  const hi = Math.max(...ts);
  // 1e-3 K: the case's temperatures were written to 6 significant digits in several units.
  const pad = slack * (hi - lo) + 1e-3;
  return [lo - pad, hi + pad];
}

function temperatureProblems(t: number | undefined, where: string, facts: CaseFacts, slack = 1e-6): string[] {
  if (t === undefined) return [];
  const [lo, hi] = temperatureBounds(facts, slack);
  return t >= lo && t <= hi ? [] : [`${where} = ${t} degC: outside [${lo}, ${hi}] (ambient, base, tip, surroundings)`];
}

const tolerated = (drift: number, tolerance: number) => (Math.abs(drift) <= tolerance ? 'ok' : Math.abs(drift) <= 2 * tolerance ? 'marginal' : 'unsafe');

/** `check --json`: documented keys, finite numbers, efficiency, verdicts, energy balance, flags. */
export function checkJsonProblems(json: Json, facts: CaseFacts, expected: { reference: 'auto' | '1d'; tolerance: number }): string[] {
  const problems: string[] = [];
  if (!isObject(json)) return ['check --json did not print a JSON object'];
  const noted = notedNullRules(json, facts, 'check');
  const nullable = (path: string): boolean => noted.some((r) => r.path.test(path));
  problems.push(...strayNulls(json, [...checkNullRules(facts), ...noted]));
  for (const key of ['case', 'tolerance', 'reference', 'models', 'assumptions', 'flags', 'cautions']) {
    if (!(key in json)) problems.push(`missing key ${key}`);
  }
  if (typeof json['case'] !== 'string') problems.push('case is not a string');
  const tolerance = finite(json, 'tolerance', '', problems);
  if (tolerance !== undefined && Math.abs(tolerance - expected.tolerance) > 1e-12)
    problems.push(`tolerance ${tolerance}, asked for ${expected.tolerance}`);
  if ('biot' in json) {
    const biot = finite(json, 'biot', '', problems, nullable('biot'));
    if (biot !== undefined && !(biot >= 0)) problems.push(`biot = ${biot} < 0`);
  }

  const ref = json['reference'];
  if (!isObject(ref)) return [...problems, 'reference is not an object'];
  const refModel = ref['model'];
  if (refModel !== 'fd-1d' && refModel !== 'fd-2d') problems.push(`reference.model ${JSON.stringify(refModel)}`);
  if (expected.reference === '1d' && refModel !== 'fd-1d') problems.push(`--reference 1d but reference.model is ${JSON.stringify(refModel)}`);
  const q = finite(ref, 'heatRate_W', 'reference', problems);
  if (q === 0) problems.push('reference.heatRate_W is 0');
  if (q !== undefined && !facts.radiates && facts.tip !== 'temperature' && Math.sign(q) !== Math.sign(facts.baseC - facts.ambientC)) {
    problems.push(`reference.heatRate_W = ${q} has the wrong sign for base ${facts.baseC} degC, ambient ${facts.ambientC} degC`);
  }
  const refError = finite(ref, 'discretizationError', 'reference', problems);
  problems.push(
    ...efficiencyProblems(
      finite(ref, 'efficiency', 'reference', problems, facts.tip === 'infinite' || nullable('reference.efficiency')),
      'reference',
      facts,
      1e-9 + (refError ?? 0) * 4,
    ),
  );
  finite(ref, 'effectiveness', 'reference', problems, nullable('reference.effectiveness'));
  const balance = finite(ref, 'energyBalance', 'reference', problems);

  const flags = Array.isArray(json['flags']) ? json['flags'].filter(isObject) : [];
  const flagNames = flags.map((f) => f['flag']);
  for (const f of flags) {
    if (typeof f['flag'] !== 'string' || typeof f['message'] !== 'string')
      problems.push(`flag without a name or message: ${JSON.stringify(f).slice(0, 120)}`);
    if (f['value'] !== undefined && f['value'] !== null && (typeof f['value'] !== 'number' || !Number.isFinite(f['value']))) {
      problems.push(`flag ${String(f['flag'])} value ${JSON.stringify(f['value'])}`);
    }
  }
  // README "Flags": energy-balance when heat in and out differ by more than 1e-8; the scheme is conservative,
  // so anything beyond 1e-6 is a bug whatever the flags say.
  if (balance !== undefined) {
    if (!(balance >= 0)) problems.push(`reference.energyBalance = ${balance} < 0`);
    if (balance > 1e-8 && !flagNames.includes('energy-balance'))
      problems.push(`reference.energyBalance = ${balance} > 1e-8 without the energy-balance flag`);
    if (balance > 1e-6) problems.push(`reference.energyBalance = ${balance}: not small`);
  }
  // README "Flags": grid-not-converged when the GCI exceeds a tenth of the tolerance.
  if (refError !== undefined && tolerance !== undefined) {
    if (!(refError >= 0)) problems.push(`reference.discretizationError = ${refError} < 0`);
    if (refError > tolerance / 10 && !flagNames.includes('grid-not-converged')) {
      problems.push(`reference.discretizationError = ${refError} > tolerance/10 without the grid-not-converged flag`);
    }
  }

  // README "check": a verdict only on a resolved reference (GCI at most a tenth of the tolerance); an
  // unresolved reference gives every row the verdict `unresolved`.
  const resolved = ref['resolved'];
  if ('resolved' in ref && typeof resolved !== 'boolean') problems.push(`reference.resolved ${JSON.stringify(resolved)} is not true or false`);
  if (resolved === true && refError !== undefined && tolerance !== undefined && refError > tolerance / 10) {
    problems.push(`reference.resolved but its discretizationError ${refError} exceeds a tenth of the tolerance`);
  }
  // README "check": a shortcut's efficiency may exceed 1 when its equivalent fin has more surface than the
  // actual one, and reference.efficiencyNote then names it.
  const efficiencyNote = typeof ref['efficiencyNote'] === 'string' ? ref['efficiencyNote'] : '';

  const models = Array.isArray(json['models']) ? json['models'] : [];
  // README: a shortcut that does not apply is left out of the table with the reason (notApplicable).
  const notApplicable = Array.isArray(json['notApplicable']) ? json['notApplicable'] : [];
  if (models.length === 0 && notApplicable.length === 0) problems.push('no models and none listed as not applicable');
  for (const [i, row] of models.entries()) {
    const where = `models[${i}]`;
    if (!isObject(row)) {
      problems.push(`${where} is not an object`);
      continue;
    }
    const id = row['model'];
    if (typeof id !== 'string' || !(modelIds as readonly string[]).includes(id))
      problems.push(`${where}.model ${JSON.stringify(id)} is not a documented model id`);
    finite(row, 'heatRate_W', where, problems);
    const eta = finite(row, 'efficiency', where, problems, facts.tip === 'infinite' || nullable('models[i].efficiency'));
    finite(row, 'effectiveness', where, problems, nullable('models[i].effectiveness'));
    const named =
      typeof id === 'string' && !id.startsWith('fd-') && new RegExp(`(^|[\\s,])${id}[\\s,]`).test(efficiencyNote) && /above 1/.test(efficiencyNote);
    if (!named) problems.push(...efficiencyProblems(eta, `${where} (${String(id)})`, facts, 1e-9 + (refError ?? 0) * 4));
    const drift = finite(row, 'drift', where, problems);
    const verdict = row['verdict'];
    if (typeof verdict !== 'string' || !(verdicts as readonly string[]).includes(verdict)) {
      problems.push(`${where}.verdict ${JSON.stringify(verdict)} is not one of ${verdicts.join(', ')}`);
    } else if (resolved === false && verdict !== 'unresolved') {
      problems.push(`${where}.verdict ${verdict} on an unresolved reference`);
    } else if (resolved === true && verdict === 'unresolved') {
      problems.push(`${where}.verdict unresolved on a resolved reference`);
    } else if (verdict !== 'unresolved' && drift !== undefined && tolerance !== undefined && verdict !== tolerated(drift, tolerance)) {
      problems.push(`${where}.verdict ${verdict} but drift ${drift} at tolerance ${tolerance} is ${tolerated(drift, tolerance)}`);
    }
  }
  const assumptions = Array.isArray(json['assumptions']) ? json['assumptions'] : [];
  for (const [i, row] of assumptions.entries()) {
    if (!isObject(row) || typeof row['assumption'] !== 'string') problems.push(`assumptions[${i}] has no assumption text`);
    else finite(row, 'drift', `assumptions[${i}]`, problems);
  }
  const cautions = json['cautions'];
  if (!Array.isArray(cautions) || cautions.length === 0 || !cautions.every((c) => typeof c === 'string')) problems.push('cautions are not a list of text');
  return problems;
}

/** `solve --json` (1-D or 2-D). `single`: one grid (--nodes or --grid). */
export function solveJsonProblems(json: Json, facts: CaseFacts, expected: { model: 'fd-1d' | 'fd-2d'; single: boolean }): string[] {
  const problems: string[] = [];
  if (!isObject(json)) return ['solve --json did not print a JSON object'];
  const noted = notedNullRules(json, facts, 'solve');
  const nullable = (path: string): boolean => noted.some((r) => r.path.test(path));
  problems.push(...strayNulls(json, [...solveNullRules(facts, expected.single), ...noted]));
  if (json['model'] !== expected.model) problems.push(`model ${JSON.stringify(json['model'])}, expected ${expected.model}`);
  const q = finite(json, 'heatRate_W', '', problems);
  if (q === 0) problems.push('heatRate_W is 0');
  const error = finite(json, 'discretizationError', '', problems, expected.single);
  problems.push(
    ...efficiencyProblems(
      finite(json, 'efficiency', '', problems, facts.tip === 'infinite' || nullable('efficiency')),
      'solve',
      facts,
      1e-9 + (error ?? 0) * 4,
    ),
  );
  finite(json, 'effectiveness', '', problems, nullable('effectiveness'));
  const balance = finite(json, 'energyBalance', '', problems);
  // Conservative schemes: heat in = heat out to round-off (README "How accurate"); nonlinear solves stop at a
  // relative residual of 1e-10 (2-D) or 1e-12 (1-D), far below 1e-6.
  if (balance !== undefined && !(balance >= 0 && balance <= 1e-6)) problems.push(`energyBalance = ${balance}: not small`);
  const slack = expected.model === 'fd-2d' && expected.single ? 1e-2 : 1e-6;
  problems.push(...temperatureProblems(finite(json, 'baseTemperature_degC', '', problems), 'baseTemperature_degC', facts, slack));
  problems.push(...temperatureProblems(finite(json, 'tipTemperature_degC', '', problems), 'tipTemperature_degC', facts, slack));
  const lines = expected.model === 'fd-1d' ? ['profile'] : ['centreline', 'surface'];
  for (const line of lines) {
    const points = json[line];
    if (!Array.isArray(points) || points.length < 2) {
      problems.push(`${line} is not a list of points`);
      continue;
    }
    let bad = 0;
    for (const p of points) {
      if (!isObject(p)) continue;
      const x = p['x_m'] ?? p['r_m'];
      const t = p['T_degC'];
      if (typeof x !== 'number' || typeof t !== 'number' || temperatureProblems(t, 'T', facts, slack).length > 0) bad += 1;
    }
    if (bad > 0)
      problems.push(
        `${line}: ${bad} of ${points.length} points without a finite position or with T outside the bounds ${temperatureBounds(facts, slack).join('..')}`,
      );
  }
  return problems;
}

/** Parses stdout as JSON; a parse failure is a violation. */
export function parseJson(stdout: string): { json?: Json; problems: string[] } {
  try {
    return { json: JSON.parse(stdout) as Json, problems: [] };
  } catch (e) {
    return { problems: [`stdout is not one JSON document: ${(e as Error).message}`] };
  }
}

/**
 * Refusals of valid cases that the README documents: `solve --model 2d` on an infinite tip (the 2-D model
 * closes the cut fin with the 1-D decaying mode of a uniform fin; README: "except a nonlinear infinite tip",
 * and the linear cut needs a uniform h).
 */
export function documentedRefusal(command: 'check' | 'solve' | 'solve2d' | 'plot', facts: CaseFacts, stderr: string): boolean {
  if (command === 'solve2d' && facts.tip === 'infinite') return /infinite tip/.test(stderr);
  return false;
}
