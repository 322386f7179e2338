/**
 * Long work in slices: between slices the event loop answers other requests, so a large import or
 * export never stalls the server (one Node.js thread serves every request).
 */
export const yieldToEventLoop = () => new Promise<void>((resolve) => setImmediate(resolve));

/** `items.map(fn)`, a slice at a time. */
export async function mapInSlices<T, R>(
  items: readonly T[],
  fn: (item: T) => R,
  sliceSize = 250,
): Promise<R[]> {
  const results: R[] = [];
  for (let i = 0; i < items.length; i += sliceSize) {
    if (i > 0) await yieldToEventLoop();
    for (const item of items.slice(i, i + sliceSize)) results.push(fn(item));
  }
  return results;
}

/** Runs `work` on each slice of `items` in turn. */
export async function eachSlice<T>(
  items: readonly T[],
  work: (slice: readonly T[]) => Promise<void>,
  sliceSize = 200,
): Promise<void> {
  for (let i = 0; i < items.length; i += sliceSize) {
    if (i > 0) await yieldToEventLoop();
    await work(items.slice(i, i + sliceSize));
  }
}
