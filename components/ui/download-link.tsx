import { Linking } from 'react-native';

import { Button } from './button';

type DownloadLinkProps = { href: string; fileName: string; label: string; testID: string };

/** Native: hand the address to the system, which downloads or opens it. */
export function DownloadLink({ href, label, testID }: DownloadLinkProps) {
  return (
    <Button
      testID={testID}
      label={label}
      variant="secondary"
      onPress={() => void Linking.openURL(href)}
    />
  );
}
