import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { counted, formatDate } from '@/components/ui/format';
import { StateMark } from '@/components/ui/state-mark';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { lineStateLooks } from '@/constants/states';
import { palette, spacing } from '@/constants/theme';
import { useWorkHistoryQuery } from '@/hooks/queries/works';
import { formatMoney } from '@/shared/money/format';

const stageWords = {
  dispatch: 'At dispatch',
  arrival: 'On arrival',
  return: 'On return',
  claim: 'For a claim',
};

/** Where the work has been sent and what state it was found in each time. */
export function WorkHistory({ workId }: { workId: number }) {
  const history = useWorkHistoryQuery(workId);
  return (
    <View style={styles.sections}>
      <View style={styles.section}>
        <Heading level={2}>Consignment history</Heading>
        {history.isPending ? (
          <LoadingView message="Fetching where it has been…" />
        ) : history.isError ? (
          <ErrorView error={history.error} onRetry={() => history.refetch()} />
        ) : history.data.consignments.length === 0 ? (
          <EmptyView
            title="Never sent out"
            message="When this piece goes out on consignment, each venue and what happened there is listed here."
          />
        ) : (
          <Card role="list" style={styles.list}>
            {history.data.consignments.map((line, index) => (
              <View
                key={line.lineId}
                role="listitem"
                style={[styles.item, index > 0 && styles.divided]}
              >
                <Text variant="bodyStrong">{`${line.reference} · ${line.venueName}`}</Text>
                <Text variant="small">{line.title}</Text>
                <StateMark look={lineStateLooks[line.lineState]} />
                <Text variant="number">
                  {line.salePrice
                    ? `Sold for ${formatMoney(line.salePrice)}${line.soldOn ? ` on ${formatDate(line.soldOn)}` : ''}`
                    : `Listed at ${formatMoney(line.listPrice)}`}
                </Text>
              </View>
            ))}
          </Card>
        )}
      </View>
      <View style={styles.section}>
        <Heading level={2}>Condition reports</Heading>
        {history.isPending ? null : history.isError ? null : history.data.conditionReports
            .length === 0 ? (
          <EmptyView
            title="No condition reports yet"
            message="Each check at dispatch, arrival and return is kept here, so any change shows."
          />
        ) : (
          <Card role="list" style={styles.list}>
            {history.data.conditionReports.map((report, index) => (
              <View
                key={report.id}
                role="listitem"
                style={[styles.item, index > 0 && styles.divided]}
              >
                <Text variant="bodyStrong">{`${stageWords[report.stage]} · ${formatDate(report.examinedOn)}`}</Text>
                <Text variant="small">{`Grade: ${report.grade} · ${report.examinerName} · ${counted(report.findingCount, 'finding')}`}</Text>
              </View>
            ))}
          </Card>
        )}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  sections: { gap: spacing.xl },
  section: { gap: spacing.md },
  list: { gap: 0 },
  item: { paddingVertical: spacing.sm, gap: spacing.xxs },
  divided: { borderTopWidth: 1, borderTopColor: palette.hairline },
});
