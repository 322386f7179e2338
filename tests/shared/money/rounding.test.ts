import { dinero, halfUp, toSnapshot, transformScale } from 'dinero.js';
import { GBP } from 'dinero.js/currencies';
import * as fc from 'fast-check';

import { applyRate, divideHalfUp, roundUpToStep } from '@/shared/money';

import { RUNS } from './arbitraries';

describe('divideHalfUp: HMRC VATREC12030 "round up and down"', () => {
  it('rounds under half a minor unit down and half or more up', () => {
    expect(divideHalfUp(49, 100)).toBe(0);
    expect(divideHalfUp(50, 100)).toBe(1);
    expect(divideHalfUp(149, 100)).toBe(1);
    expect(divideHalfUp(150, 100)).toBe(2);
    // Half-up, not to even: 2.5 → 3.
    expect(divideHalfUp(250, 100)).toBe(3);
  });

  it('rounds a negative half towards plus infinity, as dinero.js halfUp does', () => {
    expect(divideHalfUp(-150, 100)).toBe(-1);
    expect(divideHalfUp(-151, 100)).toBe(-2);
  });

  it('agrees with dinero.js transformScale(…, halfUp) for any safe amount and scale', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -1e15, max: 1e15 }),
        fc.integer({ min: 1, max: 4 }),
        (amount, extraDigits) => {
          const scaled = dinero({ amount, currency: GBP, scale: 2 + extraDigits });
          const expected = toSnapshot(transformScale(scaled, 2, halfUp)).amount;
          // dinero.js answers -0 for small negatives; the engine answers 0.
          expect(divideHalfUp(amount, 10 ** extraDigits)).toBe(expected + 0);
        },
      ),
      RUNS,
    );
  });

  it('is exact where the quotient of floating division is not: agrees with BigInt', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: Number.MAX_SAFE_INTEGER }),
        fc.integer({ min: 1, max: 20000 }),
        (numerator, denominator) => {
          const n = BigInt(numerator);
          const d = BigInt(denominator);
          expect(BigInt(divideHalfUp(numerator, denominator))).toBe((2n * n + d) / (2n * d));
        },
      ),
      RUNS,
    );
  });

  it('applyRate takes a rate in basis points: 40% of £1.05 is 42p', () => {
    expect(applyRate(105, 4000)).toBe(42);
  });
});

describe('roundUpToStep: price planning rounds up to a price step', () => {
  it('leaves a multiple alone and lifts anything else to the next one', () => {
    expect(roundUpToStep(10000, 500)).toBe(10000);
    expect(roundUpToStep(10001, 500)).toBe(10500);
    expect(roundUpToStep(0, 500)).toBe(0);
  });

  it('is the least multiple of the step at or above the amount', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 100_000_000_000 }),
        fc.integer({ min: 1, max: 1_000_000 }),
        (amount, step) => {
          const rounded = roundUpToStep(amount, step);
          expect(rounded % step).toBe(0);
          expect(rounded).toBeGreaterThanOrEqual(amount);
          expect(rounded - step).toBeLessThan(amount);
        },
      ),
      RUNS,
    );
  });
});
