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
import { formatMoney } from '@/shared/money/format';

import { CheckSummary } from '../condition-check/check-summary';
import { Differences } from '../condition-check/differences';

/** One piece on the venue's shelf, as its label's QR code opens it. */
export function VenuePieceScreen({ lineId }: { lineId: number }) {
  const query = useVenuePieceQuery(lineId);
  if (query.isPending) return <LoadingView message="Fetching the piece…" />;
  if (query.isError) {
    return (
      <Screen testID="venue-piece-screen">
        <TextLink href="/venue" label="All consignments" />
        <ErrorView error={query.error} onRetry={() => query.refetch()} />
      </Screen>
    );
  }
  const { studio, consignment, line } = query.data;
  const check = line.arrivalCheck ?? line.dispatchCheck;
  return (
    <Screen testID="venue-piece-screen">
      <TextLink href={`/venue/consignments/${consignment.id}`} label={consignment.title} />
      <Card style={styles.card}>
        <SquareImage uri={line.thumbnailUrl} size={240} label={`${line.title}, cover photo`} />
        <View style={styles.what}>
          <Text variant="small">{`${line.stockNumber} · ${studio.name}`}</Text>
          <Heading level={1}>{line.title}</Heading>
          <Text variant="number" testID="venue-piece-price">
            {formatMoney(line.listPrice)}
          </Text>
          <StateMark look={lineStateLooks[line.state]} />
          <Text variant="small">{`On consignment ${consignment.reference}.`}</Text>
        </View>
      </Card>
      {check ? (
        <Card style={styles.card}>
          <Heading level={2}>Condition</Heading>
          <CheckSummary check={check} testID="venue-piece-check" />
          <Differences differences={line.differences} testID="venue-piece-differences" />
        </Card>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  what: { gap: spacing.xs, alignItems: 'flex-start' },
});
