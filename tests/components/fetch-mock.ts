/** A stand-in for the server at the fetch boundary: answers each call with the next reply. */
export type Reply = { status: number; body?: unknown } | 'network-down';

export function mockFetch(...replies: Reply[]): jest.Mock {
  const queue = [...replies];
  const mock = jest.fn(async (_url: string, _init?: RequestInit) => {
    const reply = queue.shift();
    if (reply === undefined) throw new Error('fetch called more often than the test expected');
    if (reply === 'network-down') throw new TypeError('Failed to fetch');
    return {
      ok: reply.status >= 200 && reply.status < 300,
      status: reply.status,
      text: async () => (reply.body === undefined ? '' : JSON.stringify(reply.body)),
    };
  });
  global.fetch = mock as unknown as typeof fetch;
  return mock;
}
