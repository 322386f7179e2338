import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';

/** Terms as plain sentences, one a line: what both sides agree to. */
export function TermsInWords({ lines, testID }: { lines: string[]; testID?: string }) {
  return (
    <View role="list" testID={testID} style={styles.list}>
      {lines.map((line) => (
        <Text key={line} role="listitem">
          {line}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ list: { gap: spacing.xs } });
