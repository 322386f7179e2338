import request from 'supertest';

import { as, consignmentFixture, dispatchedWith } from '../helpers/consignment-fixture';

/** The text of an iCalendar feed, its folded lines joined again (RFC 5545 §3.1). */
const unfolded = (ics: string) => ics.replace(/\r\n[ \t]/g, '');

describe('the studio’s calendar feed', () => {
  it('gives the owner a private address whose feed lists the studio’s dates (RFC 5545)', async () => {
    const f = await consignmentFixture();
    const owner = as(f, 'owner');
    const show = await dispatchedWith(f, f.works);
    const made = await owner.post('/api/calendar-feed');
    expect(made.status).toBe(201);
    expect(made.body.active).toBe(true);
    const path = new URL(made.body.url as string).pathname;
    expect(path).toMatch(/^\/api\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);

    // A calendar program fetches it with no session.
    const feed = await request(f.app).get(path);
    expect(feed.status).toBe(200);
    expect(feed.headers['content-type']).toBe('text/calendar; charset=utf-8');
    const ics = unfolded(feed.text);
    // RFC 5545 §3.4 and §3.6: one VCALENDAR with VERSION 2.0 and PRODID, lines ending in CRLF.
    expect(ics.startsWith('BEGIN:VCALENDAR\r\n')).toBe(true);
    expect(ics).toContain('VERSION:2.0');
    expect(ics).toMatch(/PRODID:/);
    const consignment = (await owner.get(`/api/consignments/${show.id}`)).body;
    const sent = (consignment.dispatchDate as string).replaceAll('-', '');
    // An all-day event is DTSTART;VALUE=DATE (§3.3.4) and ends the next day (§3.6.1).
    expect(ics).toContain(`DTSTART;VALUE=DATE:${sent}`);
    expect(ics).toContain(`SUMMARY:Send: ${consignment.reference} Winter show\\, Gallery of A`);
    expect(ics).toMatch(new RegExp(`UID:consignment-${show.id}-dispatch@`));
    expect(feed.text.trimEnd().endsWith('END:VCALENDAR')).toBe(true);

    // A new address stops the old one; revoking stops both.
    const again = await owner.post('/api/calendar-feed');
    expect((await request(f.app).get(path)).status).toBe(404);
    const second = new URL(again.body.url as string).pathname;
    expect((await request(f.app).get(second)).status).toBe(200);
    expect((await owner.delete('/api/calendar-feed')).body).toEqual({
      active: false,
      createdAt: null,
      url: null,
    });
    expect((await request(f.app).get(second)).status).toBe(404);
  });

  it('is the owner’s to make, and a malformed address is refused', async () => {
    const f = await consignmentFixture();
    expect((await as(f, 'assistant').post('/api/calendar-feed')).status).toBe(403);
    expect((await as(f, 'gallery').get('/api/calendar-feed')).status).toBe(403);
    const bad = await request(f.app).get('/api/calendar/short.ics');
    expect(bad.status).toBe(400);
    const unknown = await request(f.app).get(`/api/calendar/${'a'.repeat(43)}.ics`);
    expect(unknown.status).toBe(404);
  });
});
