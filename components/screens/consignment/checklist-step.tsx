import { type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { StateMark } from '@/components/ui/state-mark';
import { Heading, Text } from '@/components/ui/text';
import { stepLooks, type StepStatus } from '@/constants/states';
import { palette, spacing } from '@/constants/theme';

type ChecklistStepProps = {
  number: number;
  title: string;
  status: StepStatus;
  /** What is done and what is missing, in a sentence. */
  summary: string;
  testID: string;
  children?: ReactNode;
};

/** One step of a consignment's life: its number, its state by word and shape, and its work. */
export function ChecklistStep({
  number,
  title,
  status,
  summary,
  testID,
  children,
}: ChecklistStepProps) {
  return (
    <Card
      testID={testID}
      role="listitem"
      style={[
        styles.step,
        status === 'current' && styles.current,
        status === 'later' && styles.later,
      ]}
    >
      <View style={styles.top}>
        <Text variant="number" style={styles.number} aria-hidden>
          {number}
        </Text>
        <Heading level={2} style={styles.title}>
          {title}
        </Heading>
        <StateMark look={stepLooks[status]} />
      </View>
      <Text testID={`${testID}-summary`}>{summary}</Text>
      {children}
    </Card>
  );
}

const styles = StyleSheet.create({
  step: { gap: spacing.md },
  current: { borderColor: palette.accent, borderLeftWidth: 4 },
  later: { backgroundColor: palette.paper },
  top: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
  number: { minWidth: 24, color: palette.inkMuted },
  title: { flexGrow: 1, flexShrink: 1 },
});
