/**
 * Ctrl-C (SIGINT) and SIGTERM (a service manager, `kill`, a CI timeout) while a command that writes files runs.
 * Without a listener Node dies at once, wherever it is, and leaves temporary files or a half-made folder. While
 * listening, a signal is only recorded (and aborts `signal`): the command stops at its next check, removes what it
 * staged and reports the interruption; a synchronous write or rename already under way completes first, so nothing
 * is ever left half-written. The exit code is the shell's for the signal: 128 + 2 = 130 (SIGINT), 128 + 15 = 143
 * (SIGTERM).
 */

export type InterruptSignal = 'SIGINT' | 'SIGTERM';

const exitCodes: Readonly<Record<InterruptSignal, number>> = { SIGINT: 130, SIGTERM: 143 };

/** Thrown by a command's own checks when a signal was recorded; the command turns it into its message and code. */
export class Interrupted extends Error {
  override name = 'Interrupted';
  constructor(readonly by: InterruptSignal) {
    super(`interrupted by ${by}`);
  }
}

export interface InterruptListener {
  /** The first signal received, or null. */
  readonly received: () => InterruptSignal | null;
  /** Aborted when a signal arrives. */
  readonly signal: AbortSignal;
  /** Throws Interrupted when a signal has arrived. */
  readonly check: () => void;
  /** Stops listening (the default actions return). */
  readonly dispose: () => void;
}

export function interruptExitCode(by: InterruptSignal): number {
  return exitCodes[by];
}

export function listenForInterrupt(): InterruptListener {
  const controller = new AbortController();
  let received: InterruptSignal | null = null;
  const handlers = (['SIGINT', 'SIGTERM'] as const).map((name) => {
    const handler = (): void => {
      received ??= name;
      controller.abort();
    };
    process.on(name, handler);
    return { name, handler };
  });
  return {
    received: () => received,
    signal: controller.signal,
    check: () => {
      if (received !== null) throw new Interrupted(received);
    },
    dispose: () => {
      for (const { name, handler } of handlers) process.off(name, handler);
    },
  };
}
