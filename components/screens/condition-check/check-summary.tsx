import { StyleSheet, View } from 'react-native';

import { formatDate } from '@/components/ui/format';
import { StateMark } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { conditionGradeLooks } from '@/constants/states';
import { spacing } from '@/constants/theme';
import { stageWords } from '@/shared/condition/words';
import { type ConditionCheck } from '@/shared/schemas/condition';

import { FindingsList } from './findings-list';

/** A check as recorded: its stage, who and when, its overall grade by word and shape, and findings. */
export function CheckSummary({ check, testID }: { check: ConditionCheck; testID: string }) {
  return (
    <View style={styles.summary} testID={testID}>
      <View style={styles.top}>
        <Text variant="label">{stageWords[check.stage]}</Text>
        <StateMark look={conditionGradeLooks[check.overallGrade]} />
      </View>
      <Text variant="small">{`Examined by ${check.examinerName}, ${formatDate(check.examinedOn)}`}</Text>
      <FindingsList
        testID={`${testID}-findings`}
        findings={check.findings.map((f) => ({ ...f, photoFileId: null }))}
      />
      {check.notes ? <Text variant="small">{check.notes}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  summary: { gap: spacing.xs },
  top: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
});
