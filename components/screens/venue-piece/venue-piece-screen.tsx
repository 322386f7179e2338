import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { SquareImage } from '@/components/ui/square-image';
import { StateMark } from '@/components/ui/state-mark';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { lineStateLooks } from '@/constants/states';
import { spacing } from '@/constants/theme';
import { useVenuePieceQuery } from '@/hooks/queries/venue-home';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { formatMoney } from '@/shared/money/format';

import { CheckSummary } from '../condition-check/check-summary';
import { Differences } from '../condition-check/differences';
import { PieceOutcome } from '../sale/piece-outcome';

/**
 * One piece on the venue's shelf, as its label's QR code opens it: what it is, then "Sold" within
 * a thumb's reach, the other ways out, and its condition.
 */
export function VenuePieceScreen({ lineId, sell = false }: { lineId: number; sell?: boolean }) {
  const query = useVenuePieceQuery(lineId);
  const { wide } = useBreakpoint();
  // On a phone the photo steps back while a form is open, so the form fits under the thumb.
  const [selling, setSelling] = useState(sell);
  const compact = selling && !wide;
  if (query.isPending) return <LoadingView message="Fetching the piece…" />;
  if (query.isError) {
    return (
      <Screen testID="venue-piece-screen">
        <TextLink href="/venue" label="All pieces" />
        <ErrorView error={query.error} onRetry={() => query.refetch()} />
      </Screen>
    );
  }
  const { studio, consignment, line } = query.data;
  const check = line.arrivalCheck ?? line.dispatchCheck;
  const outcome = (
    <PieceOutcome
      // A new piece (another label scanned) starts afresh.
      key={line.id}
      line={line}
      consignment={consignment}
      side="venue"
      startWith={sell ? 'sale' : null}
      onFormOpen={setSelling}
      testID="venue-piece-outcome"
    />
  );
  const details = (
    <View style={[styles.what, compact && styles.whatBeside]}>
      <Text variant="small" style={styles.tabular}>
        {`${line.stockNumber} · ${studio.name}`}
      </Text>
      <Heading level={1} testID="venue-piece-title" style={compact && styles.titleCompact}>
        {line.title}
      </Heading>
      <Text variant="number" testID="venue-piece-price">
        {`${formatMoney(line.listPrice)} list price`}
      </Text>
      <StateMark look={lineStateLooks[line.state]} testID="venue-piece-state" />
      {compact ? null : (
        <Text variant="small">{`On consignment ${consignment.reference}, ${consignment.title}.`}</Text>
      )}
    </View>
  );
  return (
    <Screen testID="venue-piece-screen">
      <View style={styles.back}>
        <TextLink href="/venue" label="All pieces" />
      </View>
      {wide ? (
        // Wide: the photo on the left, what it is and what to do with it beside it.
        <Card style={[styles.card, styles.cardRow]}>
          <SquareImage uri={line.thumbnailUrl} size={280} label={`${line.title}, cover photo`} />
          <View style={styles.beside}>
            {details}
            {outcome}
          </View>
        </Card>
      ) : (
        <>
          <Card style={[styles.card, compact && styles.cardRow]}>
            <SquareImage
              uri={line.thumbnailUrl}
              size={compact ? 88 : 200}
              label={`${line.title}, cover photo`}
            />
            {details}
          </Card>
          {outcome}
        </>
      )}
      {check ? (
        <Card style={styles.section}>
          <Heading level={2}>Condition</Heading>
          <CheckSummary check={check} testID="venue-piece-check" />
          <Differences differences={line.differences} testID="venue-piece-differences" />
        </Card>
      ) : null}
      <TextLink
        href={{ pathname: '/venue/consignments/[id]', params: { id: String(consignment.id) } }}
        label={`All of ${consignment.reference}`}
      />
    </Screen>
  );
}

const styles = StyleSheet.create({
  back: { alignItems: 'flex-start', marginBottom: -spacing.md },
  card: { gap: spacing.md },
  cardRow: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.lg },
  what: { gap: spacing.xs, alignItems: 'flex-start' },
  whatBeside: { flex: 1 },
  beside: { flex: 1, gap: spacing.lg },
  titleCompact: { fontSize: 21, lineHeight: 28 },
  section: { gap: spacing.md },
  tabular: { fontVariant: ['tabular-nums'] },
});
