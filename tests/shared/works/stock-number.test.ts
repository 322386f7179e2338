import {
  counterOf,
  formatStockNumber,
  nextStockNumber,
  stockNumberGlob,
} from '@/shared/works/stock-number';

describe('stock-number patterns', () => {
  it('formats the year and a counter padded to the Ns (the schema’s own example: 2026-007)', () => {
    expect(formatStockNumber('{YYYY}-{NNN}', 2026, 7)).toBe('2026-007');
    expect(formatStockNumber('SK/{YY}/{NNNN}', 2026, 12)).toBe('SK/26/0012');
    expect(formatStockNumber('{N}', 2026, 1234)).toBe('1234');
  });

  it('reads the counter back only from numbers the pattern made that year', () => {
    expect(counterOf('{YYYY}-{NNN}', 2026, '2026-041')).toBe(41);
    expect(counterOf('{YYYY}-{NNN}', 2026, '2025-041')).toBeNull();
    expect(counterOf('{YYYY}-{NNN}', 2026, '2026-041b')).toBeNull();
    expect(counterOf('A.{NN}', 2026, 'AB12')).toBeNull();
  });

  it('goes one past the highest counter used, not into gaps, starting at 1', () => {
    expect(nextStockNumber('{YYYY}-{NNN}', 2026, [])).toBe('2026-001');
    expect(nextStockNumber('{YYYY}-{NNN}', 2026, ['2026-002', '2026-010', '2025-500', 'X'])).toBe(
      '2026-011',
    );
    expect(nextStockNumber('{YYYY}-{NNN}', 2026, ['2026-999'])).toBe('2026-1000');
  });

  it('narrows the search with a GLOB whose special characters are escaped', () => {
    expect(stockNumberGlob('{YYYY}-{NNN}', 2026)).toBe('2026-*');
    expect(stockNumberGlob('*[{YY}]?{NN}', 2026)).toBe('[*][[]26][?]*');
  });
});
