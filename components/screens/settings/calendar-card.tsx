import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { formatDate } from '@/components/ui/format';
import { Notice } from '@/components/ui/notice';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import { useCalendarFeedMutation, useCalendarFeedQuery } from '@/hooks/queries/calendar';

/**
 * The studio's dates in the maker's own calendar program: a private address to subscribe to,
 * shown once when made, replaced or stopped here.
 */
export function CalendarCard() {
  const feed = useCalendarFeedQuery();
  const change = useCalendarFeedMutation();
  const made = change.data?.url ?? null;
  const active = feed.data?.active ?? false;
  return (
    <Card style={styles.card} testID="settings-calendar">
      <Heading level={2}>Calendar</Heading>
      <Text variant="small">
        Sending, opening, closing and return dates, and when statements are due, in any calendar
        program that subscribes to an address (iCalendar). Anyone with the address can read these
        dates: keep it to yourself, and stop it if it goes astray.
      </Text>
      {made ? (
        <View style={styles.made}>
          <Text>Subscribe to this address in your calendar program. It is shown only now:</Text>
          <Text selectable testID="settings-calendar-url" variant="bodyStrong">
            {made}
          </Text>
        </View>
      ) : active && feed.data?.createdAt ? (
        <Text variant="small">{`An address is in use, made on ${formatDate(feed.data.createdAt.slice(0, 10))}.`}</Text>
      ) : (
        <Text variant="small">No address yet.</Text>
      )}
      {change.isError ? <Notice message={errorMessage(change.error)} /> : null}
      <View style={styles.actions}>
        <Button
          testID="settings-calendar-make"
          label={active ? 'Make a new address (the old one stops)' : 'Make an address'}
          busy={change.isPending && change.variables === 'make'}
          onPress={() => change.mutate('make')}
        />
        {active ? (
          <Button
            testID="settings-calendar-stop"
            variant="danger"
            label="Stop the address"
            busy={change.isPending && change.variables === 'stop'}
            onPress={() => change.mutate('stop')}
          />
        ) : null}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  made: { gap: spacing.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
