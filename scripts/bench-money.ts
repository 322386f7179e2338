// Money engine benchmark: splits per second against the same arithmetic on plain integers, and
// the time to build a 10,000-line statement. Targets: ratio no worse than 1:5, statement < 50 ms.
import { addDays, buildStatement, splitSale, type StatementLineInput } from '../shared/money';
import { defaultTerms, type Terms } from '../shared/schemas/terms';

const RATIO_TARGET = 5;
const STATEMENT_TARGET_MS = 50;
const N = 200_000;

const termsSet: Terms[] = [
  { ...defaultTerms },
  { ...defaultTerms, commissionVat: 'added', discountRule: 'venue' },
  { ...defaultTerms, commissionVat: 'included', discountRule: 'maker', commissionRateBp: 3000 },
  { ...defaultTerms, commissionVat: 'added', makerVatRegistered: true, commissionRateBp: 5000 },
];
const statementLines: StatementLineInput[] = Array.from({ length: 10_000 }, (_, i) => ({
  id: i,
  listPrice: { amount: 1000 + ((i * 7919) % 500_000), currency: 'GBP' },
  sale: {
    date: addDays('2024-01-01', i % 366),
    price: { amount: 1000 + ((i * 7919) % 500_000) - (i % 4) * 50, currency: 'GBP' },
  },
}));
const statementInput = {
  terms: termsSet[1]!,
  period: { from: '2024-01-01', to: '2024-12-31' },
  lines: statementLines,
  payments: [{ id: 1, date: '2024-06-30', amount: { amount: 100_000, currency: 'GBP' } }],
};

function timeStatement(): number {
  const start = performance.now();
  const statement = buildStatement(statementInput);
  const ms = performance.now() - start;
  if (statement.lines.length !== 10_000) throw new Error('statement lost lines');
  return ms;
}

// Timed first, before the split benchmark's arrays exist: a server builds one statement at a time.
const coldStatementMs = timeStatement();

const lists = Array.from({ length: N }, (_, i) => 1000 + ((i * 7919) % 500_000));
// Every fourth sale at list price, the others discounted by 5%, 10% or 15%.
const saleAmounts = lists.map((list, i) => list - Math.floor((list * (i % 4)) / 20));

function half(n: number, d: number): number {
  const q = Math.floor(n / d);
  return (n - q * d) * 2 >= d ? q + 1 : q;
}

function nil(vat: number, base: number, rate: number): number {
  return vat === 0 && base > 0 && rate > 0 ? 1 : vat;
}

/** The split's arithmetic inline on plain numbers: the cost floor the engine is measured against. */
function baselineSplit(t: Terms, list: number, sale: number) {
  const v = t.vatRateBp;
  const r = t.commissionRateBp;
  const out = t.makerVatRegistered ? nil(half(sale * v, 10000 + v), sale, v) : 0;
  const sn = sale - out;
  const ln = t.makerVatRegistered ? list - nil(half(list * v, 10000 + v), list, v) : list;
  let c =
    t.discountRule === 'shared'
      ? half(sn * r, 10000)
      : t.discountRule === 'venue'
        ? Math.max(0, half(ln * r, 10000) - (ln - sn))
        : half(ln * r, 10000);
  let vat = 0;
  let keeps = c;
  if (t.commissionVat === 'added') {
    vat = nil(half(c * v, 10000), c, v);
    keeps = c + vat;
  } else if (t.commissionVat === 'included') vat = nil(half(c * v, 10000 + v), c, v);
  const share = sale - keeps;
  if (share < 0) c = -1;
  const insured = ln - half(ln * r, 10000);
  return { c, vat, share, out, reclaim: t.makerVatRegistered ? vat : 0, insured };
}

function timeBaseline(): number {
  let check = 0;
  const start = performance.now();
  for (let i = 0; i < N; i += 1) {
    const s = baselineSplit(termsSet[i & 3]!, lists[i]!, saleAmounts[i]!);
    check += s.share;
  }
  const ms = performance.now() - start;
  if (check === 0) throw new Error('unused');
  return ms;
}

function timeEngine(): number {
  let check = 0;
  const start = performance.now();
  for (let i = 0; i < N; i += 1) {
    const t = termsSet[i & 3]!;
    const s = splitSale(
      t,
      { amount: lists[i]!, currency: 'GBP' },
      { amount: saleAmounts[i]!, currency: 'GBP' },
    );
    check += s.makerShare.amount;
  }
  const ms = performance.now() - start;
  if (check === 0) throw new Error('unused');
  return ms;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)]!;
}

const baseline: number[] = [];
const engine: number[] = [];
for (let round = 0; round < 7; round += 1) {
  baseline.push(timeBaseline());
  engine.push(timeEngine());
}
const statements = Array.from({ length: 15 }, timeStatement);

const baselinePerSecond = N / (median(baseline) / 1000);
const enginePerSecond = N / (median(engine) / 1000);
const ratio = baselinePerSecond / enginePerSecond;
const statementMs = median(statements);
const fmt = (n: number) => Math.round(n).toLocaleString('en-GB');

console.log(`plain-integer splits/s  ${fmt(baselinePerSecond)}`);
console.log(`engine splits/s         ${fmt(enginePerSecond)}`);
console.log(
  `ratio                   1:${ratio.toFixed(2)} (target no worse than 1:${RATIO_TARGET})`,
);
console.log(
  `10,000-line statement   ${statementMs.toFixed(1)} ms median, ${coldStatementMs.toFixed(1)} ms first run (target < ${STATEMENT_TARGET_MS} ms)`,
);
const met = ratio <= RATIO_TARGET && Math.max(statementMs, coldStatementMs) < STATEMENT_TARGET_MS;
console.log(met ? 'targets met' : 'TARGETS MISSED');
process.exitCode = met ? 0 : 1;
