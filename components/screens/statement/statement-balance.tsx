import { StyleSheet, View } from 'react-native';

import { formatDate } from '@/components/ui/format';
import { StateGlyph } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { palette, radii, spacing } from '@/constants/theme';
import { formatMoney } from '@/shared/money/format';
import { type Statement } from '@/shared/schemas/statement';

import { adjustmentKindWords, paymentMethodWords } from './statement-words';

/** What the balance means, in a sentence: nothing left, still owed, or paid over. */
export function balanceInWords(s: Statement, side: 'studio' | 'venue'): string {
  const balance = formatMoney(s.balance);
  const paidSome = s.payments.length > 0;
  if (s.balance.amount === 0) return 'Nothing is left to pay: the statement is settled.';
  if (s.balance.amount < 0) {
    const over = formatMoney({ ...s.balance, amount: -s.balance.amount });
    return side === 'studio'
      ? `${over} more than the statement has come in: give it back, or explain it below.`
      : `${over} more than the statement was paid: the maker will be in touch.`;
  }
  if (!paidSome) return `${balance} to pay.`;
  return side === 'studio'
    ? `${balance} short of the statement: wait for the rest, or explain the difference below.`
    : `${balance} still to pay.`;
}

/**
 * Owed, paid and the balance, each from the server: what the statement comes to, every payment
 * and every difference explained, line by line, and what is left.
 */
export function StatementBalance({
  statement,
  side,
  testID = 'statement-balance',
}: {
  statement: Statement;
  side: 'studio' | 'venue';
  testID?: string;
}) {
  const s = statement;
  const settled = s.balance.amount === 0;
  return (
    <View style={styles.box} testID={testID}>
      <Row label="The maker’s share of the sales" amount={formatMoney(s.totals.makerShare)} />
      {s.payments.map((p) => (
        <Row
          key={`p${p.id}`}
          testID={`${testID}-payment-${p.id}`}
          label={`Paid${p.receivedOn ? ` ${formatDate(p.receivedOn)}` : ''}, ${paymentMethodWords[p.method]}${p.reference ? ` (${p.reference})` : ''}`}
          amount={`− ${formatMoney(p.amount)}`}
        />
      ))}
      {s.adjustments.map((a) => (
        <Row
          key={`a${a.id}`}
          testID={`${testID}-adjustment-${a.id}`}
          label={`${adjustmentKindWords[a.kind]}${a.note ? `: ${a.note}` : ''}`}
          amount={
            a.amount.amount < 0
              ? `+ ${formatMoney({ ...a.amount, amount: -a.amount.amount })}`
              : `− ${formatMoney(a.amount)}`
          }
        />
      ))}
      <View style={styles.balance}>
        <StateGlyph
          shape={settled ? 'square' : 'triangle-right'}
          color={settled ? palette.ink : palette.ochre}
        />
        <Text variant="bodyStrong" style={styles.label}>
          {settled ? 'Balance: settled' : 'Balance'}
        </Text>
        <Text variant="bodyStrong" style={styles.amount} testID={`${testID}-amount`}>
          {formatMoney(s.balance)}
        </Text>
      </View>
      <Text testID={`${testID}-words`}>{balanceInWords(s, side)}</Text>
    </View>
  );
}

function Row({ label, amount, testID }: { label: string; amount: string; testID?: string }) {
  return (
    <View style={styles.row} testID={testID}>
      <Text style={styles.label}>{label}</Text>
      <Text variant="number" style={styles.amount}>
        {amount}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.sm,
    padding: spacing.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: palette.hairline,
    backgroundColor: palette.surface,
  },
  row: { flexDirection: 'row', gap: spacing.md, alignItems: 'flex-start' },
  balance: {
    flexDirection: 'row',
    gap: spacing.sm,
    alignItems: 'center',
    paddingTop: spacing.sm,
    borderTopWidth: 2,
    borderTopColor: palette.outline,
  },
  label: { flex: 1 },
  amount: { flexShrink: 0, textAlign: 'right', fontVariant: ['tabular-nums'] },
});
