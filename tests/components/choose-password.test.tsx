import { fireEvent, renderRouter, screen } from 'expo-router/testing-library';

import { ChoosePasswordScreen } from '@/components/screens/password-reset/choose-password-screen';

import { mockFetch, type Reply } from './fetch-mock';
import { TestQueryProvider } from './test-query-client';

const token = 'Tk7bq2XyZ0aBcDeFgHiJkLmN';

function renderLink(...replies: Reply[]) {
  const fetchMock = mockFetch(...replies);
  renderRouter(
    {
      'reset-password/[token]': () => (
        <TestQueryProvider>
          <ChoosePasswordScreen token={token} />
        </TestQueryProvider>
      ),
      'forgot-password': () => null,
      'sign-in': () => null,
    },
    { initialUrl: `/reset-password/${token}` },
  );
  return fetchMock;
}

describe('ChoosePasswordScreen', () => {
  it('says plainly that an expired link no longer works, and offers a new one', async () => {
    renderLink({ status: 200, body: { state: 'expired' } });
    expect(await screen.findByTestId('reset-closed')).toHaveTextContent(
      'This link has expired: a link to choose a new password works only for a short while. Ask for a new one.',
    );
    expect(screen.getByTestId('reset-ask-again')).toHaveTextContent('Ask for a new link');
    expect(screen.queryByTestId('reset-password')).toBeNull();
  });

  it('gives the server’s words for a link it does not know', async () => {
    const message =
      'This link is not one Saggar knows. Check that it was copied whole, or ask for a new one.';
    renderLink({ status: 404, body: { error: { code: 'not_found', message } } });
    expect(await screen.findByText(message)).toBeTruthy();
    expect(screen.getByTestId('reset-ask-again')).toBeTruthy();
  });

  it('shows the refusal of a link spent meanwhile above the form', async () => {
    const message =
      'This link has been used already: the password was changed with it. Sign in, or ask for a new link.';
    const fetchMock = renderLink(
      { status: 200, body: { state: 'open', email: 'maker@example.com' } },
      { status: 409, body: { error: { code: 'conflict', message } } },
    );
    fireEvent.changeText(await screen.findByTestId('reset-password'), 'a long new password');
    fireEvent.press(screen.getByTestId('reset-submit'));
    expect(await screen.findByTestId('reset-error')).toHaveTextContent(message);
    const [url, init] = fetchMock.mock.calls[1] as [string, RequestInit];
    expect(url).toBe('/api/auth/reset-password');
    expect(JSON.parse(String(init.body))).toEqual({ token, password: 'a long new password' });
  });
});
