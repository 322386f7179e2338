import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { StateGlyph } from '@/components/ui/state-mark';
import { Heading, Text } from '@/components/ui/text';
import { palette, spacing } from '@/constants/theme';
import {
  importColumnLabel,
  type ImportDuplicateGroup,
  type ImportProblem,
} from '@/shared/schemas/work-import';

import { duplicateWords } from './duplicate-words';
import { rowNumbersText } from './row-numbers';

type ImportGroupsProps = {
  problems: readonly ImportProblem[];
  duplicates: readonly ImportDuplicateGroup[];
  title?: string;
};

/**
 * Every problem and every kind of duplicate once, with all the rows it concerns: however long the
 * file, this says all of it in a few lines.
 */
export function ImportGroups({
  problems,
  duplicates,
  title = 'Rows that will not be imported',
}: ImportGroupsProps) {
  if (problems.length === 0 && duplicates.length === 0) return null;
  return (
    <Card style={styles.card} testID="import-groups">
      <Heading level={2}>{title}</Heading>
      <View role="list" style={styles.list}>
        {problems.map((problem) => (
          <View
            key={`${problem.field}-${problem.message}`}
            role="listitem"
            style={styles.item}
            testID="import-problem"
          >
            <StateGlyph shape="diamond" color={palette.danger} />
            <View style={styles.words}>
              <Text variant="label">{`${importColumnLabel(problem.field)}: ${problem.message}`}</Text>
              <Text variant="small">{rowNumbersText(problem.rowNumbers)}</Text>
            </View>
          </View>
        ))}
        {duplicates.map((group) => (
          <View
            key={group.kind}
            role="listitem"
            style={styles.item}
            testID={`import-duplicates-${group.kind}`}
          >
            <StateGlyph shape="square" color={palette.ochre} />
            <View style={styles.words}>
              <Text variant="label">{`Duplicate: ${duplicateWords[group.kind].title}`}</Text>
              <Text variant="small">{duplicateWords[group.kind].outcome}</Text>
              <Text variant="small">{rowNumbersText(group.rowNumbers)}</Text>
            </View>
          </View>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  list: { gap: spacing.md },
  item: { flexDirection: 'row', gap: spacing.md, alignItems: 'flex-start' },
  words: { flex: 1, gap: spacing.xxs },
});
