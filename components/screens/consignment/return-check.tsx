import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { DownloadLink } from '@/components/ui/download-link';
import { StateGlyph } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { palette, radii, spacing } from '@/constants/theme';
import { useConditionReportMutation } from '@/hooks/queries/consignments';
import { claimPdfPath } from '@/hooks/queries/statements';
import { differenceInWords } from '@/shared/condition/words';
import { formatMoney } from '@/shared/money/format';
import { type ConsignmentLine } from '@/shared/schemas/consignment';

import { CheckForm } from '../condition-check/check-form';
import { draftFrom } from '../condition-check/finding-form';

/** Pieces that come back to the studio, and so are checked on return. */
export const comesBack = (line: ConsignmentLine) =>
  line.state === 'returned' || line.state === 'damaged';

const whereWords = {
  'in-transit': 'Seen on arrival already: most likely in transit to the venue',
  'at-venue': 'Not seen on arrival: most likely at the venue or on the way back',
} as const;

const insurerWords = { maker: 'you (the maker)', venue: 'the venue' } as const;

/**
 * New damage: what the return check found that the dispatch check did not, where it most likely
 * happened, who insured the piece there, and the claim summary to send them.
 */
export function NewDamage({ line, testID }: { line: ConsignmentLine; testID: string }) {
  const damage = line.newDamage;
  if (!damage) return null;
  return (
    <View style={styles.damage} testID={testID} role="note" aria-label="New damage">
      <View style={styles.flag}>
        <StateGlyph shape="diamond" color={palette.danger} />
        <Text variant="bodyStrong">New damage since dispatch</Text>
      </View>
      {damage.differences.map((d, index) => (
        <Text key={index}>{differenceInWords(d)}</Text>
      ))}
      <Text testID={`${testID}-where`}>{`${whereWords[damage.where]}.`}</Text>
      <Text testID={`${testID}-insurer`}>
        {`Insured there by ${insurerWords[damage.insuredBy]}, for ${formatMoney(damage.insuranceValue)}.`}
      </Text>
      <View style={styles.start}>
        <DownloadLink
          testID={`${testID}-claim`}
          href={claimPdfPath(line.id)}
          fileName={`Claim ${line.stockNumber}.pdf`}
          label="Claim summary (PDF)"
        />
      </View>
    </View>
  );
}

/**
 * A returned piece checked against its dispatch check: the form starts from the findings at
 * dispatch, so the examiner changes only what differs.
 */
export function ReturnCheck({
  consignmentId,
  line,
  examinerName,
  testID,
}: {
  consignmentId: number;
  line: ConsignmentLine;
  examinerName: string;
  testID: string;
}) {
  const report = useConditionReportMutation(consignmentId);
  const [open, setOpen] = useState(false);
  if (!comesBack(line) || line.returnCheck) return null;
  if (!open) {
    return (
      <View style={styles.prompt}>
        <Text variant="small">Back in the studio: check it against its condition at dispatch.</Text>
        <View style={styles.start}>
          <Button
            testID={`${testID}-start`}
            label="Check on return"
            variant="secondary"
            onPress={() => setOpen(true)}
          />
        </View>
      </View>
    );
  }
  const sent = (line.dispatchCheck?.findings ?? []).map(draftFrom);
  return (
    <CheckForm
      testID={`${testID}-form`}
      examinerName={examinerName}
      startFrom={sent}
      submitLabel="Save the return check"
      onCancel={() => setOpen(false)}
      onSubmit={async ({ findings, ...header }) => {
        await report.mutateAsync({
          lineId: line.id,
          stage: 'return',
          ...header,
          findings: findings.map(({ photoUrl: _url, ...finding }) => finding),
        });
        setOpen(false);
      }}
    />
  );
}

const styles = StyleSheet.create({
  damage: {
    gap: spacing.xs,
    padding: spacing.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderLeftWidth: 4,
    borderColor: palette.danger,
    backgroundColor: palette.dangerSoft,
  },
  flag: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  prompt: { gap: spacing.xs },
  start: { alignSelf: 'flex-start' },
});
