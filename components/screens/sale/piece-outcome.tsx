import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { ApiError, errorMessage } from '@/hooks/api-errors';
import { useResolveMutation, useSaleMutation } from '@/hooks/queries/sales';
import { type ConsignmentLine, type ConsignmentState } from '@/shared/schemas/consignment';
import { type ResolveState } from '@/shared/schemas/sale';
import { type Terms } from '@/shared/schemas/terms';

import { ResolutionRecord } from './resolution-record';
import { ResolveForm } from './resolve-form';
import { type Side } from './sale-figures';
import { SaleForm } from './sale-form';
import { SaleRecord } from './sale-record';

/** What the piece's outcome needs of its consignment. */
export type OutcomeConsignment = {
  state: ConsignmentState;
  terms: Terms;
  today: string;
  dispatchDate: string | null;
};

type Open = 'sale' | ResolveState;

/** Pieces are sold or returned while the show runs: from dispatch until it closes. */
export const showRunning = (state: ConsignmentState) =>
  state === 'dispatched' || state === 'on-show';

/** The ways out each side offers, after the sale. Withdrawing is the studio's alone. */
const otherWays: Record<Side, { state: ResolveState; label: string }[]> = {
  venue: [
    { state: 'returned', label: 'Returned to the maker' },
    { state: 'damaged', label: 'Damaged' },
    { state: 'lost', label: 'Lost' },
  ],
  studio: [
    { state: 'returned', label: 'Mark returned' },
    { state: 'withdrawn', label: 'Withdraw' },
  ],
};

const doneWords: Record<Open, string> = {
  sale: 'Sale recorded.',
  returned: 'Recorded as returned to the maker.',
  damaged: 'Damage recorded.',
  lost: 'Recorded as lost.',
  withdrawn: 'Withdrawn from this consignment.',
};

/**
 * What became of a piece, and what can still be done with it: while it is out, "Sold" first
 * (or "Record a sale" for the studio), then the other ways out, each confirmed in its own form;
 * once sold, the sale with its undo; once returned or lost, how and when. The same on the venue's
 * side and the studio's. A refusal because someone else got there first (409) says who and when,
 * in the server's words, and the piece shows as it now stands.
 */
export function PieceOutcome({
  line,
  consignment,
  side,
  startWith = null,
  onFormOpen,
  testID,
}: {
  line: ConsignmentLine;
  consignment: OutcomeConsignment;
  side: Side;
  /** Open a form at once, as the counter list's "Sold" button does. */
  startWith?: Open | null;
  /** Told when a form opens or closes, so a page can make room for it. */
  onFormOpen?: (open: boolean) => void;
  testID: string;
}) {
  const running = showRunning(consignment.state);
  const out = line.state === 'consigned';
  const [open, setOpenState] = useState<Open | null>(running && out ? startWith : null);
  const setOpen = (next: Open | null) => {
    setOpenState(next);
    onFormOpen?.(next !== null);
  };
  const [news, setNews] = useState<{ tone: 'info' | 'problem'; message: string } | null>(null);
  const sale = useSaleMutation(line.id);
  const resolve = useResolveMutation(line.id);
  const window = { dispatchDate: consignment.dispatchDate, today: consignment.today };

  /** Sends; on a 409 the form closes and the server's sentence stays in view. */
  const send = async (what: Open, request: () => Promise<unknown>) => {
    try {
      await request();
      setOpen(null);
      const told =
        what === 'sale' && side === 'venue' ? ' The maker is e-mailed within minutes.' : '';
      setNews({ tone: 'info', message: `${doneWords[what]}${told}` });
    } catch (error) {
      if (!(error instanceof ApiError && error.status === 409)) throw error;
      setOpen(null);
      setNews({ tone: 'problem', message: errorMessage(error) });
    }
  };
  const start = (what: Open) => {
    setNews(null);
    setOpen(what);
  };

  let body = null;
  if (line.state === 'sold' && line.sale) {
    body = (
      <SaleRecord
        line={line}
        terms={consignment.terms}
        side={side}
        canChange={running}
        testID={`${testID}-sale`}
      />
    );
  } else if (!out) {
    body = <ResolutionRecord line={line} testID={`${testID}-resolution`} />;
  } else if (!running) {
    body =
      side === 'venue' && consignment.state === 'agreed' ? (
        <Text variant="small">Not sent yet: a sale can be recorded once the piece is sent.</Text>
      ) : null;
  } else if (open === 'sale') {
    body = (
      <SaleForm
        piece={{
          ...window,
          title: line.title,
          listPrice: line.listPrice,
          terms: consignment.terms,
        }}
        side={side}
        testID={`${testID}-sale-form`}
        onSubmit={(body) => send('sale', () => sale.mutateAsync(body))}
        onCancel={() => setOpen(null)}
      />
    );
  } else if (open) {
    body = (
      <ResolveForm
        state={open}
        lineId={line.id}
        window={window}
        testID={`${testID}-${open}-form`}
        onSubmit={(body) => send(open, () => resolve.mutateAsync(body))}
        onCancel={() => setOpen(null)}
      />
    );
  } else {
    body = (
      <View style={side === 'venue' ? styles.actions : styles.others}>
        <Button
          testID={`${testID}-sell`}
          label={side === 'venue' ? 'Sold' : 'Record a sale'}
          size={side === 'venue' ? 'large' : 'regular'}
          variant={side === 'venue' ? 'primary' : 'secondary'}
          onPress={() => start('sale')}
        />
        <View style={styles.others}>
          {otherWays[side].map((way) => (
            <Button
              key={way.state}
              testID={`${testID}-${way.state}`}
              label={way.label}
              variant={side === 'venue' ? 'secondary' : 'quiet'}
              onPress={() => start(way.state)}
            />
          ))}
        </View>
      </View>
    );
  }

  return (
    <View style={styles.outcome} testID={testID}>
      {news ? <Notice tone={news.tone} message={news.message} testID={`${testID}-news`} /> : null}
      {body}
    </View>
  );
}

const styles = StyleSheet.create({
  // Labels and amounts stay within reach of each other on a wide screen.
  outcome: { gap: spacing.md, maxWidth: 560 },
  actions: { gap: spacing.sm },
  others: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
