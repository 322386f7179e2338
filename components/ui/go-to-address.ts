import { Linking } from 'react-native';

/** Leaves the app for an address elsewhere (a payment page): the system opens it. */
export function goToAddress(url: string): void {
  void Linking.openURL(url);
}
