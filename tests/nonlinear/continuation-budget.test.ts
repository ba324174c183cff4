/**
 * Continuation is bounded whatever the problem (src/fd/newton/continuation.ts): at most MAX_STAGES stages and
 * WORK_BUDGET Newton steps plus line-search halvings, counted, not timed. A stage sequence that alternates
 * success and failure at steps near the smallest one used to run for thousands of stages (a wild k(T) table
 * ran for more than 10 minutes: tests/fuzz/cases/wild-conductivity-table-hang.yaml). Synthetic attempts stand
 * in for Newton here, so the bound is reached on purpose; no physics is checked.
 */
import { describe, expect, test } from 'vitest';
import { continueFromLinear, MAX_STAGES, WORK_BUDGET, type NewtonAttempt } from '../../src/fd/newton/continuation.js';

type Attempt = NewtonAttempt<number>;

const failedDirect: Attempt = { converged: false, iterations: 50, halvings: 0, drop: 0 };

function run(attemptAt: (s: number, from: number | null) => Attempt): { calls: number; error: Error | null } {
  let calls = 0;
  try {
    continueFromLinear<number, Attempt>(
      failedDirect,
      (s, from) => {
        calls++;
        return attemptAt(s, from);
      },
      (_attempt, reached, budget) => new Error(`gave up at ${reached}: ${budget ?? 'smallest step'}`),
    );
    return { calls, error: null };
  } catch (error) {
    return { calls, error: error as Error };
  }
}

describe('continuation work bound', () => {
  test('stages that converge only for steps <= 2^-11 stop at MAX_STAGES, not after ~4000 stages', () => {
    const { calls, error } = run((s, from) => {
      const step = s - (from ?? 0);
      return { converged: step <= 2 ** -11 + 1e-15, iterations: 3, halvings: 0, drop: step <= 2 ** -11 + 1e-15 ? s : (from ?? 0) };
    });
    expect(error?.message).toMatch(/continuation stopped at its work bound \(64 stages/);
    // The s = 0 stage plus MAX_STAGES stages.
    expect(calls).toBe(MAX_STAGES + 1);
  });

  test('expensive stages stop at WORK_BUDGET Newton steps and halvings', () => {
    const { calls, error } = run((s, from) => {
      const step = s - (from ?? 0);
      const ok = step <= 2 ** -8 + 1e-15;
      return { converged: ok, iterations: 50, halvings: 40, drop: ok ? s : (from ?? 0) };
    });
    expect(error?.message).toMatch(/work bound/);
    // Each stage costs 90: the bound is reached within one stage of WORK_BUDGET / 90.
    expect(calls).toBeLessThanOrEqual(Math.ceil(WORK_BUDGET / 90) + 2);
  });

  test('an ordinary continuation is untouched: s = 0, 1/4, 3/4, 1', () => {
    const seen: number[] = [];
    const { error } = run((s) => {
      seen.push(s);
      return { converged: true, iterations: 4, halvings: 0, drop: s };
    });
    expect(error).toBeNull();
    expect(seen).toEqual([0, 0.25, 0.75, 1]);
  });
});
