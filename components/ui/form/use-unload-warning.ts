/** Closing an app on a phone keeps its state, so there is nothing to warn about there. */
export function useUnloadWarning(_active: boolean): void {}
