const parts = (date: Date) =>
  Object.fromEntries(
    new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone: 'UTC' })
      .formatToParts(date)
      .map((p) => [p.type, p.value]),
  ) as Record<'weekday' | 'day' | 'month' | 'year' | 'hour' | 'minute', string>;

/** A moment as people read it in an e-mail: "Saturday 5 December 2026, 16:16 UTC". */
export function mailDateTime(date: Date): string {
  const p = parts(date);
  return `${p.weekday} ${p.day} ${p.month} ${p.year}, ${p.hour}:${p.minute} UTC`;
}

/** A calendar day (YYYY-MM-DD) as people read it: "Sunday 29 November 2026". */
export function mailDate(isoDay: string): string {
  const p = parts(new Date(`${isoDay}T12:00:00Z`));
  return `${p.weekday} ${p.day} ${p.month} ${p.year}`;
}
