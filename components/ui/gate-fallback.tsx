import { Redirect } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { palette, spacing } from '@/constants/theme';
import { type GateWaiting } from '@/hooks/session';

import { ErrorView, LoadingView } from './status-views';

/** What a guarded layout shows until the session says the area may open. */
export function GateFallback({ gate }: { gate: GateWaiting }) {
  switch (gate.status) {
    case 'redirect':
      return <Redirect href={gate.href} />;
    case 'loading':
      return <LoadingView message="Opening Saggar…" />;
    case 'error':
      return (
        <View style={styles.error}>
          <ErrorView error={gate.error} onRetry={gate.retry} />
        </View>
      );
  }
}

const styles = StyleSheet.create({
  error: { flex: 1, padding: spacing.xl, backgroundColor: palette.paper },
});
