import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ConsignmentCard } from '@/components/ui/consignment-card';
import { Screen } from '@/components/ui/screen';
import { StateMark } from '@/components/ui/state-mark';
import { EmptyView, ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { lineStateLooks } from '@/constants/states';
import { contentMaxWidth, spacing } from '@/constants/theme';
import { useVenueHomeQuery, useVenuePiecesQuery } from '@/hooks/queries/venue-home';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { type ConsignmentState, type LineState } from '@/shared/schemas/consignment';
import { type VenueHome, type VenuePieces } from '@/shared/schemas/venue-side';

import { CounterPiece } from './counter-piece';

/** The search as typed, once typing has paused, so each key does not fetch. */
function useSettled(value: string, ms = 250): string {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return settled;
}

const countedStates: LineState[] = ['consigned', 'sold', 'returned', 'damaged', 'lost'];

/** How many pieces are in each state, by word and shape: "4 Out · 2 Sold". */
function Counts({ counts }: { counts: VenuePieces['counts'] }) {
  const present = countedStates.filter((state) => (counts[state] ?? 0) > 0);
  if (present.length === 0) return null;
  return (
    <View style={styles.counts} testID="counter-counts">
      {present.map((state) => (
        <View key={state} style={styles.count}>
          <Text variant="number">{String(counts[state])}</Text>
          <StateMark look={lineStateLooks[state]} />
        </View>
      ))}
    </View>
  );
}

function Pieces({ search, showMaker }: { search: string; showMaker: boolean }) {
  const query = useVenuePiecesQuery(search);
  const { wide } = useBreakpoint();
  if (query.isPending) return <LoadingView message="Finding the pieces on your shelves…" />;
  if (query.isError) return <ErrorView error={query.error} onRetry={() => query.refetch()} />;
  const { items, counts } = query.data;
  const anyAtAll = Object.values(counts).some((n) => n > 0);
  return (
    <>
      <Counts counts={counts} />
      {items.length === 0 ? (
        anyAtAll && search.trim() !== '' ? (
          <EmptyView
            title="No piece matches"
            message={`Nothing has “${search.trim()}” in its stock number or title. Try the number on the label, or one word of the title.`}
          />
        ) : (
          <EmptyView
            title="No pieces yet"
            message="Once a maker sends work to your venue, each piece is listed here to sell or return."
          />
        )
      ) : (
        <View
          role="list"
          aria-label="Pieces"
          aria-busy={query.isPlaceholderData}
          style={[styles.list, wide && styles.listWide]}
          testID="counter-list"
        >
          {items.map((item) => (
            <View role="listitem" key={item.line.id} style={wide && styles.itemWide}>
              <CounterPiece item={item} showMaker={showMaker} />
            </View>
          ))}
        </View>
      )}
    </>
  );
}

/** Arrivals to acknowledge first, then the shows running, then the rest. */
const consignmentOrder: ConsignmentState[] = ['dispatched', 'on-show', 'agreed', 'closed'];
const rank = (state: ConsignmentState) => {
  const at = consignmentOrder.indexOf(state);
  return at === -1 ? consignmentOrder.length : at;
};

function Consignments({ home, showMaker }: { home: VenueHome; showMaker: boolean }) {
  const consignments = [...home.consignments].sort((a, b) => rank(a.state) - rank(b.state));
  return (
    <View style={styles.list}>
      <Heading level={2}>Consignments</Heading>
      {consignments.length === 0 ? (
        <EmptyView
          title="No consignments yet"
          message="When a maker sends work to your venue, it is listed here."
        />
      ) : (
        consignments.map((consignment) => (
          <ConsignmentCard
            key={consignment.id}
            consignment={consignment}
            showVenue={false}
            note={
              [
                consignment.state === 'dispatched' ? 'Arrived? Check and acknowledge it' : null,
                showMaker ? `From ${consignment.studio.name}` : null,
              ]
                .filter(Boolean)
                .join(' · ') || undefined
            }
            href={{
              pathname: '/venue/consignments/[id]',
              params: { id: String(consignment.id) },
            }}
          />
        ))
      )}
    </View>
  );
}

/**
 * The venue's counter list: find a piece by stock number or title, the pieces out first with
 * "Sold" beside each, then what has sold or gone back, then the consignments.
 */
export function VenueHomeScreen() {
  const home = useVenueHomeQuery();
  const [typed, setTyped] = useState('');
  const search = useSettled(typed);
  const places = home.data?.places ?? [];
  const showMaker = new Set(places.map((p) => p.studio.id)).size > 1;
  const venues = [...new Set(places.map((p) => p.venue.name))];
  return (
    <Screen testID="venue-home-screen">
      <View style={styles.heading}>
        <Heading level={1}>{venues.length === 1 ? venues[0] : 'Your shelves'}</Heading>
        {places.length > 0 ? (
          <Text variant="small">
            {`Work on sale or return from ${[...new Set(places.map((p) => p.studio.name))].join(', ')}`}
          </Text>
        ) : null}
      </View>
      <View style={styles.search}>
        <TextField
          testID="counter-search"
          label="Find a piece"
          hint="The stock number on its label, or a word of its title."
          value={typed}
          onChangeText={setTyped}
          autoCapitalize="none"
          autoCorrect={false}
          inputMode="search"
          returnKeyType="search"
        />
      </View>
      <Pieces search={search} showMaker={showMaker} />
      {home.isPending ? (
        <LoadingView message="Finding the consignments…" />
      ) : home.isError ? (
        <ErrorView error={home.error} onRetry={() => home.refetch()} />
      ) : (
        <Consignments home={home.data} showMaker={showMaker} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xxs },
  search: { maxWidth: 560 },
  list: { gap: spacing.md },
  // Two columns on a wide screen; a lone last card keeps the width of the others.
  listWide: { flexDirection: 'row', flexWrap: 'wrap' },
  itemWide: { flexBasis: 360, flexGrow: 1, maxWidth: (contentMaxWidth - spacing.md) / 2 },
  counts: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.lg, rowGap: spacing.xs },
  count: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});
