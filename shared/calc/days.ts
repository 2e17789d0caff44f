const DAY_MS = 86_400_000;

/** A calendar day (YYYY-MM-DD, UTC) some days before now; 0 is today. */
export function daysAgo(days: number): string {
  return new Date(Date.now() - days * DAY_MS).toISOString().slice(0, 10);
}

/** The latest day a past event may carry: tomorrow in UTC, so that no time zone ahead of UTC is refused its today. */
export function latestPastDay(): string {
  return daysAgo(-1);
}
