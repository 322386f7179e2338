import { type Server } from 'node:http';
import { type AddressInfo } from 'node:net';

import request from 'supertest';

import { formatDate } from '@/shared/format/dates';

import {
  auditOf,
  gbp,
  oneLine,
  recordedTime,
  saleMails,
  type SalesFixture,
  salesFixture,
} from '../helpers/sales-fixture';
import { addConsignment, insertLine, insertWork } from '../helpers/studio-fixture';

const roles = ['gallery', 'owner', 'assistant'] as const;

/** The app listening on loopback, so many requests are in flight at once on one server. */
async function listening(f: SalesFixture) {
  const server: Server = f.app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const cookies = Object.fromEntries(
    await Promise.all(roles.map(async (who) => [who, await f.cookie(who)] as const)),
  );
  const sell = (who: (typeof roles)[number], lineId: number, amount: number) =>
    request(url)
      .post(`/api/consignment-lines/${lineId}/sale`)
      .set('Cookie', cookies[who]!)
      .send({ soldOn: f.today, salePrice: gbp(amount) });
  return { sell, close: () => new Promise((resolve) => server.close(resolve)) };
}

const soldAudits = async (f: SalesFixture) =>
  f.db
    .selectFrom('audit_log')
    .select(['entity_id', 'user_id'])
    .where('action', '=', 'line.sold')
    .execute();

describe('concurrent sales', () => {
  it('sells a piece once when 50 people try at the same moment; the 49 others are told who did', async () => {
    const f = await salesFixture();
    const server = await listening(f);
    try {
      // A different price per attempt (£190.00 to £239.80), so the sale kept can be traced to
      // the one request that won.
      const attempts = Array.from({ length: 50 }, (_, i) => ({
        who: roles[i % roles.length]!,
        amount: 24_000 - 20 * (i + 1),
      }));
      const answers = await Promise.all(
        attempts.map((a) => server.sell(a.who, f.lines.tallBottle, a.amount)),
      );
      const won = answers.filter((r) => r.status === 201);
      const refused = answers.filter((r) => r.status === 409);
      expect(won).toHaveLength(1);
      expect(refused).toHaveLength(49);

      const sale = won[0]!.body.line.sale;
      const winner = attempts[answers.indexOf(won[0]!)]!;
      expect(sale.price).toEqual(gbp(winner.amount));
      const who =
        winner.who === 'gallery' ? 'gallery-a at Gallery of A' : `${winner.who}-a (the studio)`;
      const message = `A-2 Tall bottle is already sold: ${who} recorded the sale on ${formatDate(
        f.today,
        'en-GB',
      )} at ${recordedTime(sale.recordedAt)}.`;
      for (const res of refused) {
        expect(res.body).toEqual({ error: { code: 'conflict', message } });
      }

      const row = await f.db
        .selectFrom('consignment_lines')
        .selectAll()
        .where('id', '=', f.lines.tallBottle)
        .executeTakeFirstOrThrow();
      expect(row).toMatchObject({ state: 'sold', sale_price: winner.amount });
      expect((await auditOf(f, f.lines.tallBottle)).map((a) => a.action)).toEqual(['line.sold']);
      expect(await soldAudits(f)).toHaveLength(1);
      const mails = await saleMails(f);
      expect(mails).toHaveLength(1);
      expect(mails[0]!.subject).toMatch(/^Sold at Gallery of A: A-2 Tall bottle, £/);
    } finally {
      await server.close();
    }
  });

  // Given time: on PostgreSQL the hundred transactions queue for the studio's lock in turn, to
  // join the one held e-mail, and take about three times as long as on SQLite.
  it('records 100 sales of 100 pieces made at once, none lost and none twice', async () => {
    const f = await salesFixture();
    // A show of 100 pieces, out since 1 Oct 2026, on the default terms.
    const consignmentId = await addConsignment(f.db, f.studioA, f.venueA, 'C-2026-100');
    const lines: number[] = [];
    for (let i = 1; i <= 100; i++) {
      const stock = `R-${String(i).padStart(3, '0')}`;
      const work = await insertWork(f.db, f.studioA, stock, { title: `Beaker ${i}` });
      lines.push(await insertLine(f.db, f.studioA, consignmentId, work));
    }
    const server = await listening(f);
    try {
      const answers = await Promise.all(
        lines.map((lineId, i) => server.sell(roles[i % roles.length]!, lineId, 10_000 - i)),
      );
      expect(answers.map((r) => r.status)).toEqual(lines.map(() => 201));
      expect(answers.map((r) => r.body.line.id)).toEqual(lines);
    } finally {
      await server.close();
    }

    const rows = await f.db
      .selectFrom('consignment_lines')
      .select(['id', 'state', 'sale_price', 'sale_mail_id'])
      .where('consignment_id', '=', consignmentId)
      .orderBy('id')
      .execute();
    expect(rows.map((r) => [r.id, r.state, r.sale_price])).toEqual(
      lines.map((id, i) => [id, 'sold', 10_000 - i]),
    );
    // One 'line.sold' entry for each line, no line twice.
    const audits = await soldAudits(f);
    expect(audits.map((a) => Number(a.entity_id)).sort((a, b) => a - b)).toEqual(lines);
    // Every sale made while the maker's e-mail was held is in it, each once.
    const [mail, ...more] = await saleMails(f);
    expect(more).toEqual([]);
    expect(new Set(rows.map((r) => r.sale_mail_id))).toEqual(new Set([mail!.id]));
    expect(mail!.subject).toMatch(/^100 pieces sold at Gallery of A: /);
    const text = oneLine(mail!.text_body);
    for (let i = 1; i <= 100; i++) {
      expect(text.split(`R-${String(i).padStart(3, '0')} Beaker ${i} `)).toHaveLength(2);
    }
  }, 20_000);
});
