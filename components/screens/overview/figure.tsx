import { StyleSheet } from 'react-native';

import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';

type FigureProps = { label: string; value: number; note: string; testID: string };

/** One headline number; the number alone carries the testID so tests can read it exactly. */
export function Figure({ label, value, note, testID }: FigureProps) {
  return (
    <Card style={styles.figure}>
      <Text variant="label">{label}</Text>
      <Text variant="figure" testID={testID}>
        {String(value)}
      </Text>
      <Text variant="small">{note}</Text>
    </Card>
  );
}

const styles = StyleSheet.create({
  figure: { flexGrow: 1, flexBasis: 140 },
});
