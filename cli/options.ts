/**
 * Option schemas shared by commands: zod parses and coerces; a failure becomes a UsageError that
 * names the option, the value and what is accepted (exit 2).
 */
import { z } from 'zod';
import { clip, defaultDisplayUnits, displaySystem, displaySystems, quoted, type DisplayUnits } from '../src/case/index.js';
import { UsageError } from '../src/errors.js';

/** "2%", "2 %", "0.02": a relative tolerance in (0, 1). */
export const toleranceOption = z
  .string()
  .trim()
  .transform((s, ctx) => {
    const m = /^([0-9]*\.?[0-9]+(?:e-?[0-9]+)?)\s*(%?)$/i.exec(s);
    const v = m ? Number(m[1]) / (m[2] ? 100 : 1) : Number.NaN;
    if (!(v > 0 && v < 1)) {
      ctx.addIssue({ code: 'custom', message: 'a relative tolerance such as "2%" or 0.02 (between 0 and 1)' });
      return z.NEVER;
    }
    return v;
  });

export const referenceOption = z.enum(['auto', '1d', '2d']);
/** check --sample: when the uncertainty band is confirmed by a Latin-hypercube sample. */
export const sampleOption = z.enum(['auto', 'always', 'never']);

/** An integer node count for a single 1-D solve (3 .. 1e7). */
export const nodesOption = z.coerce.number().int().min(3).max(10_000_000);

/** Parses `value` with `schema`, or throws a UsageError naming `--option`. */
export function parseOption<T>(option: string, schema: z.ZodType<T>, value: unknown, accepted?: string): T {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  const what = accepted ?? r.error.issues[0]?.message ?? 'a valid value';
  throw new UsageError(`${option}: got ${typeof value === 'string' ? quoted(value) : clip(String(value))}; expected ${what}`);
}

export const modelOption = z.enum(['1d', '2d']);

/** "400x40": nodes along and across for a single 2-D solve. */
export const gridOption = z
  .string()
  .trim()
  .regex(/^\d+\s*[xX]\s*\d+$/)
  .transform((s) => {
    const [nx, ny] = s.split(/[xX]/).map((v) => Number(v.trim())) as [number, number];
    return { nx, ny };
  })
  .refine((g) => g.nx >= 2 && g.ny >= 2 && g.nx <= 20000 && g.ny <= 20000);

/** --units si|mm|us: the units text, charts, maps and reports show (JSON stays SI). */
export const unitsOption = z.enum(displaySystems);
export const unitsHelp = 'units shown: si (lengths in m), mm (lengths in mm, the rest SI) or us (in, degF, BTU/h); JSON stays SI';

/**
 * The display units of a run: --units when given, else the case's own (its `display` key over what its inputs
 * suggest), else the default (mm and SI).
 */
/** The case with --units as its display units (charts and reports read them from the case); unchanged without --units. */
export function withDisplayUnits<C extends { display?: DisplayUnits }>(c: C, flag: string | undefined): C {
  return flag === undefined ? c : { ...c, display: displayUnitsOf(flag, undefined) };
}

export function displayUnitsOf(flag: string | undefined, caseUnits: DisplayUnits | undefined): DisplayUnits {
  if (flag !== undefined) return displaySystem(parseOption('--units', unitsOption, flag, 'si, mm or us'));
  return caseUnits ?? defaultDisplayUnits;
}
