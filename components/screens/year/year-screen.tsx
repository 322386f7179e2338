import { lazy, type ReactNode, Suspense, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Caution } from '@/components/ui/caution';
import { DownloadLink } from '@/components/ui/download-link';
import { FigureTable } from '@/components/ui/figure-table';
import { formatDate } from '@/components/ui/format';
import { Screen } from '@/components/ui/screen';
import { StateMark } from '@/components/ui/state-mark';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { useYearQuery, yearCsvPaths } from '@/hooks/queries/year';
import { formatMoney } from '@/shared/money/format';
import { minorUnitOf, type Money } from '@/shared/schemas/money';
import { type Year, type YearCurrency } from '@/shared/schemas/year';

import { today } from '../condition-check/today';

// The charting library loads with this page only, not with every studio page.
const BarsChart = lazy(async () => ({ default: (await import('./year-charts')).BarsChart }));
const LinesChart = lazy(async () => ({ default: (await import('./year-charts')).LinesChart }));

/** An amount in major units, for drawing only: figures shown as text come from formatMoney. */
const major = (m: Money) => m.amount / 10 ** minorUnitOf(m.currency);

const monthNames = [
  'Jan',
  'Feb',
  'Mar',
  'Apr',
  'May',
  'Jun',
  'Jul',
  'Aug',
  'Sep',
  'Oct',
  'Nov',
  'Dec',
];
/** "2026-03" → "Mar". */
const monthName = (month: string) => monthNames[Number(month.slice(5, 7)) - 1] ?? month;
/** "2026-03" → "Mar 2026". */
const monthYear = (month: string) => `${monthName(month)} ${month.slice(0, 4)}`;

function ChartSlot({ children }: { children: ReactNode }) {
  return <Suspense fallback={<LoadingView message="Drawing the chart…" />}>{children}</Suspense>;
}

