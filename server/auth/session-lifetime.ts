const day = 24 * 60 * 60;

/** How long a session lasts without use, and how often use extends it (better-auth's settings). */
export const sessionLifetime = { expiresInSeconds: 7 * day, updateAgeSeconds: day };

/**
 * Whether better-auth would extend this session now: a day has passed since it was last
 * extended (its expiry was then set a full lifetime ahead).
 */
export function sessionNeedsRefresh(expiresAt: string, now: Date): boolean {
  const lastExtended = Date.parse(expiresAt) - sessionLifetime.expiresInSeconds * 1000;
  return lastExtended + sessionLifetime.updateAgeSeconds * 1000 <= now.getTime();
}
