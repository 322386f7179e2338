import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { palette, spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useConditionReportMutation } from '@/hooks/queries/consignments';
import { type Consignment, type ConsignmentLine } from '@/shared/schemas/consignment';

import { CheckForm } from '../condition-check/check-form';
import { CheckSummary } from '../condition-check/check-summary';
import { Differences } from '../condition-check/differences';
import { today } from '../condition-check/today';
import { NewDamage, ReturnCheck } from './return-check';

/** A piece's condition as the maker sees it: the check before it leaves, and later ones. */
export function DispatchCheck({
  consignment,
  line,
  examinerName,
}: {
  consignment: Consignment;
  line: ConsignmentLine;
  examinerName: string;
}) {
  const report = useConditionReportMutation(consignment.id);
  const [open, setOpen] = useState(false);
  const checking = consignment.state === 'draft' || consignment.state === 'agreed';
  const id = `piece-${line.id}-check`;
  return (
    <View style={styles.check}>
      {/* Dispatch, arrival and return side by side where there is room, so change shows. */}
      <View style={styles.checks}>
        {line.dispatchCheck ? (
          <View style={styles.checkCell}>
            <CheckSummary check={line.dispatchCheck} testID={`${id}-dispatch`} />
          </View>
        ) : (
          <Text style={checking ? styles.missing : undefined} testID={`${id}-missing`}>
            Not checked yet.
          </Text>
        )}
        {line.arrivalCheck ? (
          <View style={styles.checkCell}>
            <CheckSummary check={line.arrivalCheck} testID={`${id}-arrival`} />
          </View>
        ) : null}
        {line.returnCheck ? (
          <View style={styles.checkCell}>
            <CheckSummary check={line.returnCheck} testID={`${id}-return`} />
          </View>
        ) : null}
      </View>
      <Differences differences={line.differences} testID={`${id}-differences`} />
      <NewDamage line={line} testID={`${id}-damage`} />
      <ReturnCheck
        consignmentId={consignment.id}
        line={line}
        examinerName={examinerName}
        testID={`${id}-on-return`}
      />
      {checking && !open ? (
        <View style={styles.buttons}>
          <Button
            testID={`${id}-sound`}
            label={line.dispatchCheck ? 'Check again: no faults' : 'No faults found'}
            busyLabel="Saving…"
            busy={report.isPending}
            variant="secondary"
            onPress={() =>
              report.mutate({
                lineId: line.id,
                stage: 'dispatch',
                examinerName,
                examinedOn: today(),
                findings: [],
              })
            }
          />
          <Button
            testID={`${id}-record`}
            label="Record findings"
            variant="quiet"
            onPress={() => setOpen(true)}
          />
        </View>
      ) : null}
      {report.isError ? <Notice message={errorMessage(report.error)} /> : null}
      {checking && open ? (
        <CheckForm
          testID={`${id}-form`}
          examinerName={examinerName}
          startFrom={[]}
          submitLabel="Save the check"
          onCancel={() => setOpen(false)}
          onSubmit={async ({ findings, ...header }) => {
            await report.mutateAsync({
              lineId: line.id,
              stage: 'dispatch',
              ...header,
              findings: findings.map(({ photoUrl: _url, ...finding }) => finding),
            });
            setOpen(false);
          }}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  check: { gap: spacing.sm },
  checks: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  checkCell: { flexGrow: 1, flexBasis: 220 },
  missing: { color: palette.ochre },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
