import {
  counterOf,
  formatStockNumber,
  maxStockNumberLength,
  nextStockNumber,
  stockNumberLike,
  stockNumberSequence,
} from '@/shared/works/stock-number';

describe('stock-number patterns', () => {
  it('formats the year and a counter padded to the Ns (the schema’s own example: 2026-007)', () => {
    expect(formatStockNumber('{YYYY}-{NNN}', 2026, 7n)).toBe('2026-007');
    expect(formatStockNumber('SK/{YY}/{NNNN}', 2026, 12n)).toBe('SK/26/0012');
    expect(formatStockNumber('{N}', 2026, 1234n)).toBe('1234');
  });

  it('reads the counter back only from numbers the pattern made that year', () => {
    expect(counterOf('{YYYY}-{NNN}', 2026, '2026-041')).toBe(41n);
    expect(counterOf('{YYYY}-{NNN}', 2026, '2025-041')).toBeNull();
    expect(counterOf('{YYYY}-{NNN}', 2026, '2026-041b')).toBeNull();
    expect(counterOf('A.{NN}', 2026, 'AB12')).toBeNull();
  });

  it('reads a counter of any length exactly, without floating point', () => {
    // 10^21 − 1 is past Number.MAX_SAFE_INTEGER (2^53 − 1): as a number it would print 1e+21.
    expect(counterOf('{YYYY}-{NNN}', 2026, '2026-999999999999999999999')).toBe(
      999_999_999_999_999_999_999n,
    );
    expect(nextStockNumber('{YYYY}-{NNN}', 2026, ['2026-99999999999999999'])).toBe(
      '2026-100000000000000000',
    );
  });

  it('goes one past the highest counter used, not into gaps, starting at 1', () => {
    expect(nextStockNumber('{YYYY}-{NNN}', 2026, [])).toBe('2026-001');
    expect(nextStockNumber('{YYYY}-{NNN}', 2026, ['2026-002', '2026-010', '2025-500', 'X'])).toBe(
      '2026-011',
    );
    expect(nextStockNumber('{YYYY}-{NNN}', 2026, ['2026-999'])).toBe('2026-1000');
  });

  it('falls back to the lowest unused counter when the next would not fit the length limit', () => {
    const huge = `2026-${'9'.repeat(maxStockNumberLength - 5)}`;
    expect(huge).toHaveLength(maxStockNumberLength);
    const sequence = stockNumberSequence('{YYYY}-{NNN}', 2026, [huge, '2026-001', '2026-003']);
    expect(sequence.peek()).toBe('2026-002');
    expect(sequence.next()).toBe('2026-002');
    expect(sequence.next()).toBe('2026-004');
    expect(sequence.next()).toBe('2026-005');
  });

  it('hands out each number once', () => {
    const sequence = stockNumberSequence('{YYYY}-{NNN}', 2026, ['2026-005']);
    const handed = Array.from({ length: 50 }, () => sequence.next());
    expect(new Set(handed).size).toBe(50);
    expect(handed[0]).toBe('2026-006');
  });

  it('narrows the search with a LIKE pattern whose special characters are escaped', () => {
    expect(stockNumberLike('{YYYY}-{NNN}', 2026)).toBe('2026-%');
    expect(stockNumberLike('50%_{YY}\\{NN}', 2026)).toBe('50\\%\\_26\\\\%');
  });
});
