import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { formatDate } from '@/components/ui/format';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { StateMark } from '@/components/ui/state-mark';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { consignmentStateLooks, type StepStatus } from '@/constants/states';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import {
  useConditionReportMutation,
  useConsignmentQuery,
  useConsignmentStepMutation,
} from '@/hooks/queries/consignments';
import { useActiveRole, useMeQuery } from '@/hooks/session';
import { type Consignment, type ConsignmentState } from '@/shared/schemas/consignment';
import { termsInWords } from '@/shared/terms/terms-in-words';

import { today } from '../condition-check/today';
import { TermsInWords } from '../consignment-form/terms-in-words';
import { ChecklistStep } from './checklist-step';
import { CloseStep, StatementStep } from './closing-steps';
import { DetailsEditor } from './details-editor';
import { DispatchCheck } from './dispatch-check';
import { DocumentLinks } from './document-links';
import { LineTallies } from './line-tallies';
import { MoneyBar } from './money-bar';
import { PieceRow } from './piece-row';
import { TermsEditor } from './terms-editor';
import { WorkPicker } from './work-picker';

const order: ConsignmentState[] = ['draft', 'agreed', 'dispatched', 'on-show', 'closed', 'settled'];

/** Whether the consignment has reached a state: the steps before it are done. */
const reached = (c: Consignment, state: ConsignmentState) =>
  c.state !== 'cancelled' && order.indexOf(c.state) >= order.indexOf(state);

function dates(c: Consignment): string {
  const parts = [
    c.dispatchDate ? `sending ${formatDate(c.dispatchDate)}` : null,
    c.openingDate ? `opening ${formatDate(c.openingDate)}` : null,
    c.closingDate ? `closing ${formatDate(c.closingDate)}` : null,
    c.returnDueDate ? `back by ${formatDate(c.returnDueDate)}` : null,
  ].filter(Boolean);
  return parts.length === 0 ? 'No dates set yet.' : `Dates: ${parts.join(', ')}.`;
}

