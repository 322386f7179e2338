import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { AdjustmentForm } from '@/components/screens/statement/adjustment-form';
import { balanceInWords, StatementBalance } from '@/components/screens/statement/statement-balance';
import { statementStateLooks } from '@/constants/states';
import { type Statement, statementStates } from '@/shared/schemas/statement';
import { defaultTerms } from '@/shared/schemas/terms';

import { TestQueryProvider } from './test-query-client';

const gbp = (amount: number) => ({ amount, currency: 'GBP' });

/**
 * Quayside's statement as the server answers it after a remittance £5.00 short and a £2.00 card
 * fee explained: £154.05 owed, £149.05 paid, £3.00 left. Every figure here is the server's.
 */
const statement: Statement = {
  id: 7,
  reference: 'S-2026-001',
  state: 'issued',
  currency: 'GBP',
  venue: { id: 2, name: 'Quayside Crafts' },
  consignment: { id: 2, reference: 'QUA-2026-02', title: 'Autumn shelves' },
  periodStart: '2026-08-28',
  periodEnd: '2026-12-03',
  issuedAt: '2026-12-03T10:00:00.000Z',
  dueDate: '2027-01-30',
  terms: { ...defaultTerms },
  lines: [],
  totals: {
    sales: gbp(23_700),
    commission: gbp(8_295),
    vatOnCommission: gbp(0),
    makerShare: gbp(15_405),
    makerOutputVat: gbp(0),
    makerReclaimableVat: gbp(0),
  },
  payments: [
    {
      id: 3,
      amount: gbp(14_905),
      receivedOn: '2026-12-03',
      method: 'bank-transfer',
      reference: 'QUAYSIDE REMIT 11',
    },
  ],
  adjustments: [{ id: 4, kind: 'fee-deducted', amount: gbp(200), note: 'Card terminal fee' }],
  paid: gbp(14_905),
  balance: gbp(300),
};

describe('StatementBalance', () => {
  it('lists what is owed, each payment and each explained difference, then the balance the server gave', () => {
    render(<StatementBalance statement={statement} side="studio" />);
    expect(screen.getByTestId('statement-balance')).toHaveTextContent(
      'The maker’s share of the sales£154.05',
      { exact: false },
    );
    expect(screen.getByTestId('statement-balance-payment-3')).toHaveTextContent(
      'Paid 3 Dec 2026, bank transfer (QUAYSIDE REMIT 11)− £149.05',
    );
    expect(screen.getByTestId('statement-balance-adjustment-4')).toHaveTextContent(
      'A fee the venue deducted: Card terminal fee− £2.00',
    );
    expect(screen.getByTestId('statement-balance-amount')).toHaveTextContent('£3.00');
    expect(screen.getByTestId('statement-balance-words')).toHaveTextContent(
      '£3.00 short of the statement: wait for the rest, or explain the difference below.',
    );
  });

  it('shows a difference that adds to what is owed (an unreported sale) with a plus', () => {
    const more: Statement = {
      ...statement,
      adjustments: [{ id: 5, kind: 'unreported-sale', amount: gbp(-3_200), note: null }],
      balance: gbp(3_700),
    };
    render(<StatementBalance statement={more} side="studio" />);
    expect(screen.getByTestId('statement-balance-adjustment-5')).toHaveTextContent(
      'A sale the venue did not report+ £32.00',
    );
  });

  it('says in words when nothing is left, when nothing is paid yet, and when more came in than owed', () => {
    expect(balanceInWords({ ...statement, balance: gbp(0) }, 'studio')).toBe(
      'Nothing is left to pay: the statement is settled.',
    );
    expect(balanceInWords({ ...statement, payments: [], balance: gbp(15_405) }, 'venue')).toBe(
      '£154.05 to pay.',
    );
    expect(balanceInWords(statement, 'venue')).toBe('£3.00 still to pay.');
    expect(balanceInWords({ ...statement, balance: gbp(-150) }, 'studio')).toBe(
      '£1.50 more than the statement has come in: give it back, or explain it below.',
    );
  });

  it('gives every statement state its own word and shape', () => {
    const looks = statementStates.map((s) => statementStateLooks[s]);
    expect(new Set(looks.map((l) => l.word)).size).toBe(statementStates.length);
    expect(new Set(looks.map((l) => l.shape)).size).toBe(statementStates.length);
  });
});

describe('AdjustmentForm', () => {
  function serve() {
    const calls: { url: string; body: unknown }[] = [];
    global.fetch = jest.fn(async (url: string, init?: RequestInit) => {
      calls.push({ url, body: init?.body ? JSON.parse(String(init.body)) : undefined });
      return { ok: true, status: 201, text: async () => JSON.stringify(statement) };
    }) as unknown as typeof fetch;
    return calls;
  }

  it('starts from the balance as taken off what is owed, and sends it positive', async () => {
    const calls = serve();
    const done = jest.fn();
    render(
      <TestQueryProvider>
        <AdjustmentForm statement={statement} onDone={done} />
      </TestQueryProvider>,
    );
    expect(screen.getByTestId('adjustment-amount')).toHaveDisplayValue('3.00');
    fireEvent.press(screen.getByTestId('adjustment-submit'));
    await waitFor(() => expect(done).toHaveBeenCalled());
    expect(calls).toEqual([
      {
        url: '/api/statements/7/adjustments',
        body: { kind: 'fee-deducted', amount: gbp(300) },
      },
    ]);
  });

  it('sends what the venue owes more (a sale it did not report) as a negative amount, with its note', async () => {
    const calls = serve();
    render(
      <TestQueryProvider>
        <AdjustmentForm statement={statement} onDone={jest.fn()} />
      </TestQueryProvider>,
    );
    fireEvent.press(screen.getByTestId('adjustment-kind-unreported-sale'));
    fireEvent.press(screen.getByTestId('adjustment-direction-more'));
    fireEvent.changeText(screen.getByTestId('adjustment-amount'), '32');
    fireEvent.changeText(screen.getByTestId('adjustment-note'), 'Beaker sold at the fair');
    fireEvent.press(screen.getByTestId('adjustment-submit'));
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(calls[0]).toEqual({
      url: '/api/statements/7/adjustments',
      body: { kind: 'unreported-sale', amount: gbp(-3_200), note: 'Beaker sold at the fair' },
    });
  });
});
