import Papa from 'papaparse';

import { parseDecimalAmount } from '@/shared/money';
import {
  type BankColumns,
  bankColumnsSchema,
  type BankMatchRequest,
  type BankMatchResponse,
} from '@/shared/schemas/bank-import';
import { type Statement } from '@/shared/schemas/statement';

import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { HttpError } from '../http/http-error';
import { getStatement } from '../statements/statements.service';
import { getStudio } from '../studio/studio.service';
import { findBankColumns, listOpenStatementIds, saveBankColumns } from './bank-imports.repository';

const maxRows = 5000;

/** Headings banks commonly give each column (common practice; UK banks' exports, from memory). */
const guesses: Record<keyof BankColumns, RegExp> = {
  date: /date/i,
  amount: /amount|credit|paid in|money in|value/i,
  reference: /reference|description|details|narrative|memo|payee/i,
};

function guessColumns(headers: readonly string[]): BankColumns | null {
  const pick = (field: keyof BankColumns) => headers.find((h) => guesses[field].test(h));
  const date = pick('date');
  const amount = pick('amount');
  const reference = pick('reference');
  return date && amount && reference ? { date, amount, reference } : null;
}

/** A bank's date: ISO (2026-12-03) or the UK's day first (03/12/2026, 3-12-2026, 03.12.26). */
function readDate(text: string): string | null {
  const t = text.trim();
  const iso = /^(\d{4})-(\d{2})-(\d{2})$/.exec(t);
  const dayFirst = /^(\d{1,2})[/.-](\d{1,2})[/.-](\d{2}|\d{4})$/.exec(t);
  const [y, m, d] = iso
    ? [iso[1]!, iso[2]!, iso[3]!]
    : dayFirst
      ? [
          dayFirst[3]!.length === 2 ? `20${dayFirst[3]}` : dayFirst[3]!,
          dayFirst[2]!.padStart(2, '0'),
          dayFirst[1]!.padStart(2, '0'),
        ]
      : [];
  if (!y) return null;
  const date = `${y}-${m}-${d}`;
  const parsed = new Date(`${date}T00:00:00Z`);
  return !Number.isNaN(parsed.getTime()) && parsed.toISOString().startsWith(date) ? date : null;
}

/** A credit in minor units; null for a debit (a minus sign or brackets) or what is not an amount. */
function readCredit(text: string, currency: string): number | null {
  const t = text.trim().replace(/\s/g, '');
  if (t.startsWith('-') || t.startsWith('(')) return null;
  return parseDecimalAmount(t.replace(/^\+/, ''), currency);
}

const squeeze = (text: string) => text.toUpperCase().replace(/[^A-Z0-9]/g, '');

function matchOf(reference: string, amount: number, open: readonly Statement[]) {
  const text = squeeze(reference);
  const byReference = open.filter((s) => text.includes(squeeze(s.reference)));
  const byAmount = open.filter((s) => s.balance.amount === amount);
  const both = byReference.find((s) => s.balance.amount === amount);
  const [found, by] = both
    ? [both, 'reference-and-amount' as const]
    : byReference.length === 1
      ? [byReference[0]!, 'reference' as const]
      : byAmount.length === 1
        ? [byAmount[0]!, 'amount' as const]
        : [null, null];
  return found && by
    ? {
        statementId: found.id,
        reference: found.reference,
        venueName: found.venue.name,
        balance: found.balance,
        by,
      }
    : null;
}

/**
 * Reads a bank statement's CSV and pairs each credit with the issued statement it seems to pay, by
 * its reference and the balance; nothing is recorded here: the maker confirms each match, which
 * records it as a payment. Columns given are remembered for the studio's next file.
 */
export async function matchBankCredits(
  db: Db,
  scope: Scope,
  request: BankMatchRequest,
): Promise<BankMatchResponse> {
  const parsed = Papa.parse<Record<string, string>>(request.csv.replace(/^\ufeff/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
  });
  const headers = (parsed.meta.fields ?? []).filter((h) => h.trim() !== '');
  if (parsed.data.length > maxRows) {
    throw new HttpError('invalid_request', `A bank statement can have up to ${maxRows} rows.`, [
      { path: ['csv'], message: `This file has ${parsed.data.length} rows; split it.` },
    ]);
  }
  const remembered = await findBankColumns(db, scope);
  const saved = remembered ? bankColumnsSchema.safeParse(JSON.parse(remembered)) : null;
  const fits = (c: BankColumns) => Object.values(c).every((h) => headers.includes(h));
  let columns: BankColumns | null = null;
  if (request.columns) {
    const missing = (Object.entries(request.columns) as [keyof BankColumns, string][]).filter(
      ([, h]) => !headers.includes(h),
    );
    if (missing.length > 0) {
      throw new HttpError(
        'invalid_request',
        'Some fields need attention.',
        missing.map(([field, h]) => ({
          path: ['columns', field],
          message: `The file has no column called “${h}”.`,
        })),
      );
    }
    columns = request.columns;
    await saveBankColumns(db, scope, JSON.stringify(columns));
  } else if (saved?.success && fits(saved.data)) columns = saved.data;
  else columns = guessColumns(headers);
  if (!columns) return { headers, columns: null, credits: [], skipped: [] };

  const studio = await getStudio(db, scope);
  const open: Statement[] = [];
  for (const id of await listOpenStatementIds(db, scope)) {
    const statement = await getStatement(db, scope, id);
    if (statement.currency === studio.currency && statement.balance.amount > 0)
      open.push(statement);
  }
  const credits: BankMatchResponse['credits'] = [];
  const skipped: BankMatchResponse['skipped'] = [];
  parsed.data.forEach((record, i) => {
    const row = i + 2; // the heading is row 1
    const receivedOn = readDate(record[columns.date] ?? '');
    const amount = readCredit(record[columns.amount] ?? '', studio.currency);
    if (!receivedOn) return skipped.push({ row, reason: 'The date could not be read.' });
    if (amount === null || amount === 0) {
      return skipped.push({ row, reason: 'Not a credit (money paid in).' });
    }
    const reference = (record[columns.reference] ?? '').trim().slice(0, 200);
    credits.push({
      row,
      receivedOn,
      amount: { amount, currency: studio.currency },
      reference,
      match: matchOf(reference, amount, open),
    });
  });
  return { headers, columns, credits, skipped };
}
