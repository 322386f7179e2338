import { StyleSheet, View } from 'react-native';

import { spacing } from '@/constants/theme';

import { Button } from './button';
import { Text } from './text';

type PagerProps = {
  page: number;
  pageCount: number;
  total: number;
  noun: [one: string, many: string];
  onPage: (page: number) => void;
  testID: string;
};

/** Earlier and later pages of a list the server pages, and where in it you are. */
export function Pager({ page, pageCount, total, noun, onPage, testID }: PagerProps) {
  const pages = Math.max(1, pageCount);
  return (
    <View testID={testID} role="navigation" aria-label="Pages" style={styles.pager}>
      <Text variant="small" testID={`${testID}-summary`} style={styles.summary}>
        {`${total} ${total === 1 ? noun[0] : noun[1]} · page ${page} of ${pages}`}
      </Text>
      <View style={styles.buttons}>
        <Button
          testID={`${testID}-previous`}
          label="Previous"
          variant="secondary"
          disabled={page <= 1}
          onPress={() => onPage(page - 1)}
        />
        <Button
          testID={`${testID}-next`}
          label="Next"
          variant="secondary"
          disabled={page >= pages}
          onPress={() => onPage(page + 1)}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  pager: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
  },
  summary: { fontVariant: ['tabular-nums'] },
  buttons: { flexDirection: 'row', gap: spacing.sm },
});
