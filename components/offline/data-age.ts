/** "just now", "12 min ago", "3 h ago", "2 days ago": how old the data on screen is. */
export function dataAge(savedAtMs: number, nowMs: number): string {
  const minutes = Math.max(0, Math.round((nowMs - savedAtMs) / 60_000));
  if (minutes < 1) return 'just now';
  if (minutes < 60) return `${minutes} min ago`;
  const hours = Math.round(minutes / 60);
  if (hours < 48) return `${hours} h ago`;
  return `${Math.round(hours / 24)} days ago`;
}
