import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { MoneyField } from '@/components/ui/money-field';
import { MoneyLine } from '@/components/ui/money-line';
import { Heading, Text } from '@/components/ui/text';
import { palette, spacing } from '@/constants/theme';
import { makerNet, venueKeeps } from '@/shared/money/split';

import { firstSample, previewSplit } from './preview-split';
import { type TermsFormValues } from './terms-form-values';

type NetPreviewProps = {
  values: TermsFormValues;
  /** The sample price and its setter, when a summary elsewhere on the page follows it too. */
  sample?: [string, (text: string) => void];
};

/**
 * What the maker nets on a sample sale under the terms as they stand in the form, worked out on
 * the client by the shared money engine as a preview; the server works it out again for real.
 */
export function NetPreview({ values, sample }: NetPreviewProps) {
  const currency = values.currency.trim().toUpperCase();
  const own = useState(firstSample);
  const [sampleText, setSampleText] = sample ?? own;
  const preview = previewSplit(values, sampleText);

  let body: React.ReactNode;
  if (preview.kind === 'incomplete') {
    body = <Text variant="small">Complete the rates above to see what you would net.</Text>;
  } else if (preview.kind === 'no-sample') {
    body = <Text variant="small">Enter a sample price to see the split.</Text>;
  } else if (preview.kind === 'share-below-zero') {
    body = (
      <Text style={styles.problem}>
        Under these terms the commission and its VAT would be more than the sale brings in.
      </Text>
    );
  } else {
    const { terms, split } = preview;
    const registered = terms.makerVatRegistered;
    body = (
      <View style={styles.lines} aria-live="polite">
        <MoneyLine label="The buyer pays" money={preview.sample} testID="net-preview-price" />
        <MoneyLine
          label="The venue keeps"
          money={venueKeeps(terms, split)}
          testID="net-preview-venue"
        />
        {terms.commissionVat !== 'none' ? (
          <MoneyLine
            label="of which VAT on commission"
            money={split.vatOnCommission}
            testID="net-preview-vat"
          />
        ) : null}
        <MoneyLine
          label="You receive"
          money={split.makerShare}
          testID="net-preview-share"
          strong={!registered}
        />
        {registered ? (
          <MoneyLine
            label="You net after VAT"
            money={makerNet(split)}
            testID="net-preview-net"
            strong
          />
        ) : null}
        <MoneyLine label="Insured for" money={split.insuranceValue} testID="net-preview-insured" />
      </View>
    );
  }

  return (
    <Card testID="net-preview" style={styles.card}>
      <Heading level={3}>What you would net</Heading>
      <MoneyField
        testID="net-preview-sample"
        label="On a sale at"
        currency={/^[A-Z]{3}$/.test(currency) ? currency : 'GBP'}
        value={sampleText}
        onChangeText={setSampleText}
      />
      {body}
      <Text variant="small">
        A preview from Saggar’s money rules; VAT figures are guidance, so check them with HMRC or an
        accountant.
      </Text>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md, backgroundColor: palette.accentSoft, borderColor: palette.accent },
  lines: { gap: spacing.xs },
  problem: { color: palette.danger },
});
