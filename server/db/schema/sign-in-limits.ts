/** Sign-in attempts counted per key (`account:<e-mail>` or `address:<ip>`) in a fixed window. */
export interface SignInLimitsTable {
  key: string;
  hits: number;
  /** ISO 8601; the count starts again after it */
  window_ends_at: string;
}
