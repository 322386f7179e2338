import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { SignInScreen } from '@/components/screens/sign-in/sign-in-screen';

import { mockFetch } from './fetch-mock';
import { TestQueryProvider } from './test-query-client';

function renderSignIn() {
  return render(
    <TestQueryProvider>
      <SignInScreen />
    </TestQueryProvider>,
  );
}

function fillIn(email: string, password: string) {
  fireEvent.changeText(screen.getByTestId('sign-in-email'), email);
  fireEvent.changeText(screen.getByTestId('sign-in-password'), password);
  fireEvent.press(screen.getByTestId('sign-in-submit'));
}

describe('SignInScreen', () => {
  it('says what is wrong next to each field before asking the server', async () => {
    const fetchMock = mockFetch();
    renderSignIn();

    fillIn('not-an-address', '');

    expect(await screen.findByTestId('sign-in-email-error')).toHaveTextContent(
      'Enter an e-mail address such as name@example.com.',
    );
    expect(screen.getByTestId('sign-in-password-error')).toHaveTextContent('Enter your password.');
    expect(screen.queryByTestId('sign-in-error')).toBeNull();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('shows the server’s plain message for a wrong password and keeps the e-mail typed', async () => {
    const fetchMock = mockFetch({
      status: 401,
      body: {
        error: {
          code: 'invalid_credentials',
          message: 'That e-mail address and password do not match an account.',
        },
      },
    });
    renderSignIn();

    fillIn('maker@example.com', 'wrong-password');

    expect(await screen.findByTestId('sign-in-error')).toHaveTextContent(
      'That e-mail address and password do not match an account.',
    );
    expect(screen.getByTestId('sign-in-email')).toHaveDisplayValue('maker@example.com');
    expect(screen.queryByTestId('sign-in-email-error')).toBeNull();

    const [url, init] = fetchMock.mock.calls[0] as [string, RequestInit];
    expect(url).toBe('/api/auth/sign-in/email');
    expect(init.method).toBe('POST');
    expect(init.credentials).toBe('same-origin');
    expect(JSON.parse(init.body as string)).toEqual({
      email: 'maker@example.com',
      password: 'wrong-password',
    });
  });

  it('puts the server’s field errors on the fields they belong to', async () => {
    mockFetch({
      status: 400,
      body: {
        error: {
          code: 'invalid_request',
          message: 'Some fields need another look.',
          issues: [{ path: ['email'], message: 'No account can use this address.' }],
        },
      },
    });
    renderSignIn();

    fillIn('maker@example.com', 'secret');

    expect(await screen.findByTestId('sign-in-email-error')).toHaveTextContent(
      'No account can use this address.',
    );
    expect(screen.queryByTestId('sign-in-password-error')).toBeNull();
    expect(screen.queryByTestId('sign-in-error')).toBeNull();
  });

  it('explains a lost connection in plain words', async () => {
    mockFetch('network-down');
    renderSignIn();

    fillIn('maker@example.com', 'secret');

    await waitFor(() =>
      expect(screen.getByTestId('sign-in-error')).toHaveTextContent(
        'Saggar could not be reached. Check the connection and try again.',
      ),
    );
  });
});
