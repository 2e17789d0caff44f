/** The next time the clock shows `hour`:00 in the server's local time zone (TZ), after `now`. */
export function nextRunAt(hour: number, now = new Date()): Date {
  const next = new Date(now);
  next.setHours(hour, 0, 0, 0);
  if (next.getTime() <= now.getTime()) {
    next.setDate(next.getDate() + 1);
    next.setHours(hour, 0, 0, 0); // again: a daylight-saving change between the two days moves it
  }
  return next;
}
