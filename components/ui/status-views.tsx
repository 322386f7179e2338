import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { palette, spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';

import { Button } from './button';
import { Card } from './card';
import { Notice } from './notice';
import { Heading, Text } from './text';

/** Waiting for data: a spinner and a sentence saying what is coming. */
export function LoadingView({ message }: { message: string }) {
  return (
    <View style={styles.centre} aria-busy>
      <ActivityIndicator color={palette.accent} size="large" />
      <Text variant="small">{message}</Text>
    </View>
  );
}

/** The data could not be had: why, in plain words, and a way to try again. */
export function ErrorView({ error, onRetry }: { error: unknown; onRetry?: () => void }) {
  return (
    <View style={styles.stack}>
      <Notice message={errorMessage(error)} />
      {onRetry ? (
        <View style={styles.start}>
          <Button label="Try again" variant="secondary" onPress={onRetry} />
        </View>
      ) : null}
    </View>
  );
}

/** Nothing here yet: what that means and what to do about it. */
export function EmptyView({ title, message }: { title: string; message: string }) {
  return (
    <Card>
      <Heading level={3}>{title}</Heading>
      <Text variant="small">{message}</Text>
    </Card>
  );
}

const styles = StyleSheet.create({
  centre: {
    flex: 1,
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.md,
    padding: spacing.xxl,
    backgroundColor: palette.paper,
  },
  stack: { gap: spacing.md },
  start: { alignSelf: 'flex-start' },
});