function Body({ consignment }: { consignment: Consignment }) {
  const owner = useActiveRole() === 'owner';
  const me = useMeQuery();
  const step = useConsignmentStepMutation(consignment.id);
  const report = useConditionReportMutation(consignment.id);
  const [editing, setEditing] = useState<'terms' | 'details' | 'pieces' | null>(null);
  const c = consignment;
  const draft = c.state === 'draft';
  const lines = c.lines.filter((l) => l.state !== 'withdrawn');
  const running = c.state === 'dispatched' || c.state === 'on-show';
  const count = (state: string) => c.lines.filter((l) => l.state === state).length;
  const unchecked = lines.filter((l) => l.state === 'consigned' && !l.dispatchCheck);
  const examiner = me.data?.user.name ?? '';
  const status = (done: boolean, current: boolean): StepStatus =>
    done ? 'done' : current ? 'current' : 'todo';

  const allSound = async () => {
    for (const line of unchecked) {
      await report.mutateAsync({
        lineId: line.id,
        stage: 'dispatch',
        examinerName: examiner,
        examinedOn: today(),
        findings: [],
      });
    }
  };

  return (
    <>
      <MoneyBar consignment={c} />
      {step.isError ? (
        <Notice testID="consignment-step-error" message={errorMessage(step.error)} />
      ) : null}
      <View role="list" style={styles.steps} aria-label="Steps of this consignment">
        <ChecklistStep
          number={1}
          title="Terms"
          testID="step-terms"
          status={status(reached(c, 'agreed'), draft)}
          summary={
            reached(c, 'agreed')
              ? `Agreed${c.agreedAt ? ` on ${formatDate(c.agreedAt.slice(0, 10))}` : ''}: fixed for this consignment.`
              : `Copied from ${c.venue.name}; they can change until agreed.`
          }
        >
          {editing === 'terms' ? (
            <TermsEditor consignmentId={c.id} terms={c.terms} onDone={() => setEditing(null)} />
          ) : (
            <TermsInWords lines={termsInWords(c.terms)} testID="consignment-terms" />
          )}
          <Text variant="small">{dates(c)}</Text>
          {editing === 'details' ? (
            <DetailsEditor consignment={c} onDone={() => setEditing(null)} />
          ) : null}
          {draft && editing === null ? (
            <View style={styles.buttons}>
              <Button
                testID="consignment-edit-details"
                label="Change title or dates"
                variant="secondary"
                onPress={() => setEditing('details')}
              />
              {owner ? (
                <Button
                  testID="consignment-edit-terms"
                  label="Change the terms for this consignment"
                  variant="quiet"
                  onPress={() => setEditing('terms')}
                />
              ) : null}
            </View>
          ) : null}
        </ChecklistStep>

        <ChecklistStep
          number={2}
          title="Pieces"
          testID="step-pieces"
          status={status(lines.length > 0 && !draft, draft)}
          summary={
            lines.length === 0
              ? 'No pieces yet: add works that are in the studio.'
              : `${lines.length} ${lines.length === 1 ? 'piece' : 'pieces'}${draft ? '; prices can change until the terms are agreed.' : '.'}`
          }
        >
          <View role="list" style={styles.pieces}>
            {/* A piece withdrawn after sending stays listed, with when and why. */}
            {c.lines.map((line) => (
              <PieceRow key={line.id} consignment={c} line={line}>
                <DispatchCheck consignment={c} line={line} examinerName={examiner} />
              </PieceRow>
            ))}
          </View>
          {draft && editing === 'pieces' ? (
            <WorkPicker consignmentId={c.id} onDone={() => setEditing(null)} />
          ) : draft ? (
            <View style={styles.start}>
              <Button
                testID="consignment-add-works"
                label="Add works"
                variant="secondary"
                onPress={() => setEditing('pieces')}
              />
            </View>
          ) : null}
        </ChecklistStep>

        <ChecklistStep
          number={3}
          title="Condition checks"
          testID="step-checks"
          status={status(
            lines.length > 0 && unchecked.length === 0,
            lines.length > 0 && (c.state === 'draft' || c.state === 'agreed'),
          )}
          summary={
            lines.length === 0
              ? 'Each piece is checked before it leaves.'
              : unchecked.length === 0
                ? 'Every piece has its check at dispatch (shown beside it above).'
                : `${unchecked.length} of ${lines.length} still to check, in good light, with photos of anything found.`
          }
        >
          {unchecked.length > 1 && (c.state === 'draft' || c.state === 'agreed') ? (
            <View style={styles.start}>
              <Button
                testID="consignment-all-sound"
                label={`All ${unchecked.length} remaining: no faults found`}
                busyLabel="Saving the checks…"
                busy={report.isPending}
                variant="secondary"
                onPress={() => void allSound()}
              />
            </View>
          ) : null}
          {report.isError ? <Notice message={errorMessage(report.error)} /> : null}
        </ChecklistStep>

        <ChecklistStep
          number={4}
          title="Agree and send"
          testID="step-send"
          status={status(reached(c, 'dispatched'), c.state === 'draft' || c.state === 'agreed')}
          summary={
            reached(c, 'dispatched')
              ? `Sent${c.dispatchDate ? ` on ${formatDate(c.dispatchDate)}` : ''}. ${c.venue.email ? `The sheet, the condition report and the labels were mailed to ${c.venue.email}.` : 'The venue had no e-mail address, so nothing was mailed: print the documents below and send them with the work.'}`
              : draft
                ? 'Agree the terms once the pieces are in: the venue then sees the consignment.'
                : `Terms agreed. Send it once every piece is checked${c.venue.email ? `; ${c.venue.email} gets the documents and an invitation to sign in.` : '. The venue has no e-mail address on file: add one on its page, or print the documents below and send them with the work.'}`
          }
        >
          {draft ? (
            <View style={styles.start}>
              <Button
                testID="consignment-agree"
                label="Agree the terms"
                busyLabel="Agreeing…"
                busy={step.isPending}
                disabled={lines.length === 0}
                onPress={() => step.mutate('agree')}
              />
            </View>
          ) : c.state === 'agreed' ? (
            <View style={styles.start}>
              <Button
                testID="consignment-dispatch"
                label={`Send to ${c.venue.name}`}
                busyLabel="Sending…"
                busy={step.isPending}
                onPress={() => step.mutate('dispatch')}
              />
            </View>
          ) : null}
          {lines.length > 0 ? <DocumentLinks id={c.id} reference={c.reference} /> : null}
        </ChecklistStep>

        <ChecklistStep
          number={5}
          title="Arrived"
          testID="step-arrived"
          status={status(reached(c, 'on-show'), c.state === 'dispatched')}
          summary={
            reached(c, 'on-show')
              ? `Acknowledged${c.acknowledgedBy ? ` by ${c.acknowledgedBy}` : ''}${c.acknowledgedAt ? ` on ${formatDate(c.acknowledgedAt.slice(0, 10))}` : ''}, with a check of each piece.${lines.some((l) => l.differences.length > 0) ? ' Some pieces differ from dispatch: see them above.' : ' Nothing differs from dispatch.'}`
              : c.state === 'dispatched'
                ? `Waiting for ${c.venue.name} to acknowledge what arrived.`
                : 'The venue checks each piece on arrival.'
          }
        />

        <ChecklistStep
          number={6}
          title="Sales and returns"
          testID="step-sales"
          status={status(reached(c, 'closed'), running)}
          summary={
            reached(c, 'dispatched')
              ? `${count('consigned')} out, ${count('sold')} sold${count('returned') > 0 ? `, ${count('returned')} returned` : ''}.${running ? ' The venue records what sells; a sale phoned in, a return or a withdrawal goes in beside the piece above.' : ''}`
              : 'Once the pieces are sent, the venue records what sells and what comes back.'
          }
        >
          {reached(c, 'dispatched') ? <LineTallies consignment={c} /> : null}
        </ChecklistStep>

        <CloseStep consignment={c} number={7} />
        <StatementStep consignment={c} number={8} owner={owner} />
      </View>

      {c.state === 'draft' || c.state === 'agreed' ? (
        <View style={styles.start}>
          <Button
            testID="consignment-cancel"
            label={`Cancel ${c.reference} and free its pieces`}
            busyLabel="Cancelling…"
            busy={step.isPending}
            variant="danger"
            onPress={() => step.mutate('cancel')}
          />
        </View>
      ) : null}
    </>
  );
}

/** A consignment's page: the maker's checklist for the show, with the money always in view. */
export function ConsignmentScreen({ id }: { id: number }) {
  const query = useConsignmentQuery(id);
  return (
    <Screen testID="consignment-screen">
      <View style={styles.heading}>
        <TextLink href="/consignments" label="All consignments" />
        {query.data ? (
          <>
            <Text variant="small" style={styles.reference}>
              {query.data.reference}
            </Text>
            <Heading level={1} testID="consignment-title">
              {query.data.title}
            </Heading>
            <TextLink
              href={{ pathname: '/venues/[id]', params: { id: String(query.data.venue.id) } }}
              label={query.data.venue.name}
            />
            <StateMark look={consignmentStateLooks[query.data.state]} />
          </>
        ) : null}
      </View>
      {query.isPending ? (
        <LoadingView message="Fetching the consignment…" />
      ) : query.isError ? (
        <ErrorView error={query.error} onRetry={() => query.refetch()} />
      ) : (
        <Body consignment={query.data} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs, alignItems: 'flex-start' },
  reference: { fontVariant: ['tabular-nums'] },
  steps: { gap: spacing.lg },
  pieces: { gap: 0 },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  start: { alignSelf: 'flex-start' },
});
