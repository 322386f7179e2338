import { act, fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { PieceOutcome } from '@/components/screens/sale/piece-outcome';
import { SaleForm, type SalePiece } from '@/components/screens/sale/sale-form';
import { ApiError } from '@/hooks/api-errors';
import { trySplitSale } from '@/shared/money/split';
import { type ConsignmentLine } from '@/shared/schemas/consignment';
import { defaultTerms, type Terms } from '@/shared/schemas/terms';

import { TestQueryProvider } from './test-query-client';

const gbp = (amount: number) => ({ amount, currency: 'GBP' });

/**
 * A venue registered for VAT charging 40% commission with VAT added on top at the UK standard
 * rate, 20% (HMRC, "VAT rates": standard rate 20%); the maker is not registered.
 */
const vatAdded: Terms = { ...defaultTerms, commissionRateBp: 4000, commissionVat: 'added' };

const piece: SalePiece = {
  title: 'Moon jar, celadon',
  listPrice: gbp(24000),
  terms: vatAdded,
  dispatchDate: '2026-11-02',
  today: '2026-12-03',
};

function renderForm(
  onSubmit: jest.Mock = jest.fn(async () => {}),
  side: 'venue' | 'studio' = 'venue',
) {
  render(
    <SaleForm piece={piece} side={side} testID="sale" onSubmit={onSubmit} onCancel={jest.fn()} />,
  );
  return onSubmit;
}

describe('SaleForm', () => {
  it('previews a £240 sale at 40% commission with 20% VAT added: £96.00, £19.20 and £124.80', () => {
    renderForm();

    // Worked example: 40% of £240 is £96.00; 20% VAT on that is £19.20; the maker keeps
    // £240 − £96 − £19.20 = £124.80. The three add up to the price paid.
    expect(screen.getByTestId('sale-preview-commission')).toHaveTextContent('£96.00');
    expect(screen.getByTestId('sale-preview-vat')).toHaveTextContent('£19.20');
    expect(screen.getByTestId('sale-preview-share')).toHaveTextContent('£124.80');
    // The same figures as the money engine the server splits the sale with.
    const split = trySplitSale(vatAdded, gbp(24000), gbp(24000))!;
    expect([split.commission, split.vatOnCommission, split.makerShare]).toEqual([
      gbp(9600),
      gbp(1920),
      gbp(12480),
    ]);
    expect(screen.getByTestId('sale-preview-price')).toHaveTextContent('£240.00, the list price');
  });

  it('starts from today in the studio’s time zone and the list price, with no discount reason', () => {
    renderForm();

    expect(screen.getByTestId('sale-date').props.value).toBe('2026-12-03');
    expect(screen.getByTestId('sale-price').props.value).toBe('240.00');
    expect(screen.queryByTestId('sale-reason')).toBeNull();
  });

  it('asks why when the price paid is lower, and follows the price in the preview', () => {
    renderForm();

    fireEvent.changeText(screen.getByTestId('sale-price'), '216');
    expect(screen.getByTestId('sale-reason')).toBeTruthy();
    expect(screen.getByText('Why £24.00 off? (optional)')).toBeTruthy();
    // 40% of £216 = £86.40; 20% of that = £17.28; £216 − £86.40 − £17.28 = £112.32.
    expect(screen.getByTestId('sale-preview-commission')).toHaveTextContent('£86.40');
    expect(screen.getByTestId('sale-preview-vat')).toHaveTextContent('£17.28');
    expect(screen.getByTestId('sale-preview-share')).toHaveTextContent('£112.32');
    expect(screen.getByTestId('sale-preview-price')).toHaveTextContent(
      '£216.00: £24.00 off the list price',
    );
  });

  it('says “your share” to the studio', () => {
    renderForm(undefined, 'studio');
    expect(screen.getByText('Your share')).toBeTruthy();
    expect(screen.queryByText('The maker’s share')).toBeNull();
  });

  it('sends the day, the price in pence and the reason', async () => {
    const onSubmit = renderForm();

    fireEvent.changeText(screen.getByTestId('sale-price'), '216.00');
    fireEvent.changeText(screen.getByTestId('sale-reason'), 'Regular customer, 10% off');
    fireEvent.press(screen.getByTestId('sale-submit'));

    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit).toHaveBeenCalledWith({
      soldOn: '2026-12-03',
      salePrice: gbp(21600),
      discountReason: 'Regular customer, 10% off',
    });
  });

  it('sends no reason at the list price, even one typed before the price went back up', async () => {
    const onSubmit = renderForm();

    fireEvent.changeText(screen.getByTestId('sale-price'), '200');
    fireEvent.changeText(screen.getByTestId('sale-reason'), 'Chipped foot');
    fireEvent.changeText(screen.getByTestId('sale-price'), '240');
    fireEvent.press(screen.getByTestId('sale-submit'));

    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit).toHaveBeenCalledWith({ soldOn: '2026-12-03', salePrice: gbp(24000) });
  });

  it('refuses a price above the list price and a day outside dispatch to today, by the field', async () => {
    const onSubmit = renderForm();

    fireEvent.changeText(screen.getByTestId('sale-price'), '250');
    fireEvent.changeText(screen.getByTestId('sale-date'), '2026-10-30');
    fireEvent.press(screen.getByTestId('sale-submit'));

    expect(await screen.findByTestId('sale-price-error')).toHaveTextContent(
      'The price paid cannot be above the list price, £240.00.',
    );
    expect(screen.getByTestId('sale-date-error')).toHaveTextContent(
      'The date cannot come before the piece was sent, on 2 Nov 2026.',
    );

    fireEvent.changeText(screen.getByTestId('sale-date'), '2026-12-04');
    fireEvent.press(screen.getByTestId('sale-submit'));
    await waitFor(() =>
      expect(screen.getByTestId('sale-date-error')).toHaveTextContent(
        'The date cannot be after today, 3 Dec 2026.',
      ),
    );
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('puts the server’s field message on the field it names', async () => {
    renderForm(
      jest.fn(async () => {
        throw new ApiError(400, 'invalid_request', 'Some fields need attention.', {
          soldOn: 'The date cannot be after today, 2026-12-03.',
        });
      }),
    );

    fireEvent.press(screen.getByTestId('sale-submit'));
    expect(await screen.findByTestId('sale-date-error')).toHaveTextContent(
      'The date cannot be after today, 2026-12-03.',
    );
  });
});

const line: ConsignmentLine = {
  id: 7,
  workId: 3,
  stockNumber: '2026-014',
  title: 'Moon jar, celadon',
  thumbnailUrl: null,
  listPrice: gbp(24000),
  insuranceValue: gbp(14400),
  state: 'consigned',
  split: trySplitSale(vatAdded, gbp(24000), gbp(24000)),
  dispatchCheck: null,
  arrivalCheck: null,
  differences: [],
  returnCheck: null,
  newDamage: null,
  weightG: 2400,
  sale: null,
  resolution: null,
};

const consignment = {
  state: 'on-show' as const,
  terms: vatAdded,
  today: '2026-12-03',
  dispatchDate: '2026-11-02',
};

/** The server at the fetch boundary: each call gets the next answer; the calls are kept. */
function serve(...answers: { status: number; body: unknown }[]) {
  const calls: { url: string; method: string; body: unknown }[] = [];
  global.fetch = jest.fn(async (url: string, init?: RequestInit) => {
    calls.push({
      url,
      method: init?.method ?? 'GET',
      body: init?.body ? JSON.parse(String(init.body)) : undefined,
    });
    const answer = answers.shift() ?? { status: 500, body: {} };
    return {
      ok: answer.status < 300,
      status: answer.status,
      text: async () => JSON.stringify(answer.body),
    };
  }) as unknown as typeof fetch;
  return calls;
}

function renderOutcome(l: ConsignmentLine, side: 'venue' | 'studio' = 'venue') {
  render(
    <TestQueryProvider>
      <PieceOutcome line={l} consignment={consignment} side={side} testID="outcome" />
    </TestQueryProvider>,
  );
}

const sold = (over: Partial<NonNullable<ConsignmentLine['sale']>> = {}): ConsignmentLine => ({
  ...line,
  state: 'sold',
  sale: {
    soldOn: '2026-12-01',
    price: gbp(21600),
    split: trySplitSale(vatAdded, gbp(24000), gbp(21600))!,
    discount: gbp(2400),
    discountReason: 'Regular customer',
    enteredBy: 'venue',
    recordedBy: 'Rowan Achterberg',
    recordedAt: '2026-12-01T10:02:00.000Z',
    lockedBy: null,
    ...over,
  },
});

describe('PieceOutcome', () => {
  it('offers “Sold” first on the venue’s side, then returned, damaged and lost', () => {
    renderOutcome(line);
    expect(screen.getByTestId('outcome-sell')).toHaveTextContent('Sold');
    expect(screen.getByTestId('outcome-returned')).toHaveTextContent('Returned to the maker');
    expect(screen.getByTestId('outcome-damaged')).toBeTruthy();
    expect(screen.getByTestId('outcome-lost')).toBeTruthy();
    expect(screen.queryByTestId('outcome-withdrawn')).toBeNull();
  });

  it('lets only the studio withdraw a piece', () => {
    renderOutcome(line, 'studio');
    expect(screen.getByTestId('outcome-sell')).toHaveTextContent('Record a sale');
    expect(screen.getByTestId('outcome-withdrawn')).toBeTruthy();
  });

  it('shows the server’s words when someone else sold the piece first, and closes the form', async () => {
    const message =
      '2026-014 Moon jar, celadon is already sold: Sam Okafor at The Lanthorn Gallery recorded the sale on 3 Dec 2026 at 10:02 UTC.';
    const calls = serve({ status: 409, body: { error: { code: 'conflict', message } } });
    renderOutcome(line);

    fireEvent.press(screen.getByTestId('outcome-sell'));
    fireEvent.press(screen.getByTestId('outcome-sale-form-submit'));

    expect(await screen.findByTestId('outcome-news')).toHaveTextContent(message);
    expect(screen.queryByTestId('outcome-sale-form-submit')).toBeNull();
    expect(calls[0]).toEqual({
      url: '/api/consignment-lines/7/sale',
      method: 'POST',
      body: { soldOn: '2026-12-03', salePrice: gbp(24000) },
    });
  });

  it('shows a sale with its split, who recorded it, and “Undo this sale”', () => {
    renderOutcome(sold());
    expect(screen.getByTestId('outcome-sale-summary')).toHaveTextContent(
      'Sold on 1 Dec 2026 for £216.00',
    );
    expect(screen.getByTestId('outcome-sale-discount')).toHaveTextContent(
      '£24.00 off the list price of £240.00: Regular customer',
    );
    expect(screen.getByTestId('outcome-sale-split-share')).toHaveTextContent('£112.32');
    expect(screen.getByTestId('outcome-sale-entered')).toHaveTextContent(
      'Recorded by Rowan Achterberg at the venue',
    );
    expect(screen.getByTestId('outcome-sale-undo')).toBeTruthy();
  });

  it('undoes a sale once asked twice', async () => {
    const calls = serve({ status: 200, body: { line } });
    renderOutcome(sold());

    fireEvent.press(screen.getByTestId('outcome-sale-undo'));
    fireEvent.press(screen.getByTestId('outcome-sale-undo-confirm'));
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(calls[0]).toMatchObject({ url: '/api/consignment-lines/7/sale', method: 'DELETE' });
    await act(async () => {});
  });

  it('says which statement locks a sale, and offers no undo', () => {
    renderOutcome(sold({ lockedBy: 'ST-2026-004' }));
    expect(screen.getByTestId('outcome-sale-locked')).toHaveTextContent(
      'This sale is on statement ST-2026-004, already issued, so it can no longer be undone. A correction goes on a new statement.',
    );
    expect(screen.queryByTestId('outcome-sale-undo')).toBeNull();
  });

  it('tells the venue to ask the maker about a sale the studio entered', () => {
    renderOutcome(sold({ enteredBy: 'studio', recordedBy: 'Ines Calloway' }));
    expect(screen.getByTestId('outcome-sale-locked')).toHaveTextContent(
      'The studio entered this sale: ask the maker if it needs undoing.',
    );
    expect(screen.getByTestId('outcome-sale-entered')).toHaveTextContent(
      'Entered by the studio (Ines Calloway)',
    );
    expect(screen.queryByTestId('outcome-sale-undo')).toBeNull();
  });

  it('lets the studio undo a sale it entered', () => {
    renderOutcome(sold({ enteredBy: 'studio', recordedBy: 'Ines Calloway' }), 'studio');
    expect(screen.getByTestId('outcome-sale-undo')).toBeTruthy();
  });
});
