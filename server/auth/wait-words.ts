/** How long until `until` (ms since the epoch), in whole minutes and words: "1 minute", "14 minutes". */
export function minutesToWait(until: number, now: number): string {
  const minutes = Math.max(1, Math.ceil((until - now) / 60_000));
  return `${minutes} ${minutes === 1 ? 'minute' : 'minutes'}`;
}
