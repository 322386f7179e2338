import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { VenueForm } from '@/components/screens/venue-form/venue-form';
import {
  newVenueValues,
  venueCreateBindings,
} from '@/components/screens/venue-form/venue-form-values';

function renderForm(termsEditable: boolean, onSubmit: (values: object) => Promise<void>) {
  render(
    <VenueForm
      label="New venue"
      defaultValues={newVenueValues('GBP')}
      binding={termsEditable ? venueCreateBindings.withTerms : venueCreateBindings.detailsOnly}
      submitLabel="Save venue"
      termsEditable={termsEditable}
      onSubmit={onSubmit}
    />,
  );
}

describe('VenueForm terms, which only the owner sets (docs/domain.md roles)', () => {
  it('lets the owner edit the terms and sends them', async () => {
    const onSubmit = jest.fn(async () => {});
    renderForm(true, onSubmit);
    fireEvent.changeText(screen.getByTestId('venue-name'), 'Harbour Shop');
    fireEvent.changeText(screen.getByTestId('venue-commissionRate'), '35');
    fireEvent.press(screen.getByTestId('venue-submit'));
    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect(onSubmit.mock.calls[0]).toEqual([
      expect.objectContaining({
        name: 'Harbour Shop',
        defaultTerms: expect.objectContaining({ commissionRateBp: 3500 }),
      }),
    ]);
  });

  it('shows an assistant that the terms are locked and leaves them out of the request', async () => {
    const onSubmit = jest.fn(async () => {});
    renderForm(false, onSubmit);
    expect(screen.getByTestId('venue-terms-locked')).toBeTruthy();
    expect(screen.queryByTestId('venue-commissionRate')).toBeNull();
    fireEvent.changeText(screen.getByTestId('venue-name'), 'Harbour Shop');
    fireEvent.press(screen.getByTestId('venue-submit'));
    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    const [sent] = onSubmit.mock.calls[0] as unknown as [Record<string, unknown>];
    expect(sent.name).toBe('Harbour Shop');
    expect(sent).not.toHaveProperty('defaultTerms');
  });
});

describe('VenueForm VAT rate, asked only where VAT applies (docs/money-rules.md, "Terms")', () => {
  it('hides the rate while neither the venue nor the maker charges VAT, and shows it when either does', () => {
    renderForm(
      true,
      jest.fn(async () => {}),
    );
    // The usual terms: no VAT on commission, maker not registered (defaultTerms).
    expect(screen.queryByTestId('venue-vatRate')).toBeNull();

    fireEvent.press(screen.getByTestId('venue-commissionVat-added'));
    expect(screen.getByTestId('venue-vatRate')).toBeTruthy();

    fireEvent.press(screen.getByTestId('venue-commissionVat-none'));
    expect(screen.queryByTestId('venue-vatRate')).toBeNull();

    // A registered maker's prices include VAT at the rate, so it is asked again.
    fireEvent.press(screen.getByTestId('venue-makerVatRegistered-yes'));
    expect(screen.getByTestId('venue-vatRate')).toBeTruthy();
  });

  it('saves terms with no VAT even when the hidden rate was left unreadable', async () => {
    const onSubmit = jest.fn(async () => {});
    renderForm(true, onSubmit);
    fireEvent.changeText(screen.getByTestId('venue-name'), 'Harbour Shop');
    fireEvent.press(screen.getByTestId('venue-commissionVat-added'));
    fireEvent.changeText(screen.getByTestId('venue-vatRate'), '300');
    fireEvent.press(screen.getByTestId('venue-commissionVat-none'));
    fireEvent.press(screen.getByTestId('venue-submit'));
    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect(onSubmit.mock.calls[0]).toEqual([
      expect.objectContaining({
        defaultTerms: expect.objectContaining({ commissionVat: 'none', vatRateBp: 2000 }),
      }),
    ]);
  });
});

describe('VenueForm rates out of range, said as they are typed', () => {
  it('says a commission over 100% beside the field before any save, and clears it when corrected', async () => {
    const onSubmit = jest.fn(async () => {});
    renderForm(true, onSubmit);
    fireEvent.changeText(screen.getByTestId('venue-commissionRate'), '140');
    expect(await screen.findByTestId('venue-commissionRate-error')).toHaveTextContent(
      'A percentage cannot be above 100.',
    );
    fireEvent.changeText(screen.getByTestId('venue-commissionRate'), '45');
    await waitFor(() =>
      expect(screen.queryByTestId('venue-commissionRate-error')).not.toBeOnTheScreen(),
    );
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('says a negative VAT rate at once', async () => {
    renderForm(
      true,
      jest.fn(async () => {}),
    );
    fireEvent.press(screen.getByTestId('venue-commissionVat-included'));
    fireEvent.changeText(screen.getByTestId('venue-vatRate'), '-5');
    expect(await screen.findByTestId('venue-vatRate-error')).toHaveTextContent(
      'A percentage cannot be below 0.',
    );
  });
});
