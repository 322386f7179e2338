import { type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { StateMark } from '@/components/ui/state-mark';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { statementStateLooks } from '@/constants/states';
import { spacing } from '@/constants/theme';
import { type Statement } from '@/shared/schemas/statement';

/**
 * A statement's heading on either side: the way back, its reference, what it is for, the venue
 * and its state; `children` (the studio's link to the consignment) go above the state.
 */
export function StatementHeading({
  statement: s,
  backHref,
  children,
}: {
  statement: Statement | undefined;
  backHref: '/statements' | '/venue/statements';
  children?: ReactNode;
}) {
  return (
    <View style={styles.heading}>
      <TextLink href={backHref} label="All statements" />
      {s ? (
        <>
          <Text variant="small" style={styles.tabular}>
            {s.reference}
          </Text>
          <Heading level={1} testID="statement-title">
            {s.consignment
              ? `Statement for ${s.consignment.title}`
              : `Statement for ${s.venue.name}`}
          </Heading>
          <Text>{s.venue.name}</Text>
          {children}
          <StateMark look={statementStateLooks[s.state]} testID="statement-state" />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs, alignItems: 'flex-start' },
  tabular: { fontVariant: ['tabular-nums'] },
});
