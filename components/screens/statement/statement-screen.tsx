import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { DownloadLink } from '@/components/ui/download-link';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import {
  statementPdfPath,
  useStatementIssueMutation,
  useStatementQuery,
} from '@/hooks/queries/statements';
import { useActiveRole } from '@/hooks/session';
import { type Statement } from '@/shared/schemas/statement';

import { AdjustmentForm } from './adjustment-form';
import { PaymentForm } from './payment-form';
import { StatementBalance } from './statement-balance';
import { statementDates, StatementLines, StatementVat } from './statement-figures';
import { StatementHeading } from './statement-heading';

/** A draft's one action, confirmed first: issuing cannot be taken back. */
function IssueStep({ statement }: { statement: Statement }) {
  const issue = useStatementIssueMutation(statement.id);
  const [confirming, setConfirming] = useState(false);
  const empty = statement.lines.length === 0;
  return (
    <Card testID="statement-issue" style={styles.section}>
      <Heading level={2}>Issue the statement</Heading>
      <Text>
        A draft follows the sales: a sale recorded or undone meanwhile changes it. Check the figures
        above, then issue it.
      </Text>
      {confirming ? (
        <View style={styles.section} testID="statement-issue-confirm">
          <Text variant="bodyStrong">
            {`Issuing freezes these figures, locks the ${statement.lines.length === 1 ? 'sale' : `${statement.lines.length} sales`} so ${statement.lines.length === 1 ? 'it' : 'they'} can no longer be undone, and e-mails the statement with a link to pay to ${statement.venue.name}.`}
          </Text>
          <View style={styles.buttons}>
            <Button
              testID="statement-issue-confirm-button"
              label="Issue and e-mail it"
              busyLabel="Issuing…"
              busy={issue.isPending}
              onPress={() => issue.mutate(undefined, { onSuccess: () => setConfirming(false) })}
            />
            <Button label="Not yet" variant="quiet" onPress={() => setConfirming(false)} />
          </View>
        </View>
      ) : (
        <View style={styles.start}>
          <Button
            testID="statement-issue-button"
            label="Issue…"
            disabled={empty}
            onPress={() => setConfirming(true)}
          />
        </View>
      )}
      {issue.isError ? (
        <Notice testID="statement-issue-error" message={errorMessage(issue.error)} />
      ) : null}
    </Card>
  );
}

/** After issue: what came in, what explains any difference, and what is left. */
function PaymentStep({ statement, owner }: { statement: Statement; owner: boolean }) {
  const [open, setOpen] = useState<'payment' | 'adjustment' | null>(null);
  const s = statement;
  const open_ = s.state === 'issued';
  return (
    <Card testID="statement-payments" style={styles.section}>
      <Heading level={2}>Payment</Heading>
      <StatementBalance statement={s} side="studio" />
      {owner && open_ && open === 'payment' ? (
        <PaymentForm statement={s} onDone={() => setOpen(null)} />
      ) : owner && open_ && open === 'adjustment' ? (
        <AdjustmentForm statement={s} onDone={() => setOpen(null)} />
      ) : owner && open_ ? (
        <View style={styles.buttons}>
          <Button
            testID="statement-record-payment"
            label="Record a payment"
            onPress={() => setOpen('payment')}
          />
          {s.payments.length > 0 ? (
            <Button
              testID="statement-explain"
              label="Explain the difference"
              variant="secondary"
              onPress={() => setOpen('adjustment')}
            />
          ) : null}
        </View>
      ) : null}
      {s.state === 'issued' && s.payments.length === 0 ? (
        <Text variant="small">
          {`${s.venue.name} can pay online from the link in the statement's e-mail; a remittance by bank transfer or cheque is recorded here.`}
        </Text>
      ) : null}
    </Card>
  );
}

function Body({ statement }: { statement: Statement }) {
  const owner = useActiveRole() === 'owner';
  const s = statement;
  return (
    <>
      <Text testID="statement-dates">{statementDates(s)}</Text>
      <View style={styles.section}>
        <Heading level={2}>Sales</Heading>
        <StatementLines statement={s} />
        <StatementVat statement={s} />
      </View>
      <View style={styles.documents}>
        <DownloadLink
          testID="statement-pdf"
          href={statementPdfPath(s.id)}
          fileName={`${s.reference}.pdf`}
          label={s.state === 'draft' ? 'Draft statement (PDF)' : 'Statement (PDF)'}
        />
      </View>
      {s.state === 'draft' ? (
        owner ? (
          <IssueStep statement={s} />
        ) : (
          <Text>The owner checks and issues the statement.</Text>
        )
      ) : (
        <PaymentStep statement={s} owner={owner} />
      )}
    </>
  );
}

/** One statement, as the studio sees it: its sales, its figures, then issue and payment. */
export function StatementScreen({ id }: { id: number }) {
  const query = useStatementQuery(id);
  const s = query.data;
  return (
    <Screen testID="statement-screen">
      <StatementHeading statement={s} backHref="/statements">
        {s?.consignment ? (
          <TextLink
            href={{ pathname: '/consignments/[id]', params: { id: String(s.consignment.id) } }}
            label={`Consignment ${s.consignment.reference}`}
            testID="statement-consignment"
          />
        ) : null}
      </StatementHeading>
      {query.isPending ? (
        <LoadingView message="Fetching the statement…" />
      ) : query.isError ? (
        <ErrorView error={query.error} onRetry={() => query.refetch()} />
      ) : (
        <Body statement={query.data} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  start: { alignSelf: 'flex-start' },
  documents: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