function CurrencySection({ data }: { data: YearCurrency }) {
  const c = data.currency;
  const venues = data.byVenue;
  const exposureVenues = [
    ...new Map(data.exposure.flatMap((e) => e.byVenue).map((v) => [v.venueId, v.venueName])),
  ];
  return (
    <View style={styles.currency} testID={`year-${c}`}>
      <Heading level={2}>{`In ${c}: ${formatMoney(data.totals.sales)} of sales`}</Heading>
      <Text>
        {`${data.totals.count} ${data.totals.count === 1 ? 'piece' : 'pieces'} sold, ${formatMoney(data.totals.makerShare)} to you after commission. Amounts in other currencies are shown apart, never added in.`}
      </Text>

      <Card style={styles.section}>
        <Heading level={3}>Sales by month</Heading>
        <ChartSlot>
          <BarsChart
            testID={`year-${c}-months-chart`}
            label={`Sales and your share by month, in ${c}`}
            currency={c}
            categories={data.byMonth.map((m) => monthName(m.month))}
            series={[
              { name: 'Sales', values: data.byMonth.map((m) => major(m.sales)) },
              { name: 'Your share', values: data.byMonth.map((m) => major(m.makerShare)) },
            ]}
          />
        </ChartSlot>
        <FigureTable
          label={`Sales by month, in ${c}`}
          testID={`year-${c}-months`}
          columns={[
            { key: 'month', header: 'Month' },
            { key: 'count', header: 'Pieces', figure: true, flex: 0.7 },
            { key: 'sales', header: 'Sales', figure: true },
            { key: 'share', header: 'Your share', figure: true },
          ]}
          maxPhoneColumns={4}
          rows={data.byMonth.map((m) => ({
            key: m.month,
            cells: {
              month: monthName(m.month),
              count: String(m.count),
              sales: formatMoney(m.sales),
              share: formatMoney(m.makerShare),
            },
          }))}
        />
      </Card>

      <Card style={styles.section}>
        <Heading level={3}>What each venue really paid</Heading>
        <Text variant="small">
          Each venue’s sales, what it kept in commission (and VAT on it), what that left you, and
          what it has paid so far.
        </Text>
        {venues.length === 0 ? (
          <Text>No sales at any venue this year.</Text>
        ) : (
          <>
            <ChartSlot>
              <BarsChart
                testID={`year-${c}-venues-chart`}
                label={`Sales, your share and paid by venue, in ${c}`}
                currency={c}
                horizontal
                categories={venues.map((v) => v.venueName)}
                series={[
                  { name: 'Sales', values: venues.map((v) => major(v.sales)) },
                  { name: 'Your share', values: venues.map((v) => major(v.makerShare)) },
                  { name: 'Paid', values: venues.map((v) => major(v.paid)) },
                ]}
              />
            </ChartSlot>
            <FigureTable
              label={`By venue, in ${c}`}
              testID={`year-${c}-venues`}
              columns={[
                { key: 'venue', header: 'Venue', flex: 1.6 },
                { key: 'sales', header: 'Sales', figure: true },
                { key: 'commission', header: 'Commission', figure: true },
                { key: 'vat', header: 'VAT on commission', figure: true },
                { key: 'share', header: 'Your share', figure: true },
                { key: 'paid', header: 'Paid', figure: true },
              ]}
              rows={venues.map((v) => ({
                key: String(v.venueId),
                cells: {
                  venue: `${v.venueName} (${v.count} sold)`,
                  sales: formatMoney(v.sales),
                  commission: formatMoney(v.commission),
                  vat: formatMoney(v.vatOnCommission),
                  share: formatMoney(v.makerShare),
                  paid: formatMoney(v.paid),
                },
              }))}
            />
          </>
        )}
      </Card>

      <Card style={styles.section}>
        <Heading level={3}>The series that sell</Heading>
        {data.bySeries.length === 0 ? (
          <Text>Nothing sold this year yet.</Text>
        ) : (
          <>
            <ChartSlot>
              <BarsChart
                testID={`year-${c}-series-chart`}
                label={`Sales by series, in ${c}`}
                currency={c}
                horizontal
                categories={data.bySeries.map((s) => s.series ?? 'No series')}
                series={[{ name: 'Sales', values: data.bySeries.map((s) => major(s.sales)) }]}
              />
            </ChartSlot>
            <FigureTable
              label={`By series, in ${c}`}
              testID={`year-${c}-series`}
              columns={[
                { key: 'series', header: 'Series', flex: 1.6 },
                { key: 'count', header: 'Pieces', figure: true, flex: 0.7 },
                { key: 'sales', header: 'Sales', figure: true },
              ]}
              rows={data.bySeries.map((s) => ({
                key: s.series ?? '—',
                cells: {
                  series: s.series ?? 'No series',
                  count: String(s.count),
                  sales: formatMoney(s.sales),
                },
              }))}
            />
          </>
        )}
      </Card>

      <Card style={styles.section}>
        <Heading level={3}>Insured value out, month by month</Heading>
        <Text variant="small">
          The insurance value of every piece still out at each month’s end (this month: today).
        </Text>
        {data.exposure.length === 0 ? (
          <Text>No month of this year has ended yet.</Text>
        ) : (
          <>
            <ChartSlot>
              <LinesChart
                testID={`year-${c}-exposure-chart`}
                label={`Insured value out at each month end, by venue, in ${c}`}
                currency={c}
                categories={data.exposure.map((e) => monthName(e.monthEnd.slice(0, 7)))}
                series={[
                  { name: 'All venues', values: data.exposure.map((e) => major(e.total)) },
                  ...exposureVenues.map(([venueId, name]) => ({
                    name,
                    values: data.exposure.map((e) =>
                      major(
                        e.byVenue.find((v) => v.venueId === venueId)?.value ?? {
                          amount: 0,
                          currency: c,
                        },
                      ),
                    ),
                  })),
                ]}
              />
            </ChartSlot>
            <FigureTable
              label={`Insured value out at each month end, in ${c}`}
              testID={`year-${c}-exposure`}
              columns={[
                { key: 'when', header: 'At', flex: 1.1 },
                ...exposureVenues.map(([venueId, name]) => ({
                  key: `v${venueId}`,
                  header: name,
                  figure: true,
                })),
                { key: 'total', header: 'All venues', figure: true },
              ]}
              rows={data.exposure.map((e) => ({
                key: e.monthEnd,
                cells: {
                  when: formatDate(e.monthEnd),
                  total: formatMoney(e.total),
                  ...Object.fromEntries(
                    exposureVenues.map(([venueId]) => {
                      const v = e.byVenue.find((b) => b.venueId === venueId);
                      return [`v${venueId}`, v ? formatMoney(v.value) : '—'];
                    }),
                  ),
                },
              }))}
            />
          </>
        )}
      </Card>
    </View>
  );
}

