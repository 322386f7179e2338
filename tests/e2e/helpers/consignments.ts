import fs from 'node:fs';
import path from 'node:path';

import { simpleParser } from 'mailparser';
import { type Page } from 'playwright-core';

import { type Consignment } from '@/shared/schemas/consignment';

import { pdfPagePng } from '../../documents/helpers/pdf';
import { qrReadingDpi, readQrCode } from '../../documents/helpers/qr';

/** The page's own origin: a label's QR address may name the host differently from the test. */
const originOf = (page: Page) => new URL(page.url()).origin;

/** The consignment as the API answers the page's signed-in person, at the page's own origin. */
export async function consignmentOf(page: Page, id: number): Promise<Consignment> {
  const res = await page.request.get(`${originOf(page)}/api/consignments/${id}`);
  expect(res.status()).toBe(200);
  return (await res.json()) as Consignment;
}

/** The messages the server's local SMTP stand-in received, parsed as a mail program would. */
export async function receivedMail(dataDir: string) {
  const dir = path.join(dataDir, 'mail');
  if (!fs.existsSync(dir)) return [];
  return Promise.all(
    fs.readdirSync(dir).map((f) => simpleParser(fs.readFileSync(path.join(dir, f)))),
  );
}

/** Asks `read` every 100 ms until it answers something, for at most 10 s. */
export async function waitFor<T>(read: () => Promise<T | undefined>, what: string): Promise<T> {
  for (let i = 0; i < 100; i += 1) {
    const value = await read();
    if (value !== undefined) return value;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`Timed out waiting for ${what}`);
}

async function api<T>(page: Page, method: 'GET' | 'POST', url: string, data?: unknown) {
  const res = await page.request.fetch(`${originOf(page)}${url}`, { method, data });
  if (!res.ok()) throw new Error(`${method} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/**
 * What the owner does on the consignment's page, through the API the page uses, signed in on
 * `page`: a consignment of `count` works still in the studio for the venue named, each at its
 * retail price, checked with no faults, agreed and sent (dated today, the dispatch e-mail queued).
 */
export async function sendConsignment(
  page: Page,
  { venueName, title, count }: { venueName: string; title: string; count: number },
): Promise<Consignment> {
  const venues = await api<{ items: { id: number; name: string }[] }>(page, 'GET', '/api/venues');
  const venue = venues.items.find((v) => v.name === venueName);
  if (!venue) throw new Error(`No venue called ${venueName}`);
  const works = await api<{ items: { id: number }[] }>(
    page,
    'GET',
    `/api/works?status=in-studio&pageSize=${count}`,
  );
  expect(works.items).toHaveLength(count);
  const created = await api<Consignment>(page, 'POST', '/api/consignments', {
    venueId: venue.id,
    title,
  });
  for (const work of works.items) {
    await api(page, 'POST', `/api/consignments/${created.id}/lines`, { workId: work.id });
  }
  const agreed = await api<Consignment>(page, 'POST', `/api/consignments/${created.id}/agree`, {});
  for (const line of agreed.lines) {
    await api(page, 'POST', `/api/consignment-lines/${line.id}/condition-reports`, {
      stage: 'dispatch',
      examinerName: 'Tomas Brill',
      examinedOn: agreed.today,
      findings: [],
    });
  }
  return api<Consignment>(page, 'POST', `/api/consignments/${created.id}/dispatch`, {});
}

/**
 * The addresses the QR codes on the first sheet of a consignment's shelf labels hold, read from
 * the PDF the server serves (rasterised by pdftoppm, decoded by jsQR), one per label.
 */
export async function labelAddresses(page: Page, id: number, labels: number): Promise<string[]> {
  const res = await page.request.get(`${originOf(page)}/api/consignments/${id}/labels.pdf`);
  expect(res.status()).toBe(200);
  expect(res.headers()['content-type']).toBe('application/pdf');
  const sheet = pdfPagePng(await res.body(), 1, qrReadingDpi);
  const read = await Promise.all(
    Array.from({ length: labels }, (_, slot) => readQrCode(sheet, slot)),
  );
  return read.map((address, slot) => {
    if (!address) throw new Error(`The QR code of label ${slot + 1} could not be read`);
    return address;
  });
}
