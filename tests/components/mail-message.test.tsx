import { act, fireEvent, renderRouter, screen, waitFor } from 'expo-router/testing-library';
import { Linking } from 'react-native';

import { MailMessageScreen } from '@/components/screens/mail/message-screen';
import { navFor, studioNav } from '@/constants/navigation';
import { type OutboxMessage } from '@/shared/schemas/outbox';
import { type StudioSettings } from '@/shared/schemas/studio';

import { TestQueryProvider } from './test-query-client';

const failed: OutboxMessage = {
  id: 7,
  kind: 'consignment-dispatch',
  to: 'priya@lanthorn.example',
  subject: 'Winter Salt: twelve pieces on their way',
  state: 'failed',
  attempts: 12,
  lastError: 'connect ECONNREFUSED 127.0.0.1:2525',
  createdAt: '2026-11-02T09:00:00.000Z',
  nextAttemptAt: null,
  sentAt: null,
  attachments: [
    { index: 0, filename: 'Consignment sheet C-0007.pdf', contentType: 'application/pdf' },
    { index: 1, filename: 'Labels C-0007.pdf', contentType: 'application/pdf' },
  ],
  from: 'Saltmarsh Kiln <studio@saltmarsh.test>',
  text: 'Twelve pieces left the studio this morning.',
  html: '<p>Twelve pieces left the studio this morning.</p>',
  messageId: null,
};

const studio: StudioSettings = {
  id: 1,
  name: 'Saltmarsh Kiln',
  currency: 'GBP',
  locale: 'en-GB',
  timeZone: 'America/New_York',
  vatNumber: null,
  stockNumberPattern: '{YYYY}-{NNN}',
  priceStep: 500,
  nextStockNumber: '2026-001',
};

type Answer = { status: number; body: unknown };

/** The server at the fetch boundary, answering by method and path; records what was asked. */
function serve(routes: Record<string, Answer | (() => Answer)>) {
  const calls: string[] = [];
  global.fetch = jest.fn(async (url: string, init?: RequestInit) => {
    const key = `${init?.method ?? 'GET'} ${url}`;
    calls.push(key);
    const route = routes[key];
    const answer = typeof route === 'function' ? route() : route;
    if (!answer) return { ok: false, status: 404, text: async () => '' };
    return {
      ok: answer.status < 300,
      status: answer.status,
      text: async () => JSON.stringify(answer.body),
    };
  }) as unknown as typeof fetch;
  return calls;
}

function renderMessage() {
  renderRouter(
    {
      'mail/[id]': () => (
        <TestQueryProvider>
          <MailMessageScreen id={7} />
        </TestQueryProvider>
      ),
      'mail/index': () => null,
    },
    { initialUrl: '/mail/7' },
  );
}

describe('the message page', () => {
  it('shows a failed message’s error, its text and its attachments as downloads', async () => {
    serve({
      'GET /api/outbox/7': { status: 200, body: failed },
      'GET /api/studio': { status: 200, body: studio },
    });
    const open = jest.spyOn(Linking, 'openURL').mockResolvedValue(true);
    renderMessage();
    await screen.findByTestId('message-subject');
    expect(screen.getByTestId('message-state')).toHaveTextContent('Not sent');
    expect(screen.getByTestId('message-error')).toHaveTextContent(
      'This message was not sent. The mail server’s last answer: connect ECONNREFUSED 127.0.0.1:2525',
    );
    // In the studio's own time zone: 09:00 UTC is 04:00 in New York on 2 November 2026 (EST).
    await waitFor(() =>
      expect(screen.getByTestId('message-written')).toHaveTextContent('2 Nov 2026, 04:00'),
    );
    expect(screen.getByTestId('message-from')).toHaveTextContent(
      'Saltmarsh Kiln <studio@saltmarsh.test>',
    );
    // Phones show the plain-text part.
    expect(screen.getByTestId('message-body')).toHaveTextContent(
      'Twelve pieces left the studio this morning.',
    );
    expect(screen.getByTestId('message-attachment-1')).toHaveTextContent('Labels C-0007.pdf');
    fireEvent.press(screen.getByTestId('message-attachment-1'));
    expect(open).toHaveBeenCalledWith('/api/outbox/7/attachments/1');
  });

  it('sends a failed message again and shows it waiting to go', async () => {
    let current = failed;
    const calls = serve({
      'GET /api/outbox/7': () => ({ status: 200, body: current }),
      'GET /api/studio': { status: 200, body: studio },
      'POST /api/outbox/7/retry': () => {
        current = { ...failed, state: 'queued', attempts: 0, nextAttemptAt: failed.createdAt };
        return { status: 200, body: current };
      },
    });
    renderMessage();
    fireEvent.press(await screen.findByTestId('message-retry'));
    await waitFor(() =>
      expect(screen.getByTestId('message-state')).toHaveTextContent('Waiting to go'),
    );
    expect(screen.getByTestId('message-waiting')).toBeTruthy();
    expect(screen.queryByTestId('message-retry')).toBeNull();
    expect(calls).toContain('POST /api/outbox/7/retry');
  });

  it('says so when the message is not there', async () => {
    serve({
      'GET /api/outbox/7': {
        status: 404,
        body: { error: { code: 'not_found', message: 'That message was not found.' } },
      },
    });
    renderMessage();
    expect(await screen.findByText('That message was not found.')).toBeTruthy();
    await act(async () => {});
  });
});

describe('the studio’s navigation', () => {
  it('shows Sent mail to the owner only', () => {
    expect(navFor(studioNav, 'owner').map((i) => i.key)).toContain('mail');
    expect(navFor(studioNav, 'assistant').map((i) => i.key)).not.toContain('mail');
  });
});
