import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { formatDate } from '@/components/ui/format';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { SquareImage } from '@/components/ui/square-image';
import { StateMark } from '@/components/ui/state-mark';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { consignmentStateLooks, lineStateLooks } from '@/constants/states';
import { palette, spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useAcknowledgeMutation } from '@/hooks/queries/consignments';
import { useVenueConsignmentQuery } from '@/hooks/queries/venue-home';
import { useMeQuery } from '@/hooks/session';
import { formatMoney } from '@/shared/money/format';
import { type Consignment } from '@/shared/schemas/consignment';
import { termsInWords } from '@/shared/terms/terms-in-words';

import { CheckSummary } from '../condition-check/check-summary';
import { Differences } from '../condition-check/differences';
import { draftFrom } from '../condition-check/finding-form';
import { today } from '../condition-check/today';
import { DocumentLinks } from '../consignment/document-links';
import { TermsInWords } from '../consignment-form/terms-in-words';
import { type ArrivalCheck, ArrivalPiece } from './arrival-piece';
import { TillReceipt } from './till-receipt';

function Acknowledge({ consignment }: { consignment: Consignment }) {
  const me = useMeQuery();
  const acknowledge = useAcknowledgeMutation(consignment.id);
  const [checks, setChecks] = useState<Record<number, ArrivalCheck | null>>({});
  const examiner = me.data?.user.name ?? '';
  const lines = consignment.lines.filter((l) => l.state === 'consigned');
  const differing = Object.values(checks).filter(Boolean).length;

  const send = () =>
    acknowledge.mutate({
      reports: lines.map((line) => {
        const check = checks[line.id] ?? {
          examinerName: examiner,
          examinedOn: today(),
          notes: null,
          findings: (line.dispatchCheck?.findings ?? []).map(draftFrom),
        };
        return {
          lineId: line.id,
          examinerName: check.examinerName,
          examinedOn: check.examinedOn,
          notes: check.notes ?? null,
          findings: check.findings.map(({ photoUrl: _url, ...finding }) => finding),
        };
      }),
    });

  return (
    <Card style={styles.section} testID="acknowledge">
      <Heading level={2}>What arrived</Heading>
      <Text>
        Check each piece against how it was sent. Where all is as sent, there is nothing to do;
        where something differs, say what, with a photo.
      </Text>
      <View role="list">
        {lines.map((line) => (
          <ArrivalPiece
            key={line.id}
            line={line}
            examinerName={examiner}
            check={checks[line.id] ?? null}
            onChange={(check) => setChecks((all) => ({ ...all, [line.id]: check }))}
          />
        ))}
      </View>
      {acknowledge.isError ? (
        <Notice testID="acknowledge-error" message={errorMessage(acknowledge.error)} />
      ) : null}
      <View style={styles.start}>
        <Button
          testID="acknowledge-submit"
          label={`Acknowledge arrival of ${lines.length} ${lines.length === 1 ? 'piece' : 'pieces'}`}
          busyLabel="Acknowledging…"
          busy={acknowledge.isPending}
          onPress={send}
        />
      </View>
      <Text variant="small">
        {differing === 0
          ? 'Every piece as sent.'
          : `${differing} ${differing === 1 ? 'piece differs' : 'pieces differ'} from how it was sent; the studio will see it.`}
      </Text>
    </Card>
  );
}

function Pieces({ consignment }: { consignment: Consignment }) {
  return (
    <Card style={styles.section}>
      <Heading level={2}>The pieces</Heading>
      <View role="list">
        {consignment.lines
          .filter((l) => l.state !== 'withdrawn')
          .map((line) => (
            <View
              key={line.id}
              role="listitem"
              style={styles.piece}
              testID={`venue-piece-${line.id}`}
            >
              <View style={styles.top}>
                <SquareImage
                  uri={line.thumbnailUrl}
                  size={88}
                  label={`${line.title}, cover photo`}
                />
                <View style={styles.what}>
                  <Text variant="small">{line.stockNumber}</Text>
                  <TextLink
                    href={{
                      pathname: '/venue/piece/[lineId]',
                      params: { lineId: String(line.id) },
                    }}
                    label={line.title}
                    testID={`venue-piece-${line.id}-open`}
                  />
                  <Text variant="number">{formatMoney(line.listPrice)}</Text>
                  <StateMark look={lineStateLooks[line.state]} />
                  {line.sale ? (
                    <Text variant="small">
                      {`Sold ${formatDate(line.sale.soldOn)} for ${formatMoney(line.sale.price)}`}
                    </Text>
                  ) : line.resolution ? (
                    <Text variant="small">{formatDate(line.resolution.on)}</Text>
                  ) : null}
                </View>
              </View>
              {line.arrivalCheck ? (
                <CheckSummary check={line.arrivalCheck} testID={`venue-piece-${line.id}-arrival`} />
              ) : null}
              <Differences
                differences={line.differences}
                testID={`venue-piece-${line.id}-differences`}
              />
            </View>
          ))}
      </View>
    </Card>
  );
}

/** A consignment on the venue's side: what was sent, its terms, and arrival to acknowledge. */
export function VenueConsignmentScreen({ id }: { id: number }) {
  const query = useVenueConsignmentQuery(id);
  const c = query.data;
  return (
    <Screen testID="venue-consignment-screen">
      <View style={styles.heading}>
        <TextLink href="/venue" label="The counter" />
        {c ? (
          <>
            <Text variant="small">{`${c.reference} · from ${c.studio.name}`}</Text>
            <Heading level={1}>{c.title}</Heading>
            <StateMark look={consignmentStateLooks[c.state]} />
            <Text variant="small">
              {c.state === 'agreed'
                ? 'Agreed, not yet sent.'
                : c.dispatchDate
                  ? `Sent ${formatDate(c.dispatchDate)}${c.closingDate ? `; closes ${formatDate(c.closingDate)}` : ''}.`
                  : ''}
            </Text>
          </>
        ) : null}
      </View>
      {query.isPending ? (
        <LoadingView message="Fetching the consignment…" />
      ) : query.isError ? (
        <ErrorView error={query.error} onRetry={() => query.refetch()} />
      ) : (
        <>
          {query.data.state === 'dispatched' ? (
            <Acknowledge consignment={query.data} />
          ) : (
            <>
              {query.data.state === 'on-show' ? <TillReceipt consignment={query.data} /> : null}
              <Pieces consignment={query.data} />
            </>
          )}
          {query.data.acknowledgedAt ? (
            <Text variant="small" testID="venue-acknowledged">
              {`Arrival acknowledged${query.data.acknowledgedBy ? ` by ${query.data.acknowledgedBy}` : ''} on ${formatDate(query.data.acknowledgedAt.slice(0, 10))}.`}
            </Text>
          ) : null}
          <Card style={styles.section}>
            <Heading level={2}>Documents</Heading>
            <Text>
              The consignment sheet, the condition report (with your arrival check once made) and
              the shelf labels, to print on A4.
            </Text>
            <DocumentLinks id={query.data.id} reference={query.data.reference} />
          </Card>
          <Card style={styles.section}>
            <Heading level={2}>Terms</Heading>
            <TermsInWords lines={termsInWords(query.data.terms)} />
          </Card>
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs, alignItems: 'flex-start' },
  section: { gap: spacing.md },
  start: { alignSelf: 'flex-start' },
  piece: {
    gap: spacing.sm,
    paddingVertical: spacing.md,
    borderTopWidth: 1,
    borderTopColor: palette.hairline,
  },
  top: { flexDirection: 'row', gap: spacing.md },
  what: { flex: 1, gap: 2 },
});
