/** Median, 95th percentile and largest of timings in milliseconds. */
export function stats(samples: readonly number[]) {
  const sorted = [...samples].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))]!;
  return { median: at(0.5), p95: at(0.95), max: sorted.at(-1) ?? 0 };
}

export const ms = (n: number) => `${n.toFixed(1)} ms`;
