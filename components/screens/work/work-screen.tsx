import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { Caution } from '@/components/ui/caution';
import { FieldList } from '@/components/ui/field-list';
import { formatDimensions, formatWeight } from '@/components/ui/format';
import { Screen } from '@/components/ui/screen';
import { StateMark } from '@/components/ui/state-mark';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { workStatusLooks } from '@/constants/states';
import { spacing } from '@/constants/theme';
import { useWorkQuery } from '@/hooks/queries/works';
import { nearestCone } from '@/shared/firing/cones';
import { formatMoney } from '@/shared/money/format';
import { heavyWeightG, type Work } from '@/shared/schemas/work';
import { foodSafeNote, foodUseWords } from '@/shared/works/food-use';

import { ArchivedBanner } from './archived-banner';
import { WorkActions } from './work-actions';
import { WorkHistory } from './work-history';
import { WorkPhotos } from './work-photos';

function firingLine(work: Work): string {
  if (work.firingTempC === null) return '—';
  const inRange = work.firingTempC >= 500 && work.firingTempC <= 1600;
  const cone = inRange ? ` (nearest cone ${nearestCone(work.firingTempC, 60).cone})` : '';
  return `${work.firingTempC.toLocaleString('en-GB')} °C${cone}`;
}

function WorkCautions({ work }: { work: Work }) {
  const heavy = work.weightG !== null && work.weightG > heavyWeightG;
  return (
    <View style={styles.cautions}>
      {heavy ? (
        <Caution testID="work-heavy" title={`Heavy piece: ${formatWeight(work.weightG)}`}>
          Over the 16 kg guideline weight in the UK HSE’s manual handling guidance (INDG143), a
          guideline rather than a limit. Plan lifting and carrying with a proper manual handling
          assessment, and mark it on sheets and labels.
        </Caution>
      ) : null}
      {work.foodUse === 'food-safe' ? (
        <Caution testID="work-food-use" title={foodUseWords['food-safe']}>
          {foodSafeNote}
        </Caution>
      ) : (
        <Caution testID="work-food-use" title={foodUseWords[work.foodUse]}>
          {work.foodUse === 'not-stated'
            ? 'No food use was stated, so the piece is shown and labelled as decorative.'
            : 'The maker declares this piece decorative only.'}
        </Caution>
      )}
    </View>
  );
}

function WorkBody({ work }: { work: Work }) {
  const fields = [
    { label: 'Stock number', value: work.stockNumber, numeric: true },
    { label: 'Year', value: work.year === null ? '—' : String(work.year), numeric: true },
    { label: 'Series', value: work.series ?? '—' },
    { label: 'Category', value: work.category ?? '—' },
    { label: 'Clay body', value: work.clayBody ?? '—' },
    { label: 'Glaze', value: work.glaze ?? '—' },
    { label: 'Firing', value: firingLine(work), numeric: true },
    { label: 'Atmosphere', value: work.atmosphere ?? '—' },
    { label: 'Kiln', value: work.kiln ?? '—' },
    {
      label: 'Height × width × depth',
      value: formatDimensions(work.heightMm, work.widthMm, work.depthMm),
      numeric: true,
    },
    { label: 'Weight', value: formatWeight(work.weightG), numeric: true, testID: 'work-weight' },
    { label: 'Retail price', value: formatMoney(work.retailPrice), numeric: true },
    { label: 'Cost', value: work.costPrice ? formatMoney(work.costPrice) : '—', numeric: true },
    { label: 'Food use', value: foodUseWords[work.foodUse] },
    { label: 'Care', value: work.careNotes ?? '—' },
    { label: 'Notes', value: work.notes ?? '—' },
  ];
  return (
    <>
      <View style={styles.heading}>
        <TextLink href="/works" label="All works" />
        <Text variant="small" style={styles.tabular} testID="work-stock-number">
          {work.stockNumber}
        </Text>
        <Heading level={1} testID="work-title">
          {work.title}
        </Heading>
        <View style={styles.where}>
          <StateMark look={workStatusLooks[work.status]} testID="work-status" />
          {work.venue ? <Text variant="small">{`at ${work.venue.name}`}</Text> : null}
        </View>
        {/* Above the photographs, so a phone shows it without scrolling. */}
        <Text variant="heading" style={styles.tabular} testID="work-price">
          {formatMoney(work.retailPrice)}
        </Text>
      </View>
      {work.archivedAt ? <ArchivedBanner work={work} archivedAt={work.archivedAt} /> : null}
      <WorkPhotos work={work} />
      <WorkActions work={work} />
      <WorkCautions work={work} />
      <Card>
        <Heading level={2}>Details</Heading>
        <FieldList items={fields} />
      </Card>
      <WorkHistory workId={work.id} />
    </>
  );
}

export function WorkScreen({ id }: { id: number }) {
  const work = useWorkQuery(id);
  return (
    <Screen testID="work-screen">
      {work.isPending ? (
        <LoadingView message="Fetching the work…" />
      ) : work.isError ? (
        <ErrorView error={work.error} onRetry={() => work.refetch()} />
      ) : (
        <WorkBody work={work.data} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs, alignItems: 'flex-start' },
  where: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  tabular: { fontVariant: ['tabular-nums'] },
  cautions: { gap: spacing.md },
});
