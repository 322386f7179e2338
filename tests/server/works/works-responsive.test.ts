import { type AddressInfo } from 'node:net';

import Papa from 'papaparse';

import { maxImportRows } from '@/shared/schemas/work-import';

import { type Fixture, studioFixture } from '../helpers/studio-fixture';

/** The app on a real port, so requests overlap as they do in use. */
async function listening(f: Fixture) {
  const server = f.app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return { url, close: () => new Promise((resolve) => server.close(resolve)) };
}

/**
 * Sends `slow` and, until it answers, asks for the health check and the signed-in person over
 * and over: counts the answers that came back while the slow request was still running.
 */
async function answeredMeanwhile(url: string, cookie: string, slow: () => Promise<Response>) {
  let finished = false;
  const slowDone = slow().then(async (res) => {
    const text = await res.text();
    finished = true;
    return { status: res.status, text };
  });
  const answered = { health: 0, me: 0 };
  while (!finished) {
    const health = await fetch(`${url}/api/health`);
    if (!finished && health.ok) answered.health += 1;
    const me = await fetch(`${url}/api/me`, { headers: { Cookie: cookie } });
    if (!finished && me.ok) answered.me += 1;
  }
  return { answered, result: await slowDone };
}

describe('a large import or export does not stall the server', () => {
  it('answers other requests, signed-in ones too, while a maximal import commits', async () => {
    const f = await studioFixture();
    const cookie = await f.cookie('owner');
    const rows = Array.from({ length: maxImportRows }, (_, i) => `Bowl ${i},12.50,Stoneware`);
    const csv = ['Title,Price,Clay body', ...rows].join('\n');
    const { url, close } = await listening(f);
    try {
      const { answered, result } = await answeredMeanwhile(url, cookie, () =>
        fetch(`${url}/api/works/import`, {
          method: 'POST',
          headers: { Cookie: cookie, 'Content-Type': 'application/json' },
          body: JSON.stringify({ mode: 'commit', csv }),
        }),
      );
      expect(result.status).toBe(200);
      expect(JSON.parse(result.text)).toMatchObject({ imported: maxImportRows, skippedCount: 0 });
      expect(answered.health).toBeGreaterThan(2);
      expect(answered.me).toBeGreaterThan(2);
    } finally {
      await close();
    }
  });

  it('streams an export of 10,000 works and answers others meanwhile', async () => {
    const f = await studioFixture();
    const cookie = await f.cookie('owner');
    const works = Array.from({ length: 10_000 }, (_, i) => ({
      studio_id: f.studioA,
      stock_number: `E-${String(i).padStart(5, '0')}`,
      title: `Export test ${i}`,
      retail_price: 1_000 + i,
      currency: 'GBP',
    }));
    for (let i = 0; i < works.length; i += 500) {
      await f.db
        .insertInto('works')
        .values(works.slice(i, i + 500))
        .execute();
    }
    const { url, close } = await listening(f);
    try {
      const { answered, result } = await answeredMeanwhile(url, cookie, () =>
        fetch(`${url}/api/works/export.csv`, { headers: { Cookie: cookie } }),
      );
      expect(result.status).toBe(200);
      const parsed = Papa.parse<string[]>(result.text.replace(/^\ufeff/, ''), {
        skipEmptyLines: true,
      });
      expect(parsed.data).toHaveLength(10_001);
      expect(parsed.data[1]?.slice(0, 2)).toEqual(['E-00000', 'Export test 0']);
      expect(parsed.data[10_000]?.slice(0, 2)).toEqual(['E-09999', 'Export test 9999']);
      expect(answered.health).toBeGreaterThan(2);
      expect(answered.me).toBeGreaterThan(2);
    } finally {
      await close();
    }
  });
});
