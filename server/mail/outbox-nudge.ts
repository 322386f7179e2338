type Listener = () => void;

const listeners = new Set<Listener>();

/**
 * Tells this process's mail workers that a message was just written, so it goes out at once
 * rather than at the next sweep. Only a hint: a worker finds due messages without it, whichever
 * process wrote them.
 */
export function nudgeOutbox(): void {
  for (const listener of listeners) listener();
}

/** Subscribes to nudges; answers the function that unsubscribes. */
export function onOutboxNudge(listener: Listener): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
