import { nextStockNumberFor } from '@/components/screens/settings/next-stock-number';

const settings = {
  stockNumberPattern: '{YYYY}-{NNN}',
  nextStockNumber: '2026-008',
  timeZone: 'Europe/London',
};
const now = new Date('2026-03-14T12:00:00Z');

describe('nextStockNumberFor, the settings page preview as the pattern is typed', () => {
  it('is the server’s own answer for the saved pattern', () => {
    expect(nextStockNumberFor(settings, '{YYYY}-{NNN}', now)).toBe('2026-008');
  });

  it('starts a new pattern at 1 when it reads none of the numbers given so far', () => {
    expect(nextStockNumberFor(settings, 'SK-{YY}-{NN}', now)).toBe('SK-26-01');
  });

  it('carries on from the last number when the new pattern reads it (a longer counter)', () => {
    expect(nextStockNumberFor(settings, '{YYYY}-{NNNN}', now)).toBe('2026-0008');
  });

  it('uses the year in the studio’s time zone (31 Dec 23:30 in London is 2025, not 2026 in Tokyo)', () => {
    const newYearsEve = new Date('2025-12-31T23:30:00Z');
    expect(
      nextStockNumberFor(
        { ...settings, nextStockNumber: '2025-008' },
        'P{YYYY}/{NNN}',
        newYearsEve,
      ),
    ).toBe('P2025/001');
    expect(
      nextStockNumberFor(
        { ...settings, nextStockNumber: '2025-008', timeZone: 'Asia/Tokyo' },
        'P{YYYY}/{NNN}',
        newYearsEve,
      ),
    ).toBe('P2026/001');
  });

  it('is null while the pattern is one the server would refuse', () => {
    expect(nextStockNumberFor(settings, '{YYYY}-', now)).toBeNull();
    expect(nextStockNumberFor(settings, '{NN}-{NN}', now)).toBeNull();
  });
});
