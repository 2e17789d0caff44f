/** A tour's walking time as a visitor reads it: "25 min", "1 h 10 min"; null when none was worked out. */
export function formatDuration(minutes: number): string | null {
  const whole = Math.round(minutes);
  if (!Number.isFinite(whole) || whole <= 0) return null;
  const hours = Math.floor(whole / 60);
  const rest = whole % 60;
  if (!hours) return `${rest} min`;
  return rest ? `${hours} h ${rest} min` : `${hours} h`;
}

export const stopCountLabel = (count: number) => (count === 1 ? '1 stop' : `${count} stops`);
