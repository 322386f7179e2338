import { type Href } from 'expo-router';

import { formatDate } from '@/components/ui/format';
import { LinkCard } from '@/components/ui/link-card';
import { StateMark } from '@/components/ui/state-mark';
import { Heading, Text } from '@/components/ui/text';
import { statementStateLooks } from '@/constants/states';
import { formatMoney } from '@/shared/money/format';
import { type StatementList } from '@/shared/schemas/statement';

export type StatementRow = StatementList['items'][number];
export type StatementSide = 'studio' | 'venue';

export const statementHref = (side: StatementSide, id: number): Href =>
  side === 'studio'
    ? { pathname: '/statements/[id]', params: { id: String(id) } }
    : { pathname: '/venue/statements/[id]', params: { id: String(id) } };

/** What a statement covers: its show, or its venue and period. */
export const coversWords = (s: StatementRow) =>
  s.consignment
    ? `${s.consignment.reference} ${s.consignment.title}`
    : `${formatDate(s.periodStart)} to ${formatDate(s.periodEnd)}`;

/** A statement as a card on a phone: the whole card opens it. */
export function StatementCard({
  statement: s,
  side,
}: {
  statement: StatementRow;
  side: StatementSide;
}) {
  const look = statementStateLooks[s.state];
  return (
    <LinkCard
      href={statementHref(side, s.id)}
      label={`${s.reference}, ${s.venue.name}, ${look.word}, balance ${formatMoney(s.balance)}`}
      testID={`statement-card-${s.id}`}
    >
      <StateMark look={look} />
      <Heading level={3}>{`${s.reference} · ${s.venue.name}`}</Heading>
      <Text variant="small">{coversWords(s)}</Text>
      <Text variant="number">
        {`Balance ${formatMoney(s.balance)} of ${formatMoney(s.owed)}${s.dueDate ? ` · due ${formatDate(s.dueDate)}` : ''}`}
      </Text>
    </LinkCard>
  );
}
