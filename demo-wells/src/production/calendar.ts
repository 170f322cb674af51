/** Calendar helpers for monthly production (UTC, Gregorian). */

/** Days in month `month` (1-12) of `year`. */
export function daysInMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

/** "YYYY-MM" of the month `k` months after (year, month). */
export function monthLabel(year: number, month: number, k: number): { year: number; month: number; label: string } {
  const m0 = year * 12 + (month - 1) + k;
  const y = Math.floor(m0 / 12);
  const m = (m0 % 12) + 1;
  return { year: y, month: m, label: `${y}-${String(m).padStart(2, '0')}` };
}
