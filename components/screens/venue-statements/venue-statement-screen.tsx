import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { DownloadLink } from '@/components/ui/download-link';
import { goToAddress } from '@/components/ui/go-to-address';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import {
  statementPdfPath,
  useCheckoutMutation,
  useStatementQuery,
} from '@/hooks/queries/statements';
import { formatMoney } from '@/shared/money/format';
import { type Statement } from '@/shared/schemas/statement';

import { StatementBalance } from '../statement/statement-balance';
import { statementDates, StatementLines } from '../statement/statement-figures';
import { StatementHeading } from '../statement/statement-heading';

/** How the person came back from the payment page, if they did. */
export type PaymentReturn = 'done' | 'cancelled' | null;

const paidOnline = (s: Statement) => s.payments.some((p) => p.method === 'online');

function PayOnline({ statement }: { statement: Statement }) {
  const checkout = useCheckoutMutation(statement.id);
  return (
    <View style={styles.pay}>
      <Button
        testID="statement-pay-online"
        label={`Pay ${formatMoney(statement.balance)} online`}
        busyLabel="Opening the payment page…"
        busy={checkout.isPending || checkout.isSuccess}
        size="large"
        onPress={() => checkout.mutate(undefined, { onSuccess: ({ url }) => goToAddress(url) })}
      />
      <Text variant="small">
        By card on the payment provider’s secure page; you come back here afterwards. Or pay by bank
        transfer, quoting {statement.reference}.
      </Text>
      {checkout.isError ? (
        <Notice testID="statement-pay-error" message={errorMessage(checkout.error)} />
      ) : null}
    </View>
  );
}

function ReturnNotice({ statement, payment }: { statement: Statement; payment: PaymentReturn }) {
  if (payment === 'cancelled') {
    return (
      <Text testID="statement-payment-cancelled">
        The payment was cancelled and nothing was taken. Pay whenever you are ready.
      </Text>
    );
  }
  if (payment !== 'done') return null;
  return paidOnline(statement) ? (
    <Notice
      tone="info"
      testID="statement-payment-received"
      message="Payment received: thank you."
    />
  ) : (
    <LoadingView message="Waiting for the payment to come through…" />
  );
}

/** A statement as the venue sees it: the sales, what is owed, what was paid, and a way to pay. */
export function VenueStatementScreen({ id, payment }: { id: number; payment: PaymentReturn }) {
  const query = useStatementQuery(id, payment === 'done' ? paidOnline : undefined);
  const s = query.data;
  return (
    <Screen testID="venue-statement-screen">
      <StatementHeading statement={s} backHref="/venue/statements" />
      {query.isPending ? (
        <LoadingView message="Fetching the statement…" />
      ) : query.isError ? (
        <ErrorView error={query.error} onRetry={() => query.refetch()} />
      ) : (
        <>
          <ReturnNotice statement={query.data} payment={payment} />
          <Text testID="statement-dates">{statementDates(query.data)}</Text>
          <Card style={styles.section}>
            <Heading level={2}>To pay</Heading>
            <StatementBalance statement={query.data} side="venue" />
            {query.data.state === 'issued' && query.data.balance.amount > 0 ? (
              <PayOnline statement={query.data} />
            ) : null}
          </Card>
          <View style={styles.section}>
            <Heading level={2}>Sales</Heading>
            <StatementLines statement={query.data} />
          </View>
          <View style={styles.documents}>
            <DownloadLink
              testID="statement-pdf"
              href={statementPdfPath(query.data.id)}
              fileName={`${query.data.reference}.pdf`}
              label="Statement (PDF)"
            />
          </View>
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.md },
  pay: { gap: spacing.sm },
  documents: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
