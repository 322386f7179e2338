import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';

export function NotFoundScreen() {
  return (
    <Screen testID="not-found-screen" narrow>
      <View style={styles.body}>
        <Heading level={1}>This page is not here</Heading>
        <Text>The address may be mistyped, or the page may have moved.</Text>
        <Link href="/" asChild replace>
          <Button label="Go to the start" variant="secondary" />
        </Link>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  body: { gap: spacing.lg, marginTop: spacing.xxl, alignItems: 'flex-start' },
});
