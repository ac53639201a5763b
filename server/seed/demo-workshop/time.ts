/**
 * Demo content is dated relative to the moment it is seeded, so the demo shop always looks recently busy:
 * a fixed local time some days back, or some minutes before now for today's work.
 */
export type When = { daysAgo: number; hour: number; minute: number } | { minutesAgo: number };

const MINUTE_MS = 60_000;

export function resolveWhen(now: Date, when: When): Date {
  if ('minutesAgo' in when) return new Date(now.getTime() - when.minutesAgo * MINUTE_MS);
  const d = new Date(now);
  d.setDate(d.getDate() - when.daysAgo);
  d.setHours(when.hour, when.minute, 0, 0);
  return d;
}

export function addMinutes(d: Date, minutes: number): Date {
  return new Date(d.getTime() + minutes * MINUTE_MS);
}

export function daysBefore(now: Date, days: number): Date {
  return new Date(now.getTime() - days * 24 * 60 * MINUTE_MS);
}
