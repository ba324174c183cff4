/**
 * The date printed in a report, as an ISO calendar date (YYYY-MM-DD): the date asked for when given, else
 * SOURCE_DATE_EPOCH (seconds since 1970, the reproducible-builds convention: same input, same bytes),
 * else today's local date.
 */
import { UsageError } from '../errors.js';

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

function isoDate(year: number, month: number, day: number): string {
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
}

/** `label` names the asked-for date in messages (the command line: its option). */
export function reportDate(option: string | undefined, sourceDateEpoch: string | undefined, now: Date = new Date(), label = 'report date'): string {
  if (option !== undefined) {
    const m = ISO_DATE.exec(option.trim());
    const d = m ? new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]))) : null;
    if (!m || !d || d.getUTCFullYear() !== Number(m[1]) || d.getUTCMonth() !== Number(m[2]) - 1 || d.getUTCDate() !== Number(m[3])) {
      throw new UsageError(`${label}: got ${JSON.stringify(option)}; expected a calendar date YYYY-MM-DD such as 2025-03-31`);
    }
    return option.trim();
  }
  if (sourceDateEpoch !== undefined && sourceDateEpoch.trim() !== '') {
    const seconds = Number(sourceDateEpoch.trim());
    if (!/^\d+$/.test(sourceDateEpoch.trim()) || !Number.isSafeInteger(seconds)) {
      throw new UsageError(`SOURCE_DATE_EPOCH: got ${JSON.stringify(sourceDateEpoch)}; expected whole seconds since 1970-01-01 UTC`);
    }
    const d = new Date(seconds * 1000);
    return isoDate(d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate());
  }
  return isoDate(now.getFullYear(), now.getMonth() + 1, now.getDate());
}
