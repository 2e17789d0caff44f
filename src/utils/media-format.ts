const wallClock = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short', timeZone: 'UTC' });

/**
 * A date and time as the camera wrote it (`YYYY-MM-DDTHH:MM:SS`, no zone): read as UTC and shown
 * in UTC, so the clock reading comes out unchanged wherever the viewer is.
 */
export function formatTakenAt(takenAt: string | null | undefined): string | null {
  if (!takenAt) return null;
  const date = new Date(`${takenAt}Z`);
  return Number.isNaN(date.getTime()) ? takenAt : wallClock.format(date);
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}