function VatThreshold({ vat }: { vat: NonNullable<Year['vatThreshold']> }) {
  const months = vat.months;
  const last = months.at(-1);
  if (!last) return null;
  const currency = last.threshold.currency;
  return (
    <Card style={styles.section} testID="year-vat">
      <Heading level={2}>VAT registration threshold</Heading>
      <Text testID="year-vat-words">
        {vat.firstMonthEndOver
          ? `Your turnover over the last 12 months passed the threshold at the end of ${formatDate(vat.firstMonthEndOver)}${vat.registerBy ? `: register for VAT by ${formatDate(vat.registerBy)}` : ''}.`
          : `Over the 12 months to ${monthYear(last.month)} your turnover is ${formatMoney(last.rolling12)}, against a threshold of ${formatMoney(last.threshold)}.`}
      </Text>
      <Caution title="Guidance only" testID="year-vat-caution">
        Guidance: check with HMRC or an accountant. Turnover here is what Saggar knows of: sales
        through venues on sale or return. Sales made elsewhere count too.
      </Caution>
      <ChartSlot>
        <LinesChart
          testID="year-vat-chart"
          label="Rolling 12-month turnover against the VAT registration threshold"
          currency={currency}
          categories={months.map((m) => monthName(m.month))}
          series={[
            { name: 'Turnover, last 12 months', values: months.map((m) => major(m.rolling12)) },
          ]}
          level={{ name: 'Registration threshold', value: major(last.threshold) }}
        />
      </ChartSlot>
      <FigureTable
        label="Rolling turnover by month"
        testID="year-vat-table"
        columns={[
          { key: 'month', header: 'Month' },
          { key: 'turnover', header: 'That month', figure: true },
          { key: 'rolling', header: 'Last 12 months', figure: true },
          { key: 'over', header: 'Over?', flex: 0.6 },
        ]}
        maxPhoneColumns={4}
        rows={months.map((m) => ({
          key: m.month,
          cells: {
            month: monthName(m.month),
            turnover: formatMoney(m.turnover),
            rolling: formatMoney(m.rolling12),
            over: m.over ? 'Over' : 'Under',
          },
        }))}
      />
    </Card>
  );
}

function SaleOrReturn({ pieces }: { pieces: Year['saleOrReturn'] }) {
  return (
    <Card style={styles.section} testID="year-sale-or-return">
      <Heading level={2}>Out on sale or return for nearly a year</Heading>
      <Text variant="small">
        A piece out on sale or return for 12 months counts as supplied for VAT on that day, sold or
        not. Bring it back, or agree a sale, before then.
      </Text>
      {pieces.length === 0 ? (
        <Text testID="year-sale-or-return-none">No piece is near 12 months out.</Text>
      ) : (
        <View role="list" style={styles.flags}>
          {pieces.map((p) => (
            <View
              role="listitem"
              key={p.lineId}
              style={styles.flag}
              testID={`year-sor-${p.lineId}`}
            >
              <StateMark
                look={
                  p.status === 'past'
                    ? { word: '12 months passed', shape: 'diamond', tone: 'danger' }
                    : {
                        word: `${p.daysLeft} days left`,
                        shape: 'triangle-right',
                        tone: 'attention',
                      }
                }
              />
              <Text variant="bodyStrong">{`${p.stockNumber} ${p.title}`}</Text>
              <Text variant="small">
                {`At ${p.venueName} (${p.reference}) since ${formatDate(p.dispatchDate)}; counts as supplied on ${formatDate(p.deemedSupplyDate)}.`}
              </Text>
            </View>
          ))}
        </View>
      )}
    </Card>
  );
}

/** The maker's year: what sold where, what it left them, what is out, and the VAT threshold. */
export function YearScreen() {
  const thisYear = Number(today().slice(0, 4));
  const [year, setYear] = useState(thisYear);
  const query = useYearQuery(year);
  const csv = yearCsvPaths(year);
  return (
    <Screen testID="year-screen">
      <View style={styles.title}>
        <Heading level={1} testID="year-title">{`The year ${year}`}</Heading>
        <View style={styles.buttons}>
          <Button
            testID="year-previous"
            label={`← ${year - 1}`}
            variant="secondary"
            onPress={() => setYear(year - 1)}
          />
          {year < thisYear ? (
            <Button
              testID="year-next"
              label={`${year + 1} →`}
              variant="secondary"
              onPress={() => setYear(year + 1)}
            />
          ) : null}
        </View>
      </View>
      <View style={styles.section}>
        <Text variant="label">For your accountant</Text>
        <View style={styles.buttons}>
          <DownloadLink
            testID="year-csv-sales"
            href={csv.sales}
            fileName={`sales-${year}.csv`}
            label="Sales (CSV)"
          />
          <DownloadLink
            testID="year-csv-payments"
            href={csv.payments}
            fileName={`payments-${year}.csv`}
            label="Payments (CSV)"
          />
          <DownloadLink
            testID="year-csv-statements"
            href={csv.statements}
            fileName={`statements-${year}.csv`}
            label="Statements (CSV)"
          />
        </View>
      </View>
      {query.isPending ? (
        <LoadingView message="Adding up the year…" />
      ) : query.isError ? (
        <ErrorView error={query.error} onRetry={() => query.refetch()} />
      ) : (
        <>
          {query.data.vatThreshold ? <VatThreshold vat={query.data.vatThreshold} /> : null}
          <SaleOrReturn pieces={query.data.saleOrReturn} />
          {query.data.currencies.length === 0 ? (
            <EmptyView title="No sales this year" message="Sales recorded at venues show here." />
          ) : (
            query.data.currencies.map((c) => <CurrencySection key={c.currency} data={c} />)
          )}
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  title: { gap: spacing.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  section: { gap: spacing.md },
  currency: { gap: spacing.lg },
  flags: { gap: spacing.md },
  flag: { gap: spacing.xxs },
});
