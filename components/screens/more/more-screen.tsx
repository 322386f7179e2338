import { StyleSheet, View } from 'react-native';

import { LinkCard } from '@/components/ui/link-card';
import { Screen } from '@/components/ui/screen';
import { Heading, Text } from '@/components/ui/text';
import { navFor, studioNav, underMore } from '@/constants/navigation';
import { spacing } from '@/constants/theme';
import { useActiveRole } from '@/hooks/session';

const descriptions: Record<string, string> = {
  statements: 'What each venue owes for its sales, what it paid, and any difference explained.',
  year: 'Sales by month, venue and series, insured value out, and the VAT threshold.',
  mail: 'Every e-mail Saggar sent for the studio, with its attachments, and any that did not go.',
  settings: 'How stock numbers are made and prices rounded.',
};

/** On a phone, the sections the bottom bar has no room for. */
export function MoreScreen() {
  const role = useActiveRole();
  const items = role ? underMore(navFor(studioNav, role)) : [];
  return (
    <Screen testID="more-screen">
      <Heading level={1}>More</Heading>
      <View role="list" style={styles.list}>
        {items.map((item) => (
          <View role="listitem" key={item.key}>
            <LinkCard href={item.href} label={item.label} testID={`more-${item.key}`}>
              <Text variant="bodyStrong">{item.label}</Text>
              {descriptions[item.key] ? (
                <Text variant="small">{descriptions[item.key]}</Text>
              ) : null}
            </LinkCard>
          </View>
        ))}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.md },
});
