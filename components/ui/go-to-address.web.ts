/** Leaves the app for an address elsewhere (a payment page), in the same tab, which comes back. */
export function goToAddress(url: string): void {
  window.location.assign(url);
}
