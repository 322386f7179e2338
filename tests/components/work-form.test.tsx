import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { WorkForm } from '@/components/screens/work-form/work-form';
import { emptyWorkValues, workBinding } from '@/components/screens/work-form/work-form-values';
import { useWorkCreateMutation } from '@/hooks/queries/works';

import { mockFetch } from './fetch-mock';
import { TestQueryProvider } from './test-query-client';

function CreateForm({ onSaved }: { onSaved: () => void }) {
  const create = useWorkCreateMutation();
  return (
    <WorkForm
      mode="create"
      defaultValues={emptyWorkValues('2026-014')}
      binding={workBinding('create', 'GBP')}
      currency="GBP"
      submitLabel="Save work"
      busyLabel="Saving…"
      onSubmit={async (values) => {
        await create.mutateAsync(values);
        onSaved();
      }}
    />
  );
}

function renderForm(onSaved = jest.fn()) {
  render(
    <TestQueryProvider>
      <CreateForm onSaved={onSaved} />
    </TestQueryProvider>,
  );
  return onSaved;
}

function fill(testID: string, text: string) {
  fireEvent.changeText(screen.getByTestId(testID), text);
}

const conflict = {
  status: 409,
  body: {
    error: {
      code: 'conflict',
      message: 'That stock number is already in use.',
      issues: [{ path: ['stockNumber'], message: '2026-014 is already used by “Moon jar”.' }],
    },
  },
};

describe('WorkForm', () => {
  it('puts the server’s field errors on the same fields', async () => {
    const fetchMock = mockFetch(conflict);
    const onSaved = renderForm();

    fill('work-title', 'Tall bottle, tenmoku');
    fill('work-retailPrice', '245.50');
    fireEvent.press(screen.getByTestId('work-submit'));

    expect(await screen.findByTestId('work-stockNumber-error')).toHaveTextContent(
      '2026-014 is already used by “Moon jar”.',
    );
    expect(screen.queryByTestId('work-title-error')).toBeNull();
    expect(screen.queryByTestId('work-form-error')).toBeNull();
    expect(onSaved).not.toHaveBeenCalled();

    const [url, init] = fetchMock.mock.calls[0] as [string, RequestInit];
    expect(url).toBe('/api/works');
    const body = JSON.parse(init.body as string);
    expect(body).toMatchObject({
      stockNumber: '2026-014',
      title: 'Tall bottle, tenmoku',
      retailPrice: { amount: 24550, currency: 'GBP' },
      costPrice: null,
      foodUse: 'not-stated',
    });
  });

  it('lifts a nested server issue (retailPrice.amount) onto the price field', async () => {
    mockFetch({
      status: 400,
      body: {
        error: {
          code: 'invalid_request',
          message: 'Some fields need another look.',
          issues: [{ path: ['retailPrice', 'amount'], message: 'That amount is too large.' }],
        },
      },
    });
    renderForm();

    fill('work-title', 'Jar');
    fill('work-retailPrice', '12');
    fireEvent.press(screen.getByTestId('work-submit'));

    expect(await screen.findByTestId('work-retailPrice-error')).toHaveTextContent(
      'That amount is too large.',
    );
  });

  it('shows a message that belongs to no field above the button', async () => {
    mockFetch({ status: 500, body: { error: { code: 'internal', message: 'boom' } } });
    renderForm();

    fill('work-title', 'Jar');
    fill('work-retailPrice', '12');
    fireEvent.press(screen.getByTestId('work-submit'));

    expect(await screen.findByTestId('work-form-error')).toHaveTextContent(
      'Something went wrong on our side. Try again in a moment.',
    );
  });

  it('says what is wrong next to each field before asking the server', async () => {
    const fetchMock = mockFetch();
    renderForm();

    fill('work-retailPrice', '45.555');
    fill('work-heightMm', '12.5');
    fill('work-firingTempC', '1290');
    fireEvent.press(screen.getByTestId('work-submit'));

    expect(await screen.findByTestId('work-title-error')).toHaveTextContent('Enter a title.');
    expect(screen.getByTestId('work-retailPrice-error')).toHaveTextContent(
      'Enter at most 2 decimal places (pounds and pence).',
    );
    expect(screen.getByTestId('work-heightMm-error')).toHaveTextContent(
      'Enter the size to the nearest millimetre, such as 142 mm or 14.2 cm.',
    );
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('reads sizes and weights typed with their units into millimetres and grams', async () => {
    const fetchMock = mockFetch({ status: 400, body: { error: { code: 'x', message: 'No.' } } });
    renderForm();

    fill('work-title', 'Tall jug');
    fill('work-retailPrice', '85');
    fill('work-heightMm', '14 cm');
    fill('work-widthMm', '95 mm');
    fill('work-depthMm', '90');
    fill('work-weightG', '1.2 kg');
    fireEvent.press(screen.getByTestId('work-submit'));

    await screen.findByTestId('work-form-error');
    const body = JSON.parse((fetchMock.mock.calls[0] as [string, RequestInit])[1].body as string);
    expect(body).toMatchObject({ heightMm: 140, widthMm: 95, depthMm: 90, weightG: 1200 });
  });

  it('says what a weight needs in the same words the server uses', async () => {
    const fetchMock = mockFetch();
    renderForm();

    fill('work-title', 'Tall jug');
    fill('work-retailPrice', '85');
    fill('work-weightG', '3 lb');
    fireEvent.press(screen.getByTestId('work-submit'));
    expect(await screen.findByTestId('work-weightG-error')).toHaveTextContent(
      'Enter the weight in grams or kilograms, such as 850 g or 1.2 kg.',
    );

    fill('work-weightG', '0 kg');
    fireEvent.press(screen.getByTestId('work-submit'));
    await waitFor(() =>
      expect(screen.getByTestId('work-weightG-error')).toHaveTextContent(
        'The weight must be at least 1 g.',
      ),
    );
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('names the nearest Orton cone beside the firing temperature as it is typed', async () => {
    mockFetch();
    renderForm();

    // Orton chart, self-supporting cones at 60 °C/h: cone 10 is 1285 °C, cone 11 is 1294 °C.
    fill('work-firingTempC', '1285');
    await waitFor(() =>
      expect(screen.getByTestId('work-cone')).toHaveTextContent(/Nearest cone: 10 \(1285 °C/),
    );
    fill('work-firingTempC', '1291');
    await waitFor(() =>
      expect(screen.getByTestId('work-cone')).toHaveTextContent(/Nearest cone: 11 \(1294 °C/),
    );
    fill('work-firingTempC', '1222');
    await waitFor(() =>
      expect(screen.getByTestId('work-cone')).toHaveTextContent(/Nearest cone: 6 \(1222 °C/),
    );
  });
});
