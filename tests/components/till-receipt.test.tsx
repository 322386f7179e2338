import { act, fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { TillReceipt } from '@/components/screens/venue-consignment/till-receipt';
import { trySplitSale } from '@/shared/money/split';
import { type Consignment, type ConsignmentLine } from '@/shared/schemas/consignment';
import { defaultTerms } from '@/shared/schemas/terms';

import { TestQueryProvider } from './test-query-client';

const gbp = (amount: number) => ({ amount, currency: 'GBP' });

const piece = (id: number, stockNumber: string, title: string, price: number): ConsignmentLine => ({
  id,
  workId: id,
  stockNumber,
  title,
  thumbnailUrl: null,
  listPrice: gbp(price),
  insuranceValue: gbp(price),
  state: 'consigned',
  split: trySplitSale(defaultTerms, gbp(price), gbp(price)),
  dispatchCheck: null,
  arrivalCheck: null,
  differences: [],
  returnCheck: null,
  newDamage: null,
  weightG: null,
  sale: null,
  resolution: null,
});

const consignment: Consignment = {
  id: 4,
  reference: 'LAN-2026-04',
  title: 'Winter window',
  state: 'on-show',
  venue: { id: 2, name: 'The Lanthorn Gallery', email: null, contactName: null },
  dispatchDate: '2026-11-20',
  openingDate: null,
  closingDate: null,
  returnDueDate: null,
  terms: defaultTerms,
  notes: null,
  agreedAt: null,
  dispatchedAt: null,
  acknowledgedAt: null,
  acknowledgedBy: null,
  lines: [
    piece(11, '2026-031', 'Beaker, oatmeal', 4800),
    piece(12, '2026-032', 'Jug, nuka white', 7800),
    piece(13, '2026-033', 'Shino bottle', 47000),
  ],
  totals: null,
  insuredOut: gbp(59600),
  createdAt: '2026-11-01T09:00:00.000Z',
  today: '2026-12-03',
};

/** The server at the fetch boundary: one answer; the request is kept. */
function serve(answer: { status: number; body: unknown }) {
  const calls: { url: string; body: unknown }[] = [];
  global.fetch = jest.fn(async (url: string, init?: RequestInit) => {
    calls.push({ url, body: init?.body ? JSON.parse(String(init.body)) : undefined });
    return {
      ok: answer.status < 300,
      status: answer.status,
      text: async () => JSON.stringify(answer.body),
    };
  }) as unknown as typeof fetch;
  return calls;
}

function openReceipt() {
  render(
    <TestQueryProvider>
      <TillReceipt consignment={consignment} />
    </TestQueryProvider>,
  );
  fireEvent.press(screen.getByTestId('receipt-open'));
  fireEvent.press(screen.getByTestId('receipt-tick-11'));
  fireEvent.press(screen.getByTestId('receipt-tick-13'));
}

describe('TillReceipt', () => {
  it('sends the ticked pieces with one date, each at its list price unless changed, and totals them', async () => {
    const calls = serve({ status: 201, body: { sales: [] } });
    openReceipt();

    fireEvent.changeText(screen.getByTestId('receipt-price-13'), '450');
    fireEvent.changeText(screen.getByTestId('receipt-reason-13'), 'Bought with the beaker');
    expect(screen.getByTestId('receipt-total')).toHaveTextContent('Total, 2 pieces£498.00');
    expect(screen.getByTestId('receipt-submit')).toHaveTextContent('Confirm 2 sales');
    fireEvent.press(screen.getByTestId('receipt-submit'));

    await waitFor(() => expect(calls).toHaveLength(1));
    expect(calls[0]).toEqual({
      url: '/api/consignments/4/sales',
      body: {
        sales: [
          { lineId: 11, soldOn: '2026-12-03', salePrice: gbp(4800) },
          {
            lineId: 13,
            soldOn: '2026-12-03',
            salePrice: gbp(45000),
            discountReason: 'Bought with the beaker',
          },
        ],
      },
    });
    expect(await screen.findByTestId('receipt-done')).toHaveTextContent(
      '2 sales recorded. The maker is e-mailed within minutes.',
    );
  });

  it('puts the server’s sales.i messages on that piece’s price and on the one date', async () => {
    serve({
      status: 400,
      body: {
        error: {
          code: 'invalid_request',
          message: 'Some fields need attention.',
          issues: [
            { path: ['sales', 1, 'salePrice'], message: 'Shino bottle is priced in GBP.' },
            { path: ['sales', 0, 'soldOn'], message: 'The date cannot be after today.' },
            { path: ['sales', 1, 'soldOn'], message: 'The date cannot be after today.' },
          ],
        },
      },
    });
    openReceipt();

    fireEvent.press(screen.getByTestId('receipt-submit'));

    expect(await screen.findByTestId('receipt-price-13-error')).toHaveTextContent(
      'Shino bottle is priced in GBP.',
    );
    expect(screen.getByTestId('receipt-date-error')).toHaveTextContent(
      'The date cannot be after today.',
    );
    expect(screen.queryByTestId('receipt-price-11-error')).toBeNull();
    await act(async () => {});
  });

  it('asks for the pieces before sending nothing', () => {
    const calls = serve({ status: 201, body: { sales: [] } });
    render(
      <TestQueryProvider>
        <TillReceipt consignment={consignment} />
      </TestQueryProvider>,
    );
    fireEvent.press(screen.getByTestId('receipt-open'));
    fireEvent.press(screen.getByTestId('receipt-submit'));
    expect(screen.getByTestId('receipt-none')).toHaveTextContent(
      'Tick the pieces on the receipt first.',
    );
    expect(calls).toHaveLength(0);
  });

  it('refuses a price above the list price beside that piece, before asking the server', async () => {
    const calls = serve({ status: 201, body: { sales: [] } });
    openReceipt();
    fireEvent.changeText(screen.getByTestId('receipt-price-11'), '50');
    fireEvent.press(screen.getByTestId('receipt-submit'));
    expect(await screen.findByTestId('receipt-price-11-error')).toHaveTextContent(
      'The price paid cannot be above the list price, £48.00.',
    );
    expect(calls).toHaveLength(0);
  });
});
