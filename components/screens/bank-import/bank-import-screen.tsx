import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Choice } from '@/components/ui/choice';
import { formatDate } from '@/components/ui/format';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useBankMatchMutation, useConfirmBankPaymentMutation } from '@/hooks/queries/bank-imports';
import { formatMoney } from '@/shared/money/format';
import { type BankColumns, type BankMatchResponse } from '@/shared/schemas/bank-import';

import { chooseCsvFile } from '../work-import/read-csv-file';

type Credit = BankMatchResponse['credits'][number];

const byWords = {
  'reference-and-amount': 'its reference and the amount owed',
  reference: 'its reference (the amount differs)',
  amount: 'the amount owed alone',
} as const;

function CreditRow({ credit }: { credit: Credit }) {
  const confirm = useConfirmBankPaymentMutation();
  const { match } = credit;
  return (
    <Card style={styles.credit} testID={`bank-credit-${credit.row}`}>
      <Text variant="bodyStrong">{`${formatMoney(credit.amount)} on ${formatDate(credit.receivedOn)}`}</Text>
      <Text variant="small">{credit.reference || 'No reference'}</Text>
      {match ? (
        <>
          <Text>{`Pays ${match.reference}, ${match.venueName} (balance ${formatMoney(match.balance)}), matched by ${byWords[match.by]}.`}</Text>
          {confirm.isSuccess ? (
            <Notice tone="info" message={`Recorded against ${match.reference}.`} />
          ) : (
            <View style={styles.action}>
              <Button
                testID={`bank-credit-${credit.row}-confirm`}
                label={`Record as a payment of ${match.reference}`}
                busy={confirm.isPending}
                onPress={() =>
                  confirm.mutate({
                    statementId: match.statementId,
                    payment: {
                      amount: credit.amount,
                      receivedOn: credit.receivedOn,
                      method: 'bank-transfer',
                      reference: credit.reference.slice(0, 120) || undefined,
                    },
                  })
                }
              />
            </View>
          )}
          {confirm.isError ? <Notice message={errorMessage(confirm.error)} /> : null}
        </>
      ) : (
        <Text variant="small">No open statement matches this credit.</Text>
      )}
    </Card>
  );
}

const columnWords: Record<keyof BankColumns, string> = {
  date: 'The date',
  amount: 'The amount paid in',
  reference: 'The reference or description',
};

/**
 * A bank statement's CSV: each credit paired with the issued statement it seems to pay, which the
 * maker records as a payment one by one. The columns are chosen once and remembered.
 */
export function BankImportScreen() {
  const match = useBankMatchMutation();
  const [csv, setCsv] = useState<string | null>(null);
  const [columns, setColumns] = useState<Partial<BankColumns>>({});
  const result = match.data;
  const choose = async () => {
    const file = await chooseCsvFile();
    if (!file) return;
    setCsv(file.text);
    match.mutate({ csv: file.text });
  };
  const complete = (c: Partial<BankColumns>): c is BankColumns =>
    Boolean(c.date && c.amount && c.reference);
  return (
    <Screen testID="bank-import-screen" narrow>
      <Heading level={1}>Payments from a bank statement</Heading>
      <Text variant="small">
        Choose your bank statement as a CSV file. Each amount paid in is matched to the statement it
        seems to pay, by its reference and the balance owed; nothing is recorded until you confirm
        it.
      </Text>
      <View style={styles.action}>
        <Button
          testID="bank-import-choose"
          label="Choose the CSV file"
          busy={match.isPending}
          onPress={choose}
        />
      </View>
      {match.isError ? <Notice message={errorMessage(match.error)} /> : null}
      {result && result.columns === null && csv ? (
        <Card style={styles.credit} testID="bank-import-columns">
          <Text>Which column holds what? This is remembered for your next file.</Text>
          {(Object.keys(columnWords) as (keyof BankColumns)[]).map((field) => (
            <Choice
              key={field}
              label={columnWords[field]}
              options={result.headers.map((h) => ({ value: h, label: h }))}
              value={columns[field]}
              onChange={(value) => setColumns({ ...columns, [field]: value })}
              testID={`bank-import-column-${field}`}
            />
          ))}
          <View style={styles.action}>
            <Button
              testID="bank-import-columns-done"
              label="Read the file with these columns"
              onPress={() => {
                if (complete(columns)) match.mutate({ csv, columns });
              }}
            />
          </View>
        </Card>
      ) : null}
      {result && result.columns ? (
        <View style={styles.list}>
          <Heading level={2}>{`Amounts paid in (${result.credits.length})`}</Heading>
          {result.credits.map((credit) => (
            <CreditRow key={credit.row} credit={credit} />
          ))}
          {result.skipped.length > 0 ? (
            <Text variant="small">
              {`Left out: ${result.skipped.map((s) => `row ${s.row} (${s.reason})`).join('; ')}`}
            </Text>
          ) : null}
        </View>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  credit: { gap: spacing.sm },
  action: { alignSelf: 'flex-start' },
  list: { gap: spacing.md },
});
