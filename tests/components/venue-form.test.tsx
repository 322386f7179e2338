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
