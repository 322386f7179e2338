import { StyleSheet, View } from 'react-native';

import { stickyOnWeb } from '@/components/ui/sticky';
import { Text } from '@/components/ui/text';
import { palette, spacing } from '@/constants/theme';
import { formatMoney } from '@/shared/money/format';
import { makerNet } from '@/shared/money/split';

import { previewSplit } from './preview-split';
import { type TermsFormValues } from './terms-form-values';

/** One line of what the sample sale nets, for a bar that stays in view while terms change. */
export function netSummaryText(values: TermsFormValues, sampleText: string): string {
  const preview = previewSplit(values, sampleText);
  if (preview.kind === 'incomplete') return 'Complete the rates to see your net.';
  if (preview.kind === 'no-sample') return 'Enter a sample price below to see the split.';
  if (preview.kind === 'share-below-zero') return 'The commission and its VAT exceed the sale.';
  const { terms, split, sample } = preview;
  const receive = `On ${formatMoney(sample)} you receive ${formatMoney(split.makerShare)}`;
  return terms.makerVatRegistered
    ? `${receive}, ${formatMoney(makerNet(split))} after VAT`
    : receive;
}

// At the foot of the screen while the fields above it scroll past.
const stuck = stickyOnWeb('bottom');

/**
 * The net preview in one line at the bottom of the screen, on a phone, where the full preview
 * sits below the terms and out of sight while they are changed.
 */
export function NetSummary({
  values,
  sampleText,
}: {
  values: TermsFormValues;
  sampleText: string;
}) {
  return (
    <View testID="net-summary" style={[styles.bar, stuck]}>
      <Text variant="bodyStrong" testID="net-summary-text">
        {netSummaryText(values, sampleText)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    marginTop: spacing.md,
    marginHorizontal: -spacing.lg,
    paddingHorizontal: spacing.lg,
    paddingVertical: spacing.sm,
    backgroundColor: palette.accentSoft,
    borderTopWidth: 1,
    borderTopColor: palette.accent,
  },
});
