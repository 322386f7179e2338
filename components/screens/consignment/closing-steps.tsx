import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { formatDate } from '@/components/ui/format';
import { LinkCard } from '@/components/ui/link-card';
import { Notice } from '@/components/ui/notice';
import { StateMark } from '@/components/ui/state-mark';
import { Text } from '@/components/ui/text';
import { statementStateLooks, type StepStatus } from '@/constants/states';
import { palette, spacing } from '@/constants/theme';
import { ApiError, errorMessage } from '@/hooks/api-errors';
import { useConsignmentStepMutation } from '@/hooks/queries/consignments';
import { useStatementCreateMutation, useStatementsQuery } from '@/hooks/queries/statements';
import { formatMoney } from '@/shared/money/format';
import { type Consignment } from '@/shared/schemas/consignment';

import { PieceOutcome, showRunning } from '../sale/piece-outcome';
import { ChecklistStep } from './checklist-step';

/**
 * The end of the show: the pieces still out, each with its ways out, and "Close the show". A
 * refusal names the pieces the server still counts as out, beside each.
 */
export function CloseStep({
  consignment: c,
  number,
}: {
  consignment: Consignment;
  number: number;
}) {
  const close = useConsignmentStepMutation(c.id);
  const running = showRunning(c.state);
  const out = c.lines.filter((l) => l.state === 'consigned');
  const over = c.closingDate !== null && c.today >= c.closingDate;
  const refusals = close.error instanceof ApiError ? close.error.fieldErrors : {};
  const closed = c.state === 'closed' || c.state === 'settled';
  const status: StepStatus = closed
    ? 'done'
    : running && (over || out.length === 0)
      ? 'current'
      : 'todo';
  const summary = closed
    ? 'Closed: every piece is accounted for.'
    : !running
      ? 'Once the show is over, every piece is sold, returned, damaged or lost, and the show is closed.'
      : out.length === 0
        ? 'Every piece is accounted for: close the show to make its statement final.'
        : `${out.length} ${out.length === 1 ? 'piece is' : 'pieces are'} still out${over && c.closingDate ? `, and the show closed on ${formatDate(c.closingDate)}` : ''}: say what became of each, then close the show.`;
  return (
    <ChecklistStep
      number={number}
      title="Close the show"
      testID="step-close"
      status={status}
      summary={summary}
    >
      {running && out.length > 0 ? (
        <View role="list" aria-label="Pieces still out" style={styles.out} testID="closing-out">
          {out.map((line) => (
            <View
              key={line.id}
              role="listitem"
              style={styles.outPiece}
              testID={`closing-${line.id}`}
            >
              <Text variant="bodyStrong">{`${line.stockNumber} ${line.title}`}</Text>
              {refusals[`lines.${line.id}`] ? (
                <Text style={styles.refused} testID={`closing-${line.id}-refused`}>
                  {refusals[`lines.${line.id}`]}
                </Text>
              ) : null}
              <PieceOutcome
                line={line}
                consignment={c}
                side="studio"
                testID={`closing-${line.id}-outcome`}
              />
            </View>
          ))}
        </View>
      ) : null}
      {running ? (
        <View style={styles.start}>
          <Button
            testID="consignment-close"
            label="Close the show"
            busyLabel="Closing…"
            busy={close.isPending}
            variant={out.length === 0 ? 'primary' : 'secondary'}
            onPress={() => close.mutate('close')}
          />
        </View>
      ) : null}
      {close.isError ? (
        <Notice testID="consignment-close-error" message={errorMessage(close.error)} />
      ) : null}
    </ChecklistStep>
  );
}

/** The statement for the show's sales, made here and settled on its own page. */
export function StatementStep({
  consignment: c,
  number,
  owner,
}: {
  consignment: Consignment;
  number: number;
  owner: boolean;
}) {
  const router = useRouter();
  const statements = useStatementsQuery();
  const create = useStatementCreateMutation();
  const mine = (statements.data?.items ?? []).filter((s) => s.consignment?.id === c.id);
  const sold = c.lines.filter((l) => l.state === 'sold').length;
  const sent = c.state === 'dispatched' || c.state === 'on-show' || c.state === 'closed';
  const hasDraft = mine.some((s) => s.state === 'draft');
  const status: StepStatus =
    c.state === 'settled' ? 'done' : c.state === 'closed' ? 'current' : sent ? 'todo' : 'later';
  const summary =
    c.state === 'settled'
      ? 'Settled: every statement is paid or its difference explained.'
      : sold === 0
        ? 'Nothing has sold, so there is nothing to put on a statement.'
        : mine.length === 0
          ? `${sold} ${sold === 1 ? 'sale' : 'sales'} to put on a statement${c.state === 'closed' ? '' : ': make it now for a running show, or after closing'}.`
          : 'The statement for these sales, and what has been paid against it:';
  return (
    <ChecklistStep
      number={number}
      title="Statement and payment"
      testID="step-statement"
      status={status}
      summary={summary}
    >
      {mine.length > 0 ? (
        <View role="list" style={styles.statements}>
          {mine.map((s) => (
            <View key={s.id} role="listitem">
              <LinkCard
                href={{ pathname: '/statements/[id]', params: { id: String(s.id) } }}
                label={`${s.reference}, ${statementStateLooks[s.state].word}, balance ${formatMoney(s.balance)}`}
                testID={`consignment-statement-${s.id}`}
              >
                <Text variant="bodyStrong">{s.reference}</Text>
                <StateMark look={statementStateLooks[s.state]} />
                <Text variant="number">{`Balance ${formatMoney(s.balance)} of ${formatMoney(s.owed)}`}</Text>
              </LinkCard>
            </View>
          ))}
        </View>
      ) : null}
      {owner && sent && sold > 0 && !hasDraft ? (
        <View style={styles.start}>
          <Button
            testID="consignment-make-statement"
            label="Make the statement"
            busyLabel="Making it…"
            busy={create.isPending}
            variant={c.state === 'closed' ? 'primary' : 'secondary'}
            onPress={() =>
              create.mutate(
                { consignmentId: c.id },
                {
                  onSuccess: (s) =>
                    router.push({ pathname: '/statements/[id]', params: { id: String(s.id) } }),
                },
              )
            }
          />
        </View>
      ) : null}
      {create.isError ? (
        <Notice testID="consignment-statement-error" message={errorMessage(create.error)} />
      ) : null}
    </ChecklistStep>
  );
}

const styles = StyleSheet.create({
  out: { gap: spacing.md },
  outPiece: {
    gap: spacing.sm,
    paddingTop: spacing.md,
    borderTopWidth: 1,
    borderTopColor: palette.hairline,
  },
  refused: { color: palette.danger },
  statements: { gap: spacing.sm },
  start: { alignSelf: 'flex-start' },
});
